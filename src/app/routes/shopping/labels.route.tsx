import { Link, useParams, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { LABEL_SHEETS, LABEL_SHEET_CODES, labelsPerSheet, sheetsFor, type LabelSheet as SheetLayout, type LabelSheetCode } from '@shared/domain/label-sheets';
import type { ContainerLabelDto, ShortTrayDto } from '@shared/schemas/shopping.schema';
import { allergenLabel } from '@shared/domain/allergens';
import { labelSheetQuery } from '@/features/shopping/api/shopping.queries';
import { LabelSheet } from '@/features/shopping/components/label-sheet';
import { Button } from '@/components/ui/button';
import { DayOptions, SelectField } from '@/components/ui/field';
import { EmptyState, Notice, PageHeader, QueryView } from '@/components/ui/states';
import { counted } from '@/lib/words';
import { dayLabel } from '@/lib/dates';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/hooks/use-me';
import { useTempScale } from '@/lib/temp-scale';
import { bothScales } from '@shared/domain/temperature';
import { compareNames } from '@shared/domain/words';
import { FRIDGE_MAX_F } from '@shared/domain/eat-by';

/** The labels to print: one client's plates, or every plate (and the spare portions when asked). */
const labelsOf = (labels: ContainerLabelDto[], withSpares: boolean, clientId: number | null) =>
  clientId !== null ? labels.filter((l) => l.clientId === clientId) : withSpares ? labels : labels.filter((l) => l.kind === 'plate');

/** The clients with a plate label, by name (the choice of whose labels to print). */
const clientsOf = (labels: ContainerLabelDto[]) =>
  [...new Map(labels.filter((l) => l.clientId !== null).map((l) => [l.clientId!, l.title])).entries()].sort((a, b) => compareNames(a[1], b[1]));

const COLUMN_WORDS: Record<number, readonly string[]> = { 2: ['left', 'right'], 3: ['left', 'middle', 'right'] };

/** "8 (row 4, right)": where a label place is on its sheet, counted row by row as the sheet is printed. */
function placeWords(sheet: SheetLayout, place: number): string {
  const row = Math.floor((place - 1) / sheet.columns) + 1;
  const col = (place - 1) % sheet.columns;
  return `${place} (row ${row}, ${COLUMN_WORDS[sheet.columns]?.[col] ?? `column ${col + 1}`})`;
}

/** The trays short on this prep day, as the labels shown use them (one client's: only their plates count). */
function shortOf(short: ShortTrayDto[], shown: ContainerLabelDto[], clientId: number | null): ShortTrayDto[] {
  if (clientId === null) return short;
  return short
    .map((t) => ({ ...t, plateLabels: shown.filter((l) => l.shortTrays.includes(t.trayName)).length }))
    .filter((t) => t.plateLabels > 0);
}

/** What stays unused on the last sheet: " Labels 8–10 of the last sheet stay unused: start there next time." */
function leftOver(count: number, sheet: SheetLayout, skip: number): string {
  const per = labelsPerSheet(sheet);
  const used = (count + skip) % per;
  if (count === 0 || used === 0) return '';
  return used + 1 === per
    ? ` Label ${per} of the last sheet stays unused: start there next time.`
    : ` Labels ${used + 1}–${per} of the last sheet stay unused: start there next time.`;
}

/** Why a tray is short on this prep day, in the kitchen's words. */
function shortWhy(t: ShortTrayDto): string {
  if (t.lostTrays > 0) return `${t.lostTrays} of its ${counted(t.trayCount, 'tray')} thrown away`;
  if (t.trayCount === 0) return 'no tray of it set for this prep day';
  return t.trayCount === 1 ? 'the one tray set does not cover its plates' : `the ${t.trayCount} trays set do not cover its plates`;
}

/**
 * Plate labels holding an allergen on their client's own list (allowed by the coach with a reason, or still to be
 * solved on the board): named before printing, so whoever packs knows which containers to take care with.
 */
function OwnListNotice({ labels, weekId, coach }: { labels: ContainerLabelDto[]; weekId: number; coach: boolean }) {
  return (
    <Notice tone="warn" title={`${counted(labels.length, 'plate label')} ${labels.length === 1 ? 'marks' : 'mark'} an allergen on the client’s own list`}>
      <ul className="list-disc pl-5">
        {labels.map((l) => (
          <li key={`${l.clientId}|${l.planned?.date}|${l.planned?.slot}`}>
            <b>{l.title}</b>, {l.planned ? `${dayLabel(l.planned.date)} ${l.planned.slot}` : ''}: {l.subtitle} ({l.onClientList.map(allergenLabel).join(', ')})
          </li>
        ))}
      </ul>
      <p className="mt-1">
        {labels.length === 1 ? 'It is marked on its label; pack it with care, apart from the rest.' : 'Each is marked on its label; pack them with care, apart from the rest.'}{' '}
        {coach ? (
          <>
            The{' '}
            <Link className="font-bold underline" to={paths.week(weekId)}>
              week board
            </Link>{' '}
            shows whether you allowed it with a reason or it still needs solving.
          </>
        ) : (
          'If one looks wrong, ask the coach before packing it.'
        )}
      </p>
    </Notice>
  );
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
  const scale = useTempScale();
  const [params, setParams] = useSearchParams();
  const layout = (LABEL_SHEET_CODES as readonly string[]).includes(params.get('layout') ?? '')
    ? (params.get('layout') as LabelSheetCode)
    : 'letter-2x5';
  const prepDate = params.get('prepDate');
  const withSpares = params.get('spares') !== '0';
  const sheet = LABEL_SHEETS[layout];
  // The first unused place of a sheet used in part before (1 = a new sheet); kept within the sheet chosen.
  const start = Math.min(Math.max(Math.trunc(Number(params.get('start'))) || 1, 1), labelsPerSheet(sheet));
  const q = useQuery(labelSheetQuery(weekId, layout, prepDate));
  // One client's labels: a client with a plate label this prep day (another address reads as everyone's).
  const clients = q.data ? clientsOf(q.data.labels) : [];
  const clientId = clients.find(([id]) => String(id) === params.get('client'))?.[0] ?? null;
  const shown = q.data ? labelsOf(q.data.labels, withSpares, clientId) : [];
  const short = q.data ? shortOf(q.data.short, shown, clientId) : [];
  const ownList = shown.filter((l) => l.onClientList.length > 0);
  const set = (k: string, v: string) => {
    const next = new URLSearchParams(params);
    next.set(k, v);
    setParams(next, { replace: true });
  };

  return (
    <div className="flex flex-col gap-5">
      <div className="no-print flex flex-col gap-4">
        <PageHeader title="Container labels" lead="One label per container: whose it is, when it was made, until when it is good.">
          <Button onClick={() => window.print()} disabled={shown.length === 0}>
            Print labels
          </Button>
        </PageHeader>
        <div className="flex flex-wrap gap-3">
          {q.data && q.data.prepDates.length > 1 && (
            <SelectField label="Prep day" value={q.data.prepDate ?? ''} onChange={(e) => set('prepDate', e.target.value)} className="w-48">
              <DayOptions days={q.data.prepDates} />
            </SelectField>
          )}
          <SelectField label="Label sheet" value={layout} onChange={(e) => set('layout', e.target.value)} className="w-80">
            {LABEL_SHEET_CODES.map((c) => (
              <option key={c} value={c}>
                {LABEL_SHEETS[c].name}
              </option>
            ))}
          </SelectField>
          <SelectField
            label="Start at label"
            value={String(start)}
            onChange={(e) => set('start', e.target.value)}
            hint="A sheet used before: its first unused label."
            className="w-52"
          >
            {Array.from({ length: labelsPerSheet(sheet) }, (_, i) => (
              <option key={i} value={i + 1}>
                {i === 0 ? '1 (a new sheet)' : placeWords(sheet, i + 1)}
              </option>
            ))}
          </SelectField>
          {clients.length > 0 && (
            <SelectField
              label="Whose labels"
              value={clientId === null ? '' : String(clientId)}
              onChange={(e) => set('client', e.target.value)}
              hint="One client's again, after a change to their plates."
              className="w-60"
            >
              <option value="">Everyone's</option>
              {clients.map(([id, name]) => (
                <option key={id} value={id}>
                  {name}
                </option>
              ))}
            </SelectField>
          )}
          {clientId === null && (
            <label className="flex min-h-11 items-center gap-2 self-end font-bold">
              <input type="checkbox" className="h-5 w-5 accent-herb" checked={withSpares} onChange={(e) => set('spares', e.target.checked ? '1' : '0')} />
              Label spare portions too
            </label>
          )}
        </div>
        <Notice tone="cold" title="Print at actual size">
          Choose 100 % (not "fit to page") and no margins, then test on plain paper against your label sheet. Eat-by dates
          are guidance, not a guarantee: keep the fridge at {bothScales(FRIDGE_MAX_F, scale)} or below, and your local food code comes first.
        </Notice>
      </div>
      <QueryView
        query={q}
        isEmpty={() => shown.length === 0}
        empty={<EmptyState title="No containers for this prep day">Fill the week board and set tray counts: each plate and each spare portion gets a label.</EmptyState>}
      >
        {(data) => (
          <>
            {short.length > 0 && (
              <div className="no-print">
                <ShortNotice short={short} weekId={weekId} coach={coach} />
              </div>
            )}
            {ownList.length > 0 && (
              <div className="no-print">
                <OwnListNotice labels={ownList} weekId={weekId} coach={coach} />
              </div>
            )}
            <p className="no-print num text-ink-soft">
              {counted(shown.length, 'label')} on {counted(sheetsFor(shown.length, sheet, start - 1), 'sheet')}
              {start > 1 && `, the first from label ${start}`}, prep day {data.prepDate ? dayLabel(data.prepDate, true) : 'not set'}.
              {leftOver(shown.length, sheet, start - 1)}
            </p>
            <LabelSheet layout={layout} labels={shown} skip={start - 1} />
          </>
        )}
      </QueryView>
    </div>
  );
}
