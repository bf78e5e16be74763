import { describe, expect, it } from 'vitest';
import { planBakeRunOffThread } from '@server/lib/bake-run-pool.js';
import { planBakeRun } from '@shared/domain/bake-run';
import type { BakeRunInput } from '@shared/domain/bake-run-types';

// The worker threads' plans, kept by their whole input: the scheduler is deterministic (fixed-seed search, a budget of
// evaluations), so a kept plan is the one a new computation would give. Checked against the scheduler run on this
// thread (planBakeRun), the reference for the worker's answer.
const input = (trays: number): BakeRunInput => ({
  start: '2026-01-04T08:00',
  cooks: 1,
  ambientF: 70,
  ovens: [{ name: 'Left', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 }],
  trays: Array.from({ length: trays }, (_, i) => ({ id: `1-${i + 1}`, name: `Slab (${i + 1}/${trays})`, tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 })),
});

describe('plans off the request thread', () => {
  it('answer as the scheduler does, and again from the kept plan, each caller with a copy of its own', async () => {
    const first = await planBakeRunOffThread(input(3));
    expect(first).toEqual(JSON.parse(JSON.stringify(planBakeRun(input(3)))));
    // A caller changing its copy changes nothing for the next one.
    first.trays[0].name = 'changed by a caller';
    first.events.length = 0;
    const again = await planBakeRunOffThread(input(3));
    expect(again).not.toBe(first);
    expect(again).toEqual(JSON.parse(JSON.stringify(planBakeRun(input(3)))));
    // Another input is another plan.
    expect((await planBakeRunOffThread(input(4))).trays).toHaveLength(4);
  });
});
