import { Link, useParams, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { LABEL_SHEETS, LABEL_SHEET_CODES, labelsPerSheet, type LabelSheetCode } from '@shared/domain/label-sheets';
import type { ContainerLabelDto, ShortTrayDto } from '@shared/schemas/shopping.schema';
import { labelSheetQuery } from '@/features/shopping/api/shopping.queries';
import { LabelSheet } from '@/features/shopping/components/label-sheet';
import { Button } from '@/components/ui/button';
import { DayOptions, SelectField } from '@/components/ui/field';
import { EmptyState, Notice, PageHeader, QueryView } from '@/components/ui/states';
import { counted } from '@/lib/words';
import { dayLabel } from '@/lib/dates';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/hooks/use-me';

const labelsOf = (labels: ContainerLabelDto[], withSpares: boolean) => (withSpares ? labels : labels.filter((l) => l.kind === 'plate'));

/** Why a tray is short on this prep day, in the kitchen's words. */
function shortWhy(t: ShortTrayDto): string {
  if (t.lostTrays > 0) return `${t.lostTrays} of its ${counted(t.trayCount, 'tray')} thrown away`;
  if (t.trayCount === 0) return 'no tray of it set for this prep day';
  return t.trayCount === 1 ? 'the one tray set does not cover its plates' : `the ${t.trayCount} trays set do not cover its plates`;
}

/**
 * The prep day is short of some trays (thrown away in the cooling record, or too few set): not every plate label
 * has food to go with it. Which plates change is the coach's choice on the week board; the labels follow the board.
 */
function ShortNotice({ short, weekId, coach }: { short: ShortTrayDto[]; weekId: number; coach: boolean }) {
  return (
    <Notice tone="warn" title="Not every container can be filled">
      <ul className="list-disc pl-5">
        {short.map((t) => (
          <li key={t.trayId}>
            <b>{t.trayName}</b>: {counted(t.portions, 'portion')} short ({shortWhy(t)}).{' '}
            {t.plateLabels > 0 ? `${counted(t.plateLabels, 'plate label')} below use it, marked “Short”.` : 'No plate label of this prep day uses it.'}
          </li>
        ))}
      </ul>
      <p className="mt-1">
        {coach ? (
          <>
            Choose which plates change, or add a tray, on the{' '}
            <Link className="font-bold underline" to={paths.week(weekId)}>
              week board
            </Link>; the labels follow the board.
          </>
        ) : (
          'Fill the containers you can and tell the coach: they choose which plates change or add a tray, and the labels follow the board.'
        )}{' '}
        Labels marked “Short” may change: print them once the plates are settled.
      </p>
    </Notice>
  );
}

/** Container labels of one prep day, printed on a generic label sheet. */
export function Component() {
  const weekId = Number(useParams().weekId);
  const coach = useMe().role === 'coach';
  const [params, setParams] = useSearchParams();
  const layout = (LABEL_SHEET_CODES as readonly string[]).includes(params.get('layout') ?? '')
    ? (params.get('layout') as LabelSheetCode)
    : 'letter-2x5';
  const prepDate = params.get('prepDate');
  const withSpares = params.get('spares') !== '0';
  const q = useQuery(labelSheetQuery(weekId, layout, prepDate));
  const set = (k: string, v: string) => {
    const next = new URLSearchParams(params);
    next.set(k, v);
    setParams(next, { replace: true });
  };

  return (
    <div className="flex flex-col gap-5">
      <div className="no-print flex flex-col gap-4">
        <PageHeader title="Container labels" lead="One label per container: whose it is, when it was made, until when it is good.">
          <Button onClick={() => window.print()} disabled={!q.data || labelsOf(q.data.labels, withSpares).length === 0}>
            Print labels
          </Button>
        </PageHeader>
        <div className="flex flex-wrap gap-3">
          <SelectField label="Label sheet" value={layout} onChange={(e) => set('layout', e.target.value)} className="w-80">
            {LABEL_SHEET_CODES.map((c) => (
              <option key={c} value={c}>
                {LABEL_SHEETS[c].name}
              </option>
            ))}
          </SelectField>
          <label className="flex min-h-11 items-center gap-2 self-end font-bold">
            <input type="checkbox" className="h-5 w-5 accent-herb" checked={withSpares} onChange={(e) => set('spares', e.target.checked ? '1' : '0')} />
            Label spare portions too
          </label>
          {q.data && q.data.prepDates.length > 1 && (
            <SelectField label="Prep day" value={q.data.prepDate ?? ''} onChange={(e) => set('prepDate', e.target.value)} className="w-48">
              <DayOptions days={q.data.prepDates} />
            </SelectField>
          )}
        </div>
        <Notice tone="cold" title="Print at actual size">
          Choose 100 % (not "fit to page") and no margins, then test on plain paper against your label sheet. Eat-by dates
          are guidance, not a guarantee: keep the fridge at 40 °F (4 °C) or below, and your local food code comes first.
        </Notice>
      </div>
      <QueryView
        query={q}
        isEmpty={(data) => labelsOf(data.labels, withSpares).length === 0}
        empty={<EmptyState title="No containers for this prep day">Fill the week board and set tray counts: each plate and each spare portion gets a label.</EmptyState>}
      >
        {(data) => (
          <>
            {data.short.length > 0 && (
              <div className="no-print">
                <ShortNotice short={data.short} weekId={weekId} coach={coach} />
              </div>
            )}
            <p className="no-print num text-ink-soft">
              {counted(labelsOf(data.labels, withSpares).length, 'label')} on{' '}
              {counted(Math.ceil(labelsOf(data.labels, withSpares).length / labelsPerSheet(LABEL_SHEETS[layout])), 'sheet')}, prep day {data.prepDate ? dayLabel(data.prepDate, true) : 'not set'}
            </p>
            <LabelSheet layout={layout} labels={labelsOf(data.labels, withSpares)} />
          </>
        )}
      </QueryView>
    </div>
  );
}
