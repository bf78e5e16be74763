import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Ingredient } from '../ingredients/ingredient.entity.js';

/**
 * What a workspace has on hand of one ingredient. One row per (workspace, ingredient). The amount is stored in
 * the ingredient's base unit for the shopping list (grams, or pieces for count-bought items such as eggs) and
 * never goes below zero.
 */
export const PantryItem = defineEntity({
  name: 'PantryItem',
  tableName: 'pantry_item',
  uniques: [{ properties: ['workspace', 'ingredient'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    ingredient: () => p.manyToOne(Ingredient).ref().deleteRule('cascade'),
    amount: p.decimal().precision(14).scale(4),
    /** "g" or a piece name (the ingredient's count piece). */
    unit: p.string().length(40),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IPantryItem = InferEntity<typeof PantryItem>;
