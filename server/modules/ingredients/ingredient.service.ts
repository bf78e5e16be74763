import { ForeignKeyConstraintViolationException, type FilterQuery } from '@mikro-orm/core';
import { preparedRows } from '../../db/prepared.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { isAllergenCode, type AllergenCode } from '@shared/domain/allergens.js';
import {
  computeRecipeExact,
  DEFAULT_NET_CARB_RULE,
  NET_CARB_RULES,
  toNutrientNumbers,
  type NetCarbRule,
  type NutritionIngredient,
  type RecipeLine,
} from '@shared/domain/nutrition.js';
import { UnitConversionError } from '@shared/domain/units.js';
import {
  ingredientListQuerySchema,
  recipeCalcSchema,
  type IngredientDto,
  type IngredientListDto,
  type IngredientListQuery,
  type IngredientUpdateValues,
  type IngredientValues,
  type RecipeCalcDto,
  type RecipeCalcInput,
  type RecipeCalcValues,
} from '@shared/schemas/ingredients.schema.js';
import type { Actor } from '../../http/authz.js';
import { Conflict, Forbidden, NotFound, StaleEdit, ValidationError } from '../../http/errors.js';
import { Ingredient, type IIngredient } from './ingredient.entity.js';
import { isOwnedBy, isShared, presentIngredient, toNutritionIngredient } from './ingredient.presenter.js';
import { stampedRowsCache } from './calc-rows-cache.js';

/** A library row in the shape the nutrition domain reads, plus what plates and shopping lists need beside it. */
export type LoadedIngredient = NutritionIngredient & { id: number; allergens: AllergenCode[]; priceCents: number | null };

const SHARED_READ_ONLY =
  'Shared reference ingredients are read-only. Use "Copy to my library" to make your own version you can change.';

// ---------------------------------------------------------------------------------------------------------------
// The workspace's net-carb rule
// ---------------------------------------------------------------------------------------------------------------

export function toNetCarbRule(kind: string | null | undefined): NetCarbRule {
  const known = NET_CARB_RULES.find((r) => r.kind === kind);
  return known ? { kind: known.kind } : DEFAULT_NET_CARB_RULE;
}

/** The net-carb rule the workspace counts with (Workspace.netCarbRule; the default when unset). */
export async function netCarbRuleOf(em: EntityManager, workspaceId: number): Promise<NetCarbRule> {
  const [ws] = await preparedRows<{ netCarbRule: string }>(em, 'trayline_net_carb_rule', 'select net_carb_rule as "netCarbRule" from workspace where id = $1', [workspaceId]);
  if (!ws) throw new NotFound('Workspace');
  return toNetCarbRule(ws.netCarbRule);
}

// ---------------------------------------------------------------------------------------------------------------
// For other modules: rows by id, recipe calculation
// ---------------------------------------------------------------------------------------------------------------

/** Library rows the actor may use: the workspace's own and the shared reference rows. */
function visibleTo(actor: Actor): FilterQuery<IIngredient> {
  return { $or: [{ workspace: actor.workspaceId }, { workspace: null }] } as FilterQuery<IIngredient>;
}

async function findVisible(em: EntityManager, actor: Actor, ids: readonly number[]): Promise<Map<number, IIngredient>> {
  const unique = [...new Set(ids)];
  if (!unique.length) return new Map();
  const rows = await em.find(Ingredient, { $and: [{ id: { $in: unique } }, visibleTo(actor)] } as FilterQuery<IIngredient>);
  return new Map(rows.map((r) => [r.id, r]));
}

/** The columns the recipe calculation reads, as plain rows (no entity hydration: this runs on every keystroke). */
type CalcRow = Pick<IIngredient, 'id' | 'name' | 'densityGPerMl' | 'pieceWeights' | NutrientColumn>;
type NutrientColumn = keyof NutritionIngredient['per100g'];

const CALC_COLUMNS = `i.id, i.name, i.density_g_per_ml as "densityGPerMl", i.piece_weights as "pieceWeights", i.kcal,
  i.fat_g as "fatG", i.sat_fat_g as "satFatG", i.protein_g as "proteinG", i.carbs_g as "carbsG", i.fiber_g as "fiberG",
  i.sugars_g as "sugarsG", i.erythritol_g as "erythritolG", i.allulose_g as "alluloseG", i.other_polyols_g as "otherPolyolsG",
  i.sodium_mg as "sodiumMg"`;

/** A library row ready for nutrition, allergens, cost and packages. */
export type UsableIngredient = LoadedIngredient & { purchaseAmount: string | null; purchaseUnit: string | null };

type UsableRow = CalcRow & { allergens: string[] | null; priceCents: number | null; purchaseAmount: string | null; purchaseUnit: string | null };

function usableFromRow(row: UsableRow): UsableIngredient {
  return {
    ...toNutritionIngredient(row),
    id: row.id,
    allergens: (row.allergens ?? []).filter(isAllergenCode),
    priceCents: row.priceCents ?? null,
    purchaseAmount: row.purchaseAmount ?? null,
    purchaseUnit: row.purchaseUnit ?? null,
  };
}

const USABLE_COLUMNS = `${CALC_COLUMNS}, i.allergens, i.price_cents as "priceCents", i.purchase_amount as "purchaseAmount",
  i.purchase_unit as "purchaseUnit"`;

/**
 * The library rows the actor may use (own workspace or shared) among `ids`, keyed by id; ids that are missing or
 * belong to another workspace are simply absent. One prepared statement, plain rows (boards and trays read dozens).
 */
export async function loadUsableIngredients(em: EntityManager, actor: Actor, ids: readonly number[]): Promise<Map<number, UsableIngredient>> {
  const unique = [...new Set(ids)].filter((id) => Number.isSafeInteger(id));
  if (!unique.length) return new Map();
  return loadUsableIngredientsWhere(em, 'trayline_usable_ingredients', 'select unnest($1::int[])', 2, [unique, actor.workspaceId]);
}

/**
 * The usable library rows (own workspace or shared) whose id is among those an SQL subquery selects, keyed by id:
 * lets a caller read ingredients in the same round as the rows that name them. `idsSql` is a constant select of
 * one integer column over the statement's own parameters (the same for a given `name`).
 */
export async function loadUsableIngredientsWhere(
  em: EntityManager,
  name: string,
  idsSql: string,
  workspaceParam: number,
  values: readonly unknown[],
): Promise<Map<number, UsableIngredient>> {
  const rows = await preparedRows<UsableRow>(
    em,
    name,
    `select ${USABLE_COLUMNS} from ingredient i
      where (i.workspace_id = $${workspaceParam} or i.workspace_id is null) and i.id in (${idsSql})`,
    values,
  );
  return new Map(rows.map((row) => [row.id, usableFromRow(row)]));
}

/**
 * Nutrition of a recipe for the actor's workspace: `{ items: [{ ingredientId, amount, unit }], portions,
 * yieldFactor? }` with amounts as typed ('1 1/2', '¾', '1-2' → midpoint) or numbers, and units as typed
 * ('cups', 'Tbsp', 'large'). Uses the workspace's net-carb rule.
 * 400s name the field: `items.N.ingredientId` (not in the library), `items.N.amount`, `items.N.unit` (a
 * conversion needs a fact the ingredient lacks: the message names the ingredient and the fact).
 */
export async function computeRecipeForActor(em: EntityManager, actor: Actor, input: RecipeCalcInput): Promise<RecipeCalcDto> {
  return computeParsedRecipeForActor(em, actor, recipeCalcSchema.parse(input));
}

/** Library rows the calculation read, as nutrition facts, kept under the workspace's nutrition stamp (calc-rows-cache.ts). */
const calcRows = stampedRowsCache<NutritionIngredient>();

/** A row as the nutrition math reads it, frozen through (kept rows are shared by requests). */
function frozenFacts(row: CalcRow): NutritionIngredient {
  const facts = toNutritionIngredient(row);
  Object.freeze(facts.per100g);
  if (facts.pieceWeights) Object.freeze(facts.pieceWeights);
  return Object.freeze(facts);
}

/**
 * The rows findVisible would give (own workspace or shared), as plain column values keyed by id, and the
 * workspace's net-carb rule (as netCarbRuleOf); ids not visible drop out. Answered from the rows kept under the
 * stamp the actor was read with when it still holds them all; otherwise one round trip, which also reads the stamp
 * those rows belong to (same statement, same snapshot) and keeps them under it.
 */
async function loadForCalc(
  em: EntityManager,
  actor: Actor,
  ids: readonly number[],
): Promise<{ found: Map<number, NutritionIngredient>; rule: NetCarbRule }> {
  const kept = calcRows.get(actor.workspaceId, actor.nutritionVersion, ids);
  if (kept) return kept;
  const unique = [...new Set(ids)];
  const rows = await preparedRows<Omit<CalcRow, 'id'> & { id: number | null; netCarbRule: string; nutritionVersion: string | null }>(
    em,
    'trayline_calc_ingredients',
    `select w.net_carb_rule as "netCarbRule", ns.version::text as "nutritionVersion", ${CALC_COLUMNS}
       from workspace w left join nutrition_stamp ns on ns.workspace_id = w.id
       left join ingredient i on i.id = any($1::int[]) and (i.workspace_id = w.id or i.workspace_id is null)
      where w.id = $2`,
    [unique, actor.workspaceId],
  );
  if (!rows.length) throw new NotFound('Workspace');
  const found = new Map<number, NutritionIngredient>();
  for (const r of rows) if (r.id !== null) found.set(r.id, frozenFacts(r as CalcRow));
  const rule = toNetCarbRule(rows[0].netCarbRule);
  calcRows.set(actor.workspaceId, rows[0].nutritionVersion, rule, unique, found);
  return { found, rule };
}

/** Forgets the kept calculation rows (tests that compare a cold read with a kept one). */
export function forgetCalcRows(): void {
  calcRows.clear();
}

/** computeRecipeForActor for input already checked by recipeCalcSchema (the route validates the body once). */
export async function computeParsedRecipeForActor(em: EntityManager, actor: Actor, parsed: RecipeCalcValues): Promise<RecipeCalcDto> {
  const { found, rule } = await loadForCalc(em, actor, parsed.items.map((i) => i.ingredientId));
  const errors: Record<string, string[]> = {};
  parsed.items.forEach((item, i) => {
    if (!found.has(item.ingredientId)) errors[`items.${i}.ingredientId`] = [`No ingredient with id ${item.ingredientId} in your library`];
  });
  if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);

  const lines: RecipeLine[] = parsed.items.map((item) => ({
    ingredient: found.get(item.ingredientId)!,
    amount: item.amount,
    unit: item.unit,
  }));
  let exact: ReturnType<typeof computeRecipeExact>;
  try {
    // Computed once; only when a line cannot be converted is each line tried alone, to name every bad line.
    exact = computeRecipeExact(lines, { portions: parsed.portions, yieldFactor: parsed.yieldFactor, netCarbRule: rule });
  } catch (first) {
    if (!(first instanceof UnitConversionError)) throw first;
    lines.forEach((line, i) => {
      try {
        computeRecipeExact([line]);
      } catch (e) {
        if (!(e instanceof UnitConversionError)) throw e;
        errors[`items.${i}.unit`] = [`${e.message} Add it to the ingredient, or use grams.`];
      }
    });
    if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);
    throw first;
  }
  return {
    total: toNutrientNumbers(exact.total),
    perPortion: toNutrientNumbers(exact.perPortion),
    portions: exact.portions,
    yieldFactor: exact.yieldFactor.toNumber(),
    netCarbRule: rule.kind,
    lines: parsed.items.map((item, i) => ({
      ingredientId: item.ingredientId,
      name: exact.lines[i].ingredient,
      amount: Number(item.amount), // exact decimal text (recipeCalcSchema): the nearest number, as Decimal#toNumber gives
      unit: item.unit,
      grams: exact.lines[i].grams.toDecimalPlaces(2).toNumber(),
    })),
  };
}

// ---------------------------------------------------------------------------------------------------------------
// Library
// ---------------------------------------------------------------------------------------------------------------

function escapeLike(q: string): string {
  return q.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export async function listIngredients(em: EntityManager, actor: Actor, query: IngredientListQuery): Promise<IngredientListDto> {
  const q = ingredientListQuerySchema.parse(query);
  const and: FilterQuery<IIngredient>[] = [];
  if (q.scope === 'mine') and.push({ workspace: actor.workspaceId } as FilterQuery<IIngredient>);
  else if (q.scope === 'shared') and.push({ workspace: null } as FilterQuery<IIngredient>);
  else and.push(visibleTo(actor));
  if (q.q) and.push({ name: { $ilike: `%${escapeLike(q.q)}%` } });
  if (q.category) and.push({ category: q.category });
  const desc = q.sort.startsWith('-');
  const field = (desc ? q.sort.slice(1) : q.sort) as keyof IIngredient;
  const dir = desc ? 'desc' : 'asc';
  const orderBy =
    field === 'name' ? [{ name: dir }, { id: 'asc' }] : [{ [field]: dir }, { name: 'asc' }, { id: 'asc' }];
  const [rows, total] = await em.findAndCount(Ingredient, { $and: and } as FilterQuery<IIngredient>, {
    orderBy: orderBy as never,
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  });
  const rule = await netCarbRuleOf(em, actor.workspaceId);
  return { items: rows.map((r) => presentIngredient(r, actor, rule)), total, page: q.page, pageSize: q.pageSize, netCarbRule: rule.kind };
}

async function findOne(em: EntityManager, actor: Actor, id: number): Promise<IIngredient> {
  const row = (await findVisible(em, actor, [id])).get(id);
  if (!row) throw new NotFound('Ingredient');
  return row;
}

/** An own row the coach may change; a shared row is 403 (with the copy hint), another workspace's 404. */
async function findEditable(em: EntityManager, actor: Actor, id: number): Promise<IIngredient> {
  const row = await findOne(em, actor, id);
  if (isShared(row)) throw new Forbidden(SHARED_READ_ONLY);
  if (!isOwnedBy(row, actor)) throw new NotFound('Ingredient');
  return row;
}

export async function getIngredient(em: EntityManager, actor: Actor, id: number): Promise<IngredientDto> {
  const row = await findOne(em, actor, id);
  return presentIngredient(row, actor, await netCarbRuleOf(em, actor.workspaceId));
}

/** Column values of an entity row from validated input (decimals stay strings). */
export function rowData(v: IngredientValues) {
  return {
    name: v.name,
    category: v.category,
    kcal: v.kcal,
    fatG: v.fatG,
    satFatG: v.satFatG,
    proteinG: v.proteinG,
    carbsG: v.carbsG,
    fiberG: v.fiberG,
    sugarsG: v.sugarsG,
    erythritolG: v.erythritolG,
    alluloseG: v.alluloseG,
    otherPolyolsG: v.otherPolyolsG,
    sodiumMg: v.sodiumMg,
    densityGPerMl: v.densityGPerMl,
    densitySource: v.densitySource,
    pieceWeights: Object.fromEntries(v.pieceWeights.map((p) => [p.name, Number(p.grams)])),
    allergens: [...v.allergens],
    purchaseAmount: v.purchase?.amount ?? null,
    purchaseUnit: v.purchase ? v.purchase.unit.trim() : null,
    purchaseLabel: v.purchase?.label ?? null,
    priceCents: v.priceCents,
    aisle: v.aisle,
    source: v.source,
    note: v.note,
  };
}

/** Own-library names in use (lower case), optionally without one row. */
export async function ownNames(em: EntityManager, actor: Actor, exceptId?: number): Promise<Set<string>> {
  const rows = await em.find(Ingredient, { workspace: actor.workspaceId }, { fields: ['id', 'name'] });
  return new Set(rows.filter((r) => r.id !== exceptId).map((r) => r.name.trim().toLowerCase()));
}

async function checkName(em: EntityManager, actor: Actor, name: string, exceptId?: number) {
  if ((await ownNames(em, actor, exceptId)).has(name.trim().toLowerCase())) {
    throw ValidationError.field('name', `Your library already has "${name}"`);
  }
}

export async function createIngredient(em: EntityManager, actor: Actor, v: IngredientValues): Promise<IngredientDto> {
  await checkName(em, actor, v.name);
  const row = em.create(Ingredient, { ...rowData(v), workspace: actor.workspaceId, provenance: 'workspace' });
  await em.flush();
  return presentIngredient(row, actor, await netCarbRuleOf(em, actor.workspaceId));
}

export async function updateIngredient(
  em: EntityManager,
  actor: Actor,
  id: number,
  v: IngredientUpdateValues,
): Promise<IngredientDto> {
  const row = await findEditable(em, actor, id);
  const rule = await netCarbRuleOf(em, actor.workspaceId);
  if (row.version !== v.version) throw new StaleEdit(row.version, presentIngredient(row, actor, rule));
  await checkName(em, actor, v.name, row.id);
  em.assign(row, rowData(v));
  await em.flush();
  return presentIngredient(row, actor, rule);
}

/** Deletes an own row; 409 when a base tray (or anything else) still references it. */
export async function deleteIngredient(em: EntityManager, actor: Actor, id: number): Promise<void> {
  const row = await findEditable(em, actor, id);
  try {
    await em.transactional(async (tx) => {
      await tx.nativeDelete(Ingredient, { id: row.id });
    });
  } catch (e) {
    if (e instanceof ForeignKeyConstraintViolationException) {
      const users = await usersOf(em, actor.workspaceId, row.id);
      throw new Conflict(`"${row.name}" cannot be deleted while ${users.words} ${users.count === 1 ? 'uses' : 'use'} it: take it out there first.`, {
        code: 'in_use',
      });
    }
    throw e;
  }
  em.clear();
}

/** The base trays and plates that name an ingredient, in words ("base tray "A" and plate "B""); a few, then a count. */
async function usersOf(em: EntityManager, workspaceId: number, ingredientId: number): Promise<{ words: string; count: number }> {
  const rows = await em.getConnection().execute<{ kind: 'tray' | 'plate'; name: string }[]>(
    `select distinct 'tray' as kind, t.name from tray_line l join tray t on t.id = l.tray_id where l.ingredient_id = ? and t.workspace_id = ?
     union
     select distinct 'plate' as kind, a.name from assembly_item ai join assembly a on a.id = ai.assembly_id where ai.ingredient_id = ? and a.workspace_id = ?
     order by kind desc, name asc`,
    [ingredientId, workspaceId, ingredientId, workspaceId],
  );
  if (!rows.length) return { words: 'a base tray or a plate', count: 1 };
  const named = rows.slice(0, 3).map((r) => `${r.kind === 'tray' ? 'base tray' : 'plate'} "${r.name}"`);
  const more = rows.length - named.length;
  const words = more > 0 ? `${named.join(', ')} and ${more} more` : named.length > 1 ? `${named.slice(0, -1).join(', ')} and ${named[named.length - 1]}` : named[0];
  return { words, count: rows.length };
}

/** "Copy to my library": a workspace-own copy of a shared (or own) row, named "<name> (copy)" when taken. */
export async function copyIngredient(em: EntityManager, actor: Actor, id: number): Promise<IngredientDto> {
  const src = await findOne(em, actor, id);
  const names = await ownNames(em, actor);
  let name = src.name;
  for (let n = 1; names.has(name.toLowerCase()); n++) name = `${src.name} (copy${n > 1 ? ` ${n}` : ''})`;
  const row = em.create(Ingredient, {
    workspace: actor.workspaceId,
    slug: null,
    name: name.slice(0, 160),
    category: src.category,
    kcal: src.kcal,
    fatG: src.fatG,
    satFatG: src.satFatG,
    proteinG: src.proteinG,
    carbsG: src.carbsG,
    fiberG: src.fiberG,
    sugarsG: src.sugarsG,
    erythritolG: src.erythritolG,
    alluloseG: src.alluloseG,
    otherPolyolsG: src.otherPolyolsG,
    sodiumMg: src.sodiumMg,
    densityGPerMl: src.densityGPerMl,
    densitySource: src.densitySource,
    pieceWeights: { ...(src.pieceWeights ?? {}) },
    allergens: [...(src.allergens ?? [])],
    purchaseAmount: src.purchaseAmount,
    purchaseUnit: src.purchaseUnit,
    purchaseLabel: src.purchaseLabel,
    priceCents: src.priceCents,
    aisle: src.aisle,
    source: src.source,
    // The copy is the workspace's own from now on; its source text still says where the values came from.
    provenance: 'workspace',
    fdcId: src.fdcId,
    note: src.note,
  });
  await em.flush();
  return presentIngredient(row, actor, await netCarbRuleOf(em, actor.workspaceId));
}
