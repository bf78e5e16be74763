/**
 * Hand-checked bake runs. Every expected minute below is worked out by hand in the comments from the model's
 * rules (preheat = ceil((T − ambient) / heat), changeover = ceil(ΔT / rate), crowding rate 1 / (1 + c·(k − 1))).
 * Bake times and rates in these fixtures are made-up kitchen numbers (common practice, no source); the cooling
 * deadlines are checked against FDA Food Code §3-501.14.
 */
import { describe, expect, it } from 'vitest';

import { FOOD_CODE_COOLING, planBakeRun, sessionMinutesOf } from '@shared/domain/bake-run';
import { BakeRunInputError } from '@shared/domain/bake-run-model';
import type { BakeOven, BakeRunInput, BakeTray } from '@shared/domain/bake-run-types';
import { addLocalMinutes } from '@shared/domain/bake-run-time';

import { checkBakeRun } from './bake-run-check';

const oven = (over: Partial<BakeOven> = {}): BakeOven => ({
  name: 'Left',
  racks: 1,
  traysPerRack: 1,
  convection: false,
  heatFPerMin: 25,
  coolFPerMin: 15,
  maxF: 500,
  ...over,
});
const tray = (id: string, tempF: number, minMinutes: number, over: Partial<BakeTray> = {}): BakeTray => ({
  id,
  name: id,
  tempF,
  minMinutes,
  maxMinutes: minMinutes + 5,
  handsOnMinutes: 0,
  ...over,
});
const run = (ovens: BakeOven[], trays: BakeTray[], over: Partial<BakeRunInput> = {}): BakeRunInput => ({
  start: '2026-12-06T08:00',
  cooks: 1,
  ambientF: 70,
  ovens,
  trays,
  ...over,
});
const byId = (r: ReturnType<typeof planBakeRun>, id: string) => r.trays.find((t) => t.id === id)!;

describe('two set points in one oven (heating is faster than cooling)', () => {
  // One place (1 rack × 1 tray), heat 25 °F/min, cool 15 °F/min, ambient 70 °F, trays of 20 min at 350 and 425.
  // 350 first: preheat ceil((350 − 70)/25) = ceil(11.2) = 12; bake 12–32; heat 75/25 = 3 → ready 35; bake 35–55.
  // 425 first: preheat ceil((425 − 70)/25) = ceil(14.2) = 15; bake 15–35; cool 75/15 = 5 → ready 40; bake 40–60.
  const input = run([oven()], [tray('hot', 425, 20), tray('mild', 350, 20)]);

  it('bakes 350 first and ends at minute 55', () => {
    const r = planBakeRun(input);
    expect(r.sessionMinutes).toBe(55);
    expect(r.endAt).toBe('2026-12-06T08:55');
    expect(r.ovens[0].setPoints.map((s) => [s.tempF, s.changeMinute, s.readyMinute, s.endMinute])).toEqual([
      [350, 0, 12, 32],
      [425, 32, 35, 55],
    ]);
    expect([byId(r, 'mild').inMinute, byId(r, 'mild').outMinute]).toEqual([12, 32]);
    expect([byId(r, 'hot').inMinute, byId(r, 'hot').outMinute]).toEqual([35, 55]);
    expect(r.method).toBe('exact');
    expect(r.provenOptimal).toBe(true);
    expect(checkBakeRun(input, r)).toEqual([]);
  });

  it('prices both orders as worked out by hand', () => {
    // Tray indices in input order: 0 = hot (425), 1 = mild (350).
    expect(sessionMinutesOf(input, { order: [1, 0], ovenOf: [0, 0] })).toBe(55);
    expect(sessionMinutesOf(input, { order: [0, 1], ovenOf: [0, 0] })).toBe(60);
  });

  it('emits the oven events at the hand-computed minutes', () => {
    const r = planBakeRun(input);
    const ovenEvents = r.events.filter((e) => e.trayId === null).map((e) => [e.kind, e.at, e.tempF, e.fromF]);
    expect(ovenEvents).toEqual([
      ['preheat', '2026-12-06T08:00', 350, undefined],
      ['ready', '2026-12-06T08:12', 350, undefined],
      ['setpoint-change', '2026-12-06T08:32', 425, 350],
      ['ready', '2026-12-06T08:35', 425, undefined],
    ]);
  });

  it('has the hand-computed lower bound', () => {
    // Windows 350 ± 10 = [340, 360] and 425 ± 10 = [415, 435] never share a set point: in one oven the two bakes
    // (20 + 20 min) cannot overlap, and the oven must first heat to 340 at least: ceil(270/25) = 11 min, and to
    // 415 at some point: ceil(345/25) = 14, i.e. 3 more. Bound = 40 + 11 + 3 = 54; gap (55 − 54)/54 = 1.9 %.
    const r = planBakeRun(input);
    expect(r.lowerBoundMinutes).toBe(54);
    expect(r.gapPct).toBe(1.9);
  });
});

describe('crowding', () => {
  // Two places, both trays at 400 °F: preheat ceil((400 − 70)/25) = ceil(13.2) = 14, both go in at 14.
  const two = (a: number, b: number, crowding?: number) =>
    run([oven({ racks: 2 })], [tray('a', 400, a), tray('b', 400, b)], crowding === undefined ? {} : { rules: { crowdingPerExtraTray: crowding } });

  it.each([
    // [a, b, crowding, a out, b out]
    // 10 and 20 at +10 %: a gains 1/1.1 per minute, needs 10 → 11 min → out 25; b has 10 at 25, alone 10 more → 35.
    [10, 20, 0.1, 25, 35],
    // 7 and 15 at +10 %: a needs 7 × 1.1 = 7.7 → 8 min → out 22; b has 8/1.1 = 7.27 at 22, needs 7.73 → 8 → 30.
    [7, 15, 0.1, 22, 30],
    // No crowding: 14 + 10 = 24 and 14 + 20 = 34.
    [10, 20, 0, 24, 34],
  ])('%i + %i min at crowding %d: out at %i and %i', (a, b, c, outA, outB) => {
    const input = two(a, b, c);
    const r = planBakeRun(input);
    expect(byId(r, 'a').outMinute).toBe(outA);
    expect(byId(r, 'b').outMinute).toBe(outB);
    expect(r.sessionMinutes).toBe(outB);
    expect(checkBakeRun(input, r)).toEqual([]);
  });

  it('three trays at +20 % each stretch to 1.4× while all three are in', () => {
    // 3 places, crowding 0.2: k = 3 → rate 1/1.4. Trays 10, 10, 20 in at 14: the 10s need 14 min → out 28;
    // the 20 has 10 at 28, alone 10 more → 38.
    const input = run(
      [oven({ racks: 3 })],
      [tray('a', 400, 10), tray('b', 400, 10), tray('c', 400, 20)],
      { rules: { crowdingPerExtraTray: 0.2 } },
    );
    const r = planBakeRun(input);
    expect([byId(r, 'a').outMinute, byId(r, 'b').outMinute, byId(r, 'c').outMinute]).toEqual([28, 28, 38]);
    expect(checkBakeRun(input, r)).toEqual([]);
  });
});

describe('capacity and cooks', () => {
  it('a third tray waits for a free place', () => {
    // 2 places, no crowding, three 10-min trays at 400: two in at 14, out 24; the third in at 24, out 34.
    const input = run([oven({ racks: 2 })], [tray('a', 400, 10), tray('b', 400, 10), tray('c', 400, 10)], {
      rules: { crowdingPerExtraTray: 0 },
    });
    const r = planBakeRun(input);
    expect(r.trays.map((t) => [t.id, t.inMinute, t.outMinute])).toEqual([
      ['a', 14, 24],
      ['b', 14, 24],
      ['c', 24, 34],
    ]);
    expect(checkBakeRun(input, r)).toEqual([]);
  });

  it.each([
    // One oven, 2 places, 350 °F at 50 °F/min: preheat ceil(280/50) = ceil(5.6) = 6. Trays p (prep 10) and
    // q (prep 5), 20 min each, crowding +10 %.
    // 1 cook, q then p: q in 6 (prep ends 5), alone to 15 (9 done), with p at 1/1.1: 11 more → 13 min → out 28;
    //   p from 15 to 28 has 13/1.1 = 11.82, alone 8.18 more → 9 → out 37. (p then q also gives 37.)
    [1, 37],
    // 2 cooks: q ready at 5, p at 10. q in 6, alone to 10 (4 done), with p: 16 more → 17.6 → 18 min → out 28;
    //   p from 10 to 28 has 18/1.1 = 16.36, alone 3.64 more → 4 → out 32.
    [2, 32],
  ])('%i cook(s): the session ends at %i', (cooks, session) => {
    const input = run(
      [oven({ racks: 2, heatFPerMin: 50 })],
      [tray('p', 350, 20, { handsOnMinutes: 10 }), tray('q', 350, 20, { handsOnMinutes: 5 })],
      { cooks },
    );
    const r = planBakeRun(input);
    expect(r.sessionMinutes).toBe(session);
    expect(checkBakeRun(input, r)).toEqual([]);
  });
});

describe('convection (temperature or time, never both)', () => {
  // Convection oven, tray 400 °F for 20 min.
  // 'temperature': set 400 − 25 = 375, preheat ceil(305/25) = ceil(12.2) = 13, bake 20 → out 33.
  // 'time': set 400, preheat ceil(330/25) = 14, bake 20 × 0.75 = 15 → out 29.
  it.each([
    ['temperature', 375, 13, 33, 20],
    ['time', 400, 14, 29, 15],
  ] as const)('%s mode: set %i, in %i, out %i', (mode, setF, inMinute, outMinute, minAdjusted) => {
    const input = run([oven({ convection: true })], [tray('t', 400, 20)], { rules: { convectionMode: mode } });
    const r = planBakeRun(input);
    expect(byId(r, 't')).toMatchObject({ tempF: setF, inMinute, outMinute, minAdjustedMinutes: minAdjusted });
    expect(byId(r, 't').convectionAdjustment).toBe(mode);
    expect(checkBakeRun(input, r)).toEqual([]);
  });
});

describe('tolerance', () => {
  it('trays 10 °F apart share one set point within ±10 °F', () => {
    const input = run([oven({ racks: 2 })], [tray('a', 400, 10), tray('b', 410, 10)]);
    const r = planBakeRun(input);
    expect(r.ovens[0].setPoints).toHaveLength(1);
    expect(checkBakeRun(input, r)).toEqual([]);
  });

  it('trays 10 °F apart need two set points at ±4 °F', () => {
    const input = run([oven({ racks: 2 })], [tray('a', 400, 10, { toleranceF: 4 }), tray('b', 410, 10, { toleranceF: 4 })]);
    const r = planBakeRun(input);
    expect(r.ovens[0].setPoints.map((s) => s.tempF).sort()).toEqual([400, 410]);
    expect(checkBakeRun(input, r)).toEqual([]);
  });
});

describe('food safety deadlines (FDA Food Code §3-501.14)', () => {
  it('cool to 70 °F within 2 h and to 41 °F within 6 h of the pull', () => {
    // FDA Food Code §3-501.14: from 135 °F to 70 °F within 2 hours, to 41 °F or less within a total of 6 hours.
    const input = run([oven()], [tray('mild', 350, 20)]);
    const r = planBakeRun(input);
    const out = byId(r, 'mild').outMinute; // 12 + 20 = 32
    expect(out).toBe(32);
    const at = (kind: string) => r.events.find((e) => e.kind === kind && e.trayId === 'mild')!;
    expect(at('cooling-start')).toMatchObject({ minute: 32, tempF: 135 });
    expect(at('cool-to-70-by')).toMatchObject({ minute: 32 + 2 * 60, tempF: 70, at: '2026-12-06T10:32' });
    expect(at('fridge-41-by')).toMatchObject({ minute: 32 + 6 * 60, tempF: 41, at: '2026-12-06T14:32' });
    expect(at('fridge-41-by').source).toContain('3-501.14');
    expect(FOOD_CODE_COOLING).toMatchObject({ startF: 135, firstStageF: 70, firstStageMinutes: 120, finalF: 41, totalMinutes: 360 });
  });

  it('the first check names the internal temperature to reach', () => {
    // USDA FSIS Safe Minimum Internal Temperatures: egg dishes 160 °F.
    const input = run([oven()], [tray('eggs', 350, 25, { minInternalF: 160 })]);
    const r = planBakeRun(input);
    const check = r.events.find((e) => e.kind === 'first-check')!;
    expect(check).toMatchObject({ trayId: 'eggs', internalF: 160, minute: byId(r, 'eggs').outMinute });
  });
});

describe('run sheet details', () => {
  it('local times cross midnight', () => {
    expect(addLocalMinutes('2026-12-06T23:50', 25)).toBe('2026-12-07T00:15');
    expect(addLocalMinutes('2026-12-31T23:59', 1)).toBe('2027-01-01T00:00');
    const r = planBakeRun(run([oven()], [tray('t', 400, 10)], { start: '2026-12-06T23:50' }));
    // preheat 14 → in 00:04, out 00:14
    expect([byId(r, 't').inAt, byId(r, 't').outAt]).toEqual(['2026-12-07T00:04', '2026-12-07T00:14']);
  });

  it.each([
    ['upper', 1],
    ['middle', 2],
    ['lower', 3],
  ] as const)('rack preference %s → rack %i of 3', (pref, rack) => {
    const r = planBakeRun(run([oven({ racks: 3 })], [tray('t', 400, 10, { rackPreference: pref })]));
    expect(byId(r, 't').rack).toBe(rack);
  });

  it('hands-on tasks name the cook (1-based) and when they end', () => {
    const input = run([oven()], [tray('t', 400, 10, { handsOnMinutes: 7 })]);
    const r = planBakeRun(input);
    expect(r.events.find((e) => e.kind === 'hands-on-start')).toMatchObject({ minute: 0, cook: 1, untilAt: '2026-12-06T08:07' });
    // prep ends at 7, oven ready at 14: the tray waits 7 min.
    expect(byId(r, 't')).toMatchObject({ inMinute: 14, waitMinutes: 7 });
  });

  it('names the food-safety cautions', () => {
    const r = planBakeRun(run([oven()], [tray('t', 400, 10)]));
    expect(r.cautions.join(' ')).toContain('3-501.14');
    expect(r.cautions.join(' ')).toContain('local food code');
  });
});

describe('input errors', () => {
  it('a tray hotter than every oven is rejected with its path', () => {
    const input = run([oven({ maxF: 500 })], [tray('ok', 400, 10), tray('too-hot', 520, 10)]);
    expect(() => planBakeRun(input)).toThrow(BakeRunInputError);
    try {
      planBakeRun(input);
    } catch (e) {
      expect((e as BakeRunInputError).issues).toContainEqual(expect.objectContaining({ path: ['trays', 1, 'tempF'] }));
    }
  });

  it('a convection oven set 25 °F lower fits a tray the conventional one cannot', () => {
    // 520 − 25 = 495 ≤ 500 in the convection oven.
    const r = planBakeRun(run([oven({ name: 'Fan', convection: true })], [tray('hot', 520, 10)]));
    expect(byId(r, 'hot')).toMatchObject({ oven: 'Fan', tempF: 495 });
  });

  it.each([
    ['no ovens', { ovens: [] }, ['ovens']],
    ['no cooks', { cooks: 0 }, ['cooks']],
    ['bad start', { start: '2026-02-30T08:00' }, ['start']],
  ])('%s', (_, over, path) => {
    const input = { ...run([oven()], [tray('t', 400, 10)]), ...over } as BakeRunInput;
    expect(() => planBakeRun(input)).toThrow(BakeRunInputError);
    try {
      planBakeRun(input);
    } catch (e) {
      expect((e as BakeRunInputError).issues.map((i) => i.path)).toContainEqual(path);
    }
  });
});

describe('an oven already on when the run starts (the rest of a day planned again)', () => {
  // One place, heat 25 °F/min, cool 15 °F/min, a 350 °F tray of 20 min (±10 °F), nothing to prep. Worked by hand:
  //   on at 350: no change → in at 0, out at 20 (cold, it would preheat ceil(280/25) = 12 and end at 32);
  //   on at 425: cool 75/15 = 5 → in at 5, out at 25; the bound: reach 360 from 425 takes ceil(65/15) = 5, + 20 = 25;
  //   on at 300: heat 50/25 = 2 → in at 2, out at 22.
  const input = (startF?: number) => run([oven(startF === undefined ? {} : { startF })], [tray('mild', 350, 20)]);

  it.each([
    [350, 0, 20, 'stays'],
    [425, 5, 25, 'cools'],
    [300, 2, 22, 'heats'],
  ])('on at %i °F: in at minute %i, out at %i (it %s)', (startF, inMinute, outMinute) => {
    const r = planBakeRun(input(startF));
    expect(checkBakeRun(input(startF), r)).toEqual([]);
    expect([byId(r, 'mild').inMinute, byId(r, 'mild').outMinute]).toEqual([inMinute, outMinute]);
    // A change from where it is, never a preheat; the set point says where it came from.
    const first = r.events.find((e) => e.trayId === null)!;
    expect(first).toMatchObject({ kind: 'setpoint-change', minute: 0, fromF: startF, tempF: 350 });
    expect(r.events.some((e) => e.kind === 'preheat')).toBe(false);
    expect(r.ovens[0].setPoints[0]).toMatchObject({ tempF: 350, fromF: startF, changeMinute: 0, readyMinute: inMinute });
    expect(r.lowerBoundMinutes).toBeLessThanOrEqual(r.sessionMinutes);
  });

  it('the bound counts the cooling of a hot oven (on at 425: 5 + 20 = 25, the plan is the shortest)', () => {
    const r = planBakeRun(input(425));
    expect(r.lowerBoundMinutes).toBe(25);
    expect(r.provenOptimal).toBe(true);
  });

  it('cold, the same tray is preheated (unchanged): in at 12, out at 32', () => {
    const r = planBakeRun(input());
    expect([byId(r, 'mild').inMinute, byId(r, 'mild').outMinute]).toEqual([12, 32]);
    expect(r.events[0]).toMatchObject({ kind: 'preheat', tempF: 350 });
  });

  it('an oven cannot start above its maximum (400 naming ovens.0.startF)', () => {
    expect(() => planBakeRun(run([oven({ startF: 600 })], [tray('mild', 350, 20)]))).toThrow(BakeRunInputError);
    try {
      planBakeRun(run([oven({ startF: 600 })], [tray('mild', 350, 20)]));
    } catch (e) {
      expect((e as BakeRunInputError).issues.map((i) => i.path)).toContainEqual(['ovens', 0, 'startF']);
    }
  });
});
