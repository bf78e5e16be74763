/**
 * Shopping list, pantry and container labels: request inputs (zod) and response DTOs.
 */
import Decimal from 'decimal.js';
import { z } from 'zod';
import { isIsoDate } from '../domain/iso-date';
import { ambiguousCommaMessage, decimalCommaToPoint, MAX_AMOUNT, MAX_AMOUNT_MESSAGE, PLAIN_DECIMAL } from '../domain/units';
import { LABEL_SHEET_CODES } from '../domain/label-sheets';
import type { AllergenCode } from '../domain/allergens';
import type { LabelSheetCode } from '../domain/label-sheets';
import { PG_INT_MAX, TOO_LARGE, editVersionText } from './ids';


/** An amount typed as text or a number: a plain decimal string of 0 or more, at most 4 decimals. */
export const amountField = z
  .union([z.string(), z.number()], { message: 'Enter an amount' })
  .transform((v, ctx) => {
    const typed = typeof v === 'number' ? String(v) : v.trim();
    const s = decimalCommaToPoint(typed);
    if (s === null) {
      ctx.addIssue({ code: 'custom', message: ambiguousCommaMessage(typed) });
      return z.NEVER;
    }
    if (s === '') {
      ctx.addIssue({ code: 'custom', message: 'Enter an amount' });
      return z.NEVER;
    }
    if (!PLAIN_DECIMAL.test(s)) {
      ctx.addIssue({ code: 'custom', message: 'The amount must be a number of 0 or more' });
      return z.NEVER;
    }
    const d = new Decimal(s);
    if (d.gt(MAX_AMOUNT)) {
      ctx.addIssue({ code: 'custom', message: MAX_AMOUNT_MESSAGE });
      return z.NEVER;
    }
    return d.toDecimalPlaces(4, Decimal.ROUND_HALF_UP).toFixed();
  });

const unitField = z.string({ message: 'Choose a unit' }).trim().min(1, { message: 'Choose a unit' }).max(40);

// ---------------------------------------------------------------------------------------------------------------
// Pantry
// ---------------------------------------------------------------------------------------------------------------

export const pantryCreateSchema = z.object({
  ingredientId: z.coerce.number({ message: 'Choose an ingredient' }).int().positive({ message: 'Choose an ingredient' }).max(PG_INT_MAX, TOO_LARGE),
  amount: amountField,
  /** Any unit the ingredient can be converted from (g, oz, cup with a density, a piece name…). */
  unit: unitField,
});
export type PantryCreateInput = z.input<typeof pantryCreateSchema>;
export type PantryCreateValues = z.output<typeof pantryCreateSchema>;

export const pantryUpdateSchema = z.object({
  amount: amountField,
  unit: unitField,
  version: editVersionText,
});
export type PantryUpdateInput = z.input<typeof pantryUpdateSchema>;
export type PantryUpdateValues = z.output<typeof pantryUpdateSchema>;

export const pantryIdParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });

export interface PantryItemDto {
  id: number;
  ingredientId: number;
  ingredientName: string;
  aisle: string | null;
  /** Stored in the ingredient's base unit: grams, or pieces for count-bought items (eggs → "large"). */
  amount: number;
  unit: string;
  /** The amount in kitchen words ("2 lb 3 oz", "18 large"). */
  display: string;
  version: number;
  updatedAt: string;
}

export interface PantryListDto {
  items: PantryItemDto[];
}

// ---------------------------------------------------------------------------------------------------------------
// Shopping list
// ---------------------------------------------------------------------------------------------------------------

export const weekIdParams = z.object({ weekId: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });

export const checkParams = z.object({
  weekId: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE),
  ingredientId: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE),
});

/** A prep date as YYYY-MM-DD. */
const prepDateField = z.string().refine(isIsoDate, { message: 'Give the prep date as YYYY-MM-DD' });

/**
 * Which list of a week: the whole week (no prep date) or, in a week with two prep days, the trip before one of them
 * (what that prep day's trays and the plates it supplies need).
 */
export const shoppingListQuerySchema = z.object({ prepDate: prepDateField.optional() });
export type ShoppingListQuery = z.input<typeof shoppingListQuerySchema>;

export const checkBodySchema = z.object({
  checked: z.boolean({ message: 'Say whether the item is checked (true or false)' }),
  /** The trip's prep date; none for the whole week's list. */
  prepDate: prepDateField.optional(),
});

export const markBoughtSchema = z.object({ prepDate: prepDateField.optional() }).default({});
export type CheckBodyInput = z.input<typeof checkBodySchema>;

/** Needs given directly (before or beside a prep week): trays × counts and add-on amounts. */
export const shoppingNeedsSchema = z.object({
  trays: z
    .array(z.object({ trayId: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE), count: z.coerce.number().int().min(0).max(1000) }))
    .max(200)
    .default([]),
  addOns: z
    .array(z.object({ ingredientId: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE), amount: amountField, unit: unitField }))
    .max(2000)
    .default([]),
});
export type ShoppingNeedsInput = z.input<typeof shoppingNeedsSchema>;
export type ShoppingNeedsValues = z.output<typeof shoppingNeedsSchema>;

export interface ShoppingCheckDto {
  checked: boolean;
  checkedBy: string | null;
  checkedAt: string | null;
}

export interface ShoppingItemDto {
  ingredientId: number;
  name: string;
  aisle: string;
  aisleLabel: string;
  /** Base unit the amounts are in: "g" or a piece name. */
  baseUnit: string;
  needed: number;
  inPantry: number;
  fromPantry: number;
  toBuy: number;
  /** Kitchen words for the amounts ("2 lb 3 oz", "36 large"). */
  neededText: string;
  toBuyText: string;
  /** Null when the ingredient has no purchase unit: buy `toBuyText` as is. */
  purchase: {
    label: string;
    packages: number;
    /** Package size in its own unit, e.g. 8 (oz) or 12 (large). */
    size: number;
    unit: string;
    /** Bought beyond the need, in the purchase unit and in words. */
    spare: number;
    spareText: string;
  } | null;
  costCents: number | null;
  check: ShoppingCheckDto;
}

export interface ShoppingAisleDto {
  aisle: string;
  label: string;
  items: ShoppingItemDto[];
}

/** A line of the plan that could not be counted (a unit the ingredient cannot be converted from). */
export interface ShoppingProblemDto {
  ingredientId: number;
  name: string;
  message: string;
}

export interface ShoppingListDto {
  weekId: number | null;
  /** The trip this list is for (its prep date), or null for the whole week. */
  prepDate: string | null;
  /** The week's prep dates when it has two (each has a trip list of its own), else empty. */
  tripDates: string[];
  aisles: ShoppingAisleDto[];
  itemCount: number;
  checkedCount: number;
  totalCostCents: number;
  /** False when some item has no price: the total is a lower bound. */
  costComplete: boolean;
  problems: ShoppingProblemDto[];
  /** When the list was marked bought (and the pantry updated), else null. */
  bought: { at: string; by: string | null } | null;
  /** The week's other lists marked bought (a trip's prep date, or null for the whole week): the pantry has their food. */
  alsoBought: { prepDate: string | null; at: string }[];
}

export interface MarkBoughtDto {
  /** False when the list had been marked bought before (nothing changed this time). */
  applied: boolean;
  at: string;
  pantry: { ingredientId: number; name: string; before: number; after: number; unit: string }[];
}

// ---------------------------------------------------------------------------------------------------------------
// Container labels
// ---------------------------------------------------------------------------------------------------------------

export const labelsQuerySchema = z.object({
  layout: z.enum(LABEL_SHEET_CODES as unknown as [LabelSheetCode, ...LabelSheetCode[]], { message: 'Choose a label sheet' }).default('letter-2x5'),
  prepDate: z
    .string()
    .refine(isIsoDate, { message: 'Give the prep date as YYYY-MM-DD' })
    .optional(),
});
export type LabelsQuery = z.input<typeof labelsQuerySchema>;

export interface LabelMacrosDto {
  /** Already rounded per 21 CFR 101.9(c), as printed. */
  calories: string;
  fat: string;
  carbohydrate: string;
  protein: string;
  /** Net carbs per the workspace's rule (no regulatory definition; shown apart from the panel values). */
  netCarbs: string;
}

export interface ContainerLabelDto {
  /** A client's plate from the board, or a spare portion of a tray baked that day. */
  kind: 'plate' | 'spare';
  /** "Client name" or the tray name for a container that is not assigned to a client. */
  title: string;
  /** The client whose plate it is (null for a spare portion). */
  clientId: number | null;
  /** The plate's name, or "Spare portion". */
  subtitle: string;
  /** The day and meal slot the plate is planned for (null for a spare portion); pages write the day their way. */
  planned: { date: string; slot: string } | null;
  /** Portions in the container when the client's household multiplier is not 1 ("2", "1.5"); else null. */
  portions: string | null;
  madeOn: string;
  eatBy: string;
  /** Fridge portions that keep in the freezer: freeze by this day at the latest. */
  freezeBy: string | null;
  /** A plate frozen on prep day: best quality until this day in the freezer (it thaws the evening before its day). */
  frozenBestBy: string | null;
  reheat: string | null;
  macros: LabelMacrosDto | null;
  allergens: AllergenCode[];
  allergenText: string;
  /**
   * The plate's allergens on its client's list as it stands (allowed by the coach with a reason, or still to be
   * solved on the board): the label marks them for whoever packs and whoever eats it. Empty for a spare portion.
   */
  onClientList: AllergenCode[];
  /** Address the QR code points at, and the QR code as a data URL (SVG). */
  url: string;
  qr: string;
  /** Trays of this plate that the prep day is short of (screen only: the container may not be fillable). */
  shortTrays: string[];
}

/** A tray the prep day has fewer portions of than its plates need. */
export interface ShortTrayDto {
  trayId: number;
  trayName: string;
  /** Whole portions short on this prep day. */
  portions: number;
  /** Trays of it the cooling record has thrown away on this prep day, and the trays set for it. */
  lostTrays: number;
  trayCount: number;
  /** Plate labels of this prep day that use it. */
  plateLabels: number;
}

export interface LabelSheetDto {
  layout: LabelSheetCode;
  prepDate: string | null;
  prepDates: string[];
  labels: ContainerLabelDto[];
  /** Trays short on this prep day (thrown away, or fewer trays set than the plates need); empty when all are covered. */
  short: ShortTrayDto[];
}
