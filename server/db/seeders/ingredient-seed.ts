import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { IngredientCategoryCode, StoreAisleCode } from '@shared/schemas/ingredients.schema.js';
import { Ingredient, type IIngredient } from '../../modules/ingredients/ingredient.entity.js';
import { SEED_INGREDIENTS, type SeedIngredient } from './data/ingredients.data.js';

/** numeric(12,4) as PostgreSQL returns it, so an unchanged value is not written again. */
const d4 = (v: number) => new Decimal(v).toFixed(4);

/** Column values of a shared reference row. */
export function referenceRow(s: SeedIngredient) {
  // The seed's category and aisle must be codes the API accepts (checked by the compiler here).
  const category: IngredientCategoryCode = s.category;
  const aisle: StoreAisleCode = s.aisle;
  return {
    slug: s.slug,
    name: s.name,
    category,
    kcal: d4(s.kcal),
    fatG: d4(s.fatG),
    satFatG: d4(s.satFatG),
    proteinG: d4(s.proteinG),
    carbsG: d4(s.carbsG),
    fiberG: d4(s.fiberG),
    sugarsG: d4(s.sugarsG),
    erythritolG: d4(s.erythritolG),
    alluloseG: d4(s.alluloseG),
    otherPolyolsG: d4(s.otherPolyolsG),
    sodiumMg: d4(s.sodiumMg),
    densityGPerMl: s.densityGPerMl === null ? null : d4(s.densityGPerMl),
    densitySource: s.densitySource,
    pieceWeights: { ...s.pieceWeights },
    allergens: [...s.allergens],
    purchaseAmount: d4(s.purchase.size),
    purchaseUnit: String(s.purchase.unit),
    purchaseLabel: s.purchase.label,
    priceCents: s.priceCents ?? null,
    aisle,
    source: s.source,
    provenance: s.provenance,
    fdcId: s.fdcId,
    note: s.note ?? null,
  };
}

/**
 * Shared reference ingredients (workspace null), upserted by slug on every start: new slugs are created,
 * changed values are updated, rows whose values did not change are left alone. Rows are never deleted here
 * (a base tray may use one).
 */
export async function seedReferenceIngredients(em: EntityManager, seeds: readonly SeedIngredient[] = SEED_INGREDIENTS) {
  const existing = await em.find(Ingredient, { slug: { $in: seeds.map((s) => s.slug) } });
  const bySlug = new Map(existing.map((r) => [r.slug!, r] as const));
  for (const seed of seeds) {
    const data = referenceRow(seed);
    const row = bySlug.get(seed.slug);
    if (!row) em.create(Ingredient, { ...data, workspace: null });
    else if (changed(row, data)) em.assign(row, data);
  }
  await em.flush();
}

/** JSON with object keys sorted (PostgreSQL's jsonb does not keep key order). */
function canonical(v: unknown): string {
  if (v === undefined || v === null) return 'null';
  if (Array.isArray(v)) return `[${v.map(canonical).join(',')}]`;
  if (typeof v === 'object') {
    const o = v as Record<string, unknown>;
    return `{${Object.keys(o).sort().map((k) => `${JSON.stringify(k)}:${canonical(o[k])}`).join(',')}}`;
  }
  return JSON.stringify(v);
}

function changed(row: IIngredient, data: ReturnType<typeof referenceRow>): boolean {
  return Object.entries(data).some(([k, v]) => canonical((row as Record<string, unknown>)[k]) !== canonical(v));
}
