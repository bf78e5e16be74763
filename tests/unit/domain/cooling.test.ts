/**
 * The cooling record against FDA Food Code §3-501.14 (../shared/reference/published-values.md §6: cooked food from
 * 135 °F to 70 °F within 2 hours, and to 41 °F or less within a total of 6 hours; adopted verbatim in the Delaware and
 * Oklahoma codes). The clock starts when the tray comes out (earlier than 135 °F: the safe side). What to do when a
 * stage is missed (reheat to 165 °F and cool again, or throw away) is common practice, from memory: checked only for
 * being said, with the local code deciding. Times and readings are made-up kitchen numbers.
 */
import { describe, expect, it } from 'vitest';
import { checkCooling, clockFrom, coolingResult, eventsWithCooling, FOOD_CODE_COOLING, notWrittenDown, WRITE_DOWN_AFTER_MINUTES, type CoolingEntry } from '@shared/domain/cooling';
import { planBakeRun } from '@shared/domain/bake-run';
import type { BakeRunInput } from '@shared/domain/bake-run-types';
import { celsiusToFahrenheit } from '@shared/domain/temperature';
import { DEFAULT_CLOCK } from '@shared/domain/clock';

const entry = (over: Partial<CoolingEntry> = {}): CoolingEntry => ({ outAt: '2026-01-04T10:10', restartedAt: null, readings: [], discarded: false, ...over });
const at = (hhmm: string) => `2026-01-04T${hhmm}`;

describe('the Food Code cooling stages', () => {
  it('uses the Food Code limits: 70 °F in 2 h, 41 °F in 6 h in total', () => {
    expect(FOOD_CODE_COOLING).toMatchObject({ startF: 135, firstStageF: 70, firstStageMinutes: 120, finalF: 41, totalMinutes: 360 });
  });

  it('counts both deadlines from the time out, and says them in °F and °C', () => {
    const c = checkCooling(entry(), at('10:40'));
    expect(c).toMatchObject({ state: 'to-70', tone: 'ok', from: at('10:10'), by70: at('12:10'), by41: at('16:10'), reached70At: null });
    // 70 °F = 21.1 °C and 41 °F = 5 °C (NIST SP 811), rounded to whole degrees as the Food Code prints them.
    expect(c.said).toBe('Cool to 70 °F (21 °C) or below by 12:10, then to 41 °F (5 °C) or below by 16:10.');
  });

  it('a reading at or below 70 °F by 2 hours meets the first stage; at or below 41 °F by 6 hours, the second', () => {
    const first = checkCooling(entry({ readings: [{ at: at('11:00'), tempF: 95 }, { at: at('12:10'), tempF: 70 }] }), at('12:30'));
    expect(first).toMatchObject({ state: 'to-41', reached70At: at('12:10') });
    expect(first.said).toContain('Next: 41 °F (5 °C) or below by 16:10');
    // Readings in °C as a thermometer shows them: 21 °C = 69.8 °F, 4.5 °C = 40.1 °F.
    const readings = [
      { at: at('11:40'), tempF: celsiusToFahrenheit(21).toNumber() },
      { at: at('16:10'), tempF: celsiusToFahrenheit(4.5).toNumber() },
    ];
    const done = checkCooling(entry({ readings }), at('18:00'));
    expect(done).toMatchObject({ state: 'cooled', tone: 'ok', reached70At: at('11:40'), reached41At: at('16:10') });
    expect(done.said).toBe('Cooled in time: 70 °F (21 °C) reached by 11:40, 41 °F (5 °C) by 16:10.');
  });

  it('misses the first stage when 2 hours pass above 70 °F, and a later reading does not mend it', () => {
    const late = checkCooling(entry({ readings: [{ at: at('12:00'), tempF: 74 }] }), at('12:11'));
    expect(late).toMatchObject({ state: 'missed-70', tone: 'block' });
    expect(late.said).toContain('Not at 70 °F (21 °C) by 12:10');
    expect(late.said).toContain('Reheat it to 165 °F (74 °C) and start cooling again, or throw it away');
    expect(late.said).toContain('your local food code decides');
    // Still on time one minute before the deadline.
    expect(checkCooling(entry({ readings: [{ at: at('12:00'), tempF: 74 }] }), at('12:10')).state).toBe('to-70');
    const mended = checkCooling(entry({ readings: [{ at: at('12:11'), tempF: 60 }] }), at('12:11'));
    expect(mended.state).toBe('missed-70');
  });

  it('misses the second stage when 6 hours pass above 41 °F', () => {
    const c = checkCooling(entry({ readings: [{ at: at('11:30'), tempF: 68 }, { at: at('16:00'), tempF: 45 }] }), at('16:11'));
    expect(c).toMatchObject({ state: 'missed-41', tone: 'block', reached70At: at('11:30') });
    expect(c.said).toContain('Not at 41 °F (5 °C) by 16:10');
    expect(c.said).toContain('throw it away');
  });

  it('cooling started again after a reheat counts from the restart, ignoring the readings before it; a second miss is thrown away', () => {
    const readings = [
      { at: at('12:00'), tempF: 80 },
      { at: at('13:30'), tempF: 69 },
    ];
    const c = checkCooling(entry({ restartedAt: at('12:30'), readings }), at('13:40'));
    expect(c).toMatchObject({ state: 'to-41', from: at('12:30'), by70: at('14:30'), by41: at('18:30'), reached70At: at('13:30') });
    const again = checkCooling(entry({ restartedAt: at('12:30'), readings: [{ at: at('14:00'), tempF: 90 }] }), at('14:31'));
    expect(again.state).toBe('missed-70');
    expect(again.said).toContain('reheated once already: throw it away');
  });

  it('a deadline past midnight says the next day; a tray thrown away has no deadline left', () => {
    const evening = checkCooling(entry({ outAt: at('20:30') }), at('20:40'));
    expect(evening.by41).toBe('2026-01-05T02:30');
    expect(evening.said).toContain('by 02:30 the next day');
    expect(clockFrom('2026-01-04T22:30', at('20:30'))).toBe('22:30');
    expect(checkCooling(entry({ discarded: true }), at('12:11'))).toMatchObject({ state: 'discarded', tone: 'info' });
  });
});

describe('the cooling log’s one-line result', () => {
  it('says where each record ended or stands, in both scales, with the deadline it is about', () => {
    const said = (e: CoolingEntry, now: string) => coolingResult(checkCooling(e, now));
    expect(said(entry(), at('10:40'))).toBe('No reading at 70 °F (21 °C) yet (due by 12:10)');
    expect(said(entry({ readings: [{ at: at('11:00'), tempF: 68 }] }), at('11:00'))).toBe('70 °F (21 °C) reached; no reading at 41 °F (5 °C) yet (due by 16:10)');
    expect(said(entry({ readings: [{ at: at('11:00'), tempF: 68 }, { at: at('15:00'), tempF: 40 }] }), at('15:00'))).toBe('Cooled in time');
    expect(said(entry(), at('12:11'))).toBe('Missed: not at 70 °F (21 °C) by 12:10');
    expect(said(entry({ readings: [{ at: at('11:00'), tempF: 68 }] }), at('16:11'))).toBe('Missed: not at 41 °F (5 °C) by 16:10');
    expect(said(entry({ discarded: true }), at('12:11'))).toBe('Thrown away');
    expect(coolingResult(checkCooling(entry({ outAt: at('20:30') }), at('20:40')))).toBe('No reading at 70 °F (21 °C) yet (due by 22:30)');
  });
});

describe('the cooling deadlines across a daylight-time change, in the kitchen’s zone', () => {
  // The Food Code counts hours of real time. The nights worked by hand from the legal rules (15 U.S.C. §260a: in 2026
  // the US falls back at 2:00 on Nov 1 and springs forward at 2:00 on Mar 8; see tests/unit/domain/time-zone.test.ts).
  const zone = 'America/Chicago';
  const night = (over: Partial<CoolingEntry>) => entry({ outAt: '2026-10-31T23:30', ...over });

  it('falls back: a tray out at 23:30 must be at 41 °F by 04:30, not the calendar’s 05:30', () => {
    const c = checkCooling(night({}), '2026-10-31T23:40', DEFAULT_CLOCK, zone);
    expect(c).toMatchObject({ state: 'to-70', by70: '2026-11-01T01:30', by41: '2026-11-01T04:30' });
    expect(c.said).toContain('41 °F (5 °C) or below by 04:30 the next day');
    expect(c.said).toContain('The clocks change in between: the deadlines are 2 and 6 hours of real time.');
    // Without the zone, the calendar reading (an hour too late that night).
    expect(checkCooling(night({}), '2026-10-31T23:40').by41).toBe('2026-11-01T05:30');
    // At 04:31 (10:31Z) with 70 °F met and no 41 °F reading: missed, judged from the instant the watch reads.
    const readings = [{ at: '2026-11-01T00:50', tempF: 65 }];
    expect(checkCooling(night({ readings }), new Date('2026-11-01T10:31:00Z'), DEFAULT_CLOCK, zone).state).toBe('missed-41');
    expect(checkCooling(night({ readings }), new Date('2026-11-01T10:30:00Z'), DEFAULT_CLOCK, zone).state).toBe('to-41');
    // A reading at 04:45 is after the real deadline: it does not meet the stage.
    const late = checkCooling(night({ readings: [...readings, { at: '2026-11-01T04:45', tempF: 40 }] }), '2026-11-01T04:45', DEFAULT_CLOCK, zone);
    expect(late.state).toBe('missed-41');
    expect(checkCooling(night({ readings: [...readings, { at: '2026-11-01T04:45', tempF: 40 }] }), '2026-11-01T04:45').state).toBe('cooled');
  });

  it('springs forward: a tray out at 23:30 has until 06:30 (the calendar’s 05:30 would be an hour early)', () => {
    const c = checkCooling(entry({ outAt: '2026-03-07T23:30' }), '2026-03-07T23:40', DEFAULT_CLOCK, zone);
    expect(c).toMatchObject({ by70: '2026-03-08T01:30', by41: '2026-03-08T06:30' });
    const readings = [{ at: '2026-03-08T01:00', tempF: 60 }, { at: '2026-03-08T06:15', tempF: 40 }];
    expect(checkCooling(entry({ outAt: '2026-03-07T23:30', readings }), '2026-03-08T06:20', DEFAULT_CLOCK, zone).state).toBe('cooled');
  });

  it('a day with no change reads the same with and without the zone', () => {
    const readings = [{ at: at('11:30'), tempF: 68 }, { at: at('16:00'), tempF: 45 }];
    expect(checkCooling(entry(), at('10:40'), DEFAULT_CLOCK, zone).said).not.toContain('clocks change');
    for (const now of [at('10:40'), at('12:11'), at('16:11')]) {
      expect(checkCooling(entry({ readings }), now, DEFAULT_CLOCK, zone)).toEqual(checkCooling(entry({ readings }), now));
    }
  });

  it('an instant without a zone is refused (it has no wall clock to be read on)', () => {
    expect(() => checkCooling(entry(), new Date('2026-01-04T16:00:00Z'))).toThrow(RangeError);
  });
});

describe('the run’s steps with the cooling record', () => {
  const input: BakeRunInput = {
    start: at('08:00'),
    cooks: 1,
    ambientF: 70,
    ovens: [{ name: 'Left', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 }],
    trays: [
      { id: '1-1', name: 'Slab (1/2)', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 },
      { id: '1-2', name: 'Slab (2/2)', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 },
    ],
  };
  const run = planBakeRun(input);
  const kinds = (id: string, events = run.events) => events.filter((e) => e.trayId === id).map((e) => `${e.kind}@${e.at.slice(11)}`);

  it('a tray written down as out loses its planned check and time out; its deadlines count from when it came out', () => {
    const planned = run.trays.find((t) => t.id === '1-1')!;
    const out = '2026-01-04T08:31';
    expect(planned.outAt).not.toBe(out);
    const events = eventsWithCooling(run, [{ runTrayId: '1-1', ...entry({ outAt: out }) }], at('08:40'));
    expect(kinds('1-1', events).filter((k) => /check|tray-out|cool|fridge/.test(k))).toEqual(['cool-to-70-by@10:31', 'fridge-41-by@14:31']);
    // The other tray keeps its planned steps; every step's minute agrees with its time; in time order.
    expect(kinds('1-2', events)).toEqual(kinds('1-2'));
    for (const e of events) expect(e.minute).toBe((Date.parse(`${e.at}Z`) - Date.parse(`${run.start}Z`)) / 60_000);
    expect(events.map((e) => e.minute)).toEqual([...events.map((e) => e.minute)].sort((a, b) => a - b));
  });

  it('a tray at 70 °F keeps only the 41 °F deadline; cooled or thrown away, none', () => {
    const r = (over: Partial<CoolingEntry>) => ({ runTrayId: '1-1', ...entry({ outAt: at('08:40'), ...over }) });
    const at70 = eventsWithCooling(run, [r({ readings: [{ at: at('10:00'), tempF: 65 }] })], at('10:05'));
    expect(kinds('1-1', at70).filter((k) => k.startsWith('cool') || k.startsWith('fridge'))).toEqual(['fridge-41-by@14:40']);
    const cooled = eventsWithCooling(run, [r({ readings: [{ at: at('10:00'), tempF: 65 }, { at: at('13:00'), tempF: 40 }] })], at('13:05'));
    expect(kinds('1-1', cooled).filter((k) => /cool|fridge|check|tray-out/.test(k))).toEqual([]);
    const gone = eventsWithCooling(run, [r({ discarded: true })], at('10:05'));
    expect(kinds('1-1', gone).filter((k) => /cool|fridge|check|tray-out/.test(k))).toEqual([]);
  });
});

describe('trays due out that the cooling record does not have', () => {
  // The 5-minute grace is common practice (no source): a check can keep a tray in a little longer than planned.
  const trays = [
    { id: '2-1', outMinute: 41 },
    { id: '1-1', outMinute: 33 },
    { id: '1-2', outMinute: 33 },
    { id: '3-1', outMinute: 65 },
  ];

  it('names the trays planned out at least the grace ago and not written down, by planned time out', () => {
    expect(WRITE_DOWN_AFTER_MINUTES).toBe(5);
    // 08:50 on a run from 08:00: trays planned out at 08:33 and 08:41 are due; the 09:05 one is not.
    expect(notWrittenDown(trays, [], 50).map((t) => t.id)).toEqual(['1-1', '1-2', '2-1']);
    expect(notWrittenDown(trays, [{ runTrayId: '1-2' }], 50).map((t) => t.id)).toEqual(['1-1', '2-1']);
  });

  it('leaves a tray alone until the grace has passed, and asks nothing once every tray due is written down', () => {
    expect(notWrittenDown(trays, [], 37).map((t) => t.id)).toEqual([]);
    expect(notWrittenDown(trays, [], 38).map((t) => t.id)).toEqual(['1-1', '1-2']);
    expect(notWrittenDown(trays, [{ runTrayId: '1-1' }, { runTrayId: '1-2' }, { runTrayId: '2-1' }], 60)).toEqual([]);
    // A record of a tray no longer in the run does not stand in for one that is.
    expect(notWrittenDown(trays, [{ runTrayId: '9-1' }], 40).map((t) => t.id)).toEqual(['1-1', '1-2']);
  });
});
