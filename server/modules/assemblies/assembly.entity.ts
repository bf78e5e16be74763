import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Tray } from '../trays/tray.entity.js';
import { Ingredient } from '../ingredients/ingredient.entity.js';

/** A plate: portions of base trays plus add-ons from the ingredient library, with assembly and reheat steps. */
export const Assembly = defineEntity({
  name: 'Assembly',
  tableName: 'assembly',
  indexes: [{ properties: ['workspace', 'name'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref(),
    name: p.string().length(120),
    description: p.text().default(''),
    items: () => p.oneToMany(AssemblyItem).mappedBy('assembly').orderBy({ position: 'asc' }).orphanRemoval(),
    assemblySteps: p.json<string[]>().default('[]'),
    reheatSteps: p.json<string[]>().default('[]'),
    /** Out of the plates list and the board's pickers; the boards and plans that name it keep it. */
    archived: p.boolean().default(false),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IAssembly = InferEntity<typeof Assembly>;

/** One part of a plate: either `portions` of a tray, or an add-on ingredient with its amount. */
export const AssemblyItem = defineEntity({
  name: 'AssemblyItem',
  tableName: 'assembly_item',
  indexes: [{ properties: ['assembly'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    assembly: () => p.manyToOne(Assembly).ref().deleteRule('cascade'),
    position: p.integer(),
    tray: () => p.manyToOne(Tray).ref().nullable().deleteRule('restrict'),
    portions: p.decimal().precision(8).scale(2).nullable(),
    ingredient: () => p.manyToOne(Ingredient).ref().nullable().deleteRule('restrict'),
    amountText: p.string().length(40).default(''),
    amount: p.decimal().precision(14).scale(6).nullable(),
    unit: p.string().length(40).default(''),
    note: p.string().length(200).default(''),
  },
});
export type IAssemblyItem = InferEntity<typeof AssemblyItem>;
