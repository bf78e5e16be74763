/**
 * Units and amounts: mass, volume and count, conversion to grams through an ingredient's facts,
 * amount parsing as people type it, and a friendly kitchen display.
 *
 * Definitions (exact; US customary units by NIST Handbook 44, Appendix C, and NIST SP 430):
 * - 1 lb (avoirdupois) = 453.592 37 g; 1 oz = 1/16 lb = 28.349 523 125 g.
 * - 1 US fl oz = 1/128 US gallon = 29.573 529 562 5 mL (1 gal = 231 in³, 1 in = 2.54 cm).
 * - 1 tsp = 1/6 fl oz; 1 tbsp = 3 tsp = 1/2 fl oz; 1 cup = 8 fl oz = 16 tbsp; 1 pint = 2 cups; 1 quart = 2 pints.
 * - The FDA's rounder "labeling" measures (1 cup = 240 mL, 21 CFR 101.9(b)(5)(viii)) are NOT used for cooking amounts.
 *
 * All arithmetic is decimal.js. Numbers appear only in display results.
 */
import Decimal from 'decimal.js';

// ---------------------------------------------------------------------------------------------------------------
// Unit codes
// ---------------------------------------------------------------------------------------------------------------

export type MassUnit = 'g' | 'kg' | 'oz' | 'lb';
export type VolumeUnit = 'tsp' | 'tbsp' | 'floz' | 'cup' | 'pint' | 'quart' | 'ml' | 'l';
/** The standard codes. `each` is the generic piece; ingredients may define other named pieces. */
export type StandardUnit = MassUnit | VolumeUnit | 'each';
/**
 * A unit as stored on a recipe line: a standard code, or a per-ingredient piece name such as
 * `large`, `slice`, `strip`, `package`, `clove` (stored lower case; matched case-insensitively).
 * Piece names are `count` units.
 */
export type UnitCode = StandardUnit | (string & {});
export type UnitKind = 'mass' | 'volume' | 'count';
export type MeasureSystem = 'us' | 'metric';

export const MASS_UNITS: readonly MassUnit[] = ['g', 'kg', 'oz', 'lb'];
export const VOLUME_UNITS: readonly VolumeUnit[] = ['tsp', 'tbsp', 'floz', 'cup', 'pint', 'quart', 'ml', 'l'];

const FL_OZ_ML = new Decimal('29.5735295625');

/** Grams in one unit (exact). */
export const GRAMS_PER_UNIT: Readonly<Record<MassUnit, Decimal>> = {
  g: new Decimal(1),
  kg: new Decimal(1000),
  oz: new Decimal('453.59237').div(16), // 28.349523125 exactly
  lb: new Decimal('453.59237'),
};

/** Millilitres in one unit (exact: every US value is a whole multiple of 1/6 fl oz). */
export const MILLILITERS_PER_UNIT: Readonly<Record<VolumeUnit, Decimal>> = {
  tsp: FL_OZ_ML.div(6), // 4.92892159375
  tbsp: FL_OZ_ML.div(2), // 14.78676478125
  floz: FL_OZ_ML,
  cup: FL_OZ_ML.times(8), // 236.5882365
  pint: FL_OZ_ML.times(16), // 473.176473
  quart: FL_OZ_ML.times(32), // 946.352946
  ml: new Decimal(1),
  l: new Decimal(1000),
};

export interface UnitOption {
  code: StandardUnit;
  /** Short form shown after a number ("2 cups", "250 mL"). */
  symbol: string;
  /** Label for a select. */
  label: string;
  kind: UnitKind;
  system: MeasureSystem | 'any';
}

/** Every standard unit, in the order a select should show them (mass, volume, count). */
export const UNIT_OPTIONS: readonly UnitOption[] = [
  { code: 'g', symbol: 'g', label: 'grams (g)', kind: 'mass', system: 'metric' },
  { code: 'kg', symbol: 'kg', label: 'kilograms (kg)', kind: 'mass', system: 'metric' },
  { code: 'oz', symbol: 'oz', label: 'ounces, weight (oz)', kind: 'mass', system: 'us' },
  { code: 'lb', symbol: 'lb', label: 'pounds (lb)', kind: 'mass', system: 'us' },
  { code: 'tsp', symbol: 'tsp', label: 'teaspoons (tsp)', kind: 'volume', system: 'us' },
  { code: 'tbsp', symbol: 'tbsp', label: 'tablespoons (tbsp)', kind: 'volume', system: 'us' },
  { code: 'floz', symbol: 'fl oz', label: 'fluid ounces (fl oz)', kind: 'volume', system: 'us' },
  { code: 'cup', symbol: 'cup', label: 'cups (US)', kind: 'volume', system: 'us' },
  { code: 'pint', symbol: 'pint', label: 'pints (US)', kind: 'volume', system: 'us' },
  { code: 'quart', symbol: 'quart', label: 'quarts (US)', kind: 'volume', system: 'us' },
  { code: 'ml', symbol: 'mL', label: 'milliliters (mL)', kind: 'volume', system: 'metric' },
  { code: 'l', symbol: 'L', label: 'liters (L)', kind: 'volume', system: 'metric' },
  { code: 'each', symbol: 'each', label: 'each (whole piece)', kind: 'count', system: 'any' },
];

export const UNIT_CODES: readonly StandardUnit[] = UNIT_OPTIONS.map((u) => u.code);

const OPTION_OF: ReadonlyMap<string, UnitOption> = new Map(UNIT_OPTIONS.map((u) => [u.code, u]));

/** A unit as people write it: the symbol of a standard unit ("mL", "fl oz"), a piece name as stored. */
export function unitSymbol(unit: UnitCode): string {
  return OPTION_OF.get(unit)?.symbol ?? unit;
}

/**
 * An amount as typed with its unit, for people to read before an ingredient's name: standard units by their symbol
 * ("1 fl oz", "250 mL", "1 L"), `each` as a count ("2 ×"), a piece name as stored ("1/4 avocado", "2 slice").
 */
export function amountWithUnit(amountText: string, unit: UnitCode): string {
  const amount = amountText.trim();
  if (unit === 'each') return `${amount} ×`;
  return `${amount} ${unitSymbol(unit)}`;
}

/**
 * The last word of the name before its first comma or bracket, lower case: the food itself ("Avocado, raw" →
 * "avocado", "Low-carb tortilla (…)" → "tortilla", "Lemon juice, fresh" → "juice").
 */
function foodNoun(name: string): string {
  return name.split(/[,(]/, 1)[0]!.toLowerCase().split(/[\s-]+/).filter(Boolean).at(-1) ?? '';
}

/**
 * A typed mass or volume in the reader's other measure system, as a kitchen amount ("3 oz" → "85 g" for a metric
 * reader, "100 g" → "3 ½ oz" for a US one); null when there is nothing to convert: a piece, a unit already of the
 * reader's system, a range, or text that does not parse.
 */
export function amountInSystem(amountText: string, unit: UnitCode, system: MeasureSystem): string | null {
  const code = unit.trim().toLowerCase();
  const from = OPTION_OF.get(code)?.system;
  if (from === undefined || from === 'any' || from === system) return null;
  let parsed: ParsedAmount;
  try {
    parsed = parseAmount(amountText);
  } catch {
    return null;
  }
  if (parsed.isRange) return null;
  if (isMassUnit(code)) return formatMass(parsed.value.times(GRAMS_PER_UNIT[code]), system).text;
  if (isVolumeUnit(code)) return formatVolume(parsed.value.times(MILLILITERS_PER_UNIT[code]), system).text;
  return null;
}

/**
 * An amount, its unit and the ingredient's name as one phrase ("1 fl oz Heavy cream", "2 slice Bacon…"). When a
 * piece is the food itself (the name's last word before a comma: "avocado" of "Avocado, raw", "tortilla" of
 * "Low-carb tortilla", "wrap" of "Coconut wraps"), the piece is not said twice: "1/4 Avocado, raw",
 * "2 × Low-carb tortilla", "6 Olives, ripe, canned", and for one of a plural name "1 wrap (Coconut wraps)".
 * A piece of something else keeps its name ("1 lemon Lemon juice, fresh"). With the reader's `system`, a mass or
 * volume typed in the other system also gives the reader's amount (amountInSystem).
 */
export function amountAndName(amountText: string, unit: UnitCode, name: string, system?: MeasureSystem): string {
  const amount = amountText.trim();
  // A reader of the other measure system gets the typed amount and, in brackets, theirs: "3 oz (85 g) Smoked salmon".
  const theirs = system ? amountInSystem(amountText, unit, system) : null;
  if (theirs) return `${amountWithUnit(amountText, unit)} (${theirs}) ${name}`.trim();
  const piece = unit.trim().toLowerCase();
  const noun = foodNoun(name);
  if (piece && piece !== 'each' && !isMassUnit(piece) && !isVolumeUnit(piece) && noun.startsWith(piece)) {
    let many = false;
    try {
      many = parseAmount(amount).value.gt(1);
    } catch {
      // An amount that does not parse is written as typed, with its piece.
    }
    if (noun === piece) return `${amount}${many ? ' ×' : ''} ${name}`;
    if (noun === `${piece}s` || noun === `${piece}es`) return many ? `${amount} ${name}` : `${amount} ${piece} (${name})`;
  }
  return `${amountWithUnit(amountText, unit)} ${name}`.trim();
}

export function isMassUnit(code: string): code is MassUnit {
  return Object.prototype.hasOwnProperty.call(GRAMS_PER_UNIT, code);
}

export function isVolumeUnit(code: string): code is VolumeUnit {
  return Object.prototype.hasOwnProperty.call(MILLILITERS_PER_UNIT, code);
}

/** A unit code that is neither a standard code nor a valid piece name (e.g. "", "2", or an alias like "cups"). */
export class UnknownUnitError extends Error {
  readonly code = 'unknown_unit' as const;
  constructor(
    readonly unit: string,
    message: string,
  ) {
    super(message);
    this.name = 'UnknownUnitError';
  }
}

const PIECE_NAME = /^(?=.*\p{L})[\p{L}\d][\p{L}\d .'()-]{0,39}$/u; // at least one letter, e.g. "10-oz package"

/**
 * The kind of a unit code: `mass`, `volume`, or `count` (`each` and any per-ingredient piece name).
 * Throws UnknownUnitError for an empty or malformed code, and for a spelling of a standard unit that is
 * not its code ("cups", "Tbsp"): normalise typed text with `normalizeUnit` first.
 */
export function unitKind(code: UnitCode): UnitKind {
  if (isMassUnit(code)) return 'mass';
  if (isVolumeUnit(code)) return 'volume';
  if (code === 'each') return 'count';
  const trimmed = typeof code === 'string' ? code.trim() : '';
  if (!PIECE_NAME.test(trimmed)) {
    throw new UnknownUnitError(String(code), `"${String(code)}" is not a unit.`);
  }
  const alias = standardAlias(trimmed);
  if (alias) {
    throw new UnknownUnitError(code, `"${code}" is not a unit code: use "${alias}".`);
  }
  return 'count';
}

/** True for `each` and for any per-ingredient piece name. */
export function isPieceUnit(code: UnitCode): boolean {
  return unitKind(code) === 'count';
}

// Case-sensitive first: "T" is a tablespoon and "t" a teaspoon in US recipe shorthand.
const CASE_SENSITIVE_ALIASES: Record<string, StandardUnit> = { T: 'tbsp', t: 'tsp', Tb: 'tbsp', L: 'l', mL: 'ml' };
const ALIASES: Record<string, StandardUnit> = {
  g: 'g', gr: 'g', gm: 'g', gms: 'g', gram: 'g', grams: 'g', gramme: 'g', grammes: 'g',
  kg: 'kg', kgs: 'kg', kilo: 'kg', kilos: 'kg', kilogram: 'kg', kilograms: 'kg',
  oz: 'oz', ozs: 'oz', ounce: 'oz', ounces: 'oz',
  lb: 'lb', lbs: 'lb', pound: 'lb', pounds: 'lb',
  tsp: 'tsp', tsps: 'tsp', teaspoon: 'tsp', teaspoons: 'tsp',
  tbsp: 'tbsp', tbsps: 'tbsp', tbs: 'tbsp', tbl: 'tbsp', tblsp: 'tbsp', tablespoon: 'tbsp', tablespoons: 'tbsp',
  floz: 'floz', 'fl oz': 'floz', 'fl. oz.': 'floz', 'fl. oz': 'floz', 'fl.oz.': 'floz', 'fl.oz': 'floz',
  'fluid ounce': 'floz', 'fluid ounces': 'floz',
  c: 'cup', cup: 'cup', cups: 'cup',
  pt: 'pint', pts: 'pint', pint: 'pint', pints: 'pint',
  qt: 'quart', qts: 'quart', quart: 'quart', quarts: 'quart',
  ml: 'ml', mls: 'ml', milliliter: 'ml', milliliters: 'ml', millilitre: 'ml', millilitres: 'ml', cc: 'ml',
  l: 'l', liter: 'l', liters: 'l', litre: 'l', litres: 'l',
  each: 'each', ea: 'each', pc: 'each', pcs: 'each', piece: 'each', pieces: 'each', whole: 'each',
};

function standardAlias(text: string): StandardUnit | null {
  const t = text.trim().replace(/\s+/g, ' ');
  if (CASE_SENSITIVE_ALIASES[t]) return CASE_SENSITIVE_ALIASES[t];
  const lower = t.toLowerCase();
  const hit = ALIASES[lower] ?? null;
  return hit !== null && hit !== t ? hit : null;
}

/**
 * Turns a typed unit ("cups", "Tbsp", "T", "fl. oz.", "Slices") into a code: a standard code when the text
 * spells one, otherwise the lower-cased piece name. Throws UnknownUnitError for text that cannot be a unit.
 */
export function normalizeUnit(text: string): UnitCode {
  const t = text.trim().replace(/\s+/g, ' ');
  if (CASE_SENSITIVE_ALIASES[t]) return CASE_SENSITIVE_ALIASES[t];
  const lower = t.toLowerCase();
  if (ALIASES[lower]) return ALIASES[lower];
  if (!PIECE_NAME.test(lower)) throw new UnknownUnitError(text, `"${text}" is not a unit.`);
  return lower;
}

// ---------------------------------------------------------------------------------------------------------------
// Ingredient facts and conversion
// ---------------------------------------------------------------------------------------------------------------

/** What an ingredient knows about itself for unit conversion (plain object, as stored). */
export interface IngredientFacts {
  name: string;
  /** Grams per millilitre, e.g. 0.913 for olive oil. Needed for any volume unit. */
  densityGPerMl?: string | number | null;
  /** Grams per named piece, e.g. `{ large: 50 }` for eggs, `{ slice: 28 }` for raw bacon. */
  pieceWeights?: Record<string, number | string> | null;
}

export type MissingFact = 'density' | `pieceWeight:${string}`;

/**
 * A conversion needed a fact the ingredient lacks (or holds as zero, negative or unreadable).
 * The API turns it into a 400 naming the ingredient and the missing fact. Never a silent zero.
 */
export class UnitConversionError extends Error {
  readonly code = 'unit_conversion' as const;
  constructor(
    readonly ingredient: string,
    readonly missing: MissingFact,
    message: string,
  ) {
    super(message);
    this.name = 'UnitConversionError';
  }
}

function positiveDecimal(value: unknown): Decimal | null {
  if (value === null || value === undefined || value === '') return null;
  if (typeof value !== 'string' && typeof value !== 'number' && !Decimal.isDecimal(value)) return null;
  try {
    const d = new Decimal(value as Decimal.Value);
    return d.isFinite() && d.gt(0) ? d : null;
  } catch {
    return null;
  }
}

/** The ingredient's density in g/mL; throws UnitConversionError (`missing: 'density'`) when unknown. */
export function densityOf(facts: IngredientFacts): Decimal {
  const d = positiveDecimal(facts.densityGPerMl);
  if (!d) {
    throw new UnitConversionError(
      facts.name,
      'density',
      `${facts.name} has no density (grams per mL), so a volume of it cannot be turned into grams.`,
    );
  }
  return d;
}

/**
 * Grams of one named piece. Piece names match case-insensitively, and a plural falls back to its singular
 * ("slices" finds "slice"). Throws UnitConversionError (`missing: 'pieceWeight:<piece>'`) when unknown.
 */
export function pieceWeightOf(facts: IngredientFacts, piece: string): Decimal {
  const wanted = piece.trim().toLowerCase();
  const weights = facts.pieceWeights ?? {};
  const byName = new Map(Object.entries(weights).map(([k, v]) => [k.trim().toLowerCase(), v] as const));
  const candidates = [wanted];
  if (wanted.endsWith('es')) candidates.push(wanted.slice(0, -2));
  if (wanted.endsWith('s')) candidates.push(wanted.slice(0, -1));
  for (const name of candidates) {
    const w = positiveDecimal(byName.get(name));
    if (w) return w;
  }
  throw new UnitConversionError(
    facts.name,
    `pieceWeight:${wanted}`,
    `${facts.name} has no weight for one "${wanted}", so it cannot be turned into grams.`,
  );
}

/** Grams in `amount` of `unit` of this ingredient. Mass needs nothing, volume needs density, pieces a weight. */
export function toGrams(amount: Decimal.Value, unit: UnitCode, facts: IngredientFacts): Decimal {
  const a = new Decimal(amount);
  const kind = unitKind(unit);
  if (kind === 'mass') return a.times(GRAMS_PER_UNIT[unit as MassUnit]);
  if (kind === 'volume') return a.times(MILLILITERS_PER_UNIT[unit as VolumeUnit]).times(densityOf(facts));
  return a.times(pieceWeightOf(facts, unit));
}

/** The inverse of `toGrams`: how much of `unit` makes `grams` of this ingredient. */
export function fromGrams(grams: Decimal.Value, unit: UnitCode, facts: IngredientFacts): Decimal {
  const g = new Decimal(grams);
  const kind = unitKind(unit);
  if (kind === 'mass') return g.div(GRAMS_PER_UNIT[unit as MassUnit]);
  if (kind === 'volume') return g.div(densityOf(facts)).div(MILLILITERS_PER_UNIT[unit as VolumeUnit]);
  return g.div(pieceWeightOf(facts, unit));
}

/**
 * Converts an amount between any two units. Mass↔mass and volume↔volume need no facts, nor does a piece to
 * the same piece; anything else goes through grams and needs the ingredient's facts.
 */
export function convertAmount(
  amount: Decimal.Value,
  from: UnitCode,
  to: UnitCode,
  facts?: IngredientFacts,
): Decimal {
  const a = new Decimal(amount);
  const fromKind = unitKind(from);
  const toKind = unitKind(to);
  if (from === to) return a;
  if (fromKind === 'mass' && toKind === 'mass') {
    return a.times(GRAMS_PER_UNIT[from as MassUnit]).div(GRAMS_PER_UNIT[to as MassUnit]);
  }
  if (fromKind === 'volume' && toKind === 'volume') {
    return a.times(MILLILITERS_PER_UNIT[from as VolumeUnit]).div(MILLILITERS_PER_UNIT[to as VolumeUnit]);
  }
  const subject = facts ?? { name: 'This ingredient' };
  return fromGrams(toGrams(a, from, subject), to, subject);
}

// ---------------------------------------------------------------------------------------------------------------
// Amount parsing
// ---------------------------------------------------------------------------------------------------------------

export interface ParsedAmount {
  /** The amount to compute with: the number, or the midpoint of a range. */
  value: Decimal;
  /** The text as typed (trimmed), to show back to the person. */
  text: string;
  min: Decimal;
  max: Decimal;
  isRange: boolean;
}

export class AmountParseError extends Error {
  readonly code = 'amount_parse' as const;
  constructor(
    readonly text: string,
    message: string,
  ) {
    super(message);
    this.name = 'AmountParseError';
  }
}

const VULGAR_FRACTIONS: Record<string, [number, number]> = {
  '½': [1, 2], '⅓': [1, 3], '⅔': [2, 3], '¼': [1, 4], '¾': [3, 4], '⅕': [1, 5], '⅖': [2, 5], '⅗': [3, 5],
  '⅘': [4, 5], '⅙': [1, 6], '⅚': [5, 6], '⅛': [1, 8], '⅜': [3, 8], '⅝': [5, 8], '⅞': [7, 8],
};
const GLYPHS = Object.keys(VULGAR_FRACTIONS).join('');
const RE_GLYPH = new RegExp(`^(\\d+)?\\s*([${GLYPHS}])$`);
const RE_MIXED = /^(\d+)\s+(\d+)\s*\/\s*(\d+)$/;
const RE_FRACTION = /^(\d+)\s*\/\s*(\d+)$/;
/** A plain decimal of 0 or more written with a point ("2", "1.5", ".5", "3."): what number text must be once its comma is read. */
export const PLAIN_DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)$/;
const RE_THOUSANDS = /^\d{1,3}(?:,\d{3})+$/;

/**
 * Number text with a decimal comma written with a point: "12,5" → "12.5", "0,125" → "0.125", "1,2345" → "1.2345".
 * A comma before groups of exactly three digits ("1,717", "12,000") is ambiguous: a US thousands separator or a
 * decimal comma? Read either way the value is off by a factor of a thousand, so it is refused (null), never guessed.
 * Text without a comma comes back as it is (the caller checks it is a number).
 */
export function decimalCommaToPoint(text: string): string | null {
  if (!text.includes(',')) return text;
  if (RE_THOUSANDS.test(text) && !text.startsWith('0,')) return null;
  return /^\d+,\d+$/.test(text) ? text.replace(',', '.') : text;
}

/** Why a number such as "1,717" is refused (decimalCommaToPoint gave null). */
export function ambiguousCommaMessage(text: string): string {
  return `"${text}" is ambiguous: write ${text.replace(/,/g, '')} for a whole number or use a point for decimals.`;
}

function hint(text: string): string {
  return `Could not read "${text}" as an amount. Try 2, 1.5, 1,5, 1 1/2, 1½ or a range like 1-2.`;
}

function fraction(whole: string | undefined, num: string | number, den: string | number, text: string): Decimal {
  const d = new Decimal(den);
  const n = new Decimal(num);
  if (d.isZero()) throw new AmountParseError(text, `"${text}" divides by zero.`);
  if (whole !== undefined && n.gte(d)) {
    throw new AmountParseError(text, `In "${text}" the fraction after the whole number must be less than 1.`);
  }
  return new Decimal(whole ?? 0).plus(n.div(d));
}

function parseSingle(part: string, text: string): Decimal {
  const s = part.trim().replace(/⁄/g, '/');
  if (s === '') throw new AmountParseError(text, hint(text));
  if (s.startsWith('-') || s.startsWith('−')) throw new AmountParseError(text, 'An amount cannot be negative.');
  let m = RE_GLYPH.exec(s);
  if (m) {
    const [num, den] = VULGAR_FRACTIONS[m[2]];
    return fraction(m[1], num, den, text);
  }
  m = RE_MIXED.exec(s);
  if (m) return fraction(m[1], m[2], m[3], text);
  m = RE_FRACTION.exec(s);
  if (m) return fraction(undefined, m[1], m[2], text);
  const plain = decimalCommaToPoint(s);
  if (plain === null) throw new AmountParseError(text, ambiguousCommaMessage(s));
  if (PLAIN_DECIMAL.test(plain)) return new Decimal(plain.endsWith('.') ? plain.slice(0, -1) : plain);
  throw new AmountParseError(text, hint(text));
}

/**
 * Reads an amount as people type it.
 * - `2`, `1.5`, `.5`, `1,5`, `0,125` (a decimal comma; `1,500` is refused as ambiguous: see decimalCommaToPoint)
 * - `1/2`, `1 1/2`, `1-1/2` (whole, hyphen, proper fraction: the US mixed-number habit, not a range)
 * - `½`, `1½`, `1 ½` (Unicode vulgar fractions; the fraction slash ⁄ works like /)
 * - ranges `1-2`, `1–2`, `1—2`, `1 to 2`, `½-1`, `1-1 1/2`: value is the midpoint, min and max are kept,
 *   and text keeps what was typed. A range must go up (`2-1` is refused).
 * Negative amounts and anything else throw AmountParseError with a message that can be shown as is.
 */
/** The largest amount a recipe line, add-on, pantry row or shopping need may hold, in any unit. */
export const MAX_AMOUNT = 1_000_000;
export const MAX_AMOUNT_MESSAGE = 'The amount must be at most 1,000,000';

export function parseAmount(input: string): ParsedAmount {
  const text = String(input ?? '').replace(/\u00a0/g, ' ').trim().replace(/\s+/g, ' ');
  if (text === '') throw new AmountParseError(text, 'Enter an amount.');
  if (/^[-−]/.test(text)) throw new AmountParseError(text, 'An amount cannot be negative.');
  const parts = splitRange(text);
  if (parts.length === 1) {
    const v = parseSingle(parts[0], text);
    return { value: v, text, min: v, max: v, isRange: false };
  }
  const min = parseSingle(parts[0], text);
  const max = parseSingle(parts[1], text);
  if (min.gt(max)) throw new AmountParseError(text, `The range "${text}" must go from the smaller to the larger amount.`);
  return { value: min.plus(max).div(2), text, min, max, isRange: true };
}

function splitRange(text: string): string[] {
  const parts = text.split(/\s*(?:[–—]|\bto\b)\s*/i);
  if (parts.length === 2) return parts;
  if (parts.length > 2) throw new AmountParseError(text, hint(text));
  const hyphens = text.split('-');
  if (hyphens.length === 1) return [text];
  if (hyphens.length > 2) throw new AmountParseError(text, hint(text));
  const [left, right] = hyphens.map((p) => p.trim());
  const mixed = /^\d+$/.test(left) && RE_FRACTION.exec(right.replace(/⁄/g, '/'));
  if (mixed && Number(mixed[1]) < Number(mixed[2])) return [`${left} ${right}`];
  return [left, right];
}

// ---------------------------------------------------------------------------------------------------------------
// Kitchen display
// ---------------------------------------------------------------------------------------------------------------

export interface KitchenAmount {
  /** What to print: "2 ¼ cups", "1 lb 2 oz", "250 g", "1.25 L", "3 large". */
  text: string;
  /** The shown quantity as a number, in `unit` (for "1 lb 2 oz": 1.125 lb). */
  value: number;
  unit: UnitCode;
  /** The unrounded quantity in `unit`. */
  exact: number;
}

const FRACTION_GLYPH: Record<string, string> = {
  '1/8': '⅛', '1/4': '¼', '1/3': '⅓', '1/2': '½', '2/3': '⅔', '3/4': '¾',
};

interface Grid {
  unit: UnitCode;
  /** Allowed fractional parts as [numerator, denominator]; [0, 1] is the whole number. */
  parts: ReadonlyArray<readonly [number, number]>;
  singular: string;
  plural: string;
}

const EIGHTHS_AND_THIRDS = [[0, 1], [1, 8], [1, 4], [1, 3], [1, 2], [2, 3], [3, 4]] as const;
const TSP_GRID: Grid = { unit: 'tsp', parts: [[0, 1], [1, 8], [1, 4], [1, 2], [3, 4]], singular: 'tsp', plural: 'tsp' };
const TBSP_GRID: Grid = { unit: 'tbsp', parts: [[0, 1], [1, 2]], singular: 'tbsp', plural: 'tbsp' };
const CUP_GRID: Grid = { unit: 'cup', parts: EIGHTHS_AND_THIRDS, singular: 'cup', plural: 'cups' };
const QUART_GRID: Grid = { unit: 'quart', parts: [[0, 1], [1, 4], [1, 2], [3, 4]], singular: 'quart', plural: 'quarts' };
const OZ_GRID: Grid = { unit: 'oz', parts: [[0, 1], [1, 4], [1, 2], [3, 4]], singular: 'oz', plural: 'oz' };
const PIECE_PARTS = [[0, 1], [1, 4], [1, 2], [3, 4]] as const;

/** Rounds to the nearest allowed whole-plus-fraction; a tie goes to the larger value (half up). */
function snapToGrid(value: Decimal, parts: Grid['parts']): { whole: Decimal; part: readonly [number, number] } {
  const whole = value.floor();
  const frac = value.minus(whole);
  let best: { whole: Decimal; part: readonly [number, number]; dist: Decimal } | null = null;
  const options = [...parts.map((p) => ({ whole, part: p })), { whole: whole.plus(1), part: [0, 1] as const }];
  for (const o of options) {
    const v = o.whole.minus(whole).plus(new Decimal(o.part[0]).div(o.part[1]));
    const dist = v.minus(frac).abs();
    if (!best || dist.lt(best.dist) || dist.eq(best.dist)) best = { ...o, dist };
  }
  return { whole: best!.whole, part: best!.part };
}

function gridText(whole: Decimal, part: readonly [number, number]): string {
  const glyph = part[0] === 0 ? '' : (FRACTION_GLYPH[`${part[0]}/${part[1]}`] ?? `${part[0]}/${part[1]}`);
  if (whole.isZero()) return glyph || '0';
  return glyph ? `${whole.toFixed(0)} ${glyph}` : whole.toFixed(0);
}

function onGrid(amount: Decimal, grid: Grid): KitchenAmount & { shown: Decimal } {
  const { whole, part } = snapToGrid(amount, grid.parts);
  const shown = whole.plus(new Decimal(part[0]).div(part[1]));
  const word = shown.gt(1) ? grid.plural : grid.singular;
  return { text: `${gridText(whole, part)} ${word}`, value: shown.toNumber(), unit: grid.unit, exact: amount.toNumber(), shown };
}

/** Fixed to `dp` places (half up), then trailing decimal zeros dropped: 1.50 → "1.5", 2.00 → "2", 100 → "100". */
function stripZeros(d: Decimal, dp: number): string {
  const fixed = d.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP).toFixed(dp);
  return fixed.includes('.') ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
}

/**
 * Millilitres as a kitchen volume.
 * US: below 1 tbsp in tsp (⅛ ¼ ½ ¾), below ¼ cup in tbsp (½), below 16 cups in cups (⅛ ¼ ⅓ ½ ⅔ ¾), above that in
 * quarts (¼ ½ ¾); each step is rounded to the nearest allowed fraction (ties up), and a value that rounds up to
 * the next unit's threshold moves to that unit. Below ⅟₁₆ tsp the text is "< ⅛ tsp".
 * Metric: below 10 mL one decimal, below 1000 mL whole mL, from 1000 mL litres with up to two decimals.
 */
export function formatVolume(ml: Decimal.Value, system: MeasureSystem): KitchenAmount {
  const v = new Decimal(ml);
  if (system === 'metric') return metricText(v, 'ml', 'mL', 'l', 'L');
  if (v.lte(0)) return { text: '0 tsp', value: 0, unit: 'tsp', exact: v.toNumber() };
  const tsp = v.div(MILLILITERS_PER_UNIT.tsp);
  if (tsp.lt(new Decimal(1).div(16))) return { text: '< ⅛ tsp', value: 0.125, unit: 'tsp', exact: tsp.toNumber() };
  const steps: Array<[Grid, Decimal | null]> = [
    [TSP_GRID, new Decimal(3)],
    [TBSP_GRID, new Decimal(4)],
    [CUP_GRID, new Decimal(16)],
    [QUART_GRID, null],
  ];
  for (const [grid, limit] of steps) {
    const amount = v.div(MILLILITERS_PER_UNIT[grid.unit as VolumeUnit]);
    const shown = onGrid(amount, grid);
    if (limit === null || shown.shown.lt(limit)) {
      const { shown: _omit, ...rest } = shown;
      return rest;
    }
  }
  throw new Error('formatVolume: no display step matched');
}

/**
 * Grams as a kitchen mass.
 * US: below 1 oz one decimal ("0.4 oz", "< 0.1 oz"), below 1 lb the nearest ¼ oz ("6 ¼ oz"), from 1 lb pounds and
 * whole ounces ("1 lb 2 oz", "2 lb").
 * Metric: below 10 g one decimal, below 1000 g whole grams, from 1000 g kilograms with up to two decimals.
 * Rounding is half up.
 */
export function formatMass(grams: Decimal.Value, system: MeasureSystem): KitchenAmount {
  const g = new Decimal(grams);
  if (system === 'metric') return metricText(g, 'g', 'g', 'kg', 'kg');
  const oz = g.div(GRAMS_PER_UNIT.oz);
  if (oz.lte(0)) return { text: '0 oz', value: 0, unit: 'oz', exact: oz.toNumber() };
  const oneDp = oz.toDecimalPlaces(1, Decimal.ROUND_HALF_UP);
  if (oneDp.lt(1)) {
    if (oneDp.isZero()) return { text: '< 0.1 oz', value: 0.1, unit: 'oz', exact: oz.toNumber() };
    return { text: `${oneDp.toFixed(1)} oz`, value: oneDp.toNumber(), unit: 'oz', exact: oz.toNumber() };
  }
  const quarter = onGrid(oz, OZ_GRID);
  if (quarter.shown.lt(16)) {
    const { shown: _omit, ...rest } = quarter;
    return rest;
  }
  const totalOz = oz.toDecimalPlaces(0, Decimal.ROUND_HALF_UP);
  const lb = totalOz.divToInt(16);
  const rest = totalOz.minus(lb.times(16));
  const shownLb = totalOz.div(16);
  const text = rest.isZero() ? `${lb.toFixed(0)} lb` : `${lb.toFixed(0)} lb ${rest.toFixed(0)} oz`;
  return { text, value: shownLb.toNumber(), unit: 'lb', exact: g.div(GRAMS_PER_UNIT.lb).toNumber() };
}

function metricText(v: Decimal, small: 'g' | 'ml', smallSym: string, big: 'kg' | 'l', bigSym: string): KitchenAmount {
  if (v.lte(0)) return { text: `0 ${smallSym}`, value: 0, unit: small, exact: v.toNumber() };
  const dp = v.lt(10) ? 1 : 0;
  const rounded = v.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP);
  if (rounded.lt(1000)) {
    if (rounded.isZero()) return { text: `< 0.1 ${smallSym}`, value: 0.1, unit: small, exact: v.toNumber() };
    return { text: `${stripZeros(rounded, dp)} ${smallSym}`, value: rounded.toNumber(), unit: small, exact: v.toNumber() };
  }
  const inBig = v.div(1000);
  const shown = inBig.toDecimalPlaces(2, Decimal.ROUND_HALF_UP);
  return { text: `${stripZeros(shown, 2)} ${bigSym}`, value: shown.toNumber(), unit: big, exact: inBig.toNumber() };
}

/** A count of pieces to the nearest ¼ ("3 large", "1 ½ slice"); below ⅛ the text is "< ¼ <piece>". */
export function formatPieces(count: Decimal.Value, piece: string): KitchenAmount {
  const c = new Decimal(count);
  // The generic piece is a bare count ("12"), not "12 each"; a named piece follows the number ("2 ½ large").
  const withPiece = (n: string) => (piece === 'each' ? n : `${n} ${piece}`);
  if (c.lte(0)) return { text: withPiece('0'), value: 0, unit: piece, exact: c.toNumber() };
  if (c.lt(0.125)) return { text: withPiece('< ¼'), value: 0.25, unit: piece, exact: c.toNumber() };
  const { whole, part } = snapToGrid(c, PIECE_PARTS);
  const shown = whole.plus(new Decimal(part[0]).div(part[1]));
  return { text: withPiece(gridText(whole, part)), value: shown.toNumber(), unit: piece, exact: c.toNumber() };
}

export type KitchenMeasure = 'auto' | 'mass' | 'volume' | { piece: string };

export interface KitchenFormatOptions {
  system: MeasureSystem;
  /** `auto` (default): volume when the ingredient has a density, otherwise mass. */
  measure?: KitchenMeasure;
}

/**
 * Grams of an ingredient as a friendly kitchen amount, e.g. 531.4 mL worth of flour → "2 ¼ cups".
 * Throws UnitConversionError when the chosen measure needs a fact the ingredient lacks.
 */
export function formatKitchenAmount(
  grams: Decimal.Value,
  facts: IngredientFacts,
  options: KitchenFormatOptions,
): KitchenAmount {
  const g = new Decimal(grams);
  const measure = options.measure ?? 'auto';
  if (typeof measure === 'object') return formatPieces(fromGrams(g, measure.piece, facts), measure.piece);
  const useVolume = measure === 'volume' || (measure === 'auto' && positiveDecimal(facts.densityGPerMl) !== null);
  if (useVolume) return formatVolume(fromGrams(g, 'ml', facts), options.system);
  return formatMass(g, options.system);
}
