/**
 * A lower bound on the session length of ANY schedule that obeys the model in bake-run-model.ts (not only the
 * plans the scheduler builds): no plan, however it is searched for, can end sooner.
 *
 * Notation, per tray i and oven o that fits it:
 *   h_i        hands-on minutes;                     C   number of cooks;
 *   need_io    progress the tray needs in oven o;    wall_io = ceil(need_io) (progress per minute is ≤ 1);
 *   pre_io     ceil((lo_io − ambient) / heat_o): minutes to heat from ambient to the LOWEST set point tray i
 *              accepts in oven o (any set point it bakes at is at least lo_io); for an oven already on at
 *              start_o, the minutes to move from start_o to the nearer edge of [lo_io, hi_io] (heating or
 *              cooling, 0 inside): the oven's temperature moves at most heat_o or cool_o °F per minute;
 *   tail_i = min_o wall_io,  work_i = min_o need_io,  start_i = max(h_i, min_o pre_io);
 *   R_o = max over k ≤ capacity_o of k / (1 + c·(k − 1)): the most progress per minute oven o can hand out
 *         (k trays each gain 1 / (1 + c·(k − 1)) per minute).
 * All schedule times are whole minutes, so every real-valued bound below may be rounded up.
 *
 * (A) one tray: T ≥ max_i min_o (max(h_i, pre_io) + wall_io).
 *     Proof: tray i goes in after its prep (≥ h_i, prep starts at ≥ 0) and after its oven reached a set point
 *     acceptable for it (≥ pre_io, the oven starts at ambient or start_o and moves at its rates); it then stays in at
 *     least wall_io minutes.
 * (B) cooks and tails: for every θ, with S = {i : tail_i ≥ θ}: T ≥ ceil(Σ_S h_i / C) + θ.
 *     Proof: the C cooks together do at most C minutes of prep per minute from minute 0, so the last tray of S to
 *     finish prep finishes at ≥ Σ_S h_i / C (if S has only 0-minute trays the bound reads 0 + θ, still true); that
 *     tray then bakes ≥ its tail ≥ θ.
 * (C) oven places: for every p and θ, with G = {i : start_i ≥ p, tail_i ≥ θ} and K_G the total capacity of the
 *     ovens that fit some tray of G: T ≥ p + ceil(|G| / K_G)·θ.
 *     Proof: every tray of G occupies a place during an interval of length ≥ θ inside [p, T]. If T − p < r·θ with
 *     r = ceil(|G| / K_G), look at the r − 1 instants p + jθ − ½ (j = 1..r − 1): an interval of length ≥ θ that
 *     starts at ≥ p and ends by T < p + rθ contains one of them, so some instant lies in ≥ |G| / (r − 1) > K_G
 *     intervals, more trays than places. (For r = 1 the bound is p + θ, true for any tray of G.)
 * (D) oven throughput after prep: sort h ascending with prefix sums H_j; the j-th prep to finish finishes at
 *     ≥ τ_j = ceil(H_j / C) (j trays prepped by time x need ≥ H_j minutes of cook time, at most C·x). The
 *     n − j + 1 trays whose prep finishes j-th or later all bake after τ_j and need ≥ W_j = the sum of the
 *     n − j + 1 smallest work_i. Oven o hands out at most R_o progress per minute and only after
 *     a_o = max(τ_j, q_o), q_o = min_i pre_io; so T is at least the smallest T with Σ_o R_o·(T − a_o)⁺ ≥ W_j.
 * (E) throughput with the hottest preheat: the same with τ = 0 and W = all work, except that one oven must bake
 *     tray i: it spends ≥ pre_io minutes heating or cooling (an oven bakes only at a set point, never while it changes), so its
 *     a_o is pre_io. For each tray i take the best oven for it (min over o); the bound is the max over i.
 * (F) temperature bands: take pairwise disjoint bands [x, y] of the temperature axis and let s(band) be the
 *     trays whose window [tempF − tol, tempF + tol] lies inside the band. In one oven, trays of different bands
 *     never bake together (no set point serves both; a convection offset shifts every window of that oven by
 *     the same amount, and the cap at maxF only narrows windows). Let τ_ob be the minutes oven o spends at set
 *     points of band b: Σ_o τ_ob ≥ g(b) = max(max tail in b, work of b / max_o R_o). Each oven also spends
 *     ≥ q_o minutes heating (or cooling, when on at the start) if it bakes anything, and ≥ pre_io if it bakes tray i. Over the set U of ovens that
 *     bake something: |U|·T ≥ Σ_b g(b) + Σ_U q_o + max_i min_o (pre_io − q_o). U is unknown, so the bound is the
 *     minimum over all U (see bestOverOvenSets). The bands are chosen by dynamic programming over window end
 *     points to maximise Σ_b g(b). With one oven this is "heat to the hottest, then bake each temperature group
 *     one after the other".
 */
import type { LowerBoundPart } from './bake-run-types';
import type { PreparedBakeRun } from './bake-run-model';

const EPS = 1e-9;

export interface BakeRunLowerBound {
  minutes: number;
  parts: LowerBoundPart[];
}

export function maxThroughput(prep: PreparedBakeRun, o: number): number {
  let best = 0;
  for (let k = 1; k <= prep.capacity[o]; k++) best = Math.max(best, k * prep.inv[o][k]);
  return best;
}

/** Smallest T with Σ rate_o · max(0, T − from_o) ≥ work (work > 0). */
function throughputTime(from: number[], rate: number[], work: number): number {
  if (work <= EPS) return 0;
  const idx = from.map((_, o) => o).filter((o) => rate[o] > 0).sort((a, b) => from[a] - from[b] || a - b);
  let sumRate = 0;
  let sumRateFrom = 0;
  for (let p = 0; p < idx.length; p++) {
    const o = idx[p];
    sumRate += rate[o];
    sumRateFrom += rate[o] * from[o];
    const t = (work + sumRateFrom) / sumRate;
    const nextFrom = p + 1 < idx.length ? from[idx[p + 1]] : Infinity;
    if (t <= nextFrom) return t;
  }
  return Infinity;
}

function ceilMinutes(x: number): number {
  return Math.ceil(x - EPS);
}

export function bakeRunLowerBound(prep: PreparedBakeRun): BakeRunLowerBound {
  const { n, m, cooks } = prep;
  if (n === 0) return { minutes: 0, parts: [] };
  const tail = new Array<number>(n).fill(Infinity);
  const work = new Array<number>(n).fill(Infinity);
  const start = new Array<number>(n).fill(Infinity);
  let single = 0;
  for (let i = 0; i < n; i++) {
    const h = prep.handsOn[i];
    let best = Infinity;
    for (let o = 0; o < m; o++) {
      if (!prep.fits[o][i]) continue;
      tail[i] = Math.min(tail[i], prep.minWall[o][i]);
      work[i] = Math.min(work[i], prep.need[o][i]);
      start[i] = Math.min(start[i], prep.preheatLow[o][i]);
      best = Math.min(best, Math.max(h, prep.preheatLow[o][i]) + prep.minWall[o][i]);
    }
    start[i] = Math.max(start[i], h);
    single = Math.max(single, best);
  }

  // (B) cooks and tails.
  const byTail = [...Array(n).keys()].sort((a, b) => tail[b] - tail[a] || a - b);
  let cooksTails = 0;
  let handsOn = 0;
  for (const i of byTail) {
    handsOn += prep.handsOn[i];
    cooksTails = Math.max(cooksTails, ceilMinutes(handsOn / cooks) + tail[i]);
  }

  // (C) oven places.
  let places = 0;
  const starts = [...new Set(start)].sort((a, b) => a - b);
  const tails = [...new Set(tail)].sort((a, b) => a - b);
  for (const p of starts) {
    for (const theta of tails) {
      let count = 0;
      const ovenUsed = new Uint8Array(m);
      for (let i = 0; i < n; i++) {
        if (start[i] < p || tail[i] < theta) continue;
        count++;
        for (let o = 0; o < m; o++) if (prep.fits[o][i]) ovenUsed[o] = 1;
      }
      if (count === 0) continue;
      let capacity = 0;
      for (let o = 0; o < m; o++) if (ovenUsed[o]) capacity += prep.capacity[o];
      places = Math.max(places, p + Math.ceil(count / capacity) * theta);
    }
  }

  // (D) and (E) throughput.
  const rate: number[] = [];
  const earliest: number[] = [];
  for (let o = 0; o < m; o++) {
    let q = Infinity;
    for (let i = 0; i < n; i++) if (prep.fits[o][i]) q = Math.min(q, prep.preheatLow[o][i]);
    rate.push(q === Infinity ? 0 : maxThroughput(prep, o));
    earliest.push(q === Infinity ? 0 : q);
  }
  const workAsc = [...work].sort((a, b) => a - b);
  const handsAsc = Array.from(prep.handsOn).sort((a, b) => a - b);
  let afterPrep = 0;
  let prefixH = 0;
  let remainingWork = workAsc.reduce((s, w) => s + w, 0);
  for (let j = 1; j <= n; j++) {
    prefixH += handsAsc[j - 1];
    const tau = ceilMinutes(prefixH / cooks);
    const from = earliest.map((q) => Math.max(q, tau));
    afterPrep = Math.max(afterPrep, ceilMinutes(throughputTime(from, rate, remainingWork)));
    remainingWork -= workAsc[n - j];
  }
  const totalWork = work.reduce((s, w) => s + w, 0);
  let hottest = 0;
  for (let i = 0; i < n; i++) {
    let best = Infinity;
    for (let o = 0; o < m; o++) {
      if (!prep.fits[o][i]) continue;
      const from = earliest.slice();
      from[o] = Math.max(from[o], prep.preheatLow[o][i]);
      best = Math.min(best, throughputTime(from, rate, totalWork));
    }
    hottest = Math.max(hottest, ceilMinutes(best));
  }

  const bands = temperatureBands(prep, tail, work, rate, earliest);

  const parts: LowerBoundPart[] = [
    { name: 'one tray: prep or preheat, then its bake', minutes: single },
    { name: 'cooks: hands-on work, then the shortest remaining bake', minutes: cooksTails },
    { name: 'oven places: trays per place, each at least its bake', minutes: places },
    { name: 'oven throughput after prep', minutes: afterPrep },
    { name: 'oven throughput after heating to the hottest tray', minutes: hottest },
    { name: 'temperature groups that cannot share an oven', minutes: bands },
  ];
  return { minutes: Math.max(...parts.map((p) => p.minutes)), parts };
}

/** Raw tolerance windows [tempF − tol, tempF + tol] of the trays (the same in every oven up to a shift). */
export function rawWindows(prep: PreparedBakeRun): { lo: number[]; hi: number[] } {
  const tol = (i: number) => prep.trays[i].toleranceF ?? prep.rules.defaultToleranceF;
  return {
    lo: prep.trays.map((t, i) => t.tempF - tol(i)),
    hi: prep.trays.map((t, i) => t.tempF + tol(i)),
  };
}

/**
 * Σ_b g(b) over the best set of disjoint temperature bands, counting only the trays with include(i) (see (F)):
 * g(b) = max(max tail in b, work in b / rMax); bands are closed intervals between window end points.
 */
export function bandTotal(
  lo: number[],
  hi: number[],
  tail: ArrayLike<number>,
  work: ArrayLike<number>,
  rMax: number,
  include: (i: number) => boolean,
): number {
  const members = lo.map((_, i) => i).filter(include);
  if (members.length === 0 || rMax <= 0) return 0;
  const xs = [...new Set(members.map((i) => lo[i]))].sort((a, b) => a - b);
  const ys = [...new Set(members.map((i) => hi[i]))].sort((a, b) => a - b);
  const bestEnd: number[] = [];
  let bestSoFar = 0;
  for (const y of ys) {
    let value = bestSoFar;
    for (const x of xs) {
      if (x > y) break;
      let maxTail = 0;
      let sumWork = 0;
      for (const i of members) {
        if (lo[i] < x || hi[i] > y) continue;
        if (tail[i] > maxTail) maxTail = tail[i];
        sumWork += work[i];
      }
      if (maxTail === 0) continue;
      let before = 0;
      for (let k = 0; k < bestEnd.length && ys[k] < x; k++) before = Math.max(before, bestEnd[k]);
      value = Math.max(value, before + Math.max(maxTail, sumWork / rMax));
    }
    bestEnd.push(value);
    bestSoFar = Math.max(bestSoFar, value);
  }
  return bestSoFar;
}

/** (F) over all trays (see the header). */
function temperatureBands(
  prep: PreparedBakeRun,
  tail: number[],
  work: number[],
  rate: number[],
  earliest: number[],
): number {
  const { n, m } = prep;
  const ovens = [...Array(m).keys()].filter((o) => rate[o] > 0);
  if (ovens.length === 0) return 0;
  const { lo, hi } = rawWindows(prep);
  const total = bandTotal(lo, hi, tail, work, Math.max(...rate), () => true);
  let extra = 0;
  for (let i = 0; i < n; i++) {
    let e = Infinity;
    for (const o of ovens) if (prep.fits[o][i]) e = Math.min(e, prep.preheatLow[o][i] - earliest[o]);
    if (e < Infinity) extra = Math.max(extra, e);
  }
  return ceilMinutes(bestOverOvenSets(total + extra, [], ovens.map((o) => earliest[o])));
}

/**
 * The ovens that bake something are unknown: an unused oven spends no time heating, so the band bound must hold
 * for the least favourable set U of used ovens: T ≥ min over U of (total + Σ_U heat_o) / |U|, where the ovens in
 * `always` are used for sure. For a fixed size the smallest heats give the minimum, so prefixes of the sorted
 * optional heats suffice.
 */
export function bestOverOvenSets(total: number, always: number[], optional: number[]): number {
  const sorted = [...optional].sort((a, b) => a - b);
  let sum = total;
  for (const a of always) sum += a;
  let count = always.length;
  let best = count > 0 ? sum / count : Infinity;
  for (const a of sorted) {
    sum += a;
    count++;
    best = Math.min(best, sum / count);
  }
  return best === Infinity ? 0 : best;
}
