import { allergenLabel, type AllergenCode } from '@shared/domain/allergens';
import type { PlateMacrosDto } from '@shared/schemas/assemblies.schema';

/** A plate's macros in a compact row of compared numbers. */
export function PlateMacros({ macros, allergens = [] }: { macros: PlateMacrosDto; allergens?: AllergenCode[] }) {
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
      <span className="num">{Math.round(macros.kcal)} kcal</span>
      <span className="num">{macros.netCarbsG} g net carbs</span>
      <span className="num">{macros.proteinG} g protein</span>
      <span className="num">{macros.fatG} g fat</span>
      {allergens.length > 0 && <span className="text-ink-faint">Contains: {allergens.map(allergenLabel).join(', ')}</span>}
    </div>
  );
}
