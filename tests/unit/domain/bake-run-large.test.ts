/**
 * A full prep day: 40 trays, 3 ovens (one convection), 2 cooks. The plan must obey the model and end within 5 %
 * of the lower bound (the goal). Speed is measured outside the test suite (the project keeps timings out
 * of tests); the search budget counts plan evaluations, so this test does the same work on every machine.
 */
import { describe, expect, it } from 'vitest';

import { planBakeRun } from '@shared/domain/bake-run';
import { DEFAULT_BAKE_RUN_SEARCH } from '@shared/domain/bake-run-model';

import { checkBakeRun } from './bake-run-check';
import { prepDay40 } from './bake-run-fixtures';

describe('a 40-tray prep day', () => {
  it('is valid, within 5 % of the bound, inside the evaluation budget', () => {
    const input = prepDay40();
    const r = planBakeRun(input);
    expect(r.method).toBe('heuristic');
    expect(checkBakeRun(input, r)).toEqual([]);
    expect(r.gapPct).toBeLessThanOrEqual(5);
    expect(r.evaluations).toBeLessThanOrEqual(DEFAULT_BAKE_RUN_SEARCH.heuristicEvaluations);
    // Cooks: 326 hands-on minutes / 2 cooks = 163, then the shortest bake (cheese crisps, 6 min): bound ≥ 169.
    expect(r.lowerBoundMinutes).toBeGreaterThanOrEqual(169);
  });

  it('8 trays get the exact search and a proof of optimality', () => {
    const input = prepDay40();
    input.trays = input.trays.filter((_, k) => k % 5 === 0);
    expect(input.trays).toHaveLength(8);
    const r = planBakeRun(input);
    expect(r.method).toBe('exact');
    expect(r.provenOptimal).toBe(true);
    expect(checkBakeRun(input, r)).toEqual([]);
  });
});
