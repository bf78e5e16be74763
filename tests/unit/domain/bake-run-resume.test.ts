/**
 * A run planned again part-way through prep day: the trays already out stay as planned, the rest is planned from a
 * later time, and the two read as one day's plan. The fixtures are made-up kitchen numbers (common practice, no
 * source); what is checked is that the joined plan keeps every planned time, counts every minute from the day's
 * start, and keeps the kept trays' cooling deadlines (FDA Food Code §3-501.14: 2 h to 70 °F, 6 h to 41 °F).
 */
import { describe, expect, it } from 'vitest';
import { FOOD_CODE_COOLING, planBakeRun } from '@shared/domain/bake-run';
import { resolveBakeRunRules } from '@shared/domain/bake-run-model';
import { minutesBetween, movedOut, ovensAt, resumeRun, takeDone } from '@shared/domain/bake-run-resume';
import { addLocalMinutes } from '@shared/domain/bake-run-time';
import { replannedSummary } from '@shared/domain/bake-run-words';
import type { BakeOven, BakeRunInput, BakeRunResult, BakeTray } from '@shared/domain/bake-run-types';
import { checkBakeRun } from './bake-run-check';

const oven = (name: string): BakeOven => ({ name, racks: 1, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 });
const tray = (id: string, tempF: number, minMinutes: number): BakeTray => ({ id, name: id, tempF, minMinutes, maxMinutes: minMinutes + 5, handsOnMinutes: 5 });

const day: BakeRunInput = {
  start: '2026-01-04T08:00',
  cooks: 2,
  ambientF: 70,
  ovens: [oven('Left'), oven('Right')],
  trays: [tray('slab-1', 350, 25), tray('slab-2', 350, 25), tray('radish', 425, 20), tray('crackers', 325, 30)],
};

/** Every minute of a plan agrees with its local reading, counted from the plan's start; events in time order. */
function consistent(run: BakeRunResult): string[] {
  const wrong: string[] = [];
  const m = (at: string) => minutesBetween(run.start, at);
  run.events.forEach((e, k) => {
    if (m(e.at) !== e.minute) wrong.push(`event ${k} ${e.kind} at ${e.at} ≠ minute ${e.minute}`);
    if (k > 0 && e.minute < run.events[k - 1].minute) wrong.push(`event ${k} out of order`);
  });
  for (const t of run.trays) {
    if (m(t.inAt) !== t.inMinute || m(t.outAt) !== t.outMinute || m(t.pullByAt) !== t.pullByMinute) wrong.push(`tray ${t.id} minutes`);
    if (t.prep && (m(t.prep.startAt) !== t.prep.startMinute || m(t.prep.endAt) !== t.prep.endMinute)) wrong.push(`tray ${t.id} prep minutes`);
    if (run.ovens[t.ovenIndex]?.name !== t.oven) wrong.push(`tray ${t.id} oven index`);
  }
  for (const o of run.ovens)
    for (const sp of o.setPoints)
      if (m(sp.changeAt) !== sp.changeMinute || m(sp.readyAt) !== sp.readyMinute || m(sp.endAt) !== sp.endMinute) wrong.push(`${o.name} set point minutes`);
  if (addLocalMinutes(run.start, run.sessionMinutes) !== run.endAt) wrong.push('endAt');
  return wrong;
}

describe('planning the rest of a prep day again', () => {
  const whole = planBakeRun(day);
  const first = [...whole.trays].sort((a, b) => a.outMinute - b.outMinute)[0];
  const from = addLocalMinutes(day.start, first.outMinute + 3);
  const kept = { from, ...takeDone(whole, [first.id]) };
  // The oven the first tray used fails after it came out: the rest goes into the other one, from `from`.
  const restInput: BakeRunInput = { ...day, start: from, ovens: day.ovens.filter((o) => o.name !== first.oven), trays: day.trays.filter((t) => t.id !== first.id) };
  const rest = planBakeRun(restInput);
  const joined = resumeRun(day.start, kept, rest, rest.rules);

  it('the rest alone is a valid plan of the model (the independent checker)', () => {
    expect(checkBakeRun(restInput, rest)).toEqual([]);
  });

  it('keeps the tray already out as it was planned and every tray of the rest as the rest planned it', () => {
    const byId = new Map(joined.trays.map((t) => [t.id, t]));
    expect(byId.get(first.id)).toMatchObject({ inAt: first.inAt, outAt: first.outAt, oven: first.oven, rack: first.rack, inMinute: first.inMinute });
    for (const t of rest.trays) expect(byId.get(t.id)).toMatchObject({ inAt: t.inAt, outAt: t.outAt, oven: t.oven, inMinute: minutesBetween(day.start, t.inAt) });
    expect(joined.trays).toHaveLength(day.trays.length);
  });

  it('counts every minute from the day’s start, in time order', () => {
    expect(joined.start).toBe(day.start);
    expect(consistent(joined)).toEqual([]);
    expect(joined.sessionMinutes).toBe(minutesBetween(day.start, rest.endAt));
  });

  it('keeps the kept tray’s cooling deadlines: 2 h and 6 h after it came out (FDA Food Code §3-501.14)', () => {
    const deadlines = joined.events.filter((e) => e.trayId === first.id && (e.kind === 'cool-to-70-by' || e.kind === 'fridge-41-by'));
    expect(deadlines.map((e) => [e.kind, e.at])).toEqual([
      ['cool-to-70-by', addLocalMinutes(first.outAt, 120)],
      ['fridge-41-by', addLocalMinutes(first.outAt, 360)],
    ]);
    expect(FOOD_CODE_COOLING).toMatchObject({ firstStageMinutes: 120, totalMinutes: 360 });
  });

  it('the oven that failed keeps a lane for the tray it baked, with no set point after', () => {
    const down = joined.ovens.find((o) => o.name === first.oven);
    expect(down).toEqual({ name: first.oven, setPoints: [] });
    expect(joined.ovens.map((o) => o.name)).toEqual([...rest.ovens.map((o) => o.name), first.oven]);
  });

  it('the lower bound is the rest’s, counted from when the rest starts; the words say what was kept', () => {
    const offset = minutesBetween(day.start, from);
    expect(joined.lowerBoundMinutes).toBe(offset + rest.lowerBoundMinutes);
    expect(joined.sessionMinutes).toBeGreaterThanOrEqual(joined.lowerBoundMinutes);
    expect(joined.cautions[0]).toBe(
      `Planned again from ${from.slice(11)}: 1 tray already out is kept as planned (their cooling deadlines still run); 3 trays are planned from then, each oven from cold (one still hot is ready sooner).`,
    );
    expect(joined.cautions.slice(1)).toEqual(rest.cautions);
  });

  it('with every tray out, the day is what was planned for them, nothing left to plan', () => {
    const all = resumeRun(day.start, { from: whole.endAt, ...takeDone(whole, whole.trays.map((t) => t.id)) }, null, resolveBakeRunRules());
    expect(all.trays.map((t) => [t.id, t.inAt, t.outAt])).toEqual(whole.trays.map((t) => [t.id, t.inAt, t.outAt]));
    expect(all.sessionMinutes).toBe(whole.sessionMinutes);
    expect(all.events.filter((e) => e.kind === 'fridge-41-by')).toHaveLength(4);
    expect(all.events.some((e) => e.trayId === null)).toBe(false);
    expect(consistent(all)).toEqual([]);
    expect(all).toMatchObject({ lowerBoundMinutes: whole.sessionMinutes, gapPct: 0, provenOptimal: false });
    expect(all.cautions[0]).toMatch(/^Every tray is out of the oven: 4 trays already out are kept as planned/);
  });

  it('knows which ovens are at a set point at a time: ready, and not past the last tray of it', () => {
    const left = whole.ovens.find((o) => o.setPoints.length)!;
    const sp = left.setPoints[0];
    expect(ovensAt(whole, sp.readyAt)).toMatchObject({ [left.name]: sp.tempF });
    expect(ovensAt(whole, sp.endAt)).toMatchObject({ [left.name]: sp.tempF });
    // Before it is ready (preheating or changing) it is on its way there: below the set point, above the kitchen.
    if (sp.changeMinute < sp.readyMinute) {
      const warming = ovensAt(whole, addLocalMinutes(sp.readyAt, -1))[left.name];
      expect(warming).toBeGreaterThan(70);
      expect(warming).toBeLessThan(sp.tempF);
    }
    // Past its last set point it is done (switched off or cooling): not counted as on.
    const last = left.setPoints[left.setPoints.length - 1];
    expect(ovensAt(whole, addLocalMinutes(last.endAt, 1))[left.name]).toBeUndefined();
  });

  it('reads an oven part-way through a preheat or a change off the plan’s straight line (worked by hand)', () => {
    // One oven heating 25 °F a minute from a 70 °F kitchen: 350 °F takes ceil(280 / 25) = 12 minutes (08:00–08:12);
    // raising 350 → 425 °F takes 75 / 25 = 3 minutes. Made-up kitchen numbers (common practice, no source).
    const one = planBakeRun({
      start: '2026-01-04T08:00',
      cooks: 1,
      ambientF: 70,
      ovens: [oven('Left')],
      trays: [{ ...tray('slab', 350, 14), handsOnMinutes: 0 }, { ...tray('radish', 425, 14), handsOnMinutes: 0 }],
      rules: { crowdingPerExtraTray: 0 },
    });
    const [low, high] = one.ovens[0].setPoints;
    expect([low.tempF, low.changeAt, low.readyAt]).toEqual([350, '2026-01-04T08:00', '2026-01-04T08:12']);
    // Six minutes into the preheat: 70 + 280 × 6 / 12 = 210 °F.
    expect(ovensAt(one, '2026-01-04T08:06')).toEqual({ Left: 210 });
    expect(high.tempF).toBe(425);
    expect(minutesBetween(high.changeAt, high.readyAt)).toBe(3);
    // One minute into the change: 350 + 75 × 1 / 3 = 375 °F; two minutes: 400 °F.
    expect(ovensAt(one, addLocalMinutes(high.changeAt, 1))).toEqual({ Left: 375 });
    expect(ovensAt(one, addLocalMinutes(high.changeAt, 2))).toEqual({ Left: 400 });
    // A warmer kitchen preheats from higher: 90 + 260 × 6 / 12 = 220 °F.
    expect(ovensAt(one, '2026-01-04T08:06', 90)).toEqual({ Left: 220 });
  });

  it('says which ovens start the rest hot', () => {
    const hot = resumeRun(day.start, { ...kept, ovenF: { Right: 350 } }, rest, rest.rules);
    expect(hot.cautions[0]).toMatch(/planned from then, Right from 350 °F \(177 °C\) \(on at that time\), any other oven from cold\.$/);
  });

  it('moves a kept tray that came out at another time: its out, check and cooling steps, not its prep or its time in', () => {
    const later = addLocalMinutes(first.outAt, 6);
    const moved = movedOut(kept, first.id, later);
    const tray = moved.trays.find((t) => t.id === first.id)!;
    expect(tray).toMatchObject({ inAt: first.inAt, outAt: later, outMinute: first.outMinute + 6, bakeMinutes: first.bakeMinutes + 6 });
    const at = (kind: string) => moved.events.find((e) => e.trayId === first.id && e.kind === kind)?.at;
    expect([at('tray-in'), at('tray-out'), at('cool-to-70-by'), at('fridge-41-by')]).toEqual([
      first.inAt,
      later,
      addLocalMinutes(later, 120),
      addLocalMinutes(later, 360),
    ]);
    // The same time again changes nothing; an unknown tray leaves it as it is.
    expect(movedOut(moved, first.id, later)).toEqual(moved);
    expect(movedOut(kept, 'nope', later)).toBe(kept);
    // Joined into the day, the minutes agree with the readings.
    expect(consistent(resumeRun(day.start, { from, ...moved }, rest, rest.rules))).toEqual([]);
  });

  it('says in words what a day planned again is (the page and the run sheet)', () => {
    expect(replannedSummary('2026-01-04T09:18', 7, 10)).toBe('7 trays already out are kept as planned, with their cooling deadlines; the 3 still to bake are planned from 09:18');
    expect(replannedSummary('2026-01-04T08:40', 1, 2)).toBe('one tray already out is kept as planned, with their cooling deadlines; the one tray still to bake is planned from 08:40');
    expect(replannedSummary('2026-01-04T09:20', 2, 2)).toBe('2 trays already out are kept as planned, with their cooling deadlines; every tray is out');
  });

  it('counts minutes across midnight (a run that goes on past it)', () => {
    expect(minutesBetween('2026-01-04T23:50', '2026-01-05T00:10')).toBe(20);
    expect(() => minutesBetween('2026-01-04T23:50', 'midnight')).toThrow(RangeError);
  });
});
