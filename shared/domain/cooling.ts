/**
 * The cooling record of a baked tray: when it really came out of the oven, the food temperatures taken while it
 * cooled, and whether it met the Food Code's two cooling stages in time (FDA Food Code §3-501.14: from 135 °F to
 * 70 °F within 2 hours, and to 41 °F or below within 6 hours in total).
 *
 * The clock starts when the tray comes out (earlier than the Food Code's start at 135 °F: the safe side), or when
 * cooling was started again after a reheat. A stage counts as met by the first reading at or below its limit taken
 * by its deadline; a later reading does not mend a missed stage.
 *
 * What to do when a stage is missed is common practice in kitchens' cooling logs (from memory, no single source):
 * food not at 70 °F within 2 hours is reheated to 165 °F and cooled again from the start, or thrown away; food not at
 * 41 °F within 6 hours is thrown away. The local food code decides; the words say so.
 */
import { clockText, DEFAULT_CLOCK, type ClockStyle } from './clock';
import type { BakeEvent, BakeRunResult } from './bake-run-types';
import { addLocalMinutes, requireLocalMinutes } from './bake-run-time';
import { bothScales, type TempScale } from './temperature';
import { instantOfWall, wallClockIn } from './time-zone';

/** FDA Food Code §3-501.14 (cooling): 135 °F → 70 °F within 2 h, and → 41 °F within 6 h in total. */
export const FOOD_CODE_COOLING = Object.freeze({
  source: 'FDA Food Code §3-501.14 (cooling)',
  startF: 135,
  firstStageF: 70,
  firstStageMinutes: 120,
  finalF: 41,
  totalMinutes: 360,
});

/** A food temperature taken while the tray cooled (probe in the thickest part). */
export interface CoolingReading {
  /** Local "YYYY-MM-DDTHH:mm". */
  at: string;
  /** °F (stored in °F; a reading given in °C is converted). */
  tempF: number;
}

/** What was written down for one tray. */
export interface CoolingEntry {
  /** When it came out of the oven, local "YYYY-MM-DDTHH:mm". */
  outAt: string;
  /** Reheated to 165 °F and cooled again from this time (local), or null. */
  restartedAt: string | null;
  readings: readonly CoolingReading[];
  /** Thrown away. */
  discarded: boolean;
}

export type CoolingState = 'to-70' | 'to-41' | 'cooled' | 'missed-70' | 'missed-41' | 'discarded';

export interface CoolingCheck {
  state: CoolingState;
  /** When the cooling clock started: the time out, or the restart after a reheat. */
  from: string;
  /** 70 °F or below by (local). */
  by70: string;
  /** 41 °F or below by (local). */
  by41: string;
  /** The reading that met each stage in time (local), or null. */
  reached70At: string | null;
  reached41At: string | null;
  /** The kitchen's clock changes (daylight time) between the start and a deadline: the deadlines are real hours. */
  clocksChanged: boolean;
  /** 'ok' while on time or done, 'block' when a stage is missed, 'info' once thrown away. */
  tone: 'ok' | 'block' | 'info';
  /** What to do now, in words (both temperature scales). */
  said: string;
}

const F70 = FOOD_CODE_COOLING.firstStageF;
const F41 = FOOD_CODE_COOLING.finalF;
/** A temperature in both scales, as the record and its e-mails say it: "70 °F (21 °C)" (or °C first). */
export { bothScales };

/** The readings in the order they were taken (a record keeps them as written down). */
export function inTakenOrder<R extends CoolingReading>(readings: readonly R[]): R[] {
  return [...readings].sort((a, b) => (a.at < b.at ? -1 : a.at > b.at ? 1 : 0));
}

/** The readings as the log and the e-mails say them, in the order taken: "14:10 68 °F (20 °C)" (the next day said). */
export function readingsSaid(readings: readonly CoolingReading[], day: string, style: ClockStyle = DEFAULT_CLOCK, first: TempScale = 'F'): string[] {
  return inTakenOrder(readings).map((x) => `${clockFrom(x.at, day, style)} ${bothScales(x.tempF, first)}`);
}

/** Said with the deadlines when the kitchen's clock changes between the start and a deadline. */
export const CLOCKS_CHANGED = 'The clocks change in between: the deadlines are 2 and 6 hours of real time.';

/** What the cooling deadlines count from, in words: "it came out", or "cooling started again" after a reheat. */
export const countedFrom = (entry: { restartedAt?: string | null }) => (entry.restartedAt ? 'cooling started again' : 'it came out');

/** The time of `at` as the workspace writes it, with "the next day" when it falls on a later date than `day`. */
export function clockFrom(at: string, day: string, style: ClockStyle = DEFAULT_CLOCK): string {
  const time = clockText(at, style);
  return at.slice(0, 10) > day.slice(0, 10) ? `${time} the next day` : time;
}

/**
 * Where one tray's cooling stands at `now`: the stage it is in, its deadlines, and what to do. Readings before `from`
 * (before a restart) are kept in the record but not counted.
 *
 * The record is written in the kitchen's wall-clock time. With the kitchen's time zone the deadlines are real hours
 * after the start, read on its wall clock (a tray out at 23:30 on the night the clock falls back must be at 41 °F by
 * 04:30, not 05:30), and `now` may be the instant itself; without one, hours are counted on the calendar reading as
 * if every day had 24 (an hour off only across a daylight-time change, and then on the safe side in spring only).
 */
export function checkCooling(
  entry: CoolingEntry,
  now: string | Date,
  style: ClockStyle = DEFAULT_CLOCK,
  zone: string | null = null,
): CoolingCheck {
  const from = entry.restartedAt ?? entry.outAt;
  // Minutes on one line for every time compared: real minutes in the kitchen's zone, else the calendar reading's.
  const minutesOf = zone ? (local: string) => Math.floor(instantOfWall(local, zone) / 60_000) : requireLocalMinutes;
  const start = minutesOf(from);
  // The deadlines: real minutes after the start's instant, read on the kitchen's wall clock (23:30 + 6 h on the night
  // Chicago falls back is 04:30, not 05:30); else on the calendar reading.
  const after = (minutes: number) => (zone ? wallClockIn(new Date((start + minutes) * 60_000), zone) : addLocalMinutes(from, minutes));
  const by70 = after(FOOD_CODE_COOLING.firstStageMinutes);
  const by41 = after(FOOD_CODE_COOLING.totalMinutes);
  // Each reading's minute read once (in a zone that is the costly part).
  const counted = entry.readings
    .map((r) => ({ at: r.at, tempF: r.tempF, m: minutesOf(r.at) }))
    .filter((r) => r.m >= start)
    .sort((a, b) => a.m - b.m);
  const last = counted.at(-1) ?? null;
  if (typeof now !== 'string' && !zone) throw new RangeError('An instant needs the kitchen’s time zone to be read');
  const nowRead = typeof now === 'string' ? minutesOf(now) : Math.floor(now.getTime() / 60_000);
  // "Now" is at least the latest reading (a device clock behind the thermometer's note does not undo it).
  const nowM = Math.max(nowRead, last ? last.m : -Infinity);
  const m70 = start + FOOD_CODE_COOLING.firstStageMinutes;
  const m41 = start + FOOD_CODE_COOLING.totalMinutes;
  const hit70 = counted.find((r) => r.tempF <= F70);
  const reached70At = hit70 && hit70.m <= m70 ? hit70.at : null;
  const hit41 = reached70At ? counted.find((r) => r.tempF <= F41) : undefined;
  const reached41At = hit41 && hit41.m <= m41 ? hit41.at : null;
  // Across a daylight-time change the wall clock's deadlines are an hour off the calendar's: say why.
  const clocksChanged =
    zone !== null &&
    (by70 !== addLocalMinutes(from, FOOD_CODE_COOLING.firstStageMinutes) || by41 !== addLocalMinutes(from, FOOD_CODE_COOLING.totalMinutes));
  const changed = clocksChanged ? ` ${CLOCKS_CHANGED}` : '';
  const base = { from, by70, by41, reached70At, reached41At, clocksChanged };
  if (entry.discarded) return { ...base, state: 'discarded', tone: 'info', said: 'Thrown away.' };
  if (!reached70At && (nowM > m70 || hit70)) {
    return {
      ...base,
      state: 'missed-70',
      tone: 'block',
      said:
        `Not at ${bothScales(F70)} by ${clockFrom(by70, from, style)}, 2 hours after ${countedFrom(entry)}. ` +
        (entry.restartedAt
          ? 'It has been reheated once already: throw it away'
          : `Reheat it to ${bothScales(165)} and start cooling again, or throw it away`) +
        ' (common practice; your local food code decides).' +
        changed,
    };
  }
  if (!reached70At) {
    return {
      ...base,
      state: 'to-70',
      tone: 'ok',
      said: `Cool to ${bothScales(F70)} or below by ${clockFrom(by70, from, style)}, then to ${bothScales(F41)} or below by ${clockFrom(by41, from, style)}.${changed}`,
    };
  }
  if (reached41At) {
    return {
      ...base,
      state: 'cooled',
      tone: 'ok',
      said: `Cooled in time: ${bothScales(F70)} reached by ${clockFrom(reached70At, from, style)}, ${bothScales(F41)} by ${clockFrom(reached41At, from, style)}.`,
    };
  }
  if (nowM > m41 || hit41) {
    return {
      ...base,
      state: 'missed-41',
      tone: 'block',
      said: `Not at ${bothScales(F41)} by ${clockFrom(by41, from, style)}, 6 hours after ${countedFrom(entry)}: throw it away (common practice; your local food code decides).${changed}`,
    };
  }
  return {
    ...base,
    state: 'to-41',
    tone: 'ok',
    said: `${bothScales(F70)} reached at ${clockFrom(reached70At, from, style)}. Next: ${bothScales(F41)} or below by ${clockFrom(by41, from, style)} (in the fridge).${changed}`,
  };
}

/**
 * Where a record stands on what was written down alone, for a reader that does not look at the clock (the printed
 * run sheet, a kept or thrown-away tray's e-mail, the glance without the kitchen's zone): a deadline counts as missed
 * only when a reading shows it. With the kitchen's zone its deadlines are real hours, as in `checkCooling`.
 */
export function checkOnPaper(entry: CoolingEntry, zone: string | null = null): CoolingCheck {
  return checkCooling(entry, entry.outAt, DEFAULT_CLOCK, zone);
}

/** A tray's record as the run's timers read it: its id in the run and what was written down. */
export interface RecordedCooling extends CoolingEntry {
  runTrayId: string;
}

/**
 * The run's steps with what the cooling record says: a tray written down as out no longer has its check and time out
 * to come, and its cooling deadlines count from when it really came out (or started cooling again); a tray cooled in
 * time or thrown away has no deadline left. Trays without a record keep their planned steps. With the kitchen's time
 * zone the deadlines are read as `checkCooling` reads them (real hours); the steps stay on the run's minute line.
 */
export function eventsWithCooling(
  run: Pick<BakeRunResult, 'start' | 'events'>,
  records: readonly RecordedCooling[],
  now: string | Date,
  zone: string | null = null,
): BakeEvent[] {
  const byTray = new Map(records.map((r) => [r.runTrayId, r]));
  const start = requireLocalMinutes(run.start);
  const gone = new Set<BakeEvent['kind']>(['first-check', 'tray-out', 'cooling-start', 'cool-to-70-by', 'fridge-41-by']);
  const out: BakeEvent[] = run.events.filter((e) => !(e.trayId !== null && byTray.has(e.trayId) && gone.has(e.kind)));
  for (const r of records) {
    const planned = run.events.find((e) => e.trayId === r.runTrayId && e.kind === 'cool-to-70-by');
    if (!planned) continue;
    const check = checkCooling(r, now, DEFAULT_CLOCK, zone);
    const source = FOOD_CODE_COOLING.source;
    const push = (kind: BakeEvent['kind'], at: string, tempF: number) =>
      out.push({ at, minute: requireLocalMinutes(at) - start, kind, oven: planned.oven, trayId: r.runTrayId, tempF, source });
    if (check.state === 'to-70' || check.state === 'missed-70') push('cool-to-70-by', check.by70, F70);
    if (check.state === 'to-70' || check.state === 'to-41' || check.state === 'missed-41') push('fridge-41-by', check.by41, F41);
  }
  // A stable sort: the deadlines added go after the planned steps of the same minute (their kinds come last anyway).
  return out.sort((a, b) => a.minute - b.minute);
}

/**
 * How long after a tray's planned time out the cooling record asks for it (common practice, no source: a check can
 * keep a tray in a few minutes longer than planned).
 */
export const WRITE_DOWN_AFTER_MINUTES = 5;

/**
 * The trays the plan had out at least `after` minutes before `nowMinute` (minutes from the run's start) that the
 * cooling record does not have yet, by planned time out: still in the oven, or out and not written down (their
 * cooling deadlines then run from the planned time, which may be later than the real one).
 */
export function notWrittenDown<T extends { id: string; outMinute: number }>(
  trays: readonly T[],
  records: readonly { runTrayId: string }[],
  nowMinute: number,
  after = WRITE_DOWN_AFTER_MINUTES,
): T[] {
  const written = new Set(records.map((r) => r.runTrayId));
  return trays
    .filter((t) => !written.has(t.id) && nowMinute - t.outMinute >= after)
    .sort((a, b) => a.outMinute - b.outMinute || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** Where a tray's cooling ended (or stands), as the cooling log says it in one line. */
export function coolingResult(c: CoolingCheck, style: ClockStyle = DEFAULT_CLOCK): string {
  switch (c.state) {
    case 'cooled':
      return 'Cooled in time';
    case 'missed-70':
      return `Missed: not at ${bothScales(F70)} by ${clockFrom(c.by70, c.from, style)}`;
    case 'missed-41':
      return `Missed: not at ${bothScales(F41)} by ${clockFrom(c.by41, c.from, style)}`;
    case 'discarded':
      return 'Thrown away';
    // Within its deadlines, or judged on its readings alone (the kitchen's time unknown): what is true either way.
    case 'to-70':
      return `No reading at ${bothScales(F70)} yet (due by ${clockFrom(c.by70, c.from, style)})`;
    default:
      return `${bothScales(F70)} reached; no reading at ${bothScales(F41)} yet (due by ${clockFrom(c.by41, c.from, style)})`;
  }
}
