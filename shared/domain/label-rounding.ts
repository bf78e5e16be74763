/**
 * Nutrition-label rounding per 21 CFR 101.9(c) and FDA "A Food Labeling Guide", Appendix H.
 *
 * Apply it only to what is PRINTED (a portion label); keep computing with the unrounded values.
 * - Calories (c)(1): < 5 → 0; ≤ 50 → nearest 5; > 50 → nearest 10.
 * - Total fat (c)(2), saturated fat (c)(2)(i): < 0.5 g → 0; < 5 g → nearest 0.5 g; ≥ 5 g → nearest 1 g.
 * - Sodium (c)(4): < 5 mg → 0; 5–140 mg → nearest 5 mg; > 140 mg → nearest 10 mg.
 * - Total carbohydrate (c)(6), dietary fibre (c)(6)(i), total sugars (c)(6)(ii):
 *   < 0.5 g → 0; < 1 g → "less than 1 g"; ≥ 1 g → nearest 1 g.
 * - Protein (c)(7): < 0.5 g → 0; 0.5 to < 1 g → "less than 1 g" or, at the maker's choice, 1 g; ≥ 1 g → nearest 1 g.
 * Which band applies is decided on the unrounded value (4.76 g fat is in the "< 5 g" band and prints "5 g").
 *
 * ASSUMPTION: exact halfway values round UP (47.5 kcal → 50, 2.25 g fat → 2.5 g). Neither the CFR nor
 * Appendix H states a tie-break; FDA rounds halfway serving sizes up, and we do the same here.
 */
import Decimal from 'decimal.js';

export type LabelUnit = 'kcal' | 'g' | 'mg';

export interface LabelValue {
  /** The declared number; with `lessThan` it is the bound ("less than 1 g" → value 1). */
  value: number;
  lessThan: boolean;
  unit: LabelUnit;
  /** What to print: "50" for calories, "4.5 g", "0 g", "less than 1 g", "140 mg". */
  text: string;
}

/** Rounds to the nearest multiple of `step`, ties up. */
export function roundToStep(value: Decimal.Value, step: Decimal.Value): Decimal {
  const s = new Decimal(step);
  return new Decimal(value).div(s).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).times(s);
}

function amount(value: Decimal, unit: LabelUnit): LabelValue {
  const n = value.toNumber();
  const shown = value.toString();
  return { value: n, lessThan: false, unit, text: unit === 'kcal' ? shown : `${shown} ${unit}` };
}

function lessThanOneGram(): LabelValue {
  return { value: 1, lessThan: true, unit: 'g', text: 'less than 1 g' };
}

function nonNegative(value: Decimal.Value, what: string): Decimal {
  const d = new Decimal(value);
  if (!d.isFinite() || d.lt(0)) throw new RangeError(`${what} for a label must be a number of at least 0.`);
  return d;
}

/** Calories, 21 CFR 101.9(c)(1). */
export function labelCalories(kcal: Decimal.Value): LabelValue {
  const v = nonNegative(kcal, 'Calories');
  if (v.lt(5)) return amount(new Decimal(0), 'kcal');
  if (v.lte(50)) return amount(roundToStep(v, 5), 'kcal');
  return amount(roundToStep(v, 10), 'kcal');
}

/** Total fat and saturated fat, 21 CFR 101.9(c)(2) and (c)(2)(i). */
export function labelFat(grams: Decimal.Value): LabelValue {
  const v = nonNegative(grams, 'Fat');
  if (v.lt('0.5')) return amount(new Decimal(0), 'g');
  if (v.lt(5)) return amount(roundToStep(v, '0.5'), 'g');
  return amount(roundToStep(v, 1), 'g');
}

/** Total carbohydrate, dietary fibre and total sugars, 21 CFR 101.9(c)(6), (c)(6)(i), (c)(6)(ii). */
export function labelCarbohydrate(grams: Decimal.Value): LabelValue {
  const v = nonNegative(grams, 'Carbohydrate');
  if (v.lt('0.5')) return amount(new Decimal(0), 'g');
  if (v.lt(1)) return lessThanOneGram();
  return amount(roundToStep(v, 1), 'g');
}

export interface ProteinLabelOptions {
  /** For 0.5 g to < 1 g: "less than 1 g" (default) or "1 g"; 21 CFR 101.9(c)(7) allows either. */
  halfToOne?: 'less-than' | 'one';
}

/** Protein, 21 CFR 101.9(c)(7). */
export function labelProtein(grams: Decimal.Value, options: ProteinLabelOptions = {}): LabelValue {
  const v = nonNegative(grams, 'Protein');
  if (v.lt('0.5')) return amount(new Decimal(0), 'g');
  if (v.lt(1)) return options.halfToOne === 'one' ? amount(new Decimal(1), 'g') : lessThanOneGram();
  return amount(roundToStep(v, 1), 'g');
}

/** Sodium, 21 CFR 101.9(c)(4). */
export function labelSodium(mg: Decimal.Value): LabelValue {
  const v = nonNegative(mg, 'Sodium');
  if (v.lt(5)) return amount(new Decimal(0), 'mg');
  if (v.lte(140)) return amount(roundToStep(v, 5), 'mg');
  return amount(roundToStep(v, 10), 'mg');
}

/** The per-serving values a label needs (a NutrientVector or its JSON numbers fit). */
export interface LabelInput {
  kcal: Decimal.Value;
  fatG: Decimal.Value;
  satFatG: Decimal.Value;
  carbsG: Decimal.Value;
  fiberG: Decimal.Value;
  sugarsG: Decimal.Value;
  proteinG: Decimal.Value;
  sodiumMg: Decimal.Value;
}

export type LabelPanel = Record<keyof LabelInput, LabelValue>;

/** Every declared nutrient of one serving, rounded for the label. */
export function labelPanel(perServing: LabelInput, options: ProteinLabelOptions = {}): LabelPanel {
  return {
    kcal: labelCalories(perServing.kcal),
    fatG: labelFat(perServing.fatG),
    satFatG: labelFat(perServing.satFatG),
    carbsG: labelCarbohydrate(perServing.carbsG),
    fiberG: labelCarbohydrate(perServing.fiberG),
    sugarsG: labelCarbohydrate(perServing.sugarsG),
    proteinG: labelProtein(perServing.proteinG, options),
    sodiumMg: labelSodium(perServing.sodiumMg),
  };
}
