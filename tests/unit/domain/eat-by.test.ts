import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  CAUTIONS,
  COOLING,
  FREEZER_MAX_C,
  FREEZER_MAX_F,
  FRIDGE_MAX_C,
  FRIDGE_MAX_F,
  HOT_DAY_ROOM_TEMP_MAX_HOURS,
  HOT_DAY_THRESHOLD_C,
  HOT_DAY_THRESHOLD_F,
  REHEAT_HOLD_SECONDS,
  REHEAT_MIN_C,
  REHEAT_MIN_F,
  ROOM_TEMP_MAX_HOURS,
  STORAGE_DEFAULTS,
  THAWED_EAT_WITHIN_DAYS,
  eatByDate,
  eatByRemedies,
  freezeRemedy,
  thawTasks,
  otherPrepDateRemedy,
  portionStatus,
  supplyingPrepDate,
  type FoodCategory,
} from '@shared/domain/eat-by';
import { addDays, dateWithYear, dayHeading, daysBetween, DEFAULT_DATE_ORDER, isIsoDate, longDate, shortDate, toDateOrder, weekdayOf } from '@shared/domain/iso-date';

// convert-units (general-purpose npm library, no type declarations) as the outside °F → °C reference.
const require = createRequire(import.meta.url);
const convert = require('convert-units') as (value: number) => { from(unit: string): { to(unit: string): number } };
const fToC = (f: number) => convert(f).from('F').to('C');

describe('food-safety constants', () => {
  it.each([
    // USDA FSIS Cold Food Storage chart: "Refrigerator (40 °F or below) Freezer (0 °F or below)"
    { what: 'refrigerator', f: FRIDGE_MAX_F, c: FRIDGE_MAX_C, expectedF: 40 },
    { what: 'freezer', f: FREEZER_MAX_F, c: FREEZER_MAX_C, expectedF: 0 },
    // FDA Food Code §3-403.11: all parts to 165 °F (74 °C)
    { what: 'reheat', f: REHEAT_MIN_F, c: REHEAT_MIN_C, expectedF: 165 },
    // FDA Food Code §3-501.14: 135 °F (57 °C) → 70 °F (21 °C) → 41 °F (5 °C)
    { what: 'cooling start', f: COOLING.startF, c: COOLING.startC, expectedF: 135 },
    { what: 'cooling stage one', f: COOLING.stageOneEndF, c: COOLING.stageOneEndC, expectedF: 70 },
    { what: 'cooling final', f: COOLING.finalMaxF, c: COOLING.finalMaxC, expectedF: 41 },
    // USDA FSIS "Danger Zone": 1 hour above 90 °F (32 °C)
    { what: 'hot day', f: HOT_DAY_THRESHOLD_F, c: HOT_DAY_THRESHOLD_C, expectedF: 90 },
  ])('$what: $expectedF °F, and its °C is the whole-degree conversion (checked with convert-units)', ({ f, c, expectedF }) => {
    expect(f).toBe(expectedF);
    expect(c).toBe(Math.round(fToC(f)));
  });

  it('times: cooling 2 h / 6 h (Food Code §3-501.14), reheat hold 15 s (§3-403.11), 2-hour / 1-hour rule (USDA FSIS)', () => {
    expect([COOLING.stageOneMaxHours, COOLING.totalMaxHours]).toEqual([2, 6]);
    expect(REHEAT_HOLD_SECONDS).toBe(15);
    expect([ROOM_TEMP_MAX_HOURS, HOT_DAY_ROOM_TEMP_MAX_HOURS]).toEqual([2, 1]);
  });
});

describe('STORAGE_DEFAULTS against USDA FSIS FoodKeeper / Cold Food Storage chart (published-values §6b)', () => {
  const published: { category: FoodCategory; fridgeDays: [number, number]; freezerMonths: [number, number] }[] = [
    { category: 'egg-dish', fridgeDays: [3, 4], freezerMonths: [2, 3] }, // FoodKeeper, egg dishes after baking
    { category: 'cooked-meat-poultry', fridgeDays: [3, 4], freezerMonths: [2, 6] }, // Cold Food Storage chart
    { category: 'leftovers-meat-fish-egg', fridgeDays: [3, 4], freezerMonths: [2, 3] }, // FoodKeeper
    { category: 'cooked-vegetables', fridgeDays: [3, 4], freezerMonths: [1, 2] }, // FoodKeeper, leftovers without meat/egg
    { category: 'casserole', fridgeDays: [3, 4], freezerMonths: [2, 3] }, // FoodKeeper 3–4 d; freezer: assumption (leftovers rule)
    { category: 'soup-stew', fridgeDays: [3, 4], freezerMonths: [2, 3] }, // FoodKeeper / Cold Food Storage chart
  ];

  it('covers exactly the tabulated categories', () => {
    expect(Object.keys(STORAGE_DEFAULTS).sort()).toEqual(published.map((p) => p.category).sort());
  });

  it.each(published)('$category: fridge $fridgeDays days, freezer $freezerMonths months', ({ category, fridgeDays, freezerMonths }) => {
    const d = STORAGE_DEFAULTS[category];
    expect(d.fridgeDaysRange).toEqual(fridgeDays);
    expect(d.freezerMonthsRange).toEqual(freezerMonths);
    // Default = upper end of the range, and never above the suggested planner rule of 4 days (§6b).
    expect(d.fridgeDays).toBe(fridgeDays[1]);
    expect(d.fridgeDays).toBeLessThanOrEqual(4);
    // Freezer default in weeks stays inside the lower end even for the shortest month (28 days).
    expect(d.freezerWeeks * 7).toBeLessThanOrEqual(freezerMonths[0] * 28);
    expect(d.freezerWeeks).toBeGreaterThan(0);
    expect(d.source).toMatch(/USDA FSIS/);
  });
});

describe('eat-by date: prep date is day 0, eat-by = prep + fridge days', () => {
  // Weekdays and day sums checked with GNU date (`date -u -d '2025-01-05 +4 days' +%F-%A`).
  it.each([
    { prep: '2025-01-05', days: 4, eatBy: '2025-01-09', weekday: 4, note: 'Sunday → Thursday (egg dish, FoodKeeper 3–4 d)' },
    { prep: '2025-03-09', days: 4, eatBy: '2025-03-13', weekday: 4, note: 'across the US daylight-saving start' },
    { prep: '2025-10-26', days: 4, eatBy: '2025-10-30', weekday: 4, note: 'across the EU daylight-saving end' },
    { prep: '2024-02-26', days: 4, eatBy: '2024-03-01', weekday: 5, note: 'across 29 February (leap year)' },
    { prep: '2024-12-29', days: 4, eatBy: '2025-01-02', weekday: 4, note: 'across the new year' },
    { prep: '2025-01-05', days: 0, eatBy: '2025-01-05', weekday: 0, note: 'same day only' },
  ])('$note: $prep + $days → $eatBy', ({ prep, days, eatBy, weekday }) => {
    expect(eatByDate(prep, days)).toBe(eatBy);
    expect(weekdayOf(eatBy)).toBe(weekday);
  });

  it('2025-01-05 is a Sunday (calendar, GNU date)', () => {
    expect(weekdayOf('2025-01-05')).toBe(0);
  });

  it('adding then measuring days round-trips for any date and count', () => {
    fc.assert(
      fc.property(fc.date({ min: new Date('1970-01-01'), max: new Date('2100-12-31'), noInvalidDate: true }), fc.integer({ min: -800, max: 800 }), (d, n) => {
        const iso = d.toISOString().slice(0, 10);
        const moved = addDays(iso, n);
        expect(isIsoDate(moved)).toBe(true);
        expect(daysBetween(iso, moved)).toBe(n);
      }),
    );
  });

  // Plan dates run from 1900 to 2999 (common practice for this app, no source: far from year 9999, where adding days
  // would leave four-digit years).
  it.each(['2025-02-30', '2025-13-01', '25-01-05', '2025-1-5', '', '9999-12-31', '0000-01-01', '1899-12-31', '3000-01-01'])('rejects %s', (bad) => {
    expect(() => eatByDate(bad, 4)).toThrow(RangeError);
  });

  it.each([-1, 1.5])('rejects fridge days %s', (days) => {
    expect(() => eatByDate('2025-01-05', days)).toThrow(RangeError);
  });
});

describe('portionStatus (egg dish, 4 fridge days, prepped Sunday 2025-01-05)', () => {
  it.each([
    { planned: '2025-01-04', status: 'before-prep', dayIndex: -1 },
    { planned: '2025-01-05', status: 'ok', dayIndex: 0 },
    { planned: '2025-01-09', status: 'ok', dayIndex: 4 }, // last day: FoodKeeper upper end, "discard after day 4"
    { planned: '2025-01-10', status: 'past-eat-by', dayIndex: 5 },
  ])('$planned → $status (day $dayIndex)', ({ planned, status, dayIndex }) => {
    const r = portionStatus({ plannedDate: planned, prepDate: '2025-01-05', fridgeDays: STORAGE_DEFAULTS['egg-dish'].fridgeDays });
    expect(r).toEqual({ status, dayIndex, eatBy: '2025-01-09' });
  });
});

describe('supplyingPrepDate', () => {
  const week = ['2025-01-08', '2025-01-05']; // order does not matter
  it.each([
    { planned: '2025-01-04', expected: null },
    { planned: '2025-01-05', expected: '2025-01-05' },
    { planned: '2025-01-07', expected: '2025-01-05' },
    { planned: '2025-01-08', expected: '2025-01-08' },
    { planned: '2025-01-11', expected: '2025-01-08' },
  ])('$planned → $expected (latest prep date on or before the day)', ({ planned, expected }) => {
    expect(supplyingPrepDate(planned, week)).toBe(expected);
  });
});

describe('remedies', () => {
  const egg = STORAGE_DEFAULTS['egg-dish'];
  const twoPrepWeek = ['2025-01-05', '2025-01-08']; // Sunday and Wednesday

  it('(b) Friday plate from Sunday is past eat-by; Wednesday’s prep covers it', () => {
    const input = { plannedDate: '2025-01-10', prepDate: '2025-01-05', fridgeDays: egg.fridgeDays, freezerWeeks: egg.freezerWeeks, weekPrepDates: twoPrepWeek };
    const remedies = eatByRemedies(input);
    expect(remedies[0]).toEqual({ kind: 'use-other-prep-date', prepDate: '2025-01-08', eatBy: '2025-01-12' });
    expect(remedies[1]?.kind).toBe('freeze-and-thaw');
  });

  it('(b) a plate before its prep date is moved to the earlier prep; freezing does not apply', () => {
    const input = { plannedDate: '2025-01-06', prepDate: '2025-01-08', fridgeDays: 4, freezerWeeks: 8, weekPrepDates: twoPrepWeek };
    expect(eatByRemedies(input)).toEqual([{ kind: 'use-other-prep-date', prepDate: '2025-01-05', eatBy: '2025-01-09' }]);
  });

  it('(b) no other prep date fits in a one-prep week', () => {
    expect(otherPrepDateRemedy({ plannedDate: '2025-01-10', prepDate: '2025-01-05', fridgeDays: 4, weekPrepDates: ['2025-01-05'] })).toBeNull();
  });

  it('(a) freeze on prep day, thaw reminder the evening before, eat within THAWED_EAT_WITHIN_DAYS (common practice)', () => {
    // Dates checked with GNU date: 2025-01-05 + 56 days = 2025-03-02; 2025-01-13 ± 1 day = 2025-01-12 / 2025-01-14.
    const r = freezeRemedy({ plannedDate: '2025-01-13', prepDate: '2025-01-05', fridgeDays: 4, freezerWeeks: egg.freezerWeeks });
    expect(r).toEqual({
      kind: 'freeze-and-thaw',
      freezeOn: '2025-01-05',
      thawReminderOn: '2025-01-12',
      thawReminderTime: '19:00',
      eatOn: '2025-01-13',
      eatByAfterThaw: addDays('2025-01-13', THAWED_EAT_WITHIN_DAYS),
      freezerQualityUntil: '2025-03-02',
    });
    // The thawed window is stricter than the 3–4 days FSIS allows for refrigerated leftovers (FoodKeeper).
    expect(THAWED_EAT_WITHIN_DAYS).toBeLessThan(egg.fridgeDaysRange[0]);
  });

  it.each([
    { why: 'not freezable', plannedDate: '2025-01-13', freezerWeeks: 0 },
    { why: 'past the freezer quality limit (8 weeks)', plannedDate: '2025-03-03', freezerWeeks: 8 },
    { why: 'planned on prep day', plannedDate: '2025-01-05', freezerWeeks: 8 },
  ])('(a) none when $why', ({ plannedDate, freezerWeeks }) => {
    expect(freezeRemedy({ plannedDate, prepDate: '2025-01-05', fridgeDays: 4, freezerWeeks })).toBeNull();
  });

  it('no remedies when the portion is fine', () => {
    expect(eatByRemedies({ plannedDate: '2025-01-07', prepDate: '2025-01-05', fridgeDays: 4, freezerWeeks: 8, weekPrepDates: twoPrepWeek })).toEqual([]);
  });
});

describe('CAUTIONS (shown by the UI, labels and PDFs)', () => {
  const all = CAUTIONS.map((c) => c.text).join('\n');

  it.each([
    { topic: 'cooling limits (Food Code §3-501.14)', pattern: /135 °F.*70 °F.*2 hours.*41 °F.*6 hours/ },
    { topic: 'reheating (Food Code §3-403.11)', pattern: /165 °F \(74 °C\)/ },
    { topic: '2-hour rule (USDA FSIS)', pattern: /2 hours.*1 hour.*90 °F/ },
    { topic: 'fridge and freezer temperatures (FSIS chart)', pattern: /40 °F \(4 °C\).*0 °F \(−18 °C\)/ },
    { topic: 'eat-by is guidance', pattern: /guidance, not a guarantee/ },
    { topic: 'defer to local food codes', pattern: /local food code/ },
    { topic: 'diet: medication needs', pattern: /medication needs.*diabetes.*blood pressure/ },
    { topic: 'diet: who it does not suit', pattern: /pregnancy.*kidney disease.*eating disorders/ },
    { topic: 'diet: clinician', pattern: /clinician/ },
  ])('mentions $topic', ({ pattern }) => {
    expect(all).toMatch(pattern);
  });

  it('each caution has a unique id, a topic and a source', () => {
    expect(new Set(CAUTIONS.map((c) => c.id)).size).toBe(CAUTIONS.length);
    for (const c of CAUTIONS) expect(c.source.length).toBeGreaterThan(0);
    expect(CAUTIONS.filter((c) => c.topic === 'diet')).toHaveLength(1);
  });
});

describe('thawTasks (a client week: what to move to the fridge, which evening)', () => {
  // Refrigerator thawing the evening before the plate's day: USDA FSIS "The Big Thaw" asks to plan ahead and thaw in
  // the refrigerator; "overnight for a small portion" is from memory. THAWED_EAT_WITHIN_DAYS is common practice.
  const plate = (slot: string, name: string, storage: 'fridge' | 'frozen', thawOn: string | null) => ({ slot, name, storage, thawOn });
  const week = [
    { date: '2025-01-11', plates: [plate('breakfast', 'Egg slab', 'fridge', null)] },
    { date: '2025-01-12', plates: [plate('breakfast', 'Egg slab', 'frozen', '2025-01-11'), plate('lunch', 'Batter squares', 'frozen', '2025-01-11')] },
    { date: '2025-01-10', plates: [plate('lunch', 'Coconut slab', 'frozen', '2025-01-09')] },
  ];

  it('gives one task per frozen plate, on its thaw evening, in the order the evenings fall', () => {
    expect(thawTasks(week)).toEqual([
      { thawOn: '2025-01-09', eatOn: '2025-01-10', slot: 'lunch', name: 'Coconut slab', eatByAfterThaw: addDays('2025-01-10', THAWED_EAT_WITHIN_DAYS) },
      { thawOn: '2025-01-11', eatOn: '2025-01-12', slot: 'breakfast', name: 'Egg slab', eatByAfterThaw: '2025-01-13' },
      { thawOn: '2025-01-11', eatOn: '2025-01-12', slot: 'lunch', name: 'Batter squares', eatByAfterThaw: '2025-01-13' },
    ]);
  });

  it('has nothing for fridge plates, nor for a frozen plate without a thaw evening', () => {
    expect(thawTasks([{ date: '2025-01-12', plates: [plate('breakfast', 'Egg slab', 'fridge', null), plate('lunch', 'Odd', 'frozen', null)] }])).toEqual([]);
  });

  it('matches freezeRemedy: the task falls on the remedy evening and eats on the planned day', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 20 }), fc.integer({ min: 1, max: 12 }), (daysAfterPrep, freezerWeeks) => {
        const prepDate = '2025-01-05';
        const plannedDate = addDays(prepDate, daysAfterPrep);
        const remedy = freezeRemedy({ plannedDate, prepDate, fridgeDays: 1, freezerWeeks });
        if (!remedy) return;
        const [task] = thawTasks([{ date: plannedDate, plates: [plate('breakfast', 'Egg slab', 'frozen', remedy.thawReminderOn)] }]);
        expect(task).toMatchObject({ thawOn: remedy.thawReminderOn, eatOn: remedy.eatOn, eatByAfterThaw: remedy.eatByAfterThaw });
      }),
    );
  });
});

describe('dates in words (pages, printed plans, e-mails, the week check sentences)', () => {
  // Outside reference: ECMA-402 Intl.DateTimeFormat with CLDR data (Node's ICU). Month first follows en-US exactly;
  // day first takes en-GB's weekday, day and month names (en-GB puts a comma after the weekday in the long form and,
  // in recent CLDR, writes September "Sept": our day-first words keep "Mon 7 Sep" and "Monday 7 September 2026").
  const us = (o: Intl.DateTimeFormatOptions) => new Intl.DateTimeFormat('en-US', { ...o, timeZone: 'UTC' });
  const usShort = us({ weekday: 'short', month: 'short', day: 'numeric' });
  const usLong = us({ weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' });
  const usHeading = us({ weekday: 'long', month: 'short', day: 'numeric' });
  const usYear = us({ month: 'short', day: 'numeric', year: 'numeric' });
  const gb = new Intl.DateTimeFormat('en-GB', { weekday: 'long', month: 'long', day: 'numeric', year: 'numeric', timeZone: 'UTC' });

  it('property: month first reads as en-US writes the same UTC calendar day (fast-check, every day of ten years)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3650 }), (n) => {
        const iso = addDays('2024-01-01', n);
        const js = new Date(`${iso}T12:00:00Z`);
        expect(shortDate(iso, 'month-day')).toBe(usShort.format(js));
        expect(longDate(iso, 'month-day')).toBe(usLong.format(js));
        expect(dayHeading(iso, 'month-day')).toBe(usHeading.format(js));
        expect(dateWithYear(iso, 'month-day')).toBe(usYear.format(js));
      }),
    );
  });

  it("property: day first has en-GB's weekday, day, month and year, in that order (fast-check)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3650 }), (n) => {
        const iso = addDays('2024-01-01', n);
        const part = Object.fromEntries(gb.formatToParts(new Date(`${iso}T12:00:00Z`)).map((p) => [p.type, p.value]));
        expect(longDate(iso, 'day-month')).toBe(`${part.weekday} ${part.day} ${part.month} ${part.year}`);
        expect(shortDate(iso, 'day-month')).toBe(`${part.weekday.slice(0, 3)} ${part.day} ${part.month.slice(0, 3)}`);
        expect(dayHeading(iso, 'day-month')).toBe(`${part.weekday} ${part.day} ${part.month.slice(0, 3)}`);
        expect(dateWithYear(iso, 'day-month')).toBe(`${part.day} ${part.month.slice(0, 3)} ${part.year}`);
      }),
    );
  });

  it('2025-01-05 was a Sunday (a worked calendar fact, also used above) and leap day 2028-02-29 a Tuesday', () => {
    expect(shortDate('2025-01-05', 'day-month')).toBe('Sun 5 Jan');
    expect(shortDate('2025-01-05', 'month-day')).toBe('Sun, Jan 5');
    expect(longDate('2028-02-29', 'day-month')).toBe('Tuesday 29 February 2028');
    expect(longDate('2028-02-29', 'month-day')).toBe('Tuesday, February 29, 2028');
  });

  it('reads a stored setting: anything but day-month is the default, month first', () => {
    expect(toDateOrder('day-month')).toBe('day-month');
    expect(toDateOrder('month-day')).toBe('month-day');
    expect(toDateOrder(null)).toBe(DEFAULT_DATE_ORDER);
    expect(toDateOrder('sideways')).toBe('month-day');
  });
});
