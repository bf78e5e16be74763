import { z } from 'zod';
import { typedNumber } from './typed-number';
import { unitTextSchema } from './units.schema';
import { ALLERGEN_CODES, type AllergenCode } from '../domain/allergens';
import { DEFAULT_BAKE_RULES, type BakeRuleCategory } from '../domain/bake-rules-defaults';
import { MAX_AMOUNT, MAX_AMOUNT_MESSAGE, parseAmount } from '../domain/units';
import type { NutrientNumbers } from '../domain/nutrition';
import type { EnergyShares } from '../domain/nutrition';
import { PG_INT_MAX, TOO_LARGE, editVersionText } from './ids';

/** Base trays: inputs (zod) and response DTOs, shared by the API and the client. */

export const PAN_CODES = ['full-sheet', 'half-sheet', 'quarter-sheet', 'dish-9x13', 'custom'] as const;
export type PanCodeInput = (typeof PAN_CODES)[number];

export const PAN_LININGS = ['parchment', 'silicone-mat', 'greased', 'foil', 'none'] as const;
export type PanLining = (typeof PAN_LININGS)[number];
export const PAN_LINING_LABELS: Record<PanLining, string> = {
  parchment: 'Parchment paper',
  'silicone-mat': 'Silicone baking mat',
  greased: 'Greased pan',
  foil: 'Foil',
  none: 'No lining',
};

export const BAKE_CATEGORIES = DEFAULT_BAKE_RULES.map((r) => r.category) as [BakeRuleCategory, ...BakeRuleCategory[]];

const positiveDecimal = (what: string, max: number) =>
  typedNumber(
    what,
    z.coerce
      .number({ message: `Enter ${what} as a number` })
      .refine((v) => Number.isFinite(v) && v > 0, { message: `${what} must be above 0` })
      .refine((v) => v <= max, { message: `${what} must be at most ${max}` }),
  );

export const panInputSchema = z
  .object({
    code: z.enum(PAN_CODES, { message: 'Choose a pan' }),
    /** Custom pans only: the two sides, in `unit`. */
    length: positiveDecimal('The pan length', 200).optional(),
    width: positiveDecimal('The pan width', 200).optional(),
    unit: z.enum(['in', 'cm']).default('in'),
  })
  .superRefine((pan, ctx) => {
    if (pan.code !== 'custom') return;
    if (pan.length === undefined) ctx.addIssue({ code: 'custom', path: ['length'], message: 'Enter the pan length' });
    if (pan.width === undefined) ctx.addIssue({ code: 'custom', path: ['width'], message: 'Enter the pan width' });
  });
export type PanInput = z.input<typeof panInputSchema>;

export const cutPlanSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('grid'),
    rows: z.coerce.number().int({ message: 'Rows must be a whole number' }).min(1, { message: 'At least 1 row' }).max(40),
    columns: z.coerce
      .number()
      .int({ message: 'Columns must be a whole number' })
      .min(1, { message: 'At least 1 column' })
      .max(40),
  }),
  z.object({
    kind: z.literal('pieces'),
    pieces: z.coerce
      .number()
      .int({ message: 'Pieces must be a whole number' })
      .min(1, { message: 'At least 1 piece' })
      .max(400),
  }),
]);
export type CutPlanInput = z.infer<typeof cutPlanSchema>;

export const trayLineSchema = z.object({
  ingredientId: z.coerce.number({ message: 'Choose an ingredient' }).int().positive({ message: 'Choose an ingredient' }).max(PG_INT_MAX, TOO_LARGE),
  /** The amount as typed: 2, 1.5, 1 1/2, 1½, a range 1-2 (its midpoint is used). */
  amountText: z
    .string()
    .trim()
    .min(1, { message: 'Enter an amount' })
    .max(40)
    .superRefine((text, ctx) => {
      try {
        const { value } = parseAmount(text);
        if (value.lte(0)) ctx.addIssue({ code: 'custom', message: 'The amount must be above 0' });
        else if (value.gt(MAX_AMOUNT)) ctx.addIssue({ code: 'custom', message: MAX_AMOUNT_MESSAGE });
      } catch (e) {
        ctx.addIssue({ code: 'custom', message: e instanceof Error ? e.message : 'Could not read this amount' });
      }
    }),
  /** A unit as typed or one of the ingredient's piece names; normalised to a code. */
  unit: unitTextSchema,
  note: z.string().trim().max(200).default(''),
});
export type TrayLineInput = z.input<typeof trayLineSchema>;

/** A tray's oven set point, whole °F (the form takes °C too: src/components/domain/oven-temperature-field.tsx). */
export const TRAY_OVEN_LIMITS_F = { min: 150, max: 550 } as const;

export const bakeInputSchema = z
  .object({
    /** A bake rule category (shared/domain/bake-rules-defaults.ts); the temperature and times may differ from it. */
    category: z.enum(BAKE_CATEGORIES, { message: 'Choose a bake category' }),
    tempF: z.coerce
      .number()
      .int({ message: 'Use whole degrees' })
      .min(TRAY_OVEN_LIMITS_F.min, { message: `At least ${TRAY_OVEN_LIMITS_F.min} °F` })
      .max(TRAY_OVEN_LIMITS_F.max, { message: `At most ${TRAY_OVEN_LIMITS_F.max} °F` }),
    minMinutes: z.coerce.number().int({ message: 'Use whole minutes' }).min(1, { message: 'At least 1 minute' }).max(600),
    maxMinutes: z.coerce.number().int({ message: 'Use whole minutes' }).min(1, { message: 'At least 1 minute' }).max(600),
  })
  .refine((b) => b.maxMinutes >= b.minMinutes, {
    path: ['maxMinutes'],
    message: 'The longest time must be at least the shortest',
  });
export type BakeInput = z.infer<typeof bakeInputSchema>;

export const storageInputSchema = z.object({
  fridgeDays: z.coerce.number().int({ message: 'Use whole days' }).min(0).max(7, { message: 'At most 7 days in the fridge' }),
  freezerWeeks: z.coerce.number().int({ message: 'Use whole weeks' }).min(0).max(52, { message: 'At most 52 weeks' }),
});

const tag = z.string().trim().toLowerCase().min(1).max(30, { message: 'A tag has at most 30 characters' });

export const trayInputSchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(120, { message: 'At most 120 characters' }),
  description: z.string().trim().max(4000).default(''),
  lines: z.array(trayLineSchema).min(1, { message: 'Add at least one ingredient' }).max(60),
  pan: panInputSchema,
  panLining: z.enum(PAN_LININGS).default('parchment'),
  bake: bakeInputSchema,
  /** Cooked mass ÷ raw mass (e.g. 0.35 for baked bacon, 0.9 for an egg slab). */
  yieldFactor: positiveDecimal('The cooked-yield factor', 5),
  cutPlan: cutPlanSchema,
  storage: storageInputSchema,
  reheatSteps: z.array(z.string().trim().min(1, { message: 'Write the step or remove it' }).max(300)).max(12).default([]),
  tags: z
    .array(tag)
    .max(20)
    .default([])
    .transform((t) => [...new Set(t)]),
});
export type TrayInput = z.input<typeof trayInputSchema>;
export type TrayValues = z.output<typeof trayInputSchema>;

export const createTraySchema = trayInputSchema;
export type CreateTrayInput = TrayInput;

export const updateTraySchema = trayInputSchema.extend({
  version: editVersionText,
  archived: z.boolean().optional(),
});
export type UpdateTrayInput = z.input<typeof updateTraySchema>;

export const trayIdParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });

const allergenList = z
  .union([z.string(), z.array(z.string())])
  .transform((v) => (Array.isArray(v) ? v : v.split(',')).map((s) => s.trim()).filter(Boolean))
  .pipe(z.array(z.enum(ALLERGEN_CODES as [AllergenCode, ...AllergenCode[]], { message: 'Unknown allergen' })));

export const listTraysQuerySchema = z.object({
  q: z.string().trim().max(120).optional(),
  /** `false` (default): active trays; `true`: archived only; `all`: both. */
  archived: z.enum(['true', 'false', 'all']).default('false'),
  /** Comma-separated allergen codes the tray must be free of. */
  freeOf: allergenList.optional(),
  /** Net carbs per portion at most this many grams. */
  maxNetCarbs: z.coerce.number().min(0).max(1000).optional(),
  tag: z.string().trim().toLowerCase().max(30).optional(),
});
export type ListTraysQuery = z.input<typeof listTraysQuerySchema>;

export const scaleTraySchema = z
  .object({
    factor: positiveDecimal('The factor', 100).optional(),
    targetPortions: z.coerce.number().int({ message: 'Use a whole number of portions' }).min(1).max(10000).optional(),
    pan: panInputSchema.optional(),
    /** Display system; default: the person's own setting. */
    system: z.enum(['us', 'metric']).optional(),
  })
  .superRefine((b, ctx) => {
    const given = [b.factor, b.targetPortions, b.pan].filter((v) => v !== undefined).length;
    if (given !== 1) {
      ctx.addIssue({ code: 'custom', path: ['factor'], message: 'Give exactly one of factor, targetPortions or pan' });
    }
  });
export type ScaleTrayInput = z.input<typeof scaleTraySchema>;

// ---------------------------------------------------------------------------------------------------------------
// DTOs
// ---------------------------------------------------------------------------------------------------------------

export interface PanDto {
  code: PanCodeInput;
  label: string;
  /** Long side and short side, in `unit`. */
  length: number;
  width: number;
  unit: 'in' | 'cm';
}

export interface TrayLineDto {
  id: number;
  position: number;
  ingredientId: number;
  ingredientName: string;
  amountText: string;
  unit: string;
  note: string;
  /** Grams of this line (null when the ingredient lacks a fact the unit needs). */
  grams: number | null;
}

export interface BakeDto {
  category: BakeRuleCategory;
  categoryLabel: string;
  tempF: number;
  minMinutes: number;
  maxMinutes: number;
}

export interface TrayPhotoDto {
  url: string;
  thumbnailUrl: string;
  width: number;
  height: number;
  contentType: string;
}

export interface TrayDto {
  id: number;
  name: string;
  description: string;
  lines: TrayLineDto[];
  pan: PanDto;
  panLining: PanLining;
  bake: BakeDto;
  yieldFactor: number;
  cutPlan: CutPlanInput;
  portions: number;
  storage: { fridgeDays: number; freezerWeeks: number };
  reheatSteps: string[];
  /** The safe reheat temperature (FDA Food Code 3-403.11): 165 °F / 74 °C. */
  reheat: { minF: number; minC: number; source: string };
  /** Derived from the ingredients, never typed. */
  allergens: AllergenCode[];
  tags: string[];
  photo: TrayPhotoDto | null;
  isDemo: boolean;
  archived: boolean;
  version: number;
  createdAt: string;
  updatedAt: string;
}

export interface TraySummaryDto {
  id: number;
  name: string;
  tags: string[];
  allergens: AllergenCode[];
  portions: number;
  /** How the pan is cut (drawn on library cards that have no photo). */
  cutPlan: CutPlanInput;
  pan: PanDto;
  photo: TrayPhotoDto | null;
  /** Per portion; null when a line cannot be turned into grams. */
  perPortion: Pick<NutrientNumbers, 'kcal' | 'fatG' | 'proteinG' | 'carbsG' | 'fiberG' | 'netCarbsG' | 'massG'> | null;
  archived: boolean;
  isDemo: boolean;
  version: number;
}

export interface PortionCardDto {
  trayId: number;
  name: string;
  portions: number;
  gramsPerPortion: number;
  /** e.g. "3.6 × 3.25 in" for a grid cut; null for N equal pieces. */
  portionSize: string | null;
  /** Area of one portion in the pan's square units (also for equal pieces). */
  portionArea: number;
  areaUnit: 'in²' | 'cm²';
  perPortion: NutrientNumbers;
  total: NutrientNumbers;
  energyShares: EnergyShares;
  /** Cost of one portion in cents, when every ingredient has a price; otherwise null. */
  costPerPortionCents: number | null;
  /** Ingredients without a price (why the cost is missing). */
  unpricedIngredients: string[];
  netCarbRule: string;
  allergens: AllergenCode[];
}

export interface ScaledLineDto {
  ingredientId: number;
  ingredientName: string;
  originalText: string;
  unit: string;
  /** Scaled amount in the line's own unit. */
  amount: number;
  grams: number | null;
  /** A friendly kitchen amount ("2 ¼ cups", "1 lb 2 oz", "250 g"). */
  display: string;
  note: string;
}

export interface ScaleResultDto {
  mode: 'factor' | 'targetPortions' | 'pan';
  factor: number;
  system: 'us' | 'metric';
  /** targetPortions: whole trays to bake. */
  trays: number | null;
  portionsBaked: number | null;
  spare: number | null;
  /** pan: the new pan and the portions it gives at the same portion size (rounded down). */
  pan: PanDto | null;
  portionsAtSameSize: number | null;
  lines: ScaledLineDto[];
  roundingNote: string;
}
