import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';

/**
 * A coach's client. Body measurements, targets and health notes are seen by the coach (and, except health notes,
 * by the client themself); assistants see only the name and the household multiplier.
 * Decimal columns come back as strings; feed them to decimal.js.
 */
export const Client = defineEntity({
  name: 'Client',
  tableName: 'client',
  indexes: [{ properties: ['workspace', 'name'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    name: p.string().length(120),
    email: p.string().length(254).nullable(),
    /** Portions per plate (2 = the plate feeds two people). */
    householdMultiplier: p.decimal().precision(8).scale(2).default('1'),
    /** The form of the Mifflin–St Jeor equation. */
    sex: p.string().length(10),
    ageYears: p.integer(),
    heightCm: p.decimal().precision(8).scale(2),
    weightKg: p.decimal().precision(8).scale(2),
    activity: p.string().length(20),
    goal: p.string().length(20),
    goalAdjustment: p.decimal().precision(6).scale(3).nullable(),
    netCarbCapG: p.decimal().precision(8).scale(2).default('20'),
    proteinGPerKg: p.decimal().precision(6).scale(2).fieldName('protein_g_per_kg'),
    /** 'computed' (Mifflin–St Jeor + keto split) or 'manual' (manualTargets). */
    targetMode: p.string().length(10).default('computed'),
    manualTargets: p.json<{ targetKcal: number; netCarbCapG: number; proteinG: number; fatG: number }>().nullable(),
    /** Share of the day per meal slot, e.g. {"breakfast": 0.3}. */
    slotShares: p.json<Record<string, number>>().default('{}'),
    allergens: p.json<string[]>().default('[]'),
    dislikes: p.json<string[]>().default('[]'),
    /** Coach only. */
    healthNotes: p.text().default(''),
    /**
     * When the coach archived the client (they paused or left), else null. An archived client leaves the client list
     * and the boards of weeks they have no plates in; past weeks and published plans keep them.
     */
    archivedAt: p.datetime().nullable(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IClient = InferEntity<typeof Client>;

/** A client's scalar columns: what the week board, targets and plans read (an entity or a plain row). */
export type ClientFacts = Pick<
  IClient,
  | 'id'
  | 'name'
  | 'email'
  | 'householdMultiplier'
  | 'sex'
  | 'ageYears'
  | 'heightCm'
  | 'weightKg'
  | 'activity'
  | 'goal'
  | 'goalAdjustment'
  | 'netCarbCapG'
  | 'proteinGPerKg'
  | 'targetMode'
  | 'manualTargets'
  | 'slotShares'
  | 'allergens'
  | 'dislikes'
  | 'archivedAt'
  | 'version'
>;
