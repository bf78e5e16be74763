import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ALLERGEN_CODES, type AllergenCode } from '@shared/domain/allergens.js';
import {
  addSums,
  nutrientsForGrams,
  scaleSums,
  toNutrientNumbers,
  toVector,
  zeroSums,
  type NetCarbRule,
  type NutrientSums,
  type NutrientVector,
} from '@shared/domain/nutrition.js';
import { portionsOf } from '@shared/domain/tray-plan.js';
import type { PlateMacrosDto } from '@shared/schemas/assemblies.schema.js';
import type { Actor } from '../../http/authz.js';
import { preparedRows } from '../../db/prepared.js';
import { cutPlanOf } from '../trays/tray.presenter.js';
import {
  gramsOfLine,
  loadTrayIngredients,
  netCarbRuleOf,
  toTrayIngredients,
  trayAllergens,
  trayNutrition,
  type TrayIngredient,
} from '../trays/tray-nutrition.js';
import type { IAssembly } from './assembly.entity.js';
import { loadUsableIngredientsWhere } from '../ingredients/ingredient.service.js';
import { pureMemo } from '../../lib/pure-memo.js';

/**
 * What plates and the week board need to know about base trays and add-ons, loaded in a fixed number of queries
 * (trays with lines, ingredients, the net-carb rule) whatever the number of plates: no N+1.
 */
export interface TrayFacts {
  id: number;
  name: string;
  fridgeDays: number;
  freezerWeeks: number;
  portionsPerTray: number | null;
  /** Nutrients of one portion, or null when a line cannot be weighed. */
  perPortion: NutrientSums | null;
  allergens: AllergenCode[];
  terms: string[];
  reheatSteps: string[];
  archived: boolean;
}

export interface PlateContext {
  rule: NetCarbRule;
  trays: Map<number, TrayFacts>;
  ingredients: Map<number, TrayIngredient>;
}

export interface PlateFacts {
  id: number;
  vector: NutrientVector;
  macros: PlateMacrosDto;
  complete: boolean;
  allergens: AllergenCode[];
  terms: string[];
  trays: { trayId: number; portions: string }[];
}

/** One part of a plate as plate facts read it (an AssemblyItem entity or a plain row). */
export interface PlateItemRow {
  id: number;
  position: number;
  tray?: { id: number } | null;
  portions?: string | null;
  ingredient?: { id: number } | null;
  amountText: string;
  amount?: string | null;
  unit: string;
  note?: string | null;
}

/** A plate as the week board reads it: a plain row with its items in order (no entity hydration). */
export interface PlateRow {
  id: number;
  name: string;
  description?: string | null;
  assemblySteps?: string[] | null;
  reheatSteps?: string[] | null;
  archived?: boolean;
  version: number;
  updatedAt: Date;
  items: PlateItemRow[];
}

export type PlateLike = IAssembly | PlateRow;

export function itemsOf(a: PlateLike): PlateItemRow[] {
  const items: readonly PlateItemRow[] = Array.isArray(a.items) ? a.items : (a as IAssembly).items.getItems();
  return [...items].sort((x, y) => x.position - y.position);
}

/** A tray as plate facts read it: a plain row with its lines in order (no entity hydration). */
export interface TrayRow {
  id: number;
  name: string;
  fridgeDays: number;
  freezerWeeks: number;
  cutKind: string;
  cutRows: number | null;
  cutColumns: number | null;
  cutPieces: number | null;
  yieldFactor: string;
  tags: string[] | null;
  reheatSteps: string[] | null;
  archived: boolean;
  lines: { ingredientId: number; amount: string; unit: string }[];
}

/** A tray row with its lines in order (one statement: the lines come aggregated as JSON). */
const TRAY_ROW_SELECT = `select t.id, t.name, t.fridge_days as "fridgeDays", t.freezer_weeks as "freezerWeeks", t.cut_kind as "cutKind",
         t.cut_rows as "cutRows", t.cut_columns as "cutColumns", t.cut_pieces as "cutPieces", t.yield_factor as "yieldFactor",
         t.tags, t.reheat_steps as "reheatSteps", t.archived,
         coalesce((select json_agg(json_build_object('ingredientId', l.ingredient_id, 'amount', l.amount::text, 'unit', l.unit)
                                   order by l.position asc, l.id asc)
                     from tray_line l where l.tray_id = t.id), '[]') as lines
    from tray t`;

async function loadTrayRows(em: EntityManager, workspaceId: number, ids: readonly number[]): Promise<TrayRow[]> {
  if (ids.length === 0) return [];
  return preparedRows<TrayRow>(
    em,
    'trayline_tray_rows',
    `${TRAY_ROW_SELECT} where t.id = any($1::int[]) and t.workspace_id = $2 order by t.id asc`,
    [[...new Set(ids)], workspaceId],
  );
}

/**
 * The trays a workspace's plates use plus those a week counts (`$1` workspace, `$2` week or null): the scope of
 * the week board's plate context, resolved in SQL so trays and ingredients are read in the same round as the plates.
 */
const BOARD_TRAY_SCOPE = `select ai.tray_id from assembly_item ai join assembly a on a.id = ai.assembly_id
                           where a.workspace_id = $1 and ai.tray_id is not null
                          union
                          select wt.tray_id from week_tray wt join week w on w.id = wt.week_id
                           where wt.week_id = $2 and w.workspace_id = $1`;

/**
 * The plate context of every plate of the workspace and of a week's tray counts, in one round of three statements
 * side by side (trays with their lines, the ingredients they and the add-ons name), whatever the number of plates.
 */
export async function loadWorkspacePlateContext(
  em: EntityManager,
  workspaceId: number,
  weekId: number | null,
  rule: NetCarbRule | Promise<NetCarbRule>,
): Promise<PlateContext> {
  const [trays, ingredients, r] = await Promise.all([
    preparedRows<TrayRow>(
      em,
      'trayline_board_trays',
      `${TRAY_ROW_SELECT} where t.workspace_id = $1 and t.id in (${BOARD_TRAY_SCOPE}) order by t.id asc`,
      [workspaceId, weekId],
    ),
    loadUsableIngredientsWhere(
      em,
      'trayline_board_ingredients',
      `select l.ingredient_id from tray_line l join tray t on t.id = l.tray_id
        where t.workspace_id = $1 and t.id in (${BOARD_TRAY_SCOPE})
       union
       select ai.ingredient_id from assembly_item ai join assembly a on a.id = ai.assembly_id
        where a.workspace_id = $1 and ai.ingredient_id is not null`,
      1,
      [workspaceId, weekId],
    ).then(toTrayIngredients),
    rule,
  ]);
  return { rule: r, ingredients, trays: new Map(trays.map((t) => [t.id, trayFacts(t, ingredients, r)])) };
}

/**
 * A tray's facts, memoized on everything they are computed from: the tray row with its lines, each line's library
 * row, and the net-carb rule (a board load computes every tray's nutrition with decimal.js otherwise).
 */
export const trayFacts: (t: TrayRow, ingredients: Map<number, TrayIngredient>, rule: NetCarbRule) => TrayFacts = pureMemo(
  computeTrayFacts,
  (t, ingredients, rule) => JSON.stringify([t, t.lines.map((l) => ingredients.get(l.ingredientId) ?? null), rule]),
  2000,
);

export function computeTrayFacts(t: TrayRow, ingredients: Map<number, TrayIngredient>, rule: NetCarbRule): TrayFacts {
  let portionsPerTray: number | null;
  try {
    portionsPerTray = portionsOf(cutPlanOf(t));
  } catch {
    portionsPerTray = null;
  }
  const lines = t.lines;
  const recipe = portionsPerTray ? trayNutrition(lines, ingredients, { portions: portionsPerTray, yieldFactor: t.yieldFactor, rule }) : null;
  const names = lines.map((l) => ingredients.get(l.ingredientId)?.name).filter((n): n is string => !!n);
  return {
    id: t.id,
    name: t.name,
    fridgeDays: t.fridgeDays,
    freezerWeeks: t.freezerWeeks,
    portionsPerTray,
    perPortion: recipe ? recipe.perPortion : null,
    // Frozen: the memo shares these between requests.
    allergens: Object.freeze(trayAllergens(lines, ingredients)) as AllergenCode[],
    terms: Object.freeze([t.name, ...(t.tags ?? []), ...names]) as string[],
    reheatSteps: Object.freeze([...(t.reheatSteps ?? [])]) as string[],
    archived: t.archived,
  };
}

/** Loads the trays and ingredients of these plates (plus `extraTrayIds`, e.g. a week's tray counts). */
export async function loadPlateContext(
  em: EntityManager,
  actor: Actor,
  assemblies: readonly PlateLike[],
  extraTrayIds: readonly number[] = [],
): Promise<PlateContext> {
  const items = assemblies.flatMap(itemsOf);
  const trayIds = [...new Set([...items.filter((i) => i.tray).map((i) => i.tray!.id), ...extraTrayIds])];
  const [trays, rule] = await Promise.all([loadTrayRows(em, actor.workspaceId, trayIds), netCarbRuleOf(em, actor)]);
  const ingredientIds = [
    ...trays.flatMap((t) => t.lines.map((l) => l.ingredientId)),
    ...items.filter((i) => i.ingredient).map((i) => i.ingredient!.id),
  ];
  const ingredients = await loadTrayIngredients(em, actor, ingredientIds);
  return { rule, ingredients, trays: new Map(trays.map((t) => [t.id, trayFacts(t, ingredients, rule)])) };
}

const r1 = (d: Decimal) => d.toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber();

export function macrosOf(v: NutrientVector): PlateMacrosDto {
  return { kcal: r1(v.kcal), fatG: r1(v.fatG), proteinG: r1(v.proteinG), carbsG: r1(v.carbsG), fiberG: r1(v.fiberG), netCarbsG: r1(v.netCarbsG) };
}

/** Add-on grams, or null when the ingredient lacks the fact its unit needs. */
export function addOnGrams(item: PlateItemRow, ctx: PlateContext): Decimal | null {
  if (!item.ingredient || item.amount === null || item.amount === undefined) return null;
  return gramsOfLine({ ingredientId: item.ingredient.id, amount: item.amount, unit: item.unit }, ctx.ingredients.get(item.ingredient.id));
}

/** Facts computed for a context, per plate: a board asks for the same plate's facts several times. */
const factsMemo = new WeakMap<PlateContext, WeakMap<PlateLike, PlateFacts>>();

/**
 * A number per tray-facts object. Tray facts come from the `trayFacts` memo, so one object stands for one content:
 * a plate's key can name its trays by these numbers instead of their whole content.
 */
const trayFactNumbers = new WeakMap<TrayFacts, number>();
let lastTrayFactNumber = 0;
function trayFactNumber(t: TrayFacts): number {
  let n = trayFactNumbers.get(t);
  if (n === undefined) trayFactNumbers.set(t, (n = ++lastTrayFactNumber));
  return n;
}

/** Everything computePlateFacts reads: the plate's name and items, its trays' facts, its add-ons' rows, the rule. */
function plateFactsKey(a: PlateLike, ctx: PlateContext): string {
  const items = itemsOf(a).map((i) => {
    if (i.tray) {
      const t = ctx.trays.get(i.tray.id);
      return ['tray', i.tray.id, i.portions ?? null, t ? trayFactNumber(t) : null];
    }
    if (i.ingredient) return ['add-on', i.ingredient.id, i.amount ?? null, i.unit, ctx.ingredients.get(i.ingredient.id) ?? null];
    return ['none'];
  });
  return JSON.stringify([a.id, a.name, items, ctx.rule]);
}

/** Plate facts memoized on everything they are computed from (see plateFactsKey), across requests. */
const memoPlateFacts: (a: PlateLike, ctx: PlateContext) => PlateFacts = pureMemo(computePlateFacts, plateFactsKey, 5000);

/** A plate's nutrients (sum of tray portions and add-ons), allergens and dislike terms (computed once per context). */
export function plateFacts(a: PlateLike, ctx: PlateContext): PlateFacts {
  let memo = factsMemo.get(ctx);
  if (!memo) factsMemo.set(ctx, (memo = new WeakMap()));
  let f = memo.get(a);
  if (!f) memo.set(a, (f = memoPlateFacts(a, ctx)));
  return f;
}

export function computePlateFacts(a: PlateLike, ctx: PlateContext): PlateFacts {
  let sums = zeroSums();
  let complete = true;
  const allergens = new Set<AllergenCode>();
  const terms: string[] = [a.name];
  const trays: PlateFacts['trays'] = [];
  for (const item of itemsOf(a)) {
    if (item.tray) {
      const t = ctx.trays.get(item.tray.id);
      const portions = new Decimal(item.portions ?? 1);
      if (!t) {
        complete = false;
        continue;
      }
      trays.push({ trayId: t.id, portions: portions.toString() });
      t.allergens.forEach((x) => allergens.add(x));
      terms.push(...t.terms);
      if (t.perPortion) sums = addSums(sums, scaleSums(t.perPortion, portions));
      else complete = false;
    } else if (item.ingredient) {
      const ing = ctx.ingredients.get(item.ingredient.id);
      const grams = addOnGrams(item, ctx);
      if (!ing || grams === null) {
        complete = false;
        continue;
      }
      ing.allergens.forEach((x) => allergens.add(x));
      terms.push(ing.name);
      sums = addSums(sums, nutrientsForGrams(ing.facts.per100g, grams));
    }
  }
  const vector = toVector(sums, ctx.rule);
  // Frozen: the memo shares these between requests.
  return {
    id: a.id,
    vector: Object.freeze(vector),
    macros: Object.freeze(macrosOf(vector)),
    complete,
    allergens: Object.freeze(ALLERGEN_CODES.filter((c) => allergens.has(c))) as AllergenCode[],
    terms: Object.freeze([...new Set(terms)]) as string[],
    trays: Object.freeze(trays.map((t) => Object.freeze(t))) as PlateFacts['trays'],
  };
}

export { toNutrientNumbers };
