/**
 * Bake rules, ovens and the saved bake-run settings of a prep week (issue 6): request schemas and DTOs.
 * The bake-run request itself (POST /api/calc/bake-run after rules are resolved) is `bakeRunInputSchema` in
 * bake-run.schema.ts. Temperatures are stored in °F; inputs take °F (`tempF`) or °C (`tempC`), converted with
 * °F = °C × 9/5 + 32 (NIST SP 811).
 */
import { z } from 'zod';

import type { BakeRunResult } from '../domain/bake-run-types';
import { isLocalDateTime } from '../domain/bake-run-time';
import { celsiusToFahrenheit } from '../domain/temperature';
import { PG_INT_MAX, TOO_LARGE, editVersion } from './ids';

const version = editVersion;
const wholeMinutes = (what: string) =>
  z
    .number({ message: `${what} must be a number.` })
    .int({ message: `${what} must be whole minutes.` })
    .positive({ message: 'Minutes must be more than 0.' })
    .max(1440);

export const RACK_PREFERENCES = ['upper', 'middle', 'lower', 'any'] as const;

/** Both scales accepted: exactly one of tempF / tempC. Returns °F. */
function oneTemperature<T extends { tempF?: number; tempC?: number }>(v: T, ctx: z.RefinementCtx, required: boolean) {
  const hasF = v.tempF !== undefined;
  const hasC = v.tempC !== undefined;
  if (hasF && hasC) ctx.addIssue({ code: 'custom', path: ['tempF'], message: 'Give the temperature in tempF or in tempC, not both.' });
  if (required && !hasF && !hasC) ctx.addIssue({ code: 'custom', path: ['tempF'], message: 'Give the set temperature (tempF or tempC).' });
}

const bakeRuleFields = {
  category: z
    .string()
    .trim()
    .min(1, { message: 'Give the category a code.' })
    .max(40)
    .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, { message: 'Use lower-case letters, digits and dashes (e.g. "egg-slab").' }),
  label: z.string().trim().min(1, { message: 'Name the category.' }).max(120),
  tempF: z.number().min(100, { message: 'Set temperature is below 100 °F.' }).max(700).optional(),
  tempC: z.number().min(38, { message: 'Set temperature is below 38 °C.' }).max(370).optional(),
  minMinutes: wholeMinutes('Minimum minutes'),
  maxMinutes: wholeMinutes('Maximum minutes'),
  handsOnMinutes: z.number().int({ message: 'Whole minutes.' }).min(0, { message: 'Cannot be negative.' }).max(600),
  toleranceF: z.number().min(0).max(100).default(10),
  donenessCue: z.string().trim().max(500).default(''),
  minInternalF: z.number().positive().max(400).nullable().default(null),
  restMinutes: z.number().int().min(0).max(120).default(0),
  minInternalSource: z.string().trim().max(200).nullable().default(null),
  rackPreference: z.enum(RACK_PREFERENCES).default('any'),
  /** Convection: set the oven this many °F lower (default 25). */
  convectionDeltaF: z.number().min(0).max(100).default(25),
  /** Crowding: +this % bake time for each tray beyond the first in the oven (default 10). */
  crowdingPct: z.number().min(0).max(100).default(10),
  bakeSource: z.string().trim().max(200).default('common practice, no source'),
  note: z.string().trim().max(500).default(''),
};

function checkRule(v: { minMinutes?: number; maxMinutes?: number; tempF?: number; tempC?: number }, ctx: z.RefinementCtx, required: boolean) {
  oneTemperature(v, ctx, required);
  if (v.minMinutes !== undefined && v.maxMinutes !== undefined && v.maxMinutes < v.minMinutes)
    ctx.addIssue({ code: 'custom', path: ['maxMinutes'], message: 'The maximum bake time is below the minimum.' });
}

const toF = (tempF?: number, tempC?: number): number | undefined =>
  tempF ?? (tempC === undefined ? undefined : celsiusToFahrenheit(tempC).toDecimalPlaces(4).toNumber());

export const bakeRuleCreateSchema = z
  .object(bakeRuleFields)
  .superRefine((v, ctx) => checkRule(v, ctx, true))
  .transform(({ tempC, tempF, ...rest }) => ({ ...rest, tempF: toF(tempF, tempC)! }));
export type BakeRuleCreateValues = z.output<typeof bakeRuleCreateSchema>;
export type BakeRuleCreateInput = z.input<typeof bakeRuleCreateSchema>;

/** PUT: the whole rule plus the version it started from (the category code stays as it is). */
export const bakeRuleUpdateSchema = z
  .object({ ...bakeRuleFields, category: bakeRuleFields.category.optional(), version })
  .superRefine((v, ctx) => checkRule(v, ctx, true))
  .transform(({ tempC, tempF, category: _c, ...rest }) => ({ ...rest, tempF: toF(tempF, tempC)! }));
export type BakeRuleUpdateValues = z.output<typeof bakeRuleUpdateSchema>;

export const ovenFields = {
  name: z.string().trim().min(1, { message: 'Name the oven.' }).max(60),
  racks: z.number().int({ message: 'Racks must be a whole number.' }).min(1, { message: 'At least one rack.' }).max(12),
  traysPerRack: z.number().int({ message: 'Whole trays.' }).min(1, { message: 'At least one tray per rack.' }).max(6),
  convection: z.boolean().default(false),
  heatFPerMin: z.number().positive({ message: 'The heating rate must be more than 0.' }).max(200).default(25),
  coolFPerMin: z.number().positive({ message: 'The cooling rate must be more than 0.' }).max(200).default(15),
  maxF: z.number().min(200, { message: 'The maximum is below 200 °F.' }).max(1000).optional(),
  maxC: z.number().min(94, { message: 'The maximum is below 94 °C.' }).max(540).optional(),
};

export const ovenCreateSchema = z
  .object(ovenFields)
  .superRefine((v, ctx) => {
    if (v.maxF !== undefined && v.maxC !== undefined)
      ctx.addIssue({ code: 'custom', path: ['maxF'], message: 'Give the maximum in maxF or in maxC, not both.' });
  })
  .transform(({ maxC, maxF, ...rest }) => ({ ...rest, maxF: toF(maxF, maxC) ?? 500 }));
export type OvenCreateValues = z.output<typeof ovenCreateSchema>;
export type OvenCreateInput = z.input<typeof ovenCreateSchema>;

export const ovenUpdateSchema = z
  .object({ ...ovenFields, version })
  .superRefine((v, ctx) => {
    if (v.maxF !== undefined && v.maxC !== undefined)
      ctx.addIssue({ code: 'custom', path: ['maxF'], message: 'Give the maximum in maxF or in maxC, not both.' });
  })
  .transform(({ maxC, maxF, ...rest }) => ({ ...rest, maxF: toF(maxF, maxC) ?? 500 }));
export type OvenUpdateValues = z.output<typeof ovenUpdateSchema>;

export const idParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });
export const weekIdParam = z.object({ weekId: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });
export const prepDateQuery = z.object({
  prepDate: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, { message: 'Use a date like 2026-12-06' })
    .optional(),
});

/** PUT /api/weeks/:weekId/bake-run/settings. `version` is required once settings exist (omit it the first time). */
export const bakeRunSettingsSchema = z.object({
  prepDate: prepDateQuery.shape.prepDate,
  start: z.string().refine(isLocalDateTime, { message: 'Start must be a local date-time "YYYY-MM-DDTHH:mm".' }),
  cooks: z.number().int({ message: 'Cooks must be a whole number.' }).min(1, { message: 'At least one cook.' }).max(50),
  /** Hands-on minutes per base tray id (one tray of it); missing → the tray's bake rule. */
  handsOnMinutes: z
    .record(z.string().regex(/^\d+$/, { message: 'Key by tray id.' }), z.number().int().min(0, { message: 'Cannot be negative.' }).max(600))
    .default({}),
  /** The ovens to use (workspace ids); empty → every oven of the workspace. */
  ovenIds: z.array(z.number().int().positive().max(PG_INT_MAX, TOO_LARGE)).max(20).default([]),
  version: version.optional(),
});
export type BakeRunSettingsValues = z.output<typeof bakeRunSettingsSchema>;

/**
 * PUT /api/weeks/:weekId/bake-run/start: the time the run really started on prep day (the kitchen started late or
 * early), for the coach or the assistant; only the start moves, the rest of the settings stay. `version` as above.
 */
export const bakeRunStartSchema = z.object({
  prepDate: prepDateQuery.shape.prepDate,
  start: bakeRunSettingsSchema.shape.start,
  version: version.optional(),
});
export type BakeRunStartValues = z.output<typeof bakeRunStartSchema>;

/** A tray of a week's run by its id there: base tray id and its number, e.g. "12-1". */
const runTrayId = z.string().regex(/^\d{1,9}-\d{1,3}$/, { message: 'Give the trays by their id in the run.' });

/**
 * PUT /api/weeks/:weekId/bake-run/kitchen: the kitchen as it is on prep day (an oven out of order, a cook missing),
 * for the coach or the assistant: the ovens that work and the cooks who came. The start, the hands-on minutes and the
 * bake rules stay. `version` as above.
 */
export const bakeRunKitchenSchema = z.object({
  prepDate: prepDateQuery.shape.prepDate,
  cooks: bakeRunSettingsSchema.shape.cooks,
  ovenIds: z
    .array(z.number().int().positive().max(PG_INT_MAX, TOO_LARGE))
    .min(1, { message: 'At least one oven has to work to bake.' })
    .max(20),
  /**
   * The trays already out of the oven (their ids in the run, e.g. "12-1"): they stay as planned and the rest is
   * planned from `from`. Empty: the whole day is planned from its start again. Absent: what was said before stays.
   */
  out: z.array(runTrayId).max(200).optional(),
  /**
   * A tray of `out` that came out at another time than planned: its id → when ("YYYY-MM-DDTHH:mm"); its cooling
   * deadlines count from then.
   */
  outAt: z
    .record(
      runTrayId,
      z.string().refine(isLocalDateTime, { message: 'Give the time it came out, "YYYY-MM-DDTHH:mm".' }),
    )
    .optional(),
  /** When the rest starts ("YYYY-MM-DDTHH:mm" on the prep day); needed with trays out. */
  from: z.string().refine(isLocalDateTime, { message: 'Give the time to plan the rest from, "YYYY-MM-DDTHH:mm".' }).optional(),
  version: version.optional(),
});
export type BakeRunKitchenValues = z.output<typeof bakeRunKitchenSchema>;
export type BakeRunKitchenInput = z.input<typeof bakeRunKitchenSchema>;
export type BakeRunStartInput = z.input<typeof bakeRunStartSchema>;
export type BakeRunSettingsInput = z.input<typeof bakeRunSettingsSchema>;

/**
 * POST /api/calc/bake-run body before rules are resolved: a tray may give `ruleId` (a workspace bake rule) instead
 * of its temperature and minutes; values it gives win over the rule's. Everything else is checked by
 * `bakeRunInputSchema` once the rules are filled in (so field paths stay `trays.N.tempF` etc.).
 */
export const calcBakeRunRequestSchema = z
  .object({
    trays: z
      .array(z.looseObject({ ruleId: z.number().int().positive({ message: 'Give a bake rule id.' }).max(PG_INT_MAX, TOO_LARGE).optional() }), {
        message: 'Give the trays to bake.',
      })
      .min(1, { message: 'At least one tray.' })
      .max(200),
    ovens: z.array(z.unknown(), { message: 'Give the ovens.' }).min(1, { message: 'At least one oven.' }).max(20),
  })
  .loose();
export type CalcBakeRunRequest = z.output<typeof calcBakeRunRequestSchema>;

export interface BakeRuleDto {
  id: number;
  category: string;
  label: string;
  tempF: number;
  tempC: number;
  minMinutes: number;
  maxMinutes: number;
  handsOnMinutes: number;
  toleranceF: number;
  donenessCue: string;
  minInternalF: number | null;
  restMinutes: number;
  minInternalSource: string | null;
  rackPreference: (typeof RACK_PREFERENCES)[number];
  convectionDeltaF: number;
  crowdingPct: number;
  bakeSource: string;
  note: string;
  version: number;
  updatedAt: string;
}

export interface OvenDto {
  id: number;
  name: string;
  racks: number;
  traysPerRack: number;
  convection: boolean;
  heatFPerMin: number;
  coolFPerMin: number;
  maxF: number;
  maxC: number;
  version: number;
  updatedAt: string;
}

export interface BakeRunSettingsDto {
  prepDate: string;
  start: string;
  cooks: number;
  handsOnMinutes: Record<string, number>;
  ovenIds: number[];
  /** Planned again part-way through the day: when the rest starts and the trays already out; null otherwise. */
  done: { from: string; out: string[] } | null;
  /** null until the coach saves settings (the defaults are shown). */
  version: number | null;
}

/** One base tray of the week's run: how many trays and what the run uses for it. */
export interface WeekBakeTrayDto {
  trayId: number;
  name: string;
  category: string;
  trayCount: number;
  tempF: number;
  minMinutes: number;
  maxMinutes: number;
  handsOnMinutes: number;
  donenessCue: string;
  minInternalF: number | null;
}

export interface WeekBakeRunDto {
  weekId: number;
  weekName: string;
  prepDate: string;
  prepDates: string[];
  settings: BakeRunSettingsDto;
  trays: WeekBakeTrayDto[];
  ovens: OvenDto[];
  /** null when there is nothing to plan (no trays or no ovens); `problems` says why. */
  run: BakeRunResult | null;
  problems: string[];
}
