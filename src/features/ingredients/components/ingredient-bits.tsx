import { allergenLabel, type AllergenCode } from '@shared/domain/allergens';
import type { AtwaterCheck } from '@shared/domain/nutrition';

/** A number for a table cell: at most `dp` decimals, no trailing zeros. */
export function fmt(n: number | null | undefined, dp = 1): string {
  if (n === null || n === undefined || !Number.isFinite(n)) return '—';
  return Number(n.toFixed(dp)).toLocaleString('en-US', { maximumFractionDigits: dp });
}

export function AllergenList({ codes }: { codes: AllergenCode[] }) {
  if (!codes.length) return <span className="text-ink-faint">none</span>;
  return (
    <ul className="flex flex-wrap gap-1" aria-label="Allergens">
      {codes.map((c) => (
        <li key={c} className="rounded-full border border-caution bg-caution-50 px-2 text-xs font-bold text-ink">
          {allergenLabel(c)}
        </li>
      ))}
    </ul>
  );
}

/** The Atwater cross-check as an icon plus words (never colour alone). */
export function AtwaterFlag({ check, long = false }: { check: AtwaterCheck; long?: boolean }) {
  const title = `Stored ${fmt(check.storedKcal)} kcal; from fat, protein and carbs ${fmt(check.computedKcal)} kcal per 100 g`;
  if (!check.flagged) {
    return (
      <span title={title} className="inline-flex items-center gap-1 text-sm text-herb-700">
        <span aria-hidden>✓</span> {long ? title : 'Energy adds up'}
      </span>
    );
  }
  return (
    <span title={title} className="inline-flex items-center gap-1 text-sm font-bold text-caution-700">
      <span aria-hidden>⚠</span> {long ? `Check energy: ${title}` : 'Check energy'}
    </span>
  );
}
