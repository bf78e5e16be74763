/**
 * Trayline's seeded ingredient library: plain data, loaded into PostgreSQL by the seeder.
 *
 * Every nutrient is per 100 g of edible portion, US style:
 * - `carbsG` is total carbohydrate by difference (21 CFR 101.9(c)(6)); it INCLUDES fibre, sugar alcohols and
 *   allulose. `sugarsG` excludes sugar alcohols and allulose (FDA allulose guidance, 2020).
 * - `erythritolG`, `alluloseG` and `otherPolyolsG` are parts of `carbsG`.
 *
 * Where the numbers come from (`provenance`, and the `source` text of each item says the same in words):
 * - `usda-fdc-verified`: USDA FoodData Central SR Legacy rows whose values and FDC ids were read from the data
 *   files (shared reference "published-values", section 5). `fdcId` is set only for these.
 * - `usda-sr28-verified`: SR28 values read in the same way, but no FDC id was found.
 * - `usda-sr28-public-copy`: energy, fat, saturated fat, protein, carbohydrate, fibre and sodium read from a
 *   public copy of USDA SR28 data; sugars are from memory; the FDC id was not looked up.
 * - `usda-sr-from-memory`: USDA SR values recalled from memory, not verified.
 * - `label-from-memory`: typical package-label values recalled from memory (brands differ: read the label).
 * - `defined-composition`: a pure substance whose composition follows from its definition and a regulatory
 *   energy factor (erythritol, allulose, xylitol, maltitol).
 *
 * `priceCents` are illustrative demo values (typical US grocery prices, not quotes). Densities come from USDA
 * portion weights (grams in one cup, tablespoon or teaspoon divided by that volume in mL) or from package
 * serving sizes; `densitySource` names which, and says "from memory" when it was not read.
 *
 * Allergens use the nine US major food allergens (FALCPA 2004 + FASTER Act 2021). Coconut is NOT listed as a
 * tree nut: FDA's current guidance no longer treats it as one (from memory; the earlier FDA list included it).
 * Highly refined oils (e.g. soybean oil in mayonnaise) are exempt from allergen labelling under FALCPA.
 * Products vary: these codes are defaults for planning; the package label always wins.
 */
import type { AllergenCode } from '@shared/domain/allergens.js';
import type { UnitCode } from '@shared/domain/units.js';

export type IngredientCategory =
  | 'eggs'
  | 'dairy'
  | 'meat'
  | 'fish'
  | 'vegetables'
  | 'fruit'
  | 'nuts-seeds-flours'
  | 'fats-oils'
  | 'sweeteners'
  | 'wraps-breads'
  | 'condiments'
  | 'herbs-spices'
  | 'baking'
  | 'drinks'
  | 'other';

export const INGREDIENT_CATEGORIES: readonly IngredientCategory[] = [
  'eggs', 'dairy', 'meat', 'fish', 'vegetables', 'fruit', 'nuts-seeds-flours', 'fats-oils', 'sweeteners',
  'wraps-breads', 'condiments', 'herbs-spices', 'baking', 'drinks', 'other',
];

/** Store aisles, for grouping the shopping list the way a store is laid out. */
export type StoreAisle =
  | 'produce'
  | 'dairy-eggs'
  | 'meat-deli'
  | 'bakery'
  | 'baking'
  | 'canned-jarred'
  | 'condiments'
  | 'spices'
  | 'frozen'
  | 'health-food'
  | 'oils';

export const STORE_AISLES: readonly StoreAisle[] = [
  'produce', 'dairy-eggs', 'meat-deli', 'bakery', 'baking', 'canned-jarred', 'condiments', 'spices', 'frozen',
  'health-food', 'oils',
];

export type ValueProvenance =
  | 'usda-fdc-verified'
  | 'usda-sr28-verified'
  | 'usda-sr28-public-copy'
  | 'usda-sr-from-memory'
  | 'label-from-memory'
  | 'defined-composition';

/** How the ingredient is bought: `size` of `unit` (a unit code or one of the item's piece names). */
export interface SeedPurchase {
  unit: UnitCode;
  size: number;
  label: string;
}

export interface SeedIngredient {
  /** Stable kebab-case id. */
  slug: string;
  name: string;
  category: IngredientCategory;
  // Per 100 g edible portion.
  kcal: number;
  fatG: number;
  satFatG: number;
  proteinG: number;
  /** Total carbohydrate by difference (includes fibre, sugar alcohols and allulose). */
  carbsG: number;
  fiberG: number;
  sugarsG: number;
  erythritolG: number;
  alluloseG: number;
  /** Sugar alcohols other than erythritol (xylitol, maltitol, …). */
  otherPolyolsG: number;
  sodiumMg: number;
  /** Grams per millilitre; null where a volume measure is not meaningful (whole cuts, blocks). */
  densityGPerMl: number | null;
  /** Where the density comes from; null when `densityGPerMl` is null. */
  densitySource: string | null;
  /** Grams of one named piece, e.g. `{ large: 50 }` for eggs. Empty when none is meaningful. */
  pieceWeights: Record<string, number>;
  allergens: AllergenCode[];
  purchase: SeedPurchase;
  /** Illustrative demo price, in US cents, of one package as described by `purchase` (e.g. the dozen eggs). */
  priceCents?: number;
  aisle: StoreAisle;
  /** Where the nutrient values come from, in words ("from memory" where they were recalled, not read). */
  source: string;
  provenance: ValueProvenance;
  /** FoodData Central id, only where it was verified (shared reference "published-values", section 5). */
  fdcId: number | null;
  note?: string;
}

// US customary volumes in mL (NIST Handbook 44, exact): 1 cup = 8 fl oz, 1 tbsp = 1/2 fl oz, 1 tsp = 1/6 fl oz.
const CUP_ML = 236.5882365;
const TBSP_ML = 14.78676478125;
const TSP_ML = 4.92892159375;

/** Density in g/mL from a portion weight, rounded to 0.001. */
function perMl(grams: number, ml: number): number {
  return Math.round((grams / ml) * 1000) / 1000;
}
const cup = (grams: number) => perMl(grams, CUP_ML);
const tbsp = (grams: number) => perMl(grams, TBSP_ML);
const tsp = (grams: number) => perMl(grams, TSP_ML);

const NO_POLYOLS = { erythritolG: 0, alluloseG: 0, otherPolyolsG: 0 } as const;

const SR_COPY = 'kcal, macros, fibre, sat fat and sodium read from a public SR28-derived copy; sugars from memory; FDC id not verified';
const LABEL = 'package label, typical values from memory';

export const SEED_INGREDIENTS: SeedIngredient[] = [
  // ---------------------------------------------------------------------------------------------------------
  // Eggs
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'egg-whole', name: 'Eggs, whole, raw', category: 'eggs',
    kcal: 143, fatG: 9.51, satFatG: 3.126, proteinG: 12.56, carbsG: 0.72, fiberG: 0, sugarsG: 0.37, ...NO_POLYOLS, sodiumMg: 142,
    densityGPerMl: cup(243), densitySource: 'USDA SR portion "1 cup (4.86 large eggs)" = 243 g (published-values §5b)',
    pieceWeights: { large: 50, 'extra large': 56, jumbo: 63, medium: 44, small: 38 },
    allergens: ['egg'], purchase: { unit: 'large', size: 12, label: 'dozen large eggs' }, priceCents: 399, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 171287 (NDB 01123)', provenance: 'usda-fdc-verified', fdcId: 171287,
  },
  {
    slug: 'egg-white', name: 'Egg whites, raw', category: 'eggs',
    kcal: 52, fatG: 0.17, satFatG: 0, proteinG: 10.9, carbsG: 0.73, fiberG: 0, sugarsG: 0.71, ...NO_POLYOLS, sodiumMg: 166,
    densityGPerMl: cup(243), densitySource: 'USDA SR portion 1 cup = 243 g (from memory)',
    pieceWeights: { large: 33 },
    allergens: ['egg'], purchase: { unit: 'oz', size: 16, label: '16 oz carton liquid egg whites' }, priceCents: 449, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01124): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Piece weight "large" = white of one large egg, USDA SR portion from memory.',
  },
  {
    slug: 'egg-yolk', name: 'Egg yolks, raw', category: 'eggs',
    kcal: 322, fatG: 26.54, satFatG: 9.551, proteinG: 15.86, carbsG: 3.59, fiberG: 0, sugarsG: 0.56, ...NO_POLYOLS, sodiumMg: 48,
    densityGPerMl: cup(243), densitySource: 'USDA SR portion 1 cup = 243 g (from memory)',
    pieceWeights: { large: 17 },
    allergens: ['egg'], purchase: { unit: 'large', size: 12, label: 'dozen large eggs (yolks separated)' }, priceCents: 399, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01125): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Bought as whole eggs: one large egg gives one 17 g yolk (USDA SR portion, from memory).',
  },

  // ---------------------------------------------------------------------------------------------------------
  // Dairy
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'heavy-cream', name: 'Heavy whipping cream', category: 'dairy',
    kcal: 340, fatG: 36.08, satFatG: 23.032, proteinG: 2.84, carbsG: 2.74, fiberG: 0, sugarsG: 2.92, ...NO_POLYOLS, sodiumMg: 27,
    densityGPerMl: cup(238), densitySource: 'USDA SR portion "1 cup, fluid" = 238 g (published-values §5b)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'pint', size: 1, label: '1 pint carton (16 fl oz)' }, priceCents: 449, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 170859 (NDB 01053)', provenance: 'usda-fdc-verified', fdcId: 170859,
    note: 'USDA lists sugars (2.92 g, analysed) above carbohydrate by difference (2.74 g); kept as published.',
  },
  {
    slug: 'half-and-half', name: 'Half and half', category: 'dairy',
    kcal: 123, fatG: 10.39, satFatG: 7.032, proteinG: 3.13, carbsG: 4.73, fiberG: 0, sugarsG: 4.13, ...NO_POLYOLS, sodiumMg: 61,
    densityGPerMl: cup(242), densitySource: 'USDA SR portion 1 cup = 242 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'pint', size: 1, label: '1 pint carton' }, priceCents: 299, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01049): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'cream-cheese', name: 'Cream cheese', category: 'dairy',
    kcal: 350, fatG: 34.44, satFatG: 20.213, proteinG: 6.15, carbsG: 5.52, fiberG: 0, sugarsG: 3.76, ...NO_POLYOLS, sodiumMg: 314,
    densityGPerMl: cup(232), densitySource: 'USDA SR portion 1 cup = 232 g (published-values §5b)',
    pieceWeights: { block: 226.8 },
    allergens: ['milk'], purchase: { unit: 'oz', size: 8, label: '8 oz block' }, priceCents: 299, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 173418 (NDB 01017)', provenance: 'usda-fdc-verified', fdcId: 173418,
  },
  {
    slug: 'butter-salted', name: 'Butter, salted', category: 'dairy',
    kcal: 717, fatG: 81.11, satFatG: 51.368, proteinG: 0.85, carbsG: 0.06, fiberG: 0, sugarsG: 0.06, ...NO_POLYOLS, sodiumMg: 643,
    densityGPerMl: cup(227), densitySource: 'USDA SR portion 1 cup = 227 g (published-values §5b)',
    pieceWeights: { stick: 113, pat: 5 },
    allergens: ['milk'], purchase: { unit: 'lb', size: 1, label: '1 lb (4 sticks)' }, priceCents: 549, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 173410 (NDB 01001)', provenance: 'usda-fdc-verified', fdcId: 173410,
  },
  {
    slug: 'butter-unsalted', name: 'Butter, unsalted', category: 'dairy',
    kcal: 717, fatG: 81.11, satFatG: 50.489, proteinG: 0.85, carbsG: 0.06, fiberG: 0, sugarsG: 0.06, ...NO_POLYOLS, sodiumMg: 11,
    densityGPerMl: cup(227), densitySource: 'USDA SR portion 1 cup = 227 g, as salted butter (published-values §5b)',
    pieceWeights: { stick: 113, pat: 5 },
    allergens: ['milk'], purchase: { unit: 'lb', size: 1, label: '1 lb (4 sticks)' }, priceCents: 549, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01145): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'ghee', name: 'Ghee (clarified butter)', category: 'dairy',
    kcal: 876, fatG: 99.48, satFatG: 61.924, proteinG: 0.28, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: cup(205), densitySource: 'USDA SR portion 1 cup = 205 g for butter oil (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 13, label: '13 oz jar' }, priceCents: 999, aisle: 'oils',
    source: `USDA SR28 "Butter oil, anhydrous" (NDB 01003): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'cheddar', name: 'Cheddar cheese', category: 'dairy',
    kcal: 404, fatG: 33.31, satFatG: 18.867, proteinG: 22.87, carbsG: 3.09, fiberG: 0, sugarsG: 0.48, ...NO_POLYOLS, sodiumMg: 653,
    densityGPerMl: cup(113), densitySource: 'USDA SR portion "1 cup, shredded" = 113 g (published-values §5b)',
    pieceWeights: { slice: 28 },
    allergens: ['milk'], purchase: { unit: 'oz', size: 8, label: '8 oz block or bag, shredded' }, priceCents: 349, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 173414 (NDB 01009)', provenance: 'usda-fdc-verified', fdcId: 173414,
    note: 'Density is for shredded cheese; slice = 1 oz slice, 28 g (USDA portion).',
  },
  {
    slug: 'mozzarella-low-moisture', name: 'Mozzarella, low-moisture, part-skim', category: 'dairy',
    kcal: 295, fatG: 19.78, satFatG: 11.295, proteinG: 23.75, carbsG: 5.58, fiberG: 0, sugarsG: 1.9, ...NO_POLYOLS, sodiumMg: 666,
    densityGPerMl: cup(113), densitySource: 'USDA SR portion "1 cup, shredded" = 113 g (published-values §5b)',
    pieceWeights: { slice: 28 },
    allergens: ['milk'], purchase: { unit: 'oz', size: 16, label: '16 oz bag, shredded' }, priceCents: 499, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 171244 (NDB 01029)', provenance: 'usda-fdc-verified', fdcId: 171244,
  },
  {
    slug: 'mozzarella-part-skim', name: 'Mozzarella, part-skim milk', category: 'dairy',
    kcal: 254, fatG: 15.92, satFatG: 10.114, proteinG: 24.26, carbsG: 2.77, fiberG: 0, sugarsG: 1.13, ...NO_POLYOLS, sodiumMg: 619,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { stick: 28 },
    allergens: ['milk'], purchase: { unit: 'oz', size: 12, label: '12-stick pack (1 oz sticks)' }, priceCents: 549, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 170847 (NDB 01028)', provenance: 'usda-fdc-verified', fdcId: 170847,
    note: 'Stick weight is the 1 oz string-cheese stick of the package (from memory).',
  },
  {
    slug: 'mozzarella-fresh', name: 'Mozzarella, whole milk (fresh)', category: 'dairy',
    kcal: 300, fatG: 22.35, satFatG: 13.152, proteinG: 22.17, carbsG: 2.19, fiberG: 0, sugarsG: 1.03, ...NO_POLYOLS, sodiumMg: 627,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { ball: 227 },
    allergens: ['milk'], purchase: { unit: 'ball', size: 1, label: '8 oz ball' }, priceCents: 499, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01026): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'parmesan-grated', name: 'Parmesan, grated', category: 'dairy',
    kcal: 420, fatG: 27.84, satFatG: 15.371, proteinG: 28.42, carbsG: 13.91, fiberG: 0, sugarsG: 0.07, ...NO_POLYOLS, sodiumMg: 1804,
    densityGPerMl: tbsp(5), densitySource: 'USDA SR portion 1 tbsp = 5 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 8, label: '8 oz shaker' }, priceCents: 449, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01032): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'parmesan-hard', name: 'Parmesan, hard (wedge)', category: 'dairy',
    kcal: 392, fatG: 25.83, satFatG: 16.41, proteinG: 35.75, carbsG: 3.22, fiberG: 0, sugarsG: 0.8, ...NO_POLYOLS, sodiumMg: 1376,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 8, label: '8 oz wedge' }, priceCents: 799, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01033): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'sour-cream', name: 'Sour cream, cultured', category: 'dairy',
    kcal: 198, fatG: 19.35, satFatG: 10.14, proteinG: 2.44, carbsG: 4.63, fiberG: 0, sugarsG: 3.41, ...NO_POLYOLS, sodiumMg: 31,
    densityGPerMl: cup(230), densitySource: 'USDA SR portion 1 cup = 230 g (published-values §5b)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 16, label: '16 oz tub' }, priceCents: 279, aisle: 'dairy-eggs',
    source: 'USDA FoodData Central SR Legacy, FDC 171257 (NDB 01056)', provenance: 'usda-fdc-verified', fdcId: 171257,
  },
  {
    slug: 'cottage-cheese', name: 'Cottage cheese, 4% milkfat', category: 'dairy',
    kcal: 98, fatG: 4.3, satFatG: 1.718, proteinG: 11.12, carbsG: 3.38, fiberG: 0, sugarsG: 2.67, ...NO_POLYOLS, sodiumMg: 364,
    densityGPerMl: cup(210), densitySource: 'USDA SR portion 1 cup (large curd) = 210 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 16, label: '16 oz tub' }, priceCents: 349, aisle: 'dairy-eggs',
    source: `USDA SR28 "Cheese, cottage, creamed" (NDB 01012): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'greek-yogurt-whole', name: 'Greek yogurt, plain, whole milk', category: 'dairy',
    kcal: 97, fatG: 5, satFatG: 2.4, proteinG: 9, carbsG: 3.98, fiberG: 0, sugarsG: 4, ...NO_POLYOLS, sodiumMg: 35,
    densityGPerMl: cup(227), densitySource: 'package label 3/4 cup = 170 g, so 1 cup = 227 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 32, label: '32 oz tub' }, priceCents: 699, aisle: 'dairy-eggs',
    source: 'USDA SR Legacy values from memory ("Yogurt, Greek, plain, whole milk"), not verified',
    provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'feta', name: 'Feta cheese', category: 'dairy',
    kcal: 264, fatG: 21.28, satFatG: 14.946, proteinG: 14.21, carbsG: 4.09, fiberG: 0, sugarsG: 4.09, ...NO_POLYOLS, sodiumMg: 917,
    densityGPerMl: cup(150), densitySource: 'USDA SR portion 1 cup, crumbled = 150 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 6, label: '6 oz tub, crumbled' }, priceCents: 399, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01019): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'swiss-cheese', name: 'Swiss cheese', category: 'dairy',
    kcal: 393, fatG: 30.99, satFatG: 18.227, proteinG: 26.96, carbsG: 1.44, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 187,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 28 },
    allergens: ['milk'], purchase: { unit: 'oz', size: 8, label: '8 oz pack, sliced' }, priceCents: 449, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01040): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'provolone', name: 'Provolone cheese', category: 'dairy',
    kcal: 351, fatG: 26.62, satFatG: 17.078, proteinG: 25.58, carbsG: 2.14, fiberG: 0, sugarsG: 0.56, ...NO_POLYOLS, sodiumMg: 876,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 28 },
    allergens: ['milk'], purchase: { unit: 'oz', size: 8, label: '8 oz pack, sliced' }, priceCents: 399, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01035): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'monterey-jack', name: 'Monterey Jack cheese', category: 'dairy',
    kcal: 373, fatG: 30.28, satFatG: 19.066, proteinG: 24.48, carbsG: 0.68, fiberG: 0, sugarsG: 0.5, ...NO_POLYOLS, sodiumMg: 600,
    densityGPerMl: cup(113), densitySource: 'USDA SR portion 1 cup, shredded = 113 g (from memory)',
    pieceWeights: { slice: 28 },
    allergens: ['milk'], purchase: { unit: 'oz', size: 8, label: '8 oz block' }, priceCents: 349, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01025): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'ricotta-whole', name: 'Ricotta, whole milk', category: 'dairy',
    kcal: 174, fatG: 12.98, satFatG: 8.295, proteinG: 11.26, carbsG: 3.04, fiberG: 0, sugarsG: 0.27, ...NO_POLYOLS, sodiumMg: 84,
    densityGPerMl: cup(246), densitySource: 'USDA SR portion 1 cup = 246 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 15, label: '15 oz tub' }, priceCents: 399, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01036): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'goat-cheese', name: 'Goat cheese, soft', category: 'dairy',
    kcal: 264, fatG: 21.08, satFatG: 14.575, proteinG: 18.52, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 459,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 4, label: '4 oz log' }, priceCents: 399, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01159): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'blue-cheese', name: 'Blue cheese', category: 'dairy',
    kcal: 353, fatG: 28.74, satFatG: 18.669, proteinG: 21.4, carbsG: 2.34, fiberG: 0, sugarsG: 0.5, ...NO_POLYOLS, sodiumMg: 1146,
    densityGPerMl: cup(135), densitySource: 'USDA SR portion 1 cup, crumbled = 135 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 5, label: '5 oz tub, crumbled' }, priceCents: 399, aisle: 'dairy-eggs',
    source: `USDA SR28 (NDB 01004): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },

  // ---------------------------------------------------------------------------------------------------------
  // Meat
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'bacon-raw', name: 'Bacon, pork, cured, raw', category: 'meat',
    kcal: 417, fatG: 39.69, satFatG: 13.296, proteinG: 12.62, carbsG: 1.28, fiberG: 0, sugarsG: 1, ...NO_POLYOLS, sodiumMg: 662,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { strip: 28, slice: 28 },
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb pack' }, priceCents: 699, aisle: 'meat-deli',
    source: 'USDA FoodData Central SR Legacy, FDC 168277 (NDB 10123)', provenance: 'usda-fdc-verified', fdcId: 168277,
    note: 'About 1/3 of the raw weight remains after baking (published-values §5c, derived).',
  },
  {
    slug: 'bacon-baked', name: 'Bacon, cooked, baked', category: 'meat',
    kcal: 548, fatG: 43.27, satFatG: 14.187, proteinG: 35.73, carbsG: 1.35, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 2193,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { strip: 8.1, slice: 8.1 },
    allergens: [], purchase: { unit: 'oz', size: 2.1, label: '2.1 oz box, fully cooked' }, priceCents: 499, aisle: 'meat-deli',
    source: 'USDA FoodData Central SR Legacy, FDC 167914 (NDB 10860)', provenance: 'usda-fdc-verified', fdcId: 167914,
  },
  {
    slug: 'bacon-pan-fried', name: 'Bacon, pre-sliced, cooked, pan-fried', category: 'meat',
    kcal: 468, fatG: 35.09, satFatG: 11.964, proteinG: 33.92, carbsG: 1.7, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 1684,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { strip: 11.5, slice: 11.5 },
    allergens: [], purchase: { unit: 'oz', size: 2.1, label: '2.1 oz box, fully cooked' }, priceCents: 499, aisle: 'meat-deli',
    source: 'USDA FoodData Central SR Legacy, FDC 168322 (NDB 10862)', provenance: 'usda-fdc-verified', fdcId: 168322,
  },
  {
    slug: 'pork-sausage-raw', name: 'Pork sausage, bulk, raw', category: 'meat',
    kcal: 288, fatG: 24.8, satFatG: 7.57, proteinG: 15.39, carbsG: 0.93, fiberG: 0, sugarsG: 0.93, ...NO_POLYOLS, sodiumMg: 739,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb roll' }, priceCents: 499, aisle: 'meat-deli',
    source: 'USDA SR28 (NDB 07063) as read in published-values §5; FDC id not found', provenance: 'usda-sr28-verified', fdcId: null,
    note: 'Some sausages add milk powder, soy or wheat fillers: check the label.',
  },
  {
    slug: 'pork-sausage-cooked', name: 'Pork sausage, link or patty, cooked, pan-fried', category: 'meat',
    kcal: 325, fatG: 27.25, satFatG: 8.826, proteinG: 18.53, carbsG: 1.42, fiberG: 0, sugarsG: 1.09, ...NO_POLYOLS, sodiumMg: 814,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { patty: 27, link: 23 },
    allergens: [], purchase: { unit: 'oz', size: 12, label: '12 oz pack, fully cooked' }, priceCents: 499, aisle: 'meat-deli',
    source: 'USDA FoodData Central SR Legacy, FDC 174578 (NDB 07064)', provenance: 'usda-fdc-verified', fdcId: 174578,
  },
  {
    slug: 'ground-beef-80-20', name: 'Ground beef, 80% lean / 20% fat, raw', category: 'meat',
    kcal: 254, fatG: 20, satFatG: 7.581, proteinG: 17.17, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 66,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb pack' }, priceCents: 599, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 23572): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'ground-beef-85-15', name: 'Ground beef, 85% lean / 15% fat, raw', category: 'meat',
    kcal: 215, fatG: 15, satFatG: 5.715, proteinG: 18.59, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 66,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb pack' }, priceCents: 699, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 23567): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'ground-pork', name: 'Ground pork, raw', category: 'meat',
    kcal: 263, fatG: 21.19, satFatG: 7.87, proteinG: 16.88, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 56,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb pack' }, priceCents: 449, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 10219): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'pork-belly', name: 'Pork belly, raw', category: 'meat',
    kcal: 518, fatG: 53.01, satFatG: 19.33, proteinG: 9.34, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 32,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 2, label: '2 lb slab' }, priceCents: 1199, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 10005): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'chicken-thigh-boneless', name: 'Chicken thighs, boneless, skinless, raw', category: 'meat',
    kcal: 121, fatG: 4.12, satFatG: 1.097, proteinG: 19.66, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 95,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 2, label: '2 lb family pack' }, priceCents: 799, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 05096): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'chicken-thigh-skin-on', name: 'Chicken thighs, meat and skin, raw', category: 'meat',
    kcal: 221, fatG: 16.61, satFatG: 4.524, proteinG: 16.52, carbsG: 0.25, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 81,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 3, label: '3 lb pack, bone-in' }, priceCents: 699, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 05091): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Values are per 100 g of meat and skin; bone-in packs include bone that is not eaten.',
  },
  {
    slug: 'chicken-breast', name: 'Chicken breast, boneless, skinless, raw', category: 'meat',
    kcal: 120, fatG: 2.62, satFatG: 0.563, proteinG: 22.5, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 45,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 2, label: '2 lb family pack' }, priceCents: 899, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 05062): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'chicken-wings', name: 'Chicken wings, meat and skin, raw', category: 'meat',
    kcal: 191, fatG: 12.85, satFatG: 3.535, proteinG: 17.52, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 84,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 3, label: '3 lb pack' }, priceCents: 999, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 05100): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Values are per 100 g of meat and skin; packs include bone that is not eaten.',
  },
  {
    slug: 'ground-turkey', name: 'Ground turkey, raw', category: 'meat',
    kcal: 148, fatG: 7.66, satFatG: 2.024, proteinG: 19.66, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 58,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb pack' }, priceCents: 549, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 05305): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'deli-turkey', name: 'Turkey breast, deli sliced', category: 'meat',
    kcal: 89, fatG: 1.4, satFatG: 0.4, proteinG: 17.9, carbsG: 1.8, fiberG: 0, sugarsG: 1.8, ...NO_POLYOLS, sodiumMg: 890,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 28 },
    allergens: [], purchase: { unit: 'oz', size: 9, label: '9 oz pack' }, priceCents: 549, aisle: 'meat-deli',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'ham-deli', name: 'Ham, sliced, regular (about 11% fat)', category: 'meat',
    kcal: 163, fatG: 8.6, satFatG: 2.936, proteinG: 16.6, carbsG: 3.83, fiberG: 1.3, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 1143,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 28 },
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz pack, sliced' }, priceCents: 649, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 07029): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Slice weight 28 g is a typical deli slice (from memory).',
  },
  {
    slug: 'salami-hard', name: 'Salami, dry or hard, pork and beef', category: 'meat',
    kcal: 378, fatG: 31.65, satFatG: 11.418, proteinG: 21.07, carbsG: 0.72, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 1756,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 10 },
    allergens: [], purchase: { unit: 'oz', size: 4, label: '4 oz pack, sliced' }, priceCents: 499, aisle: 'meat-deli',
    source: `USDA SR28 "Salami, dry or hard, pork, beef": ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Slice weight 10 g is typical for thin hard salami (from memory).',
  },
  {
    slug: 'pepperoni', name: 'Pepperoni, beef and pork, sliced', category: 'meat',
    kcal: 504, fatG: 46.28, satFatG: 17.708, proteinG: 19.25, carbsG: 1.18, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 1582,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 2 },
    allergens: [], purchase: { unit: 'oz', size: 6, label: '6 oz bag, sliced' }, priceCents: 449, aisle: 'meat-deli',
    source: `USDA SR28 "Pepperoni, beef and pork, sliced": ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Slice weight 2 g is typical for packaged pepperoni (from memory).',
  },
  {
    slug: 'prosciutto', name: 'Prosciutto, sliced', category: 'meat',
    kcal: 250, fatG: 16, satFatG: 5.4, proteinG: 25, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 2300,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 14 },
    allergens: [], purchase: { unit: 'oz', size: 3, label: '3 oz pack' }, priceCents: 599, aisle: 'meat-deli',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'chorizo', name: 'Chorizo, pork and beef (cured)', category: 'meat',
    kcal: 455, fatG: 38.27, satFatG: 14.38, proteinG: 24.1, carbsG: 1.86, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 1235,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 9, label: '9 oz link' }, priceCents: 599, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 07019): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'beef-franks', name: 'Beef frankfurters', category: 'meat',
    kcal: 315, fatG: 28.1, satFatG: 11.46, proteinG: 11.69, carbsG: 2.97, fiberG: 0, sugarsG: 1.3, ...NO_POLYOLS, sodiumMg: 865,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { frank: 45 },
    allergens: [], purchase: { unit: 'frank', size: 8, label: '8-count pack' }, priceCents: 549, aisle: 'meat-deli',
    source: `USDA SR28 "Frankfurter, beef, unheated": ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Frank weight 45 g is typical (from memory); packs differ.',
  },

  // ---------------------------------------------------------------------------------------------------------
  // Fish and shellfish
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'smoked-salmon', name: 'Smoked salmon (chinook)', category: 'fish',
    kcal: 117, fatG: 4.32, satFatG: 0.929, proteinG: 18.28, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 672,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: ['fish'], purchase: { unit: 'oz', size: 4, label: '4 oz pack' }, priceCents: 799, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 15077): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Lox-style cold-smoked salmon is usually saltier; read the label.',
  },
  {
    slug: 'tuna-canned-water', name: 'Tuna, light, canned in water, drained', category: 'fish',
    kcal: 86, fatG: 0.96, satFatG: 0.211, proteinG: 19.44, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 247,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { can: 113 },
    allergens: ['fish'], purchase: { unit: 'can', size: 1, label: '5 oz can (about 4 oz drained)' }, priceCents: 149, aisle: 'canned-jarred',
    source: `USDA SR28 (NDB 15121): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Drained weight of a 5 oz can, about 113 g (label, from memory).',
  },
  {
    slug: 'salmon-atlantic', name: 'Salmon, Atlantic, farmed, raw', category: 'fish',
    kcal: 208, fatG: 13.42, satFatG: 3.05, proteinG: 20.42, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 59,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: ['fish'], purchase: { unit: 'lb', size: 1, label: '1 lb fillet' }, priceCents: 1199, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 15236): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'sardines-oil', name: 'Sardines, canned in oil, drained, with bone', category: 'fish',
    kcal: 208, fatG: 11.45, satFatG: 1.528, proteinG: 24.62, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 307,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { can: 92 },
    allergens: ['fish'], purchase: { unit: 'can', size: 1, label: '3.75 oz can' }, priceCents: 249, aisle: 'canned-jarred',
    source: `USDA SR28 (NDB 15088): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Drained can weight 92 g: USDA portion from memory.',
  },
  {
    slug: 'cod', name: 'Cod, Atlantic, raw', category: 'fish',
    kcal: 82, fatG: 0.67, satFatG: 0.131, proteinG: 17.81, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 54,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: ['fish'], purchase: { unit: 'lb', size: 1, label: '1 lb fillets' }, priceCents: 1099, aisle: 'meat-deli',
    source: `USDA SR28 (NDB 15015): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'shrimp-raw', name: 'Shrimp, raw', category: 'fish',
    kcal: 106, fatG: 1.73, satFatG: 0.328, proteinG: 20.31, carbsG: 0.91, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 148,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: ['crustacean-shellfish'], purchase: { unit: 'lb', size: 1, label: '1 lb bag, peeled, frozen' }, priceCents: 1099, aisle: 'frozen',
    source: 'USDA SR Legacy values from memory (NDB 15149, shrimp, mixed species, raw), not verified',
    provenance: 'usda-sr-from-memory', fdcId: null,
    note: 'Frozen shrimp are often brined with sodium additives; read the label.',
  },

  // ---------------------------------------------------------------------------------------------------------
  // Vegetables
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'spinach', name: 'Spinach, raw', category: 'vegetables',
    kcal: 23, fatG: 0.39, satFatG: 0.063, proteinG: 2.86, carbsG: 3.63, fiberG: 2.2, sugarsG: 0.42, ...NO_POLYOLS, sodiumMg: 79,
    densityGPerMl: cup(30), densitySource: 'USDA SR portion 1 cup = 30 g (published-values §5b)',
    pieceWeights: { bunch: 340 },
    allergens: [], purchase: { unit: 'oz', size: 10, label: '10 oz bag' }, priceCents: 349, aisle: 'produce',
    source: 'USDA FoodData Central SR Legacy, FDC 168462 (NDB 11457)', provenance: 'usda-fdc-verified', fdcId: 168462,
  },
  {
    slug: 'kale', name: 'Kale, raw', category: 'vegetables',
    kcal: 49, fatG: 0.93, satFatG: 0.091, proteinG: 4.28, carbsG: 8.75, fiberG: 3.6, sugarsG: 2.26, ...NO_POLYOLS, sodiumMg: 38,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 10, label: '10 oz bag, chopped' }, priceCents: 349, aisle: 'produce',
    source: `USDA SR28 (NDB 11233): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'zucchini', name: 'Zucchini, with skin, raw', category: 'vegetables',
    kcal: 17, fatG: 0.32, satFatG: 0.084, proteinG: 1.21, carbsG: 3.11, fiberG: 1, sugarsG: 2.5, ...NO_POLYOLS, sodiumMg: 8,
    densityGPerMl: cup(124), densitySource: 'USDA SR portion 1 cup, chopped = 124 g (published-values §5b)',
    pieceWeights: { medium: 196 },
    allergens: [], purchase: { unit: 'lb', size: 1, label: 'sold loose, per lb' }, priceCents: 199, aisle: 'produce',
    source: 'USDA FoodData Central SR Legacy, FDC 169291 (NDB 11477)', provenance: 'usda-fdc-verified', fdcId: 169291,
  },
  {
    slug: 'cauliflower', name: 'Cauliflower, raw', category: 'vegetables',
    kcal: 25, fatG: 0.28, satFatG: 0.13, proteinG: 1.92, carbsG: 4.97, fiberG: 2, sugarsG: 1.91, ...NO_POLYOLS, sodiumMg: 30,
    densityGPerMl: cup(107), densitySource: 'USDA SR portion 1 cup, chopped (1/2 in) = 107 g (published-values §5b)',
    pieceWeights: { head: 588, floweret: 13 },
    allergens: [], purchase: { unit: 'head', size: 1, label: '1 medium head' }, priceCents: 349, aisle: 'produce',
    source: 'USDA FoodData Central SR Legacy, FDC 169986 (NDB 11135)', provenance: 'usda-fdc-verified', fdcId: 169986,
  },
  {
    slug: 'broccoli', name: 'Broccoli, raw', category: 'vegetables',
    kcal: 34, fatG: 0.37, satFatG: 0.039, proteinG: 2.82, carbsG: 6.64, fiberG: 2.6, sugarsG: 1.7, ...NO_POLYOLS, sodiumMg: 33,
    densityGPerMl: cup(91), densitySource: 'USDA SR portion 1 cup, chopped = 91 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb crowns' }, priceCents: 249, aisle: 'produce',
    source: `USDA SR28 (NDB 11090): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'bell-pepper-green', name: 'Bell pepper, green, raw', category: 'vegetables',
    kcal: 20, fatG: 0.17, satFatG: 0.058, proteinG: 0.86, carbsG: 4.64, fiberG: 1.7, sugarsG: 2.4, ...NO_POLYOLS, sodiumMg: 3,
    densityGPerMl: cup(149), densitySource: 'USDA SR portion 1 cup, chopped = 149 g (from memory)',
    pieceWeights: { medium: 119 },
    allergens: [], purchase: { unit: 'medium', size: 1, label: '1 pepper, sold loose' }, priceCents: 99, aisle: 'produce',
    source: `USDA SR28 (NDB 11333): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'bell-pepper-red', name: 'Bell pepper, red, raw', category: 'vegetables',
    kcal: 31, fatG: 0.3, satFatG: 0.027, proteinG: 0.99, carbsG: 6.03, fiberG: 2.1, sugarsG: 4.2, ...NO_POLYOLS, sodiumMg: 4,
    densityGPerMl: cup(149), densitySource: 'USDA SR portion 1 cup, chopped = 149 g (from memory)',
    pieceWeights: { medium: 119 },
    allergens: [], purchase: { unit: 'medium', size: 1, label: '1 pepper, sold loose' }, priceCents: 149, aisle: 'produce',
    source: `USDA SR28 (NDB 11821): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'mushrooms-white', name: 'Mushrooms, white, raw', category: 'vegetables',
    kcal: 22, fatG: 0.34, satFatG: 0.05, proteinG: 3.09, carbsG: 3.26, fiberG: 1, sugarsG: 1.98, ...NO_POLYOLS, sodiumMg: 5,
    densityGPerMl: cup(70), densitySource: 'USDA SR portion 1 cup, sliced = 70 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 8, label: '8 oz package' }, priceCents: 249, aisle: 'produce',
    source: `USDA SR28 (NDB 11260): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'onion-yellow', name: 'Onion, raw', category: 'vegetables',
    kcal: 40, fatG: 0.1, satFatG: 0.042, proteinG: 1.1, carbsG: 9.34, fiberG: 1.7, sugarsG: 4.24, ...NO_POLYOLS, sodiumMg: 4,
    densityGPerMl: cup(160), densitySource: 'USDA SR portion 1 cup, chopped = 160 g (from memory)',
    pieceWeights: { medium: 110 },
    allergens: [], purchase: { unit: 'lb', size: 3, label: '3 lb bag' }, priceCents: 399, aisle: 'produce',
    source: `USDA SR28 (NDB 11282): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'garlic', name: 'Garlic, raw', category: 'vegetables',
    kcal: 149, fatG: 0.5, satFatG: 0.089, proteinG: 6.36, carbsG: 33.06, fiberG: 2.1, sugarsG: 1, ...NO_POLYOLS, sodiumMg: 17,
    densityGPerMl: tsp(2.8), densitySource: 'USDA SR portion 1 tsp = 2.8 g (from memory)',
    pieceWeights: { clove: 3, head: 40 },
    allergens: [], purchase: { unit: 'head', size: 3, label: '3-head net bag' }, priceCents: 199, aisle: 'produce',
    source: `USDA SR28 (NDB 11215): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Clove 3 g is the USDA portion; head weight 40 g is typical (from memory).',
  },
  {
    slug: 'asparagus', name: 'Asparagus, raw', category: 'vegetables',
    kcal: 20, fatG: 0.12, satFatG: 0.04, proteinG: 2.2, carbsG: 3.88, fiberG: 2.1, sugarsG: 1.88, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: cup(134), densitySource: 'USDA SR portion 1 cup, pieces = 134 g (from memory)',
    pieceWeights: { spear: 16 },
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb bunch' }, priceCents: 399, aisle: 'produce',
    source: `USDA SR28 (NDB 11011): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'green-beans', name: 'Green beans, raw', category: 'vegetables',
    kcal: 31, fatG: 0.22, satFatG: 0.05, proteinG: 1.83, carbsG: 6.97, fiberG: 2.7, sugarsG: 3.26, ...NO_POLYOLS, sodiumMg: 6,
    densityGPerMl: cup(100), densitySource: 'USDA SR portion 1 cup, 1/2 in pieces = 100 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb bag' }, priceCents: 299, aisle: 'produce',
    source: `USDA SR28 (NDB 11052): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'cabbage-green', name: 'Cabbage, green, raw', category: 'vegetables',
    kcal: 25, fatG: 0.1, satFatG: 0.034, proteinG: 1.28, carbsG: 5.8, fiberG: 2.5, sugarsG: 3.2, ...NO_POLYOLS, sodiumMg: 18,
    densityGPerMl: cup(89), densitySource: 'USDA SR portion 1 cup, chopped = 89 g (from memory)',
    pieceWeights: { head: 908 },
    allergens: [], purchase: { unit: 'head', size: 1, label: '1 medium head' }, priceCents: 249, aisle: 'produce',
    source: `USDA SR28 (NDB 11109): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'cabbage-red', name: 'Cabbage, red, raw', category: 'vegetables',
    kcal: 31, fatG: 0.16, satFatG: 0.021, proteinG: 1.43, carbsG: 7.37, fiberG: 2.1, sugarsG: 3.83, ...NO_POLYOLS, sodiumMg: 27,
    densityGPerMl: cup(89), densitySource: 'USDA SR portion 1 cup, chopped = 89 g (from memory)',
    pieceWeights: { head: 908 },
    allergens: [], purchase: { unit: 'head', size: 1, label: '1 medium head' }, priceCents: 299, aisle: 'produce',
    source: `USDA SR28 (NDB 11112): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'radishes', name: 'Radishes, raw', category: 'vegetables',
    kcal: 16, fatG: 0.1, satFatG: 0.032, proteinG: 0.68, carbsG: 3.4, fiberG: 1.6, sugarsG: 1.86, ...NO_POLYOLS, sodiumMg: 39,
    densityGPerMl: cup(116), densitySource: 'USDA SR portion 1 cup, slices = 116 g (published-values §5b)',
    pieceWeights: { small: 2, medium: 4.5, large: 9 },
    allergens: [], purchase: { unit: 'oz', size: 6, label: '6 oz bag' }, priceCents: 149, aisle: 'produce',
    source: 'USDA FoodData Central SR Legacy, FDC 169276 (NDB 11429)', provenance: 'usda-fdc-verified', fdcId: 169276,
  },
  {
    slug: 'daikon', name: 'Daikon radish, raw', category: 'vegetables',
    kcal: 18, fatG: 0.1, satFatG: 0.03, proteinG: 0.6, carbsG: 4.1, fiberG: 1.6, sugarsG: 2.5, ...NO_POLYOLS, sodiumMg: 21,
    densityGPerMl: cup(116), densitySource: 'USDA SR portion 1 cup, slices = 116 g (published-values §5b)',
    pieceWeights: { radish: 338 },
    allergens: [], purchase: { unit: 'radish', size: 1, label: '1 radish (about 7 in)' }, priceCents: 199, aisle: 'produce',
    source: 'USDA FoodData Central SR Legacy, FDC 168451 (NDB 11430)', provenance: 'usda-fdc-verified', fdcId: 168451,
  },
  {
    slug: 'tomato', name: 'Tomatoes, red, ripe, raw', category: 'vegetables',
    kcal: 18, fatG: 0.2, satFatG: 0.028, proteinG: 0.88, carbsG: 3.89, fiberG: 1.2, sugarsG: 2.63, ...NO_POLYOLS, sodiumMg: 5,
    densityGPerMl: cup(180), densitySource: 'USDA SR portion 1 cup, chopped = 180 g (from memory)',
    pieceWeights: { medium: 123, cherry: 17 },
    allergens: [], purchase: { unit: 'lb', size: 1, label: 'sold loose, per lb' }, priceCents: 249, aisle: 'produce',
    source: `USDA SR28 (NDB 11529): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'cucumber', name: 'Cucumber, with peel, raw', category: 'vegetables',
    kcal: 15, fatG: 0.11, satFatG: 0.037, proteinG: 0.65, carbsG: 3.63, fiberG: 0.5, sugarsG: 1.67, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: cup(104), densitySource: 'USDA SR portion 1 cup, sliced = 104 g (from memory)',
    pieceWeights: { cucumber: 301 },
    allergens: [], purchase: { unit: 'cucumber', size: 1, label: '1 cucumber, sold loose' }, priceCents: 79, aisle: 'produce',
    source: `USDA SR28 (NDB 11205): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'celery', name: 'Celery, raw', category: 'vegetables',
    kcal: 16, fatG: 0.17, satFatG: 0.042, proteinG: 0.69, carbsG: 2.97, fiberG: 1.6, sugarsG: 1.34, ...NO_POLYOLS, sodiumMg: 80,
    densityGPerMl: cup(101), densitySource: 'USDA SR portion 1 cup, chopped = 101 g (from memory)',
    pieceWeights: { stalk: 40, bunch: 450 },
    allergens: [], purchase: { unit: 'bunch', size: 1, label: '1 bunch' }, priceCents: 199, aisle: 'produce',
    source: `USDA SR28 (NDB 11143): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Bunch weight 450 g is typical (from memory).',
  },
  {
    slug: 'lettuce-romaine', name: 'Lettuce, romaine, raw', category: 'vegetables',
    kcal: 17, fatG: 0.3, satFatG: 0.039, proteinG: 1.23, carbsG: 3.29, fiberG: 2.1, sugarsG: 1.19, ...NO_POLYOLS, sodiumMg: 8,
    densityGPerMl: cup(47), densitySource: 'USDA SR portion 1 cup, shredded = 47 g (from memory)',
    pieceWeights: { head: 626 },
    allergens: [], purchase: { unit: 'head', size: 1, label: '1 head' }, priceCents: 199, aisle: 'produce',
    source: `USDA SR28 (NDB 11251): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'lettuce-iceberg', name: 'Lettuce, iceberg, raw', category: 'vegetables',
    kcal: 14, fatG: 0.14, satFatG: 0.018, proteinG: 0.9, carbsG: 2.97, fiberG: 1.2, sugarsG: 1.97, ...NO_POLYOLS, sodiumMg: 10,
    densityGPerMl: cup(72), densitySource: 'USDA SR portion 1 cup, shredded = 72 g (from memory)',
    pieceWeights: { head: 755 },
    allergens: [], purchase: { unit: 'head', size: 1, label: '1 head' }, priceCents: 179, aisle: 'produce',
    source: `USDA SR28 (NDB 11252): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'arugula', name: 'Arugula, raw', category: 'vegetables',
    kcal: 25, fatG: 0.66, satFatG: 0.086, proteinG: 2.58, carbsG: 3.65, fiberG: 1.6, sugarsG: 2.05, ...NO_POLYOLS, sodiumMg: 27,
    densityGPerMl: cup(20), densitySource: 'USDA SR portion 1 cup = 20 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 5, label: '5 oz clamshell' }, priceCents: 399, aisle: 'produce',
    source: `USDA SR28 (NDB 11959): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'brussels-sprouts', name: 'Brussels sprouts, raw', category: 'vegetables',
    kcal: 43, fatG: 0.3, satFatG: 0.062, proteinG: 3.38, carbsG: 8.95, fiberG: 3.8, sugarsG: 2.2, ...NO_POLYOLS, sodiumMg: 25,
    densityGPerMl: cup(88), densitySource: 'USDA SR portion 1 cup = 88 g (from memory)',
    pieceWeights: { sprout: 19 },
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb bag' }, priceCents: 349, aisle: 'produce',
    source: `USDA SR28 (NDB 11098): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'jalapeno', name: 'Jalapeño pepper, raw', category: 'vegetables',
    kcal: 29, fatG: 0.37, satFatG: 0.092, proteinG: 0.91, carbsG: 6.5, fiberG: 2.8, sugarsG: 4.12, ...NO_POLYOLS, sodiumMg: 3,
    densityGPerMl: cup(90), densitySource: 'USDA SR portion 1 cup, sliced = 90 g (from memory)',
    pieceWeights: { pepper: 14 },
    allergens: [], purchase: { unit: 'pepper', size: 1, label: '1 pepper, sold loose' }, priceCents: 40, aisle: 'produce',
    source: `USDA SR28 (NDB 11979): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'scallions', name: 'Scallions (green onions), raw', category: 'vegetables',
    kcal: 32, fatG: 0.19, satFatG: 0.032, proteinG: 1.83, carbsG: 7.34, fiberG: 2.6, sugarsG: 2.33, ...NO_POLYOLS, sodiumMg: 16,
    densityGPerMl: cup(100), densitySource: 'USDA SR portion 1 cup, chopped = 100 g (from memory)',
    pieceWeights: { stalk: 15, bunch: 100 },
    allergens: [], purchase: { unit: 'bunch', size: 1, label: '1 bunch' }, priceCents: 99, aisle: 'produce',
    source: `USDA SR28 (NDB 11291): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'eggplant', name: 'Eggplant, raw', category: 'vegetables',
    kcal: 25, fatG: 0.18, satFatG: 0.034, proteinG: 0.98, carbsG: 5.88, fiberG: 3, sugarsG: 3.53, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: cup(82), densitySource: 'USDA SR portion 1 cup, cubes = 82 g (from memory)',
    pieceWeights: { eggplant: 548 },
    allergens: [], purchase: { unit: 'eggplant', size: 1, label: '1 medium eggplant' }, priceCents: 199, aisle: 'produce',
    source: `USDA SR28 (NDB 11209): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'sauerkraut', name: 'Sauerkraut, canned or jarred', category: 'vegetables',
    kcal: 19, fatG: 0.14, satFatG: 0.034, proteinG: 0.91, carbsG: 4.28, fiberG: 2.9, sugarsG: 1.78, ...NO_POLYOLS, sodiumMg: 661,
    densityGPerMl: cup(142), densitySource: 'USDA SR portion 1 cup = 142 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz jar' }, priceCents: 349, aisle: 'canned-jarred',
    source: 'USDA SR Legacy values from memory (NDB 11439), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },

  // ---------------------------------------------------------------------------------------------------------
  // Fruit
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'avocado', name: 'Avocado, raw', category: 'fruit',
    kcal: 160, fatG: 14.66, satFatG: 2.126, proteinG: 2, carbsG: 8.53, fiberG: 6.7, sugarsG: 0.66, ...NO_POLYOLS, sodiumMg: 7,
    densityGPerMl: cup(150), densitySource: 'USDA SR portion 1 cup, cubes = 150 g (published-values §5b)',
    pieceWeights: { avocado: 201 },
    allergens: [], purchase: { unit: 'avocado', size: 1, label: '1 avocado, sold loose' }, priceCents: 129, aisle: 'produce',
    source: 'USDA FoodData Central SR Legacy, FDC 171705 (NDB 09037)', provenance: 'usda-fdc-verified', fdcId: 171705,
    note: 'Piece weight is the edible part of one avocado (USDA portion).',
  },
  {
    slug: 'lemon-juice', name: 'Lemon juice, fresh', category: 'fruit',
    kcal: 22, fatG: 0.24, satFatG: 0.04, proteinG: 0.35, carbsG: 6.9, fiberG: 0.3, sugarsG: 2.52, ...NO_POLYOLS, sodiumMg: 1,
    densityGPerMl: cup(244), densitySource: 'USDA SR portion 1 cup = 244 g (from memory)',
    pieceWeights: { lemon: 48 },
    allergens: [], purchase: { unit: 'lemon', size: 1, label: '1 lemon, sold loose' }, priceCents: 69, aisle: 'produce',
    source: `USDA SR28 (NDB 09152): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Piece weight "lemon" = juice of one lemon, about 48 g (USDA portion, from memory).',
  },
  {
    slug: 'raspberries', name: 'Raspberries, raw', category: 'fruit',
    kcal: 52, fatG: 0.65, satFatG: 0.019, proteinG: 1.2, carbsG: 11.94, fiberG: 6.5, sugarsG: 4.42, ...NO_POLYOLS, sodiumMg: 1,
    densityGPerMl: cup(123), densitySource: 'USDA SR portion 1 cup = 123 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 6, label: '6 oz clamshell' }, priceCents: 399, aisle: 'produce',
    source: `USDA SR28 (NDB 09302): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'strawberries', name: 'Strawberries, raw', category: 'fruit',
    kcal: 32, fatG: 0.3, satFatG: 0.015, proteinG: 0.67, carbsG: 7.68, fiberG: 2, sugarsG: 4.89, ...NO_POLYOLS, sodiumMg: 1,
    densityGPerMl: cup(152), densitySource: 'USDA SR portion 1 cup, halves = 152 g (from memory)',
    pieceWeights: { medium: 12 },
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb clamshell' }, priceCents: 399, aisle: 'produce',
    source: `USDA SR28 (NDB 09316): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'blackberries', name: 'Blackberries, raw', category: 'fruit',
    kcal: 43, fatG: 0.49, satFatG: 0.014, proteinG: 1.39, carbsG: 9.61, fiberG: 5.3, sugarsG: 4.88, ...NO_POLYOLS, sodiumMg: 1,
    densityGPerMl: cup(144), densitySource: 'USDA SR portion 1 cup = 144 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 6, label: '6 oz clamshell' }, priceCents: 349, aisle: 'produce',
    source: 'USDA SR Legacy values from memory (NDB 09042), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'olives-black', name: 'Olives, ripe, canned', category: 'fruit',
    kcal: 115, fatG: 10.68, satFatG: 1.415, proteinG: 0.84, carbsG: 6.26, fiberG: 3.2, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 735,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { olive: 4.4 },
    allergens: [], purchase: { unit: 'oz', size: 6, label: '6 oz can (drained weight)' }, priceCents: 229, aisle: 'canned-jarred',
    source: `USDA SR28 (NDB 09193): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Olive weight 4.4 g is a large pitted olive (from memory).',
  },

  // ---------------------------------------------------------------------------------------------------------
  // Nuts, seeds and flours
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'almond-flour', name: 'Almond flour, blanched', category: 'nuts-seeds-flours',
    kcal: 590, fatG: 52.52, satFatG: 3.953, proteinG: 21.4, carbsG: 18.67, fiberG: 9.9, sugarsG: 4.63, ...NO_POLYOLS, sodiumMg: 19,
    densityGPerMl: cup(112), densitySource: 'package label 1/4 cup = 28 g, so 1 cup = 112 g (from memory; published-values §5b)',
    pieceWeights: {},
    allergens: ['tree-nuts'], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 899, aisle: 'baking',
    source: 'USDA FoodData Central SR Legacy, FDC 170568 (NDB 12062, almonds, blanched) as composition proxy for almond flour',
    provenance: 'usda-fdc-verified', fdcId: 170568,
  },
  {
    slug: 'almonds', name: 'Almonds, whole or ground (almond meal)', category: 'nuts-seeds-flours',
    kcal: 579, fatG: 49.93, satFatG: 3.802, proteinG: 21.15, carbsG: 21.55, fiberG: 12.5, sugarsG: 4.35, ...NO_POLYOLS, sodiumMg: 1,
    densityGPerMl: cup(95), densitySource: 'USDA SR portion "1 cup, ground" = 95 g (published-values §5b); applies to almond meal',
    pieceWeights: { almond: 1.2 },
    allergens: ['tree-nuts'], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 799, aisle: 'baking',
    source: 'USDA FoodData Central SR Legacy, FDC 170567 (NDB 12061)', provenance: 'usda-fdc-verified', fdcId: 170567,
    note: 'Weight of one almond (1.2 g) from memory.',
  },
  {
    slug: 'coconut-flour', name: 'Coconut flour', category: 'nuts-seeds-flours',
    kcal: 400, fatG: 13.3, satFatG: 11.6, proteinG: 20, carbsG: 60, fiberG: 33.3, sugarsG: 6.7, ...NO_POLYOLS, sodiumMg: 40,
    densityGPerMl: tbsp(7.5), densitySource: 'package label 2 tbsp = 15 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 599, aisle: 'baking',
    source: `${LABEL} (no USDA SR Legacy entry exists)`, provenance: 'label-from-memory', fdcId: null,
    note: 'Coconut is not a tree nut in current FDA guidance (from memory); some people with tree-nut allergy avoid it.',
  },
  {
    slug: 'flaxseed-meal', name: 'Flaxseed meal (ground flaxseed)', category: 'nuts-seeds-flours',
    kcal: 534, fatG: 42.16, satFatG: 3.663, proteinG: 18.29, carbsG: 28.88, fiberG: 27.3, sugarsG: 1.55, ...NO_POLYOLS, sodiumMg: 30,
    densityGPerMl: tbsp(7), densitySource: 'USDA SR portion 1 tbsp, ground = 7 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 499, aisle: 'baking',
    source: `USDA SR28 "Seeds, flaxseed" (NDB 12220): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'psyllium-husk', name: 'Psyllium husk powder', category: 'nuts-seeds-flours',
    kcal: 190, fatG: 0.6, satFatG: 0.1, proteinG: 2, carbsG: 85, fiberG: 80, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 20,
    densityGPerMl: tbsp(7), densitySource: 'package label 1 tbsp = 7 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 12, label: '12 oz jar' }, priceCents: 999, aisle: 'health-food',
    source: `${LABEL}; kcal computed by 21 CFR 101.9(c)(1)(i)(C) with fibre at 2 kcal/g (labels differ in method)`,
    provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'chia-seeds', name: 'Chia seeds, dried', category: 'nuts-seeds-flours',
    kcal: 486, fatG: 30.74, satFatG: 3.33, proteinG: 16.54, carbsG: 42.12, fiberG: 34.4, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 16,
    densityGPerMl: tbsp(10), densitySource: 'package label 1 tbsp = 10 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 12, label: '12 oz bag' }, priceCents: 599, aisle: 'health-food',
    source: `USDA SR28 (NDB 12006): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'sesame-seeds', name: 'Sesame seeds, whole, dried', category: 'nuts-seeds-flours',
    kcal: 573, fatG: 49.67, satFatG: 6.957, proteinG: 17.73, carbsG: 23.45, fiberG: 11.8, sugarsG: 0.3, ...NO_POLYOLS, sodiumMg: 11,
    densityGPerMl: tbsp(9), densitySource: 'USDA SR portion 1 tbsp = 9 g (from memory)',
    pieceWeights: {},
    allergens: ['sesame'], purchase: { unit: 'oz', size: 4, label: '4 oz jar' }, priceCents: 449, aisle: 'spices',
    source: `USDA SR28 (NDB 12023): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'sunflower-seeds', name: 'Sunflower seed kernels, dried', category: 'nuts-seeds-flours',
    kcal: 584, fatG: 51.46, satFatG: 4.455, proteinG: 20.78, carbsG: 20, fiberG: 8.6, sugarsG: 2.62, ...NO_POLYOLS, sodiumMg: 9,
    densityGPerMl: cup(140), densitySource: 'USDA SR portion 1 cup = 140 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 449, aisle: 'health-food',
    source: `USDA SR28 (NDB 12036): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'pumpkin-seeds', name: 'Pumpkin seed kernels (pepitas), dried', category: 'nuts-seeds-flours',
    kcal: 559, fatG: 49.05, satFatG: 8.659, proteinG: 30.23, carbsG: 10.71, fiberG: 6, sugarsG: 1.4, ...NO_POLYOLS, sodiumMg: 7,
    densityGPerMl: cup(129), densitySource: 'USDA SR portion 1 cup = 129 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 12, label: '12 oz bag' }, priceCents: 549, aisle: 'health-food',
    source: `USDA SR28 (NDB 12014): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'pecans', name: 'Pecans', category: 'nuts-seeds-flours',
    kcal: 691, fatG: 71.97, satFatG: 6.18, proteinG: 9.17, carbsG: 13.86, fiberG: 9.6, sugarsG: 3.97, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: cup(109), densitySource: 'USDA SR portion 1 cup, chopped = 109 g (from memory)',
    pieceWeights: { half: 1.4 },
    allergens: ['tree-nuts'], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 999, aisle: 'baking',
    source: `USDA SR28 (NDB 12142): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'walnuts', name: 'Walnuts, English', category: 'nuts-seeds-flours',
    kcal: 654, fatG: 65.21, satFatG: 6.126, proteinG: 15.23, carbsG: 13.71, fiberG: 6.7, sugarsG: 2.61, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: cup(117), densitySource: 'USDA SR portion 1 cup, chopped = 117 g (from memory)',
    pieceWeights: {},
    allergens: ['tree-nuts'], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 899, aisle: 'baking',
    source: `USDA SR28 (NDB 12155): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'macadamia-nuts', name: 'Macadamia nuts, raw', category: 'nuts-seeds-flours',
    kcal: 718, fatG: 75.77, satFatG: 12.061, proteinG: 7.91, carbsG: 13.82, fiberG: 8.6, sugarsG: 4.57, ...NO_POLYOLS, sodiumMg: 5,
    densityGPerMl: cup(134), densitySource: 'USDA SR portion 1 cup, whole = 134 g (from memory)',
    pieceWeights: {},
    allergens: ['tree-nuts'], purchase: { unit: 'oz', size: 8, label: '8 oz bag' }, priceCents: 999, aisle: 'baking',
    source: `USDA SR28 (NDB 12131): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'hazelnuts', name: 'Hazelnuts', category: 'nuts-seeds-flours',
    kcal: 628, fatG: 60.75, satFatG: 4.464, proteinG: 14.95, carbsG: 16.7, fiberG: 9.7, sugarsG: 4.34, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: cup(115), densitySource: 'USDA SR portion 1 cup, chopped = 115 g (from memory)',
    pieceWeights: {},
    allergens: ['tree-nuts'], purchase: { unit: 'oz', size: 8, label: '8 oz bag' }, priceCents: 799, aisle: 'baking',
    source: `USDA SR28 (NDB 12120): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'hemp-hearts', name: 'Hemp seeds, hulled (hemp hearts)', category: 'nuts-seeds-flours',
    kcal: 553, fatG: 48.75, satFatG: 4.6, proteinG: 31.56, carbsG: 8.67, fiberG: 4, sugarsG: 1.5, ...NO_POLYOLS, sodiumMg: 5,
    densityGPerMl: tbsp(10), densitySource: 'package label 3 tbsp = 30 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 12, label: '12 oz bag' }, priceCents: 999, aisle: 'health-food',
    source: `USDA SR28 (NDB 12012): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'coconut-shredded', name: 'Coconut, shredded, unsweetened (desiccated)', category: 'nuts-seeds-flours',
    kcal: 660, fatG: 64.53, satFatG: 57.218, proteinG: 6.88, carbsG: 23.65, fiberG: 16.3, sugarsG: 7.35, ...NO_POLYOLS, sodiumMg: 37,
    densityGPerMl: cup(80), densitySource: 'package label 3 tbsp = 15 g, so 1 cup = 80 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 8, label: '8 oz bag' }, priceCents: 399, aisle: 'baking',
    source: `USDA SR28 (NDB 12108): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Coconut is not a tree nut in current FDA guidance (from memory).',
  },
  {
    slug: 'pork-rind-crumbs', name: 'Pork rind crumbs (plain pork skins)', category: 'nuts-seeds-flours',
    kcal: 544, fatG: 31.3, satFatG: 11.37, proteinG: 61.3, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 1818,
    densityGPerMl: cup(56), densitySource: 'package label 1/4 cup = 14 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 12, label: '12 oz canister' }, priceCents: 999, aisle: 'health-food',
    source: `USDA SR28 "Snacks, pork skins, plain" (NDB 19041): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'almond-butter', name: 'Almond butter, unsalted', category: 'nuts-seeds-flours',
    kcal: 614, fatG: 55.5, satFatG: 4.152, proteinG: 20.96, carbsG: 18.82, fiberG: 10.3, sugarsG: 4.43, ...NO_POLYOLS, sodiumMg: 7,
    densityGPerMl: tbsp(16), densitySource: 'USDA SR portion 1 tbsp = 16 g (from memory)',
    pieceWeights: {},
    allergens: ['tree-nuts'], purchase: { unit: 'oz', size: 12, label: '12 oz jar' }, priceCents: 899, aisle: 'canned-jarred',
    source: `USDA SR28 (NDB 12195): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'peanut-butter', name: 'Peanut butter, smooth, unsalted', category: 'nuts-seeds-flours',
    kcal: 598, fatG: 51.36, satFatG: 10.325, proteinG: 22.21, carbsG: 22.31, fiberG: 5, sugarsG: 9.2, ...NO_POLYOLS, sodiumMg: 17,
    densityGPerMl: tbsp(16), densitySource: 'USDA SR portion 1 tbsp = 16 g (from memory)',
    pieceWeights: {},
    allergens: ['peanuts'], purchase: { unit: 'oz', size: 16, label: '16 oz jar' }, priceCents: 399, aisle: 'canned-jarred',
    source: `USDA SR28 (NDB 16398): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'tahini', name: 'Tahini (sesame butter)', category: 'nuts-seeds-flours',
    kcal: 595, fatG: 53.76, satFatG: 7.529, proteinG: 17, carbsG: 21.19, fiberG: 9.3, sugarsG: 0.49, ...NO_POLYOLS, sodiumMg: 115,
    densityGPerMl: tbsp(15), densitySource: 'USDA SR portion 1 tbsp = 15 g (from memory)',
    pieceWeights: {},
    allergens: ['sesame'], purchase: { unit: 'oz', size: 16, label: '16 oz jar' }, priceCents: 799, aisle: 'canned-jarred',
    source: `USDA SR28 (NDB 12166): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },

  // ---------------------------------------------------------------------------------------------------------
  // Fats and oils
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'olive-oil', name: 'Olive oil', category: 'fats-oils',
    kcal: 884, fatG: 100, satFatG: 13.808, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: cup(216), densitySource: 'USDA SR portion 1 cup = 216 g (published-values §5b)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'ml', size: 500, label: '500 mL (16.9 fl oz) bottle' }, priceCents: 899, aisle: 'oils',
    source: 'USDA FoodData Central SR Legacy, FDC 171413 (NDB 04053)', provenance: 'usda-fdc-verified', fdcId: 171413,
  },
  {
    slug: 'avocado-oil', name: 'Avocado oil', category: 'fats-oils',
    kcal: 884, fatG: 100, satFatG: 11.56, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: cup(218), densitySource: 'USDA SR portion 1 cup = 218 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'ml', size: 500, label: '500 mL (16.9 fl oz) bottle' }, priceCents: 999, aisle: 'oils',
    source: `USDA SR28 (NDB 04581): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'coconut-oil', name: 'Coconut oil', category: 'fats-oils',
    kcal: 892, fatG: 99.06, satFatG: 82.475, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: cup(218), densitySource: 'USDA SR portion 1 cup = 218 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 14, label: '14 fl oz jar' }, priceCents: 799, aisle: 'oils',
    source: `USDA SR28 (NDB 04047): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Coconut is not a tree nut in current FDA guidance (from memory).',
  },
  {
    slug: 'mct-oil', name: 'MCT oil', category: 'fats-oils',
    kcal: 900, fatG: 100, satFatG: 100, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: tbsp(14), densitySource: 'package label 1 tbsp = 14 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 16, label: '16 fl oz bottle' }, priceCents: 1599, aisle: 'health-food',
    source: `${LABEL} (energy by the general 9 kcal/g for fat, as labels print it)`, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'lard', name: 'Lard', category: 'fats-oils',
    kcal: 902, fatG: 100, satFatG: 39.2, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: cup(205), densitySource: 'USDA SR portion 1 cup = 205 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz tub' }, priceCents: 499, aisle: 'oils',
    source: `USDA SR28 (NDB 04002): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'bacon-fat', name: 'Bacon fat (rendered drippings)', category: 'fats-oils',
    kcal: 897, fatG: 99.5, satFatG: 39, proteinG: 0.1, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 150,
    densityGPerMl: cup(205), densitySource: 'assumed equal to lard, 1 cup = 205 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 14, label: '14 oz jar' }, priceCents: 799, aisle: 'oils',
    source: 'USDA SR Legacy values from memory (pork, bacon grease), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
    note: 'Usually saved from baking bacon; sodium depends on the bacon.',
  },
  {
    slug: 'beef-tallow', name: 'Beef tallow', category: 'fats-oils',
    kcal: 902, fatG: 100, satFatG: 49.8, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: cup(205), densitySource: 'USDA SR portion 1 cup = 205 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 14, label: '14 oz jar' }, priceCents: 899, aisle: 'oils',
    source: `USDA SR28 (NDB 04001): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'sesame-oil-toasted', name: 'Sesame oil, toasted', category: 'fats-oils',
    kcal: 884, fatG: 100, satFatG: 14.2, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: cup(218), densitySource: 'USDA SR portion 1 cup = 218 g (from memory)',
    pieceWeights: {},
    allergens: ['sesame'], purchase: { unit: 'floz', size: 5, label: '5 fl oz bottle' }, priceCents: 499, aisle: 'oils',
    source: `USDA SR28 "Oil, sesame, salad or cooking" (NDB 04058): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Toasted sesame oil is not highly refined, so it is treated as containing sesame.',
  },

  // ---------------------------------------------------------------------------------------------------------
  // Sweeteners
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'erythritol', name: 'Erythritol, granulated', category: 'sweeteners',
    kcal: 0, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 100, fiberG: 0, sugarsG: 0, erythritolG: 100, alluloseG: 0, otherPolyolsG: 0, sodiumMg: 0,
    densityGPerMl: tsp(4), densitySource: 'package label 1 tsp = 4 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb bag' }, priceCents: 899, aisle: 'baking',
    source: 'Defined composition: pure erythritol counts in total carbohydrate as sugar alcohol, 0 kcal/g (21 CFR 101.9(c)(1)(i)(F); EU Reg. 1169/2011 Annex XIV); published-values §3, §5',
    provenance: 'defined-composition', fdcId: null,
  },
  {
    slug: 'allulose', name: 'Allulose, granulated', category: 'sweeteners',
    kcal: 40, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 100, fiberG: 0, sugarsG: 0, erythritolG: 0, alluloseG: 100, otherPolyolsG: 0, sodiumMg: 0,
    densityGPerMl: tsp(4), densitySource: 'package label 1 tsp = 4 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb bag' }, priceCents: 1099, aisle: 'baking',
    source: 'Defined composition: allulose stays in total carbohydrate, is excluded from sugars, 0.4 kcal/g (FDA allulose guidance, 2020); published-values §3',
    provenance: 'defined-composition', fdcId: null,
  },
  {
    slug: 'monk-fruit-blend', name: 'Monk fruit sweetener (erythritol blend)', category: 'sweeteners',
    kcal: 0, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 100, fiberG: 0, sugarsG: 0, erythritolG: 100, alluloseG: 0, otherPolyolsG: 0, sodiumMg: 0,
    densityGPerMl: tsp(4), densitySource: 'package label 1 tsp = 4 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz bag' }, priceCents: 999, aisle: 'baking',
    source: `${LABEL} (erythritol with under 1% monk fruit extract; treated as pure erythritol)`,
    provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'stevia-liquid', name: 'Stevia extract, liquid drops', category: 'sweeteners',
    kcal: 0, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 0,
    densityGPerMl: 1, densitySource: 'assumed water-like, 1 g/mL (from memory)',
    pieceWeights: { drop: 0.05 },
    allergens: [], purchase: { unit: 'floz', size: 2, label: '2 fl oz dropper bottle' }, priceCents: 1199, aisle: 'baking',
    source: `${LABEL} (0 kcal per serving; brands with glycerin or alcohol differ)`, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'xylitol', name: 'Xylitol, granulated', category: 'sweeteners',
    kcal: 240, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 100, fiberG: 0, sugarsG: 0, erythritolG: 0, alluloseG: 0, otherPolyolsG: 100, sodiumMg: 0,
    densityGPerMl: tsp(4), densitySource: 'package label 1 tsp = 4 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb bag' }, priceCents: 999, aisle: 'baking',
    source: 'Defined composition: sugar alcohol, 2.4 kcal/g (21 CFR 101.9(c)(1)(i)(F)); published-values §3',
    provenance: 'defined-composition', fdcId: null,
    note: 'Xylitol is highly toxic to dogs: keep it away from pets.',
  },
  {
    slug: 'maltitol', name: 'Maltitol, crystalline', category: 'sweeteners',
    kcal: 210, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 100, fiberG: 0, sugarsG: 0, erythritolG: 0, alluloseG: 0, otherPolyolsG: 100, sodiumMg: 0,
    densityGPerMl: tsp(4), densitySource: 'package label 1 tsp = 4 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb bag' }, priceCents: 1099, aisle: 'baking',
    source: 'Defined composition: sugar alcohol, 2.1 kcal/g (21 CFR 101.9(c)(1)(i)(F)); published-values §3',
    provenance: 'defined-composition', fdcId: null,
    note: 'Maltitol raises blood glucose more than other sugar alcohols; many keto coaches avoid it.',
  },

  // ---------------------------------------------------------------------------------------------------------
  // Wraps and breads
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'low-carb-tortilla', name: 'Low-carb tortilla (high-fibre wheat)', category: 'wraps-breads',
    kcal: 155, fatG: 6.7, satFatG: 2.2, proteinG: 11, carbsG: 42, fiberG: 33, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 950,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { tortilla: 45 },
    allergens: ['wheat'], purchase: { unit: 'tortilla', size: 8, label: '8-count pack' }, priceCents: 449, aisle: 'bakery',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
    note: 'Mostly insoluble fibre (wheat or oat fibre), which labels count at 0 kcal/g. Some brands add soy.',
  },
  {
    slug: 'low-carb-bread', name: 'Low-carb bread, sliced (high-fibre wheat)', category: 'wraps-breads',
    kcal: 160, fatG: 5.4, satFatG: 0.9, proteinG: 21, carbsG: 32, fiberG: 25, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 410,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { slice: 28 },
    allergens: ['wheat'], purchase: { unit: 'slice', size: 16, label: '16-slice loaf' }, priceCents: 599, aisle: 'bakery',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
    note: 'Mostly insoluble fibre, which labels count at 0 kcal/g. Some brands add soy or egg.',
  },
  {
    slug: 'egg-white-wrap', name: 'Egg white wraps', category: 'wraps-breads',
    kcal: 89, fatG: 0.4, satFatG: 0, proteinG: 18, carbsG: 2, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 540,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { wrap: 28 },
    allergens: ['egg'], purchase: { unit: 'wrap', size: 6, label: '6-count pack' }, priceCents: 599, aisle: 'dairy-eggs',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'coconut-wrap', name: 'Coconut wraps', category: 'wraps-breads',
    kcal: 500, fatG: 35.7, satFatG: 32, proteinG: 7.1, carbsG: 35.7, fiberG: 14.3, sugarsG: 14.3, ...NO_POLYOLS, sodiumMg: 140,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { wrap: 14 },
    allergens: [], purchase: { unit: 'wrap', size: 7, label: '7-count pack' }, priceCents: 699, aisle: 'health-food',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
    note: 'Coconut is not a tree nut in current FDA guidance (from memory).',
  },

  // ---------------------------------------------------------------------------------------------------------
  // Condiments
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'mayonnaise', name: 'Mayonnaise, regular', category: 'condiments',
    kcal: 680, fatG: 74.85, satFatG: 11.703, proteinG: 0.96, carbsG: 0.57, fiberG: 0, sugarsG: 0.57, ...NO_POLYOLS, sodiumMg: 635,
    densityGPerMl: tbsp(13.8), densitySource: 'USDA SR portion 1 tbsp = 13.8 g (from memory)',
    pieceWeights: {},
    allergens: ['egg'], purchase: { unit: 'floz', size: 30, label: '30 fl oz jar' }, priceCents: 599, aisle: 'condiments',
    source: `USDA SR28 (NDB 04025): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Made with soybean oil, which is highly refined and exempt from soy labelling under FALCPA.',
  },
  {
    slug: 'mayonnaise-avocado-oil', name: 'Mayonnaise, avocado oil', category: 'condiments',
    kcal: 786, fatG: 85.7, satFatG: 10.7, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 786,
    densityGPerMl: tbsp(14), densitySource: 'package label 1 tbsp = 14 g (from memory)',
    pieceWeights: {},
    allergens: ['egg'], purchase: { unit: 'floz', size: 12, label: '12 fl oz jar' }, priceCents: 899, aisle: 'condiments',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'mustard-yellow', name: 'Mustard, prepared, yellow', category: 'condiments',
    kcal: 60, fatG: 3.34, satFatG: 0.214, proteinG: 3.74, carbsG: 5.83, fiberG: 4, sugarsG: 0.92, ...NO_POLYOLS, sodiumMg: 1104,
    densityGPerMl: tsp(5), densitySource: 'USDA SR portion 1 tsp = 5 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 14, label: '14 oz bottle' }, priceCents: 199, aisle: 'condiments',
    source: `USDA SR28 (NDB 02046): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Mustard is not a US major allergen, but it is one in the EU (Reg. 1169/2011 Annex II).',
  },
  {
    slug: 'hot-sauce', name: 'Hot pepper sauce', category: 'condiments',
    kcal: 11, fatG: 0.37, satFatG: 0.052, proteinG: 0.51, carbsG: 1.75, fiberG: 0.3, sugarsG: 1.26, ...NO_POLYOLS, sodiumMg: 2643,
    densityGPerMl: tsp(4.7), densitySource: 'USDA SR portion 1 tsp = 4.7 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 5, label: '5 fl oz bottle' }, priceCents: 299, aisle: 'condiments',
    source: `USDA SR28 "Sauce, ready-to-serve, pepper or hot" (NDB 06168): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'ketchup-sugar-free', name: 'Ketchup, no sugar added', category: 'condiments',
    kcal: 35, fatG: 0.2, satFatG: 0, proteinG: 1.2, carbsG: 8, fiberG: 1, sugarsG: 4, ...NO_POLYOLS, sodiumMg: 900,
    densityGPerMl: tbsp(17), densitySource: 'package label 1 tbsp = 17 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 13, label: '13 oz bottle' }, priceCents: 399, aisle: 'condiments',
    source: `${LABEL} (stevia- or monk-fruit-sweetened; brands with erythritol or allulose differ)`,
    provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'salsa', name: 'Salsa, ready-to-serve', category: 'condiments',
    kcal: 29, fatG: 0.17, satFatG: 0.021, proteinG: 1.52, carbsG: 6.64, fiberG: 1.9, sugarsG: 4.01, ...NO_POLYOLS, sodiumMg: 711,
    densityGPerMl: tbsp(16), densitySource: 'USDA SR portion 1 tbsp = 16 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 16, label: '16 oz jar' }, priceCents: 349, aisle: 'condiments',
    source: `USDA SR28 (NDB 06164): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'pesto', name: 'Basil pesto', category: 'condiments',
    kcal: 470, fatG: 48, satFatG: 8, proteinG: 6.7, carbsG: 5, fiberG: 1.7, sugarsG: 1.7, ...NO_POLYOLS, sodiumMg: 750,
    densityGPerMl: cup(240), densitySource: 'package label 1/4 cup = 60 g (from memory)',
    pieceWeights: {},
    allergens: ['milk', 'tree-nuts'], purchase: { unit: 'oz', size: 6.5, label: '6.5 oz jar' }, priceCents: 499, aisle: 'condiments',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
    note: 'Pine nuts count as tree nuts for FDA; some brands use cashews or no nuts.',
  },
  {
    slug: 'soy-sauce', name: 'Soy sauce (soy and wheat)', category: 'condiments',
    kcal: 53, fatG: 0.57, satFatG: 0.073, proteinG: 8.14, carbsG: 4.93, fiberG: 0.8, sugarsG: 0.4, ...NO_POLYOLS, sodiumMg: 5493,
    densityGPerMl: tbsp(16), densitySource: 'USDA SR portion 1 tbsp = 16 g (from memory)',
    pieceWeights: {},
    allergens: ['soy', 'wheat'], purchase: { unit: 'floz', size: 10, label: '10 fl oz bottle' }, priceCents: 349, aisle: 'condiments',
    source: `USDA SR28 (NDB 16123): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'tamari', name: 'Tamari (soy sauce, wheat-free)', category: 'condiments',
    kcal: 60, fatG: 0.1, satFatG: 0.011, proteinG: 10.51, carbsG: 5.57, fiberG: 0.8, sugarsG: 1.7, ...NO_POLYOLS, sodiumMg: 5586,
    densityGPerMl: tbsp(18), densitySource: 'USDA SR portion 1 tbsp = 18 g (from memory)',
    pieceWeights: {},
    allergens: ['soy'], purchase: { unit: 'floz', size: 10, label: '10 fl oz bottle' }, priceCents: 499, aisle: 'condiments',
    source: `USDA SR28 (NDB 16124): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Some tamari contains wheat: check the label.',
  },
  {
    slug: 'coconut-aminos', name: 'Coconut aminos', category: 'condiments',
    kcal: 80, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 20, fiberG: 0, sugarsG: 18, ...NO_POLYOLS, sodiumMg: 1650,
    densityGPerMl: 1.1, densitySource: 'estimated 1.1 g/mL for a thin syrup-like sauce (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 8, label: '8 fl oz bottle' }, priceCents: 599, aisle: 'condiments',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
    note: 'Coconut is not a tree nut in current FDA guidance (from memory).',
  },
  {
    slug: 'vinegar-cider', name: 'Apple cider vinegar', category: 'condiments',
    kcal: 21, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 0.93, fiberG: 0, sugarsG: 0.4, ...NO_POLYOLS, sodiumMg: 5,
    densityGPerMl: tbsp(14.9), densitySource: 'USDA SR portion 1 tbsp = 14.9 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 16, label: '16 fl oz bottle' }, priceCents: 299, aisle: 'condiments',
    source: `USDA SR28 (NDB 02048): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Most of its energy is acetic acid (about 5 g per 100 g), which the 4/9/4 factors do not cover.',
  },
  {
    slug: 'vinegar-white', name: 'White distilled vinegar', category: 'condiments',
    kcal: 18, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 0.04, fiberG: 0, sugarsG: 0.04, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: tbsp(14.9), densitySource: 'USDA SR portion 1 tbsp = 14.9 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 32, label: '32 fl oz bottle' }, priceCents: 199, aisle: 'condiments',
    source: 'USDA SR Legacy values from memory (NDB 02053), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
    note: 'Its energy is acetic acid (about 5 g per 100 g), which the 4/9/4 factors do not cover.',
  },
  {
    slug: 'fish-sauce', name: 'Fish sauce', category: 'condiments',
    kcal: 35, fatG: 0.01, satFatG: 0.002, proteinG: 5.06, carbsG: 3.64, fiberG: 0, sugarsG: 3.64, ...NO_POLYOLS, sodiumMg: 7851,
    densityGPerMl: tbsp(18), densitySource: 'USDA SR portion 1 tbsp = 18 g (from memory)',
    pieceWeights: {},
    allergens: ['fish'], purchase: { unit: 'floz', size: 8.45, label: '250 mL bottle' }, priceCents: 399, aisle: 'condiments',
    source: 'USDA SR Legacy values from memory (NDB 06179), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'ranch-dressing', name: 'Ranch dressing', category: 'condiments',
    kcal: 430, fatG: 44.54, satFatG: 6.964, proteinG: 1.32, carbsG: 5.9, fiberG: 0, sugarsG: 4.69, ...NO_POLYOLS, sodiumMg: 901,
    densityGPerMl: tbsp(15), densitySource: 'USDA SR portion 1 tbsp = 15 g (from memory)',
    pieceWeights: {},
    allergens: ['milk', 'egg'], purchase: { unit: 'floz', size: 16, label: '16 fl oz bottle' }, priceCents: 399, aisle: 'condiments',
    source: `USDA SR28 (NDB 04639): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },

  // ---------------------------------------------------------------------------------------------------------
  // Herbs and spices
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'salt', name: 'Salt, table', category: 'herbs-spices',
    kcal: 0, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 38758,
    densityGPerMl: tsp(6), densitySource: 'USDA SR portion 1 tsp = 6 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 26, label: '26 oz canister' }, priceCents: 149, aisle: 'spices',
    source: `USDA SR28 (NDB 02047): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'black-pepper', name: 'Black pepper, ground', category: 'herbs-spices',
    kcal: 251, fatG: 3.26, satFatG: 1.392, proteinG: 10.39, carbsG: 63.95, fiberG: 25.3, sugarsG: 0.64, ...NO_POLYOLS, sodiumMg: 20,
    densityGPerMl: tsp(2.3), densitySource: 'USDA SR portion 1 tsp = 2.3 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 3, label: '3 oz tin' }, priceCents: 399, aisle: 'spices',
    source: `USDA SR28 (NDB 02030): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'paprika', name: 'Paprika', category: 'herbs-spices',
    kcal: 282, fatG: 12.89, satFatG: 2.14, proteinG: 14.14, carbsG: 53.99, fiberG: 34.9, sugarsG: 10.34, ...NO_POLYOLS, sodiumMg: 68,
    densityGPerMl: tsp(2.3), densitySource: 'USDA SR portion 1 tsp = 2.3 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 2, label: '2 oz jar' }, priceCents: 349, aisle: 'spices',
    source: `USDA SR28 (NDB 02028): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'garlic-powder', name: 'Garlic powder', category: 'herbs-spices',
    kcal: 331, fatG: 0.73, satFatG: 0.249, proteinG: 16.55, carbsG: 72.73, fiberG: 9, sugarsG: 2.43, ...NO_POLYOLS, sodiumMg: 60,
    densityGPerMl: tsp(3.1), densitySource: 'USDA SR portion 1 tsp = 3.1 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 3, label: '3 oz jar' }, priceCents: 349, aisle: 'spices',
    source: `USDA SR28 (NDB 02020): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'onion-powder', name: 'Onion powder', category: 'herbs-spices',
    kcal: 341, fatG: 1.04, satFatG: 0.219, proteinG: 10.41, carbsG: 79.12, fiberG: 15.2, sugarsG: 6.63, ...NO_POLYOLS, sodiumMg: 73,
    densityGPerMl: tsp(2.4), densitySource: 'USDA SR portion 1 tsp = 2.4 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 2.6, label: '2.6 oz jar' }, priceCents: 349, aisle: 'spices',
    source: `USDA SR28 (NDB 02026): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'cumin', name: 'Cumin, ground', category: 'herbs-spices',
    kcal: 375, fatG: 22.27, satFatG: 1.535, proteinG: 17.81, carbsG: 44.24, fiberG: 10.5, sugarsG: 2.25, ...NO_POLYOLS, sodiumMg: 168,
    densityGPerMl: tsp(2.1), densitySource: 'USDA SR portion 1 tsp, ground = 2.1 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 1.5, label: '1.5 oz jar' }, priceCents: 399, aisle: 'spices',
    source: `USDA SR28 "Spices, cumin seed" (NDB 02014): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'chili-flakes', name: 'Crushed red pepper flakes', category: 'herbs-spices',
    kcal: 318, fatG: 17.27, satFatG: 3.26, proteinG: 12.01, carbsG: 56.63, fiberG: 27.2, sugarsG: 10.34, ...NO_POLYOLS, sodiumMg: 30,
    densityGPerMl: tsp(1.8), densitySource: 'USDA SR portion 1 tsp = 1.8 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 1.5, label: '1.5 oz jar' }, priceCents: 299, aisle: 'spices',
    source: `USDA SR28 "Spices, pepper, red or cayenne" (NDB 02031) as composition for flakes: ${SR_COPY}`,
    provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'chili-powder', name: 'Chili powder (blend)', category: 'herbs-spices',
    kcal: 282, fatG: 14.28, satFatG: 2.462, proteinG: 13.46, carbsG: 49.7, fiberG: 34.8, sugarsG: 7.19, ...NO_POLYOLS, sodiumMg: 2867,
    densityGPerMl: tsp(2.7), densitySource: 'USDA SR portion 1 tsp = 2.7 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 2.5, label: '2.5 oz jar' }, priceCents: 299, aisle: 'spices',
    source: `USDA SR28 (NDB 02009): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'oregano-dried', name: 'Oregano, dried', category: 'herbs-spices',
    kcal: 265, fatG: 4.28, satFatG: 1.551, proteinG: 9, carbsG: 68.92, fiberG: 42.5, sugarsG: 4.09, ...NO_POLYOLS, sodiumMg: 25,
    densityGPerMl: tsp(1), densitySource: 'USDA SR portion 1 tsp, leaves = 1 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 0.75, label: '0.75 oz jar' }, priceCents: 299, aisle: 'spices',
    source: `USDA SR28 (NDB 02027): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'basil-dried', name: 'Basil, dried', category: 'herbs-spices',
    kcal: 233, fatG: 4.07, satFatG: 2.157, proteinG: 22.98, carbsG: 47.75, fiberG: 37.7, sugarsG: 1.71, ...NO_POLYOLS, sodiumMg: 76,
    densityGPerMl: tsp(0.7), densitySource: 'USDA SR portion 1 tsp, leaves = 0.7 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 0.62, label: '0.62 oz jar' }, priceCents: 299, aisle: 'spices',
    source: `USDA SR28 (NDB 02003): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'thyme-dried', name: 'Thyme, dried', category: 'herbs-spices',
    kcal: 276, fatG: 7.43, satFatG: 2.73, proteinG: 9.11, carbsG: 63.94, fiberG: 37, sugarsG: 1.71, ...NO_POLYOLS, sodiumMg: 55,
    densityGPerMl: tsp(1), densitySource: 'USDA SR portion 1 tsp, leaves = 1 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 0.8, label: '0.8 oz jar' }, priceCents: 299, aisle: 'spices',
    source: 'USDA SR Legacy values from memory (NDB 02042), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'cinnamon', name: 'Cinnamon, ground', category: 'herbs-spices',
    kcal: 247, fatG: 1.24, satFatG: 0.345, proteinG: 3.99, carbsG: 80.59, fiberG: 53.1, sugarsG: 2.17, ...NO_POLYOLS, sodiumMg: 10,
    densityGPerMl: tsp(2.6), densitySource: 'USDA SR portion 1 tsp = 2.6 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 2.37, label: '2.37 oz jar' }, priceCents: 349, aisle: 'spices',
    source: `USDA SR28 (NDB 02010): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'turmeric', name: 'Turmeric, ground', category: 'herbs-spices',
    kcal: 312, fatG: 3.25, satFatG: 1.838, proteinG: 9.68, carbsG: 67.14, fiberG: 22.7, sugarsG: 3.21, ...NO_POLYOLS, sodiumMg: 27,
    densityGPerMl: tsp(3), densitySource: 'USDA SR portion 1 tsp = 3 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 1.37, label: '1.37 oz jar' }, priceCents: 399, aisle: 'spices',
    source: 'USDA SR Legacy values from memory (NDB 02043), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'everything-bagel-seasoning', name: 'Everything-bagel seasoning', category: 'herbs-spices',
    kcal: 400, fatG: 25, satFatG: 3.3, proteinG: 13, carbsG: 33, fiberG: 10, sugarsG: 3, ...NO_POLYOLS, sodiumMg: 6000,
    densityGPerMl: tsp(3), densitySource: 'package label 1 tsp = 3 g (from memory)',
    pieceWeights: {},
    allergens: ['sesame'], purchase: { unit: 'oz', size: 2.3, label: '2.3 oz jar' }, priceCents: 299, aisle: 'spices',
    source: `${LABEL} (sesame, poppy seed, dried garlic and onion, salt)`, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'cilantro', name: 'Cilantro (coriander leaves), fresh', category: 'herbs-spices',
    kcal: 23, fatG: 0.52, satFatG: 0.014, proteinG: 2.13, carbsG: 3.67, fiberG: 2.8, sugarsG: 0.87, ...NO_POLYOLS, sodiumMg: 46,
    densityGPerMl: cup(16), densitySource: 'USDA SR portion 1 cup = 16 g (from memory)',
    pieceWeights: { bunch: 60 },
    allergens: [], purchase: { unit: 'bunch', size: 1, label: '1 bunch' }, priceCents: 99, aisle: 'produce',
    source: 'USDA SR Legacy values from memory (NDB 11165), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'parsley', name: 'Parsley, fresh', category: 'herbs-spices',
    kcal: 36, fatG: 0.79, satFatG: 0.132, proteinG: 2.97, carbsG: 6.33, fiberG: 3.3, sugarsG: 0.85, ...NO_POLYOLS, sodiumMg: 56,
    densityGPerMl: cup(60), densitySource: 'USDA SR portion 1 cup, chopped = 60 g (from memory)',
    pieceWeights: { bunch: 60 },
    allergens: [], purchase: { unit: 'bunch', size: 1, label: '1 bunch' }, priceCents: 99, aisle: 'produce',
    source: 'USDA SR Legacy values from memory (NDB 11297), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },

  // ---------------------------------------------------------------------------------------------------------
  // Baking
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'baking-powder', name: 'Baking powder, double-acting', category: 'baking',
    kcal: 53, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 27.7, fiberG: 0.2, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 10600,
    densityGPerMl: tsp(4.6), densitySource: 'USDA SR portion 1 tsp = 4.6 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 8.1, label: '8.1 oz can' }, priceCents: 299, aisle: 'baking',
    source: `USDA SR28 (NDB 18369): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'baking-soda', name: 'Baking soda', category: 'baking',
    kcal: 0, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 27360,
    densityGPerMl: tsp(4.6), densitySource: 'USDA SR portion 1 tsp = 4.6 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'lb', size: 1, label: '1 lb box' }, priceCents: 149, aisle: 'baking',
    source: 'USDA SR Legacy values from memory (NDB 18372), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'xanthan-gum', name: 'Xanthan gum', category: 'baking',
    kcal: 160, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 80, fiberG: 78, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 350,
    densityGPerMl: tbsp(9), densitySource: 'package label 1 tbsp = 9 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 8, label: '8 oz bag' }, priceCents: 1199, aisle: 'baking',
    source: `${LABEL}; kcal computed by 21 CFR 101.9(c)(1)(i)(C) with soluble fibre at 2 kcal/g (labels differ in method)`,
    provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'vanilla-extract', name: 'Vanilla extract', category: 'baking',
    kcal: 288, fatG: 0.06, satFatG: 0.01, proteinG: 0.06, carbsG: 12.65, fiberG: 0, sugarsG: 12.65, ...NO_POLYOLS, sodiumMg: 9,
    densityGPerMl: tsp(4.2), densitySource: 'USDA SR portion 1 tsp = 4.2 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 2, label: '2 fl oz bottle' }, priceCents: 799, aisle: 'baking',
    source: `USDA SR28 (NDB 02050): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Contains 34.4 g alcohol per 100 g (USDA SR28), which carries most of its energy.',
  },
  {
    slug: 'cocoa-powder', name: 'Cocoa powder, unsweetened', category: 'baking',
    kcal: 228, fatG: 13.7, satFatG: 8.07, proteinG: 19.6, carbsG: 57.9, fiberG: 37, sugarsG: 1.75, ...NO_POLYOLS, sodiumMg: 21,
    densityGPerMl: tbsp(5.4), densitySource: 'USDA SR portion 1 tbsp = 5.4 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 8, label: '8 oz can' }, priceCents: 499, aisle: 'baking',
    source: `USDA SR28 (NDB 19165): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
  },
  {
    slug: 'chocolate-chips-sugar-free', name: 'Chocolate chips, sugar-free (erythritol/stevia)', category: 'baking',
    kcal: 430, fatG: 32, satFatG: 20, proteinG: 7, carbsG: 57, fiberG: 21, sugarsG: 1, erythritolG: 29, alluloseG: 0, otherPolyolsG: 0, sodiumMg: 10,
    densityGPerMl: tbsp(14), densitySource: 'package label 1 tbsp = 14 g (from memory)',
    pieceWeights: {},
    allergens: ['milk'], purchase: { unit: 'oz', size: 9, label: '9 oz bag' }, priceCents: 699, aisle: 'baking',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
    note: 'Milk listed to be safe: many contain milk fat or are made on shared lines; soy lecithin is common. Read the label.',
  },
  {
    slug: 'gelatin', name: 'Gelatin, unflavored, dry', category: 'baking',
    kcal: 335, fatG: 0.1, satFatG: 0.07, proteinG: 85.6, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 196,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { envelope: 7 },
    allergens: [], purchase: { unit: 'envelope', size: 4, label: 'box of 4 envelopes' }, priceCents: 249, aisle: 'baking',
    source: 'USDA SR Legacy values from memory (NDB 19177), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'vital-wheat-gluten', name: 'Vital wheat gluten', category: 'baking',
    kcal: 370, fatG: 1.85, satFatG: 0.272, proteinG: 75.16, carbsG: 13.79, fiberG: 0.6, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 29,
    densityGPerMl: cup(120), densitySource: 'package label 1/4 cup = 30 g (from memory)',
    pieceWeights: {},
    allergens: ['wheat'], purchase: { unit: 'oz', size: 22, label: '22 oz bag' }, priceCents: 799, aisle: 'baking',
    source: 'USDA SR Legacy values from memory (vital wheat gluten), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },

  // ---------------------------------------------------------------------------------------------------------
  // Drinks
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'almond-milk-unsweetened', name: 'Almond milk, unsweetened', category: 'drinks',
    kcal: 12.5, fatG: 1.04, satFatG: 0.1, proteinG: 0.41, carbsG: 0.41, fiberG: 0.2, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 71,
    densityGPerMl: 1.0, densitySource: 'assumed water-like, 1 g/mL (label 1 cup = 240 mL; from memory)',
    pieceWeights: {},
    allergens: ['tree-nuts'], purchase: { unit: 'floz', size: 64, label: 'half gallon (64 fl oz)' }, priceCents: 349, aisle: 'dairy-eggs',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'coconut-milk-beverage', name: 'Coconut milk beverage, unsweetened (carton)', category: 'drinks',
    kcal: 19, fatG: 1.9, satFatG: 1.7, proteinG: 0, carbsG: 0.4, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 19,
    densityGPerMl: 1.0, densitySource: 'assumed water-like, 1 g/mL (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 64, label: 'half gallon (64 fl oz)' }, priceCents: 399, aisle: 'dairy-eggs',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
    note: 'Coconut is not a tree nut in current FDA guidance (from memory).',
  },
  {
    slug: 'coffee-brewed', name: 'Coffee, brewed', category: 'drinks',
    kcal: 1, fatG: 0.02, satFatG: 0.002, proteinG: 0.12, carbsG: 0, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 2,
    densityGPerMl: cup(237), densitySource: 'USDA SR portion 1 cup = 237 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 48, label: '48 fl oz cold-brew carton' }, priceCents: 599, aisle: 'canned-jarred',
    source: 'USDA SR Legacy values from memory (NDB 14209), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },

  // ---------------------------------------------------------------------------------------------------------
  // Other
  // ---------------------------------------------------------------------------------------------------------
  {
    slug: 'coconut-milk-canned', name: 'Coconut milk, canned (full fat)', category: 'other',
    kcal: 197, fatG: 21.33, satFatG: 18.915, proteinG: 2.02, carbsG: 2.81, fiberG: 0, sugarsG: 2, ...NO_POLYOLS, sodiumMg: 13,
    densityGPerMl: cup(226), densitySource: 'USDA SR portion 1 cup = 226 g (from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 13.5, label: '13.5 fl oz can' }, priceCents: 299, aisle: 'canned-jarred',
    source: `USDA SR28 (NDB 12118): ${SR_COPY}`, provenance: 'usda-sr28-public-copy', fdcId: null,
    note: 'Coconut is not a tree nut in current FDA guidance (from memory).',
  },
  {
    slug: 'bone-broth', name: 'Bone broth, chicken or beef', category: 'other',
    kcal: 17, fatG: 0.2, satFatG: 0.1, proteinG: 3.75, carbsG: 0.2, fiberG: 0, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 170,
    densityGPerMl: 1.0, densitySource: 'assumed water-like, 1 g/mL (label 1 cup = 240 mL; from memory)',
    pieceWeights: {},
    allergens: [], purchase: { unit: 'floz', size: 32, label: '32 fl oz carton' }, priceCents: 599, aisle: 'canned-jarred',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'shirataki-noodles', name: 'Shirataki noodles (konjac)', category: 'other',
    kcal: 8, fatG: 0, satFatG: 0, proteinG: 0, carbsG: 3.5, fiberG: 3.3, sugarsG: 0, ...NO_POLYOLS, sodiumMg: 5,
    densityGPerMl: null, densitySource: null,
    pieceWeights: {},
    allergens: [], purchase: { unit: 'oz', size: 8, label: '8 oz bag (drained)' }, priceCents: 299, aisle: 'produce',
    source: `${LABEL}; kcal computed by 21 CFR 101.9(c)(1)(i)(C) with soluble fibre at 2 kcal/g (labels print 0 to 10)`,
    provenance: 'label-from-memory', fdcId: null,
  },
  {
    slug: 'tofu-firm', name: 'Tofu, firm (calcium sulfate)', category: 'other',
    kcal: 144, fatG: 8.72, satFatG: 1.261, proteinG: 17.27, carbsG: 2.78, fiberG: 2.3, sugarsG: 0.7, ...NO_POLYOLS, sodiumMg: 14,
    densityGPerMl: null, densitySource: null,
    pieceWeights: { block: 396 },
    allergens: ['soy'], purchase: { unit: 'block', size: 1, label: '14 oz block' }, priceCents: 249, aisle: 'produce',
    source: 'USDA SR Legacy values from memory (NDB 16427), not verified', provenance: 'usda-sr-from-memory', fdcId: null,
  },
  {
    slug: 'whey-protein-isolate', name: 'Whey protein isolate, unflavored', category: 'other',
    kcal: 370, fatG: 1, satFatG: 0.5, proteinG: 87, carbsG: 3, fiberG: 0, sugarsG: 1, ...NO_POLYOLS, sodiumMg: 500,
    densityGPerMl: cup(120), densitySource: 'package label 1 scoop (about 1/4 cup) = 30 g (from memory)',
    pieceWeights: { scoop: 30 },
    allergens: ['milk'], purchase: { unit: 'lb', size: 2, label: '2 lb tub' }, priceCents: 3999, aisle: 'health-food',
    source: LABEL, provenance: 'label-from-memory', fdcId: null,
  },
];
