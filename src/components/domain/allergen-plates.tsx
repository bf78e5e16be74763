import { allergenLabel } from '@shared/domain/allergens';
import { andList } from '@shared/domain/words';
import type { PublishedAllergenPlateDto } from '@shared/schemas/weeks.schema';
import { dayLabel } from '@/lib/dates';

/** Published plates holding an allergen now on a client's list: day, slot, plate and the allergens, one per line. */
export function AllergenPlates({ plates }: { plates: readonly PublishedAllergenPlateDto[] }) {
  return (
    <ul className="list-disc pl-5">
      {plates.map((p) => (
        <li key={`${p.date}|${p.slot}`}>
          {dayLabel(p.date)}, {p.slot.toLowerCase()}: {p.name} ({andList(p.allergens.map(allergenLabel))})
        </li>
      ))}
    </ul>
  );
}
