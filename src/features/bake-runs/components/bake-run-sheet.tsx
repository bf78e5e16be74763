import type { BakeEvent, BakeRunResult } from '@shared/domain/bake-run-types';
import { formatTemp, type TempUnit } from './temperature';
import { timeLabel } from '@/lib/dates';

export function describeEvent(e: BakeEvent, trayName: (id: string | null) => string, unit: TempUnit): string {
  const tray = trayName(e.trayId);
  const t = (f: number | null | undefined) => formatTemp(f, unit);
  switch (e.kind) {
    case 'preheat':
      return `Preheat ${e.oven} to ${t(e.tempF)}`;
    case 'setpoint-change':
      return e.fromF === e.tempF ? `${e.oven}: stays at ${t(e.tempF)}` : `${e.oven}: change from ${t(e.fromF)} to ${t(e.tempF)}`;
    case 'ready':
      return `${e.oven} at ${t(e.tempF)}`;
    case 'hands-on-start':
      return `Cook ${e.cook ?? 1}: prepare ${tray}${e.untilAt ? ` (until ${timeLabel(e.untilAt)})` : ''}`;
    case 'tray-in':
      return `${tray} in (${e.oven}, ${t(e.tempF)})`;
    case 'first-check':
      return `Check ${tray}${e.internalF ? `: internal ${t(e.internalF)} or above` : ''}`;
    case 'tray-out':
      return `${tray} out`;
    case 'cooling-start':
      return `${tray}: start cooling`;
    case 'cool-to-70-by':
      return `${tray} at ${t(70)} or below by now`;
    case 'fridge-41-by':
      return `${tray} at ${t(41)} or below, in the fridge, by now`;
    default:
      return e.kind;
  }
}

/** A word for each kind of step (the list never relies on colour or pictures alone). */
const TAG: Partial<Record<BakeEvent['kind'], string>> = {
  preheat: 'HEAT',
  'setpoint-change': 'TEMP',
  'tray-in': 'IN',
  'first-check': 'CHECK',
  'hands-on-start': 'PREP',
  'cool-to-70-by': 'COOL',
  'fridge-41-by': 'FRIDGE',
};

/**
 * The run sheet: every step in time order, large text, stacked (the phone view and the printed sheet).
 * `cooling-start` and `ready` repeat other lines and are left out of the sheet.
 */
export function BakeRunSheet({ run, unit, nowMinute }: { run: BakeRunResult; unit: TempUnit; nowMinute: number | null }) {
  const names = new Map(run.trays.map((t) => [t.id, t.name]));
  const trayName = (id: string | null) => (id ? names.get(id) ?? id : '');
  const events = run.events.filter((e) => e.kind !== 'cooling-start' && e.kind !== 'ready' && e.kind !== 'tray-out');
  return (
    <ol className="flex flex-col divide-y divide-line rounded-tray border border-line bg-paper-card print:border-0" aria-label="Run sheet">
      {events.map((e, i) => {
        const done = nowMinute !== null && e.minute < nowMinute;
        const cold = e.kind === 'cool-to-70-by' || e.kind === 'fridge-41-by';
        return (
          <li key={i} className={`flex break-inside-avoid items-start gap-3 px-3 py-3 text-lg sm:text-base ${done ? 'text-ink-faint' : ''} ${cold ? 'bg-frost-50' : ''}`}>
            {/* On a phone the kind of step sits under its time, leaving the step's words the width of the screen. */}
            <span className="flex w-20 shrink-0 flex-col sm:w-auto sm:flex-row sm:gap-3">
              <span className="num whitespace-nowrap font-bold sm:w-20">{timeLabel(e.at)}</span>
              <span aria-hidden className="text-xs font-bold tracking-wide text-ink-soft sm:w-16 sm:pt-0.5">
                {TAG[e.kind] ?? ''}
              </span>
            </span>
            <span className="flex-1">
              {describeEvent(e, trayName, unit)}
              {cold && e.source && <span className="block text-sm text-ink-soft">{e.source}</span>}
            </span>
            {done && <span className="no-print text-sm">done</span>}
          </li>
        );
      })}
    </ol>
  );
}
