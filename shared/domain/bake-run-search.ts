/**
 * Searching the plan space of bake-run-simulate.ts (a sequence of trays + an oven per tray).
 *
 * - `heuristicPlan`: five greedy constructions (prep orders by rule, each tray to the oven where it comes out
 *   first), then first-improvement local search (move a tray to another oven, move all trays of one set point to
 *   another oven, move a tray elsewhere in the sequence, swap two set-point blocks of one oven, swap two trays)
 *   on the score (session length, then the sum of out minutes), then iterated local search in two chains (the
 *   second with block swaps): kick the plan (move a run of trays, send two trays to other ovens), improve
 *   again, keep it when no worse. Kicks come from a fixed-seed generator and the budget counts
 *   plan evaluations, never wall-clock time, so the same input always gives the same plan. It stops early when
 *   the session equals the lower bound.
 * - `exactPlan`: depth-first branch and bound that appends one (tray, oven) to the sequence per level, seeded
 *   with the heuristic's plan. A node is pruned when a lower bound on all its completions is no better than the
 *   best plan found. The bounds are valid because, in this plan space, appending a tray never changes when
 *   earlier trays go in and can only slow them (strict loading order, see bake-run-simulate.ts): see `nodeBound`.
 *   No optimal plan is lost by the reductions: interchangeable trays are placed in id order and interchangeable
 *   unused ovens in index order; two adjacent trays in different ovens of which one has no hands-on work give the
 *   same schedule in either order, so only the lower oven first is tried; and a node whose state (see
 *   `stateKey`) was already expanded is skipped.
 */
import type { PreparedBakeRun } from './bake-run-model';
import { ceilQuotient } from './bake-run-model';
import type { OvenState, PlanScore } from './bake-run-simulate';
import { createWorkspace, evaluatePlan, schedulePrep, simulateOven } from './bake-run-simulate';
import { bandTotal, bestOverOvenSets, maxThroughput, rawWindows } from './bake-run-bound';

export interface SearchOutcome {
  plan: { order: number[]; ovenOf: number[] };
  score: PlanScore;
  evaluations: number;
  provenOptimal: boolean;
}

function better(a: PlanScore, b: PlanScore): boolean {
  return a.makespan < b.makespan || (a.makespan === b.makespan && a.sumOut < b.sumOut);
}

/** Rank of each tray when trays are sorted by id (code-point order): the tie-break everywhere. */
export function rankById(prep: PreparedBakeRun): Int32Array {
  const idx = [...Array(prep.n).keys()].sort((a, b) => {
    const x = prep.trays[a].id;
    const y = prep.trays[b].id;
    return x < y ? -1 : x > y ? 1 : a - b;
  });
  const rank = new Int32Array(prep.n);
  idx.forEach((i, r) => (rank[i] = r));
  return rank;
}

/** Shortest bake of each tray over the ovens it fits. */
function tails(prep: PreparedBakeRun): number[] {
  return [...Array(prep.n).keys()].map((i) => {
    let best = Infinity;
    for (let o = 0; o < prep.m; o++) if (prep.fits[o][i]) best = Math.min(best, prep.minWall[o][i]);
    return best;
  });
}

/** Candidate prep orders (deterministic rules). */
function candidateOrders(prep: PreparedBakeRun, rank: Int32Array): number[][] {
  const n = prep.n;
  const tail = tails(prep);
  const temp = prep.trays.map((t) => t.tempF);
  const h = prep.handsOn;
  const all = [...Array(n).keys()];
  const byTail = (a: number, b: number) => tail[b] - tail[a] || temp[a] - temp[b] || rank[a] - rank[b];
  const groupMaxTail = new Map<number, number>();
  all.forEach((i) => groupMaxTail.set(temp[i], Math.max(groupMaxTail.get(temp[i]) ?? 0, tail[i])));
  return [
    all.slice().sort(byTail),
    all.slice().sort((a, b) => groupMaxTail.get(temp[b])! - groupMaxTail.get(temp[a])! || temp[a] - temp[b] || byTail(a, b)),
    all.slice().sort((a, b) => temp[a] - temp[b] || byTail(a, b)),
    all.slice().sort((a, b) => h[a] - h[b] || byTail(a, b)),
    all.slice().sort((a, b) => tail[b] + h[b] - tail[a] - h[a] || byTail(a, b)),
  ];
}

/** Each tray in `order` to the oven where it comes out first (then the oven that ends first, then the index). */
function greedyOvens(prep: PreparedBakeRun, order: number[]): number[] {
  const { n, m } = prep;
  const release = schedulePrep(prep, order).end;
  const seqs = Array.from({ length: m }, () => new Int32Array(n));
  const lens = new Int32Array(m);
  const inT = new Int32Array(n);
  const outT = new Int32Array(n);
  const state: OvenState = { end: 0, lastIn: -1, sp: -1, slotFree: -1, lastFrom: 0, lastChange: 0 };
  const ovenOf = new Array<number>(n).fill(-1);
  for (const i of order) {
    let bestO = -1;
    let bestOut = Infinity;
    let bestEnd = Infinity;
    for (let o = 0; o < m; o++) {
      if (!prep.fits[o][i]) continue;
      seqs[o][lens[o]] = i;
      simulateOven(prep, o, seqs[o], lens[o] + 1, release, inT, outT, state);
      if (outT[i] < bestOut || (outT[i] === bestOut && state.end < bestEnd)) {
        bestO = o;
        bestOut = outT[i];
        bestEnd = state.end;
      }
    }
    ovenOf[i] = bestO;
    seqs[bestO][lens[bestO]++] = i;
  }
  return ovenOf;
}

interface LocalState {
  order: number[];
  ovenOf: number[];
  score: PlanScore;
}

/** First-improvement local search; returns evaluations used. */
function improve(prep: PreparedBakeRun, s: LocalState, budget: number, floor: number, blockSwaps: boolean): number {
  const { n, m } = prep;
  const ws = createWorkspace(prep);
  let used = 0;
  const tryPlan = (): boolean => {
    used++;
    const score = evaluatePlan(prep, s, ws);
    if (better(score, s.score)) {
      s.score = score;
      return true;
    }
    return false;
  };
  const window = Math.min(n - 1, 12);
  let improved = true;
  while (improved && used < budget && s.score.makespan > floor) {
    improved = false;
    // 1. one tray to another oven
    for (let i = 0; i < n && used < budget; i++) {
      const old = s.ovenOf[i];
      for (let o = 0; o < m && used < budget; o++) {
        if (o === old || !prep.fits[o][i]) continue;
        s.ovenOf[i] = o;
        if (tryPlan()) {
          improved = true;
          break;
        }
        s.ovenOf[i] = old;
      }
    }
    // 2. all trays of one oven at one set point to another oven
    for (let from = 0; from < m && used < budget; from++) {
      const classes = [...new Set(s.order.filter((i) => s.ovenOf[i] === from).map((i) => prep.spOf[from][i]))];
      for (const sp of classes) {
        const members = s.order.filter((i) => s.ovenOf[i] === from && prep.spOf[from][i] === sp);
        for (let o = 0; o < m && used < budget; o++) {
          if (o === from || members.some((i) => !prep.fits[o][i])) continue;
          for (const i of members) s.ovenOf[i] = o;
          if (tryPlan()) {
            improved = true;
            break;
          }
          for (const i of members) s.ovenOf[i] = from;
        }
        if (members.some((i) => s.ovenOf[i] !== from)) break;
      }
    }
    // 3. move one tray to another place in the sequence
    for (let p = 0; p < n && used < budget; p++) {
      for (let d = -window; d <= window && used < budget; d++) {
        const q = p + d;
        if (d === 0 || q < 0 || q >= n) continue;
        const [x] = s.order.splice(p, 1);
        s.order.splice(q, 0, x);
        if (tryPlan()) {
          improved = true;
          break;
        }
        s.order.splice(q, 1);
        s.order.splice(p, 0, x);
      }
    }
    // 4. swap two set-point blocks of one oven: their trays trade places in the sequence, each block in its order
    for (let o = 0; o < m && blockSwaps && used < budget && !improved; o++) {
      const blocks = ovenBlocks(prep, s, o);
      for (let a = 0; a < blocks.length && used < budget && !improved; a++) {
        for (let b = a + 1; b < blocks.length && used < budget; b++) {
          const saved = s.order.slice();
          swapBlocks(s.order, blocks[a], blocks[b]);
          if (tryPlan()) {
            improved = true;
            break;
          }
          for (let p = 0; p < n; p++) s.order[p] = saved[p];
        }
      }
    }
    // 5. swap two trays in the sequence
    for (let p = 0; p < n && used < budget; p++) {
      for (let q = p + 1; q < n && q <= p + window && used < budget; q++) {
        [s.order[p], s.order[q]] = [s.order[q], s.order[p]];
        if (tryPlan()) {
          improved = true;
          break;
        }
        [s.order[p], s.order[q]] = [s.order[q], s.order[p]];
      }
    }
  }
  return used;
}

/** The trays of oven o cut into runs of the same set point class, in sequence order. */
function ovenBlocks(prep: PreparedBakeRun, s: LocalState, o: number): number[][] {
  const blocks: number[][] = [];
  let sp = -1;
  for (const i of s.order) {
    if (s.ovenOf[i] !== o) continue;
    const c = prep.spOf[o][i];
    if (c !== sp || blocks.length === 0) blocks.push([]);
    sp = c;
    blocks[blocks.length - 1].push(i);
  }
  return blocks;
}

/** Puts the trays of blocks x and y (x first in the sequence) into each other's order: y's trays, then x's. */
function swapBlocks(order: number[], x: number[], y: number[]): void {
  const inBoth = new Set([...x, ...y]);
  const replacement = [...y, ...x];
  let k = 0;
  for (let p = 0; p < order.length; p++) if (inBoth.has(order[p])) order[p] = replacement[k++];
}

export function heuristicPlan(prep: PreparedBakeRun, budget: number, floor = 0): SearchOutcome {
  const rank = rankById(prep);
  const ws = createWorkspace(prep);
  let best: LocalState | null = null;
  let evaluations = 0;
  for (const order of candidateOrders(prep, rank)) {
    const ovenOf = greedyOvens(prep, order);
    const score = evaluatePlan(prep, { order, ovenOf }, ws);
    evaluations++;
    if (!best || better(score, best.score)) best = { order, ovenOf, score };
  }
  const s = best!;
  evaluations += improve(prep, s, Math.max(0, budget - evaluations), floor, false);
  // Iterated local search in two chains that share the budget: kick the current plan (pseudo-random with a fixed
  // seed, so still deterministic), improve it again, keep it when it is no worse. The first chain (3/5 of the
  // budget) uses moves 1–3 and 5; the second starts again from the improved greedy plan with block swaps (move 4)
  // as well, a different neighbourhood that leaves other local optima. The best plan of both is returned.
  const random = seededRandom(0x7a11);
  const start: LocalState = { order: s.order.slice(), ovenOf: s.ovenOf.slice(), score: s.score };
  let bestState: LocalState = { order: s.order.slice(), ovenOf: s.ovenOf.slice(), score: s.score };
  const half = Math.max(evaluations, Math.floor((budget * 3) / 5));
  for (const [limit, blockSwaps] of [[half, false], [budget, true]] as const) {
    if (bestState.score.makespan <= floor) break;
    let current: LocalState = { order: start.order.slice(), ovenOf: start.ovenOf.slice(), score: start.score };
    if (blockSwaps && evaluations < limit) {
      evaluations += improve(prep, current, limit - evaluations, floor, true);
      if (better(current.score, bestState.score))
        bestState = { order: current.order.slice(), ovenOf: current.ovenOf.slice(), score: current.score };
    }
    while (evaluations < limit && bestState.score.makespan > floor && prep.n > 2) {
      const trial: LocalState = { order: current.order.slice(), ovenOf: current.ovenOf.slice(), score: current.score };
      kick(prep, trial, random);
      trial.score = evaluatePlan(prep, trial, ws);
      evaluations++;
      evaluations += improve(prep, trial, limit - evaluations, floor, blockSwaps);
      if (!better(current.score, trial.score)) current = trial;
      if (better(trial.score, bestState.score))
        bestState = { order: trial.order.slice(), ovenOf: trial.ovenOf.slice(), score: trial.score };
    }
  }
  return {
    plan: { order: bestState.order, ovenOf: bestState.ovenOf },
    score: bestState.score,
    evaluations,
    provenOptimal: bestState.score.makespan <= floor,
  };
}

/** mulberry32: a small deterministic generator (fixed seed), used only to vary the kicks. */
function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Moves a random run of trays elsewhere in the sequence and sends two random trays to other ovens. */
function kick(prep: PreparedBakeRun, s: LocalState, random: () => number): void {
  const n = s.order.length;
  const len = 1 + Math.floor(random() * Math.min(4, n - 1));
  const from = Math.floor(random() * (n - len + 1));
  const run = s.order.splice(from, len);
  const to = Math.floor(random() * (s.order.length + 1));
  s.order.splice(to, 0, ...run);
  for (let k = 0; k < 2; k++) {
    const i = Math.floor(random() * n);
    const options = [...Array(prep.m).keys()].filter((o) => prep.fits[o][i] && o !== s.ovenOf[i]);
    if (options.length > 0) s.ovenOf[i] = options[Math.floor(random() * options.length)];
  }
}

/** Minutes to move oven o from set point class a into tray i's tolerance window (0 when already inside). */
function minChangeTable(prep: PreparedBakeRun, o: number): Int32Array {
  const { n } = prep;
  const points = prep.setPoint[o];
  const oven = prep.ovens[o];
  const table = new Int32Array(points.length * n);
  for (let a = 0; a < points.length; a++) {
    for (let i = 0; i < n; i++) {
      const s = points[a];
      const hi = Math.min(prep.hi[o][i], oven.maxF);
      let minutes = 0;
      if (s < prep.lo[o][i]) minutes = ceilQuotient(prep.lo[o][i] - s, oven.heatFPerMin);
      else if (s > hi) minutes = ceilQuotient(s - hi, oven.coolFPerMin);
      table[a * n + i] = minutes;
    }
  }
  return table;
}

/** Earliest minute at which `work` minutes of prep can be finished by cooks free from `sortedFree` on. */
function cooksFinish(sortedFree: ArrayLike<number>, work: number): number {
  let sum = 0;
  for (let c = 0; c < sortedFree.length; c++) {
    sum += sortedFree[c];
    const t = (work + sum) / (c + 1);
    if (c + 1 === sortedFree.length || t <= sortedFree[c + 1]) return Math.ceil(t - 1e-9);
  }
  return 0;
}

/** Smallest T with Σ rate_o · (T − from_o)⁺ ≥ work, without allocating (`idx` is scratch of length m). */
function flowTime(from: ArrayLike<number>, rate: ArrayLike<number>, work: number, idx: Int32Array): number {
  let k = 0;
  for (let o = 0; o < rate.length; o++) {
    if (rate[o] <= 0) continue;
    let p = k++;
    while (p > 0 && from[idx[p - 1]] > from[o]) {
      idx[p] = idx[p - 1];
      p--;
    }
    idx[p] = o;
  }
  let sumRate = 0;
  let sumRateFrom = 0;
  for (let p = 0; p < k; p++) {
    const o = idx[p];
    sumRate += rate[o];
    sumRateFrom += rate[o] * from[o];
    const t = (work + sumRateFrom) / sumRate;
    if (p + 1 === k || t <= from[idx[p + 1]]) return t;
  }
  return Infinity;
}

/**
 * Branch and bound over the plan space. `incumbent` (a plan of the same space, e.g. from the heuristic) seeds
 * the best score; `globalBound` is the model lower bound (reaching it proves optimality at once).
 */
export function exactPlan(
  prep: PreparedBakeRun,
  incumbent: SearchOutcome,
  nodeLimit: number,
  globalBound: number,
): SearchOutcome {
  const { n, m, cooks } = prep;
  const rank = rankById(prep);
  const tail = tails(prep);
  const byTail = [...Array(n).keys()].sort((a, b) => tail[b] - tail[a] || rank[a] - rank[b]);
  const prevSame = new Int32Array(n).fill(-1);
  for (let i = 0; i < n; i++) {
    let best = -1;
    for (let j = 0; j < n; j++)
      if (prep.trayClass[j] === prep.trayClass[i] && rank[j] < rank[i] && (best < 0 || rank[j] > rank[best])) best = j;
    prevSame[i] = best;
  }
  const minChange = prep.ovens.map((_, o) => minChangeTable(prep, o));
  const work = [...Array(n).keys()].map((i) => {
    let best = Infinity;
    for (let o = 0; o < m; o++) if (prep.fits[o][i]) best = Math.min(best, prep.need[o][i]);
    return best;
  });
  const rate = prep.ovens.map((_, o) => (prep.fits[o].some((f) => f === 1) ? maxThroughput(prep, o) : 0));
  const usedA: number[] = [];
  const unusedA: number[] = [];
  const rMax = Math.max(...rate);
  const windows = rawWindows(prep);
  const useMasks = n <= 30;
  const bandMemo = new Map<number, number>();
  const from = new Float64Array(m);
  const ovenScratch = new Int32Array(m);
  const sortedFree = new Float64Array(cooks);

  let bestMakespan = incumbent.score.makespan;
  let bestPlan = incumbent.plan;
  let nodes = 0;
  let aborted = false;
  if (bestMakespan <= globalBound) return { ...incumbent, provenOptimal: true };

  const order: number[] = [];
  const ovenOf = new Array<number>(n).fill(-1);
  const placed = new Uint8Array(n);
  const release = new Int32Array(n);
  const free = new Array<number>(cooks).fill(0);
  const seqs = Array.from({ length: m }, () => new Int32Array(n));
  const lens = new Int32Array(m);
  const ovEnd = new Int32Array(m);
  const ovLastIn = new Int32Array(m).fill(-1);
  const ovSp = new Int32Array(m).fill(-1);
  const ovSlot = new Int32Array(m).fill(-1);
  const ovFrom = new Int32Array(m);
  const ovChange = new Int32Array(m);
  // Nodes already expanded, by everything their completions depend on (see stateKey).
  const seen = new Set<string>();
  const seenLimit = 2_000_000;
  const inT = new Int32Array(n);
  const outT = new Int32Array(n);
  const state: OvenState = { end: 0, lastIn: -1, sp: -1, slotFree: -1, lastFrom: 0, lastChange: 0 };

  /**
   * A bound on the session of every completion of the current node (its ovens already simulated). Each part
   * holds because later trays only delay what is placed (strict loading order):
   * - the last out so far;
   * - per tray still to place, its earliest out over the ovens it fits: after its prep (the first free cook +
   *   its hands-on), after a free place in that oven (or its preheat when unused), after the current block and
   *   the smallest changeover into its window when it cannot join that block, plus its shortest bake;
   * - cooks and tails (bake-run-bound.ts (B)) over the remaining hands-on work, from the cooks' free times;
   * - throughput (D) of the remaining work from a_o, the first minute a remaining tray can enter oven o;
   * - temperature bands (F) over the remaining trays, with a_o as each oven's unusable time.
   */
  const nodeBound = (): number => {
    let bound = 0;
    for (let o = 0; o < m; o++) if (ovEnd[o] > bound) bound = ovEnd[o];
    let minFree = Infinity;
    for (const f of free) minFree = Math.min(minFree, f);
    for (let i = 0; i < n; i++) {
      if (placed[i]) continue;
      const rel = prep.handsOn[i] > 0 ? minFree + prep.handsOn[i] : 0;
      let best = Infinity;
      for (let o = 0; o < m; o++) {
        if (!prep.fits[o][i]) continue;
        let start = rel;
        if (lens[o] === 0) start = Math.max(start, prep.preheatLow[o][i]);
        else {
          start = Math.max(start, ovSlot[o]);
          if (!prep.joinsSp[o][ovSp[o] * n + i]) start = Math.max(start, ovEnd[o] + minChange[o][ovSp[o] * n + i]);
        }
        best = Math.min(best, start + prep.minWall[o][i]);
      }
      if (best > bound) bound = best;
    }
    for (let c = 0; c < cooks; c++) {
      let p = c;
      while (p > 0 && sortedFree[p - 1] > free[c]) {
        sortedFree[p] = sortedFree[p - 1];
        p--;
      }
      sortedFree[p] = free[c];
    }
    let prepWork = 0;
    for (const i of byTail) {
      if (placed[i] || prep.handsOn[i] === 0) continue;
      prepWork += prep.handsOn[i];
      const b = cooksFinish(sortedFree, prepWork) + tail[i];
      if (b > bound) bound = b;
    }
    // Remaining trays go into oven o no earlier than a_o (its last tray in, or its preheat when unused).
    let mask = 0;
    let remainingWork = 0;
    let relMin = Infinity;
    for (let i = 0; i < n; i++) {
      if (placed[i]) continue;
      mask |= 1 << i;
      remainingWork += work[i];
      relMin = Math.min(relMin, prep.handsOn[i] > 0 ? minFree + prep.handsOn[i] : 0);
    }
    if (remainingWork === 0) return bound;
    usedA.length = 0;
    unusedA.length = 0;
    for (let o = 0; o < m; o++) {
      let a: number;
      if (lens[o] > 0) a = ovSlot[o];
      else {
        let p = Infinity;
        for (let i = 0; i < n; i++) if (!placed[i] && prep.fits[o][i]) p = Math.min(p, prep.preheatLow[o][i]);
        a = p === Infinity ? 0 : p;
      }
      if (rate[o] > 0) (lens[o] > 0 ? usedA : unusedA).push(a);
      from[o] = Math.max(a, relMin);
    }
    const flow = Math.ceil(flowTime(from, rate, remainingWork, ovenScratch) - 1e-9);
    if (flow > bound) bound = flow;
    if (useMasks) {
      let bands = bandMemo.get(mask);
      if (bands === undefined) {
        bands = bandTotal(windows.lo, windows.hi, tail, work, rMax, (i) => !placed[i]);
        bandMemo.set(mask, bands);
      }
      const b = Math.ceil(bestOverOvenSets(bands, usedA, unusedA) - 1e-9);
      if (b > bound) bound = b;
    }
    return bound;
  };

  const push = (i: number, o: number) => {
    const saved = {
      cook: -1,
      oldFree: 0,
      end: ovEnd[o],
      lastIn: ovLastIn[o],
      sp: ovSp[o],
      slot: ovSlot[o],
      from: ovFrom[o],
      change: ovChange[o],
    };
    const h = prep.handsOn[i];
    if (h > 0) {
      let c = 0;
      for (let k = 1; k < cooks; k++) if (free[k] < free[c]) c = k;
      saved.cook = c;
      saved.oldFree = free[c];
      release[i] = free[c] + h;
      free[c] += h;
    } else release[i] = 0;
    order.push(i);
    ovenOf[i] = o;
    placed[i] = 1;
    seqs[o][lens[o]++] = i;
    simulateOven(prep, o, seqs[o], lens[o], release, inT, outT, state);
    ovEnd[o] = state.end;
    ovLastIn[o] = state.lastIn;
    ovSp[o] = state.sp;
    ovSlot[o] = state.slotFree;
    ovFrom[o] = state.lastFrom;
    ovChange[o] = state.lastChange;
    return saved;
  };
  const pop = (i: number, o: number, saved: ReturnType<typeof push>): void => {
    if (saved.cook >= 0) free[saved.cook] = saved.oldFree;
    order.pop();
    ovenOf[i] = -1;
    placed[i] = 0;
    lens[o]--;
    ovEnd[o] = saved.end;
    ovLastIn[o] = saved.lastIn;
    ovSp[o] = saved.sp;
    ovSlot[o] = saved.slot;
    ovFrom[o] = saved.from;
    ovChange[o] = saved.change;
  };

  /**
   * Everything the completions of a node depend on: which trays are left, when each cook is free, and per oven
   * the set point, the minute its last block started changing (earlier blocks are final) and which trays of the
   * last block went in when (later trays go in after them and only slow them); plus what the commuting rule
   * reads of the last tray. Two nodes with the same key have the same subtree, so the second is skipped.
   */
  const stateKey = (): string => {
    const last = order[order.length - 1];
    let key = prep.handsOn[last] === 0 ? `${ovenOf[last]}#` : '#';
    for (let i = 0; i < n; i++) key += placed[i] ? '1' : '0';
    key += '|' + free.slice().sort((a, b) => a - b).join(',');
    for (let o = 0; o < m; o++) {
      key += '|' + (lens[o] === 0 ? '-' : `${ovSp[o]}@${ovChange[o]}:`);
      for (let p = ovFrom[o]; p < lens[o]; p++) key += `${seqs[o][p]}/${inT[seqs[o][p]]},`;
    }
    return key;
  };

  const dfs = (depth: number): void => {
    if (aborted) return;
    if (++nodes > nodeLimit) {
      aborted = true;
      return;
    }
    if (depth > 0 && depth < n - 1 && seen.size < seenLimit) {
      const key = stateKey();
      if (seen.has(key)) return;
      seen.add(key);
    }
    if (depth === n) {
      let makespan = 0;
      for (let o = 0; o < m; o++) makespan = Math.max(makespan, ovEnd[o]);
      if (makespan < bestMakespan) {
        bestMakespan = makespan;
        bestPlan = { order: order.slice(), ovenOf: ovenOf.slice() };
      }
      return;
    }
    const children: { i: number; o: number; bound: number }[] = [];
    const last = depth > 0 ? order[depth - 1] : -1;
    for (let i = 0; i < n; i++) {
      if (placed[i] || (prevSame[i] >= 0 && !placed[prevSame[i]])) continue;
      for (let o = 0; o < m; o++) {
        if (!prep.fits[o][i]) continue;
        // Adjacent trays in different ovens commute when one has no hands-on work (nothing they share changes):
        // keep only the order with the lower oven index first.
        if (
          last >= 0 &&
          ovenOf[last] !== o &&
          (prep.handsOn[last] === 0 || prep.handsOn[i] === 0) &&
          ovenOf[last] > o
        )
          continue;
        if (lens[o] === 0) {
          let twin = false;
          for (let p = 0; p < o; p++) if (lens[p] === 0 && prep.ovenClass[p] === prep.ovenClass[o]) twin = true;
          if (twin) continue;
        }
        const saved = push(i, o);
        const bound = nodeBound();
        pop(i, o, saved);
        if (bound < bestMakespan) children.push({ i, o, bound });
      }
    }
    children.sort((a, b) => a.bound - b.bound || rank[a.i] - rank[b.i] || a.o - b.o);
    for (const child of children) {
      if (child.bound >= bestMakespan || aborted || bestMakespan <= globalBound) break;
      const saved = push(child.i, child.o);
      dfs(depth + 1);
      pop(child.i, child.o, saved);
    }
  };
  dfs(0);

  const score = evaluatePlan(prep, bestPlan);
  return {
    plan: { order: bestPlan.order.slice(), ovenOf: Array.from(bestPlan.ovenOf) },
    score,
    evaluations: incumbent.evaluations + nodes,
    provenOptimal: !aborted || bestMakespan <= globalBound,
  };
}

