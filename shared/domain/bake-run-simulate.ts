/**
 * The bake-run simulator: turns a plan into minutes. A plan is
 *   - `order`: a sequence of all trays, which is both the cooks' prep order and each oven's loading order, and
 *   - `ovenOf[i]`: the oven of tray i.
 * Everything else follows from fixed rules (this is the plan space the searches explore):
 *   1. Prep: trays are taken in `order`; each goes to the cook who is free first (lowest cook number on a tie).
 *   2. Blocks: an oven's trays, in `order`, are cut into blocks; a block is set at the temperature its first tray
 *      asks (capped at the oven's maximum) and takes every following tray of that oven which bakes within
 *      tolerance at that set point; the next tray that does not opens the next block. The first block is
 *      preheated from ambient, each later block waits for the oven to empty and then for the changeover.
 *   3. Loading: within a block trays go in strictly in `order`, each at the first minute when the oven is ready,
 *      its prep is done, the tray before it is in and a place is free.
 *   4. Progress follows the model in bake-run-model.ts; a tray comes out at the first minute it has its progress.
 * Rule 3 is strict on purpose: a tray appended to an oven's sequence cannot change when the earlier trays go in,
 * only slow them down by crowding, so the time of a partial plan never shrinks when trays are added. The exact
 * search relies on this to prune (see bake-run-search.ts).
 */
import type { PreparedBakeRun } from './bake-run-model';
import { PROGRESS_EPS } from './bake-run-model';

export interface BakePlan {
  order: number[];
  ovenOf: ArrayLike<number>;
}

export interface PrepTimes {
  start: Int32Array;
  end: Int32Array;
  /** 0-based cook, −1 when the tray has no hands-on work. */
  cook: Int32Array;
}

/** Prep by list scheduling over `order` (rule 1). Returns release times (= end of prep). */
export function schedulePrep(prep: PreparedBakeRun, order: ArrayLike<number>, out?: PrepTimes): PrepTimes {
  const n = prep.n;
  const times = out ?? { start: new Int32Array(n), end: new Int32Array(n), cook: new Int32Array(n) };
  const free = new Array<number>(prep.cooks).fill(0);
  for (let p = 0; p < order.length; p++) {
    const i = order[p];
    const h = prep.handsOn[i];
    if (h === 0) {
      times.start[i] = 0;
      times.end[i] = 0;
      times.cook[i] = -1;
      continue;
    }
    let c = 0;
    for (let k = 1; k < free.length; k++) if (free[k] < free[c]) c = k;
    times.start[i] = free[c];
    times.end[i] = free[c] + h;
    times.cook[i] = c;
    free[c] += h;
  }
  return times;
}

/** Smallest whole m ≥ 1 with progress + m·rate ≥ need − ε (the same expression the simulator advances with). */
export function minutesToFinish(progress: number, need: number, rate: number): number {
  const target = need - PROGRESS_EPS;
  let m = Math.max(1, Math.ceil((target - progress) / rate));
  while (m > 1 && progress + (m - 1) * rate >= target) m--;
  while (progress + m * rate < target) m++;
  return m;
}

export interface BlockTrace {
  /** Set point class (index into prep.setPoint[o]). */
  sp: number;
  changeStart: number;
  ready: number;
  end: number;
  /** Positions [from, to) in the oven's sequence. */
  from: number;
  to: number;
}

export interface OvenState {
  /** Last tray out (0 when empty). */
  end: number;
  /** Minute the last tray in the sequence went in (−1 when empty). */
  lastIn: number;
  /** Set point class of the current (last) block, −1 when none. */
  sp: number;
  /** First minute ≥ lastIn with a free place in the last block (when the next tray could go in). */
  slotFree: number;
  /** Position in the sequence where the last block starts, and the minute its changeover (or preheat) starts. */
  lastFrom: number;
  lastChange: number;
}

let scratchIds = new Int32Array(16);
let scratchProg = new Float64Array(16);
let scratchNeed = new Float64Array(16);

function ensureScratch(size: number): void {
  if (scratchIds.length >= size) return;
  scratchIds = new Int32Array(size);
  scratchProg = new Float64Array(size);
  scratchNeed = new Float64Array(size);
}

/**
 * Simulates one oven: `seq[0..len)` are its trays in loading order, `release[i]` the end of prep of tray i.
 * Writes inT/outT (and the crowding rate of each tray's last minute into lastRate when given; blocks when given).
 */
export function simulateOven(
  prep: PreparedBakeRun,
  o: number,
  seq: ArrayLike<number>,
  len: number,
  release: ArrayLike<number>,
  inT: Int32Array,
  outT: Int32Array,
  state: OvenState,
  lastRate?: Float64Array,
  blocks?: BlockTrace[],
): void {
  const n = prep.n;
  const cap = prep.capacity[o];
  const inv = prep.inv[o];
  const need = prep.need[o];
  const spOf = prep.spOf[o];
  const joins = prep.joinsSp[o];
  const change = prep.changeSp[o];
  const k = prep.setPoint[o].length;
  ensureScratch(cap + 1);
  const ids = scratchIds;
  const prog = scratchProg;
  const needA = scratchNeed;
  let j = 0;
  let sp = -1;
  let end = 0;
  let lastIn = -1;
  let lastFrom = 0;
  let lastChange = 0;
  while (j < len) {
    const first = seq[j];
    const nextSp = spOf[first];
    const changeStart = end;
    const ready = sp < 0 ? prep.preheatSp[o][nextSp] : end + change[sp * k + nextSp];
    sp = nextSp;
    let e = j + 1;
    while (e < len && joins[sp * n + seq[e]] === 1) e++;
    let t = ready;
    let next = j;
    let act = 0;
    for (;;) {
      let tl = Infinity;
      if (act < cap && next < e) {
        const r = release[seq[next]];
        tl = r > t ? r : t;
      }
      let tc = Infinity;
      if (act > 0) {
        const rate = inv[act];
        for (let a = 0; a < act; a++) {
          const done = t + minutesToFinish(prog[a], needA[a], rate);
          if (done < tc) tc = done;
        }
      } else if (next >= e) break;
      if (tc <= tl) {
        const d = tc - t;
        const rate = inv[act];
        let w = 0;
        for (let a = 0; a < act; a++) {
          const p = prog[a] + d * rate;
          if (p >= needA[a] - PROGRESS_EPS) {
            outT[ids[a]] = tc;
            if (lastRate) lastRate[ids[a]] = rate;
          } else {
            ids[w] = ids[a];
            prog[w] = p;
            needA[w] = needA[a];
            w++;
          }
        }
        act = w;
        t = tc;
      } else {
        if (act > 0) {
          const d = tl - t;
          const rate = inv[act];
          for (let a = 0; a < act; a++) prog[a] += d * rate;
        }
        t = tl;
        const x = seq[next++];
        inT[x] = t;
        lastIn = t;
        ids[act] = x;
        prog[act] = 0;
        needA[act] = need[x];
        act++;
      }
    }
    if (blocks) blocks.push({ sp, changeStart, ready, end: t, from: j, to: e });
    end = t;
    lastFrom = j;
    lastChange = changeStart;
    j = e;
  }
  state.end = end;
  state.lastIn = lastIn;
  state.sp = sp;
  state.slotFree = lastIn;
  state.lastFrom = lastFrom;
  state.lastChange = lastChange;
  if (len > 0) {
    // Trays of the last block still in at lastIn, by out time: a place frees when all but cap − 1 are out.
    let still = 0;
    for (let p = lastFrom; p < len; p++) if (outT[seq[p]] > lastIn) still++;
    if (still >= cap) {
      const outs: number[] = [];
      for (let p = lastFrom; p < len; p++) if (outT[seq[p]] > lastIn) outs.push(outT[seq[p]]);
      outs.sort((a, b) => a - b);
      state.slotFree = outs[still - cap];
    }
  }
}

/** Reusable buffers for repeated evaluations of plans of one prepared run. */
export interface PlanWorkspace {
  prepTimes: PrepTimes;
  inT: Int32Array;
  outT: Int32Array;
  seqs: Int32Array[];
  lens: Int32Array;
  state: OvenState;
}

export function createWorkspace(prep: PreparedBakeRun): PlanWorkspace {
  const n = prep.n;
  return {
    prepTimes: { start: new Int32Array(n), end: new Int32Array(n), cook: new Int32Array(n) },
    inT: new Int32Array(n),
    outT: new Int32Array(n),
    seqs: Array.from({ length: prep.m }, () => new Int32Array(n)),
    lens: new Int32Array(prep.m),
    state: { end: 0, lastIn: -1, sp: -1, slotFree: -1, lastFrom: 0, lastChange: 0 },
  };
}

export interface PlanScore {
  /** Last tray out. */
  makespan: number;
  /** Sum of all out minutes (secondary objective: earlier is better). */
  sumOut: number;
}

/** Session length of a plan (and the secondary score). */
export function evaluatePlan(prep: PreparedBakeRun, plan: BakePlan, ws: PlanWorkspace = createWorkspace(prep)): PlanScore {
  const { order, ovenOf } = plan;
  const times = schedulePrep(prep, order, ws.prepTimes);
  ws.lens.fill(0);
  for (let p = 0; p < order.length; p++) {
    const i = order[p];
    const o = ovenOf[i];
    ws.seqs[o][ws.lens[o]++] = i;
  }
  let makespan = 0;
  for (let o = 0; o < prep.m; o++) {
    if (ws.lens[o] === 0) continue;
    simulateOven(prep, o, ws.seqs[o], ws.lens[o], times.end, ws.inT, ws.outT, ws.state);
    if (ws.state.end > makespan) makespan = ws.state.end;
  }
  let sumOut = 0;
  for (let p = 0; p < order.length; p++) sumOut += ws.outT[order[p]];
  return { makespan, sumOut };
}

export interface PlanTrace {
  prepTimes: PrepTimes;
  inT: Int32Array;
  outT: Int32Array;
  lastRate: Float64Array;
  /** Per oven: its trays in loading order and its blocks. */
  ovens: { seq: number[]; blocks: BlockTrace[] }[];
  makespan: number;
}

/** Full trace of a plan, for building the run sheet. */
export function tracePlan(prep: PreparedBakeRun, plan: BakePlan): PlanTrace {
  const n = prep.n;
  const prepTimes = schedulePrep(prep, plan.order);
  const inT = new Int32Array(n);
  const outT = new Int32Array(n);
  const lastRate = new Float64Array(n);
  const state: OvenState = { end: 0, lastIn: -1, sp: -1, slotFree: -1, lastFrom: 0, lastChange: 0 };
  let makespan = 0;
  const ovens = prep.ovens.map((_, o) => {
    const seq = plan.order.filter((i) => plan.ovenOf[i] === o);
    const blocks: BlockTrace[] = [];
    simulateOven(prep, o, seq, seq.length, prepTimes.end, inT, outT, state, lastRate, blocks);
    if (seq.length > 0 && state.end > makespan) makespan = state.end;
    return { seq, blocks };
  });
  return { prepTimes, inT, outT, lastRate, ovens, makespan };
}
