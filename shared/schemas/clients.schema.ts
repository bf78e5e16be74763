import { z } from 'zod';
import { optionalEmailAddress as optionalEmail } from './email';
import { typedNumber } from './typed-number';
import { ALLERGEN_CODES, type AllergenCode } from '../domain/allergens';
import type { ActivityLevel, Goal, MacroTargets, Sex, TargetNote } from '../domain/targets';
import { PG_INT_MAX, TOO_LARGE, editVersion } from './ids';

/** Client profiles: inputs and DTOs. Body measurements, targets and health notes are for the coach (and the client). */

export const SEXES = ['female', 'male'] as const satisfies readonly Sex[];
export const ACTIVITY_LEVELS = ['sedentary', 'light', 'moderate', 'active', 'very-active'] as const satisfies readonly ActivityLevel[];
export const GOALS = ['lose', 'maintain', 'gain'] as const satisfies readonly Goal[];
export const TARGET_MODES = ['computed', 'manual'] as const;
export type TargetMode = (typeof TARGET_MODES)[number];

export const ACTIVITY_LABELS: Record<ActivityLevel, string> = {
  sedentary: 'Sedentary (little or no exercise)',
  light: 'Lightly active (1–3 days a week)',
  moderate: 'Moderately active (3–5 days a week)',
  active: 'Active (6–7 days a week)',
  'very-active': 'Very active (hard exercise or physical job)',
};

export const GOAL_LABELS: Record<Goal, string> = { lose: 'Lose weight', maintain: 'Maintain', gain: 'Gain' };

/** A decimal typed as text or number, kept as a string (exact decimals end to end). */
const decimalText = (label: string, min: number, max: number) =>
  typedNumber(
    label,
    z
      .union([z.number(), z.string()])
      .transform((v) => String(v))
      .refine((v) => /^\d+(\.\d+)?$/.test(v), { message: `${label}: enter a number` })
      .refine((v) => Number(v) >= min && Number(v) <= max, { message: `${label} must be between ${min} and ${max}` }),
  );


/** What a new profile starts with where the coach gives nothing: the form's first values and a blank CSV cell. */
export const CLIENT_DEFAULTS = { householdMultiplier: '1', netCarbCapG: '20', proteinGPerKg: '1.5' } as const;

const allergenSchema = z.enum(ALLERGEN_CODES as unknown as [AllergenCode, ...AllergenCode[]]);
const term = z.string().trim().min(1).max(80);
const slotName = z.string().trim().min(1).max(40);

export const manualTargetsSchema = z.object({
  targetKcal: z.number().int().min(500, { message: 'At least 500 kcal' }).max(8000),
  netCarbCapG: z.number().min(0).max(500),
  proteinG: z.number().min(0).max(500),
  fatG: z.number().min(0).max(800),
});
export type ManualTargetsInput = z.infer<typeof manualTargetsSchema>;

const clientFields = {
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(120),
  email: optionalEmail,
  householdMultiplier: decimalText('Portions per plate', 0.25, 20),
  sex: z.enum(SEXES),
  ageYears: z.number().int().min(14, { message: 'Age must be 14 or more' }).max(110),
  heightCm: decimalText('Height (cm)', 100, 250),
  weightKg: decimalText('Weight (kg)', 30, 350),
  activity: z.enum(ACTIVITY_LEVELS),
  goal: z.enum(GOALS),
  /** Fraction of total energy, e.g. -0.15; null = the goal's default. */
  goalAdjustment: z.number().min(-0.5).max(0.5).nullable().optional(),
  netCarbCapG: decimalText('Net-carb cap (g)', 0, 300),
  proteinGPerKg: decimalText('Protein (g per kg)', 0.5, 3),
  targetMode: z.enum(TARGET_MODES),
  manualTargets: manualTargetsSchema.nullable().optional(),
  /** Share of the day per meal slot (0.3 = 30 %); missing slots use the defaults. */
  slotShares: z.record(slotName, z.number().min(0).max(1)).optional(),
  allergens: z.array(allergenSchema).max(9).optional(),
  dislikes: z.array(term).max(50).optional(),
  healthNotes: z.string().max(4000).optional(),
};

function manualNeedsTargets(v: { targetMode?: TargetMode; manualTargets?: ManualTargetsInput | null }) {
  return v.targetMode !== 'manual' || !!v.manualTargets;
}
function sharesWithinDay(v: { slotShares?: Record<string, number> }) {
  return !v.slotShares || Object.values(v.slotShares).reduce((s, x) => s + x, 0) <= 1.000001;
}

export const createClientSchema = z
  .object(clientFields)
  .refine(manualNeedsTargets, { path: ['manualTargets'], message: 'Type the daily targets, or let Trayline compute them' })
  .refine(sharesWithinDay, { path: ['slotShares'], message: 'The meal shares add up to more than the whole day' });
export type CreateClientInput = z.input<typeof createClientSchema>;
export type CreateClientData = z.output<typeof createClientSchema>;

export const updateClientSchema = z
  .object({
    ...clientFields,
    /** true archives the client (they leave the list and new weeks), false restores them. */
    archived: z.boolean(),
  })
  .partial()
  .extend({ version: editVersion })
  .refine(sharesWithinDay, { path: ['slotShares'], message: 'The meal shares add up to more than the whole day' });
export type UpdateClientInput = z.input<typeof updateClientSchema>;
export type UpdateClientData = z.output<typeof updateClientSchema>;

export const clientIdParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });

/** What an assistant may see: a name and how many portions a plate is. */
export interface ClientSummaryDto {
  id: number;
  name: string;
  householdMultiplier: string;
  /** When the coach archived the client (ISO time), else null. */
  archivedAt: string | null;
}

export interface ClientTargetsDto extends MacroTargets {
  mode: TargetMode;
  /** Computed only (null when typed by hand). */
  reeKcal: number | null;
  tdeeKcal: number | null;
  notes: TargetNote[];
  /** Per meal slot of the workspace. */
  slots: Record<string, MacroTargets & { share: number }>;
}

/** A client as the client reads it (no health notes). */
export interface ClientSelfDto extends ClientSummaryDto {
  email: string | null;
  sex: Sex;
  ageYears: number;
  heightCm: string;
  weightKg: string;
  activity: ActivityLevel;
  goal: Goal;
  goalAdjustment: number | null;
  netCarbCapG: string;
  proteinGPerKg: string;
  targetMode: TargetMode;
  manualTargets: ManualTargetsInput | null;
  slotShares: Record<string, number>;
  allergens: AllergenCode[];
  dislikes: string[];
  targets: ClientTargetsDto;
  version: number;
}

/** The coach's full view. */
export interface ClientDto extends ClientSelfDto {
  healthNotes: string;
  /** The signed-in client account linked to this profile, if any. */
  account: { email: string; name: string } | null;
  /** The open invitation to this profile while no account has joined (the newest one still valid), else null. */
  invitation: { email: string; expiresAt: string } | null;
  createdAt: string;
  updatedAt: string;
}

export type ClientListItemDto = ClientDto | ClientSummaryDto;

/**
 * The CSV columns of a client import. Height and weight take their unit in the cell ("168 cm", "5 ft 6 in",
 * "163 lb"), a number alone being read in the importing coach's units; protein per kg or per lb of body weight; the
 * four target columns, given together, type the targets by hand (else Trayline computes them).
 */
export const CLIENT_IMPORT_COLUMNS = [
  'name', 'email', 'portions_per_plate', 'sex', 'age', 'height', 'weight', 'activity', 'goal', 'net_carb_cap_g',
  'protein_g_per_kg', 'protein_g_per_lb', 'target_kcal', 'target_net_carbs_g', 'target_protein_g', 'target_fat_g',
  'allergens', 'dislikes', 'health_notes',
] as const;
export type ClientImportColumn = (typeof CLIENT_IMPORT_COLUMNS)[number];
export const REQUIRED_CLIENT_IMPORT_COLUMNS: readonly ClientImportColumn[] = ['name', 'sex', 'age', 'height', 'weight', 'activity', 'goal'];
/** The typed-by-hand targets: all four or none. */
export const CLIENT_TARGET_COLUMNS = ['target_kcal', 'target_net_carbs_g', 'target_protein_g', 'target_fat_g'] as const satisfies readonly ClientImportColumn[];

/** Form fields beside the file: the units a height or weight written as a number alone is read in. */
export const clientImportOptionsSchema = z.object({
  units: z.enum(['us', 'metric'], { message: 'Choose "us" (inches and pounds) or "metric" (centimetres and kilograms)' }).optional(),
});

export interface ClientImportResultDto {
  /** New client profiles, their ids and names in the file's order. */
  created: number;
  ids: number[];
  names: string[];
  /** How many of them have an e-mail (no invitation is sent by an import). */
  withEmail: number;
}

/**
 * The template a coach downloads: the columns (protein per lb for US measures, per kg for metric) and two example
 * rows in the coach's units, one with computed targets and one with typed ones. The import reads it as it is.
 */
export function clientImportTemplate(units: 'us' | 'metric'): [columns: ClientImportColumn[], rows: string[][]] {
  const us = units === 'us';
  const columns = CLIENT_IMPORT_COLUMNS.filter((c) => c !== (us ? 'protein_g_per_kg' : 'protein_g_per_lb'));
  const rows: Partial<Record<ClientImportColumn, string>>[] = [
    {
      name: 'Example client (delete this row)', email: 'someone@example.com', portions_per_plate: '1', sex: 'female', age: '42',
      height: us ? '5 ft 6 in' : '168 cm', weight: us ? '163 lb' : '74 kg', activity: 'light', goal: 'lose', net_carb_cap_g: '20',
      protein_g_per_kg: '1.5', protein_g_per_lb: '0.7', allergens: 'tree nuts; milk', dislikes: 'olives; cilantro',
    },
    {
      name: 'Example with typed targets (delete this row)', portions_per_plate: '2', sex: 'male', age: '55',
      height: us ? '70 in' : '178 cm', weight: us ? '190 lb' : '86 kg', activity: 'moderate', goal: 'maintain',
      target_kcal: '2200', target_net_carbs_g: '25', target_protein_g: '130', target_fat_g: '170',
    },
  ];
  return [columns, rows.map((r) => columns.map((c) => r[c] ?? ''))];
}
