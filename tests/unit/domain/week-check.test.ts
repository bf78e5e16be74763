import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import Decimal from 'decimal.js';
import {
  warningGroups,
  DEFAULT_CHECK_RULES,
  checkDay,
  checkWeek,
  normalizeTerm,
  worded,
  type CheckCell,
  type DayCheckInput,
} from '@shared/domain/week-check';
import { computeTargets } from '@shared/domain/targets';
import { STORAGE_DEFAULTS } from '@shared/domain/eat-by';

const targets = { targetKcal: 1800, netCarbCapG: 20, proteinG: 100, fatG: 140 };

const cell = (over: Partial<CheckCell> = {}): CheckCell => ({
  slot: 'lunch',
  macros: { kcal: 0, netCarbsG: 0, proteinG: 0, fatG: 0 },
  allergens: [],
  terms: [],
  portions: [],
  ...over,
});

const day = (over: Partial<DayCheckInput> = {}): DayCheckInput => ({
  clientId: 'c1',
  date: '2025-01-07',
  targets,
  clientAllergens: [],
  clientDislikes: [],
  cells: [],
  ...over,
});

// Cells whose macros sit exactly on a limit; each macro not under test is set so it raises nothing.
const macroCells = (field: 'kcal' | 'netCarbsG' | 'proteinG', values: number[]): CheckCell[] =>
  values.map((v, i) =>
    cell({
      slot: `s${i}`,
      macros: {
        kcal: field === 'kcal' ? v : 0,
        netCarbsG: field === 'netCarbsG' ? v : 0,
        proteinG: field === 'proteinG' ? v : i === 0 ? 100 : 0,
        fatG: 0,
      },
    }),
  );

describe('defaults (common practice, no source; coach-editable)', () => {
  it('protein floor 90 % of target, energy allowance 10 % over target', () => {
    expect(Number(DEFAULT_CHECK_RULES.proteinFloorShare)).toBe(0.9);
    expect(Number(DEFAULT_CHECK_RULES.energyOverShare)).toBe(0.1);
  });
});

describe('macro limits at their boundaries (sums are exact decimals)', () => {
  it.each([
    // binary floats: 0.1 + 16.1 + 3.8 = 20.000000000000004, which would wrongly exceed the cap
    { case: 'net carbs exactly at the 20 g cap', field: 'netCarbsG' as const, values: [0.1, 16.1, 3.8], kinds: [] },
    { case: 'net carbs 20.1 g over the cap', field: 'netCarbsG' as const, values: [0.1, 16.1, 3.9], kinds: ['net-carbs-over'] },
    // binary floats: 0.1 + 64.1 + 25.8 = 89.99999999999999, which would wrongly fall below the floor
    { case: 'protein exactly at the 90 g floor', field: 'proteinG' as const, values: [0.1, 64.1, 25.8], kinds: [] },
    { case: 'protein 89.9 g below the floor', field: 'proteinG' as const, values: [0.1, 64.1, 25.7], kinds: ['protein-short'] },
    { case: 'energy exactly at 1800 × 1.1 = 1980 kcal', field: 'kcal' as const, values: [990, 990], kinds: [] },
    { case: 'energy 1980.1 kcal', field: 'kcal' as const, values: [990, 990.1], kinds: ['energy-over'] },
  ])('$case → $kinds', ({ field, values, kinds }) => {
    const result = checkDay(day({ cells: macroCells(field, values) }));
    expect(result.warnings.map((w) => w.kind)).toEqual(kinds);
    expect(result.warnings.every((w) => w.severity === 'warn')).toBe(true);
  });

  it('reports the numbers behind a macro warning', () => {
    const [w] = checkDay(day({ cells: macroCells('proteinG', [0.1, 64.1, 25.7]) })).warnings;
    expect(w).toMatchObject({ kind: 'protein-short', actualG: 89.9, targetG: 100, floorG: 90, clientId: 'c1', date: '2025-01-07' });
    expect(worded(w, 'month-day').message).toContain('89.9 g');
  });

  it('macros with more than three decimals are still summed exactly (0.0001 + 19.9999 is the 20 g cap)', () => {
    expect(checkDay(day({ cells: macroCells('netCarbsG', [0.0001, 19.9999]) })).warnings).toEqual([]);
    expect(checkDay(day({ cells: macroCells('netCarbsG', [0.0001, 20]) })).warnings.map((w) => w.kind)).toEqual(['net-carbs-over']);
  });

  // Property (fast-check): the day check agrees with a plain decimal.js computation of the same rules, for
  // macros given to 0.1 (as a board's plates are) or to 0.001 and targets given to 0.1. Reference: decimal.js.
  it('agrees with an exact decimal.js reference on random days', () => {
    const macro = fc.oneof(fc.integer({ min: 0, max: 20_000 }).map((n) => n / 10), fc.integer({ min: 0, max: 2_000_000 }).map((n) => n / 1000));
    const macros = fc.record({ kcal: macro, netCarbsG: macro, proteinG: macro, fatG: macro });
    const tenth = (min: number, max: number) => fc.integer({ min: min * 10, max: max * 10 }).map((n) => n / 10);
    const goals = fc.record({ targetKcal: fc.integer({ min: 200, max: 4000 }), netCarbCapG: tenth(5, 60), proteinG: tenth(10, 250), fatG: tenth(10, 300) });
    fc.assert(
      fc.property(fc.array(macros, { minLength: 1, maxLength: 4 }), goals, (list, t) => {
        const result = checkDay(day({ targets: t, cells: list.map((m, i) => cell({ slot: `s${i}`, macros: m })) }));
        const sum = (k: keyof (typeof list)[number]) => list.reduce((a, m) => a.plus(m[k]), new Decimal(0));
        const r1 = (d: Decimal) => d.toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber();
        const expected: string[] = [];
        if (sum('netCarbsG').gt(t.netCarbCapG)) expected.push('net-carbs-over');
        if (sum('proteinG').lt(new Decimal(t.proteinG).times('0.9'))) expected.push('protein-short');
        if (sum('kcal').gt(new Decimal(t.targetKcal).times('1.1'))) expected.push('energy-over');
        expect(result.warnings.map((w) => w.kind)).toEqual(expected);
        expect(result.totals).toEqual({ kcal: r1(sum('kcal')), netCarbsG: r1(sum('netCarbsG')), proteinG: r1(sum('proteinG')), fatG: r1(sum('fatG')) });
      }),
      { numRuns: 500 },
    );
  });

  it('uses coach-edited rules', () => {
    const cells = macroCells('proteinG', [95]);
    expect(checkDay(day({ cells })).warnings).toEqual([]);
    expect(checkDay(day({ cells, rules: { proteinFloorShare: 1 } })).warnings.map((w) => w.kind)).toEqual(['protein-short']);
  });
});

describe('a realistic day from USDA SR28 composition values (published-values §5)', () => {
  // per 100 g: [kcal, protein g, fat g, carbohydrate − fiber g] from the SR28 ABBREV rows named
  const SR28 = {
    egg: [143, 12.56, 9.51, 0.72], // 01123 Egg, whole, raw
    baconBaked: [548, 35.73, 43.27, 1.35], // 10860 Bacon, cooked, baked
    cauliflower: [25, 1.92, 0.28, 2.97], // 11135 Cauliflower, raw
    cheddar: [404, 22.87, 33.31, 3.09], // 01009 Cheese, cheddar
    sausage: [325, 18.53, 27.25, 1.42], // 07064 Pork sausage, cooked, pan-fried
    spinach: [23, 2.86, 0.39, 1.43], // 11457 Spinach, raw
  } as const;
  const macros = (parts: [keyof typeof SR28, number][]) => {
    const sum = [0, 0, 0, 0];
    for (const [food, grams] of parts) SR28[food].forEach((v, i) => (sum[i] += (v * grams) / 100));
    return { kcal: sum[0], proteinG: sum[1], fatG: sum[2], netCarbsG: sum[3] };
  };
  // 3 large eggs (50 g each, SR28 portion) + 3 baked slices (8.1 g each); 200 g cauliflower + 56 g cheddar;
  // 150 g sausage + 100 g spinach
  const breakfast = macros([['egg', 150], ['baconBaked', 24.3]]);
  const lunch = macros([['cauliflower', 200], ['cheddar', 56]]);
  const dinner = macros([['sausage', 150], ['spinach', 100]]);
  // Woman 65 kg, 165 cm, 40 y, lightly active (Mifflin 1990 worked example, published-values §7)
  const womanTargets = computeTargets({ sex: 'female', weightKg: 65, heightCm: 165, ageYears: 40, activity: 'light', goal: 'maintain' });

  const result = checkDay(day({
    targets: womanTargets,
    cells: [
      cell({ slot: 'breakfast', macros: breakfast }),
      cell({ slot: 'lunch', macros: lunch }),
      cell({ slot: 'dinner', macros: dinner }),
    ],
  }));

  it('sums the day to 0.1', () => {
    expect(result.totals.kcal).toBeCloseTo(breakfast.kcal + lunch.kcal + dinner.kcal, 1);
    expect(result.totals.proteinG).toBeCloseTo(breakfast.proteinG + lunch.proteinG + dinner.proteinG, 1);
    expect(result.totals.netCarbsG).toBeCloseTo(breakfast.netCarbsG + lunch.netCarbsG + dinner.netCarbsG, 1);
  });

  it('stays under the 20 g net-carb cap and the energy limit, but is short of protein (about 75 g against a 88 g floor)', () => {
    expect(result.warnings.map((w) => w.kind)).toEqual(['protein-short']);
  });
});

describe('allergens (block unless overridden with a reason)', () => {
  const plate = cell({ slot: 'dinner', allergens: ['egg', 'milk'] });
  it.each([
    { case: 'no override', overrides: undefined, severity: 'block', overridden: false },
    { case: 'blank reason', overrides: [{ allergen: 'milk' as const, reason: '   ' }], severity: 'block', overridden: false },
    { case: 'override with a reason', overrides: [{ allergen: 'milk' as const, reason: 'Lactose-free cheese; client confirmed' }], severity: 'warn', overridden: true },
  ])('$case → $severity', ({ overrides, severity, overridden }) => {
    const result = checkDay(day({ clientAllergens: ['milk', 'tree-nuts'], cells: [{ ...plate, allergenOverrides: overrides }] }));
    const allergen = result.warnings.filter((w) => w.kind === 'allergen');
    expect(allergen).toHaveLength(1);
    expect(allergen[0]).toMatchObject({ allergen: 'milk', slot: 'dinner', severity, overridden });
    expect(worded(allergen[0], 'month-day').message).toContain('Milk');
  });
});

describe('dislikes', () => {
  it('matches names and tags case- and space-insensitively, once per dislike, plurals folded', () => {
    const result = checkDay(day({
      targets: { ...targets, proteinG: 0 },
      clientDislikes: ['Cauliflower', 'mushrooms', 'CAULIFLOWER '],
      cells: [cell({ slot: 'lunch', terms: ['cauliflower ', 'CAULIFLOWER', 'egg', 'mushroom'] })],
    }));
    expect(result.warnings.map((w) => (w.kind === 'dislike' ? [w.term, w.severity] : w.kind))).toEqual([
      ['cauliflower', 'warn'],
      ['mushrooms', 'warn'],
    ]);
  });

  // Library names read like "Onions, raw" (USDA FoodData Central descriptions); coaches type "onions" or "red onion".
  it.each([
    { dislike: 'onions', term: 'Onions, raw', hit: true },
    { dislike: 'onion', term: 'Onions, raw', hit: true },
    { dislike: 'red onion', term: 'Onions, red, raw', hit: true },
    { dislike: 'tomatoes', term: 'Tomatoes, cherry, raw', hit: true },
    { dislike: 'cherry tomato', term: 'Tomatoes, cherry, raw', hit: true },
    { dislike: 'berries', term: 'Blackberries, raw', hit: true }, // a word of 5+ letters finds compounds ending with it
    { dislike: 'strawberry', term: 'Strawberries, raw', hit: true },
    { dislike: 'melon', term: 'Watermelon, raw', hit: true },
    { dislike: 'blackberries', term: 'Berries, mixed', hit: false }, // a compound does not find its last word
    { dislike: 'corn', term: 'Peppercorns, black', hit: false }, // shorter words match whole words only
    { dislike: 'egg', term: 'Eggplant, raw', hit: false },
    { dislike: 'ham', term: 'Graham crackers', hit: false },
    { dislike: 'cream', term: 'Cheese, cream', hit: true },
    { dislike: 'sweet', term: 'sweet', hit: true },
    { dislike: 'red onion', term: 'Onions, raw', hit: false },
  ])('"$dislike" in "$term" → $hit', ({ dislike, term, hit }) => {
    const result = checkDay(day({ targets: { ...targets, proteinG: 0 }, clientDislikes: [dislike], cells: [cell({ terms: [term] })] }));
    const found = result.warnings.filter((w) => w.kind === 'dislike');
    expect(found.length).toBe(hit ? 1 : 0);
    if (hit) expect(found[0]).toMatchObject({ term: normalizeTerm(dislike), matched: normalizeTerm(term) });
  });

  it('words the warning with the dislike and the plate term that holds it', () => {
    const [w] = checkDay(day({ targets: { ...targets, proteinG: 0 }, clientDislikes: ['Onions'], cells: [cell({ terms: ['Egg slab', 'Onions, red, raw'] })] })).warnings;
    expect(worded(w, 'month-day').message).toBe('The client dislikes onions (onions, red, raw).');
  });

  it.each([
    { raw: '  Red   Onion ', normal: 'red onion' },
    { raw: 'Cilantro', normal: 'cilantro' },
  ])('normalizeTerm($raw) = $normal', ({ raw, normal }) => {
    expect(normalizeTerm(raw)).toBe(normal);
  });
});

describe('eat-by on the board (egg dish: FoodKeeper 3–4 days → 4; freezer 8 weeks)', () => {
  const egg = STORAGE_DEFAULTS['egg-dish'];
  const portion = { trayId: 'egg', prepDate: '2025-01-05', fridgeDays: egg.fridgeDays };
  it.each([
    { date: '2025-01-09', storage: 'fridge' as const, kind: null, severity: null },
    { date: '2025-01-10', storage: 'fridge' as const, kind: 'past-eat-by', severity: 'block' },
    { date: '2025-01-04', storage: 'fridge' as const, kind: 'before-prep', severity: 'block' },
    { date: '2025-01-13', storage: 'frozen' as const, kind: null, severity: null },
    { date: '2025-03-03', storage: 'frozen' as const, kind: 'past-freezer-quality', severity: 'warn' },
  ])('$storage portion on $date → $kind', ({ date, storage, kind, severity }) => {
    const result = checkDay(day({ date, cells: [cell({ portions: [{ ...portion, storage, freezerWeeks: egg.freezerWeeks }] })], targets: { ...targets, proteinG: 0 } }));
    const found = result.warnings;
    expect(found.map((w) => w.kind)).toEqual(kind ? [kind] : []);
    if (severity) expect(found[0].severity).toBe(severity);
  });

  it('names the eat-by date', () => {
    const [w] = checkDay(day({ date: '2025-01-10', cells: [cell({ portions: [portion] })], targets: { ...targets, proteinG: 0 } })).warnings;
    expect(w).toMatchObject({ kind: 'past-eat-by', eatBy: '2025-01-09', prepDate: '2025-01-05', trayId: 'egg' });
  });
});

describe('checkWeek', () => {
  it('checks every client-day and lists blocks first', () => {
    const { days, warnings } = checkWeek([
      day({ clientId: 'a', cells: macroCells('netCarbsG', [25]) }),
      day({ clientId: 'b', clientAllergens: ['sesame'], cells: [cell({ allergens: ['sesame'], macros: { kcal: 0, netCarbsG: 0, proteinG: 100, fatG: 0 } })] }),
    ]);
    expect(days.map((d) => d.clientId)).toEqual(['a', 'b']);
    expect(warnings.map((w) => [w.clientId, w.kind, w.severity])).toEqual([
      ['b', 'allergen', 'block'],
      ['a', 'net-carbs-over', 'warn'],
    ]);
  });
});

describe('the problem list by kind (worked by hand; no outside source: a count)', () => {
  const base = { severity: 'warn' as const, date: '2026-01-05' as const };
  const carbs = (clientId: string) => ({ ...base, clientId, kind: 'net-carbs-over' as const, actualG: 30, capG: 25 });
  const allergen = (clientId: string, overridden: boolean, code: 'egg' | 'milk' = 'egg') => ({ ...base, clientId, kind: 'allergen' as const, slot: 'lunch', allergen: code, overridden });
  const dislike = (clientId: string) => ({ ...base, clientId, kind: 'dislike' as const, slot: 'lunch', term: 'olives' });

  it('counts each kind, names each client once, the most frequent kind first', () => {
    const groups = warningGroups([dislike('7'), carbs('1'), carbs('2'), carbs('1'), allergen('3', false), allergen('4', true), allergen('3', false), allergen('3', false, 'milk')]);
    expect(groups).toEqual([
      { kind: 'net-carbs-over', allergen: null, allowed: false, count: 3, clientIds: ['1', '2'] },
      { kind: 'allergen', allergen: 'egg', allowed: false, count: 2, clientIds: ['3'] },
      // Equal counts keep the order first met (a stable sort); an allergen allowed is apart from one still to solve, each allergen apart.
      { kind: 'dislike', allergen: null, allowed: false, count: 1, clientIds: ['7'] },
      { kind: 'allergen', allergen: 'egg', allowed: true, count: 1, clientIds: ['4'] },
      { kind: 'allergen', allergen: 'milk', allowed: false, count: 1, clientIds: ['3'] },
    ]);
  });

  it('counts every problem once: the groups add up to the list', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.constantFrom('1', '2', '3'), fc.integer({ min: 0, max: 2 }))), (picks) => {
        const list = picks.map(([c, k]) => (k === 0 ? carbs(c) : k === 1 ? dislike(c) : allergen(c, c === '2')));
        const groups = warningGroups(list);
        expect(groups.reduce((n, g) => n + g.count, 0)).toBe(list.length);
        for (const g of groups) expect(new Set(g.clientIds).size).toBe(g.clientIds.length);
      }),
    );
  });
});
