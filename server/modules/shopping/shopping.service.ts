import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import {
  buildShoppingList,
  toBaseAmount,
  type PantryStock,
  type ShoppingItem,
  type ShoppingList,
  type ShoppingNeed,
} from '@shared/domain/shopping.js';
import { normalizeUnit, UnitConversionError, UnknownUnitError } from '@shared/domain/units.js';
import { STORE_AISLE_CODES } from '@shared/schemas/ingredients.schema.js';
import {
  shoppingNeedsSchema,
  type ShoppingListDto,
  type ShoppingNeedsInput,
  type ShoppingProblemDto,
} from '@shared/schemas/shopping.schema.js';
import { measureOf, type Actor } from '../../http/authz.js';
import { ValidationError } from '../../http/errors.js';
import { Tray } from '../trays/tray.entity.js';
import { pantryStock } from './pantry.service.js';
import { loadShoppingIngredients, type ShoppingRow } from './shopping-ingredient.js';
import { presentShoppingList } from './shopping.presenter.js';

/** The week's list, computed: the domain result plus the rows it was computed from. */
export interface ComputedShoppingList {
  list: ShoppingList;
  ingredients: Map<number, ShoppingRow>;
  problems: ShoppingProblemDto[];
}

/** Store order of the aisles: the library's aisle codes as listed (produce first … oils last), "Other" at the end. */
export const AISLE_ORDER: readonly string[] = STORE_AISLE_CODES;

function convertible(ing: ShoppingRow, amount: Decimal.Value, unit: string): string | null {
  try {
    toBaseAmount(amount, normalizeUnit(unit), ing);
    return null;
  } catch (e) {
    if (e instanceof UnitConversionError || e instanceof UnknownUnitError) return e.message;
    throw e;
  }
}

/**
 * Every tray line × its tray count, as needs (amounts as stored per tray, in the line's unit), for each of `lists`
 * (one read of the trays for all of them). A tray not in the workspace is a 400 naming `trays.N.trayId` of the
 * first list that asks for it.
 */
async function trayNeeds(
  em: EntityManager,
  actor: Actor,
  lists: readonly (readonly { trayId: number; count: number }[])[],
): Promise<ShoppingNeed[][]> {
  const ids = new Set(lists.flatMap((trays) => trays.map((t) => t.trayId)));
  if (!ids.size) return lists.map(() => []);
  const rows = await em.find(Tray, { id: { $in: [...ids] }, workspace: actor.workspaceId }, { populate: ['lines'] });
  const found = new Set(rows.map((r) => r.id));
  return lists.map((trays) => {
    const errors: Record<string, string[]> = {};
    trays.forEach((t, i) => {
      if (!found.has(t.trayId)) errors[`trays.${i}.trayId`] = [`No base tray with id ${t.trayId} in your workspace`];
    });
    if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);
    const counts = new Map<number, number>();
    for (const t of trays) counts.set(t.trayId, (counts.get(t.trayId) ?? 0) + t.count);
    const needs: ShoppingNeed[] = [];
    for (const tray of rows) {
      const count = counts.get(tray.id) ?? 0;
      if (count <= 0) continue;
      for (const line of tray.lines.getItems()) {
        needs.push({ ingredientId: String(line.ingredient.id), amount: new Decimal(line.amount).times(count), unit: line.unit });
      }
    }
    return needs;
  });
}

/** What several lists are built from, read once: each list's needs, the pantry, and every ingredient either names. */
interface ShoppingInputs {
  raws: ShoppingNeed[][];
  rawStock: PantryStock[];
  ingredients: Map<number, ShoppingRow>;
}

async function loadShoppingInputs(em: EntityManager, actor: Actor, inputs: readonly ShoppingNeedsInput[]): Promise<ShoppingInputs> {
  const parsed = inputs.map((i) => shoppingNeedsSchema.parse(i));
  const trays = await trayNeeds(em, actor, parsed.map((p) => p.trays));
  const raws = parsed.map((p, i) => [
    ...trays[i],
    ...p.addOns.map((a) => ({ ingredientId: String(a.ingredientId), amount: a.amount, unit: a.unit })),
  ]);
  const { stock: rawStock } = await pantryStock(em, actor);
  const ids = [...raws.flat(), ...rawStock].map((n) => Number(n.ingredientId));
  return { raws, rawStock, ingredients: await loadShoppingIngredients(em, actor, ids) };
}

/**
 * One list from loaded inputs, minus the pantry. Lines whose unit the ingredient cannot be converted from are left
 * out and named in `problems` (never counted as zero silently).
 */
function buildList(raw: readonly ShoppingNeed[], { rawStock, ingredients }: ShoppingInputs, held: ReadonlyMap<string, Decimal>): ComputedShoppingList {
  const problems: ShoppingProblemDto[] = [];
  const needs: ShoppingNeed[] = [];
  for (const need of raw) {
    const ing = ingredients.get(Number(need.ingredientId));
    if (!ing) {
      problems.push({ ingredientId: Number(need.ingredientId), name: `Ingredient ${need.ingredientId}`, message: 'Not in your library' });
      continue;
    }
    const problem = convertible(ing, need.amount, need.unit);
    if (problem) {
      if (!problems.some((p) => p.ingredientId === ing.rowId && p.message === problem)) {
        problems.push({ ingredientId: ing.rowId, name: ing.name, message: problem });
      }
      continue;
    }
    needs.push({ ...need, unit: normalizeUnit(need.unit) });
  }
  const pantry: PantryStock[] = rawStock
    .filter((s) => {
      const ing = ingredients.get(Number(s.ingredientId));
      return ing !== undefined && convertible(ing, s.amount, s.unit) === null;
    })
    .map((s) => {
      const promised = held.get(String(s.ingredientId));
      return promised ? { ...s, amount: Decimal.max(new Decimal(s.amount).minus(promised), 0) } : s;
    });
  const list = buildShoppingList({ needs, ingredients: [...ingredients.values()], pantry, aisleOrder: AISLE_ORDER });
  return { list, ingredients, problems };
}

/**
 * The shopping list for trays × counts plus add-on amounts, minus the workspace's pantry. Lines whose unit the
 * ingredient cannot be converted from are left out and named in `problems` (never counted as zero silently).
 */
export function computeShoppingList(em: EntityManager, actor: Actor, input: ShoppingNeedsInput): Promise<ComputedShoppingList> {
  return computeLaterShoppingList(em, actor, [], input);
}

/**
 * The last of several lists that share the pantry in order (a week's trips): each earlier list marked `takesPantry`
 * holds what it takes from the pantry, and the later ones see only the rest. One read of trays, pantry and
 * ingredients for all of them. With no earlier list, it is the list alone (computeShoppingList).
 */
export async function computeLaterShoppingList(
  em: EntityManager,
  actor: Actor,
  earlier: readonly { input: ShoppingNeedsInput; takesPantry: boolean }[],
  input: ShoppingNeedsInput,
): Promise<ComputedShoppingList> {
  const taking = earlier.filter((e) => e.takesPantry);
  const loaded = await loadShoppingInputs(em, actor, [...taking.map((e) => e.input), input]);
  const held = new Map<string, Decimal>();
  taking.forEach((_, i) => {
    for (const item of itemsOf(buildList(loaded.raws[i], loaded, held).list)) {
      if (item.fromPantry.gt(0)) held.set(item.ingredientId, (held.get(item.ingredientId) ?? new Decimal(0)).plus(item.fromPantry));
    }
  });
  return buildList(loaded.raws[taking.length], loaded, held);
}

/** The whole list as items, for callers that only need the numbers. */
export function itemsOf(list: ShoppingList): ShoppingItem[] {
  return list.aisles.flatMap((a) => a.items);
}

/**
 * The shopping list DTO for trays × counts and add-ons (no prep week needed): what the week's list is built from.
 */
export async function shoppingListFor(em: EntityManager, actor: Actor, input: ShoppingNeedsInput): Promise<ShoppingListDto> {
  return presentShoppingList(await computeShoppingList(em, actor, input), { weekId: null, system: measureOf(actor) });
}
