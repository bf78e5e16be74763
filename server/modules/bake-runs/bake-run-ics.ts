import ical, { ICalAlarmRelatesTo, ICalAlarmType } from 'ical-generator';
import type { BakeRunResult } from '@shared/domain/bake-run-types.js';
import { bothScales, type TempScale } from '@shared/domain/temperature.js';
import { floating } from '../../lib/ics.js';
import { clockText, DEFAULT_CLOCK, type ClockStyle } from '@shared/domain/clock.js';

/**
 * The bake run as an iCalendar file (RFC 5545) made with ical-generator: floating local times (the kitchen clock,
 * no time zone), one event per preheat or set-point change, per cook's hands-on task, per tray in the oven (with
 * a reminder at the planned first check) and per food-safety cooling deadline (FDA Food Code §3-501.14).
 */
export function bakeRunIcs(run: BakeRunResult, meta: { calendarName: string; uidPrefix: string; clock?: ClockStyle; tempScale?: TempScale }): string {
  // Both scales, the reader's first.
  const deg = (f: number | null | undefined) => (f == null ? '' : bothScales(f, meta.tempScale ?? 'F'));
  const cal = ical({ name: meta.calendarName, prodId: { company: 'Trayline', product: 'bake-run', language: 'EN' } });
  const names = new Map(run.trays.map((t) => [t.id, t.name]));
  const add = (uid: string, start: string, end: string, summary: string, description = '') =>
    cal.createEvent({ id: `${meta.uidPrefix}-${uid}@trayline`, start: floating(start), end: floating(end), floating: true, summary, description });

  for (const oven of run.ovens) {
    oven.setPoints.forEach((sp, i) => {
      const what = i === 0 && sp.fromF === undefined ? `Preheat ${oven.name} to ${deg(sp.tempF)}` : `${oven.name}: change to ${deg(sp.tempF)}`;
      add(`oven-${oven.name}-${i}`, sp.changeAt, sp.readyAt === sp.changeAt ? sp.changeAt : sp.readyAt, what);
    });
  }
  for (const t of run.trays) {
    if (t.prep) add(`prep-${t.id}`, t.prep.startAt, t.prep.endAt, `Cook ${t.prep.cook}: prepare ${t.name}`);
    const e = add(
      `bake-${t.id}`,
      t.inAt,
      t.outAt,
      `${t.name} in ${t.oven}, rack ${t.rack}, ${deg(t.tempF)}`,
      `First check and out at the end; pull by ${clockText(t.pullByAt, meta.clock ?? DEFAULT_CLOCK)} at the latest.`,
    );
    e.createAlarm({ type: ICalAlarmType.display, trigger: 0, relatesTo: ICalAlarmRelatesTo.end, description: `Check ${t.name} (${t.oven})` });
  }
  for (const ev of run.events) {
    if (ev.kind !== 'cool-to-70-by' && ev.kind !== 'fridge-41-by') continue;
    const tray = names.get(ev.trayId ?? '') ?? '';
    const what = ev.kind === 'cool-to-70-by' ? `${tray} at ${deg(70)} or below` : `${tray} at ${deg(41)} or below, in the fridge`;
    add(`${ev.kind}-${ev.trayId}`, ev.at, ev.at, what, ev.source ?? '');
  }
  return cal.toString();
}
