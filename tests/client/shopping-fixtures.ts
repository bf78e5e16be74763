import type { ShoppingItemDto, ShoppingListDto } from '@shared/schemas/shopping.schema';

/** A shopping-list item for client tests (invented values): 100 g of an item in the dairy aisle, to buy. */
export const shoppingItem = (ingredientId: number, checked = false): ShoppingItemDto => ({
  ingredientId,
  name: `Item ${ingredientId}`,
  aisle: 'dairy-eggs',
  aisleLabel: 'Dairy and eggs',
  baseUnit: 'g',
  needed: 100,
  inPantry: 0,
  fromPantry: 0,
  toBuy: 100,
  neededText: '3.5 oz',
  toBuyText: '3.5 oz',
  purchase: null,
  costCents: null,
  check: { checked, checkedBy: null, checkedAt: null },
});

/** Week 7's shopping list with these items, none checked yet. */
export const shoppingList = (items: ShoppingItemDto[]): ShoppingListDto => ({
  weekId: 7,
  prepDate: null,
  tripDates: [],
  alsoBought: [],
  aisles: [{ aisle: 'dairy-eggs', label: 'Dairy and eggs', items }],
  itemCount: items.length,
  checkedCount: 0,
  totalCostCents: 0,
  costComplete: false,
  problems: [],
  bought: null,
});
