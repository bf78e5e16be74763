/**
 * Properties of the bake-run scheduler on random runs (fast-check), with ovens cold or already on:
 * - every plan obeys the model (independent checker: capacity, set point within tolerance and steady while a tray
 *   is in, at least the adjusted minimum bake with crowding counted minute by minute and a pull at the first
 *   minute it is reached, cooks one task at a time, prep before the oven, events in time order);
 * - the lower bound never exceeds a session: the planned one, any random plan, the brute-force optimum;
 * - the branch and bound equals a brute force over every plan (≤ 6 trays);
 * - the same input gives the same output.
 * Oven and tray numbers are made-up kitchen values (common practice, no source).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { planBakeRun, sessionMinutesOf } from '@shared/domain/bake-run';
import { bruteForceBakeRun } from '@shared/domain/bake-run-brute';
import { bakeRunLowerBound } from '@shared/domain/bake-run-bound';
import { prepareBakeRun } from '@shared/domain/bake-run-model';
import type { BakeRunInput } from '@shared/domain/bake-run-types';

import { checkBakeRun } from './bake-run-check';

const ovenArb = fc.record({
  racks: fc.integer({ min: 1, max: 3 }),
  traysPerRack: fc.integer({ min: 1, max: 2 }),
  convection: fc.boolean(),
  heatFPerMin: fc.constantFrom(10, 12.5, 20, 25, 30),
  coolFPerMin: fc.constantFrom(8, 10, 15),
  maxF: fc.constantFrom(450, 500, 550),
  // An oven already on when the run starts (a day planned again part-way), or cold.
  startF: fc.option(fc.constantFrom(300, 350, 400, 425, 450), { nil: undefined }),
});

const trayArb = fc.record({
  tempF: fc.constantFrom(325, 340, 350, 375, 400, 410, 425, 450),
  minMinutes: fc.integer({ min: 3, max: 30 }),
  extra: fc.integer({ min: 0, max: 10 }),
  handsOnMinutes: fc.constantFrom(0, 2, 5, 8, 12),
  toleranceF: fc.option(fc.constantFrom(0, 5, 10, 15), { nil: undefined }),
});

function runArb(maxTrays: number, maxOvens: number): fc.Arbitrary<BakeRunInput> {
  return fc
    .record({
      cooks: fc.integer({ min: 1, max: 3 }),
      ambientF: fc.constantFrom(65, 70, 75),
      ovens: fc.array(ovenArb, { minLength: 1, maxLength: maxOvens }),
      trays: fc.array(trayArb, { minLength: 1, maxLength: maxTrays }),
      crowding: fc.constantFrom(0, 0.1, 0.25),
      mode: fc.constantFrom('temperature' as const, 'time' as const),
    })
    .map(({ cooks, ambientF, ovens, trays, crowding, mode }) => ({
      start: '2026-12-06T08:00',
      cooks,
      ambientF,
      ovens: ovens.map(({ startF, ...o }, k) => ({ name: `Oven ${k + 1}`, ...o, ...(startF === undefined ? {} : { startF }) })),
      trays: trays.map(({ extra, toleranceF, ...t }, k) => ({
        id: `t${String(k).padStart(2, '0')}`,
        name: `Tray ${k}`,
        ...t,
        maxMinutes: t.minMinutes + extra,
        ...(toleranceF === undefined ? {} : { toleranceF }),
      })),
      rules: { crowdingPerExtraTray: crowding, convectionMode: mode },
    }));
}

const quick = { exactMaxTrays: 4, heuristicEvaluations: 1_500 };

describe('bake-run properties', () => {
  it('heuristic plans obey the model and stay above the lower bound', () => {
    fc.assert(
      fc.property(runArb(12, 3), (input) => {
        const r = planBakeRun(input, quick);
        expect(checkBakeRun(input, r)).toEqual([]);
      }),
      { numRuns: 80 },
    );
  });

  it('exact plans obey the model', () => {
    fc.assert(
      fc.property(runArb(6, 2), (input) => {
        const r = planBakeRun(input);
        expect(r.method).toBe('exact');
        expect(checkBakeRun(input, r)).toEqual([]);
      }),
      { numRuns: 40 },
    );
  });

  it('the lower bound is below every plan, not only the planned one', () => {
    fc.assert(
      fc.property(
        runArb(10, 3).chain((input) =>
          fc.record({
            input: fc.constant(input),
            keys: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: input.trays.length, maxLength: input.trays.length }),
            picks: fc.array(fc.nat(), { minLength: input.trays.length, maxLength: input.trays.length }),
          }),
        ),
        ({ input, keys, picks }) => {
          const prep = prepareBakeRun(input);
          const order = [...keys.keys()].sort((a, b) => keys[a] - keys[b] || a - b);
          const ovenOf = picks.map((p, i) => {
            const fitting = prep.ovens.map((_, o) => o).filter((o) => prep.fits[o][i]);
            return fitting[p % fitting.length];
          });
          expect(sessionMinutesOf(input, { order, ovenOf })).toBeGreaterThanOrEqual(bakeRunLowerBound(prep).minutes);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('the branch and bound finds the brute-force optimum (≤ 6 trays)', () => {
    fc.assert(
      fc.property(
        fc.oneof(runArb(6, 1), runArb(6, 2), runArb(5, 3)),
        (input) => {
          const r = planBakeRun(input);
          const brute = bruteForceBakeRun(input);
          expect(r.provenOptimal).toBe(true);
          expect(r.sessionMinutes).toBe(brute.sessionMinutes);
          expect(brute.sessionMinutes).toBeGreaterThanOrEqual(r.lowerBoundMinutes);
        },
      ),
      { numRuns: 30 },
    );
  });

  it('is deterministic: the same input twice gives identical output', () => {
    fc.assert(
      fc.property(runArb(14, 3), (input) => {
        const a = planBakeRun(input, quick);
        const b = planBakeRun(structuredClone(input), quick);
        expect(JSON.stringify(b)).toBe(JSON.stringify(a));
      }),
      { numRuns: 25 },
    );
  });

  it('the checker itself catches a broken plan', () => {
    // Guards against a checker that passes everything: pull a tray one minute early, overfill an oven.
    const input: BakeRunInput = {
      start: '2026-12-06T08:00',
      cooks: 1,
      ambientF: 70,
      ovens: [{ name: 'Left', racks: 1, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 }],
      trays: [
        { id: 'a', name: 'a', tempF: 400, minMinutes: 10, maxMinutes: 12, handsOnMinutes: 3 },
        { id: 'b', name: 'b', tempF: 400, minMinutes: 10, maxMinutes: 12, handsOnMinutes: 3 },
      ],
    };
    const r = planBakeRun(input);
    expect(checkBakeRun(input, r)).toEqual([]);
    const early = structuredClone(r);
    early.trays[0].outMinute -= 1;
    expect(checkBakeRun(input, early).join(' ')).toMatch(/baked/);
    const crowded = structuredClone(r);
    crowded.trays[1].inMinute = crowded.trays[0].inMinute;
    expect(checkBakeRun(input, crowded).join(' ')).toMatch(/trays at minute/);
  });
});
