/**
 * A base tray's pan and cut plan as stored, turned into the shapes of scaling.ts, plus the three ways of scaling
 * a tray (factor, target portions in whole trays, another pan by area). The arithmetic itself lives in
 * scaling.ts; this file only chooses which of its functions applies.
 */
import Decimal from 'decimal.js';
import {
  STANDARD_PANS,
  customPan,
  panArea,
  panScaleFactor,
  portionSize,
  formatPortionSize,
  traysForPortions,
  type LengthUnit,
  type Pan,
  type StandardPanCode,
  type TrayPlan,
} from './scaling';

export interface StoredPan {
  code: StandardPanCode | 'custom';
  length?: Decimal.Value | null;
  width?: Decimal.Value | null;
  unit?: LengthUnit | null;
}

export type StoredCutPlan = { kind: 'grid'; rows: number; columns: number } | { kind: 'pieces'; pieces: number };

/** The Pan of a stored pan: a standard code's nominal size, or the custom sides. */
export function panOf(stored: StoredPan): Pan {
  if (stored.code !== 'custom') return STANDARD_PANS[stored.code];
  if (stored.length == null || stored.width == null) throw new RangeError('A custom pan needs a length and a width.');
  return customPan(stored.length, stored.width, stored.unit ?? 'in');
}

/** Portions a cut plan gives: rows × columns, or the number of equal pieces. */
export function portionsOf(cut: StoredCutPlan): number {
  const n = cut.kind === 'grid' ? cut.rows * cut.columns : cut.pieces;
  if (!Number.isInteger(n) || n < 1) throw new RangeError('A cut plan gives at least 1 portion.');
  return n;
}

/** Area of one portion in the pan's square units: the pan's area shared equally. */
export function portionAreaOf(pan: Pan, cut: StoredCutPlan): Decimal {
  return panArea(pan).div(portionsOf(cut));
}

/** "3.6 × 3.25 in" for a grid cut; null for N equal pieces (their shape is free). */
export function portionSizeText(pan: Pan, cut: StoredCutPlan): string | null {
  if (cut.kind !== 'grid') return null;
  return formatPortionSize(portionSize(pan, { rows: cut.rows, columns: cut.columns }));
}

export type ScaleRequest =
  | { mode: 'factor'; factor: Decimal.Value }
  | { mode: 'targetPortions'; targetPortions: number }
  | { mode: 'pan'; pan: Pan };

export interface ScalePlan {
  factor: Decimal;
  trays: TrayPlan | null;
  pan: Pan | null;
  /** For a new pan: portions of the same size it gives, rounded down. */
  portionsAtSameSize: number | null;
}

/**
 * The factor to apply to every line:
 * - `factor`: as given;
 * - `targetPortions`: whole trays (40 portions from a 16-portion tray → 3 trays, factor 3, 8 spare);
 * - `pan`: area(new) ÷ area(old) at the same depth; the portions at the same size are portions × factor, rounded
 *   down.
 */
export function planScale(from: Pan, portionsPerTray: number, req: ScaleRequest): ScalePlan {
  switch (req.mode) {
    case 'factor': {
      const factor = new Decimal(req.factor);
      if (!factor.isFinite() || factor.lte(0)) throw new RangeError('A scale factor must be above 0.');
      return { factor, trays: null, pan: null, portionsAtSameSize: null };
    }
    case 'targetPortions': {
      const trays = traysForPortions(req.targetPortions, portionsPerTray);
      return { factor: new Decimal(trays.trays), trays, pan: null, portionsAtSameSize: null };
    }
    case 'pan': {
      const factor = panScaleFactor(from, req.pan);
      const portionsAtSameSize = factor.times(portionsPerTray).toDecimalPlaces(6).floor().toNumber();
      return { factor, trays: null, pan: req.pan, portionsAtSameSize };
    }
  }
}

/** What the scaled-amounts view says about its rounding (the formatting rules of units.ts, in words). */
export const SCALE_ROUNDING_NOTE =
  'Scaled amounts are exact in the calculation and rounded only for display: US volumes to the nearest ⅛ tsp, ' +
  '½ tbsp, ⅛ or ⅓ cup or ¼ quart; US weights to 0.1 oz below 1 oz, the nearest ¼ oz below 1 lb, then whole ounces; ' +
  'pieces to the nearest ¼; metric to 0.1 below 10, whole grams or millilitres below 1000, then kg or L with two ' +
  'decimals. Halves round up.';
