import type { DemoContext } from './demo-seed.js';
import { Ingredient } from '../../modules/ingredients/ingredient.entity.js';
import { PantryItem } from '../../modules/shopping/pantry.entity.js';
import { toShoppingIngredient } from '../../modules/shopping/shopping-ingredient.js';
import { baseUnitOf, toBaseAmount } from '@shared/domain/shopping.js';
import { UnitConversionError } from '@shared/domain/units.js';

/**
 * DEMO DATA — what the invented "Oat & Ember Prep (demo)" kitchen has on the shelf, so the demo shopping list shows
 * the pantry being subtracted. Amounts are invented; each is stored in the ingredient's shopping base unit.
 */
const DEMO_PANTRY: { slug: string; amount: string; unit: string }[] = [
  { slug: 'egg-whole', amount: '6', unit: 'large' },
  { slug: 'butter-unsalted', amount: '8', unit: 'oz' },
  { slug: 'heavy-cream', amount: '1', unit: 'cup' },
  { slug: 'olive-oil', amount: '500', unit: 'ml' },
];

export async function seedDemoPantry({ em, workspace }: DemoContext): Promise<void> {
  const rows = await em.find(Ingredient, { slug: { $in: DEMO_PANTRY.map((p) => p.slug) }, workspace: null });
  const bySlug = new Map(rows.map((r) => [r.slug, r]));
  for (const p of DEMO_PANTRY) {
    const row = bySlug.get(p.slug);
    if (!row) continue;
    const ing = toShoppingIngredient(row);
    let amount: string;
    try {
      amount = toBaseAmount(p.amount, p.unit, ing).toDecimalPlaces(4).toFixed(4);
    } catch (e) {
      if (e instanceof UnitConversionError) continue;
      throw e;
    }
    em.create(PantryItem, { workspace, ingredient: row, amount, unit: baseUnitOf(ing).unit });
  }
  await em.flush();
}
