import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  OTHER_AISLE,
  UnknownIngredientError,
  buildShoppingList,
  roundUpToPurchase,
  toBaseAmount,
  type ShoppingIngredient,
  type ShoppingNeed,
} from '@shared/domain/shopping';
import { GRAMS_PER_UNIT, MILLILITERS_PER_UNIT, UnitConversionError } from '@shared/domain/units';

// 1 dozen = 12 (common usage); egg piece weight: USDA FDC 171287 "large, 50.0 g".
const eggs: ShoppingIngredient = {
  id: 'egg',
  name: 'Eggs, large',
  aisle: 'Dairy',
  buyBy: 'count',
  countPiece: 'large',
  pieceWeights: { large: 50 },
  purchase: { label: 'dozen', size: 12, unit: 'large', price: '4.29' },
};
const cheddar: ShoppingIngredient = {
  id: 'cheddar',
  name: 'Cheddar',
  aisle: 'Dairy',
  purchase: { label: '8 oz package', size: 8, unit: 'oz', price: '3.49' },
};
// SR28: 1 cup heavy whipping cream = 238 g → density 238 g ÷ 236.5882365 mL (NIST cup).
const cream: ShoppingIngredient = {
  id: 'cream',
  name: 'Heavy cream',
  aisle: 'Dairy',
  densityGPerMl: new Decimal(238).div(MILLILITERS_PER_UNIT.cup).toString(),
  purchase: { label: '1 quart carton', size: 1, unit: 'quart', price: null },
};
const spinach: ShoppingIngredient = { id: 'spinach', name: 'Spinach', aisle: 'Produce', pieceWeights: { package: 284 } };
const salt: ShoppingIngredient = { id: 'salt', name: 'Salt' };

const ingredients = [eggs, cheddar, cream, spinach, salt];
const one = (needs: ShoppingNeed[], pantry: ShoppingNeed[] = []) => {
  const list = buildShoppingList({ needs, ingredients, pantry });
  expect(list.items).toHaveLength(1);
  return list.items[0];
};

describe('purchase rounding (the brief\'s examples; arithmetic, common practice)', () => {
  // [label, needs, packages, spare in the purchase unit]
  const cases: Array<[string, ShoppingNeed[], number, string]> = [
    ['36 eggs → 3 dozen', [{ ingredientId: 'egg', amount: 36, unit: 'large' }], 3, '0'],
    ['37 eggs → 4 dozen, 11 spare', [{ ingredientId: 'egg', amount: 37, unit: 'large' }], 4, '11'],
    ['30 oz of an 8 oz package → 4 packages, 2 oz spare', [{ ingredientId: 'cheddar', amount: 30, unit: 'oz' }], 4, '2'],
    ['1 lb 14 oz in two lines is the same 30 oz (NIST: 1 lb = 16 oz)', [
      { ingredientId: 'cheddar', amount: 1, unit: 'lb' },
      { ingredientId: 'cheddar', amount: 14, unit: 'oz' },
    ], 4, '2'],
    ['exactly 2 packages stays 2 (no rounding noise)', [{ ingredientId: 'cheddar', amount: 1, unit: 'lb' }], 2, '0'],
    ['2 ¼ cups of cream (2 cups + 4 tbsp) → 1 quart carton, 1 ¾ cups = 0.4375 quart spare (NIST: 1 quart = 4 cups)', [
      { ingredientId: 'cream', amount: 2, unit: 'cup' },
      { ingredientId: 'cream', amount: 4, unit: 'tbsp' },
    ], 1, '0.4375'],
  ];
  it.each(cases)('%s', (_label, needs, packages, spare) => {
    const item = one(needs);
    expect(item.purchase!.packages).toBe(packages);
    expect(item.purchase!.spareInPurchaseUnit.toDecimalPlaces(12).eq(spare)).toBe(true);
  });

  it('adds up needs across units into grams: 2 cups + 4 tbsp of cream = 2.25 × 238 g', () => {
    const item = one([
      { ingredientId: 'cream', amount: 2, unit: 'cup' },
      { ingredientId: 'cream', amount: 4, unit: 'tbsp' },
    ]);
    expect(item.base).toEqual({ kind: 'mass', unit: 'g' });
    expect(item.needed.toDecimalPlaces(9).eq('535.5')).toBe(true);
  });

  it('count-bought items take grams and other pieces through the piece weight: 100 g of egg = 2 large', () => {
    expect(toBaseAmount(100, 'g', eggs).eq(2)).toBe(true);
    const item = one([{ ingredientId: 'egg', amount: 100, unit: 'g' }, { ingredientId: 'egg', amount: 10, unit: 'large' }]);
    expect(item.base).toEqual({ kind: 'count', unit: 'large' });
    expect(item.needed.eq(12)).toBe(true);
    expect(item.purchase!.packages).toBe(1);
  });

  it('packages by piece: 3 × 10-oz spinach packages are 852 g (SR28: package 284 g)', () => {
    const item = one([{ ingredientId: 'spinach', amount: 3, unit: 'package' }]);
    expect(item.needed.eq(852)).toBe(true);
    expect(item.purchase).toBeNull();
  });

  it('a need of 0 buys 0 packages', () => {
    expect(roundUpToPurchase(0, cheddar.purchase!, cheddar).packages).toBe(0);
  });
});

describe('pantry', () => {
  // [label, need, pantry, fromPantry, toBuy, packages]
  const cases: Array<[string, ShoppingNeed, ShoppingNeed, string, string, number]> = [
    ['10 eggs on hand of 36 → buy 26 → 3 dozen', { ingredientId: 'egg', amount: 36, unit: 'large' }, { ingredientId: 'egg', amount: 10, unit: 'large' }, '10', '26', 3],
    ['40 eggs on hand of 36 → buy 0, never below zero', { ingredientId: 'egg', amount: 36, unit: 'large' }, { ingredientId: 'egg', amount: 40, unit: 'large' }, '36', '0', 0],
    ['1 lb cheddar on hand of 30 oz → 14 oz → 2 packages', { ingredientId: 'cheddar', amount: 30, unit: 'oz' }, { ingredientId: 'cheddar', amount: 1, unit: 'lb' }, GRAMS_PER_UNIT.lb.toString(), GRAMS_PER_UNIT.oz.times(14).toString(), 2],
  ];
  it.each(cases)('%s', (_label, need, stock, fromPantry, toBuy, packages) => {
    const item = one([need], [stock]);
    expect(item.fromPantry.eq(fromPantry)).toBe(true);
    expect(item.toBuy.eq(toBuy)).toBe(true);
    expect(item.purchase!.packages).toBe(packages);
  });

  it('pantry rows for ingredients nobody needs do not add items', () => {
    const list = buildShoppingList({
      needs: [{ ingredientId: 'egg', amount: 6, unit: 'large' }],
      pantry: [{ ingredientId: 'cheddar', amount: 2, unit: 'lb' }],
      ingredients,
    });
    expect(list.items.map((i) => i.ingredientId)).toEqual(['egg']);
  });
});

describe('cost and aisles', () => {
  it('costs packages × price, and says when a price is missing', () => {
    const list = buildShoppingList({
      needs: [
        { ingredientId: 'egg', amount: 36, unit: 'large' },
        { ingredientId: 'cheddar', amount: 30, unit: 'oz' },
      ],
      ingredients,
    });
    const byId = Object.fromEntries(list.items.map((i) => [i.ingredientId, i]));
    expect(byId.egg.cost!.eq('12.87')).toBe(true); // 3 × 4.29
    expect(byId.cheddar.cost!.eq('13.96')).toBe(true); // 4 × 3.49
    expect(list.totalCost.eq('26.83')).toBe(true);
    expect(list.costComplete).toBe(true);

    const withCream = buildShoppingList({ needs: [{ ingredientId: 'cream', amount: 1, unit: 'cup' }], ingredients });
    expect(withCream.items[0].cost).toBeNull();
    expect(withCream.costComplete).toBe(false);
  });

  it('groups by aisle in store order, unlisted aisles alphabetically, "Other" last; items by name', () => {
    const list = buildShoppingList({
      needs: [
        { ingredientId: 'salt', amount: 10, unit: 'g' },
        { ingredientId: 'cheddar', amount: 8, unit: 'oz' },
        { ingredientId: 'spinach', amount: 1, unit: 'package' },
        { ingredientId: 'egg', amount: 12, unit: 'large' },
      ],
      ingredients,
      aisleOrder: ['produce'],
    });
    expect(list.aisles.map((a) => [a.aisle, a.items.map((i) => i.name)])).toEqual([
      ['Produce', ['Spinach']],
      ['Dairy', ['Cheddar', 'Eggs, large']],
      [OTHER_AISLE, ['Salt']],
    ]);
  });
});

describe('errors', () => {
  it('an unknown ingredient id throws UnknownIngredientError', () => {
    expect(() => buildShoppingList({ needs: [{ ingredientId: 'nope', amount: 1, unit: 'g' }], ingredients })).toThrow(
      UnknownIngredientError,
    );
  });

  it('a volume need for an ingredient without density throws UnitConversionError, never 0', () => {
    expect(() => buildShoppingList({ needs: [{ ingredientId: 'cheddar', amount: 1, unit: 'cup' }], ingredients })).toThrow(
      UnitConversionError,
    );
  });

  it('a negative need is refused', () => {
    expect(() => buildShoppingList({ needs: [{ ingredientId: 'salt', amount: -1, unit: 'g' }], ingredients })).toThrow(RangeError);
  });
});

describe('properties (fast-check)', () => {
  it('the fewest whole packages that cover what is left after the pantry, never below zero', () => {
    fc.assert(
      fc.property(fc.nat(400), fc.nat(400), fc.integer({ min: 1, max: 40 }), (needOz, stockOz, sizeOz) => {
        const ingredient: ShoppingIngredient = { ...cheddar, purchase: { label: 'pack', size: sizeOz, unit: 'oz' } };
        const list = buildShoppingList({
          needs: [{ ingredientId: 'cheddar', amount: needOz, unit: 'oz' }],
          pantry: [{ ingredientId: 'cheddar', amount: stockOz, unit: 'oz' }],
          ingredients: [ingredient],
        });
        const item = list.items[0];
        const left = Math.max(0, needOz - stockOz);
        const packages = item.purchase!.packages;
        return (
          item.toBuy.gte(0) &&
          packages === Math.ceil(left / sizeOz) &&
          item.purchase!.spare.gte(0) &&
          item.purchase!.spareInPurchaseUnit.toDecimalPlaces(9).eq(packages * sizeOz - left)
        );
      }),
    );
  });
});
