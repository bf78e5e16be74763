import type { DemoContext } from './demo-seed.js';
import { Ingredient } from '../../modules/ingredients/ingredient.entity.js';

/**
 * DEMO DATA — two workspace-own ingredients of the invented "Oat & Ember Prep (demo)" kitchen, so the library
 * shows the coach's own rows beside the shared ones. The values are invented for the demo, not a real product:
 * the source text says so.
 */
export async function seedDemoIngredients({ em, workspace }: DemoContext): Promise<void> {
  const common = { workspace, provenance: 'workspace', densitySource: null, note: 'Demo data.' };
  em.create(Ingredient, {
    ...common,
    name: 'House herb salt (demo)',
    category: 'herbs-spices',
    kcal: '40',
    fatG: '1',
    satFatG: '0.1',
    proteinG: '1.5',
    carbsG: '8',
    fiberG: '3',
    sugarsG: '0.5',
    sodiumMg: '30000',
    densityGPerMl: '1.1',
    densitySource: 'weighed in the demo kitchen: 1 tsp = 5.4 g (invented demo value)',
    pieceWeights: {},
    allergens: [],
    purchaseAmount: '8',
    purchaseUnit: 'oz',
    purchaseLabel: '8 oz jar (made in-house)',
    priceCents: 250,
    aisle: 'spices',
    source: 'Invented demo values (a house blend of salt and dried herbs), not a real product',
  });
  em.create(Ingredient, {
    ...common,
    name: 'Maple-flavoured allulose syrup (demo)',
    category: 'sweeteners',
    kcal: '25',
    fatG: '0',
    satFatG: '0',
    proteinG: '0',
    carbsG: '70',
    fiberG: '0',
    sugarsG: '0',
    alluloseG: '70',
    sodiumMg: '40',
    densityGPerMl: '1.3',
    densitySource: 'invented demo value',
    pieceWeights: {},
    allergens: [],
    purchaseAmount: '12',
    purchaseUnit: 'floz',
    purchaseLabel: '12 fl oz bottle',
    priceCents: 899,
    aisle: 'health-food',
    source: 'Invented demo values (allulose counted at 0.4 kcal/g, FDA allulose guidance 2020), not a real product',
  });
  await em.flush();
}
