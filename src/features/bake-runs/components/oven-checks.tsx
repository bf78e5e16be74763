import type { ReactNode } from 'react';

/**
 * A tick box per oven, in a fieldset with its legend: which ovens a run uses (the coach's settings, the ad-hoc
 * planner, the kitchen on prep day). `detail` adds words after an oven's name; `error` is said under the boxes.
 */
export function OvenChecks<O extends { id: number; name: string }>({
  legend,
  ovens,
  chosen,
  onChange,
  error,
  detail,
  className = 'flex flex-col gap-2',
}: {
  legend: string;
  ovens: readonly O[];
  chosen: readonly number[];
  onChange: (ids: number[]) => void;
  error?: string;
  detail?: (oven: O) => ReactNode;
  className?: string;
}) {
  return (
    <fieldset className={className}>
      <legend className="text-sm font-bold">{legend}</legend>
      <div className="flex flex-wrap gap-x-5">
        {ovens.map((o) => (
          <label key={o.id} className="flex min-h-11 items-center gap-2">
            <input
              type="checkbox"
              className="h-5 w-5"
              checked={chosen.includes(o.id)}
              onChange={(e) => onChange(e.target.checked ? [...chosen, o.id] : chosen.filter((i) => i !== o.id))}
            />
            {o.name}
            {detail?.(o)}
          </label>
        ))}
      </div>
      {error && (
        <p role="alert" className="text-sm font-bold text-signal">
          ⚠ {error}
        </p>
      )}
    </fieldset>
  );
}
