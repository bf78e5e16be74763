import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { TextField } from '@/components/ui/field';
import { ErrorState, Skeleton } from '@/components/ui/states';
import { shoppingPreviewQuery } from '../api/shopping.queries';
import { buyText } from './shopping-list';
import { money } from '@/lib/money';

const MAX_TRAYS = 50;

/**
 * What baking a number of this tray asks the shop for, after what the pantry holds: packages and estimated cost
 * (an extra tray mid-week, or pricing a tray before it goes on a plan). Nothing is written.
 */
export function TrayShopping({ trayId }: { trayId: number }) {
  const [typed, setTyped] = useState('1');
  const n = Number(typed);
  const valid = Number.isInteger(n) && n >= 1 && n <= MAX_TRAYS;
  const [count, setCount] = useState(1);
  const q = useQuery(shoppingPreviewQuery([{ trayId, count }]));
  const items = q.data?.aisles.flatMap((a) => a.items) ?? [];
  return (
    <div className="flex flex-col gap-3">
      <TextField
        label="Trays"
        type="number"
        inputMode="numeric"
        min={1}
        max={MAX_TRAYS}
        value={typed}
        error={valid ? undefined : `A whole number from 1 to ${MAX_TRAYS}`}
        onChange={(e) => {
          setTyped(e.target.value);
          const v = Number(e.target.value);
          if (Number.isInteger(v) && v >= 1 && v <= MAX_TRAYS) setCount(v);
        }}
      />
      {q.isPending ? (
        <Skeleton className="h-24 w-full" label="Working out the shopping" />
      ) : q.isError ? (
        <ErrorState error={q.error} retry={() => q.refetch()} />
      ) : items.length === 0 ? (
        <p className="text-sm text-ink-soft">This tray has no ingredients to buy yet.</p>
      ) : (
        <>
          <ul className={`flex flex-col divide-y divide-line text-sm ${q.isPlaceholderData ? 'opacity-60' : ''}`} aria-busy={q.isPlaceholderData}>
            {items.map((item) => (
              <li key={item.ingredientId} className="flex justify-between gap-3 py-1.5">
                <span>
                  <span className="font-bold">{item.name}</span>
                  <span className="num block text-ink-soft">{buyText(item)}</span>
                </span>
                <span className="num shrink-0">{item.costCents ? money(item.costCents) : ''}</span>
              </li>
            ))}
          </ul>
          <p className="num text-sm font-bold">
            Estimated {money(q.data.totalCostCents)}
            {!q.data.costComplete && ' or more (some items have no price)'}
          </p>
          {q.data.problems.length > 0 && (
            <p className="text-sm text-signal-700">Not counted: {q.data.problems.map((p) => `${p.name} (${p.message})`).join('; ')}</p>
          )}
          <p className="text-xs text-ink-faint">After what the pantry holds, in whole packages. Prices are the library's estimates.</p>
        </>
      )}
    </div>
  );
}
