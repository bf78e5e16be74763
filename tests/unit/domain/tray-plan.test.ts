import Decimal from 'decimal.js';
import fc from 'fast-check';
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { customPan, panArea, scaleLines, STANDARD_PANS, STANDARD_PAN_CODES } from '@shared/domain/scaling';
import { panOf, planScale, portionAreaOf, portionSizeText, portionsOf } from '@shared/domain/tray-plan';

describe('stored pans', () => {
  // Nominal sheet-pan sizes: trade convention (published-values §8: full 26 × 18, half 18 × 13, quarter 13 × 9 in);
  // 9 × 13 in dish: common practice (published-values §8, from memory there).
  const cases: Array<[string, number, number, number]> = [
    ['full-sheet', 26, 18, 468],
    ['half-sheet', 18, 13, 234],
    ['quarter-sheet', 13, 9, 117],
    ['dish-9x13', 13, 9, 117],
  ];
  it.each(cases)('%s is %s × %s in, %s in²', (code, length, width, area) => {
    const pan = panOf({ code: code as 'half-sheet' });
    expect(pan.length.toNumber()).toBe(length);
    expect(pan.width.toNumber()).toBe(width);
    expect(panArea(pan).toNumber()).toBe(area);
  });

  it('a custom pan keeps its sides and unit; a custom pan needs both sides', () => {
    const pan = panOf({ code: 'custom', length: '30', width: '40', unit: 'cm' });
    expect([pan.length.toNumber(), pan.width.toNumber(), pan.unit]).toEqual([40, 30, 'cm']);
    expect(() => panOf({ code: 'custom', length: 10 })).toThrow(RangeError);
  });
});

describe('cut plans', () => {
  // Arithmetic: a half sheet (18 × 13 in) cut 4 rows × 5 columns → 18/5 = 3.6 in by 13/4 = 3.25 in (the brief's
  // example "3.6 × 3.3 in" is this size shown to one decimal).
  it('half sheet, 4 × 5 grid → 20 portions of 3.6 × 3.25 in, 11.7 in² each', () => {
    const pan = STANDARD_PANS['half-sheet'];
    const cut = { kind: 'grid', rows: 4, columns: 5 } as const;
    expect(portionsOf(cut)).toBe(20);
    expect(portionSizeText(pan, cut)).toBe('3.6 × 3.25 in');
    expect(portionAreaOf(pan, cut).toNumber()).toBe(11.7);
  });

  it('N equal pieces: no grid size, the area is shared equally', () => {
    const pan = STANDARD_PANS['quarter-sheet'];
    const cut = { kind: 'pieces', pieces: 9 } as const;
    expect(portionsOf(cut)).toBe(9);
    expect(portionSizeText(pan, cut)).toBeNull();
    expect(portionAreaOf(pan, cut).toNumber()).toBe(13);
  });

  it('property: portions × portion area = pan area (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...STANDARD_PAN_CODES),
        fc.integer({ min: 1, max: 40 }),
        fc.integer({ min: 1, max: 40 }),
        (code, rows, columns) => {
          const pan = STANDARD_PANS[code];
          const cut = { kind: 'grid' as const, rows, columns };
          const back = portionAreaOf(pan, cut).times(portionsOf(cut));
          // decimal.js keeps 20 significant digits: equal to 1e-15 in²
          expect(back.minus(panArea(pan)).abs().lt('1e-15')).toBe(true);
        },
      ),
    );
  });
});

describe('scaling a tray', () => {
  const half = STANDARD_PANS['half-sheet'];

  // The brief's worked example: 40 portions from a 16-portion tray → 3 trays, 48 baked, 8 spare (ceiling division).
  it('target portions in whole trays', () => {
    const plan = planScale(half, 16, { mode: 'targetPortions', targetPortions: 40 });
    expect(plan.factor.toNumber()).toBe(3);
    expect(plan.trays).toEqual({ trays: 3, portionsBaked: 48, spare: 8 });
  });

  // Areas 234 in² (half) and 468 in² (full): trade convention sizes, published-values §8.
  it('half sheet → full sheet doubles the recipe; 20 portions become 40 of the same size', () => {
    const plan = planScale(half, 20, { mode: 'pan', pan: STANDARD_PANS['full-sheet'] });
    expect(plan.factor.toNumber()).toBe(2);
    expect(plan.portionsAtSameSize).toBe(40);
  });

  // 1 in = 2.54 cm exactly (NIST HB 44); the sides are converted by js-quantities, a general-purpose reference
  // library, and 1 in² = 6.4516 cm² by the same library.
  it('a metric custom pan of the same size as a half sheet gives factor 1', () => {
    expect(Qty(1, 'in^2').to('cm^2').scalar).toBeCloseTo(6.4516, 10);
    const sideCm = (inches: number) => new Decimal(Qty(inches, 'in').to('cm').scalar).toDecimalPlaces(10);
    const metricHalf = customPan(sideCm(18), sideCm(13), 'cm');
    const plan = planScale(half, 20, { mode: 'pan', pan: metricHalf });
    expect(plan.factor.toNumber()).toBeCloseTo(1, 9);
    expect(plan.portionsAtSameSize).toBe(20);
  });

  it('a factor below or at 0 is refused', () => {
    expect(() => planScale(half, 20, { mode: 'factor', factor: 0 })).toThrow(RangeError);
    expect(() => planScale(half, 20, { mode: 'factor', factor: -1 })).toThrow(RangeError);
  });

  it('property: whole trays cover the need with fewer spare portions than one tray (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 5000 }), fc.integer({ min: 1, max: 200 }), (need, per) => {
        const plan = planScale(half, per, { mode: 'targetPortions', targetPortions: need });
        const t = plan.trays!;
        expect(t.portionsBaked).toBeGreaterThanOrEqual(need);
        expect(t.spare).toBeLessThan(per);
        expect(plan.factor.toNumber()).toBe(t.trays);
      }),
    );
  });

  it('property: scaling to a pan and back returns every amount exactly (fast-check)', () => {
    const side = fc.integer({ min: 1, max: 400 }).map((n) => new Decimal(n).div(4));
    fc.assert(
      fc.property(side, side, fc.array(fc.integer({ min: 1, max: 100000 }), { minLength: 1, maxLength: 8 }), (a, b, amounts) => {
        const other = customPan(a, b, 'in');
        const there = planScale(half, 20, { mode: 'pan', pan: other }).factor;
        const back = planScale(other, 20, { mode: 'pan', pan: half }).factor;
        const lines = amounts.map((g) => ({ amount: new Decimal(g).div(10) }));
        const roundTrip = scaleLines(scaleLines(lines, there), back);
        roundTrip.forEach((line, i) => {
          expect(line.amount.toDecimalPlaces(12).eq(lines[i].amount)).toBe(true);
        });
      }),
    );
  });

  it('property: scaling by a factor multiplies the total by that factor (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1000 }).map((n) => new Decimal(n).div(100)),
        fc.array(fc.integer({ min: 1, max: 100000 }), { minLength: 1, maxLength: 10 }),
        (f, amounts) => {
          const factor = planScale(half, 16, { mode: 'factor', factor: f }).factor;
          const lines = amounts.map((a) => ({ amount: new Decimal(a) }));
          const sum = (ls: { amount: Decimal }[]) => ls.reduce((s, l) => s.plus(l.amount), new Decimal(0));
          expect(sum(scaleLines(lines, factor)).eq(sum(lines).times(f))).toBe(true);
        },
      ),
    );
  });
});
