import { allergenLabel } from '@shared/domain/allergens';
import { amountAndName } from '@shared/domain/units';
import { PAN_LINING_LABELS, type TrayDto } from '@shared/schemas/trays.schema';
import { Card } from '@/components/ui/states';
import { COOLING } from '@shared/domain/eat-by';
import { bothScales } from '@shared/domain/temperature';
import { useTempScale } from '@/lib/temp-scale';

/**
 * The recipe as a printable card (the print stylesheet hides navigation and buttons marked `no-print`); with the
 * reader's `system`, a line typed in the other one also gives theirs ("16 oz (454 g) Cream cheese").
 */
export function RecipeCard({ tray, system }: { tray: TrayDto; system?: 'us' | 'metric' }) {
  const scale = useTempScale();
  const cut =
    tray.cutPlan.kind === 'grid'
      ? `${tray.cutPlan.rows} rows × ${tray.cutPlan.columns} columns (${tray.portions} portions)`
      : `${tray.cutPlan.pieces} pieces of equal weight`;
  return (
    <Card className="break-inside-avoid">
      <h2 className="mb-1 text-xl">Recipe card</h2>
      {tray.description && <p className="mb-3 whitespace-pre-line text-ink-soft">{tray.description}</p>}
      <dl className="num mb-3 grid gap-x-4 gap-y-1 text-sm sm:grid-cols-2">
        <div>
          <dt className="inline font-bold">Pan: </dt>
          <dd className="inline">
            {tray.pan.label}, {PAN_LINING_LABELS[tray.panLining].toLowerCase()}
          </dd>
        </div>
        <div>
          <dt className="inline font-bold">Bake: </dt>
          <dd className="inline">
            {bothScales(tray.bake.tempF, scale)}, {tray.bake.minMinutes}–{tray.bake.maxMinutes} min ·{' '}
            {tray.bake.categoryLabel}
          </dd>
        </div>
        <div>
          <dt className="inline font-bold">Cut: </dt>
          <dd className="inline">{cut}</dd>
        </div>
        <div>
          <dt className="inline font-bold">Store: </dt>
          <dd className="inline">
            fridge {tray.storage.fridgeDays} days (prep day is day 0) · freezer {tray.storage.freezerWeeks} weeks
          </dd>
        </div>
      </dl>
      <h3 className="font-bold">Ingredients</h3>
      <ul className="num mb-3 list-disc pl-5">
        {tray.lines.map((l) => (
          <li key={l.id}>
            {amountAndName(l.amountText, l.unit, l.ingredientName, system)}
            {l.note && <span className="text-ink-soft">, {l.note}</span>}
          </li>
        ))}
      </ul>
      <h3 className="font-bold">Reheat</h3>
      <ol className="mb-3 list-decimal pl-5">
        {tray.reheatSteps.map((s, i) => (
          <li key={i}>{s}</li>
        ))}
        <li>
          Every part reaches {bothScales(tray.reheat.minF, scale)} ({tray.reheat.source}).
        </li>
      </ol>
      <p className="text-sm">
        <span className="font-bold">Allergens:</span>{' '}
        {tray.allergens.length ? tray.allergens.map(allergenLabel).join(', ') : 'none of the nine major allergens'} (from the
        ingredients; check package labels).
      </p>
      <p className="mt-2 text-xs text-ink-faint">
        Cool from {bothScales(COOLING.startF, scale)} to {bothScales(COOLING.stageOneEndF, scale)} within 2 hours and to{' '}
        {bothScales(COOLING.finalMaxF, scale)} within 6 hours (FDA Food Code 3-501.14). Eat-by dates are guidance;
        your local food code comes first.
      </p>
    </Card>
  );
}
