import { useEffect, useRef, useState } from 'react';
import type { BakeRunResult } from '@shared/domain/bake-run-types';
import { describeEvent } from './bake-run-sheet';
import { localMinutes, nowLocalMinutes, type TempUnit } from './temperature';

/** Minutes since the run's start on the device clock, or null when today is not the run's day. Ticks every 15 s. */
export function useRunMinute(run: BakeRunResult | null): number | null {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const id = window.setInterval(() => setNow(new Date()), 15_000);
    return () => window.clearInterval(id);
  }, []);
  if (!run) return null;
  const minute = nowLocalMinutes(now) - localMinutes(run.start);
  const today = `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
  return today === run.start.slice(0, 10) ? minute : null;
}

function beep() {
  try {
    const ctx = new AudioContext();
    const osc = ctx.createOscillator();
    osc.frequency.value = 880;
    osc.connect(ctx.destination);
    osc.start();
    osc.stop(ctx.currentTime + 0.4);
  } catch {
    // no audio on this device: the words on screen remain
  }
}

const TIMED = new Set(['preheat', 'setpoint-change', 'tray-in', 'first-check']);

/** On prep day: the next steps with a countdown (check and out times first), optional sound when one is due. */
export function BakeRunTimers({ run, unit, nowMinute }: { run: BakeRunResult; unit: TempUnit; nowMinute: number }) {
  const [sound, setSound] = useState(false);
  const rung = useRef(new Set<string>());
  const names = new Map(run.trays.map((t) => [t.id, t.name]));
  const trayName = (id: string | null) => (id ? names.get(id) ?? id : '');
  const upcoming = run.events.filter((e) => TIMED.has(e.kind) && e.minute >= nowMinute - 2).slice(0, 4);
  useEffect(() => {
    if (!sound) return;
    for (const e of run.events) {
      const key = `${e.kind}-${e.trayId}-${e.minute}`;
      if (e.kind === 'first-check' && e.minute === nowMinute && !rung.current.has(key)) {
        rung.current.add(key);
        beep();
      }
    }
  }, [sound, nowMinute, run.events]);
  return (
    <section aria-label="Timers" className="no-print flex flex-col gap-2 rounded-tray border-2 border-oven-4 bg-paper-card p-4" aria-live="polite">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-xl">Now and next</h2>
        <label className="flex min-h-11 items-center gap-2 text-base">
          <input type="checkbox" className="h-5 w-5" checked={sound} onChange={(e) => setSound(e.target.checked)} /> Sound at check times
        </label>
      </div>
      {upcoming.length === 0 ? (
        <p className="text-lg">Every step of this run is done.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {upcoming.map((e, i) => {
            const left = e.minute - nowMinute;
            return (
              <li key={i} className={`flex items-baseline gap-3 text-xl ${left <= 0 ? 'font-bold text-signal-700' : ''}`}>
                <span className="num w-28 shrink-0">{left > 0 ? `in ${left} min` : left === 0 ? '⏰ now' : `⚠ ${-left} min ago`}</span>
                <span>{describeEvent(e, trayName, unit)}</span>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
