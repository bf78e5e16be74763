import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ALLERGEN_CODES, type AllergenCode } from '@shared/domain/allergens.js';
import { computeRecipeExact, type NetCarbRule, type NutritionIngredient, type RecipeExact } from '@shared/domain/nutrition.js';
import { toGrams, UnitConversionError } from '@shared/domain/units.js';
import type { Actor } from '../../http/authz.js';
import { loadUsableIngredients, netCarbRuleOf as workspaceNetCarbRule, type UsableIngredient } from '../ingredients/ingredient.service.js';

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
  return toTrayIngredients(await loadUsableIngredients(em, actor, ids));
}

/** Library rows in the shape trays and plates read them. */
export function toTrayIngredients(loaded: Map<number, UsableIngredient>): Map<number, TrayIngredient> {
  return new Map(
    [...loaded.values()].map((ing) => {
      const { id, allergens, priceCents, purchaseAmount, purchaseUnit, ...facts } = ing;
      return [id, { id, name: facts.name, facts, allergens, priceCents, purchaseAmount, purchaseUnit }];
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
