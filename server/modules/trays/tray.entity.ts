import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Ingredient } from '../ingredients/ingredient.entity.js';

/**
 * A base tray: one recipe baked on one pan and cut into portions by its cut plan.
 *
 * - Pan: a standard code (nominal size from shared/domain/scaling.ts) or `custom` with `panLength` × `panWidth`
 *   in `panUnit`.
 * - Bake: until bake rules are stored per workspace, the tray keeps its bake category code plus its own
 *   temperature (°F) and time range.
 * - Cut plan: `grid` (rows × columns) or `pieces` (N pieces of equal weight).
 * - Allergens are never stored: they are derived from the ingredients on every read.
 * - `archived`: a tray used by a plan is archived, never deleted.
 */
export const Tray = defineEntity({
  name: 'Tray',
  tableName: 'tray',
  indexes: [{ properties: ['workspace', 'archived'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    name: p.string().length(120),
    description: p.text().default(''),
    lines: () => p.oneToMany(TrayLine).mappedBy('tray').orderBy({ position: 'asc' }).orphanRemoval(),
    panCode: p.string().length(20),
    panLength: p.decimal().precision(12).scale(4).nullable(),
    panWidth: p.decimal().precision(12).scale(4).nullable(),
    panUnit: p.string().length(2).default('in'),
    panLining: p.string().length(20).default('parchment'),
    bakeCategory: p.string().length(40),
    bakeTempF: p.integer(),
    bakeMinMinutes: p.integer(),
    bakeMaxMinutes: p.integer(),
    /** Cooked mass ÷ raw mass. */
    yieldFactor: p.decimal().precision(12).scale(4).default('1'),
    cutKind: p.string().length(10).default('grid'),
    cutRows: p.integer().nullable(),
    cutColumns: p.integer().nullable(),
    cutPieces: p.integer().nullable(),
    fridgeDays: p.integer(),
    freezerWeeks: p.integer(),
    reheatSteps: p.json<string[]>().default('[]'),
    tags: p.json<string[]>().default('[]'),
    isDemo: p.boolean().default(false),
    archived: p.boolean().default(false),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type ITray = InferEntity<typeof Tray>;

/** One ordered ingredient line of a tray: the amount as typed, its parsed value, the unit and a note. */
export const TrayLine = defineEntity({
  name: 'TrayLine',
  tableName: 'tray_line',
  properties: {
    id: p.integer().primary().autoincrement(),
    tray: () => p.manyToOne(Tray).ref().deleteRule('cascade'),
    position: p.integer(),
    ingredient: () => p.manyToOne(Ingredient).ref(),
    amountText: p.string().length(40),
    /** parseAmount(amountText).value (a range's midpoint). */
    amount: p.decimal().precision(14).scale(6),
    unit: p.string().length(40),
    note: p.string().length(200).default(''),
  },
});
export type ITrayLine = InferEntity<typeof TrayLine>;

/**
 * A tray's photo: the files live under FILES_DIR (original as uploaded, checked by content, and a WebP
 * thumbnail made with sharp); this row holds their metadata, so any app instance can serve them.
 */
export const TrayPhoto = defineEntity({
  name: 'TrayPhoto',
  tableName: 'tray_photo',
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    tray: () => p.manyToOne(Tray).ref().deleteRule('cascade').unique(),
    contentType: p.string().length(40),
    byteSize: p.integer(),
    width: p.integer(),
    height: p.integer(),
    /** Paths relative to FILES_DIR. */
    filePath: p.string().length(255),
    thumbPath: p.string().length(255),
    sha256: p.string().length(64),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type ITrayPhoto = InferEntity<typeof TrayPhoto>;
