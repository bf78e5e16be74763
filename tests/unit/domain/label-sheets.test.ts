import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LABEL_SHEETS, LABEL_SHEET_CODES, labelPosition, labelsPerSheet, pagesOf, sheetExtent, sheetsFor } from '@shared/domain/label-sheets';

// Page sizes: US Letter 8.5 × 11 in (ANSI/ASME Y14.1, "A" size); A4 210 × 297 mm (ISO 216).
// The label grids (2 × 5 of 4 × 2 in; 3 × 7 of 63.5 × 38.1 mm) are common blank-label layouts: common practice, no source.
const PAGES = [
  { code: 'letter-2x5', width: 8.5, height: 11, unit: 'in', labels: 10 },
  { code: 'a4-3x7', width: 210, height: 297, unit: 'mm', labels: 21 },
] as const;

describe('label sheets', () => {
  it.each(PAGES)('$code fills its page exactly ($width × $height $unit) with $labels labels', ({ code, width, height, unit, labels }) => {
    const sheet = LABEL_SHEETS[code];
    expect(sheet.unit).toBe(unit);
    expect(sheet.page).toMatchObject({ width, height });
    const extent = sheetExtent(sheet);
    expect(extent.width.toNumber()).toBe(width);
    expect(extent.height.toNumber()).toBe(height);
    expect(labelsPerSheet(sheet)).toBe(labels);
  });

  it('names sheets by size only', () => {
    for (const code of LABEL_SHEET_CODES) expect(LABEL_SHEETS[code].name).toMatch(/^(US Letter|A4), \d × \d labels of [\d.]+ × [\d.]+ (in|mm)$/);
  });

  it('places the last label of a page flush with the bottom-right margin', () => {
    for (const code of LABEL_SHEET_CODES) {
      const s = LABEL_SHEETS[code];
      const last = labelPosition(s, labelsPerSheet(s) - 1);
      expect(last.page).toBe(0);
      expect(last.x.plus(s.label.width).plus(s.marginLeft).toNumber()).toBe(s.page.width);
      expect(last.y.plus(s.label.height).plus(s.marginTop).toNumber()).toBe(s.page.height);
    }
  });

  it('every label lies inside its page and pages hold at most one sheet (property)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...LABEL_SHEET_CODES), fc.integer({ min: 0, max: 500 }), (code, n) => {
        const s = LABEL_SHEETS[code];
        const pages = pagesOf(Array.from({ length: n }, (_, i) => i), s);
        expect(pages.flat()).toHaveLength(n);
        expect(pages.every((p) => p.length <= labelsPerSheet(s) && p.length > 0)).toBe(true);
        for (let i = 0; i < Math.min(n, 60); i++) {
          const { x, y, page } = labelPosition(s, i);
          expect(page).toBe(Math.floor(i / labelsPerSheet(s)));
          expect(x.gte(0) && x.plus(s.label.width).lte(new Decimal(s.page.width))).toBe(true);
          expect(y.gte(0) && y.plus(s.label.height).lte(new Decimal(s.page.height))).toBe(true);
        }
      }),
    );
  });

  it('a sheet used in part before: the first places stay empty, the labels follow in order, the sheet count adds them (property)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...LABEL_SHEET_CODES), fc.integer({ min: 0, max: 300 }), fc.nat(), (code, n, k) => {
        const s = LABEL_SHEETS[code];
        const skip = k % labelsPerSheet(s);
        const labels = Array.from({ length: n }, (_, i) => i);
        const pages = pagesOf(labels, s, skip);
        expect(pages).toHaveLength(sheetsFor(n, s, skip));
        const flat = pages.flat();
        expect(flat.slice(0, n ? skip : 0).every((x) => x === null)).toBe(true);
        expect(flat.filter((x) => x !== null)).toEqual(labels);
        expect(pages.every((p) => p.length <= labelsPerSheet(s))).toBe(true);
      }),
    );
    // Worked by hand: 4 labels from place 8 of a 2 × 5 Letter sheet: places 8, 9, 10, then place 1 of a second sheet.
    const letter = LABEL_SHEETS['letter-2x5'];
    expect(pagesOf(['a', 'b', 'c', 'd'], letter, 7).map((p) => p.length)).toEqual([10, 1]);
    expect(sheetsFor(4, letter, 7)).toBe(2);
    expect(sheetsFor(0, letter, 7)).toBe(0);
    expect(() => pagesOf(['a'], letter, 10)).toThrow(RangeError);
  });
});
