/**
 * The shopping list: needs in any units are added up into one unit per ingredient (grams, or pieces for
 * count-bought items such as eggs), the pantry is subtracted (never below zero), the rest is rounded up to whole
 * purchase units (36 eggs → 3 dozen; 30 oz of an 8 oz package → 4 packages, 2 oz spare), priced, and grouped by
 * aisle. Inputs are plain objects; quantities come back as exact Decimals for the presenter to round.
 */
import Decimal from 'decimal.js';
import { pieceWeightOf, toGrams, unitKind, type IngredientFacts, type UnitCode } from './units';
import { compareNames } from './words';

/** How the store sells one package: `{ label: 'dozen', size: 12, unit: 'large', price: '4.29' }`. */
export interface PurchaseUnit {
  label: string;
  /** How much one package holds, in `unit`. */
  size: Decimal.Value;
  /** Any unit the ingredient's facts can turn into its base: 'oz', 'lb', 'g', 'quart' (with density), a piece. */
  unit: UnitCode;
  /** Price of one package, in the workspace currency. */
  price?: Decimal.Value | null;
}

export interface ShoppingIngredient extends IngredientFacts {
  id: string;
  /** Store aisle ("Dairy", "Produce"); missing → "Other". */
  aisle?: string | null;
  /** `mass` (default): counted in grams. `count`: counted in pieces of `countPiece` (eggs, avocados). */
  buyBy?: 'mass' | 'count';
  /** The piece a count-bought item is counted in (default `each`), e.g. `large` for eggs. */
  countPiece?: string | null;
  purchase?: PurchaseUnit | null;
}

/** One need from the week's plan (a recipe line × trays), in any unit. */
export interface ShoppingNeed {
  ingredientId: string;
  amount: Decimal.Value;
  unit: UnitCode;
}

/** What is already on hand. */
export interface PantryStock {
  ingredientId: string;
  amount: Decimal.Value;
  unit: UnitCode;
}

/** The unit an ingredient is added up in: grams, or a piece name. */
export type BaseUnit = { kind: 'mass'; unit: 'g' } | { kind: 'count'; unit: string };

export interface PurchaseResult {
  label: string;
  /** Package size in the purchase unit, and in the base unit. */
  size: Decimal;
  unit: UnitCode;
  sizeInBase: Decimal;
  packages: number;
  /** Bought beyond what is needed, in the base unit and in the purchase unit. */
  spare: Decimal;
  spareInPurchaseUnit: Decimal;
}

export interface ShoppingItem {
  ingredientId: string;
  name: string;
  aisle: string;
  base: BaseUnit;
  /** All needs added up, in the base unit. */
  needed: Decimal;
  /** Stock on hand, in the base unit. */
  inPantry: Decimal;
  /** The part of the need the pantry covers: min(needed, inPantry). */
  fromPantry: Decimal;
  /** needed − fromPantry, never below zero. */
  toBuy: Decimal;
  /** Null when the ingredient has no purchase unit: buy `toBuy` as is. */
  purchase: PurchaseResult | null;
  /** packages × price; null when there is no purchase unit or no price. */
  cost: Decimal | null;
}

export interface AisleGroup {
  aisle: string;
  items: ShoppingItem[];
}

export interface ShoppingList {
  items: ShoppingItem[];
  aisles: AisleGroup[];
  /** Sum of the known costs. */
  totalCost: Decimal;
  /** False when some item to buy has no price, so `totalCost` is a lower bound. */
  costComplete: boolean;
}

export interface ShoppingInput {
  needs: readonly ShoppingNeed[];
  ingredients: readonly ShoppingIngredient[];
  pantry?: readonly PantryStock[];
  /** Aisles in store order; aisles not listed follow alphabetically, then "Other". */
  aisleOrder?: readonly string[];
}

export const OTHER_AISLE = 'Other';

/** A need or a pantry row names an ingredient that was not given. */
export class UnknownIngredientError extends Error {
  readonly code = 'unknown_ingredient' as const;
  constructor(readonly ingredientId: string) {
    super(`No ingredient with id "${ingredientId}" was given to the shopping list.`);
    this.name = 'UnknownIngredientError';
  }
}

/**
 * Packages are rounded up after rounding the exact ratio to 9 decimals, so a need of exactly 3 packages that
 * decimal arithmetic computes as 3.000…01 stays 3.
 */
const PACKAGE_RATIO_DECIMALS = 9;

export function baseUnitOf(ingredient: ShoppingIngredient): BaseUnit {
  if (ingredient.buyBy === 'count') {
    return { kind: 'count', unit: (ingredient.countPiece ?? 'each').trim().toLowerCase() || 'each' };
  }
  return { kind: 'mass', unit: 'g' };
}

/**
 * An amount in the ingredient's base unit. For count-bought items the count piece passes straight through;
 * any other unit goes through grams (needs the ingredient's facts; throws UnitConversionError otherwise).
 */
export function toBaseAmount(amount: Decimal.Value, unit: UnitCode, ingredient: ShoppingIngredient): Decimal {
  const base = baseUnitOf(ingredient);
  if (base.kind === 'mass') return toGrams(amount, unit, ingredient);
  unitKind(unit);
  if (unit.trim().toLowerCase() === base.unit) return new Decimal(amount);
  return toGrams(amount, unit, ingredient as IngredientFacts).div(pieceWeightOf(ingredient, base.unit));
}

/**
 * Whole packages for `toBuy` (in the base unit): ceil(toBuy ÷ package size). A need of 0 buys 0 packages.
 */
export function roundUpToPurchase(toBuy: Decimal.Value, purchase: PurchaseUnit, ingredient: ShoppingIngredient): PurchaseResult {
  const need = new Decimal(toBuy);
  const size = new Decimal(purchase.size);
  if (!size.isFinite() || size.lte(0)) {
    throw new RangeError(`The purchase unit "${purchase.label}" of ${ingredient.name} needs a size above 0.`);
  }
  const sizeInBase = toBaseAmount(size, purchase.unit, ingredient);
  const ratio = need.div(sizeInBase).toDecimalPlaces(PACKAGE_RATIO_DECIMALS, Decimal.ROUND_HALF_UP);
  const packages = Decimal.max(ratio.ceil(), 0).toNumber();
  const spare = sizeInBase.times(packages).minus(need);
  return {
    label: purchase.label,
    size,
    unit: purchase.unit,
    sizeInBase,
    packages,
    spare,
    spareInPurchaseUnit: spare.div(sizeInBase).times(size),
  };
}

/** Adds up rows per ingredient id, in each ingredient's base unit. */
export function aggregateByIngredient(
  rows: readonly { ingredientId: string; amount: Decimal.Value; unit: UnitCode }[],
  byId: ReadonlyMap<string, ShoppingIngredient>,
): Map<string, Decimal> {
  const totals = new Map<string, Decimal>();
  for (const row of rows) {
    const ingredient = byId.get(row.ingredientId);
    if (!ingredient) throw new UnknownIngredientError(row.ingredientId);
    const amount = new Decimal(row.amount);
    if (!amount.isFinite() || amount.lt(0)) {
      throw new RangeError(`An amount of ${ingredient.name} must be at least 0 (got ${amount.toString()}).`);
    }
    const inBase = toBaseAmount(amount, row.unit, ingredient);
    totals.set(row.ingredientId, (totals.get(row.ingredientId) ?? new Decimal(0)).plus(inBase));
  }
  return totals;
}

/** Groups items by aisle in store order (listed aisles first, others alphabetically, "Other" last). */
export function groupByAisle(items: readonly ShoppingItem[], aisleOrder: readonly string[] = []): AisleGroup[] {
  const groups = new Map<string, ShoppingItem[]>();
  for (const item of items) groups.set(item.aisle, [...(groups.get(item.aisle) ?? []), item]);
  const rank = (aisle: string) => {
    const i = aisleOrder.findIndex((a) => a.toLowerCase() === aisle.toLowerCase());
    if (i >= 0) return [0, i] as const;
    return aisle === OTHER_AISLE ? ([2, 0] as const) : ([1, 0] as const);
  };
  return [...groups.entries()]
    .sort(([a], [b]) => {
      const [ra, ia] = rank(a);
      const [rb, ib] = rank(b);
      return ra - rb || ia - ib || compareNames(a, b);
    })
    .map(([aisle, list]) => ({ aisle, items: [...list].sort((x, y) => compareNames(x.name, y.name)) }));
}

/** The whole shopping list from the week's needs, the ingredients, and the pantry. */
export function buildShoppingList(input: ShoppingInput): ShoppingList {
  const byId = new Map(input.ingredients.map((i) => [i.id, i] as const));
  const needed = aggregateByIngredient(input.needs, byId);
  const stock = aggregateByIngredient(input.pantry ?? [], byId);
  const items: ShoppingItem[] = [];
  for (const [id, need] of needed) {
    const ingredient = byId.get(id)!;
    const inPantry = stock.get(id) ?? new Decimal(0);
    const fromPantry = Decimal.min(need, inPantry);
    const toBuy = need.minus(fromPantry);
    const purchase = ingredient.purchase ? roundUpToPurchase(toBuy, ingredient.purchase, ingredient) : null;
    const price = ingredient.purchase?.price;
    const cost = purchase && price !== null && price !== undefined && price !== '' ? new Decimal(price).times(purchase.packages) : null;
    items.push({
      ingredientId: id,
      name: ingredient.name,
      aisle: ingredient.aisle?.trim() || OTHER_AISLE,
      base: baseUnitOf(ingredient),
      needed: need,
      inPantry,
      fromPantry,
      toBuy,
      purchase,
      cost,
    });
  }
  const toPay = items.filter((i) => i.toBuy.gt(0));
  return {
    items,
    aisles: groupByAisle(items, input.aisleOrder),
    totalCost: toPay.reduce((sum, i) => sum.plus(i.cost ?? 0), new Decimal(0)),
    costComplete: toPay.every((i) => i.cost !== null),
  };
}
