/**
 * The request schema of POST /api/calc/bake-run: field paths for every rejection, °C input converted with
 * °F = °C × 9/5 + 32 (NIST SP 811), and parsed output the scheduler accepts.
 */
import { describe, expect, it } from 'vitest';

import { planBakeRun } from '@shared/domain/bake-run';
import type { BakeRunRequestBody } from '@shared/schemas/bake-run.schema';
import { asBakeRunInput, bakeRunInputSchema } from '@shared/schemas/bake-run.schema';

const body = (): BakeRunRequestBody => ({
  start: '2026-12-06T08:00',
  cooks: 1,
  ambientF: 70,
  ovens: [{ name: 'Left', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 }],
  trays: [{ id: 't1', name: 'Egg slab', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 10, toleranceF: 10 }],
});

function paths(input: unknown): string[] {
  const r = bakeRunInputSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
}

describe('bakeRunInputSchema', () => {
  it('accepts the documented example and the scheduler plans it', () => {
    const parsed = bakeRunInputSchema.parse(body());
    const result = planBakeRun(asBakeRunInput(parsed));
    expect(result.trays).toHaveLength(1);
  });

  it.each([
    ['no ovens', (b: BakeRunRequestBody) => ({ ...b, ovens: [] }), 'ovens'],
    ['no trays', (b: BakeRunRequestBody) => ({ ...b, trays: [] }), 'trays'],
    ['no cooks', (b: BakeRunRequestBody) => ({ ...b, cooks: 0 }), 'cooks'],
    ['half a cook', (b: BakeRunRequestBody) => ({ ...b, cooks: 1.5 }), 'cooks'],
    ['bad start', (b: BakeRunRequestBody) => ({ ...b, start: '6 Dec 8am' }), 'start'],
    ['0 minutes', (b: BakeRunRequestBody) => ({ ...b, trays: [{ ...b.trays[0], minMinutes: 0 }] }), 'trays.0.minMinutes'],
    ['negative minutes', (b: BakeRunRequestBody) => ({ ...b, trays: [{ ...b.trays[0], maxMinutes: -5 }] }), 'trays.0.maxMinutes'],
    ['max below min', (b: BakeRunRequestBody) => ({ ...b, trays: [{ ...b.trays[0], minMinutes: 30, maxMinutes: 25 }] }), 'trays.0.maxMinutes'],
    ['hotter than every oven', (b: BakeRunRequestBody) => ({ ...b, trays: [b.trays[0], { ...b.trays[0], id: 't2', tempF: 560 }] }), 'trays.1.tempF'],
    ['hotter in °C', (b: BakeRunRequestBody) => ({ ...b, trays: [{ ...b.trays[0], tempF: undefined, tempC: 300 }] }), 'trays.0.tempC'],
    ['both °F and °C', (b: BakeRunRequestBody) => ({ ...b, trays: [{ ...b.trays[0], tempC: 175 }] }), 'trays.0.tempF'],
    ['duplicate tray id', (b: BakeRunRequestBody) => ({ ...b, trays: [b.trays[0], b.trays[0]] }), 'trays.1.id'],
    ['duplicate oven name', (b: BakeRunRequestBody) => ({ ...b, ovens: [b.ovens[0], b.ovens[0]] }), 'ovens.1.name'],
    ['no racks', (b: BakeRunRequestBody) => ({ ...b, ovens: [{ ...b.ovens[0], racks: 0 }] }), 'ovens.0.racks'],
    ['no heating', (b: BakeRunRequestBody) => ({ ...b, ovens: [{ ...b.ovens[0], heatFPerMin: 0 }] }), 'ovens.0.heatFPerMin'],
    ['fractional hands-on', (b: BakeRunRequestBody) => ({ ...b, trays: [{ ...b.trays[0], handsOnMinutes: 2.5 }] }), 'trays.0.handsOnMinutes'],
  ])('%s → 400 at %s', (_, edit, path) => {
    expect(paths(edit(body()))).toContain(path);
  });

  it('reports the tray path once, not a cascade', () => {
    expect(paths({ ...body(), trays: [{ ...body().trays[0], minMinutes: 0 }] })).toEqual(['trays.0.minMinutes']);
  });

  it('converts °C to °F (× 9/5 + 32): 175 °C = 347 °F, 200 °C = 392 °F', () => {
    const parsed = bakeRunInputSchema.parse({
      ...body(),
      trays: [
        { ...body().trays[0], tempF: undefined, tempC: 175 },
        { ...body().trays[0], id: 't2', tempF: undefined, tempC: 200 },
      ],
    });
    expect(parsed.trays.map((t) => [t.tempF, t.tempC])).toEqual([
      [347, 175],
      [392, 200],
    ]);
  });

  it('a convection oven rescues a tray the conventional maximum cannot hold', () => {
    // 520 °F − 25 °F (default convection offset) = 495 °F ≤ 500 °F.
    const fan = { ...body().ovens[0], name: 'Fan', convection: true };
    expect(paths({ ...body(), ovens: [fan], trays: [{ ...body().trays[0], tempF: 520 }] })).toEqual([]);
    expect(
      paths({ ...body(), ovens: [fan], rules: { convectionMode: 'time' }, trays: [{ ...body().trays[0], tempF: 520 }] }),
    ).toEqual(['trays.0.tempF']);
  });

  it('fills defaults: ambient 70 °F, conventional oven', () => {
    const { ambientF: _a, ...rest } = body();
    const parsed = bakeRunInputSchema.parse({ ...rest, ovens: [{ ...rest.ovens[0], convection: undefined }] });
    expect(parsed.ambientF).toBe(70);
    expect(parsed.ovens[0].convection).toBe(false);
  });

  it('rejects rule values out of range', () => {
    expect(paths({ ...body(), rules: { crowdingPerExtraTray: -0.1 } })).toContain('rules.crowdingPerExtraTray');
    expect(paths({ ...body(), rules: { convectionTimeFactor: 0 } })).toContain('rules.convectionTimeFactor');
  });
});
