import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ALLERGEN_CODES, type AllergenCode } from '@shared/domain/allergens.js';
import { computeRecipeExact, type NetCarbRule, type NutritionIngredient, type RecipeExact } from '@shared/domain/nutrition.js';
import { toGrams, UnitConversionError } from '@shared/domain/units.js';
import { ValidationError } from '../../http/errors.js';
import type { Actor } from '../../http/authz.js';
import { Ingredient } from '../ingredients/ingredient.entity.js';
import { loadNutritionIngredients, netCarbRuleOf as workspaceNetCarbRule } from '../ingredients/ingredient.service.js';

/** What a tray needs to know about one ingredient: its facts for nutrition, allergens and price. */
export interface TrayIngredient {
  id: number;
  name: string;
  facts: NutritionIngredient;
  allergens: AllergenCode[];
  priceCents: number | null;
  purchaseAmount: string | null;
  purchaseUnit: string | null;
}

/**
 * The ingredients the actor's workspace may use (shared reference rows and its own), by id, through the
 * ingredient library's service. Ids that are missing or belong to another workspace are simply absent from
 * the map (the caller names the line).
 */
export async function loadTrayIngredients(
  em: EntityManager,
  actor: Actor,
  ids: readonly number[],
): Promise<Map<number, TrayIngredient>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  // The package size is not part of LoadedIngredient: read it beside (for the cost per portion), as plain rows
  // (hydrating the same ingredients twice made the second load merge into every entity).
  const purchase: { id: number; purchaseAmount: string | null; purchaseUnit: string | null }[] = await em
    .createQueryBuilder(Ingredient)
    .select(['id', 'purchaseAmount', 'purchaseUnit'])
    .where({ id: { $in: unique } })
    .execute('all');
  const packs = new Map(purchase.map((r) => [r.id, r]));
  let loaded: Awaited<ReturnType<typeof loadNutritionIngredients>>;
  try {
    loaded = await loadNutritionIngredients(em, actor, unique);
  } catch (e) {
    if (!(e instanceof ValidationError)) throw e;
    // Some ids are not usable: load the rest, leave those out.
    const usable = unique.filter((id) => packs.has(id));
    loaded = new Map();
    for (const id of usable) {
      try {
        const one = await loadNutritionIngredients(em, actor, [id]);
        for (const [k, v] of one) loaded.set(k, v);
      } catch (inner) {
        if (!(inner instanceof ValidationError)) throw inner;
      }
    }
  }
  return new Map(
    [...loaded.values()].map((ing) => {
      const { id, allergens, priceCents, ...facts } = ing;
      const pack = packs.get(id);
      return [
        id,
        {
          id,
          name: facts.name,
          facts,
          allergens,
          priceCents,
          purchaseAmount: pack?.purchaseAmount ?? null,
          purchaseUnit: pack?.purchaseUnit ?? null,
        },
      ];
    }),
  );
}

export async function netCarbRuleOf(em: EntityManager, actor: Actor): Promise<NetCarbRule> {
  return workspaceNetCarbRule(em, actor.workspaceId);
}

export interface LineForNutrition {
  ingredientId: number;
  amount: Decimal.Value;
  unit: string;
}

/** Grams of one line, or null when the ingredient lacks the fact its unit needs. */
export function gramsOfLine(line: LineForNutrition, ing: TrayIngredient | undefined): Decimal | null {
  if (!ing) return null;
  try {
    return toGrams(line.amount, line.unit, ing.facts);
  } catch (e) {
    if (e instanceof UnitConversionError) return null;
    throw e;
  }
}

/** Exact nutrition of a tray, or null when a line cannot be turned into grams. */
export function trayNutrition(
  lines: readonly LineForNutrition[],
  ingredients: Map<number, TrayIngredient>,
  opts: { portions: number; yieldFactor: Decimal.Value; rule: NetCarbRule },
): RecipeExact | null {
  if (lines.some((l) => gramsOfLine(l, ingredients.get(l.ingredientId)) === null)) return null;
  return computeRecipeExact(
    lines.map((l) => ({ ingredient: ingredients.get(l.ingredientId)!.facts, amount: l.amount, unit: l.unit })),
    { portions: opts.portions, yieldFactor: opts.yieldFactor, netCarbRule: opts.rule },
  );
}

/** The union of the lines' allergens, in display order. Derived, never typed. */
export function trayAllergens(lines: readonly LineForNutrition[], ingredients: Map<number, TrayIngredient>): AllergenCode[] {
  const present = new Set<AllergenCode>();
  for (const l of lines) for (const a of ingredients.get(l.ingredientId)?.allergens ?? []) present.add(a);
  return ALLERGEN_CODES.filter((c) => present.has(c));
}

export interface TrayCost {
  /** Whole-tray cost in cents (exact), or null when an ingredient has no usable price. */
  totalCents: Decimal | null;
  unpriced: string[];
}

/** Cost of a tray: each line's grams ÷ grams of one purchase unit × its price. */
export function trayCost(lines: readonly LineForNutrition[], ingredients: Map<number, TrayIngredient>): TrayCost {
  let total = new Decimal(0);
  const unpriced: string[] = [];
  for (const l of lines) {
    const ing = ingredients.get(l.ingredientId);
    const grams = gramsOfLine(l, ing);
    if (!ing || grams === null) continue;
    let perPurchase: Decimal | null = null;
    if (ing.priceCents !== null && ing.purchaseAmount && ing.purchaseUnit) {
      try {
        perPurchase = toGrams(ing.purchaseAmount, ing.purchaseUnit, ing.facts);
      } catch (e) {
        if (!(e instanceof UnitConversionError)) throw e;
      }
    }
    if (!perPurchase || perPurchase.lte(0)) {
      if (!unpriced.includes(ing.name)) unpriced.push(ing.name);
      continue;
    }
    total = total.plus(grams.div(perPurchase).times(ing.priceCents!));
  }
  return { totalCents: unpriced.length ? null : total, unpriced };
}
