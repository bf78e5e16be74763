import { Link, useSearchParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { addDays, type IsoDate } from '@shared/domain/iso-date';
import { clockFrom, FOOD_CODE_COOLING, readingsSaid } from '@shared/domain/cooling';
import { bothScales, inReadersScale } from '@shared/domain/temperature';
import { useTempScale } from '@/lib/temp-scale';
import { coolingLogQuery as coolingLogQuerySchema, type CoolingLogDto, type CoolingLogRow } from '@shared/schemas/cooling.schema';
import { coolingLogCsvUrl, coolingLogQuery } from '@/features/bake-runs/api/cooling';
import { Button, linkButton } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Card, EmptyState, PageHeader, QueryView, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { currentClockStyle, dayLabel, kitchenToday } from '@/lib/dates';
import { useMe } from '@/features/auth/hooks/use-me';


/** How many days the log shows when the address names none: the last four weeks and two days (common practice, no source). */
const DEFAULT_DAYS = 30;

/** The stretch asked for, or why it cannot be read: the server's own query schema, its first word said under its field. */
function stretchOf(from: string, to: string): { from: string; to: string; error: { field: 'from' | 'to'; words: string } | null } {
  const read = coolingLogQuerySchema.safeParse({ from, to });
  if (read.success) return { from, to, error: null };
  const issue = read.error.issues[0];
  return { from, to, error: { field: issue.path[0] === 'from' ? 'from' : 'to', words: issue.message } };
}

const RESULT_TONE: Record<CoolingLogRow['state'], string> = {
  cooled: 'bg-herb-50 text-herb-700 border-herb',
  'missed-70': 'bg-signal-50 text-signal-700 border-signal-700',
  'missed-41': 'bg-signal-50 text-signal-700 border-signal-700',
  discarded: 'bg-paper-deep text-ink border-line-strong',
  'to-70': 'bg-frost-50 text-ink border-frost',
  'to-41': 'bg-frost-50 text-ink border-frost',
};

function Counts({ rows }: { rows: CoolingLogRow[] }) {
  const n = (pred: (r: CoolingLogRow) => boolean) => rows.filter(pred).length;
  const missed = n((r) => r.state === 'missed-70' || r.state === 'missed-41');
  const cooling = n((r) => r.state === 'to-70' || r.state === 'to-41');
  return (
    <p className="text-base" role="status">
      <span className="num font-bold">{rows.length}</span> {rows.length === 1 ? 'tray' : 'trays'} · <span className="num">{n((r) => r.state === 'cooled')}</span>{' '}
      cooled in time
      {missed > 0 && (
        <span className="font-bold text-signal-700">
          {' '}
          · <span className="num">{missed}</span> missed a deadline
        </span>
      )}
      {' · '}
      <span className="num">{n((r) => r.state === 'discarded')}</span> thrown away
      {cooling > 0 && (
        <>
          {' · '}
          <span className="num">{cooling}</span> waiting for a reading
        </>
      )}
    </p>
  );
}

/** One tray's line: what was written down and where it ended. */
function TrayLine({ row }: { row: CoolingLogRow }) {
  const style = currentClockStyle();
  const scale = useTempScale();
  const at = (local: string) => clockFrom(local, row.prepDate, style);
  return (
    <li className="break-inside-avoid rounded-lg border border-line bg-paper-card p-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-bold">{row.trayName}</p>
        <span className={`rounded-full border px-2 py-0.5 text-sm font-bold ${RESULT_TONE[row.state]}`}>{inReadersScale(row.result, scale)}</span>
      </div>
      <p className="num mt-1 text-base">
        Out {at(row.outAt)}
        {row.restartedAt && <> · reheated, cooling again from {at(row.restartedAt)}</>} · {bothScales(FOOD_CODE_COOLING.firstStageF, scale)} by {at(row.by70)} · {bothScales(FOOD_CODE_COOLING.finalF, scale)} by {at(row.by41)}
      </p>
      <p className="num text-sm text-ink-soft">
        {row.readings.length ? readingsSaid(row.readings, row.prepDate, style, scale).join(' · ') : 'No temperature written down.'}
      </p>
      {row.note && <p className="text-sm">Note: {row.note}</p>}
      <p className="text-sm text-ink-faint">Written down by {row.recordedBy}</p>
    </li>
  );
}

/** The log's records by prep day, each day with the week it was baked for (and the way to its bake run). */
function ByPrepDay({ log }: { log: CoolingLogDto }) {
  const days = [...new Set(log.rows.map((r) => r.prepDate))];
  return (
    <div className="flex flex-col gap-5">
      <Counts rows={log.rows} />
      {log.timeZone === null && (
        <p className="text-sm text-ink-soft">
          The kitchen’s time zone is not set, so Trayline does not know the kitchen’s time: the last three days’ trays are
          judged on the temperatures written down alone (a deadline counts as missed only when a reading shows it).
        </p>
      )}
      {days.map((day) => {
        const rows = log.rows.filter((r) => r.prepDate === day);
        const { weekId, weekName } = rows[0];
        return (
          <section key={day} className="flex flex-col gap-2" aria-labelledby={`log-${day}`}>
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h2 id={`log-${day}`} className="text-xl">
                Prep day {dayLabel(day, true)}
              </h2>
              {weekId !== null ? (
                <Link className="font-bold underline print:no-underline" to={`${paths.bakeRun(weekId)}?prepDate=${day}#cooling-record-title`}>
                  {weekName}: bake run
                </Link>
              ) : (
                <span className="text-ink-soft">Its week was deleted</span>
              )}
            </div>
            <ul className="flex flex-col gap-2">
              {rows.map((r) => (
                <TrayLine key={r.id} row={r} />
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}

/**
 * The kitchen's cooling log (coach and assistant): every tray's cooling record over a stretch of prep days, whatever
 * week it was baked for, with where it ended against the Food Code; to read, print or download as CSV.
 */
export function Component() {
  const [params, setParams] = useSearchParams();
  const me = useMe();
  const scale = useTempScale();
  const today = kitchenToday() as IsoDate;
  const stretch = stretchOf(params.get('from') ?? addDays(today, -(DEFAULT_DAYS - 1)), params.get('to') ?? today);
  const log = useQuery({ ...coolingLogQuery(stretch.from, stretch.to), enabled: stretch.error === null });
  const set = (field: 'from' | 'to', value: string) => {
    const next = new URLSearchParams(params);
    next.set('from', field === 'from' ? value : stretch.from);
    next.set('to', field === 'to' ? value : stretch.to);
    setParams(next, { replace: true });
  };
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Cooling log"
        lead={inReadersScale(
          'Every tray’s cooling record, prep day by prep day, whatever week it was baked for (a deleted week’s too): when it came out, the temperatures written down, and whether it reached 70 °F (21 °C) within 2 hours and 41 °F (5 °C) within 6 (FDA Food Code §3-501.14). Times are the kitchen’s clock. How long to keep a cooling log, and what it must show, is for your local food code and inspector to say.',
          scale,
        )}
      />
      <Card className="print:hidden">
        {/* The fields' tops line up while one says what is wrong under it; the buttons sit on the fields' line otherwise. */}
        <div className={`flex flex-wrap gap-3 ${stretch.error === null ? 'items-end' : 'items-start'}`}>
          <TextField
            label="First prep day"
            type="date"
            value={stretch.from}
            onChange={(e) => set('from', e.target.value)}
            error={stretch.error?.field === 'from' ? stretch.error.words : undefined}
            className="w-48"
          />
          <TextField
            label="Last prep day"
            type="date"
            value={stretch.to}
            onChange={(e) => set('to', e.target.value)}
            error={stretch.error?.field === 'to' ? stretch.error.words : undefined}
            className="w-48"
          />
          {stretch.error === null && (
            <>
              <Button type="button" variant="secondary" onClick={() => window.print()}>
                Print
              </Button>
              <a className={linkButton} href={coolingLogCsvUrl(stretch.from, stretch.to)} download>
                Download CSV
              </a>
            </>
          )}
        </div>
      </Card>
      {stretch.error === null && (
        // On paper: whose log, which days, and when it was printed.
        <p className="hidden print:block">
          {me.workspaceName} · prep days {dayLabel(stretch.from, true)} to {dayLabel(stretch.to, true)} · printed {dayLabel(today, true)}
        </p>
      )}
      {stretch.error === null && (
        <QueryView
          query={log}
          loading={<Skeleton className="h-40 w-full" label="Loading the cooling log" />}
          isEmpty={(l) => l.rows.length === 0}
          empty={
            <EmptyState title="No cooling records for these prep days">
              Trays are written down in the cooling record on a prep day’s bake-run page as they come out of the oven.
            </EmptyState>
          }
        >
          {(l) => <ByPrepDay log={l} />}
        </QueryView>
      )}
    </div>
  );
}
