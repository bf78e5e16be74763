import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Ingredient } from '../ingredients/ingredient.entity.js';
import { User } from '../auth/user.entity.js';
import { Week } from '../weeks/week.entity.js';

/**
 * A check mark on a week's shopping list: one row per (week, list, ingredient), the list being the whole week
 * (trip 0) or, in a week with two prep days, the trip before the first (1) or the second (2). Trips are numbered,
 * not dated, so moving a prep day keeps its marks. Each tap is its own idempotent write of that one row (no
 * whole-list version), so two people shopping at once never overwrite each other's marks.
 */
export const ShoppingCheck = defineEntity({
  name: 'ShoppingCheck',
  tableName: 'shopping_check',
  uniques: [{ properties: ['week', 'trip', 'ingredient'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    week: () => p.manyToOne(Week).ref().deleteRule('cascade'),
    /** 0: the whole week's list; 1 or 2: the trip before the week's first or second prep day. */
    trip: p.smallint().default(0),
    ingredient: () => p.manyToOne(Ingredient).ref().deleteRule('cascade'),
    checked: p.boolean().default(false),
    checkedBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    checkedAt: p.datetime().nullable(),
  },
});
export type IShoppingCheck = InferEntity<typeof ShoppingCheck>;

/**
 * The record that a list was marked bought and the pantry updated: at most one per (week, list), so a second
 * "mark bought" changes nothing. `changes` keeps each pantry row's amount before and after.
 */
export const ShoppingPurchase = defineEntity({
  name: 'ShoppingPurchase',
  tableName: 'shopping_purchase',
  uniques: [{ properties: ['week', 'trip'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    week: () => p.manyToOne(Week).ref().deleteRule('cascade'),
    /** 0: the whole week's list; 1 or 2: the trip before the week's first or second prep day. */
    trip: p.smallint().default(0),
    boughtBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    boughtAt: p.datetime().onCreate(() => new Date()),
    changes: p.json<{ ingredientId: number; name: string; before: string; after: string; unit: string }[]>().default('[]'),
  },
});
export type IShoppingPurchase = InferEntity<typeof ShoppingPurchase>;
