import { z } from 'zod';
import { ALLERGEN_CODES, type AllergenCode } from '../domain/allergens';
import type { Caution } from '../domain/eat-by';
import type { TrayTally } from '../domain/inventory';
import { isIsoDate, type DateOrder, type IsoDate } from '../domain/iso-date';
import type { MacroTargets } from '../domain/targets';
import type { DayTotals, WordedWarning } from '../domain/week-check';
import type { AssemblyDto, PlateMacrosDto } from './assemblies.schema';
import { PG_INT_MAX, TOO_LARGE, editVersion } from './ids';

/** Prep weeks, the week board, publishing. */

export const isoDate = z.string().refine(isIsoDate, { message: 'Use a date like 2026-01-04' });

/** The person's "today" (their device's date), for the routes that pick a week by it. */
export const todayQuery = z.object({ today: isoDate.optional() });
const version = editVersion;
const allergen = z.enum(ALLERGEN_CODES as unknown as [AllergenCode, ...AllergenCode[]]);


/** The longest name a prep week may have (characters). */
export const WEEK_NAME_MAX = 120;

export const createWeekSchema = z
  .object({
    name: z.string().trim().max(WEEK_NAME_MAX).default(''),
    /** The first day of the board. */
    startDate: isoDate,
    prepDate: isoDate,
    secondPrepDate: isoDate.nullable().optional(),
  })
  .refine((w) => !w.secondPrepDate || w.secondPrepDate > w.prepDate, {
    path: ['secondPrepDate'],
    message: 'The second prep date comes after the first',
  });
export type CreateWeekInput = z.input<typeof createWeekSchema>;

export const updateWeekSchema = z.object({
  version,
  name: z.string().trim().max(WEEK_NAME_MAX).optional(),
  prepDate: isoDate.optional(),
  secondPrepDate: isoDate.nullable().optional(),
});
export type UpdateWeekInput = z.input<typeof updateWeekSchema>;

export const allergenOverrideSchema = z.object({
  allergen,
  reason: z.string().trim().min(3, { message: 'Give a reason (at least 3 characters)' }).max(300),
});

export const cellInputSchema = z.object({
  clientId: z.number().int().positive().max(PG_INT_MAX, TOO_LARGE),
  date: isoDate,
  slot: z.string().trim().min(1).max(40),
  /** null empties the cell. */
  assemblyId: z.number().int().positive().max(PG_INT_MAX, TOO_LARGE).nullable(),
  /** Take the portions from this prep date (null = the default: the latest on or before the day). */
  prepDate: isoDate.nullable().optional(),
  storage: z.enum(['fridge', 'frozen']).default('fridge'),
  allergenOverrides: z.array(allergenOverrideSchema).max(9).default([]),
});
export type CellInput = z.input<typeof cellInputSchema>;

export const putCellsSchema = z.object({ version, cells: z.array(cellInputSchema).min(1).max(2000) });
export type PutCellsInput = z.input<typeof putCellsSchema>;

export const putTraysSchema = z.object({
  version,
  trays: z
    .array(z.object({ trayId: z.number().int().positive().max(PG_INT_MAX, TOO_LARGE), prepDate: isoDate, trayCount: z.number().int().min(0).max(200) }))
    .max(200),
});
export type PutTraysInput = z.input<typeof putTraysSchema>;

export const versionOnlySchema = z.object({ version });

export const copyDaySchema = z.object({
  version,
  fromDate: isoDate,
  toDate: isoDate,
  /** Only this client's row; all clients when missing. */
  clientId: z.number().int().positive().max(PG_INT_MAX, TOO_LARGE).optional(),
});
export type CopyDayInput = z.input<typeof copyDaySchema>;

export const copyWeekSchema = z.object({
  name: z.string().trim().max(WEEK_NAME_MAX).default(''),
  startDate: isoDate,
  prepDate: isoDate,
  secondPrepDate: isoDate.nullable().optional(),
});
export type CopyWeekInput = z.input<typeof copyWeekSchema>;

export const weekIdParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });

export type WeekStatus = 'draft' | 'published';

export interface WeekSummaryDto {
  id: number;
  name: string;
  startDate: IsoDate;
  endDate: IsoDate;
  prepDate: IsoDate;
  secondPrepDate: IsoDate | null;
  /** Published version number, or null when never published. */
  publishedVersion: number | null;
  publishedAt: string | null;
  /** True when the board changed after the last publication. */
  changedSincePublished: boolean;
  cellCount: number;
  version: number;
}

export interface BoardClientDto {
  id: number;
  name: string;
  householdMultiplier: string;
  allergens: AllergenCode[];
  dislikes: string[];
  /** Targets for the board's meal slots (their share of the day). */
  targets: MacroTargets;
  /** Archived since: on this board only because they have plates on it. */
  archived: boolean;
}

export interface BoardCellDto {
  clientId: number;
  date: IsoDate;
  slot: string;
  assemblyId: number;
  prepDate: IsoDate | null;
  storage: 'fridge' | 'frozen';
  allergenOverrides: { allergen: AllergenCode; reason: string }[];
}

export interface BoardTrayDto {
  trayId: number;
  name: string;
  prepDate: IsoDate;
  trayCount: number;
  portionsPerTray: number | null;
  fridgeDays: number;
  freezerWeeks: number;
}

export interface BoardDayDto {
  clientId: number;
  date: IsoDate;
  totals: DayTotals;
  warnings: WordedWarning[];
}

/** The week board as pages read it. The API sends it as a `BoardAnswer` (board-answer.ts); `expandBoard` gives this. */
export interface BoardDto {
  week: WeekSummaryDto;
  /** How the workspace writes dates in words (the warnings' sentences follow it). */
  dateOrder: DateOrder;
  days: IsoDate[];
  slots: string[];
  prepDates: IsoDate[];
  clients: BoardClientDto[];
  plates: AssemblyDto[];
  cells: BoardCellDto[];
  trays: BoardTrayDto[];
  /**
   * Per client-day totals and warnings (the week's problem list is `flatWarnings(checks)`). A cell's portions, with
   * eat-by and remedies, are `cellEatBy(cell, plate.trays, prepDates)` (shared/domain/week-board.ts): the board
   * answer does not carry them for every cell.
   */
  checks: BoardDayDto[];
  inventory: TrayTally[];
  cautions: readonly Caution[];
}

/** How far a workspace is set up: how many active base trays, plates, clients, ovens and prep weeks it has. */
export interface SetupCountsDto {
  trays: number;
  plates: number;
  clients: number;
  ovens: number;
  weeks: number;
}

/** The week after the glance's week, as the home page names it. */
export interface NextWeekDto {
  id: number;
  name: string;
  startDate: IsoDate;
  cellCount: number;
  publishedVersion: number | null;
}

export interface GlanceDto {
  week: WeekSummaryDto | null;
  /** The first week of the workspace starting after the glance's week (null: nothing planned after it yet). */
  nextWeek: NextWeekDto | null;
  warnings: number;
  blocks: number;
  portionsShort: number;
  nextPrepDate: IsoDate | null;
  setup: SetupCountsDto;
  /**
   * The week's cooling record where it went wrong (shared/domain/cooling.ts): trays thrown away (their portions no
   * longer count as baked: see `portionsShort`) and trays past a Food Code deadline with no reading showing it met
   * (at the kitchen's time now when the workspace has a time zone, else on the readings alone).
   */
  cooling: { thrownAway: CoolingTrayDto[]; missed: CoolingTrayDto[] };
  /** The week's published version, from today on: plates holding an allergen put on a client's list since. */
  publishedAllergens: { clients: number; plates: number };
}

export interface CoolingTrayDto {
  trayName: string;
  prepDate: IsoDate;
}

/** What a client sees: their published plates. */
export interface MyPlateDto {
  slot: string;
  name: string;
  description: string;
  macros: PlateMacrosDto;
  allergens: AllergenCode[];
  /**
   * Allergens on the client's own list that the plate contains, allowed by the coach on this day (an override with a
   * reason, kept for the coach): the client is told plainly. Absent in snapshots published before it was kept.
   */
  allowedAllergens?: AllergenCode[];
  /** The plate's allergens on the client's list as it stands when read (not stored: the list can change after publishing). */
  onYourList?: AllergenCode[];
  trays: { trayId: number; name: string; portions: number; reheatSteps: string[] }[];
  addOns: { name: string; amountText: string; unit: string; note: string }[];
  assemblySteps: string[];
  reheatSteps: string[];
  /** The earliest eat-by of the plate's portions. */
  eatBy: IsoDate | null;
  storage: 'fridge' | 'frozen';
  /** For a frozen plate: move it from the freezer to the fridge on this evening. */
  thawOn: IsoDate | null;
  prepDate: IsoDate;
}

/**
 * GET /api/clients/:id/published-allergens: the plates of published weeks, from today on, that hold an allergen on
 * the client's list as it stands and that the coach did not allow when publishing (the list changed after). The
 * client's phone and plan PDF tell them not to eat these; the coach changes them on the board and publishes again.
 */
export interface PublishedAllergenWeekDto {
  weekId: number;
  weekName: string;
  publishedVersion: number;
  plates: PublishedAllergenPlateDto[];
}

export interface PublishedAllergenPlateDto {
  date: IsoDate;
  slot: string;
  name: string;
  /** The plate's allergens on the client's list now that the coach did not allow when publishing. */
  allergens: AllergenCode[];
}

/**
 * GET /api/weeks/:id/published-allergens: the same plates for one week's published version (from today on), client by
 * client; `clients` is empty when none has any or the week is not published (`publishedVersion` null).
 */
export interface WeekPublishedAllergensDto {
  weekId: number;
  publishedVersion: number | null;
  clients: { clientId: number; name: string; plates: PublishedAllergenPlateDto[] }[];
}

export interface MyDayDto {
  date: IsoDate;
  plates: MyPlateDto[];
  totals: PlateMacrosDto;
}

export interface MyWeekDto {
  weekId: number;
  name: string;
  publishedVersion: number;
  publishedAt: string;
  startDate: IsoDate;
  endDate: IsoDate;
  days: MyDayDto[];
  /**
   * The next published week after this one, with the client's days on it (null: none yet). A frozen plate on its
   * first day thaws on this week's last evening, and the client can look ahead once it is published.
   */
  next: MyNextWeekDto | null;
  cautions: readonly Caution[];
}

export interface MyNextWeekDto {
  weekId: number;
  name: string;
  publishedVersion: number;
  startDate: IsoDate;
  endDate: IsoDate;
  days: MyDayDto[];
}

/** The stored snapshot of one publication: every client's days, as clients will read them. */
export interface WeekSnapshot {
  weekId: number;
  /** The week's title when it was published ("Week of Mon, Dec 7" for a week without a name of its own). */
  name: string;
  /**
   * The week's own name ('' when it had none): readers write the title with `snapshotTitle`, so an unnamed week
   * follows the workspace's date setting. Absent in snapshots published before it was kept.
   */
  ownName?: string;
  startDate: IsoDate;
  endDate: IsoDate;
  prepDates: IsoDate[];
  clients: Record<string, { days: MyDayDto[]; trayIds: number[] }>;
}

/** One published version of a week (GET /api/weeks/:id/publications), newest first. */
export interface WeekPublicationDto {
  number: number;
  publishedAt: string;
  /** Who published it (their name), null when that account is gone. */
  publishedBy: string | null;
}
