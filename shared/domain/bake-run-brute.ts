/**
 * Brute force over the whole plan space of bake-run-simulate.ts: every sequence of the trays × every oven for
 * every tray (among the ovens it fits), each simulated in full. No bounds, no symmetry breaking: a reference
 * for tests and benchmarks of the branch and bound. n! · m^n plans, so keep it to about 6 trays.
 */
import type { BakeRunInput } from './bake-run-types';
import type { PreparedBakeRun } from './bake-run-model';
import { BakeRunInputError, findBakeRunIssues, prepareBakeRun } from './bake-run-model';
import { createWorkspace, evaluatePlan } from './bake-run-simulate';

export interface BruteForceResult {
  sessionMinutes: number;
  order: number[];
  ovenOf: number[];
  plansTried: number;
}

export function bruteForcePrepared(prep: PreparedBakeRun): BruteForceResult {
  const { n, m } = prep;
  const ws = createWorkspace(prep);
  const options = [...Array(n).keys()].map((i) => [...Array(m).keys()].filter((o) => prep.fits[o][i]));
  const order: number[] = [];
  const used = new Uint8Array(n);
  const ovenOf = new Array<number>(n).fill(0);
  let best: BruteForceResult = { sessionMinutes: Infinity, order: [], ovenOf: [], plansTried: 0 };
  let tried = 0;

  const assign = (i: number): void => {
    if (i === n) {
      tried++;
      const { makespan } = evaluatePlan(prep, { order, ovenOf }, ws);
      if (makespan < best.sessionMinutes) best = { sessionMinutes: makespan, order: order.slice(), ovenOf: ovenOf.slice(), plansTried: 0 };
      return;
    }
    for (const o of options[i]) {
      ovenOf[i] = o;
      assign(i + 1);
    }
  };
  const permute = (): void => {
    if (order.length === n) {
      assign(0);
      return;
    }
    for (let i = 0; i < n; i++) {
      if (used[i]) continue;
      used[i] = 1;
      order.push(i);
      permute();
      order.pop();
      used[i] = 0;
    }
  };
  permute();
  return { ...best, plansTried: tried };
}

/** Shortest session over all plans of the input (throws BakeRunInputError on invalid input). */
export function bruteForceBakeRun(input: BakeRunInput): BruteForceResult {
  const issues = findBakeRunIssues(input);
  if (issues.length > 0) throw new BakeRunInputError(issues);
  return bruteForcePrepared(prepareBakeRun(input));
}
