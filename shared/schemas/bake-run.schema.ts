/**
 * Request body of POST /api/calc/bake-run. Field paths of every issue point at the offending value
 * (e.g. `trays.3.tempF` for a tray hotter than every oven's maximum), so the API can answer 400 with them.
 * Tray temperatures may be given in °F (`tempF`) or °C (`tempC`, converted with °F = °C × 9/5 + 32, NIST SP 811).
 */
import { z } from 'zod';

import type { BakeRunInput as DomainBakeRunInput } from '../domain/bake-run-types';
import { findBakeRunCrossIssues } from '../domain/bake-run-model';
import { isLocalDateTime } from '../domain/bake-run-time';
import { celsiusToFahrenheit } from '../domain/temperature';

const minutes = (what: string) =>
  z.number({ message: `${what} must be a number.` }).positive({ message: 'Minutes must be more than 0.' }).max(1440);

export const bakeOvenSchema = z.object({
  name: z.string().trim().min(1, { message: 'Name the oven.' }).max(60),
  racks: z.number().int({ message: 'Racks must be a whole number.' }).min(1, { message: 'At least one rack.' }).max(12),
  traysPerRack: z.number().int().min(1, { message: 'At least one tray per rack.' }).max(6),
  convection: z.boolean().default(false),
  heatFPerMin: z.number().positive({ message: 'The heating rate must be more than 0.' }).max(200),
  coolFPerMin: z.number().positive({ message: 'The cooling rate must be more than 0.' }).max(200),
  maxF: z.number().positive().max(1000),
  startF: z.number().min(0).max(1000).optional(),
});

export const bakeTraySchema = z
  .object({
    id: z.string().trim().min(1, { message: 'Give the tray an id.' }).max(80),
    name: z.string().trim().min(1, { message: 'Name the tray.' }).max(120),
    tempF: z.number().min(0).max(1000).optional(),
    tempC: z.number().min(-20).max(540).optional(),
    minMinutes: minutes('Minimum minutes'),
    maxMinutes: minutes('Maximum minutes'),
    handsOnMinutes: z
      .number()
      .int({ message: 'Hands-on minutes must be a whole number.' })
      .min(0, { message: 'Hands-on minutes cannot be negative.' })
      .max(600),
    toleranceF: z.number().min(0).max(100).optional(),
    rackPreference: z.enum(['upper', 'middle', 'lower', 'any']).optional(),
    minInternalF: z.number().positive().max(400).optional(),
  })
  .superRefine((tray, ctx) => {
    if ((tray.tempF === undefined) === (tray.tempC === undefined))
      ctx.addIssue({ code: 'custom', path: ['tempF'], message: 'Give the temperature in tempF or in tempC (one of them).' });
    if (tray.maxMinutes < tray.minMinutes)
      ctx.addIssue({ code: 'custom', path: ['maxMinutes'], message: 'The maximum bake time is below the minimum.' });
  })
  .transform(({ tempF, tempC, ...rest }) => ({
    ...rest,
    tempF: tempF ?? celsiusToFahrenheit(tempC!).toNumber(),
    ...(tempC === undefined ? {} : { tempC }),
  }));

export const bakeRunRulesSchema = z.object({
  crowdingPerExtraTray: z.number().min(0).max(1).optional(),
  convectionMode: z.enum(['temperature', 'time']).optional(),
  convectionDeltaF: z.number().min(0).max(100).optional(),
  convectionTimeFactor: z.number().gt(0).max(1).optional(),
  defaultToleranceF: z.number().min(0).max(100).optional(),
});

export const bakeRunInputSchema = z
  .object({
    start: z.string().refine(isLocalDateTime, { message: 'Start must be a local date-time "YYYY-MM-DDTHH:mm".' }),
    cooks: z.number().int({ message: 'Cooks must be a whole number.' }).min(1, { message: 'At least one cook.' }).max(50),
    ambientF: z.number().min(0).max(130).default(70),
    ovens: z.array(bakeOvenSchema).min(1, { message: 'At least one oven.' }).max(20),
    trays: z.array(bakeTraySchema).min(1, { message: 'At least one tray.' }).max(200),
    rules: bakeRunRulesSchema.optional(),
  })
  .superRefine((input, ctx) => {
    // Cross-field rules shared with the scheduler: unique names and ids, each tray fits some oven.
    for (const issue of findBakeRunCrossIssues(input)) {
      const [, index, field] = issue.path;
      const path =
        issue.path[0] === 'trays' && field === 'tempF' && input.trays[index as number]?.tempC !== undefined
          ? ['trays', index, 'tempC']
          : issue.path;
      ctx.addIssue({ code: 'custom', path, message: issue.message });
    }
  });

export type BakeRunInput = z.output<typeof bakeRunInputSchema>;
export type BakeRunRequestBody = z.input<typeof bakeRunInputSchema>;

/** Compile-time check: what the schema returns is what the scheduler takes. */
export const asBakeRunInput = (parsed: BakeRunInput): DomainBakeRunInput => parsed;
