import { useQuery } from '@tanstack/react-query';
import { allergenLabel } from '@shared/domain/allergens';
import { Card, ErrorState, Skeleton } from '@/components/ui/states';
import { portionCardQuery } from '../api/trays.queries';
import { money } from '@/lib/money';

/** One portion of a tray: weight, size in the pan, macros with net carbs, energy shares, cost when priced. */
export function PortionCard({ trayId }: { trayId: number }) {
  const q = useQuery(portionCardQuery(trayId));
  if (q.isPending) return <Skeleton className="h-48 w-full" label="Loading the portion card" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const c = q.data;
  const p = c.perPortion;
  return (
    <Card className="break-inside-avoid">
      <h2 className="mb-1 text-xl">Portion card</h2>
      <p className="num mb-3 text-ink-soft">
        1 of {c.portions} · {c.gramsPerPortion.toFixed(0)} g
        {c.portionSize ? ` · ${c.portionSize}` : ` · about ${c.portionArea} ${c.areaUnit} (equal pieces by weight)`}
      </p>
      <table className="num w-full text-left">
        <caption className="sr-only">Nutrition per portion</caption>
        <tbody>
          {[
            ['Energy', `${p.kcal.toFixed(0)} kcal`],
            ['Fat', `${p.fatG.toFixed(1)} g`],
            ['  of which saturated', `${p.satFatG.toFixed(1)} g`],
            ['Protein', `${p.proteinG.toFixed(1)} g`],
            ['Total carbohydrate', `${p.carbsG.toFixed(1)} g`],
            ['  Fiber', `${p.fiberG.toFixed(1)} g`],
            ['  Sugar alcohols and allulose', `${p.polyolsG.toFixed(1)} g`],
            ['Net carbs', `${p.netCarbsG.toFixed(1)} g`],
            ['Sodium', `${p.sodiumMg.toFixed(0)} mg`],
          ].map(([k, v]) => (
            <tr key={k} className={`border-b border-line ${k === 'Net carbs' ? 'font-bold' : ''}`}>
              <th scope="row" className={`py-1 font-normal ${k.startsWith('  ') ? 'pl-4 text-ink-soft' : ''}`}>
                {k.trim()}
              </th>
              <td className="py-1 text-right">{v}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="mt-3 flex h-3 overflow-hidden rounded-full" aria-hidden>
        <div className="bg-oven-3" style={{ width: `${c.energyShares.fatPct}%` }} />
        <div className="bg-herb" style={{ width: `${c.energyShares.proteinPct}%` }} />
        <div className="bg-frost" style={{ width: `${c.energyShares.carbsPct}%` }} />
      </div>
      <p className="num mt-1 text-sm text-ink-soft">
        Energy: fat {c.energyShares.fatPct} %, protein {c.energyShares.proteinPct} %, carbs {c.energyShares.carbsPct} % (general
        factors 9/4/4).
      </p>
      <p className="mt-2 text-sm">
        {c.costPerPortionCents !== null ? (
          <>
            Cost per portion: <span className="num font-bold">{money(c.costPerPortionCents)}</span>
          </>
        ) : (
          <span className="text-ink-faint">Cost per portion unknown: no price for {c.unpricedIngredients.join(', ')}.</span>
        )}
      </p>
      <p className="mt-2 text-sm">
        <span className="font-bold">Allergens:</span>{' '}
        {c.allergens.length ? c.allergens.map(allergenLabel).join(', ') : 'none of the nine major allergens'}
      </p>
      <p className="mt-2 text-xs text-ink-faint">
        Net carbs by the workspace rule ({c.netCarbRule.replace(/-/g, ' ')}); “net carbs” has no regulatory definition.
      </p>
    </Card>
  );
}
