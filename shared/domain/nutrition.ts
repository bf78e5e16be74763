/**
 * Nutrition: per-100 g facts on an ingredient, recipe totals, per portion, cooked yield, net carbs under a
 * configurable rule, an Atwater energy cross-check, and the energy share of fat / protein / carbs.
 *
 * Conventions
 * - `carbsG` is US "Total Carbohydrate" (21 CFR 101.9(c)(6)): it INCLUDES dietary fibre, sugar alcohols and
 *   allulose. EU/UK labels (and IFCT) declare carbohydrate WITHOUT fibre: convert with `usTotalCarbsFromEu`.
 * - Sugar alcohols are kept by kind: `erythritolG`, `otherPolyolsG` (maltitol, sorbitol, xylitol, isomalt, …)
 *   and `alluloseG`. Allulose is a rare sugar, not a polyol, but keto practice subtracts it like erythritol,
 *   so it is kept in the same group. `polyolsG` in results = erythritol + other polyols + allulose
 *   ("sugar alcohols and allulose"); the split stays available beside it.
 * - Optional nutrients that are missing (null / undefined) count as 0; kcal, fat, protein and carbs are required.
 * - Exact Decimals throughout; `computeRecipe` rounds to 0.01 for JSON at the very end.
 */
import Decimal from 'decimal.js';
import { toGrams, type IngredientFacts, type UnitCode } from './units';

type Num = Decimal.Value;
type MaybeNum = Decimal.Value | null | undefined;

/** Nutrients per 100 g of an ingredient as stored (strings from PostgreSQL decimals, or numbers). */
export interface NutrientsPer100g {
  kcal: Num;
  fatG: Num;
  satFatG?: MaybeNum;
  proteinG: Num;
  /** US total carbohydrate, including fibre, sugar alcohols and allulose. */
  carbsG: Num;
  fiberG?: MaybeNum;
  sugarsG?: MaybeNum;
  erythritolG?: MaybeNum;
  /** Allulose: not a polyol, but kept with them (keto practice subtracts it; FDA counts it at 0.4 kcal/g). */
  alluloseG?: MaybeNum;
  /** Every sugar alcohol other than erythritol. */
  otherPolyolsG?: MaybeNum;
  sodiumMg?: MaybeNum;
}

export interface NutritionIngredient extends IngredientFacts {
  per100g: NutrientsPer100g;
}

/** One line of a base tray's recipe. `amount` is a number (parse typed text with `parseAmount` first). */
export interface RecipeLine {
  ingredient: NutritionIngredient;
  amount: Num;
  unit: UnitCode;
}

/** The additive nutrients (everything except net carbs, which depend on a rule). */
export interface NutrientSums {
  kcal: Decimal;
  fatG: Decimal;
  satFatG: Decimal;
  proteinG: Decimal;
  carbsG: Decimal;
  fiberG: Decimal;
  sugarsG: Decimal;
  erythritolG: Decimal;
  alluloseG: Decimal;
  otherPolyolsG: Decimal;
  sodiumMg: Decimal;
  massG: Decimal;
}

/** The nutrient vector with exact decimals. */
export interface NutrientVector extends NutrientSums {
  /** Sugar alcohols and allulose: erythritolG + otherPolyolsG + alluloseG. */
  polyolsG: Decimal;
  netCarbsG: Decimal;
}

/** The nutrient vector as plain JSON numbers (rounded to 0.01). */
export type NutrientNumbers = { [K in keyof NutrientVector]: number };

const SUM_KEYS = [
  'kcal', 'fatG', 'satFatG', 'proteinG', 'carbsG', 'fiberG', 'sugarsG',
  'erythritolG', 'alluloseG', 'otherPolyolsG', 'sodiumMg', 'massG',
] as const satisfies ReadonlyArray<keyof NutrientSums>;

const VECTOR_KEYS = [...SUM_KEYS, 'polyolsG', 'netCarbsG'] as const satisfies ReadonlyArray<keyof NutrientVector>;

// ---------------------------------------------------------------------------------------------------------------
// Net carbs
// ---------------------------------------------------------------------------------------------------------------

/**
 * How net carbs are counted. "Net carbs" has no US regulatory definition (21 CFR 101.54(a) and FDA have none);
 * these are the common-practice variants:
 * - `full`: total − fibre − all sugar alcohols − allulose
 * - `half-other-polyols` (DEFAULT): total − fibre − erythritol − allulose − ½ × other polyols
 * - `fiber-only`: total − fibre
 * Net carbs are never below 0.
 */
export type NetCarbRule = { kind: 'full' } | { kind: 'half-other-polyols' } | { kind: 'fiber-only' };
export type NetCarbRuleKind = NetCarbRule['kind'];

export const DEFAULT_NET_CARB_RULE: NetCarbRule = { kind: 'half-other-polyols' };

export const NET_CARB_RULES: ReadonlyArray<{ kind: NetCarbRuleKind; label: string; formula: string }> = [
  {
    kind: 'half-other-polyols',
    label: 'Half of other sugar alcohols (default)',
    formula: 'total carbs − fiber − erythritol − allulose − ½ × other sugar alcohols',
  },
  { kind: 'full', label: 'All sugar alcohols', formula: 'total carbs − fiber − all sugar alcohols − allulose' },
  { kind: 'fiber-only', label: 'Fiber only', formula: 'total carbs − fiber' },
];

export interface CarbBreakdown {
  carbsG: Num;
  fiberG?: MaybeNum;
  erythritolG?: MaybeNum;
  alluloseG?: MaybeNum;
  otherPolyolsG?: MaybeNum;
}

function dec(v: MaybeNum): Decimal {
  return v === null || v === undefined || v === '' ? new Decimal(0) : new Decimal(v);
}

/** Net carbs of a carbohydrate breakdown under a rule; never below 0. */
export function netCarbs(c: CarbBreakdown, rule: NetCarbRule = DEFAULT_NET_CARB_RULE): Decimal {
  const total = dec(c.carbsG);
  const fiber = dec(c.fiberG);
  const ery = dec(c.erythritolG);
  const allu = dec(c.alluloseG);
  const other = dec(c.otherPolyolsG);
  let net: Decimal;
  switch (rule.kind) {
    case 'full':
      net = total.minus(fiber).minus(ery).minus(allu).minus(other);
      break;
    case 'half-other-polyols':
      net = total.minus(fiber).minus(ery).minus(allu).minus(other.div(2));
      break;
    case 'fiber-only':
      net = total.minus(fiber);
      break;
    default: {
      const never: never = rule;
      throw new RangeError(`Unknown net-carb rule: ${JSON.stringify(never)}`);
    }
  }
  return Decimal.max(net, 0);
}

/** EU/UK (and IFCT) "carbohydrate" excludes fibre (Reg. 1169/2011 Annex I); US total carbohydrate includes it. */
export function usTotalCarbsFromEu(euCarbohydrateG: Num, fiberG: MaybeNum): Decimal {
  return new Decimal(euCarbohydrateG).plus(dec(fiberG));
}

// ---------------------------------------------------------------------------------------------------------------
// Vectors
// ---------------------------------------------------------------------------------------------------------------

/** The shared zero: absent and zero nutrients are this one immutable Decimal (no parsing, no arithmetic). */
const ZERO = new Decimal(0);
const HUNDREDTH = new Decimal('0.01');
const ZERO_TEXT = /^[-+]?(0+(\.0*)?|\.0+)$/;

export function zeroSums(): NutrientSums {
  const z = {} as Record<keyof NutrientSums, Decimal>;
  for (const k of SUM_KEYS) z[k] = ZERO;
  return z;
}

/**
 * Stored nutrient values are decimal strings that repeat from request to request (the same library rows): each
 * text is parsed once. Decimals are immutable, so sharing one is safe; the map is cleared when it grows past
 * PARSED_LIMIT (a pure parse memo: it holds nothing a fresh process would answer differently).
 */
const PARSED = new Map<string, Decimal>();
const PARSED_LIMIT = 20_000;

function parsedText(v: string): Decimal {
  let d = PARSED.get(v);
  if (d === undefined) {
    d = ZERO_TEXT.test(v) ? ZERO : new Decimal(v);
    if (PARSED.size >= PARSED_LIMIT) PARSED.clear();
    PARSED.set(v, d);
  }
  return d;
}

/** A stored nutrient value times a factor; an absent or zero value gives the shared zero (no parsing, no product). */
function timesOrZero(v: MaybeNum, f: Decimal): Decimal {
  if (v === null || v === undefined || v === '' || v === 0) return ZERO;
  const d = typeof v === 'string' ? parsedText(v) : new Decimal(v);
  return d === ZERO || d.isZero() ? ZERO : d.times(f);
}

/**
 * Products already computed, by their inputs' exact text (grams and every per-100 g value): a recipe form asks again
 * on each keystroke with one line changed, and a week board weighs the same add-on on many plates. Cleared past
 * PARSED_LIMIT entries; values are frozen (callers share them).
 */
const PRODUCTS = new Map<string, NutrientSums>();

/** Every per-100 g value as text, for PRODUCTS' keys; a frozen object (it cannot change) is written once. */
const FROZEN_FACTS_TEXT = new WeakMap<NutrientsPer100g, string>();
function factsText(v: NutrientsPer100g): string {
  let text = FROZEN_FACTS_TEXT.get(v);
  if (text === undefined) {
    text = `${v.kcal}|${v.fatG}|${v.satFatG}|${v.proteinG}|${v.carbsG}|${v.fiberG}|${v.sugarsG}|${v.erythritolG}|${v.alluloseG}|${v.otherPolyolsG}|${v.sodiumMg}`;
    if (Object.isFrozen(v)) FROZEN_FACTS_TEXT.set(v, text);
  }
  return text;
}

/** The additive nutrients in `grams` of an ingredient (massG = grams). */
export function nutrientsForGrams(per100g: NutrientsPer100g, grams: Num): NutrientSums {
  const g = grams instanceof Decimal ? grams : new Decimal(grams);
  // A frozen row (the library rows a request shares) keys its products by grams alone; any other by its text too.
  const byRow = Object.isFrozen(per100g) ? productsByRow(per100g) : undefined;
  const key = byRow ? g.toString() : `${g.toString()}|${factsText(per100g)}`;
  const cache = byRow ?? PRODUCTS;
  let sums = cache.get(key);
  if (sums === undefined) {
    sums = productsOf(per100g, g);
    Object.defineProperty(sums, SCALED, { value: scaledOf(sums), enumerable: false });
    Object.freeze(sums);
    if (cache.size >= PARSED_LIMIT) cache.clear();
    cache.set(key, sums);
  }
  return sums;
}

/** Products of one frozen per-100 g row, by grams (the row's text would give the same products: it cannot change). */
const FROZEN_ROW_PRODUCTS = new WeakMap<NutrientsPer100g, Map<string, NutrientSums>>();
function productsByRow(per100g: NutrientsPer100g): Map<string, NutrientSums> {
  let m = FROZEN_ROW_PRODUCTS.get(per100g);
  if (m === undefined) FROZEN_ROW_PRODUCTS.set(per100g, (m = new Map()));
  return m;
}

function productsOf(per100g: NutrientsPer100g, g: Decimal): NutrientSums {
  // × 0.01 is exact and cheaper than ÷ 100 (decimal.js divides digit by digit).
  const f = g.times(HUNDREDTH);
  return {
    kcal: timesOrZero(per100g.kcal, f),
    fatG: timesOrZero(per100g.fatG, f),
    satFatG: timesOrZero(per100g.satFatG, f),
    proteinG: timesOrZero(per100g.proteinG, f),
    carbsG: timesOrZero(per100g.carbsG, f),
    fiberG: timesOrZero(per100g.fiberG, f),
    sugarsG: timesOrZero(per100g.sugarsG, f),
    erythritolG: timesOrZero(per100g.erythritolG, f),
    alluloseG: timesOrZero(per100g.alluloseG, f),
    otherPolyolsG: timesOrZero(per100g.otherPolyolsG, f),
    sodiumMg: timesOrZero(per100g.sodiumMg, f),
    massG: g,
  };
}

/** Sums field by field; adding the shared zero keeps the other side as it is (Decimals are immutable). */
export function addSums(a: NutrientSums, b: NutrientSums): NutrientSums {
  const out = {} as Record<keyof NutrientSums, Decimal>;
  for (const k of SUM_KEYS) out[k] = b[k] === ZERO ? a[k] : a[k] === ZERO ? b[k] : a[k].plus(b[k]);
  return out;
}

/**
 * Exact sums of many products without a Decimal addition per term. A product (nutrientsForGrams) also carries each
 * field as a whole number of 10^-8 units when it has at most 8 decimal places and is small enough (SCALED_TERM_MAX):
 * such whole numbers add exactly in floating point while the running total stays within 2^53, so the sum is the
 * exact decimal sum, the same Decimal a chain of `plus` gives (every such sum has at most 16 significant digits,
 * inside decimal.js's 20). Terms without it (more places, larger values, sums not from nutrientsForGrams) are added
 * as Decimals at 60 significant digits (WIDE); a running total past SCALED_FLUSH moves there first. The total is
 * the exact sum rounded once to decimal.js's 20 significant digits (half up): a chain of `plus` at 20 digits would
 * round at every step, and a recipe of billions of grams with many decimal places could differ in its last digit.
 */
const WIDE = Decimal.clone({ precision: 60 });
const SCALED = Symbol('trayline.scaledSums');
const SCALE_PLACES = 8;
const SCALE = new Decimal(10).pow(SCALE_PLACES);
const SCALED_TERM_MAX = Math.floor(Number.MAX_SAFE_INTEGER / 4096);
const SCALED_FLUSH = Math.floor(Number.MAX_SAFE_INTEGER / 2);
type Scaled = Readonly<Record<keyof NutrientSums, number>>;

/** Each field as a whole number of 10^-8, or NaN where it has more places or is too large to add exactly. */
function scaledOf(s: NutrientSums): Scaled {
  const out = {} as Record<keyof NutrientSums, number>;
  for (const k of SUM_KEYS) {
    const v = s[k];
    out[k] = v === ZERO ? 0 : v.decimalPlaces() <= SCALE_PLACES && v.abs().times(SCALE).lte(SCALED_TERM_MAX) ? v.times(SCALE).toNumber() : NaN;
  }
  return Object.freeze(out);
}

/** A running total: whole 10^-8 units per field (exact) plus a wide Decimal part for the terms that cannot be scaled. */
class ExactTotal {
  private readonly units = new Float64Array(SUM_KEYS.length);
  /** Per field, the Decimal part at WIDE's precision (null: nothing added there yet, the field stays the shared zero). */
  private readonly rest: (Decimal | null)[] = SUM_KEYS.map(() => null);

  add(b: NutrientSums): void {
    const scaled = (b as NutrientSums & { [SCALED]?: Scaled })[SCALED];
    for (let i = 0; i < SUM_KEYS.length; i++) {
      const k = SUM_KEYS[i];
      const u = scaled ? scaled[k] : NaN;
      if (u === u) {
        if (u === 0) continue;
        if (Math.abs(this.units[i]) > SCALED_FLUSH) this.flush(i);
        this.units[i] += u;
      } else if (b[k] !== ZERO) {
        const r = this.rest[i];
        this.rest[i] = r === null ? new WIDE(b[k]) : r.plus(b[k]);
      }
    }
  }

  private flush(i: number): void {
    const part = new WIDE(this.units[i]).div(SCALE);
    const r = this.rest[i];
    this.rest[i] = r === null ? part : r.plus(part);
    this.units[i] = 0;
  }

  sums(): NutrientSums {
    const out = zeroSums() as Record<keyof NutrientSums, Decimal>;
    for (let i = 0; i < SUM_KEYS.length; i++) {
      if (this.units[i] !== 0) this.flush(i);
      const r = this.rest[i];
      // Back to decimal.js's own precision, rounded once (half up, its default).
      if (r !== null) out[SUM_KEYS[i]] = new Decimal(r).toSignificantDigits(Decimal.precision, Decimal.ROUND_HALF_UP);
    }
    return out;
  }
}

export function scaleSums(a: NutrientSums, factor: Num): NutrientSums {
  const out = {} as Record<keyof NutrientSums, Decimal>;
  for (const k of SUM_KEYS) out[k] = a[k] === ZERO ? ZERO : a[k].times(factor);
  return out;
}

/** Adds `polyolsG` and `netCarbsG` (under `rule`) to additive sums. */
export function toVector(s: NutrientSums, rule: NetCarbRule = DEFAULT_NET_CARB_RULE): NutrientVector {
  return { ...s, polyolsG: s.erythritolG.plus(s.otherPolyolsG).plus(s.alluloseG), netCarbsG: netCarbs(s, rule) };
}

/** Rounds every field half up to `decimals` places (0.01 by default) and returns plain numbers for JSON. */
export function toNutrientNumbers(v: NutrientVector, decimals = 2): NutrientNumbers {
  const out = {} as Record<keyof NutrientVector, number>;
  for (const k of VECTOR_KEYS) out[k] = v[k].toDecimalPlaces(decimals, Decimal.ROUND_HALF_UP).toNumber();
  return out;
}

// ---------------------------------------------------------------------------------------------------------------
// Recipes
// ---------------------------------------------------------------------------------------------------------------

export interface RecipeOptions {
  /** Portions the base tray is cut into (a positive integer; its cut plan's rows × columns). Default 1. */
  portions?: number;
  /** Cooked mass ÷ raw mass (e.g. 0.33 for baked bacon). Changes massG only, never the nutrients. Default 1. */
  yieldFactor?: Num;
  netCarbRule?: NetCarbRule;
}

export interface RecipeLineResult {
  ingredient: string;
  grams: Decimal;
  nutrients: NutrientSums;
}

export interface RecipeExact {
  lines: RecipeLineResult[];
  rawMassG: Decimal;
  yieldFactor: Decimal;
  portions: number;
  netCarbRule: NetCarbRule;
  total: NutrientVector;
  perPortion: NutrientVector;
}

export interface RecipeNumbers {
  total: NutrientNumbers;
  perPortion: NutrientNumbers;
}

function checkOptions(options: RecipeOptions): { portions: number; yieldFactor: Decimal; rule: NetCarbRule } {
  const portions = options.portions ?? 1;
  if (!Number.isInteger(portions) || portions < 1) {
    throw new RangeError(`Portions must be a whole number of at least 1 (got ${portions}).`);
  }
  const yieldFactor = new Decimal(options.yieldFactor ?? 1);
  if (!yieldFactor.isFinite() || yieldFactor.lte(0)) {
    throw new RangeError(`The cooked-yield factor must be above 0 (got ${yieldFactor.toString()}).`);
  }
  return { portions, yieldFactor, rule: options.netCarbRule ?? DEFAULT_NET_CARB_RULE };
}

/**
 * Exact recipe totals. Each line's amount is turned into grams through its ingredient's facts (throws
 * UnitConversionError when a fact is missing); nutrients are summed; the total mass is the raw mass × yield
 * factor; per portion is the total ÷ portions. Net carbs are computed on each vector (never below 0).
 */
export function computeRecipeExact(lines: readonly RecipeLine[], options: RecipeOptions = {}): RecipeExact {
  const { portions, yieldFactor, rule } = checkOptions(options);
  const total = new ExactTotal();
  const results = lines.map((line) => {
    const grams = toGrams(line.amount, line.unit, line.ingredient);
    const nutrients = nutrientsForGrams(line.ingredient.per100g, grams);
    total.add(nutrients);
    return { ingredient: line.ingredient.name, grams, nutrients };
  });
  const raw = total.sums();
  const cooked: NutrientSums = { ...raw, massG: raw.massG.times(yieldFactor) };
  const perPortion = scaleSums(cooked, new Decimal(1).div(portions));
  return {
    lines: results,
    rawMassG: raw.massG,
    yieldFactor,
    portions,
    netCarbRule: rule,
    total: toVector(cooked, rule),
    perPortion: toVector(perPortion, rule),
  };
}

/**
 * Recipe totals and per portion as JSON numbers rounded to 0.01:
 * `computeRecipe(lines, { portions: 20, yieldFactor: 0.9, netCarbRule: { kind: 'full' } })`
 * → `{ total, perPortion }` with kcal, fatG, satFatG, proteinG, carbsG, fiberG, sugarsG, polyolsG, netCarbsG,
 * sodiumMg, massG (plus erythritolG, alluloseG, otherPolyolsG). Use `computeRecipeExact` for the Decimals.
 */
export function computeRecipe(lines: readonly RecipeLine[], options: RecipeOptions = {}): RecipeNumbers {
  const exact = computeRecipeExact(lines, options);
  return { total: toNutrientNumbers(exact.total), perPortion: toNutrientNumbers(exact.perPortion) };
}

// ---------------------------------------------------------------------------------------------------------------
// Atwater energy cross-check
// ---------------------------------------------------------------------------------------------------------------

/** kcal per gram. */
export interface EnergyFactors {
  protein: Num;
  fat: Num;
  /** Carbohydrate left after fibre, sugar alcohols and allulose. */
  availableCarbs: Num;
  fiber: Num;
  erythritol: Num;
  allulose: Num;
  otherPolyols: Num;
}

/**
 * The factors of the cross-check.
 * - protein 4, fat 9, available carbohydrate 4: the general factors, 21 CFR 101.9(c)(1)(i)(B)/(C).
 * - fibre 2: (C) gives 2 kcal/g for SOLUBLE non-digestible carbohydrate and 0 for insoluble. We do not store the
 *   split, so all fibre counts at 2 kcal/g, which is also the EU factor for fibre (Reg. 1169/2011 Annex XIV).
 *   Counting it at 0 would under-read high-fibre foods (raw avocado: 147 vs 160 kcal in USDA SR28).
 * - erythritol 0: 21 CFR 101.9(c)(1)(i)(F) and EU Annex XIV.
 * - allulose 0.4: FDA allulose guidance (2020).
 * - other polyols 2.4: the single EU Annex XIV polyol factor; the US factors by kind run from 1.6 (mannitol)
 *   to 3.0 (hydrogenated starch hydrolysates), so 2.4 is a middle value for an unsplit "other".
 */
export const GENERAL_ENERGY_FACTORS: Readonly<EnergyFactors> = {
  protein: 4,
  fat: 9,
  availableCarbs: 4,
  fiber: 2,
  erythritol: 0,
  allulose: '0.4',
  otherPolyols: '2.4',
};

/** Flag when stored and computed energy differ by more than this share of the computed energy. */
export const ATWATER_TOLERANCE = new Decimal('0.15');
/**
 * Below this much computed energy per 100 g, compare the absolute difference instead (watery vegetables: a
 * 2 kcal difference on 14 kcal is 14 %, which is noise). The allowed difference there is 15 % of 20 = 3 kcal per
 * 100 g, so the two tests meet at 20 kcal/100 g.
 */
export const ATWATER_SMALL_FOOD_KCAL_PER_100G = new Decimal(20);
export const ATWATER_SMALL_FOOD_MAX_DIFF_PER_100G = ATWATER_TOLERANCE.times(ATWATER_SMALL_FOOD_KCAL_PER_100G);

export interface EnergyInputs {
  kcal?: MaybeNum;
  fatG: Num;
  proteinG: Num;
  carbsG: Num;
  fiberG?: MaybeNum;
  erythritolG?: MaybeNum;
  alluloseG?: MaybeNum;
  otherPolyolsG?: MaybeNum;
}

export interface EnergyParts {
  fat: Decimal;
  protein: Decimal;
  /** Everything from the carbohydrate group: available carbs, fibre, sugar alcohols, allulose. */
  carbs: Decimal;
  total: Decimal;
}

/** Energy from each macronutrient by the factors (general ones by default). Available carbs never below 0. */
export function energyParts(n: EnergyInputs, factors: Partial<EnergyFactors> = {}): EnergyParts {
  const f = { ...GENERAL_ENERGY_FACTORS, ...factors };
  const fiber = dec(n.fiberG);
  const ery = dec(n.erythritolG);
  const allu = dec(n.alluloseG);
  const other = dec(n.otherPolyolsG);
  const available = Decimal.max(dec(n.carbsG).minus(fiber).minus(ery).minus(allu).minus(other), 0);
  const fat = dec(n.fatG).times(f.fat);
  const protein = dec(n.proteinG).times(f.protein);
  const carbs = available
    .times(f.availableCarbs)
    .plus(fiber.times(f.fiber))
    .plus(ery.times(f.erythritol))
    .plus(allu.times(f.allulose))
    .plus(other.times(f.otherPolyols));
  return { fat, protein, carbs, total: fat.plus(protein).plus(carbs) };
}

export interface AtwaterCheck {
  storedKcal: number;
  computedKcal: number;
  /** (stored − computed) ÷ computed, 4 decimals; null when computed energy is 0. */
  deviation: number | null;
  flagged: boolean;
  /** `relative`: the 15 % test; `absolute`: the small-food test (difference over 3 kcal per 100 g). */
  basis: 'relative' | 'absolute';
}

export interface AtwaterOptions {
  /** Mass the nutrients describe (default 100 g, i.e. per-100 g facts). Used for the small-food test. */
  massG?: Num;
  /** Override factors, e.g. USDA specific Atwater factors. */
  factors?: Partial<EnergyFactors>;
}

/**
 * Compares stored kcal with the energy computed from the macronutrients. Flagged when
 * |stored − computed| ÷ computed > 15 %, or, for foods under 20 kcal per 100 g computed, when the difference is
 * over 3 kcal per 100 g. USDA SR kcal use specific Atwater factors, so a few % of difference is normal.
 */
export function atwaterCheck(n: EnergyInputs, options: AtwaterOptions = {}): AtwaterCheck {
  const mass = new Decimal(options.massG ?? 100);
  if (mass.lte(0)) throw new RangeError('atwaterCheck needs a mass above 0.');
  const stored = dec(n.kcal);
  const computed = energyParts(n, options.factors).total;
  const diff = stored.minus(computed);
  const per100 = (x: Decimal) => x.times(100).div(mass);
  const small = per100(computed).lt(ATWATER_SMALL_FOOD_KCAL_PER_100G);
  const flagged = small
    ? per100(diff.abs()).gt(ATWATER_SMALL_FOOD_MAX_DIFF_PER_100G)
    : diff.abs().div(computed).gt(ATWATER_TOLERANCE);
  return {
    storedKcal: round(stored, 1),
    computedKcal: round(computed, 1),
    deviation: computed.isZero() ? null : round(diff.div(computed), 4),
    flagged,
    basis: small ? 'absolute' : 'relative',
  };
}

export interface EnergyShares {
  fatPct: number;
  proteinPct: number;
  carbsPct: number;
}

/**
 * Share of energy from fat, protein and carbohydrate for a portion card, in % of the COMPUTED energy (so the
 * three add up to 100 up to rounding), one decimal. All zero when there is no energy.
 */
export function energyShares(n: EnergyInputs, factors: Partial<EnergyFactors> = {}): EnergyShares {
  const p = energyParts(n, factors);
  if (p.total.isZero()) return { fatPct: 0, proteinPct: 0, carbsPct: 0 };
  const pct = (x: Decimal) => round(x.times(100).div(p.total), 1);
  return { fatPct: pct(p.fat), proteinPct: pct(p.protein), carbsPct: pct(p.carbs) };
}

function round(d: Decimal, dp: number): number {
  return d.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP).toNumber();
}
