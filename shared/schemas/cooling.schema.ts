/**
 * The cooling record of a prep day's trays (shared/domain/cooling.ts): request schemas and DTOs. Food temperatures
 * are stored in °F; a reading takes °F (`tempF`) or °C (`tempC`), converted with °F = °C × 9/5 + 32 (NIST SP 811).
 */
import { z } from 'zod';
import { isLocalDateTime, parseLocalMinutes } from '../domain/bake-run-time';
import { celsiusToFahrenheit } from '../domain/temperature';
import { PG_INT_MAX, TOO_LARGE } from './ids';
import { prepDateQuery, weekIdParam } from './bake-setup.schema';
import { daysBetween, isIsoDate, type IsoDate } from '../domain/iso-date';
import type { CoolingState } from '../domain/cooling';

const localTime = (what: string) => z.string().refine(isLocalDateTime, { message: `${what} must be a local date-time "YYYY-MM-DDTHH:mm".` });

/** A tray of a week's run by its id there: base tray id and its number, e.g. "12-1". */
export const coolingParams = weekIdParam.extend({
  runTrayId: z.string().regex(/^[1-9]\d{0,8}-[1-9]\d{0,2}$/, { message: 'Give the tray by its id in the run, e.g. "12-1".' }),
});

/** A reading as typed: when, and the food temperature in °F or in °C. */
const readingInput = z
  .object({
    at: localTime('The time of a reading'),
    tempF: z.number({ message: 'A temperature is a number.' }).min(-40, { message: 'Below −40 °F: check the reading.' }).max(250, { message: 'Above 250 °F: check the reading.' }).optional(),
    tempC: z.number({ message: 'A temperature is a number.' }).min(-40, { message: 'Below −40 °C: check the reading.' }).max(121, { message: 'Above 121 °C: check the reading.' }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.tempF !== undefined && v.tempC !== undefined)
      ctx.addIssue({ code: 'custom', path: ['tempF'], message: 'Give the temperature in tempF or in tempC, not both.' });
    if (v.tempF === undefined && v.tempC === undefined) ctx.addIssue({ code: 'custom', path: ['tempF'], message: 'Give the food temperature.' });
  })
  .transform((v) => ({
    at: v.at,
    // Kept to a hundredth of a degree: a reading in °C converts exactly (× 1.8 + 32), thermometers show tenths.
    tempF: v.tempF ?? celsiusToFahrenheit(v.tempC as number).toDecimalPlaces(2).toNumber(),
  }));

const minutes = (at: string) => parseLocalMinutes(at) ?? 0;

/**
 * PUT /api/weeks/:weekId/bake-run/cooling/:runTrayId: what was written down for one tray (coach or assistant).
 * `version` is required once the tray has a record (omit it the first time); a stale one is a 409.
 */
export const coolingRecordSchema = z
  .object({
    prepDate: prepDateQuery.shape.prepDate,
    version: z.number().int().positive().max(PG_INT_MAX, TOO_LARGE).optional(),
    outAt: localTime('The time out'),
    restartedAt: localTime('The time cooling started again').nullable().default(null),
    readings: z.array(readingInput).max(48, { message: 'At most 48 readings for one tray.' }).default([]),
    discarded: z.boolean().default(false),
    note: z.string().trim().max(500, { message: 'Keep the note under 500 characters.' }).default(''),
  })
  // The words name no time: the record shows the time out beside the field, in the workspace's clock style.
  .superRefine((v, ctx) => {
    const out = minutes(v.outAt);
    // A record covers the 6 hours of cooling and a while after: readings beyond a day are another day's.
    const within = (at: string) => minutes(at) >= out && minutes(at) <= out + 24 * 60;
    if (v.restartedAt !== null && !within(v.restartedAt))
      ctx.addIssue({ code: 'custom', path: ['restartedAt'], message: 'Cooling starts again after the tray came out, and within a day of it.' });
    v.readings.forEach((r, i) => {
      if (!within(r.at))
        ctx.addIssue({ code: 'custom', path: ['readings', i, 'at'], message: 'A reading is taken after the tray came out, and within a day of it.' });
    });
  });
export type CoolingRecordValues = z.output<typeof coolingRecordSchema>;
export type CoolingRecordInput = z.input<typeof coolingRecordSchema>;

/** DELETE …/cooling/:runTrayId?prepDate=&version=: a record written by mistake (the tray is not out yet). */
export const coolingDeleteQuery = prepDateQuery.extend({
  version: z.coerce
    .number({ message: 'Give the version of the record you read (e.g. ?version=3).' })
    .int({ message: 'The version is a whole number.' })
    .positive({ message: 'The version is a whole number from 1.' })
    .max(PG_INT_MAX, TOO_LARGE),
});

export interface CoolingRecordDto {
  runTrayId: string;
  /** The tray's name in the run when it was written down, e.g. "Chive egg slab (2/3)". */
  trayName: string;
  outAt: string;
  restartedAt: string | null;
  readings: { at: string; tempF: number }[];
  discarded: boolean;
  note: string;
  /** Who wrote it down last (their name then). */
  recordedBy: string;
  updatedAt: string;
  version: number;
}

/** GET /api/weeks/:weekId/bake-run/cooling?prepDate=: the prep day's records, by time out. */
export interface CoolingListDto {
  weekId: number;
  prepDate: string;
  records: CoolingRecordDto[];
  /** The kitchen's time zone, or null: with it the server e-mails a missed deadline (the cooling watch). */
  timeZone: string | null;
}

/** The longest stretch the cooling log reads at once (a year and a day: a leap year's). */
export const COOLING_LOG_MAX_DAYS = 366;

const logDate = (what: string) =>
  z
    .string({ message: `Give the ${what} date, like 2026-12-06.` })
    .refine(isIsoDate, { message: `Give the ${what} date as a date like 2026-12-06.` })
    .transform((v) => v as IsoDate);

/** GET /api/cooling-log?from=&to= (and .csv): the prep days from `from` to `to`, both included. */
export const coolingLogQuery = z
  .object({ from: logDate('first prep'), to: logDate('last prep') })
  .superRefine((v, ctx) => {
    if (!isIsoDate(v.from) || !isIsoDate(v.to)) return;
    const span = daysBetween(v.from, v.to);
    if (span < 0) ctx.addIssue({ code: 'custom', path: ['to'], message: 'The last day comes on or after the first.' });
    else if (span + 1 > COOLING_LOG_MAX_DAYS)
      ctx.addIssue({ code: 'custom', path: ['to'], message: `At most ${COOLING_LOG_MAX_DAYS} days at once: choose a shorter stretch.` });
  });
export type CoolingLogQuery = z.output<typeof coolingLogQuery>;

/** One tray's cooling in the log: what was written down (as the prep day's list gives it) and where it ended (or stands). */
export interface CoolingLogRow extends CoolingRecordDto {
  id: number;
  prepDate: string;
  /** The week it was baked for, or null once that week was deleted (the record stays in the log). */
  weekId: number | null;
  weekName: string | null;
  /** Judged at the kitchen's time now (with its zone), else on its readings until its deadlines have surely passed. */
  state: CoolingState;
  by70: string;
  by41: string;
  reached70At: string | null;
  reached41At: string | null;
  /** What the log says of it: "Cooled in time", "Missed 70 °F (21 °C) by 12:10", "Thrown away", "Cooling". */
  result: string;
}

/** GET /api/cooling-log: a stretch of prep days' cooling records, by prep date and time out. */
export interface CoolingLogDto {
  from: string;
  to: string;
  timeZone: string | null;
  rows: CoolingLogRow[];
}
