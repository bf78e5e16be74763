import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { toBaseAmount, baseUnitOf, type PantryStock } from '@shared/domain/shopping.js';
import { normalizeUnit, UnitConversionError, UnknownUnitError, type MeasureSystem } from '@shared/domain/units.js';
import { compareNames } from '@shared/domain/words.js';
import type {
  PantryCreateValues,
  PantryItemDto,
  PantryListDto,
  PantryUpdateValues,
} from '@shared/schemas/shopping.schema.js';
import { measureOf, type Actor } from '../../http/authz.js';
import { Conflict, NotFound, StaleEdit, ValidationError } from '../../http/errors.js';
import { PantryItem, type IPantryItem } from './pantry.entity.js';
import { baseAmountText, loadShoppingIngredients, type ShoppingRow } from './shopping-ingredient.js';

/** Pantry amounts are stored with 4 decimals, rounded half up; never below zero. */
export function pantryAmount(value: Decimal.Value): Decimal {
  return Decimal.max(new Decimal(value), 0).toDecimalPlaces(4, Decimal.ROUND_HALF_UP);
}

function presentPantryItem(row: IPantryItem, ing: ShoppingRow | undefined, system: MeasureSystem): PantryItemDto {
  return {
    id: row.id,
    ingredientId: row.ingredient.id,
    ingredientName: ing?.name ?? `Ingredient ${row.ingredient.id}`,
    aisle: ing?.aisle ?? null,
    amount: Number(row.amount),
    unit: row.unit,
    display: ing ? baseAmountText(row.amount, ing, system) : `${Number(row.amount)} ${row.unit}`,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The typed amount in the ingredient's base unit; a 400 on `unit` when it cannot be converted. */
function toBase(ing: ShoppingRow, amount: string, unitText: string): { amount: Decimal; unit: string } {
  try {
    const unit = normalizeUnit(unitText);
    return { amount: pantryAmount(toBaseAmount(amount, unit, ing)), unit: baseUnitOf(ing).unit };
  } catch (e) {
    if (e instanceof UnitConversionError || e instanceof UnknownUnitError) {
      throw ValidationError.field('unit', `${e.message} Use grams${ing.buyBy === 'count' ? ` or "${ing.countPiece}"` : ''}.`);
    }
    throw e;
  }
}

async function ingredientFor(em: EntityManager, actor: Actor, ingredientId: number): Promise<ShoppingRow> {
  const ing = (await loadShoppingIngredients(em, actor, [ingredientId])).get(ingredientId);
  if (!ing) throw ValidationError.field('ingredientId', `No ingredient with id ${ingredientId} in your library`);
  return ing;
}

async function findItem(em: EntityManager, actor: Actor, id: number): Promise<IPantryItem> {
  const row = await em.findOne(PantryItem, { id, workspace: actor.workspaceId });
  if (!row) throw new NotFound('Pantry item');
  return row;
}

export async function listPantry(em: EntityManager, actor: Actor): Promise<PantryListDto> {
  const rows = await em.find(PantryItem, { workspace: actor.workspaceId }, { orderBy: { id: 'asc' } });
  const ings = await loadShoppingIngredients(em, actor, rows.map((r) => r.ingredient.id));
  const items = rows.map((r) => presentPantryItem(r, ings.get(r.ingredient.id), measureOf(actor)));
  items.sort((a, b) => compareNames(a.ingredientName, b.ingredientName));
  return { items };
}

export async function getPantryItem(em: EntityManager, actor: Actor, id: number): Promise<PantryItemDto> {
  const row = await findItem(em, actor, id);
  const ing = (await loadShoppingIngredients(em, actor, [row.ingredient.id])).get(row.ingredient.id);
  return presentPantryItem(row, ing, measureOf(actor));
}

/** One row per ingredient: a second one is 409 naming the existing row (edit that one instead). */
export async function createPantryItem(em: EntityManager, actor: Actor, v: PantryCreateValues): Promise<PantryItemDto> {
  const ing = await ingredientFor(em, actor, v.ingredientId);
  const existing = await em.findOne(PantryItem, { workspace: actor.workspaceId, ingredient: v.ingredientId });
  if (existing) {
    throw new Conflict(`The pantry already lists ${ing.name}: change that amount instead`, { existingId: existing.id });
  }
  const base = toBase(ing, v.amount, v.unit);
  const row = em.create(PantryItem, {
    workspace: actor.workspaceId,
    ingredient: v.ingredientId,
    amount: base.amount.toFixed(4),
    unit: base.unit,
  });
  await em.flush();
  return presentPantryItem(row, ing, measureOf(actor));
}

export async function updatePantryItem(em: EntityManager, actor: Actor, id: number, v: PantryUpdateValues): Promise<PantryItemDto> {
  const row = await findItem(em, actor, id);
  const ing = await ingredientFor(em, actor, row.ingredient.id);
  if (row.version !== v.version) throw new StaleEdit(row.version, presentPantryItem(row, ing, measureOf(actor)));
  const base = toBase(ing, v.amount, v.unit);
  row.amount = base.amount.toFixed(4);
  row.unit = base.unit;
  await em.flush();
  return presentPantryItem(row, ing, measureOf(actor));
}

export async function deletePantryItem(em: EntityManager, actor: Actor, id: number): Promise<void> {
  const row = await findItem(em, actor, id);
  await em.removeAndFlush(row);
}

/** The workspace's stock as the shopping domain reads it (rows whose stored unit no longer fits are skipped). */
export async function pantryStock(em: EntityManager, actor: Actor): Promise<{ stock: PantryStock[]; rows: IPantryItem[] }> {
  const rows = await em.find(PantryItem, { workspace: actor.workspaceId });
  return {
    rows,
    stock: rows.map((r) => ({ ingredientId: String(r.ingredient.id), amount: r.amount, unit: r.unit })),
  };
}
