import type { BakeRunResult } from '@shared/domain/bake-run-types';
import { BAND_CLASS, formatTemp, tempBand, type TempUnit } from './temperature';
import { timeLabel, timeSpanLabel } from '@/lib/dates';
import { addLocalMinutes } from '@shared/domain/bake-run-time';

interface Bar {
  key: string;
  /** Row inside the lane (0 = set points / the cook's tasks, 1… = oven places by rack). */
  row: number;
  from: number;
  to: number;
  label: string;
  title: string;
  className: string;
}

interface Lane {
  key: string;
  name: string;
  rows: number;
  bars: Bar[];
}

/** Lanes: one per oven (set points as thin bars, trays as bars coloured by temperature band) and one per cook. */
export function timelineLanes(run: BakeRunResult, unit: TempUnit): Lane[] {
  const slotOf = (t: BakeRunResult['trays'][number]) => {
    const perRack = Math.max(1, ...run.trays.filter((u) => u.oven === t.oven).map((u) => u.position));
    return (t.rack - 1) * perRack + t.position;
  };
  const ovens: Lane[] = run.ovens.map((o) => ({
    key: `oven-${o.name}`,
    name: o.name,
    rows: 1 + Math.max(0, ...run.trays.filter((t) => t.oven === o.name).map(slotOf)),
    bars: [
      ...o.setPoints
        .filter((sp) => sp.readyMinute > sp.changeMinute)
        .map((sp, i) => ({
          key: `sp-${i}`,
          row: 0,
          from: sp.changeMinute,
          to: sp.readyMinute,
          label: `${i === 0 && sp.fromF === undefined ? 'Preheat' : 'Change'} ${formatTemp(sp.tempF, unit)}`,
          title: `${o.name}: ${i === 0 && sp.fromF === undefined ? 'preheat' : 'change'} to ${formatTemp(sp.tempF, unit)}, ${timeSpanLabel(sp.changeAt, sp.readyAt)}`,
          className: 'border-2 border-dashed border-oven-4 bg-paper-card text-ink',
        })),
      ...run.trays
        .filter((t) => t.oven === o.name)
        .map((t) => ({
          key: t.id,
          row: slotOf(t),
          from: t.inMinute,
          to: t.outMinute,
          label: `${formatTemp(t.tempF, unit)} · ${t.name}`,
          title: `${t.name}: ${timeSpanLabel(t.inAt, t.outAt)}, rack ${t.rack}, ${formatTemp(t.tempF, unit)}`,
          className: BAND_CLASS[tempBand(t.tempF)],
        })),
    ],
  }));
  const cookCount = Math.max(0, ...run.trays.map((t) => t.prep?.cook ?? 0));
  const cooks: Lane[] = Array.from({ length: cookCount }, (_, c) => ({
    key: `cook-${c + 1}`,
    name: `Cook ${c + 1}`,
    rows: 1,
    bars: run.trays
      .filter((t) => t.prep?.cook === c + 1)
      .map((t) => ({
        key: `prep-${t.id}`,
        row: 0,
        from: t.prep!.startMinute,
        to: t.prep!.endMinute,
        label: `Prep ${t.name}`,
        title: `Cook ${c + 1}: prepare ${t.name}, ${timeSpanLabel(t.prep!.startAt, t.prep!.endAt)}`,
        className: 'bg-herb-50 text-ink border border-herb',
      })),
  }));
  return [...ovens, ...cooks];
}

/**
 * The bake run as a timeline: minutes across, a lane per oven and per cook. Each tray bar carries its temperature
 * in words (the colour band only repeats it). Scrolls sideways on a phone; the stacked list below is the phone view.
 */
export function BakeRunTimeline({ run, unit, nowMinute }: { run: BakeRunResult; unit: TempUnit; nowMinute: number | null }) {
  const lanes = timelineLanes(run, unit);
  const firstMinute = Math.min(0, ...lanes.flatMap((l) => l.bars.map((b) => b.from)));
  const span = Math.max(1, run.sessionMinutes - firstMinute);
  const pxPerMin = 9;
  const rowPx = 34;
  const width = span * pxPerMin;
  const x = (m: number) => (m - firstMinute) * pxPerMin;
  const ticks: number[] = [];
  for (let m = Math.ceil(firstMinute / 15) * 15; m <= run.sessionMinutes; m += 15) ticks.push(m);
  const tickLabel = (m: number) => timeLabel(addLocalMinutes(run.start, m));
  return (
    // tabIndex: a phone scrolls the timeline sideways; a keyboard reaches it to scroll it with the arrow keys.
    <figure tabIndex={0} className="overflow-x-auto rounded-tray border border-line bg-paper-card p-3" aria-label="Bake run timeline">
      <div className="flex" style={{ minWidth: width + 110 }}>
        <div className="w-[110px] shrink-0">
          <div className="h-7" />
          {lanes.map((l) => (
            <div key={l.key} className="flex items-start pt-2 pr-2 font-bold" style={{ height: l.rows * rowPx + 8 }}>
              {l.name}
            </div>
          ))}
        </div>
        <div className="relative" style={{ width }}>
          <div className="relative h-7 border-b border-line text-xs text-ink-faint">
            {ticks.map((m) => (
              <span key={m} className="num absolute -translate-x-1/2 whitespace-nowrap" style={{ left: x(m) }}>
                {tickLabel(m)}
              </span>
            ))}
          </div>
          {lanes.map((l) => (
            <div key={l.key} className="relative border-b border-line/60" style={{ height: l.rows * rowPx + 8 }} role="list" aria-label={l.name}>
              {l.bars.map((b) => (
                <div
                  key={b.key}
                  role="listitem"
                  title={b.title}
                  aria-label={b.title}
                  className={`absolute flex items-center overflow-hidden whitespace-nowrap rounded-md px-1.5 text-xs font-bold ${b.className}`}
                  style={{ top: 4 + b.row * rowPx, height: rowPx - 4, left: x(b.from), width: Math.max(4, (b.to - b.from) * pxPerMin - 2) }}
                >
                  {b.label}
                </div>
              ))}
            </div>
          ))}
          {nowMinute !== null && nowMinute >= firstMinute && nowMinute <= run.sessionMinutes && (
            <div className="absolute top-0 bottom-0 w-0.5 bg-signal" style={{ left: x(nowMinute) }} aria-label="Now">
              <span className="absolute -top-0.5 left-1 rounded bg-signal px-1 text-xs font-bold text-white">Now</span>
            </div>
          )}
        </div>
      </div>
    </figure>
  );
}
