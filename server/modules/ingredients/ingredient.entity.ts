import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';

/**
 * One ingredient of the library. Every nutrient is per 100 g of edible portion, US style (total carbohydrate
 * includes fibre, sugar alcohols and allulose; see shared/domain/nutrition.ts).
 *
 * - `workspace` null: a shared reference row, seeded from SEED_INGREDIENTS by `slug` on every start; read-only
 *   for everyone.
 * - `workspace` set: a workspace's own ingredient, seen and edited only by that workspace.
 *
 * Decimal columns come back from the ORM as strings; feed them to decimal.js.
 */
export const Ingredient = defineEntity({
  name: 'Ingredient',
  tableName: 'ingredient',
  indexes: [{ properties: ['workspace', 'name'] }],
  // An own name once per workspace, whatever its case (Migration20261208000000_ingredient_name_unique).
  uniques: [
    {
      name: 'ingredient_workspace_id_name_unique',
      expression: 'create unique index "ingredient_workspace_id_name_unique" on "ingredient" ("workspace_id", lower("name")) where "workspace_id" is not null',
    },
  ],
  properties: {
    id: p.integer().primary().autoincrement(),
    // Cascade, never set-null: a deleted workspace's rows must not turn into shared reference rows.
    workspace: () => p.manyToOne(Workspace).ref().nullable().deleteRule('cascade'),
    /** Stable id of a shared reference row (null for a workspace's own rows). */
    slug: p.string().length(80).nullable().unique(),
    name: p.string().length(160),
    category: p.string().length(40).default('other'),
    kcal: p.decimal().precision(12).scale(4),
    fatG: p.decimal().precision(12).scale(4),
    satFatG: p.decimal().precision(12).scale(4).default('0'),
    proteinG: p.decimal().precision(12).scale(4),
    /** Total carbohydrate by difference, including fibre, sugar alcohols and allulose. */
    carbsG: p.decimal().precision(12).scale(4),
    fiberG: p.decimal().precision(12).scale(4).default('0'),
    sugarsG: p.decimal().precision(12).scale(4).default('0'),
    erythritolG: p.decimal().precision(12).scale(4).default('0'),
    alluloseG: p.decimal().precision(12).scale(4).default('0'),
    /** Sugar alcohols other than erythritol (xylitol, maltitol, …). */
    otherPolyolsG: p.decimal().precision(12).scale(4).default('0'),
    sodiumMg: p.decimal().precision(12).scale(4).default('0'),
    /** Grams per millilitre; null where a volume measure is not meaningful. */
    densityGPerMl: p.decimal().precision(12).scale(4).nullable().fieldName('density_g_per_ml'),
    densitySource: p.text().nullable(),
    /** Grams of one named piece, e.g. {"large": 50}. */
    pieceWeights: p.json<Record<string, number>>().default('{}'),
    /** Codes of the nine US major allergens (shared/domain/allergens.ts). */
    allergens: p.json<string[]>().default('[]'),
    /** How it is bought: `purchaseAmount` of `purchaseUnit` (a unit code or a piece name), e.g. 12 × "large". */
    purchaseAmount: p.decimal().precision(12).scale(4).nullable(),
    purchaseUnit: p.string().length(40).nullable(),
    purchaseLabel: p.string().length(120).nullable(),
    /** Price of one purchase unit, in cents. */
    priceCents: p.integer().nullable(),
    aisle: p.string().length(40).nullable(),
    /** Where the nutrient values come from, in words. */
    source: p.text().default(''),
    provenance: p.string().length(40).nullable(),
    fdcId: p.integer().nullable(),
    note: p.text().nullable(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IIngredient = InferEntity<typeof Ingredient>;
