import Decimal from 'decimal.js';
import { isAllergenCode, type AllergenCode } from '@shared/domain/allergens.js';
import { atwaterCheck, netCarbs, type NetCarbRule, type NutritionIngredient } from '@shared/domain/nutrition.js';
import type { IngredientCategoryCode, IngredientDto, StoreAisleCode } from '@shared/schemas/ingredients.schema.js';
import type { Actor } from '../../http/authz.js';
import type { IIngredient } from './ingredient.entity.js';

const num = (v: string | number | null | undefined): number => (v === null || v === undefined ? 0 : Number(v));

function workspaceIdOf(row: IIngredient): number | null {
  const ws = row.workspace as unknown as { id?: number } | number | null | undefined;
  if (ws === null || ws === undefined) return null;
  return typeof ws === 'number' ? ws : (ws.id ?? null);
}

/** A shared reference row (seeded, workspace null): read-only for everyone. */
export function isShared(row: IIngredient): boolean {
  return workspaceIdOf(row) === null;
}

export function isOwnedBy(row: IIngredient, actor: Actor): boolean {
  return workspaceIdOf(row) === actor.workspaceId;
}

/** The stored row as the nutrition domain reads it (decimal strings go to decimal.js as they are). */
export function toNutritionIngredient(
  row: Pick<IIngredient, 'name' | 'densityGPerMl' | 'pieceWeights' | keyof NutritionIngredient['per100g']>,
): NutritionIngredient {
  return {
    name: row.name,
    densityGPerMl: row.densityGPerMl ?? null,
    pieceWeights: row.pieceWeights ?? {},
    per100g: {
      kcal: row.kcal,
      fatG: row.fatG,
      satFatG: row.satFatG,
      proteinG: row.proteinG,
      carbsG: row.carbsG,
      fiberG: row.fiberG,
      sugarsG: row.sugarsG,
      erythritolG: row.erythritolG,
      alluloseG: row.alluloseG,
      otherPolyolsG: row.otherPolyolsG,
      sodiumMg: row.sodiumMg,
    },
  };
}

export function allergensOf(row: IIngredient): AllergenCode[] {
  return (row.allergens ?? []).filter(isAllergenCode);
}

export function presentIngredient(row: IIngredient, actor: Actor, rule: NetCarbRule): IngredientDto {
  const polyols = new Decimal(row.erythritolG).plus(row.otherPolyolsG).plus(row.alluloseG);
  const net = netCarbs(row, rule);
  return {
    id: row.id,
    slug: row.slug ?? null,
    name: row.name,
    category: row.category as IngredientCategoryCode,
    shared: isShared(row),
    editable: actor.role === 'coach' && isOwnedBy(row, actor),
    per100g: {
      kcal: num(row.kcal),
      fatG: num(row.fatG),
      satFatG: num(row.satFatG),
      proteinG: num(row.proteinG),
      carbsG: num(row.carbsG),
      fiberG: num(row.fiberG),
      sugarsG: num(row.sugarsG),
      erythritolG: num(row.erythritolG),
      alluloseG: num(row.alluloseG),
      otherPolyolsG: num(row.otherPolyolsG),
      polyolsG: polyols.toDecimalPlaces(4).toNumber(),
      netCarbsG: net.toDecimalPlaces(4).toNumber(),
      sodiumMg: num(row.sodiumMg),
    },
    densityGPerMl: row.densityGPerMl === null || row.densityGPerMl === undefined ? null : Number(row.densityGPerMl),
    densitySource: row.densitySource ?? null,
    pieceWeights: Object.fromEntries(Object.entries(row.pieceWeights ?? {}).map(([k, v]) => [k, Number(v)])),
    allergens: allergensOf(row),
    purchase:
      row.purchaseAmount && row.purchaseUnit
        ? { amount: Number(row.purchaseAmount), unit: row.purchaseUnit, label: row.purchaseLabel ?? '' }
        : null,
    priceCents: row.priceCents ?? null,
    aisle: (row.aisle ?? null) as StoreAisleCode | null,
    source: row.source,
    provenance: row.provenance ?? null,
    fdcId: row.fdcId ?? null,
    note: row.note ?? null,
    atwater: atwaterCheck(row),
    netCarbRule: rule.kind,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
  };
}
