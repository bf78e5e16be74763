import type { EntityManager } from '@mikro-orm/postgresql';
import type { FilterQuery } from '@mikro-orm/core';
import Decimal from 'decimal.js';
import { baseUnitOf, type ShoppingIngredient } from '@shared/domain/shopping.js';
import { formatMass, formatPieces, unitKind } from '@shared/domain/units.js';
import type { Actor } from '../../http/authz.js';
import { Ingredient, type IIngredient } from '../ingredients/ingredient.entity.js';

/** A library row with what the shopping list reads: facts, purchase unit, price (cents) and aisle. */
export interface ShoppingRow extends ShoppingIngredient {
  rowId: number;
}

function kindOf(unit: string): 'mass' | 'volume' | 'count' | null {
  try {
    return unitKind(unit);
  } catch {
    return null;
  }
}

/**
 * The library row as the shopping domain reads it. An ingredient whose purchase unit is a piece (12 × "large")
 * is counted in that piece; anything else is counted in grams. Prices stay in cents.
 */
export function toShoppingIngredient(row: IIngredient): ShoppingRow {
  const purchaseUnit = row.purchaseUnit?.trim() || null;
  const countBought = purchaseUnit !== null && kindOf(purchaseUnit) === 'count';
  return {
    rowId: row.id,
    id: String(row.id),
    name: row.name,
    densityGPerMl: row.densityGPerMl ?? null,
    pieceWeights: row.pieceWeights ?? {},
    aisle: row.aisle ?? null,
    buyBy: countBought ? 'count' : 'mass',
    countPiece: countBought ? purchaseUnit : null,
    purchase:
      row.purchaseAmount && purchaseUnit && kindOf(purchaseUnit)
        ? {
            label: row.purchaseLabel?.trim() || `${Number(row.purchaseAmount)} ${purchaseUnit}`,
            size: row.purchaseAmount,
            unit: purchaseUnit,
            // The domain prices a package in currency units ('3.99'); the library stores cents.
            price: row.priceCents === null || row.priceCents === undefined ? null : new Decimal(row.priceCents).div(100),
          }
        : null,
  };
}

/** Library rows the actor may use (own workspace or shared reference rows), by id. Missing ids are absent. */
export async function loadShoppingIngredients(
  em: EntityManager,
  actor: Actor,
  ids: readonly number[],
): Promise<Map<number, ShoppingRow>> {
  const unique = [...new Set(ids)];
  if (!unique.length) return new Map();
  const rows = await em.find(Ingredient, {
    $and: [{ id: { $in: unique } }, { $or: [{ workspace: actor.workspaceId }, { workspace: null }] }],
  } as FilterQuery<IIngredient>);
  return new Map(rows.map((r) => [r.id, toShoppingIngredient(r)]));
}

/** An amount in the base unit in kitchen words: "2 lb 3 oz" / "1.2 kg", or "36 large". */
export function baseAmountText(amount: Decimal.Value, ingredient: ShoppingIngredient, system: 'us' | 'metric' = 'us'): string {
  const base = baseUnitOf(ingredient);
  if (base.kind === 'count') return formatPieces(amount, base.unit).text;
  return formatMass(amount, system).text;
}
