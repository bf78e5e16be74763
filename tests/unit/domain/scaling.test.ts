import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  CM_PER_INCH,
  STANDARD_PANS,
  STANDARD_PAN_CODES,
  customPan,
  formatPortionSize,
  panArea,
  panAreaSquareInches,
  panScaleFactor,
  portionSize,
  portionsInCutPlan,
  scaleAmount,
  scaleLines,
  traysForPortions,
  type StandardPanCode,
} from '@shared/domain/scaling';

describe('whole trays for a portion count', () => {
  // [needed, per tray, trays, baked, spare] — ceiling division (arithmetic); first row is the brief's example
  const cases: Array<[number, number, number, number, number]> = [
    [40, 16, 3, 48, 8],
    [48, 16, 3, 48, 0],
    [49, 16, 4, 64, 15],
    [1, 20, 1, 20, 19],
    [0, 16, 0, 0, 0],
    [60, 1, 60, 60, 0],
  ];
  it.each(cases)('%s portions from a %s-portion tray → %s trays, %s baked, %s spare', (need, per, trays, baked, spare) => {
    expect(traysForPortions(need, per)).toEqual({ trays, portionsBaked: baked, spare });
  });

  it.each([[-1, 16], [1.5, 16], [10, 0], [10, 2.5]])('refuses need %s / per tray %s', (need, per) => {
    expect(() => traysForPortions(need, per)).toThrow(RangeError);
  });

  it('property: the fewest trays that cover the need (fast-check)', () => {
    fc.assert(
      fc.property(fc.nat(2000), fc.integer({ min: 1, max: 100 }), (need, per) => {
        const { trays, portionsBaked, spare } = traysForPortions(need, per);
        return portionsBaked >= need && (trays === 0 || (trays - 1) * per < need) && spare === portionsBaked - need;
      }),
    );
  });
});

describe('pans', () => {
  // Nominal trade sizes and areas: reference/published-values.md §8 (full 468, half 234, quarter 117 in²);
  // the 9 × 13 in dish is nominal, about 117 in² (from memory).
  const areas: Array<[StandardPanCode, number, number, number]> = [
    ['full-sheet', 26, 18, 468],
    ['half-sheet', 18, 13, 234],
    ['quarter-sheet', 13, 9, 117],
    ['dish-9x13', 13, 9, 117],
  ];
  it.each(areas)('%s is %s × %s in, %s in²', (code, length, width, area) => {
    const pan = STANDARD_PANS[code];
    expect(pan.length.eq(length) && pan.width.eq(width) && pan.unit === 'in').toBe(true);
    expect(panArea(pan).eq(area)).toBe(true);
  });

  it('lists every standard pan with a label', () => {
    expect(STANDARD_PAN_CODES.map((c) => STANDARD_PANS[c].code)).toEqual(STANDARD_PAN_CODES);
    for (const c of STANDARD_PAN_CODES) expect(STANDARD_PANS[c].label).toMatch(/\d+ × \d+ in/);
  });

  // [from, to, factor] — a half sheet is half a full sheet and twice a quarter sheet (trade naming, §8)
  const factors: Array<[StandardPanCode, StandardPanCode, string]> = [
    ['half-sheet', 'full-sheet', '2'],
    ['quarter-sheet', 'half-sheet', '2'],
    ['full-sheet', 'quarter-sheet', '0.25'],
    ['dish-9x13', 'half-sheet', '2'],
    ['half-sheet', 'half-sheet', '1'],
  ];
  it.each(factors)('%s → %s scales by %s at the same depth', (from, to, factor) => {
    expect(panScaleFactor(STANDARD_PANS[from], STANDARD_PANS[to]).eq(factor)).toBe(true);
  });

  it('a custom pan in cm: 45.72 × 33.02 cm is exactly a half sheet (1 in = 2.54 cm, NIST HB 44)', () => {
    const metricHalf = customPan('33.02', '45.72', 'cm');
    expect(metricHalf.length.eq('45.72')).toBe(true); // the longer side becomes the length
    expect(panAreaSquareInches(metricHalf).eq(234)).toBe(true);
    expect(panScaleFactor(metricHalf, STANDARD_PANS['half-sheet']).eq(1)).toBe(true);
    expect(CM_PER_INCH.eq('2.54')).toBe(true);
  });

  it('different depths scale by volume: a 1 in deep half sheet to a 2 in deep 9 × 13 dish is 1', () => {
    expect(panScaleFactor(STANDARD_PANS['half-sheet'], STANDARD_PANS['dish-9x13'], { from: 1, to: 2 }).eq(1)).toBe(true);
  });

  it.each([[0, 9], [-1, 9], [Number.NaN, 9]])('refuses a custom pan side of %s', (a, b) => {
    expect(() => customPan(a, b)).toThrow(RangeError);
  });
});

describe('portion size from a cut plan', () => {
  // [pan, rows, columns, length, width, text]; rows split the width, columns the length (arithmetic;
  // the first row is the brief's example: half sheet 4 × 5 → 3.6 × 3.25 in)
  const cases: Array<[StandardPanCode, number, number, string, string, string]> = [
    ['half-sheet', 4, 5, '3.6', '3.25', '3.6 × 3.25 in'],
    ['full-sheet', 6, 8, '3.25', '3', '3.25 × 3 in'],
    ['quarter-sheet', 3, 4, '3.25', '3', '3.25 × 3 in'],
    ['dish-9x13', 3, 3, new Decimal(13).div(3).toString(), '3', '4.33 × 3 in'],
  ];
  it.each(cases)('%s cut %s × %s → %s × %s', (code, rows, columns, length, width, text) => {
    const size = portionSize(STANDARD_PANS[code], { rows, columns });
    expect(size.length.eq(length) && size.width.eq(width)).toBe(true);
    expect(size.portions).toBe(rows * columns);
    expect(formatPortionSize(size)).toBe(text);
  });

  it('property: portion area × portions = pan area (fast-check)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...STANDARD_PAN_CODES), fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 12 }), (code, rows, columns) => {
        const pan = STANDARD_PANS[code];
        const size = portionSize(pan, { rows, columns });
        return size.area.times(portionsInCutPlan({ rows, columns })).minus(panArea(pan)).abs().lte('1e-15');
      }),
    );
  });

  it.each([[{ rows: 0, columns: 5 }], [{ rows: 2, columns: 1.5 }]])('refuses cut plan %o', (plan) => {
    expect(() => portionSize(STANDARD_PANS['half-sheet'], plan)).toThrow(RangeError);
  });
});

describe('scaling by a factor', () => {
  it('scales amounts and recipe lines, keeping the other fields', () => {
    expect(scaleAmount('1.5', 2).eq(3)).toBe(true);
    const lines = scaleLines([{ ingredientId: 'egg', amount: 12, unit: 'large' }], '0.5');
    expect(lines[0]).toMatchObject({ ingredientId: 'egg', unit: 'large' });
    expect(lines[0].amount.eq(6)).toBe(true);
  });

  it.each([[0], [-2]])('refuses factor %s', (factor) => {
    expect(() => scaleAmount(1, factor)).toThrow(RangeError);
  });

  it('property: scale by k then by 1/k returns the original (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (amount, k) => {
        const back = scaleAmount(scaleAmount(amount, k), new Decimal(1).div(k));
        return back.minus(amount).abs().lte(new Decimal(amount).times('1e-15').plus('1e-300'));
      }),
    );
  });
});
