import { TextField } from './field';

/** Lists longer than this get a filter box. */
export const FILTER_FROM = 7;

/**
 * A search box over a list already on the page, with how many items it shows ("3 of 12 shown", read out politely).
 * Filter with `filterByText` (src/lib/words.ts).
 */
export function ListFilter({
  label,
  value,
  onChange,
  shown,
  total,
  placeholder,
  className = '',
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  shown: number;
  total: number;
  placeholder?: string;
  className?: string;
}) {
  return (
    <div className={`flex flex-wrap items-end gap-3 ${className}`}>
      <TextField type="search" label={label} className="w-full sm:max-w-72" value={value} placeholder={placeholder} onChange={(e) => onChange(e.target.value)} />
      <p className="num pb-2 text-sm text-ink-faint" aria-live="polite">
        {value.trim() ? `${shown} of ${total} shown` : ''}
      </p>
    </div>
  );
}
