import Decimal from 'decimal.js';
import fc from 'fast-check';
import Qty from 'js-quantities';
import convert from 'convert-units';
import { describe, expect, it } from 'vitest';
import {
  AmountParseError,
  amountAndName,
  amountInSystem,
  amountWithUnit,
  GRAMS_PER_UNIT,
  MASS_UNITS,
  MILLILITERS_PER_UNIT,
  UNIT_CODES,
  UNIT_OPTIONS,
  UnitConversionError,
  UnknownUnitError,
  VOLUME_UNITS,
  convertAmount,
  formatKitchenAmount,
  formatMass,
  formatPieces,
  formatVolume,
  fromGrams,
  normalizeUnit,
  parseAmount,
  toGrams,
  unitKind,
  type IngredientFacts,
  type MassUnit,
  type VolumeUnit,
} from '@shared/domain/units';

const HB44 = 'NIST Handbook 44, Appendix C';
const SP430 = 'NIST SP 430 household table';

function relDiff(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b));
}

describe('unit constants against NIST definitions', () => {
  // [unit, exact value, source]
  const grams: Array<[MassUnit, string, string]> = [
    ['g', '1', 'SI'],
    ['kg', '1000', 'SI'],
    ['oz', '28.349523125', `${HB44}: 1 avoirdupois ounce = 28.349 523 125 g (exact)`],
    ['lb', '453.59237', `${HB44}: 1 avoirdupois pound = 453.592 37 g (exact, 1959)`],
  ];
  it.each(grams)('1 %s = %s g (%s)', (unit, exact) => {
    expect(GRAMS_PER_UNIT[unit].eq(exact)).toBe(true);
  });

  const millilitres: Array<[VolumeUnit, string, string]> = [
    ['floz', '29.5735295625', `${HB44}: 1 US fluid ounce = 29.573 529 562 5 mL (exact)`],
    ['tsp', '4.92892159375', `${SP430}: 1 tsp = 1/6 fl oz (exact)`],
    ['tbsp', '14.78676478125', `${SP430}: 1 tbsp = 1/2 fl oz (exact)`],
    ['cup', '236.5882365', `${HB44}: 1 cup = 8 fl oz = 236.588 236 5 mL (exact)`],
    ['pint', '473.176473', `${HB44}: 1 pint = 16 fl oz (exact)`],
    ['quart', '946.352946', `${HB44}: 1 quart = 32 fl oz (exact)`],
    ['ml', '1', 'SI'],
    ['l', '1000', 'SI'],
  ];
  it.each(millilitres)('1 %s = %s mL (%s)', (unit, exact) => {
    expect(MILLILITERS_PER_UNIT[unit].eq(exact)).toBe(true);
  });

  it('1 US gallon (4 quarts) = 231 in³ with 1 in = 2.54 cm, i.e. 3785.411784 mL exactly (NIST HB 44 App. C)', () => {
    const cubicInchMl = new Decimal('2.54').pow(3); // cm³ = mL
    expect(MILLILITERS_PER_UNIT.quart.times(4).eq(cubicInchMl.times(231))).toBe(true);
    expect(MILLILITERS_PER_UNIT.quart.times(4).eq('3785.411784')).toBe(true);
  });

  // [amount, from, equals amount, to] household relations, NIST SP 430 ("1 tablespoonful … 3 [tsp] … 1/2 [fl oz]")
  const household: Array<[number, VolumeUnit, number, VolumeUnit]> = [
    [3, 'tsp', 1, 'tbsp'],
    [2, 'tbsp', 1, 'floz'],
    [16, 'tbsp', 1, 'cup'],
    [2, 'cup', 1, 'pint'],
    [2, 'pint', 1, 'quart'],
  ];
  it.each(household)('%s %s = %s %s (NIST SP 430 / HB 44)', (a, from, b, to) => {
    expect(convertAmount(a, from, to).eq(b)).toBe(true);
  });
});

describe('every mass and volume pair against two reference libraries', () => {
  // js-quantities 1.8 prints about nine significant figures; convert-units 2.3 uses lb = 453.592 g and
  // 1 L = 33.8140226 fl oz (rounded), so it agrees with the exact NIST values to about 1e-6.
  const jsq: Record<string, string> = {
    g: 'g', kg: 'kg', oz: 'oz', lb: 'lb',
    tsp: 'tsp', tbsp: 'tbsp', floz: 'floz', cup: 'cup', pint: 'pint', quart: 'quart', ml: 'ml', l: 'l',
  };
  const cu: Record<string, string> = {
    g: 'g', kg: 'kg', oz: 'oz', lb: 'lb',
    tsp: 'tsp', tbsp: 'Tbs', floz: 'fl-oz', cup: 'cup', pint: 'pnt', quart: 'qt', ml: 'ml', l: 'l',
  };
  const pairs = (units: readonly string[]) => units.flatMap((a) => units.map((b) => [a, b] as [string, string]));
  const all = [...pairs(MASS_UNITS), ...pairs(VOLUME_UNITS)];

  it.each(all)('2.5 %s → %s agrees with js-quantities (relative 1e-7)', (from, to) => {
    const ours = convertAmount('2.5', from, to).toNumber();
    const theirs = Qty(2.5, jsq[from]).to(jsq[to]).scalar;
    expect(relDiff(ours, theirs)).toBeLessThan(1e-7);
  });

  it.each(all)('2.5 %s → %s agrees with convert-units (relative 2e-6)', (from, to) => {
    const ours = convertAmount('2.5', from, to).toNumber();
    const theirs = convert(2.5).from(cu[from]).to(cu[to]);
    expect(relDiff(ours, theirs)).toBeLessThan(2e-6);
  });
});

describe('conversion to grams through ingredient facts', () => {
  // Densities derived from one USDA SR28 portion weight each; the OTHER portion weights of the same food are
  // then predicted through our volume relations and compared with SR28 (FDC food_portion), to its 0.1 g precision.
  const cupMl = 236.5882365; // NIST HB 44
  const srPortions: Array<[string, number, number, VolumeUnit, number]> = [
    // [food, grams in 1 cup (SR28), amount, unit, grams in SR28]
    ['olive oil (04053)', 216, 1, 'tbsp', 13.5],
    ['olive oil (04053)', 216, 1, 'tsp', 4.5],
    ['butter, salted (01001)', 227, 1, 'tbsp', 14.2],
    ['butter, salted (01001)', 227, 0.5, 'cup', 113], // 1 stick
    ['heavy whipping cream (01053)', 238, 1, 'tbsp', 15],
    ['heavy whipping cream (01053)', 238, 1, 'floz', 29.8],
    ['cream cheese (01017)', 232, 1, 'tbsp', 14.5],
  ];
  it.each(srPortions)('%s: 1 cup = %s g predicts %s %s ≈ %s g (USDA SR28 portions)', (name, cupG, amount, unit, expected) => {
    const facts: IngredientFacts = { name, densityGPerMl: cupG / cupMl };
    expect(Math.abs(toGrams(amount, unit, facts).toNumber() - expected)).toBeLessThanOrEqual(0.6);
  });

  // [facts, amount, unit, grams, source]
  const pieces: Array<[IngredientFacts, number, string, number, string]> = [
    [{ name: 'Egg', pieceWeights: { large: 50 } }, 3, 'large', 150, 'USDA FDC 171287 portion "large, 50.0"'],
    [{ name: 'Egg', pieceWeights: { large: '50', jumbo: 63 } }, 2, 'jumbo', 126, 'USDA FDC 171287 portion jumbo 63 g'],
    [{ name: 'Bacon, raw', pieceWeights: { slice: 28 } }, 12, 'slice', 336, 'USDA SR28 bacon raw 1 slice 28 g'],
    [{ name: 'Bacon, raw', pieceWeights: { Slice: 28 } }, 2, 'slices', 56, 'same; plural and case fall back to "slice"'],
    [{ name: 'Spinach', pieceWeights: { package: 284 } }, 1, 'package', 284, 'USDA SR28 spinach 10-oz package 284 g'],
  ];
  it.each(pieces)('%o: %s %s = %s g (%s)', (facts, amount, unit, grams) => {
    expect(toGrams(amount, unit, facts).eq(grams)).toBe(true);
  });

  it('mass units need no facts: 1 lb of anything is 453.59237 g (NIST HB 44)', () => {
    expect(toGrams(1, 'lb', { name: 'Cheddar' }).eq('453.59237')).toBe(true);
  });

  // [facts, unit, missing fact] — a missing fact throws, never a silent zero
  const missing: Array<[IngredientFacts, string, string]> = [
    [{ name: 'Almond flour' }, 'cup', 'density'],
    [{ name: 'Almond flour', densityGPerMl: null }, 'tbsp', 'density'],
    [{ name: 'Almond flour', densityGPerMl: 0 }, 'cup', 'density'],
    [{ name: 'Almond flour', densityGPerMl: '-0.4' }, 'ml', 'density'],
    [{ name: 'Almond flour', densityGPerMl: 'abc' }, 'l', 'density'],
    [{ name: 'Bacon', pieceWeights: { strip: 28 } }, 'slice', 'pieceWeight:slice'],
    [{ name: 'Egg' }, 'each', 'pieceWeight:each'],
    [{ name: 'Egg', pieceWeights: { large: 0 } }, 'large', 'pieceWeight:large'],
  ];
  it.each(missing)('%o in %s throws UnitConversionError missing %s', (facts, unit, fact) => {
    let caught: unknown;
    try {
      toGrams(1, unit, facts);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(UnitConversionError);
    const err = caught as UnitConversionError;
    expect(err.missing).toBe(fact);
    expect(err.ingredient).toBe(facts.name);
    expect(err.message).toContain(facts.name);
  });

  it('converts across kinds through grams: 2 cups of cream (1 cup = 238 g, SR28) is 4.76 large eggs by weight', () => {
    const cream = { name: 'Cream', densityGPerMl: new Decimal(238).div('236.5882365').toString() };
    expect(convertAmount(2, 'cup', 'g', cream).toDecimalPlaces(6).eq(476)).toBe(true);
    const egg = { name: 'Egg', pieceWeights: { large: 50 } };
    expect(convertAmount(476, 'g', 'large', egg).eq('9.52')).toBe(true);
  });
});

describe('unit codes, kinds and typed spellings', () => {
  it('lists every standard code once with a label, and unitKind agrees with each option', () => {
    expect(new Set(UNIT_CODES).size).toBe(UNIT_CODES.length);
    expect([...UNIT_CODES].sort()).toEqual([...MASS_UNITS, ...VOLUME_UNITS, 'each'].sort());
    for (const o of UNIT_OPTIONS) {
      expect(o.label.length).toBeGreaterThan(0);
      expect(unitKind(o.code)).toBe(o.kind);
    }
  });

  const kinds: Array<[string, string]> = [
    ['g', 'mass'], ['lb', 'mass'], ['floz', 'volume'], ['ml', 'volume'], ['each', 'count'],
    ['large', 'count'], ['slice', 'count'], ['strip', 'count'], ['package', 'count'], ['clove', 'count'],
  ];
  it.each(kinds)('unitKind(%s) = %s', (code, kind) => {
    expect(unitKind(code)).toBe(kind);
  });

  it.each(['', '  ', '2', '%', 'cups', 'Tbsp', 'grams', 'G'])('unitKind(%j) throws UnknownUnitError', (code) => {
    expect(() => unitKind(code)).toThrow(UnknownUnitError);
  });

  // Spellings seen in US recipes (common practice, no source): T = tablespoon, t = teaspoon.
  const spellings: Array<[string, string]> = [
    ['cups', 'cup'], ['C', 'cup'], ['Tbsp', 'tbsp'], ['T', 'tbsp'], ['t', 'tsp'], ['teaspoons', 'tsp'],
    ['fl. oz.', 'floz'], ['fl oz', 'floz'], ['mL', 'ml'], ['L', 'l'], ['Liters', 'l'], ['lbs', 'lb'],
    ['Ounces', 'oz'], ['qt', 'quart'], ['pt', 'pint'], ['pcs', 'each'], ['Slices', 'slices'], ['large', 'large'],
  ];
  it.each(spellings)('normalizeUnit(%j) = %j', (text, code) => {
    expect(normalizeUnit(text)).toBe(code);
  });
});

describe('parseAmount', () => {
  // [typed, value, min, max] — forms people type in recipes (common practice, no source)
  const good: Array<[string, string, string, string]> = [
    ['2', '2', '2', '2'],
    ['1.5', '1.5', '1.5', '1.5'],
    ['.5', '0.5', '0.5', '0.5'],
    ['1,5', '1.5', '1.5', '1.5'],
    ['0,25', '0.25', '0.25', '0.25'],
    ['0,125', '0.125', '0.125', '0.125'],
    ['1,2345', '1.2345', '1.2345', '1.2345'],
    ['1/2', '0.5', '0.5', '0.5'],
    ['1 1/2', '1.5', '1.5', '1.5'],
    ['1-1/2', '1.5', '1.5', '1.5'],
    ['2 3⁄4', '2.75', '2.75', '2.75'],
    ['¾', '0.75', '0.75', '0.75'],
    ['1½', '1.5', '1.5', '1.5'],
    ['1 ½', '1.5', '1.5', '1.5'],
    ['⅛', '0.125', '0.125', '0.125'],
    ['1-2', '1.5', '1', '2'],
    ['1–2', '1.5', '1', '2'],
    ['1 — 3', '2', '1', '3'],
    ['2 to 3', '2.5', '2', '3'],
    ['½-1', '0.75', '0.5', '1'],
    ['1-1 1/2', '1.25', '1', '1.5'],
    ['  3  ', '3', '3', '3'],
  ];
  it.each(good)('%j → value %s (min %s, max %s)', (typed, value, min, max) => {
    const p = parseAmount(typed);
    expect(p.value.eq(value)).toBe(true);
    expect(p.min.eq(min)).toBe(true);
    expect(p.max.eq(max)).toBe(true);
    expect(p.isRange).toBe(!p.min.eq(p.max));
    expect(p.text).toBe(typed.trim().replace(/\s+/g, ' '));
  });

  it('⅓ is kept as an exact-as-possible decimal, not 0.33', () => {
    expect(parseAmount('⅓').value.times(3).toDecimalPlaces(15).eq(1)).toBe(true);
  });

  // [typed, words the message must contain]
  const bad: Array<[string, string]> = [
    ['', 'Enter an amount'],
    ['abc', 'Could not read'],
    ['1/0', 'divides by zero'],
    ['-2', 'negative'],
    ['2-1', 'smaller to the larger'],
    ['1,500', 'ambiguous'],
    ['12,000', 'write 12000'],
    ['1,234,567', 'ambiguous'],
    ['1 3/2', 'less than 1'],
    ['1-2-3', 'Could not read'],
    ['1..5', 'Could not read'],
    ['two', 'Could not read'],
  ];
  it.each(bad)('%j throws AmountParseError mentioning %j', (typed, words) => {
    expect(() => parseAmount(typed)).toThrow(AmountParseError);
    expect(() => parseAmount(typed)).toThrow(words);
  });

  it('property: "w n/d" with n < d reads as w + n/d (fast-check)', () => {
    fc.assert(
      fc.property(fc.nat(500), fc.integer({ min: 2, max: 64 }), fc.nat(), (w, d, raw) => {
        const n = 1 + (raw % (d - 1));
        const expected = new Decimal(w).plus(new Decimal(n).div(d));
        const text = w === 0 ? `${n}/${d}` : `${w} ${n}/${d}`;
        return parseAmount(text).value.eq(expected);
      }),
    );
  });
});

describe('an amount with its unit, as people read it', () => {
  it('writes standard units by their symbols, not their codes', () => {
    // Abbreviations as NIST Handbook 44, Appendix C writes them ("fl oz", "tsp", "tbsp", "oz", "lb"); mL and L are
    // the SI symbols for the milliliter and liter (NIST SP 811 allows the capital L).
    expect(amountWithUnit('1', 'floz')).toBe('1 fl oz');
    expect(amountWithUnit('250', 'ml')).toBe('250 mL');
    expect(amountWithUnit('1', 'l')).toBe('1 L');
    expect(amountWithUnit('1 1/2', 'tbsp')).toBe('1 1/2 tbsp');
    expect(amountWithUnit('1/2', 'cup')).toBe('1/2 cup');
    expect(amountWithUnit('3', 'oz')).toBe('3 oz');
    expect(amountWithUnit(' 100 ', 'g')).toBe('100 g');
  });

  it('writes an amount before a name without saying the piece twice (our wording)', () => {
    expect(amountAndName('1/4', 'avocado', 'Avocado, raw')).toBe('1/4 Avocado, raw');
    expect(amountAndName('1', 'tortilla', 'Low-carb tortilla (high-fibre wheat)')).toBe('1 Low-carb tortilla (high-fibre wheat)');
    expect(amountAndName('2', 'tortilla', 'Low-carb tortilla (high-fibre wheat)')).toBe('2 × Low-carb tortilla (high-fibre wheat)');
    expect(amountAndName('1', 'radish', 'Daikon radish, raw')).toBe('1 Daikon radish, raw');
    // A plural name: the number alone when there are several, the piece when there is one or less.
    expect(amountAndName('6', 'olive', 'Olives, ripe, canned')).toBe('6 Olives, ripe, canned');
    expect(amountAndName('2', 'wrap', 'Egg white wraps')).toBe('2 Egg white wraps');
    expect(amountAndName('1', 'wrap', 'Coconut wraps')).toBe('1 wrap (Coconut wraps)');
    expect(amountAndName('1-2', 'wrap', 'Coconut wraps')).toBe('1-2 Coconut wraps');
    // A piece that is not the food keeps its name; words after the first comma do not count.
    expect(amountAndName('2', 'slice', 'Bacon, cooked, baked')).toBe('2 slice Bacon, cooked, baked');
    expect(amountAndName('1', 'large', 'Eggs, whole, raw')).toBe('1 large Eggs, whole, raw');
    expect(amountAndName('1', 'lemon', 'Lemon juice, fresh')).toBe('1 lemon Lemon juice, fresh');
    expect(amountAndName('1', 'stalk', 'Celery, raw, stalk')).toBe('1 stalk Celery, raw, stalk');
    // Standard units and the generic piece as amountWithUnit writes them.
    expect(amountAndName('1', 'floz', 'Heavy cream')).toBe('1 fl oz Heavy cream');
    expect(amountAndName('2', 'each', 'Cream-cheese almond batter slab')).toBe('2 × Cream-cheese almond batter slab');
    expect(amountAndName('1', 'oz', 'Oz. brand spread')).toBe('1 oz Oz. brand spread');
  });

  it("gives a typed mass or volume in the reader's other system, checked against js-quantities", () => {
    // Kitchen amounts of the exact conversions (NIST Handbook 44 App. C; js-quantities as the second reference).
    const g = (oz: number) => Qty(oz, 'oz').to('g').scalar;
    expect(g(3)).toBeCloseTo(85.05, 2);
    expect(amountInSystem('3', 'oz', 'metric')).toBe('85 g');
    expect(Qty(0.5, 'cu').to('ml').scalar).toBeCloseTo(118.29, 2);
    expect(amountInSystem('1/2', 'cup', 'metric')).toBe('118 mL');
    expect(Qty(100, 'g').to('oz').scalar).toBeCloseTo(3.527, 3);
    expect(amountInSystem('100', 'g', 'us')).toBe('3 ½ oz'); // to the nearest ¼ oz (our kitchen grid)
    expect(amountInSystem('1', 'lb', 'metric')).toBe(`${Math.round(Qty(1, 'lb').to('g').scalar)} g`);
    // Nothing to convert: the reader's own system, a piece, a range, text that does not parse.
    expect(amountInSystem('3', 'oz', 'us')).toBeNull();
    expect(amountInSystem('2', 'slice', 'metric')).toBeNull();
    expect(amountInSystem('2', 'each', 'metric')).toBeNull();
    expect(amountInSystem('1-2', 'oz', 'metric')).toBeNull();
    expect(amountInSystem('some', 'oz', 'metric')).toBeNull();
    // Beside the typed amount, before the name.
    expect(amountAndName('3', 'oz', 'Smoked salmon', 'metric')).toBe('3 oz (85 g) Smoked salmon');
    expect(amountAndName('3', 'oz', 'Smoked salmon', 'us')).toBe('3 oz Smoked salmon');
    expect(amountAndName('1/4', 'avocado', 'Avocado, raw', 'metric')).toBe('1/4 Avocado, raw');
  });

  it('counts whole pieces with ×, and keeps a piece name as stored', () => {
    expect(amountWithUnit('2', 'each')).toBe('2 ×');
    expect(amountWithUnit('1/4', 'avocado')).toBe('1/4 avocado');
    expect(amountWithUnit('1-2', 'slices')).toBe('1-2 slices');
  });

  it('has a symbol for every standard unit', () => {
    for (const u of UNIT_OPTIONS) expect(amountWithUnit('1', u.code)).not.toMatch(/floz|\bml\b|\bl$/);
  });
});

describe('kitchen display', () => {
  const ml = (n: number, u: VolumeUnit) => MILLILITERS_PER_UNIT[u].times(n);
  // [mL, text]; exact NIST amounts show exactly; the rest follow the documented display rule in units.ts
  // (fractions a kitchen measures with: ⅛ ¼ ½ ¾ tsp, ½ tbsp, ⅛ ¼ ⅓ ½ ⅔ ¾ cup; common practice, no source).
  const us: Array<[Decimal.Value, string]> = [
    [ml(1, 'tsp'), '1 tsp'],
    [ml(0.25, 'tsp'), '¼ tsp'],
    [ml(1, 'tbsp'), '1 tbsp'],
    [ml(3, 'tsp'), '1 tbsp'],
    [ml(1.5, 'tbsp'), '1 ½ tbsp'],
    [ml(0.25, 'cup'), '¼ cup'],
    [ml(new Decimal(1).div(3).toNumber(), 'cup'), '⅓ cup'],
    [ml(0.75, 'cup'), '¾ cup'],
    [ml(1, 'cup'), '1 cup'],
    ['531.4', '2 ¼ cups'], // the brief's flour example: 531.4 mL = 2.246 cups
    [ml(1, 'quart'), '4 cups'],
    [ml(4, 'quart'), '4 quarts'],
    [ml(6.5, 'quart'), '6 ½ quarts'],
    ['0.2', '< ⅛ tsp'],
    [ml(2.95, 'tsp'), '1 tbsp'], // 2.95 tsp rounds to 3 tsp, shown as 1 tbsp
    [ml(3.9, 'tbsp'), '¼ cup'], // 3.9 tbsp rounds to 4 tbsp = ¼ cup
    ['0', '0 tsp'],
  ];
  it.each(us)('%s mL (US) → %j', (millilitres, text) => {
    expect(formatVolume(millilitres, 'us').text).toBe(text);
  });

  const usMass: Array<[Decimal.Value, string]> = [
    [GRAMS_PER_UNIT.lb, '1 lb'], // NIST: 1 lb = 16 oz
    [GRAMS_PER_UNIT.oz.times(8), '8 oz'],
    [GRAMS_PER_UNIT.oz.times(24), '1 lb 8 oz'],
    [GRAMS_PER_UNIT.oz.times('6.25'), '6 ¼ oz'],
    [GRAMS_PER_UNIT.lb.times(5), '5 lb'],
    ['12', '0.4 oz'],
    ['1', '< 0.1 oz'],
    ['453', '1 lb'],
  ];
  it.each(usMass)('%s g (US) → %j', (grams, text) => {
    expect(formatMass(grams, 'us').text).toBe(text);
  });

  // Metric rule (units.ts): < 10 one decimal, < 1000 whole, then kg / L with up to two decimals, half up.
  const metric: Array<['mass' | 'volume', Decimal.Value, string]> = [
    ['mass', '2.25', '2.3 g'],
    ['mass', '250', '250 g'],
    ['mass', '999.6', '1 kg'],
    ['mass', '1500', '1.5 kg'],
    ['mass', '1234.5', '1.23 kg'],
    ['volume', '14.79', '15 mL'],
    ['volume', '1000', '1 L'],
    ['volume', '2365.88', '2.37 L'],
  ];
  it.each(metric)('%s %s (metric) → %j', (kind, amount, text) => {
    const shown = kind === 'mass' ? formatMass(amount, 'metric') : formatVolume(amount, 'metric');
    expect(shown.text).toBe(text);
  });

  it('formats an ingredient by volume when it has a density, by mass otherwise, or by piece on request', () => {
    const flour = { name: 'Almond flour', densityGPerMl: '0.4', pieceWeights: { bag: 454 } };
    expect(formatKitchenAmount(new Decimal('531.4').times('0.4'), flour, { system: 'us' }).text).toBe('2 ¼ cups');
    expect(formatKitchenAmount(GRAMS_PER_UNIT.lb, flour, { system: 'us', measure: 'mass' }).text).toBe('1 lb');
    expect(formatKitchenAmount(908, flour, { system: 'us', measure: { piece: 'bag' } }).text).toBe('2 bag');
    expect(formatKitchenAmount(250, { name: 'Cheddar' }, { system: 'metric' }).text).toBe('250 g');
    expect(() => formatKitchenAmount(250, { name: 'Cheddar' }, { system: 'us', measure: 'volume' })).toThrow(
      UnitConversionError,
    );
  });

  it('pieces show to the nearest ¼ (common practice, no source)', () => {
    expect(formatPieces('2.6', 'large').text).toBe('2 ½ large');
    expect(formatPieces('2.9', 'large').text).toBe('3 large');
    // The generic piece is a bare count: "12", not "12 each" (our wording).
    expect(formatPieces('12', 'each').text).toBe('12');
    expect(formatPieces('1.5', 'each').text).toBe('1 ½');
    expect(formatPieces('0.1', 'each').text).toBe('< ¼');
  });

  // The largest half-gap of each unit's grid: a shown value is never further than this from the exact value.
  const halfGap: Record<string, number> = { tsp: 0.125, tbsp: 0.25, cup: 0.125, quart: 0.125 };
  it('property: a US volume display is within half a grid step of the exact amount (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.7, max: 20000, noNaN: true }), (m) => {
        const shown = formatVolume(m, 'us');
        return Math.abs(shown.value - shown.exact) <= halfGap[shown.unit] + 1e-12;
      }),
    );
  });
});

describe('round trips (fast-check)', () => {
  const amount = fc.double({ min: 0.001, max: 1e6, noNaN: true });

  it('property: a → b → a returns the amount, for every same-kind pair', () => {
    const unitPair = fc.oneof(
      fc.tuple(fc.constantFrom(...MASS_UNITS), fc.constantFrom(...MASS_UNITS)),
      fc.tuple(fc.constantFrom(...VOLUME_UNITS), fc.constantFrom(...VOLUME_UNITS)),
    );
    fc.assert(
      fc.property(amount, unitPair, (v, [a, b]) => {
        const back = convertAmount(convertAmount(v, a, b), b, a);
        return back.minus(v).abs().lte(new Decimal(v).times('1e-15'));
      }),
    );
  });

  it('property: toGrams then fromGrams returns the amount for any unit and any density / piece weight', () => {
    const unit = fc.constantFrom<string>(...MASS_UNITS, ...VOLUME_UNITS, 'each', 'slice');
    const fact = fc.double({ min: 0.05, max: 500, noNaN: true });
    fc.assert(
      fc.property(amount, unit, fact, (v, u, f) => {
        const facts = { name: 'Anything', densityGPerMl: f, pieceWeights: { each: f, slice: f / 3 } };
        const back = fromGrams(toGrams(v, u, facts), u, facts);
        return back.minus(v).abs().lte(new Decimal(v).times('1e-15'));
      }),
    );
  });
});
