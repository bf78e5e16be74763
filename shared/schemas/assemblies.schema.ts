import { z } from 'zod';
import { typedNumber } from './typed-number';
import type { AllergenCode } from '../domain/allergens';
import type { NutrientNumbers } from '../domain/nutrition';
import { trayLineSchema } from './trays.schema';
import { PG_INT_MAX, TOO_LARGE, editVersion } from './ids';

/** Plates (assemblies): portions of base trays plus add-ons from the ingredient library. */

export const assemblyTrayItemSchema = z.object({
  trayId: z.coerce.number({ message: 'Choose a base tray' }).int().positive({ message: 'Choose a base tray' }).max(PG_INT_MAX, TOO_LARGE),
  /** Portions of the tray on one plate (1, 2, 0.5…). */
  portions: typedNumber(
    'Portions',
    z.coerce
      .number({ message: 'Enter the portions as a number' })
      .refine((v) => v > 0, { message: 'Portions must be above 0' })
      .refine((v) => v <= 12, { message: 'At most 12 portions' })
      .refine((v) => Number.isInteger(v * 4), { message: 'Use quarters of a portion at most (0.25, 0.5…)' }),
  ),
});
export type AssemblyTrayItemInput = z.input<typeof assemblyTrayItemSchema>;

/** An add-on: an ingredient with an amount as typed ("1", "2 Tbsp", "1 handful" is typed as grams or cups). */
export const assemblyAddOnSchema = trayLineSchema;
export type AssemblyAddOnInput = z.input<typeof assemblyAddOnSchema>;

const steps = z.array(z.string().trim().min(1).max(400)).max(20);

export const assemblyValuesSchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(120),
  description: z.string().trim().max(1000).default(''),
  trays: z.array(assemblyTrayItemSchema).max(8).default([]),
  addOns: z.array(assemblyAddOnSchema).max(20).default([]),
  assemblySteps: steps.default([]),
  reheatSteps: steps.default([]),
});
export const createAssemblySchema = assemblyValuesSchema.refine((v) => v.trays.length + v.addOns.length > 0, {
  path: ['trays'],
  message: 'Add at least one base tray portion or one add-on',
});
export type AssemblyInput = z.input<typeof createAssemblySchema>;
export type AssemblyValues = z.output<typeof createAssemblySchema>;

export const updateAssemblySchema = assemblyValuesSchema
  .extend({ version: editVersion })
  .refine((v) => v.trays.length + v.addOns.length > 0, {
    path: ['trays'],
    message: 'Add at least one base tray portion or one add-on',
  });
export type UpdateAssemblyValues = z.output<typeof updateAssemblySchema>;

/** Archive a plate or bring it back (PUT /api/assemblies/:id/archived). */
export const archiveAssemblySchema = z.object({
  archived: z.boolean({ message: 'Say whether the plate is archived (true or false)' }),
  version: editVersion,
});
export type ArchiveAssemblyInput = z.input<typeof archiveAssemblySchema>;
export type ArchiveAssemblyValues = z.output<typeof archiveAssemblySchema>;

/** DELETE /api/assemblies/:id of a plate some board plans: archived instead (204 with no body when it was deleted). */
export interface DeleteAssemblyDto {
  archived: true;
  /** Where it is planned, e.g. "13 meals on the board of Demo week". */
  plannedOn: string;
  plate: AssemblyDto;
}

export const assemblyIdParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });

/** The plate editor's live numbers: the parts of an unsaved plate (nothing is written). */
export const platePreviewSchema = assemblyValuesSchema.pick({ trays: true, addOns: true });
export type PlatePreviewInput = z.input<typeof platePreviewSchema>;
export type PlatePreviewValues = z.output<typeof platePreviewSchema>;

export interface AssemblyTrayItemDto {
  trayId: number;
  trayName: string;
  portions: number;
  fridgeDays: number;
  freezerWeeks: number;
  reheatSteps: string[];
}

export interface AssemblyAddOnDto {
  ingredientId: number;
  ingredientName: string;
  amountText: string;
  unit: string;
  note: string;
  grams: number | null;
}

/** Macros of one plate (what one person eats). */
export interface PlateMacrosDto {
  kcal: number;
  fatG: number;
  proteinG: number;
  carbsG: number;
  fiberG: number;
  netCarbsG: number;
}

/** What an unsaved plate adds up to (POST /api/assemblies/preview). */
export interface PlatePreviewDto {
  macros: PlateMacrosDto;
  allergens: AllergenCode[];
  /** False when a part lacks a fact to be weighed (its nutrients are left out). */
  complete: boolean;
  /** Each add-on's weight in grams, in the order sent (null when it cannot be weighed). */
  addOnGrams: (number | null)[];
}

export interface AssemblyDto {
  id: number;
  name: string;
  description: string;
  trays: AssemblyTrayItemDto[];
  addOns: AssemblyAddOnDto[];
  assemblySteps: string[];
  reheatSteps: string[];
  nutrition: NutrientNumbers | null;
  macros: PlateMacrosDto;
  /** False when a line lacks a fact to be weighed (its nutrients are left out). */
  complete: boolean;
  allergens: AllergenCode[];
  /** Out of the plates list and the board's pickers; boards and plans that name it keep it. */
  archived: boolean;
  version: number;
  updatedAt: string;
}
