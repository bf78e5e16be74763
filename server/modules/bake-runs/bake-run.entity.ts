import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Week } from '../weeks/week.entity.js';
import type { BakeRunDone } from '@shared/domain/bake-run-resume.js';

/**
 * A workspace's bake rule for one food category (seeded from DEFAULT_BAKE_RULES on the first read, then the coach's).
 * Temperatures in °F (numeric). A deleted rule is kept with `deletedAt` so the defaults are not seeded again and
 * a category code stays unique per workspace (creating it again revives the row).
 */
export const BakeRule = defineEntity({
  name: 'BakeRule',
  tableName: 'bake_rule',
  uniques: [{ properties: ['workspace', 'category'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    category: p.string().length(40),
    label: p.string().length(120),
    tempF: p.decimal().precision(8).scale(4),
    minMinutes: p.integer(),
    maxMinutes: p.integer(),
    handsOnMinutes: p.integer(),
    toleranceF: p.decimal().precision(8).scale(4).default('10'),
    donenessCue: p.text().default(''),
    minInternalF: p.decimal().precision(8).scale(4).nullable(),
    restMinutes: p.integer().default(0),
    minInternalSource: p.string().length(200).nullable(),
    rackPreference: p.string().length(10).default('any'),
    /** Convection adjustment: the oven is set this much lower, °F (default 25). */
    convectionDeltaF: p.decimal().precision(8).scale(4).default('25'),
    /** Crowding: + this % bake time for each tray beyond the first (default 10; common practice, no source). */
    crowdingPct: p.decimal().precision(8).scale(4).default('10'),
    bakeSource: p.string().length(200).default('common practice, no source'),
    note: p.text().default(''),
    deletedAt: p.datetime().nullable(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IBakeRule = InferEntity<typeof BakeRule>;

/** An oven of the workspace: capacity, heating/cooling rates (°F per minute) and maximum set point (°F). */
export const Oven = defineEntity({
  name: 'Oven',
  tableName: 'oven',
  uniques: [{ properties: ['workspace', 'name'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    name: p.string().length(60),
    racks: p.integer(),
    traysPerRack: p.integer(),
    convection: p.boolean().default(false),
    heatFPerMin: p.decimal().precision(8).scale(4).default('25'),
    coolFPerMin: p.decimal().precision(8).scale(4).default('15'),
    maxF: p.decimal().precision(8).scale(4).default('500'),
    isDemo: p.boolean().default(false),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IOven = InferEntity<typeof Oven>;

/** The saved bake-run settings of one prep date of a prep week. */
export const BakeRunSetting = defineEntity({
  name: 'BakeRunSetting',
  tableName: 'bake_run_setting',
  uniques: [{ properties: ['week', 'prepDate'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    week: () => p.manyToOne(Week).ref().deleteRule('cascade'),
    prepDate: p.string().length(10),
    /** Local "YYYY-MM-DDTHH:mm". */
    start: p.string().length(16),
    cooks: p.integer(),
    /** Base tray id → hands-on minutes for one tray of it. */
    handsOnMinutes: p.json<Record<string, number>>().default('{}'),
    ovenIds: p.json<number[]>().default('[]'),
    /** Planned again part-way through the day: the trays already out (as planned) and when the rest starts; else null. */
    done: p.json<BakeRunDone>().nullable(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IBakeRunSetting = InferEntity<typeof BakeRunSetting>;

/**
 * The cooling record of one tray of a prep day's run (shared/domain/cooling.ts): when it came out, the food
 * temperatures taken while it cooled (°F), a restart after a reheat, thrown away or not, and who wrote it down.
 * Kept by the tray's id in the run ("12-1") with its name then: a record outlives a later change of the run, and
 * the deletion of its week (it is part of the kitchen's food-safety log).
 */
export const CoolingRecord = defineEntity({
  name: 'CoolingRecord',
  tableName: 'cooling_record',
  uniques: [{ properties: ['week', 'prepDate', 'runTrayId'] }],
  // The cooling log reads a workspace's records by prep date.
  indexes: [{ properties: ['workspace', 'prepDate'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    /** The week it was baked for; null once that week is deleted (the record stays in the kitchen's cooling log). */
    week: () => p.manyToOne(Week).ref().nullable().deleteRule('set null'),
    prepDate: p.string().length(10),
    runTrayId: p.string().length(16),
    trayName: p.string().length(200),
    /** Local "YYYY-MM-DDTHH:mm". */
    outAt: p.string().length(16),
    restartedAt: p.string().length(16).nullable(),
    readings: p.json<{ at: string; tempF: number }[]>().default('[]'),
    discarded: p.boolean().default(false),
    note: p.text().default(''),
    recordedBy: p.string().length(200),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type ICoolingRecord = InferEntity<typeof CoolingRecord>;
