/**
 * The bake run: the prep-day oven schedule. Pure: no database, no HTTP, no clock.
 *
 *   planBakeRun(input) → which oven, rack and set point each tray gets, when it goes in and comes out, the
 *   ovens' preheats and changeovers, who preps what, and the food-safety cooling deadlines; plus a lower bound
 *   on the session length and the gap to it.
 *
 * The model a schedule obeys is written out in bake-run-model.ts; the plan space searched and its fixed rules
 * (prep by list scheduling, blocks per set point, strict loading order) in bake-run-simulate.ts; the lower
 * bound and its proof in bake-run-bound.ts; the searches in bake-run-search.ts.
 *
 * "Exact" means: for runs of at most `exactMaxTrays` trays (default 8), a branch and bound finds the shortest
 * session among all plans of that plan space (every tray sequence × every oven per tray), unless its node
 * budget runs out (then `provenOptimal` is false). The lower bound holds for every schedule of the model, so a
 * session equal to it is optimal outright. Larger runs get the heuristic (greedy + local search).
 * Same input → same output: no randomness, no wall-clock budgets, ties broken by tray id and oven order.
 */
import Decimal from 'decimal.js';

import type {
  BakeEvent,
  BakeEventKind,
  BakeOvenPlan,
  BakeRunInput,
  BakeRunResult,
  BakeRunSearchOptions,
  BakeTrayPlan,
  RackPreference,
} from './bake-run-types';
import { BakeRunInputError, DEFAULT_BAKE_RUN_SEARCH, findBakeRunIssues, prepareBakeRun } from './bake-run-model';
import type { PreparedBakeRun } from './bake-run-model';
import { bakeRunLowerBound } from './bake-run-bound';
import type { BakeRunLowerBound } from './bake-run-bound';
import { exactPlan, heuristicPlan, rankById } from './bake-run-search';
import type { SearchOutcome } from './bake-run-search';
import { tracePlan } from './bake-run-simulate';
import type { BakePlan, PlanTrace } from './bake-run-simulate';
import { formatLocalMinutes, parseLocalMinutes } from './bake-run-time';
import { FOOD_CODE_COOLING } from './cooling';

export { FOOD_CODE_COOLING } from './cooling';

export const BAKE_RUN_CAUTIONS: readonly string[] = Object.freeze([
  'Cooling deadlines follow FDA Food Code §3-501.14 (135 °F (57 °C) to 70 °F (21 °C) within 2 hours, to 41 °F (5 °C) within 6 hours in ' +
    'total); the plan starts the clock when the tray comes out, which is earlier than the Food Code requires.',
  'Check doneness at the first check: bake times are common practice, not a standard; where a minimum internal ' +
    'temperature is given (USDA FSIS Safe Minimum Internal Temperatures), check it with a thermometer.',
  'Do not leave perishable food out of refrigeration for more than 2 hours, 1 hour above 90 °F (32 °C) (USDA FSIS).',
  'Follow your local food code and licensed professionals; they take precedence over this plan.',
]);

/** Order of events at the same minute (a tray out before the oven changes, hands-on before the tray goes in). */
export const KIND_ORDER: Record<BakeEventKind, number> = {
  'first-check': 0,
  'tray-out': 1,
  'cooling-start': 2,
  'setpoint-change': 3,
  preheat: 4,
  ready: 5,
  'hands-on-start': 6,
  'tray-in': 7,
  'cool-to-70-by': 8,
  'fridge-41-by': 9,
};

/** Chooses a free place (0-based slot) in an oven according to the tray's rack preference. */
function chooseSlot(free: number[], traysPerRack: number, racks: number, preference: RackPreference): number {
  const rackOf = (slot: number) => Math.floor(slot / traysPerRack) + 1;
  const score = (slot: number): number => {
    const rack = rackOf(slot);
    if (preference === 'lower') return -rack;
    if (preference === 'middle') return Math.abs(2 * rack - (racks + 1));
    return rack;
  };
  let best = free[0];
  for (const slot of free) if (score(slot) < score(best)) best = slot;
  return best;
}

function assignSlots(prep: PreparedBakeRun, trace: PlanTrace): Int32Array {
  const slotOf = new Int32Array(prep.n);
  trace.ovens.forEach(({ seq }, o) => {
    const oven = prep.ovens[o];
    const until = new Array<number>(prep.capacity[o]).fill(-Infinity);
    for (const i of seq) {
      const free = until.map((u, s) => (u <= trace.inT[i] ? s : -1)).filter((s) => s >= 0);
      const slot = chooseSlot(free, oven.traysPerRack, oven.racks, prep.trays[i].rackPreference ?? 'any');
      slotOf[i] = slot;
      until[slot] = trace.outT[i];
    }
  });
  return slotOf;
}

function buildResult(
  input: BakeRunInput,
  prep: PreparedBakeRun,
  plan: BakePlan,
  outcome: SearchOutcome,
  method: 'exact' | 'heuristic',
  lb: BakeRunLowerBound,
): BakeRunResult {
  const base = parseLocalMinutes(input.start)!;
  const at = (minute: number) => formatLocalMinutes(base + minute);
  const trace = tracePlan(prep, plan);
  const slotOf = assignSlots(prep, trace);
  const rank = rankById(prep);
  const events: (BakeEvent & { ovenIndex: number; trayRank: number })[] = [];
  const push = (minute: number, kind: BakeEventKind, o: number, i: number | null, tempF: number | null, extra = {}) =>
    events.push({
      at: at(minute),
      minute,
      kind,
      oven: prep.ovens[o].name,
      trayId: i === null ? null : prep.trays[i].id,
      tempF,
      ...extra,
      ovenIndex: o,
      trayRank: i === null ? -1 : rank[i],
    });

  const ovens: BakeOvenPlan[] = [];
  const setOf = new Float64Array(prep.n);
  trace.ovens.forEach(({ seq, blocks }, o) => {
    const setPoints = blocks.map((block, b) => {
      const tempF = prep.setPoint[o][block.sp];
      let changeMinute = block.changeStart;
      let readyMinute = block.ready;
      const startF = prep.ovens[o].startF;
      if (b === 0 && startF !== undefined) {
        // An oven already on: its first set point is a change from where it is, made at once.
        push(changeMinute, 'setpoint-change', o, null, tempF, { fromF: startF });
      } else if (b === 0) {
        // Preheat just in time: ready when the first tray goes in (never later than the simulated readiness).
        readyMinute = trace.inT[seq[0]];
        changeMinute = readyMinute - prep.preheatSp[o][block.sp];
        push(changeMinute, 'preheat', o, null, tempF);
      } else {
        push(changeMinute, 'setpoint-change', o, null, tempF, { fromF: prep.setPoint[o][blocks[b - 1].sp] });
      }
      push(readyMinute, 'ready', o, null, tempF);
      const trayIds = seq.slice(block.from, block.to).map((i) => prep.trays[i].id);
      for (const i of seq.slice(block.from, block.to)) setOf[i] = tempF;
      return {
        tempF,
        ...(b === 0 && startF !== undefined ? { fromF: startF } : {}),
        changeAt: at(changeMinute),
        changeMinute,
        readyAt: at(readyMinute),
        readyMinute,
        endAt: at(block.end),
        endMinute: block.end,
        trayIds,
      };
    });
    ovens.push({ name: prep.ovens[o].name, setPoints });
  });

  const trays: BakeTrayPlan[] = plan.order.map((i) => {
    const o = plan.ovenOf[i];
    const tray = prep.trays[i];
    const oven = prep.ovens[o];
    const inMinute = trace.inT[i];
    const outMinute = trace.outT[i];
    const tempF = setOf[i];
    const cook = trace.prepTimes.cook[i];
    const spare = prep.needMax[o][i] - prep.need[o][i];
    const pullByMinute = outMinute + Math.floor(spare / trace.lastRate[i] + 1e-9);
    if (cook >= 0)
      push(trace.prepTimes.start[i], 'hands-on-start', o, i, tempF, {
        cook: cook + 1,
        untilAt: at(trace.prepTimes.end[i]),
      });
    push(inMinute, 'tray-in', o, i, tempF);
    push(outMinute, 'first-check', o, i, tempF, tray.minInternalF === undefined ? {} : { internalF: tray.minInternalF });
    push(outMinute, 'tray-out', o, i, tempF);
    const source = FOOD_CODE_COOLING.source;
    push(outMinute, 'cooling-start', o, i, FOOD_CODE_COOLING.startF, { source });
    push(outMinute + FOOD_CODE_COOLING.firstStageMinutes, 'cool-to-70-by', o, i, FOOD_CODE_COOLING.firstStageF, { source });
    push(outMinute + FOOD_CODE_COOLING.totalMinutes, 'fridge-41-by', o, i, FOOD_CODE_COOLING.finalF, { source });
    const slot = slotOf[i];
    return {
      id: tray.id,
      name: tray.name,
      oven: oven.name,
      ovenIndex: o,
      rack: Math.floor(slot / oven.traysPerRack) + 1,
      position: (slot % oven.traysPerRack) + 1,
      tempF,
      inAt: at(inMinute),
      outAt: at(outMinute),
      inMinute,
      outMinute,
      bakeMinutes: outMinute - inMinute,
      minAdjustedMinutes: prep.need[o][i],
      maxAdjustedMinutes: prep.needMax[o][i],
      pullByAt: at(pullByMinute),
      pullByMinute,
      convectionAdjustment: prep.adjustment[o],
      prep:
        cook < 0
          ? null
          : {
              cook: cook + 1,
              startAt: at(trace.prepTimes.start[i]),
              endAt: at(trace.prepTimes.end[i]),
              startMinute: trace.prepTimes.start[i],
              endMinute: trace.prepTimes.end[i],
            },
      waitMinutes: inMinute - trace.prepTimes.end[i],
    };
  });
  trays.sort((a, b) => a.inMinute - b.inMinute || a.ovenIndex - b.ovenIndex || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));

  events.sort(
    (a, b) =>
      a.minute - b.minute ||
      KIND_ORDER[a.kind] - KIND_ORDER[b.kind] ||
      a.ovenIndex - b.ovenIndex ||
      a.trayRank - b.trayRank,
  );
  const session = trace.makespan;
  const gapPct =
    lb.minutes > 0
      ? new Decimal(session).minus(lb.minutes).dividedBy(lb.minutes).times(100).toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber()
      : 0;
  return {
    start: input.start,
    trays,
    events: events.map(({ ovenIndex: _o, trayRank: _t, ...event }) => event),
    ovens,
    sessionMinutes: session,
    endAt: at(session),
    lowerBoundMinutes: lb.minutes,
    lowerBoundParts: lb.parts,
    gapPct,
    method,
    provenOptimal: outcome.provenOptimal || session <= lb.minutes,
    evaluations: outcome.evaluations,
    rules: prep.rules,
    cautions: [...BAKE_RUN_CAUTIONS],
  };
}

/**
 * Plans a bake run. Throws BakeRunInputError (with field paths) when the input cannot be planned; the API
 * validates with `bakeRunInputSchema` first, so this only fires for direct callers.
 */
export function planBakeRun(input: BakeRunInput, options: Partial<BakeRunSearchOptions> = {}): BakeRunResult {
  const issues = findBakeRunIssues(input);
  if (issues.length > 0) throw new BakeRunInputError(issues);
  const search = { ...DEFAULT_BAKE_RUN_SEARCH, ...options };
  const prep = prepareBakeRun(input);
  const lb = bakeRunLowerBound(prep);
  const floor = lb.minutes;
  let outcome: SearchOutcome;
  let method: 'exact' | 'heuristic';
  if (prep.n <= search.exactMaxTrays) {
    const start = heuristicPlan(prep, Math.min(search.heuristicEvaluations, 2_000), floor);
    outcome = exactPlan(prep, start, search.exactNodeLimit, floor);
    method = 'exact';
  } else {
    outcome = heuristicPlan(prep, search.heuristicEvaluations, floor);
    method = 'heuristic';
  }
  return buildResult(input, prep, outcome.plan, outcome, method, lb);
}

/** The session length of a given plan (tray indices in input order), e.g. to compare a hand-made plan. */
export function sessionMinutesOf(input: BakeRunInput, plan: BakePlan): number {
  const issues = findBakeRunIssues(input);
  if (issues.length > 0) throw new BakeRunInputError(issues);
  return tracePlan(prepareBakeRun(input), plan).makespan;
}
