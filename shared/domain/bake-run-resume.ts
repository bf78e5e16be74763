import Decimal from 'decimal.js';
import type { BakeEvent, BakeOvenPlan, BakeRunResult, BakeRunRules, BakeTrayPlan } from './bake-run-types.js';
import { BAKE_RUN_CAUTIONS, KIND_ORDER } from './bake-run.js';
import { addLocalMinutes, requireLocalMinutes } from './bake-run-time.js';
import { clockText, DEFAULT_CLOCK, type ClockStyle } from './clock.js';
import { bothScales } from './temperature.js';

/**
 * A run planned again part-way through prep day (an oven failed at ten, a cook went home): the trays already out of
 * the oven are kept as they were planned (their times, oven and rack, and their cooling deadlines, which still run),
 * and only the trays still to bake are planned, from the time the kitchen gives.
 */
export interface BakeRunDone {
  /** When the rest is planned from, local "YYYY-MM-DDTHH:mm". */
  from: string;
  /** The trays already out, as planned before (local times are what count; their minutes are re-counted). */
  trays: BakeTrayPlan[];
  /** Those trays' own steps: hands-on, in, check, out and the cooling deadlines. */
  events: BakeEvent[];
  /** The ovens on at `from` (by name, °F, `ovensAt`): the rest starts them there instead of preheating them. */
  ovenF?: Record<string, number>;
}

/**
 * The ovens of a plan that are on at local time `at`, with their temperature then (°F): at a set point (ready, up to
 * the last tray of it, or waiting between two set points at the earlier one), or part-way through a preheat or a
 * change, where the temperature is read off the same straight line the plan drew (from the earlier set point, the
 * temperature the oven was on at, or the kitchen's `ambientF` for a preheat, to the new one between its change and
 * ready times), rounded to a whole degree. An oven done with its last set point is left out (switched off or
 * cooling: the rest plans it from the kitchen's temperature).
 */
export function ovensAt(run: Pick<BakeRunResult, 'ovens'>, at: string, ambientF = 70): Record<string, number> {
  const out: Record<string, number> = {};
  for (const o of run.ovens) {
    o.setPoints.forEach((sp, k) => {
      const before = k === 0 ? sp.fromF ?? ambientF : o.setPoints[k - 1].tempF;
      const next = o.setPoints[k + 1];
      // Minutes from `at` to each of the set point's times (negative: already past).
      const [change, ready, end] = [sp.changeAt, sp.readyAt, sp.endAt].map((t) => minutesBetween(at, t));
      const nextChange = next ? minutesBetween(at, next.changeAt) : null;
      if (ready <= 0 && (end >= 0 || (nextChange !== null && nextChange > 0))) out[o.name] = sp.tempF;
      else if (change <= 0 && ready > 0) {
        // Part of the way from `before` to the set point, as far along as the time is.
        const part = new Decimal(-change).dividedBy(ready - change);
        out[o.name] = new Decimal(sp.tempF).minus(before).times(part).plus(before).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber();
      }
    });
  }
  return out;
}

/** The trays `ids` of a run with their own steps, to keep when the rest is planned again. */
export function takeDone(run: Pick<BakeRunResult, 'trays' | 'events'>, ids: readonly string[]): Pick<BakeRunDone, 'trays' | 'events'> {
  const wanted = new Set(ids);
  return {
    trays: run.trays.filter((t) => wanted.has(t.id)),
    events: run.events.filter((e) => e.trayId !== null && wanted.has(e.trayId)),
  };
}

/**
 * A kept tray that came out at another time than planned (`outAt`, local): its time out, its check and its cooling
 * steps move with it, so the cooling deadlines count from when it really came out (FDA Food Code §3-501.14: 2 h to
 * 70 °F, 6 h in all to 41 °F); its prep and its time in stay.
 */
export function movedOut(done: Pick<BakeRunDone, 'trays' | 'events'>, id: string, outAt: string): Pick<BakeRunDone, 'trays' | 'events'> {
  const tray = done.trays.find((t) => t.id === id);
  if (!tray) return done;
  const delta = minutesBetween(tray.outAt, outAt);
  if (delta === 0) return done;
  const moves = new Set<BakeEvent['kind']>(['first-check', 'tray-out', 'cooling-start', 'cool-to-70-by', 'fridge-41-by']);
  return {
    trays: done.trays.map((t) =>
      t.id === id ? { ...t, outAt, outMinute: t.outMinute + delta, bakeMinutes: t.bakeMinutes + delta } : t,
    ),
    events: done.events.map((e) =>
      e.trayId === id && moves.has(e.kind) ? { ...e, at: addLocalMinutes(e.at, delta), minute: e.minute + delta } : e,
    ),
  };
}

/** Whole minutes from one local reading to another. */
export function minutesBetween(from: string, to: string): number {
  return requireLocalMinutes(to) - requireLocalMinutes(from);
}

function retimeTray(t: BakeTrayPlan, start: string, ovenIndex: number): BakeTrayPlan {
  const m = (at: string) => minutesBetween(start, at);
  return {
    ...t,
    ovenIndex,
    inMinute: m(t.inAt),
    outMinute: m(t.outAt),
    pullByMinute: m(t.pullByAt),
    prep: t.prep && { ...t.prep, startMinute: m(t.prep.startAt), endMinute: m(t.prep.endAt) },
  };
}

function retimeOven(o: BakeOvenPlan, start: string): BakeOvenPlan {
  const m = (at: string) => minutesBetween(start, at);
  return {
    ...o,
    setPoints: o.setPoints.map((sp) => ({ ...sp, changeMinute: m(sp.changeAt), readyMinute: m(sp.readyAt), endMinute: m(sp.endAt) })),
  };
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function hotSaid(ovenF: Record<string, number> | undefined): string {
  const hot = Object.entries(ovenF ?? {});
  if (hot.length === 0) return 'each oven from cold (one still hot is ready sooner)';
  const names = hot.map(([name, f]) => `${name} from ${bothScales(f)}`).join(', ');
  return `${names} (on at that time), any other oven from cold`;
}

/**
 * The day's run as one plan again: the trays already out (as planned) and the rest (planned from `done.from`, or
 * null when nothing is left to bake), every minute counted from the day's `start`. Ovens that baked only kept trays
 * (an oven that has since failed) keep a lane with no set points. The lower bound is the rest's, from `done.from`.
 */
export function resumeRun(
  start: string,
  done: BakeRunDone,
  rest: BakeRunResult | null,
  rules: BakeRunRules,
  style: ClockStyle = DEFAULT_CLOCK,
): BakeRunResult {
  const ovens = (rest?.ovens ?? []).map((o) => retimeOven(o, start));
  for (const t of done.trays) if (!ovens.some((o) => o.name === t.oven)) ovens.push({ name: t.oven, setPoints: [] });
  const ovenIndex = new Map(ovens.map((o, i) => [o.name, i]));
  const trays = [...done.trays, ...(rest?.trays ?? [])]
    .map((t) => retimeTray(t, start, ovenIndex.get(t.oven) ?? 0))
    .sort((a, b) => a.inMinute - b.inMinute || a.ovenIndex - b.ovenIndex || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const events = [...done.events, ...(rest?.events ?? [])]
    .map((e) => ({ ...e, minute: minutesBetween(start, e.at) }))
    .sort((a, b) => a.minute - b.minute || KIND_ORDER[a.kind] - KIND_ORDER[b.kind]);
  const session = Math.max(0, ...trays.map((t) => t.outMinute));
  const offset = minutesBetween(start, done.from);
  const bound = rest ? offset + rest.lowerBoundMinutes : session;
  const gapPct =
    bound > 0 ? new Decimal(session).minus(bound).dividedBy(bound).times(100).toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber() : 0;
  const kept = plural(done.trays.length, 'tray already out is', 'trays already out are');
  const said = rest
    ? `Planned again from ${clockText(done.from, style)}: ${kept} kept as planned (their cooling deadlines still run); ` +
      `${plural(rest.trays.length, 'tray is', 'trays are')} planned from then, ${hotSaid(done.ovenF)}.`
    : `Every tray is out of the oven: ${kept} kept as planned (their cooling deadlines still run).`;
  return {
    start,
    trays,
    events,
    ovens,
    sessionMinutes: session,
    endAt: addLocalMinutes(start, session),
    lowerBoundMinutes: bound,
    lowerBoundParts: rest ? rest.lowerBoundParts : [],
    gapPct: Math.max(0, gapPct),
    method: rest ? rest.method : 'exact',
    provenOptimal: rest ? rest.provenOptimal : false,
    evaluations: rest ? rest.evaluations : 0,
    rules: rest ? rest.rules : rules,
    cautions: [said, ...(rest ? rest.cautions : BAKE_RUN_CAUTIONS)],
  };
}
