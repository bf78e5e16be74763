import type { ReactNode } from 'react';
import type { BakeRunResult } from '@shared/domain/bake-run-types';
import type { RecordedCooling } from '@shared/domain/cooling';
import { Notice } from '@/components/ui/states';
import { BakeRunSheet } from './bake-run-sheet';
import { BakeRunTimeline } from './bake-run-timeline';
import { BakeRunTimers, useRunMinute, type KitchenChange, type MoveStart } from './bake-run-timers';
import { BAND_CLASS, formatTemp, type TempUnit } from './temperature';
import { timeLabel } from '@/lib/dates';
import { inReadersScale } from '@shared/domain/temperature';

/** °F / °C toggle, starting from the person's preference (a local choice, not saved). */
export function UnitToggle({ unit, onChange }: { unit: TempUnit; onChange: (u: TempUnit) => void }) {
  return (
    <div role="group" aria-label="Temperature unit" className="no-print inline-flex rounded-lg border border-line-strong">
      {(['F', 'C'] as const).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={unit === u}
          onClick={() => onChange(u)}
          className={`min-h-11 min-w-14 px-3 font-bold first:rounded-l-lg last:rounded-r-lg ${unit === u ? 'bg-ink text-paper-card' : 'bg-paper-card text-ink'}`}
        >
          °{u}
        </button>
      ))}
    </div>
  );
}

function Legend({ unit }: { unit: TempUnit }) {
  const bands: [1 | 2 | 3 | 4 | 5, string][] = [
    [1, `below ${formatTemp(325, unit)}`],
    [2, `${formatTemp(325, unit)}–${formatTemp(374, unit)}`],
    [3, `${formatTemp(375, unit)}–${formatTemp(399, unit)}`],
    [4, `${formatTemp(400, unit)}–${formatTemp(424, unit)}`],
    [5, `${formatTemp(425, unit)} and up`],
  ];
  return (
    <ul className="flex flex-wrap gap-2 text-xs" aria-label="Temperature bands">
      {bands.map(([b, text]) => (
        <li key={b} className={`rounded px-2 py-1 font-bold ${BAND_CLASS[b]}`}>
          {text}
        </li>
      ))}
    </ul>
  );
}

/** The page's parts, to jump to: a prep day's run is long, most of all on a phone. */
function OnThisPage({ timers, cooling }: { timers: boolean; cooling: boolean }) {
  const parts: [id: string, words: string][] = [];
  if (timers) parts.push(['now-and-next', 'Now and next']);
  if (cooling) parts.push(['cooling-record-title', 'Cooling record']);
  parts.push(['run-timeline', 'Timeline'], ['run-trays', 'Trays'], ['run-sheet', 'Run sheet'], ['run-safety', 'Food safety']);
  return (
    <nav aria-label="On this page" className="no-print">
      <ul className="flex flex-wrap gap-2">
        {parts.map(([id, words]) => (
          <li key={id}>
            <a href={`#${id}`} className="inline-flex min-h-11 items-center rounded-lg border border-line bg-paper-card px-3 font-bold text-ink hover:bg-paper-deep">
              {words}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}

/**
 * A planned bake run: summary, the parts to jump to, timers on prep day, the cooling record (a saved run), the timeline, the trays and the
 * run sheet, the cautions.
 */
export function BakeRunView({
  run,
  unit,
  move,
  kitchen,
  cooling,
  coolingRecord,
}: {
  run: BakeRunResult;
  unit: TempUnit;
  move?: MoveStart;
  kitchen?: KitchenChange;
  /** What the cooling record says so far (the timers follow it). */
  cooling?: readonly RecordedCooling[];
  /** The cooling record's section, shown below the timers. */
  coolingRecord?: ReactNode;
}) {
  const nowMinute = useRunMinute(run);
  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        {[
          ['Start', timeLabel(run.start)],
          ['Last tray out', timeLabel(run.endAt)],
          ['Session', `${run.sessionMinutes} min`],
          ['Lower bound', `${run.lowerBoundMinutes} min (${run.provenOptimal ? 'shortest plan' : `within ${run.gapPct}%`})`],
        ].map(([k, v]) => (
          <div key={k} className="rounded-lg bg-paper-card p-3 shadow-tray">
            <dt className="text-sm text-ink-soft">{k}</dt>
            <dd className="num text-2xl font-bold">{v}</dd>
          </div>
        ))}
      </dl>
      <OnThisPage timers={nowMinute !== null} cooling={coolingRecord !== undefined} />
      {nowMinute !== null && <BakeRunTimers run={run} unit={unit} nowMinute={nowMinute} move={move} kitchen={kitchen} cooling={cooling} />}
      {coolingRecord}
      {/* Not on paper: a long day is wider than the page and would print cut off; the trays and the run sheet carry it all. */}
      <section className="flex flex-col gap-2 print:hidden">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="run-timeline" className="text-xl">
            Timeline
          </h2>
          <Legend unit={unit} />
        </div>
        <BakeRunTimeline run={run} unit={unit} nowMinute={nowMinute} />
      </section>
      <section className="flex flex-col gap-2">
        <h2 id="run-trays" className="text-xl">
          Trays
        </h2>
        {/* On a phone each tray is a card (seven columns do not fit a hand-held screen); wider screens get the table. */}
        <ul className="flex flex-col gap-2 sm:hidden" aria-label="Trays of the run">
          {run.trays.map((t) => (
            <li key={t.id} className="break-inside-avoid rounded-lg border border-line bg-paper-card p-3">
              <p className="font-bold">{t.name}</p>
              <p className="text-sm text-ink-soft">
                {t.oven} · rack {t.rack} · <span className="num">{formatTemp(t.tempF, unit)}</span>
              </p>
              <dl className="num mt-1 grid grid-cols-3 gap-2 text-base">
                <div>
                  <dt className="text-sm text-ink-soft">In</dt>
                  <dd>{timeLabel(t.inAt)}</dd>
                </div>
                <div>
                  <dt className="text-sm text-ink-soft">Check / out</dt>
                  <dd>
                    {timeLabel(t.outAt)} <span className="text-sm text-ink-soft">({t.bakeMinutes} min)</span>
                  </dd>
                </div>
                <div>
                  <dt className="text-sm text-ink-soft">Pull by</dt>
                  <dd>{timeLabel(t.pullByAt)}</dd>
                </div>
              </dl>
            </li>
          ))}
        </ul>
        <div className="hidden overflow-x-auto sm:block" role="region" aria-label="Trays of the run, as a table" tabIndex={0}>
          <table className="w-full text-left text-base">
            <thead className="text-sm text-ink-soft">
              <tr>
                <th className="p-2">Tray</th>
                <th className="p-2">Oven</th>
                <th className="p-2">Rack</th>
                <th className="p-2">Set point</th>
                <th className="p-2">In</th>
                <th className="p-2">Check / out</th>
                <th className="p-2">Pull by</th>
              </tr>
            </thead>
            <tbody>
              {run.trays.map((t) => (
                <tr key={t.id} className="border-t border-line">
                  <td className="p-2 font-bold">{t.name}</td>
                  <td className="p-2">{t.oven}</td>
                  <td className="num p-2">{t.rack}</td>
                  <td className="num whitespace-nowrap p-2">{formatTemp(t.tempF, unit)}</td>
                  <td className="num whitespace-nowrap p-2">{timeLabel(t.inAt)}</td>
                  <td className="num p-2">
                    <span className="whitespace-nowrap">{timeLabel(t.outAt)}</span> <span className="whitespace-nowrap text-sm text-ink-soft">({t.bakeMinutes} min)</span>
                  </td>
                  <td className="num whitespace-nowrap p-2">{timeLabel(t.pullByAt)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
      <section className="flex flex-col gap-2">
        <h2 id="run-sheet" className="text-xl">
          Run sheet
        </h2>
        <BakeRunSheet run={run} unit={unit} nowMinute={nowMinute} />
      </section>
      <div id="run-safety">
        <Notice tone="warn" title="Food safety">
          <ul className="list-disc pl-4">
            {run.cautions.map((c) => (
              <li key={c}>{inReadersScale(c, unit)}</li>
            ))}
          </ul>
        </Notice>
      </div>
    </div>
  );
}
