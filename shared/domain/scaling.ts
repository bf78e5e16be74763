/**
 * Scaling a base tray: by a factor, to a number of portions in whole trays, to another pan by area, and the size
 * of one portion from a cut plan.
 *
 * Sheet-pan sizes are the trade's nominal TOP (outside) sizes: full 26 × 18 in, half 18 × 13 in, quarter
 * 13 × 9 in. The bottom is a little smaller because the sides slope; we use the nominal size, as the trade does.
 * A 9 × 13 in baking dish is nominal too (common practice, no standard).
 */
import Decimal from 'decimal.js';

export type LengthUnit = 'in' | 'cm';

/** Centimetres per inch (exact, 1959 international inch). */
export const CM_PER_INCH = new Decimal('2.54');

// ---------------------------------------------------------------------------------------------------------------
// Factors and trays
// ---------------------------------------------------------------------------------------------------------------

/** `amount × factor`. The factor must be above 0. */
export function scaleAmount(amount: Decimal.Value, factor: Decimal.Value): Decimal {
  return new Decimal(amount).times(positive(factor, 'A scale factor'));
}

/** Scales the `amount` of every line, keeping everything else. */
export function scaleLines<T extends { amount: Decimal.Value }>(
  lines: readonly T[],
  factor: Decimal.Value,
): Array<Omit<T, 'amount'> & { amount: Decimal }> {
  const f = positive(factor, 'A scale factor');
  return lines.map((line) => ({ ...line, amount: new Decimal(line.amount).times(f) }));
}

export interface TrayPlan {
  trays: number;
  portionsBaked: number;
  /** Portions baked beyond the need. */
  spare: number;
}

/**
 * Whole trays for a number of portions: 40 portions from a 16-portion tray → 3 trays, 48 baked, 8 spare.
 * A need of 0 gives 0 trays.
 */
export function traysForPortions(portionsNeeded: number, portionsPerTray: number): TrayPlan {
  if (!Number.isInteger(portionsNeeded) || portionsNeeded < 0) {
    throw new RangeError(`Portions needed must be a whole number of at least 0 (got ${portionsNeeded}).`);
  }
  if (!Number.isInteger(portionsPerTray) || portionsPerTray < 1) {
    throw new RangeError(`Portions per tray must be a whole number of at least 1 (got ${portionsPerTray}).`);
  }
  const trays = Math.ceil(portionsNeeded / portionsPerTray);
  const portionsBaked = trays * portionsPerTray;
  return { trays, portionsBaked, spare: portionsBaked - portionsNeeded };
}

// ---------------------------------------------------------------------------------------------------------------
// Pans
// ---------------------------------------------------------------------------------------------------------------

export type StandardPanCode = 'full-sheet' | 'half-sheet' | 'quarter-sheet' | 'dish-9x13';

export interface Pan {
  code: StandardPanCode | 'custom';
  label: string;
  /** The long side. */
  length: Decimal;
  /** The short side. */
  width: Decimal;
  unit: LengthUnit;
}

function pan(code: StandardPanCode, label: string, length: number, width: number): Pan {
  return { code, label, length: new Decimal(length), width: new Decimal(width), unit: 'in' };
}

export const STANDARD_PANS: Readonly<Record<StandardPanCode, Pan>> = {
  'full-sheet': pan('full-sheet', 'Full sheet pan (26 × 18 in)', 26, 18),
  'half-sheet': pan('half-sheet', 'Half sheet pan (18 × 13 in)', 18, 13),
  'quarter-sheet': pan('quarter-sheet', 'Quarter sheet pan (13 × 9 in)', 13, 9),
  'dish-9x13': pan('dish-9x13', '9 × 13 in baking dish', 13, 9),
};

export const STANDARD_PAN_CODES: readonly StandardPanCode[] = ['full-sheet', 'half-sheet', 'quarter-sheet', 'dish-9x13'];

/** A pan of any size; the two sides may be given in either order (the longer becomes `length`). */
export function customPan(sideA: Decimal.Value, sideB: Decimal.Value, unit: LengthUnit = 'in', label?: string): Pan {
  const a = positive(sideA, 'A pan side');
  const b = positive(sideB, 'A pan side');
  const [length, width] = a.gte(b) ? [a, b] : [b, a];
  const sym = unit === 'in' ? 'in' : 'cm';
  return { code: 'custom', label: label ?? `Custom pan (${length} × ${width} ${sym})`, length, width, unit };
}

/** Area in the pan's own square units (in² or cm²). */
export function panArea(p: Pan): Decimal {
  return p.length.times(p.width);
}

/** Area in square inches, whatever the pan's unit. */
export function panAreaSquareInches(p: Pan): Decimal {
  const area = panArea(p);
  return p.unit === 'in' ? area : area.div(CM_PER_INCH.pow(2));
}

/**
 * The factor that scales a recipe from one pan to another at the same depth: area(to) ÷ area(from).
 * Half sheet → full sheet = 2. Give depths (same unit as each pan) when they differ: the factor becomes the
 * volume ratio.
 */
export function panScaleFactor(from: Pan, to: Pan, depths?: { from: Decimal.Value; to: Decimal.Value }): Decimal {
  const ratio = panAreaSquareInches(to).div(panAreaSquareInches(from));
  if (!depths) return ratio;
  const inInches = (d: Decimal.Value, p: Pan) => {
    const v = positive(d, 'A depth');
    return p.unit === 'in' ? v : v.div(CM_PER_INCH);
  };
  return ratio.times(inInches(depths.to, to)).div(inInches(depths.from, from));
}

// ---------------------------------------------------------------------------------------------------------------
// Cut plans
// ---------------------------------------------------------------------------------------------------------------

/**
 * How a tray is cut: `rows` split the pan's width (short side), `columns` split its length (long side).
 * A half sheet (18 × 13 in) cut 4 rows × 5 columns gives portions of 3.6 in (along the length) × 3.25 in.
 */
export interface CutPlan {
  rows: number;
  columns: number;
}

export interface PortionSize {
  /** Along the pan's length: length ÷ columns. */
  length: Decimal;
  /** Along the pan's width: width ÷ rows. */
  width: Decimal;
  area: Decimal;
  unit: LengthUnit;
  portions: number;
}

export function portionsInCutPlan(plan: CutPlan): number {
  checkCutPlan(plan);
  return plan.rows * plan.columns;
}

/** The size of one portion in the pan's units. */
export function portionSize(p: Pan, plan: CutPlan): PortionSize {
  checkCutPlan(plan);
  const length = p.length.div(plan.columns);
  const width = p.width.div(plan.rows);
  return { length, width, area: length.times(width), unit: p.unit, portions: plan.rows * plan.columns };
}

/** "3.6 × 3.25 in" (up to two decimals). */
export function formatPortionSize(size: PortionSize): string {
  const f = (d: Decimal) => {
    const fixed = d.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2);
    return fixed.replace(/0+$/, '').replace(/\.$/, '');
  };
  return `${f(size.length)} × ${f(size.width)} ${size.unit}`;
}

function checkCutPlan(plan: CutPlan): void {
  for (const key of ['rows', 'columns'] as const) {
    const v = plan[key];
    if (!Number.isInteger(v) || v < 1) throw new RangeError(`A cut plan's ${key} must be a whole number of at least 1.`);
  }
}

function positive(value: Decimal.Value, what: string): Decimal {
  const d = new Decimal(value);
  if (!d.isFinite() || d.lte(0)) throw new RangeError(`${what} must be above 0 (got ${d.toString()}).`);
  return d;
}
