/**
 * Generic sheets of container labels, described by size only (never by a vendor's product code).
 *
 * Page sizes: US Letter 8.5 × 11 in (ANSI/ASME Y14.1) and A4 210 × 297 mm (ISO 216).
 * The label grids are common layouts of blank label stock (common practice, no source): on Letter, 2 columns × 5 rows
 * of 4 × 2 in labels; on A4, 3 columns × 7 rows of 63.5 × 38.1 mm labels. The margins and gaps below make each grid
 * fill its page exactly; print at 100 % ("actual size"), never "fit to page".
 */
import Decimal from 'decimal.js';

export const LABEL_SHEET_CODES = ['letter-2x5', 'a4-3x7'] as const;
export type LabelSheetCode = (typeof LABEL_SHEET_CODES)[number];

export interface LabelSheet {
  code: LabelSheetCode;
  /** What a person reads in the picker. */
  name: string;
  unit: 'in' | 'mm';
  page: { width: number; height: number; cssSize: string };
  columns: number;
  rows: number;
  label: { width: number; height: number };
  /** Top and left page margins to the first label; gaps between neighbouring labels. */
  marginTop: number;
  marginLeft: number;
  gapX: number;
  gapY: number;
}

export const LABEL_SHEETS: Readonly<Record<LabelSheetCode, LabelSheet>> = {
  'letter-2x5': {
    code: 'letter-2x5',
    name: 'US Letter, 2 × 5 labels of 4 × 2 in',
    unit: 'in',
    page: { width: 8.5, height: 11, cssSize: 'letter' },
    columns: 2,
    rows: 5,
    label: { width: 4, height: 2 },
    marginTop: 0.5,
    marginLeft: 0.15625,
    gapX: 0.1875,
    gapY: 0,
  },
  'a4-3x7': {
    code: 'a4-3x7',
    name: 'A4, 3 × 7 labels of 63.5 × 38.1 mm',
    unit: 'mm',
    page: { width: 210, height: 297, cssSize: 'A4' },
    columns: 3,
    rows: 7,
    label: { width: 63.5, height: 38.1 },
    marginTop: 15.15,
    marginLeft: 7.25,
    gapX: 2.5,
    gapY: 0,
  },
};

export function labelsPerSheet(sheet: LabelSheet): number {
  return sheet.columns * sheet.rows;
}

/** The grid's total width and height (margins on both sides included), exact. */
export function sheetExtent(sheet: LabelSheet): { width: Decimal; height: Decimal } {
  const w = new Decimal(sheet.label.width).times(sheet.columns).plus(new Decimal(sheet.gapX).times(sheet.columns - 1));
  const h = new Decimal(sheet.label.height).times(sheet.rows).plus(new Decimal(sheet.gapY).times(sheet.rows - 1));
  return { width: w.plus(new Decimal(sheet.marginLeft).times(2)), height: h.plus(new Decimal(sheet.marginTop).times(2)) };
}

/** Top-left corner of the label at `index` (0-based, row by row) on its page, in the sheet's unit. */
export function labelPosition(sheet: LabelSheet, index: number): { page: number; x: Decimal; y: Decimal } {
  const per = labelsPerSheet(sheet);
  const page = Math.floor(index / per);
  const onPage = index % per;
  const row = Math.floor(onPage / sheet.columns);
  const col = onPage % sheet.columns;
  return {
    page,
    x: new Decimal(sheet.marginLeft).plus(new Decimal(sheet.label.width).plus(sheet.gapX).times(col)),
    y: new Decimal(sheet.marginTop).plus(new Decimal(sheet.label.height).plus(sheet.gapY).times(row)),
  };
}

/**
 * Splits labels into pages of one sheet each. `skip` places on the first sheet are left empty (null): a sheet used in
 * part before starts at its first unused label (counted row by row, as `labelPosition` places them).
 */
export function pagesOf<T>(labels: readonly T[], sheet: LabelSheet, skip = 0): (T | null)[][] {
  const per = labelsPerSheet(sheet);
  if (!Number.isInteger(skip) || skip < 0 || skip >= per) throw new RangeError(`Labels to skip must be 0 to ${per - 1}: ${skip}`);
  const placed: (T | null)[] = [...Array<null>(labels.length ? skip : 0).fill(null), ...labels];
  const pages: (T | null)[][] = [];
  for (let i = 0; i < placed.length; i += per) pages.push(placed.slice(i, i + per));
  return pages;
}

/** Sheets that `count` labels take, the first `skip` places of the first sheet left empty. */
export function sheetsFor(count: number, sheet: LabelSheet, skip = 0): number {
  return count === 0 ? 0 : Math.ceil((count + skip) / labelsPerSheet(sheet));
}
