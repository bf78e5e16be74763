import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  labelCalories,
  labelCarbohydrate,
  labelFat,
  labelPanel,
  labelProtein,
  labelSodium,
  type LabelValue,
} from '@shared/domain/label-rounding';

const APP_H = 'FDA Food Labeling Guide App. H';

// reference/published-values.md §2 boundary table, from 21 CFR 101.9(c) and FDA Food Labeling Guide, Appendix H.
// [rule, input, printed text]
const boundaryTable: Array<[string, (v: number) => LabelValue, number, string]> = [
  ['calories (c)(1)', labelCalories, 4.9, '0'],
  ['calories (c)(1)', labelCalories, 5, '5'],
  ['calories (c)(1)', labelCalories, 50, '50'],
  ['calories (c)(1)', labelCalories, 52, '50'],
  ['calories (c)(1), round-half-up assumption', labelCalories, 55, '60'],
  ['total fat (c)(2)', labelFat, 0.49, '0 g'],
  ['total fat (c)(2)', labelFat, 0.5, '0.5 g'],
  ['total fat (c)(2)', labelFat, 4.74, '4.5 g'],
  ['total fat (c)(2)', labelFat, 4.76, '5 g'],
  ['total fat (c)(2)', labelFat, 5.4, '5 g'],
  ['total carbohydrate (c)(6)', labelCarbohydrate, 0.49, '0 g'],
  ['total carbohydrate (c)(6)', labelCarbohydrate, 0.6, 'less than 1 g'],
  ['total carbohydrate (c)(6)', labelCarbohydrate, 1.4, '1 g'],
  ['sodium (c)(4)', labelSodium, 4, '0 mg'],
  ['sodium (c)(4)', labelSodium, 142, '140 mg'],
  ['sodium (c)(4)', labelSodium, 138, '140 mg'],
];

describe(`label rounding: boundary table (21 CFR 101.9(c); ${APP_H})`, () => {
  it.each(boundaryTable)('%s: %s → %j', (_rule, fn, input, text) => {
    expect(fn(input).text).toBe(text);
  });
});

describe('label rounding: more cases from the same rules', () => {
  // FDA worked examples quoted in published-values §2: 47 → 45, 96 → 100.
  const calories: Array<[number, number, string]> = [
    [47, 45, 'FDA worked example'],
    [96, 100, 'FDA worked example'],
    [0, 0, '< 5 → 0'],
    [50.4, 50, '> 50 → nearest 10'],
    [47.5, 50, 'halfway → up (assumption, documented)'],
    [2.5, 0, '< 5 → 0'],
    [143, 140, '> 50 → nearest 10'],
  ];
  it.each(calories)('calories %s → %s (%s)', (input, value) => {
    expect(labelCalories(input)).toMatchObject({ value, lessThan: false, unit: 'kcal', text: String(value) });
  });

  // Total fat and saturated fat share a rule: < 0.5 → 0, < 5 → nearest 0.5, ≥ 5 → nearest 1 (App. H).
  const fat: Array<[number, number]> = [
    [0, 0], [0.74, 0.5], [0.75, 1], [2.25, 2.5], [4.99, 5], [5, 5], [5.5, 6], [85.87, 86],
  ];
  it.each(fat)('fat %s g → %s g', (input, value) => {
    expect(labelFat(input)).toMatchObject({ value, lessThan: false, text: `${value} g` });
  });

  // Sodium: < 5 → 0; 5–140 → nearest 5; > 140 → nearest 10 (App. H).
  const sodium: Array<[number, number]> = [[4.99, 0], [5, 5], [7.4, 5], [7.5, 10], [140, 140], [140.1, 140], [145, 150], [653, 650]];
  it.each(sodium)('sodium %s mg → %s mg', (input, value) => {
    expect(labelSodium(input)).toMatchObject({ value, text: `${value} mg` });
  });

  // Carbohydrate, fibre and sugars: < 0.5 → 0; < 1 → "less than 1 g"; ≥ 1 → nearest 1 (App. H (6), (6)(i), (6)(ii)).
  const carbs: Array<[number, string, boolean]> = [
    [0, '0 g', false], [0.5, 'less than 1 g', true], [0.99, 'less than 1 g', true], [1, '1 g', false],
    [1.5, '2 g', false], [2.49, '2 g', false], [6.52, '7 g', false],
  ];
  it.each(carbs)('carbohydrate %s g → %j', (input, text, lessThan) => {
    expect(labelCarbohydrate(input)).toMatchObject({ text, lessThan });
  });

  // Protein (c)(7): 0.5 to < 1 g → "less than 1 g" or 1 g (App. H: "…or to 1 g if .5 g to < 1 g").
  const protein: Array<[number, 'less-than' | 'one', string]> = [
    [0.4, 'less-than', '0 g'], [0.5, 'less-than', 'less than 1 g'], [0.7, 'one', '1 g'], [0.4, 'one', '0 g'],
    [6.28, 'less-than', '6 g'], [6.5, 'one', '7 g'],
  ];
  it.each(protein)('protein %s g with %s → %j', (input, halfToOne, text) => {
    expect(labelProtein(input, { halfToOne }).text).toBe(text);
  });

  it.each([[-1], [Number.NaN]])('refuses %s', (bad) => {
    expect(() => labelFat(bad)).toThrow(RangeError);
  });
});

describe('label panel', () => {
  it('one large egg (50 g of SR28 01123) prints 70 cal, 5 g fat, 1.5 g sat fat, 70 mg sodium, 0 g carbs, 6 g protein', () => {
    // Per 50 g: kcal 71.5, fat 4.755, sat 1.563, sodium 71, carbs 0.36, sugars 0.185, protein 6.28 (SR28 ÷ 2).
    // The printed values match a typical US egg-carton label (from memory).
    const panel = labelPanel({
      kcal: 71.5, fatG: 4.755, satFatG: 1.563, carbsG: 0.36, fiberG: 0, sugarsG: 0.185, proteinG: 6.28, sodiumMg: 71,
    });
    expect(Object.fromEntries(Object.entries(panel).map(([k, v]) => [k, v.text]))).toEqual({
      kcal: '70', fatG: '5 g', satFatG: '1.5 g', carbsG: '0 g', fiberG: '0 g', sugarsG: '0 g', proteinG: '6 g', sodiumMg: '70 mg',
    });
  });
});

describe('label rounding properties (fast-check)', () => {
  it('rounded calories are on their grid and within half a step of the input', () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 5000, noNaN: true }), (kcal) => {
        const { value } = labelCalories(kcal);
        const step = kcal <= 50 ? 5 : 10;
        return value % step === 0 && Math.abs(value - kcal) <= step / 2 + 1e-9;
      }),
    );
  });

  it('rounding never lowers a larger input below a smaller one (monotone)', () => {
    const grams = fc.double({ min: 0, max: 200, noNaN: true });
    fc.assert(
      fc.property(grams, grams, (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        return labelFat(lo).value <= labelFat(hi).value && labelSodium(lo).value <= labelSodium(hi).value;
      }),
    );
  });
});
