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
