import { CAUTIONS } from '@shared/domain/eat-by';
import { inReadersScale } from '@shared/domain/temperature';
import { useTempScale } from '@/lib/temp-scale';

/** The cautions Trayline always shows: food safety and diet, deferring to local codes and professionals. */
export function Cautions({ topic, compact = false }: { topic?: 'food-safety' | 'diet'; compact?: boolean }) {
  const items = CAUTIONS.filter((c) => !topic || c.topic === topic);
  const scale = useTempScale();
  return (
    <section aria-labelledby="cautions-h" className="rounded-tray border border-frost bg-frost-50 p-4">
      <h2 id="cautions-h" className="mb-2 flex items-center gap-2 font-sans text-base font-bold">
        {/* The cold-chain mark for food safety; a plain note mark for the diet caution alone. */}
        <span aria-hidden>{topic === 'diet' ? 'ℹ' : '❄'}</span> {topic === 'diet' ? 'Diet caution' : 'Safety notes'}
      </h2>
      <ul className={`flex list-disc flex-col gap-1 pl-5 ${compact ? 'text-sm' : ''}`}>
        {items.map((c) => (
          <li key={c.id}>
            {inReadersScale(c.text, scale)} <span className="text-xs text-ink-faint">({c.source})</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
