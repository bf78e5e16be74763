/**
 * The bake-run model: rule defaults, input checks shared with the zod schema, and the "prepared" numeric tables
 * the simulator and the searches read (one pass with decimal.js over the input, numbers afterwards).
 *
 * Model (every schedule Trayline produces satisfies it; the tests check each point on the output):
 * - Time is counted in whole minutes from the start. Cooks start hands-on prep at minute 0 at the earliest; each
 *   cook does one task at a time; a tray goes in only after its prep is done (a tray with 0 hands-on minutes is
 *   ready at minute 0).
 * - An oven starts at ambient temperature. Reaching set point S takes ceil((S − ambient) / heatFPerMin) minutes;
 *   changing from S1 to S2 takes ceil(|S2 − S1| / rate) minutes with the heating rate going up and the cooling rate
 *   going down. A set point change starts only when the oven is empty, and trays go in only when it is ready.
 * - Tray i fits oven o at set point S when |S − adj(i, o)| ≤ tolerance(i) and S ≤ maxF(o), where adj is the tray's
 *   temperature lowered by `convectionDeltaF` in a convection oven in 'temperature' mode (unchanged otherwise).
 * - Progress: while k trays are in an oven, each gains 1 / (1 + c·(k − 1)) "uncrowded minutes" per minute
 *   (c = crowdingPerExtraTray). A tray needs minMinutes × (convectionTimeFactor in a convection oven in 'time'
 *   mode, else 1) of progress and is pulled at the first whole minute it has it (the first check).
 * - At most racks × traysPerRack trays are in an oven at any minute (a tray pulled at minute t frees its place
 *   for a tray going in at minute t).
 */
import Decimal from 'decimal.js';

import type { BakeOven, BakeRunInput, BakeRunRules, BakeRunSearchOptions, BakeTray } from './bake-run-types';
import { parseLocalMinutes } from './bake-run-time';

export const DEFAULT_BAKE_RUN_RULES: Readonly<BakeRunRules> = Object.freeze({
  // +10 % time for each tray beyond the first while they overlap: heuristic, unsourced (reference §8).
  crowdingPerExtraTray: 0.1,
  convectionMode: 'temperature',
  // "Lower the set temperature by about 25 °F, or cut time by about 25 %": consumer/extension practice (ref. §8).
  convectionDeltaF: 25,
  convectionTimeFactor: 0.75,
  // ±10 °F: common practice, no source.
  defaultToleranceF: 10,
});

export const DEFAULT_BAKE_RUN_SEARCH: Readonly<BakeRunSearchOptions> = Object.freeze({
  exactMaxTrays: 8,
  exactNodeLimit: 400_000,
  heuristicEvaluations: 50_000,
});

/** Progress comparisons tolerate this much floating-point error (progress is in minutes). */
export const PROGRESS_EPS = 1e-9;

export function resolveBakeRunRules(rules?: Partial<BakeRunRules>): BakeRunRules {
  const out: BakeRunRules = { ...DEFAULT_BAKE_RUN_RULES };
  if (rules) {
    for (const key of Object.keys(out) as (keyof BakeRunRules)[]) {
      const value = rules[key];
      if (value !== undefined) (out as unknown as Record<string, unknown>)[key] = value;
    }
  }
  return out;
}

export type ConvectionAdjustment = 'none' | 'temperature' | 'time';

export function convectionAdjustment(oven: Pick<BakeOven, 'convection'>, rules: BakeRunRules): ConvectionAdjustment {
  return oven.convection ? rules.convectionMode : 'none';
}

/** The temperature the tray asks of this oven: lowered in a convection oven in 'temperature' mode. */
export function adjustedTempF(tray: Pick<BakeTray, 'tempF'>, oven: Pick<BakeOven, 'convection'>, rules: BakeRunRules): Decimal {
  const t = new Decimal(tray.tempF);
  return convectionAdjustment(oven, rules) === 'temperature' ? t.minus(rules.convectionDeltaF) : t;
}

export function trayToleranceF(tray: Pick<BakeTray, 'toleranceF'>, rules: BakeRunRules): number {
  return tray.toleranceF ?? rules.defaultToleranceF;
}

/** A tray fits an oven when the lowest set point within its tolerance is at most the oven's maximum. */
export function trayFitsOven(
  tray: Pick<BakeTray, 'tempF' | 'toleranceF'>,
  oven: Pick<BakeOven, 'convection' | 'maxF'>,
  rules: BakeRunRules,
): boolean {
  return adjustedTempF(tray, oven, rules).minus(trayToleranceF(tray, rules)).lte(oven.maxF);
}

export interface BakeRunIssue {
  path: (string | number)[];
  message: string;
}

function positive(value: number): boolean {
  return Number.isFinite(value) && value > 0;
}

/**
 * The rules that look across fields (unique oven names and tray ids; every tray fits some oven). Fields that are
 * themselves invalid are skipped here, so a schema can run this next to its own field checks.
 */
export function findBakeRunCrossIssues(input: BakeRunInput): BakeRunIssue[] {
  const issues: BakeRunIssue[] = [];
  const rules = resolveBakeRunRules(input.rules);
  const ovenNames = new Set<string>();
  input.ovens.forEach((oven, o) => {
    if (ovenNames.has(oven.name)) issues.push({ path: ['ovens', o, 'name'], message: 'Oven names must be unique.' });
    ovenNames.add(oven.name);
  });
  const ovens = input.ovens.filter((oven) => positive(oven.maxF));
  const ids = new Set<string>();
  input.trays.forEach((tray, i) => {
    if (ids.has(tray.id)) issues.push({ path: ['trays', i, 'id'], message: 'Tray ids must be unique.' });
    ids.add(tray.id);
    const tolerance = tray.toleranceF ?? rules.defaultToleranceF;
    if (!Number.isFinite(tray.tempF) || !(tolerance >= 0) || ovens.length === 0) return;
    if (!Number.isFinite(rules.convectionDeltaF)) return;
    if (!ovens.some((oven) => trayFitsOven(tray, oven, rules)))
      issues.push({ path: ['trays', i, 'tempF'], message: "This tray is hotter than every oven's maximum." });
  });
  return issues;
}

/**
 * Every reason the input cannot be planned, with field paths (the zod schema checks the same field rules and
 * calls findBakeRunCrossIssues; the scheduler calls this so it is safe when used directly).
 */
export function findBakeRunIssues(input: BakeRunInput): BakeRunIssue[] {
  const issues: BakeRunIssue[] = [];
  const rules = resolveBakeRunRules(input.rules);
  const add = (path: (string | number)[], message: string) => issues.push({ path, message });
  if (parseLocalMinutes(input.start) === null) add(['start'], 'Start must be a local date-time "YYYY-MM-DDTHH:mm".');
  if (!Number.isInteger(input.cooks) || input.cooks < 1) add(['cooks'], 'At least one cook (a whole number).');
  if (!Number.isFinite(input.ambientF)) add(['ambientF'], 'Ambient temperature must be a number.');
  if (!(rules.crowdingPerExtraTray >= 0)) add(['rules', 'crowdingPerExtraTray'], 'Crowding must be 0 or more.');
  if (!(rules.convectionTimeFactor > 0 && rules.convectionTimeFactor <= 1))
    add(['rules', 'convectionTimeFactor'], 'Convection time factor must be above 0 and at most 1.');
  if (!(rules.convectionDeltaF >= 0)) add(['rules', 'convectionDeltaF'], 'Convection offset must be 0 or more.');
  if (!(rules.defaultToleranceF >= 0)) add(['rules', 'defaultToleranceF'], 'Tolerance must be 0 or more.');
  if (input.ovens.length === 0) add(['ovens'], 'At least one oven.');
  input.ovens.forEach((oven, o) => {
    for (const key of ['racks', 'traysPerRack'] as const)
      if (!Number.isInteger(oven[key]) || oven[key] < 1) add(['ovens', o, key], 'Must be a whole number of at least 1.');
    for (const key of ['heatFPerMin', 'coolFPerMin', 'maxF'] as const)
      if (!positive(oven[key])) add(['ovens', o, key], 'Must be more than 0.');
    if (oven.startF !== undefined && !(Number.isFinite(oven.startF) && oven.startF >= 0 && oven.startF <= oven.maxF))
      add(['ovens', o, 'startF'], 'The oven cannot start above its maximum (or below 0 °F).');
  });
  if (input.trays.length === 0) add(['trays'], 'At least one tray.');
  input.trays.forEach((tray, i) => {
    if (!positive(tray.minMinutes)) add(['trays', i, 'minMinutes'], 'Minutes must be more than 0.');
    if (!positive(tray.maxMinutes)) add(['trays', i, 'maxMinutes'], 'Minutes must be more than 0.');
    else if (tray.maxMinutes < tray.minMinutes)
      add(['trays', i, 'maxMinutes'], 'The maximum bake time is below the minimum.');
    if (!Number.isInteger(tray.handsOnMinutes) || tray.handsOnMinutes < 0)
      add(['trays', i, 'handsOnMinutes'], 'Hands-on minutes must be a whole number, 0 or more.');
    if (tray.toleranceF !== undefined && !(tray.toleranceF >= 0))
      add(['trays', i, 'toleranceF'], 'Tolerance must be 0 or more.');
    if (!Number.isFinite(tray.tempF)) add(['trays', i, 'tempF'], 'Temperature must be a number.');
  });
  issues.push(...findBakeRunCrossIssues(input));
  return issues;
}

export class BakeRunInputError extends Error {
  readonly issues: BakeRunIssue[];
  constructor(issues: BakeRunIssue[]) {
    super(`Bake run input is not valid: ${issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
    this.name = 'BakeRunInputError';
    this.issues = issues;
  }
}

/** ceil(a / b) for decimal inputs; exact (decimal.js) whenever the quotient is close to a whole number. */
export function ceilQuotient(numerator: number, denominator: number): number {
  const q = numerator / denominator;
  const r = Math.round(q);
  if (Math.abs(q - r) < 1e-6) return new Decimal(numerator).dividedBy(denominator).ceil().toNumber();
  return Math.ceil(q);
}

/** Minutes to move an oven from `fromF` to `toF` (heating rate up, cooling rate down). */
export function changeoverMinutes(fromF: number, toF: number, oven: Pick<BakeOven, 'heatFPerMin' | 'coolFPerMin'>): number {
  if (toF === fromF) return 0;
  const delta = new Decimal(toF).minus(fromF);
  return delta.gt(0)
    ? ceilQuotient(delta.toNumber(), oven.heatFPerMin)
    : ceilQuotient(delta.negated().toNumber(), oven.coolFPerMin);
}

/** Minutes to preheat from ambient to `toF` (0 when the set point is not above ambient). */
export function preheatMinutes(ambientF: number, toF: number, oven: Pick<BakeOven, 'heatFPerMin'>): number {
  return toF > ambientF ? changeoverMinutes(ambientF, toF, { heatFPerMin: oven.heatFPerMin, coolFPerMin: 1 }) : 0;
}

/**
 * Minutes before an oven can first be at `toF`: preheated from the kitchen's temperature, or, for an oven already
 * on at `startF`, changed from there (heating or cooling).
 */
export function firstSetPointMinutes(ambientF: number, toF: number, oven: Pick<BakeOven, 'heatFPerMin' | 'coolFPerMin' | 'startF'>): number {
  return oven.startF === undefined ? preheatMinutes(ambientF, toF, oven) : changeoverMinutes(oven.startF, toF, oven);
}

/**
 * Minutes before an oven can first be at a set point in [lowF, highF] (a tray's window): the preheat to its low
 * edge from the kitchen's temperature, or, for an oven already on at `startF`, the change to the nearer edge.
 */
export function firstWindowMinutes(ambientF: number, lowF: number, highF: number, oven: Pick<BakeOven, 'heatFPerMin' | 'coolFPerMin' | 'startF'>): number {
  if (oven.startF === undefined) return preheatMinutes(ambientF, lowF, oven);
  if (oven.startF < lowF) return changeoverMinutes(oven.startF, lowF, oven);
  if (oven.startF > highF) return changeoverMinutes(oven.startF, highF, oven);
  return 0;
}

/** Crowding multiplier for k trays in an oven: 1 + c·(k − 1). */
export function crowdingFactor(k: number, rules: Pick<BakeRunRules, 'crowdingPerExtraTray'>): number {
  return new Decimal(rules.crowdingPerExtraTray).times(k - 1).plus(1).toNumber();
}

/**
 * Numeric tables for one run. Per oven o the distinct block set points are numbered 0..K−1: a block opened by
 * tray i is set at `setPoint[o][spOf[o][i]]` = min(adj(i, o), maxF(o)).
 */
export interface PreparedBakeRun {
  n: number;
  m: number;
  cooks: number;
  ambientF: number;
  rules: BakeRunRules;
  trays: BakeTray[];
  ovens: BakeOven[];
  handsOn: Int32Array;
  capacity: Int32Array;
  /** fits[o][i] = 1 when tray i can bake in oven o. */
  fits: Uint8Array[];
  /** Tolerance window of tray i in oven o (set points allowed). */
  lo: Float64Array[];
  hi: Float64Array[];
  /** Progress (uncrowded minutes) tray i needs in oven o, for its minimum and maximum time. */
  need: Float64Array[];
  needMax: Float64Array[];
  /** ceil(need): no tray can be out sooner than this many minutes after going in. */
  minWall: Int32Array[];
  /** Minutes from ambient to the lowest set point tray i accepts in oven o (for lower bounds). */
  preheatLow: Int32Array[];
  /** Distinct block set points per oven, the set point class of each tray, and tables over classes. */
  setPoint: Float64Array[];
  spOf: Int32Array[];
  /** preheatSp[o][a]: ambient (or the oven's `startF`) → class a; changeSp[o][a·K + b]: class a → class b. */
  preheatSp: Int32Array[];
  changeSp: Int32Array[];
  /** joinsSp[o][a·n + i] = 1 when tray i can bake at set point class a. */
  joinsSp: Uint8Array[];
  /** inv[o][k] = 1 / (1 + c·(k − 1)) for k = 1..capacity (index 0 unused). */
  inv: Float64Array[];
  adjustment: ConvectionAdjustment[];
  /** Trays (ovens) with the same class number are interchangeable for timing. */
  trayClass: Int32Array;
  ovenClass: Int32Array;
}

function classIds(keys: string[]): Int32Array {
  const seen = new Map<string, number>();
  return Int32Array.from(keys, (k) => {
    if (!seen.has(k)) seen.set(k, seen.size);
    return seen.get(k)!;
  });
}

export function prepareBakeRun(input: BakeRunInput): PreparedBakeRun {
  const rules = resolveBakeRunRules(input.rules);
  const { trays, ovens, ambientF } = input;
  const n = trays.length;
  const m = ovens.length;
  const fits: Uint8Array[] = [];
  const lo: Float64Array[] = [];
  const hi: Float64Array[] = [];
  const need: Float64Array[] = [];
  const needMax: Float64Array[] = [];
  const minWall: Int32Array[] = [];
  const preheatLow: Int32Array[] = [];
  const setPoint: Float64Array[] = [];
  const spOf: Int32Array[] = [];
  const preheatSp: Int32Array[] = [];
  const changeSp: Int32Array[] = [];
  const joinsSp: Uint8Array[] = [];
  const inv: Float64Array[] = [];
  const capacity = Int32Array.from(ovens, (o) => o.racks * o.traysPerRack);
  const adjustment = ovens.map((o) => convectionAdjustment(o, rules));
  ovens.forEach((oven, o) => {
    const f = new Uint8Array(n);
    const l = new Float64Array(n);
    const h = new Float64Array(n);
    const nd = new Float64Array(n);
    const ndMax = new Float64Array(n);
    const wall = new Int32Array(n);
    const pLow = new Int32Array(n);
    const sp = new Int32Array(n);
    const points: number[] = [];
    const timeFactor = adjustment[o] === 'time' ? new Decimal(rules.convectionTimeFactor) : new Decimal(1);
    trays.forEach((tray, i) => {
      const adj = adjustedTempF(tray, oven, rules);
      const tol = trayToleranceF(tray, rules);
      const low = adj.minus(tol);
      f[i] = low.lte(oven.maxF) ? 1 : 0;
      l[i] = low.toNumber();
      h[i] = adj.plus(tol).toNumber();
      const needMin = timeFactor.times(tray.minMinutes);
      nd[i] = needMin.toNumber();
      ndMax[i] = timeFactor.times(tray.maxMinutes).toNumber();
      wall[i] = needMin.ceil().toNumber();
      pLow[i] = firstWindowMinutes(ambientF, Math.min(l[i], oven.maxF), Math.min(h[i], oven.maxF), oven);
      const point = Decimal.min(adj, oven.maxF).toNumber();
      let idx = points.indexOf(point);
      if (idx < 0) idx = points.push(point) - 1;
      sp[i] = idx;
    });
    const k = points.length;
    const pre = Int32Array.from(points, (p) => firstSetPointMinutes(ambientF, p, oven));
    const change = new Int32Array(k * k);
    for (let a = 0; a < k; a++)
      for (let b = 0; b < k; b++) change[a * k + b] = changeoverMinutes(points[a], points[b], oven);
    const joins = new Uint8Array(k * n);
    for (let a = 0; a < k; a++)
      for (let i = 0; i < n; i++) joins[a * n + i] = f[i] && l[i] <= points[a] && points[a] <= h[i] ? 1 : 0;
    const rate = new Float64Array(capacity[o] + 1);
    for (let c = 1; c <= capacity[o]; c++) rate[c] = 1 / crowdingFactor(c, rules);
    fits.push(f);
    lo.push(l);
    hi.push(h);
    need.push(nd);
    needMax.push(ndMax);
    minWall.push(wall);
    preheatLow.push(pLow);
    setPoint.push(Float64Array.from(points));
    spOf.push(sp);
    preheatSp.push(pre);
    changeSp.push(change);
    joinsSp.push(joins);
    inv.push(rate);
  });
  const tol = (t: BakeTray) => trayToleranceF(t, rules);
  return {
    n,
    m,
    cooks: input.cooks,
    ambientF,
    rules,
    trays,
    ovens,
    handsOn: Int32Array.from(trays, (t) => t.handsOnMinutes),
    capacity,
    fits,
    lo,
    hi,
    need,
    needMax,
    minWall,
    preheatLow,
    setPoint,
    spOf,
    preheatSp,
    changeSp,
    joinsSp,
    inv,
    adjustment,
    trayClass: classIds(trays.map((t) => JSON.stringify([t.tempF, tol(t), t.minMinutes, t.maxMinutes, t.handsOnMinutes]))),
    ovenClass: classIds(
      ovens.map((o) => JSON.stringify([o.racks, o.traysPerRack, o.convection, o.heatFPerMin, o.coolFPerMin, o.maxF])),
    ),
  };
}
