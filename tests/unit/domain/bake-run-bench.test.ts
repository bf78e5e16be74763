/**
 * The benchmark's bake run (tests/bench/cases.ts): 40 trays, 3 ovens (one convection, 3 racks), 2 cooks. The
 * plan must obey the model (independent checker) and end within 5 % of the lower bound, the goal.
 * Temperatures, times and rates are invented test values, as in the benchmark (common practice, no source).
 * No timing here: the search budget counts plan evaluations, so the result is the same on every machine.
 */
import { describe, expect, it } from 'vitest';

import { planBakeRun } from '@shared/domain/bake-run';
import type { BakeRunInput } from '@shared/domain/bake-run-types';

import { checkBakeRun } from './bake-run-check';

const OVEN = { racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 };
const MIX = [
  { tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 10 },
  { tempF: 400, minMinutes: 18, maxMinutes: 22, handsOnMinutes: 4 },
  { tempF: 425, minMinutes: 20, maxMinutes: 30, handsOnMinutes: 8 },
  { tempF: 400, minMinutes: 6, maxMinutes: 8, handsOnMinutes: 5 },
  { tempF: 350, minMinutes: 15, maxMinutes: 20, handsOnMinutes: 8 },
];

function benchLikeRun(): BakeRunInput {
  return {
    start: '2026-12-06T07:00',
    cooks: 2,
    ambientF: 70,
    ovens: [
      { ...OVEN, name: 'Left' },
      { ...OVEN, name: 'Right', racks: 3, convection: true },
      { ...OVEN, name: 'Back' },
    ],
    trays: Array.from({ length: 40 }, (_, i) => ({ id: `t${i + 1}`, name: `Tray ${i + 1}`, ...MIX[i % MIX.length] })),
  };
}

describe('the benchmark bake run (40 trays, 3 ovens, 2 cooks)', () => {
  it('is valid and within 5 % of the lower bound', () => {
    const input = benchLikeRun();
    const r = planBakeRun(input);
    expect(r.method).toBe('heuristic');
    expect(checkBakeRun(input, r)).toEqual([]);
    // Cooks: 280 hands-on minutes / 2 cooks = 140, then the shortest bake (6 min): bound ≥ 146 (arithmetic).
    expect(r.lowerBoundMinutes).toBeGreaterThanOrEqual(146);
    expect(r.gapPct).toBeLessThanOrEqual(5);
  });

  it('gives the same plan for the same input', () => {
    const a = planBakeRun(benchLikeRun());
    const b = planBakeRun(benchLikeRun());
    expect(b.trays).toEqual(a.trays);
    expect(b.sessionMinutes).toBe(a.sessionMinutes);
  });
});
