import Decimal from 'decimal.js';
import type { MeasureSystem } from '@shared/domain/units.js';
import { OTHER_AISLE, type ShoppingItem } from '@shared/domain/shopping.js';
import { STORE_AISLE_LABELS, type StoreAisleCode } from '@shared/schemas/ingredients.schema.js';
import type { ShoppingCheckDto, ShoppingItemDto, ShoppingListDto } from '@shared/schemas/shopping.schema.js';
import { baseAmountText } from './shopping-ingredient.js';
import type { ComputedShoppingList } from './shopping.service.js';

const UNCHECKED: ShoppingCheckDto = { checked: false, checkedBy: null, checkedAt: null };

const n2 = (d: Decimal) => d.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toNumber();
/** Currency units (the domain's costs) as whole cents for the answer. */
const cents = (d: Decimal) => d.times(100).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber();

export function aisleLabel(aisle: string): string {
  if (aisle === OTHER_AISLE) return 'Other';
  return STORE_AISLE_LABELS[aisle as StoreAisleCode] ?? aisle;
}

function presentItem(item: ShoppingItem, computed: ComputedShoppingList, check: ShoppingCheckDto, system: MeasureSystem): ShoppingItemDto {
  const ing = computed.ingredients.get(Number(item.ingredientId))!;
  const p = item.purchase;
  return {
    ingredientId: Number(item.ingredientId),
    name: item.name,
    aisle: item.aisle,
    aisleLabel: aisleLabel(item.aisle),
    baseUnit: item.base.unit,
    needed: n2(item.needed),
    inPantry: n2(item.inPantry),
    fromPantry: n2(item.fromPantry),
    toBuy: n2(item.toBuy),
    neededText: baseAmountText(item.needed, ing, system),
    toBuyText: baseAmountText(item.toBuy, ing, system),
    purchase: p
      ? {
          label: p.label,
          packages: p.packages,
          size: p.size.toNumber(),
          unit: p.unit,
          spare: n2(p.spareInPurchaseUnit),
          spareText: baseAmountText(p.spare, ing, system),
        }
      : null,
    costCents: item.cost ? cents(item.cost) : null,
    check,
  };
}

export function presentShoppingList(
  computed: ComputedShoppingList,
  opts: {
    weekId: number | null;
    /** The trip's prep date (null: the whole week) and the week's trip dates (see ShoppingListDto). */
    prepDate?: string | null;
    tripDates?: string[];
    /** The reader's measure preference for the written amounts (`neededText`, `toBuyText`, `spareText`). */
    system: MeasureSystem;
    checks?: ReadonlyMap<number, ShoppingCheckDto>;
    bought?: { at: string; by: string | null } | null;
    alsoBought?: { prepDate: string | null; at: string }[];
  },
): ShoppingListDto {
  const aisles = computed.list.aisles.map((g) => ({
    aisle: g.aisle,
    label: aisleLabel(g.aisle),
    items: g.items.map((i) => presentItem(i, computed, opts.checks?.get(Number(i.ingredientId)) ?? UNCHECKED, opts.system)),
  }));
  const items = aisles.flatMap((a) => a.items);
  return {
    weekId: opts.weekId,
    prepDate: opts.prepDate ?? null,
    tripDates: opts.tripDates ?? [],
    aisles,
    itemCount: items.length,
    checkedCount: items.filter((i) => i.check.checked).length,
    totalCostCents: cents(computed.list.totalCost),
    costComplete: computed.list.costComplete,
    problems: computed.problems,
    bought: opts.bought ?? null,
    alsoBought: opts.alsoBought ?? [],
  };
}
