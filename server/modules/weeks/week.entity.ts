import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Tray } from '../trays/tray.entity.js';
import { Client } from '../clients/client.entity.js';
import { Assembly } from '../assemblies/assembly.entity.js';
import type { WeekSnapshot } from '@shared/schemas/weeks.schema.js';

/**
 * A prep week: its prep date(s), the trays to bake, and the week board (client × day × meal slot → plate).
 * Dates are calendar days stored as 'YYYY-MM-DD' text (no time zone can shift them).
 * Every board edit bumps `version` (optimistic locking: a stale edit answers 409 with the current board).
 */
export const Week = defineEntity({
  name: 'Week',
  tableName: 'week',
  indexes: [{ properties: ['workspace', 'startDate'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    name: p.string().length(120).default(''),
    startDate: p.string().length(10),
    prepDate: p.string().length(10),
    secondPrepDate: p.string().length(10).nullable(),
    /** The number of the latest publication (null: never published). */
    publishedVersion: p.integer().nullable(),
    /** The board version that was published last. */
    publishedBoardVersion: p.integer().nullable(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IWeek = InferEntity<typeof Week>;

/** How many trays of one base tray are baked on one prep date of the week. */
export const WeekTray = defineEntity({
  name: 'WeekTray',
  tableName: 'week_tray',
  uniques: [{ properties: ['week', 'tray', 'prepDate'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    week: () => p.manyToOne(Week).ref().deleteRule('cascade'),
    tray: () => p.manyToOne(Tray).ref(),
    prepDate: p.string().length(10),
    trayCount: p.integer(),
  },
});
export type IWeekTray = InferEntity<typeof WeekTray>;

/** One cell of the week board: a client's plate for a day and meal slot. */
export const WeekCell = defineEntity({
  name: 'WeekCell',
  tableName: 'week_cell',
  uniques: [{ properties: ['week', 'client', 'date', 'slot'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    week: () => p.manyToOne(Week).ref().deleteRule('cascade'),
    client: () => p.manyToOne(Client).ref().deleteRule('cascade'),
    date: p.string().length(10),
    slot: p.string().length(40),
    assembly: () => p.manyToOne(Assembly).ref(),
    /** Portions from this prep date; null = the latest prep date on or before the day. */
    prepDate: p.string().length(10).nullable(),
    /** 'fridge' or 'frozen' (freeze on prep day, thaw the evening before). */
    storage: p.string().length(10).default('fridge'),
    allergenOverrides: p.json<{ allergen: string; reason: string }[]>().default('[]'),
  },
});
export type IWeekCell = InferEntity<typeof WeekCell>;

/** One publication of a week: the snapshot clients read until the coach publishes a new version. */
export const WeekPublication = defineEntity({
  name: 'WeekPublication',
  tableName: 'week_publication',
  uniques: [{ properties: ['week', 'number'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    week: () => p.manyToOne(Week).ref().deleteRule('cascade'),
    number: p.integer(),
    snapshot: p.json<WeekSnapshot>(),
    publishedBy: p.integer(),
    publishedAt: p.datetime().onCreate(() => new Date()),
  },
});
export type IWeekPublication = InferEntity<typeof WeekPublication>;
