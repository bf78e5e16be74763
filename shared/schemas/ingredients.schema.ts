import Decimal from 'decimal.js';
import { z } from 'zod';
import { typedNumber } from './typed-number';
import type { CrossIssues } from './csv-import';
import { unitTextSchema } from './units.schema';
import { ALLERGEN_CODES, type AllergenCode } from '../domain/allergens';
import { NET_CARB_RULES, type AtwaterCheck, type NetCarbRuleKind, type NutrientNumbers } from '../domain/nutrition';
import { ambiguousCommaMessage, AmountParseError, decimalCommaToPoint, isMassUnit, isVolumeUnit, MAX_AMOUNT, MAX_AMOUNT_MESSAGE, parseAmount, PLAIN_DECIMAL, unitKind, UnknownUnitError } from '../domain/units';
import { PG_INT_MAX, TOO_LARGE, editVersionText } from './ids';
import { DATE_ORDERS, type DateOrder } from '../domain/iso-date';
import { CLOCK_STYLES, type ClockStyle } from '../domain/clock';
import { canonicalTimeZone, TIME_ZONE_MAX } from '../domain/time-zone';

/** Ingredient library, recipe calculation and the net-carb setting: inputs (zod) and DTOs for API and client. */

export const INGREDIENT_CATEGORIES = [
  'eggs', 'dairy', 'meat', 'fish', 'vegetables', 'fruit', 'nuts-seeds-flours', 'fats-oils', 'sweeteners',
  'wraps-breads', 'condiments', 'herbs-spices', 'baking', 'drinks', 'other',
] as const;
export type IngredientCategoryCode = (typeof INGREDIENT_CATEGORIES)[number];
export const INGREDIENT_CATEGORY_LABELS: Record<IngredientCategoryCode, string> = {
  eggs: 'Eggs',
  dairy: 'Dairy',
  meat: 'Meat',
  fish: 'Fish and seafood',
  vegetables: 'Vegetables',
  fruit: 'Fruit',
  'nuts-seeds-flours': 'Nuts, seeds and flours',
  'fats-oils': 'Fats and oils',
  sweeteners: 'Sweeteners',
  'wraps-breads': 'Wraps and breads',
  condiments: 'Condiments',
  'herbs-spices': 'Herbs and spices',
  baking: 'Baking',
  drinks: 'Drinks',
  other: 'Other',
};

export const STORE_AISLE_CODES = [
  'produce', 'dairy-eggs', 'meat-deli', 'bakery', 'baking', 'canned-jarred', 'condiments', 'spices', 'frozen',
  'health-food', 'oils',
] as const;
export type StoreAisleCode = (typeof STORE_AISLE_CODES)[number];
export const STORE_AISLE_LABELS: Record<StoreAisleCode, string> = {
  produce: 'Produce',
  'dairy-eggs': 'Dairy and eggs',
  'meat-deli': 'Meat and deli',
  bakery: 'Bakery',
  baking: 'Baking',
  'canned-jarred': 'Canned and jarred',
  condiments: 'Condiments',
  spices: 'Spices',
  frozen: 'Frozen',
  'health-food': 'Health food',
  oils: 'Oils',
};

// ---------------------------------------------------------------------------------------------------------------
// Decimal fields: typed text or numbers in, a plain decimal string out (exact; the server stores numeric(12,4)).
// ---------------------------------------------------------------------------------------------------------------


type Blank = 'required' | 'zero' | 'null';

function decimalField<B extends Blank>(
  label: string,
  max: number,
  blank: B,
): z.ZodType<B extends 'null' ? string | null : string, string | number | null | undefined> {
  return z
    .union([z.string(), z.number(), z.null()])
    .optional()
    .transform((v, ctx) => {
      const typed = v === null || v === undefined ? '' : typeof v === 'number' ? String(v) : v.trim();
      const s = decimalCommaToPoint(typed);
      if (s === null) {
        ctx.addIssue({ code: 'custom', message: `${capital(label)}: ${ambiguousCommaMessage(typed)}` });
        return z.NEVER;
      }
      if (s === '') {
        if (blank === 'zero') return '0';
        if (blank === 'null') return null;
        ctx.addIssue({ code: 'custom', message: `Enter ${label}` });
        return z.NEVER;
      }
      if (!PLAIN_DECIMAL.test(s)) {
        ctx.addIssue({ code: 'custom', message: `${capital(label)} must be a number of 0 or more` });
        return z.NEVER;
      }
      const d = new Decimal(s);
      if (d.gt(max)) {
        ctx.addIssue({ code: 'custom', message: `${capital(label)} must be at most ${max}` });
        return z.NEVER;
      }
      if (d.decimalPlaces() > 4) {
        ctx.addIssue({ code: 'custom', message: `${capital(label)} takes at most 4 decimal places` });
        return z.NEVER;
      }
      if (blank === 'null' && d.isZero()) {
        ctx.addIssue({ code: 'custom', message: `${capital(label)} must be above 0 (leave it empty when unknown)` });
        return z.NEVER;
      }
      return d.toFixed();
    }) as never;
}

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/** A per-ingredient piece name ("large", "slice", "10-oz package"): not a standard unit code, not "each". */
export function pieceNameProblem(name: string): string | null {
  const n = name.trim();
  if (!n) return 'Enter a piece name';
  try {
    if (unitKind(n) !== 'count') return `"${n}" is a measuring unit, not a piece`;
  } catch (e) {
    return e instanceof UnknownUnitError ? e.message : 'Not a piece name';
  }
  if (n === 'each') return '"each" is built in; name the piece (large, slice, …)';
  return null;
}

const pieceWeightSchema = z.object({
  name: z
    .string()
    .trim()
    .toLowerCase()
    .max(40, { message: 'At most 40 characters' })
    .superRefine((n, ctx) => {
      const problem = pieceNameProblem(n);
      if (problem) ctx.addIssue({ code: 'custom', message: problem });
    }),
  grams: decimalField('the grams of one piece', 100000, 'required').refine((g) => new Decimal(g).gt(0), {
    message: 'The grams of one piece must be above 0',
  }),
});

const purchaseSchema = z.object({
  amount: decimalField('the package size', 100000, 'required').refine((a) => new Decimal(a).gt(0), {
    message: 'The package size must be above 0',
  }),
  /** A unit code (oz, lb, g, pint…) or one of the ingredient's piece names (e.g. 12 × "large" for a dozen eggs). */
  unit: z.string().trim().min(1, { message: 'Choose a unit' }).max(40),
  label: z.string().trim().min(1, { message: 'Describe the package, e.g. "8 oz block"' }).max(120),
});

const optionalText = (max: number) =>
  z
    .union([z.string(), z.null()])
    .optional()
    .transform((v) => (v ?? '').trim())
    .pipe(z.string().max(max, { message: `At most ${max} characters` }))
    .transform((v) => (v === '' ? null : v));

/** The largest package price, in cents ($100,000). */
const MAX_PRICE_CENTS = 10_000_000;

export const ingredientFields = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(160, { message: 'At most 160 characters' }),
  category: z.enum(INGREDIENT_CATEGORIES, { message: `Choose a category (${INGREDIENT_CATEGORIES.join(', ')})` }),
  kcal: decimalField('energy (kcal per 100 g)', 1000, 'required'),
  fatG: decimalField('fat (g per 100 g)', 100, 'required'),
  satFatG: decimalField('saturated fat (g per 100 g)', 100, 'zero'),
  proteinG: decimalField('protein (g per 100 g)', 100, 'required'),
  carbsG: decimalField('total carbohydrate (g per 100 g)', 100, 'required'),
  fiberG: decimalField('dietary fiber (g per 100 g)', 100, 'zero'),
  sugarsG: decimalField('total sugars (g per 100 g)', 100, 'zero'),
  erythritolG: decimalField('erythritol (g per 100 g)', 100, 'zero'),
  alluloseG: decimalField('allulose (g per 100 g)', 100, 'zero'),
  otherPolyolsG: decimalField('other sugar alcohols (g per 100 g)', 100, 'zero'),
  sodiumMg: decimalField('sodium (mg per 100 g)', 100000, 'zero'),
  densityGPerMl: decimalField('density (g per mL)', 5, 'null'),
  densitySource: optionalText(300),
  pieceWeights: z.array(pieceWeightSchema).max(12, { message: 'At most 12 piece sizes' }).default([]),
  allergens: z
    .array(z.enum(ALLERGEN_CODES as readonly AllergenCode[] as [AllergenCode, ...AllergenCode[]], { message: `Not one of the nine major allergens (${ALLERGEN_CODES.join(', ')})` }))
    .max(9)
    .default([])
    .transform((codes) => ALLERGEN_CODES.filter((c) => codes.includes(c))),
  purchase: purchaseSchema.nullable().default(null),
  priceCents: z
    .union([z.number(), z.string(), z.null()])
    .optional()
    .transform((v) => (v === '' || v === undefined || v === null ? null : Number(v)))
    .pipe(
      z
        .number({ message: 'Enter the price in cents' })
        .int({ message: 'Enter the price in whole cents' })
        .min(0, { message: 'The price cannot be negative' })
        .max(MAX_PRICE_CENTS, { message: 'At most $100,000' })
        .nullable(),
    ),
  aisle: z
    .union([z.string(), z.null()])
    .optional()
    .transform((v) => (v ? v : null))
    .pipe(z.enum(STORE_AISLE_CODES, { message: `Choose a store aisle (${STORE_AISLE_CODES.join(', ')})` }).nullable()),
  source: z
    .string({ message: 'Say where the values come from' })
    .trim()
    .min(1, { message: 'Say where the values come from (e.g. "package label" or "USDA FoodData Central 171287")' })
    .max(300, { message: 'At most 300 characters' }),
  note: optionalText(1000),
});

type Fields = z.output<typeof ingredientFields>;

/**
 * Checks between fields: parts never exceed their whole, and a purchase unit must be measurable. Each check looks
 * only at fields it has, so a CSV row can be checked on the fields that read (readRow) in the same pass as the rest.
 */
export function crossCheck(v: Partial<Fields>, ctx: CrossIssues) {
  const d = (x: string) => new Decimal(x);
  if (v.satFatG !== undefined && v.fatG !== undefined && d(v.satFatG).gt(d(v.fatG))) {
    ctx.addIssue({ code: 'custom', path: ['satFatG'], message: 'Saturated fat is part of fat: it cannot be more than fat' });
  }
  const parts = [v.fiberG, v.erythritolG, v.alluloseG, v.otherPolyolsG];
  if (v.carbsG !== undefined && parts.every((x) => x !== undefined)) {
    const carbParts = parts.reduce((sum, x) => sum.plus(x!), d('0'));
    if (carbParts.gt(d(v.carbsG))) {
      ctx.addIssue({
        code: 'custom',
        path: ['carbsG'],
        message: `Total carbohydrate includes fiber, sugar alcohols and allulose (${carbParts.toFixed()} g here): it must be at least that`,
      });
    }
  }
  // The macronutrients of 100 g cannot weigh more than 100 g (0.5 g of rounding allowed).
  if (v.fatG !== undefined && v.proteinG !== undefined && v.carbsG !== undefined) {
    const macros = d(v.fatG).plus(v.proteinG).plus(v.carbsG);
    if (macros.gt(100.5)) {
      ctx.addIssue({
        code: 'custom',
        path: ['carbsG'],
        message: `Fat, protein and carbohydrate add up to ${macros.toFixed()} g in 100 g: check the values`,
      });
    }
  }
  if (!v.pieceWeights) return;
  const names = v.pieceWeights.map((p) => p.name);
  names.forEach((n, i) => {
    if (names.indexOf(n) !== i) ctx.addIssue({ code: 'custom', path: ['pieceWeights', i, 'name'], message: `"${n}" is listed twice` });
  });
  if (v.purchase) {
    const u = v.purchase.unit;
    const ok = isMassUnit(u) || isVolumeUnit(u) || u === 'each' || names.includes(u.toLowerCase());
    if (!ok) {
      ctx.addIssue({
        code: 'custom',
        path: ['purchase', 'unit'],
        message: `Use a unit code (g, kg, oz, lb, ml, l, cup, pint, quart, each) or one of this ingredient's piece names`,
      });
    }
  }
}

export const ingredientInputSchema = ingredientFields.superRefine(crossCheck);
export type IngredientInput = z.input<typeof ingredientInputSchema>;
export type IngredientValues = z.output<typeof ingredientInputSchema>;

/**
 * A package price as people type it, in dollars and cents ("3.99", "$3.99", "3,99", "4"), to whole cents (399). The
 * API keeps and takes cents (`priceCents`, an integer: no float rounding in a sum of prices); the form reads dollars.
 */
export const priceDollarsText = z
  .union([z.string(), z.number(), z.null()])
  .optional()
  .transform((v, ctx): number | null => {
    const typed = v === null || v === undefined ? '' : String(v).trim().replace(/^\$\s*/, '');
    if (typed === '') return null;
    const point = decimalCommaToPoint(typed);
    if (point === null) {
      ctx.addIssue({ code: 'custom', message: `Price: ${ambiguousCommaMessage(typed)}` });
      return z.NEVER;
    }
    if (!/^(?:\d+(?:\.\d{0,2})?|\.\d{1,2})$/.test(point)) {
      ctx.addIssue({ code: 'custom', message: /^\d*\.\d{3,}$/.test(point) ? 'Give the price to the cent, e.g. 3.99' : 'Enter the price in dollars, e.g. 3.99' });
      return z.NEVER;
    }
    const cents = new Decimal(point).times(100);
    if (cents.gt(MAX_PRICE_CENTS)) {
      ctx.addIssue({ code: 'custom', message: 'At most $100,000' });
      return z.NEVER;
    }
    return cents.toNumber();
  });

/** Cents as the price field shows them: 399 → "3.99", none → "". */
export const dollarsText = (cents: number | null | undefined): string => (cents === null || cents === undefined ? '' : new Decimal(cents).div(100).toFixed(2));

/** The ingredient form's schema: the API's, with the price typed in dollars (the values it gives are the API's). */
export const ingredientFormSchema = ingredientFields.extend({ priceCents: priceDollarsText }).superRefine(crossCheck);

export const ingredientUpdateSchema = ingredientFields
  .extend({ version: editVersionText })
  .superRefine(crossCheck);
export type IngredientUpdateInput = z.input<typeof ingredientUpdateSchema>;
export type IngredientUpdateValues = z.output<typeof ingredientUpdateSchema>;

// ---------------------------------------------------------------------------------------------------------------
// Listing
// ---------------------------------------------------------------------------------------------------------------

export const INGREDIENT_SORTS = [
  'name', '-name', 'kcal', '-kcal', 'proteinG', '-proteinG', 'fatG', '-fatG', 'carbsG', '-carbsG', 'category',
  '-category', 'updatedAt', '-updatedAt',
] as const;
export type IngredientSort = (typeof INGREDIENT_SORTS)[number];

export const ingredientListQuerySchema = z.object({
  q: z.string().trim().max(100, { message: 'At most 100 characters' }).default(''),
  category: z
    // '' (the filter's "any category") is one of the enum's values, not a union's branch: a wrong category is
    // answered "Not a category", not a union's "Invalid input".
    .enum(['', ...INGREDIENT_CATEGORIES], { message: 'Not a category' })
    .optional()
    .transform((v) => v || undefined),
  /** all: shared reference rows and the workspace's own; mine: own only; shared: reference rows only. */
  scope: z.enum(['all', 'mine', 'shared']).default('all'),
  page: z.coerce.number().int({ message: 'Use a whole page number' }).min(1, { message: 'Pages start at 1' }).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1, { message: 'At least 1 per page' }).max(100, { message: 'At most 100 per page' }).default(25),
  sort: z.enum(INGREDIENT_SORTS, { message: 'Not a sort order' }).default('name'),
});
export type IngredientListQuery = z.input<typeof ingredientListQuerySchema>;
/** The list filters with their defaults filled in (what the client keeps and sends). */
export type IngredientListParams = z.output<typeof ingredientListQuerySchema>;

export const ingredientIdParams = z.object({ id: z.coerce.number().int().positive({ message: 'Not an ingredient id' }).max(PG_INT_MAX, TOO_LARGE) });

// ---------------------------------------------------------------------------------------------------------------
// Recipe calculation
// ---------------------------------------------------------------------------------------------------------------

/** A positive decimal written as Decimal#toFixed writes it: no sign, no leading or trailing zeros, not zero. */
const CANONICAL_POSITIVE = /^(?:[1-9]\d*(?:\.\d*[1-9])?|0\.\d*[1-9])$/;

export const recipeItemSchema = z.object({
  ingredientId: z.coerce.number({ message: 'Choose an ingredient' }).int().positive({ message: 'Choose an ingredient' }).max(PG_INT_MAX, TOO_LARGE),
  /** The amount as typed ('1 1/2', '¾', '1-2' → midpoint) or a number. */
  amount: z.union([z.string(), z.number()]).transform((v, ctx) => {
    // Already a canonical positive decimal ("250", "12.5"): it is its own exact value (the form sends these).
    if (typeof v === 'string' && CANONICAL_POSITIVE.test(v)) {
      // Seven or more whole digits may pass the largest amount (a cheap test first: this is every keystroke's path).
      const wholeDigits = v.includes('.') ? v.indexOf('.') : v.length;
      if (wholeDigits >= 7 && new Decimal(v).gt(MAX_AMOUNT)) {
        ctx.addIssue({ code: 'custom', message: MAX_AMOUNT_MESSAGE });
        return z.NEVER;
      }
      return v;
    }
    try {
      const parsed = parseAmount(String(v));
      if (parsed.value.lte(0)) {
        ctx.addIssue({ code: 'custom', message: 'The amount must be above 0' });
        return z.NEVER;
      }
      if (parsed.value.gt(MAX_AMOUNT)) {
        ctx.addIssue({ code: 'custom', message: MAX_AMOUNT_MESSAGE });
        return z.NEVER;
      }
      return parsed.value.toFixed();
    } catch (e) {
      ctx.addIssue({ code: 'custom', message: e instanceof AmountParseError ? e.message : 'Could not read this amount' });
      return z.NEVER;
    }
  }),
  /** A unit as typed or one of the ingredient's piece names; normalised to a code. */
  unit: unitTextSchema,
});

export const recipeCalcSchema = z.object({
  items: z.array(recipeItemSchema).min(1, { message: 'Add at least one ingredient' }).max(100, { message: 'At most 100 ingredients' }),
  portions: z.coerce.number().int({ message: 'Portions must be a whole number' }).min(1, { message: 'At least 1 portion' }).max(10_000),
  yieldFactor: typedNumber(
    'The cooked-yield factor',
    z
      .union([z.string(), z.number()])
      .optional()
      .transform((v, ctx) => {
        if (v === undefined || v === '') return undefined;
        const s = String(v).trim();
        if (!PLAIN_DECIMAL.test(s) || new Decimal(s).lte(0) || new Decimal(s).gt(5)) {
          ctx.addIssue({ code: 'custom', message: 'The cooked-yield factor must be a number above 0 and at most 5' });
          return z.NEVER;
        }
        return new Decimal(s).toFixed();
      }),
  ),
});
export type RecipeCalcInput = z.input<typeof recipeCalcSchema>;
export type RecipeCalcValues = z.output<typeof recipeCalcSchema>;

// ---------------------------------------------------------------------------------------------------------------
// Workspace settings (the net-carb rule, how dates are written)
// ---------------------------------------------------------------------------------------------------------------

export const NET_CARB_RULE_KINDS = NET_CARB_RULES.map((r) => r.kind) as [NetCarbRuleKind, ...NetCarbRuleKind[]];

export const workspaceSettingsUpdateSchema = z.object({
  netCarbRule: z.enum(NET_CARB_RULE_KINDS, { message: 'Choose a net-carb rule' }).optional(),
  dateOrder: z.enum(DATE_ORDERS, { message: 'Choose how dates are written: month-day or day-month' }).optional(),
  clock: z.enum(CLOCK_STYLES, { message: 'Choose how times are written: 24h or 12h' }).optional(),
  /** The kitchen's IANA time zone, or null to stop watching cooling deadlines. Stored in its canonical spelling. */
  timeZone: z
    .string({ message: 'Choose the kitchen\'s time zone from the list, such as America/Chicago' })
    .max(TIME_ZONE_MAX, { message: 'Choose the kitchen\'s time zone from the list, such as America/Chicago' })
    .transform((v, ctx) => {
      const zone = canonicalTimeZone(v);
      if (!zone) ctx.addIssue({ code: 'custom', message: `"${v.slice(0, TIME_ZONE_MAX)}" is not a time zone: choose one from the list, such as America/Chicago` });
      return zone ?? v;
    })
    .nullable()
    .optional(),
  version: editVersionText,
});
export type WorkspaceSettingsUpdateInput = z.input<typeof workspaceSettingsUpdateSchema>;

/** Shown beside the setting: there is no regulatory definition to follow. */
export const NET_CARB_HELP =
  'No US regulation defines "net carbs" (FDA has no definition; labels show total carbohydrate). ' +
  'These rules are common practice: pick the one your clients count with. Total carbohydrate always stays on labels.';

export interface WorkspaceSettingsDto {
  netCarbRule: NetCarbRuleKind;
  /** How every page and document of the workspace writes dates in words. */
  dateOrder: DateOrder;
  /** How every page and document of the workspace writes a time of day. */
  clock: ClockStyle;
  /** The kitchen's IANA time zone, or null while not set (then no cooling deadline is watched). */
  timeZone: string | null;
  netCarbRules: Array<{ kind: NetCarbRuleKind; label: string; formula: string }>;
  help: string;
  version: number;
}

// ---------------------------------------------------------------------------------------------------------------
// DTOs
// ---------------------------------------------------------------------------------------------------------------

export interface Per100gDto {
  kcal: number;
  fatG: number;
  satFatG: number;
  proteinG: number;
  carbsG: number;
  fiberG: number;
  sugarsG: number;
  erythritolG: number;
  alluloseG: number;
  otherPolyolsG: number;
  /** erythritol + other sugar alcohols + allulose. */
  polyolsG: number;
  /** Under the workspace's net-carb rule. */
  netCarbsG: number;
  sodiumMg: number;
}

export interface IngredientDto {
  id: number;
  slug: string | null;
  name: string;
  category: IngredientCategoryCode;
  /** A shared reference row (read-only for everyone) rather than the workspace's own. */
  shared: boolean;
  /** Whether the person asking may edit or delete it (a coach, on the workspace's own rows). */
  editable: boolean;
  per100g: Per100gDto;
  densityGPerMl: number | null;
  densitySource: string | null;
  pieceWeights: Record<string, number>;
  allergens: AllergenCode[];
  purchase: { amount: number; unit: string; label: string } | null;
  priceCents: number | null;
  aisle: StoreAisleCode | null;
  source: string;
  provenance: string | null;
  fdcId: number | null;
  note: string | null;
  /** Stored kcal against the energy computed from the macronutrients (21 CFR 101.9 general factors). */
  atwater: AtwaterCheck;
  netCarbRule: NetCarbRuleKind;
  version: number;
  updatedAt: string;
}

export interface IngredientListDto {
  items: IngredientDto[];
  total: number;
  page: number;
  pageSize: number;
  netCarbRule: NetCarbRuleKind;
}

export interface RecipeCalcLineDto {
  ingredientId: number;
  name: string;
  amount: number;
  unit: string;
  grams: number;
}

export interface RecipeCalcDto {
  total: NutrientNumbers;
  perPortion: NutrientNumbers;
  portions: number;
  yieldFactor: number;
  netCarbRule: NetCarbRuleKind;
  lines: RecipeCalcLineDto[];
}

export type { ImportProblem } from './csv-import';

export interface ImportResultDto {
  /** New ingredients, and their ids. */
  created: number;
  ids: number[];
  /** Own ingredients whose values the file replaced (an import that updates), and their ids. */
  updated: number;
  updatedIds: number[];
  /** Their names as the file gives them, in the file's order. */
  updatedNames: string[];
  /** Rows naming an own ingredient with the values it already has (left as they were). */
  unchanged: number;
}

/** What an import does with a row named like one of the workspace's own ingredients. */
export const importOptionsSchema = z.object({
  existing: z.enum(['refuse', 'update'], { message: 'Choose "refuse" (a name already in your library is a problem) or "update"' }).default('refuse'),
});

/** The CSV columns of an import, in order (a template can be downloaded from the library page). */
export const IMPORT_COLUMNS = [
  'name', 'category', 'kcal', 'fat_g', 'sat_fat_g', 'protein_g', 'carbs_g', 'fiber_g', 'sugars_g', 'erythritol_g',
  'allulose_g', 'other_polyols_g', 'sodium_mg', 'density_g_per_ml', 'piece_weights', 'allergens', 'purchase_amount',
  'purchase_unit', 'purchase_label', 'price_cents', 'aisle', 'source', 'note',
] as const;
export type ImportColumn = (typeof IMPORT_COLUMNS)[number];
export const REQUIRED_IMPORT_COLUMNS: readonly ImportColumn[] = ['name', 'category', 'kcal', 'fat_g', 'protein_g', 'carbs_g', 'source'];
