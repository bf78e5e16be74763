import type { ShoppingItem, ShoppingList } from '@shared/domain/shopping.js';
import { createDoc, finishDoc, heading, paragraph, table, type Column } from './pdf-document.js';
import { fixed } from './pdf-format.js';

export interface ShoppingListPdfMeta {
  businessName: string;
  /** e.g. "Shopping list, week of Mon 7 Dec". */
  title: string;
  /** Currency symbol or code shown before prices. */
  currency?: string;
  filename?: string;
  /**
   * An amount of an item (in its base unit) as written for the reader: kitchen amounts in their measure system.
   * Without it, grams or the bare piece count.
   */
  amountText?: (item: ShoppingItem, value: ShoppingItem['needed']) => string;
}

function plainAmount(item: ShoppingItem, value: ShoppingItem['needed']): string {
  const n = fixed(value, 2).replace(/\.?0+$/, '');
  if (item.base.kind === 'mass') return `${fixed(value, 0)} g`;
  return item.base.unit === 'each' ? n : `${n} ${item.base.unit}`;
}

const COLUMNS: Column[] = [
  { header: 'Got', width: 0.05, align: 'center' },
  { header: 'Item', width: 0.29 },
  { header: 'Needed', width: 0.12, align: 'right' },
  { header: 'Pantry', width: 0.11, align: 'right' },
  { header: 'To buy', width: 0.12, align: 'right' },
  { header: 'Buy', width: 0.19 },
  { header: 'Cost', width: 0.12, align: 'right' },
];

/** The shopping list (shared/domain/shopping.ts `buildShoppingList`), grouped by aisle, with boxes to tick. */
export async function renderShoppingListPdf(list: ShoppingList, meta: ShoppingListPdfMeta): Promise<{ filename: string; buffer: Buffer }> {
  const doc = createDoc({ businessName: meta.businessName, title: meta.title, subject: 'Shopping list' });
  const cur = meta.currency ?? '$';
  const amount = meta.amountText ?? plainAmount;
  heading(doc, meta.title, 20);
  const toBuy = list.items.filter((i) => i.toBuy.gt(0)).length;
  paragraph(doc, `${toBuy} of ${list.items.length} items to buy; the pantry covers the rest. Packages are rounded up.`);
  doc.moveDown(0.5);
  for (const group of list.aisles) {
    heading(doc, group.aisle, 13);
    const rows = group.items.map((item) => [
      '[ ]',
      item.name,
      amount(item, item.needed),
      item.fromPantry.gt(0) ? amount(item, item.fromPantry) : '',
      amount(item, item.toBuy),
      item.purchase && item.toBuy.gt(0) ? `${item.purchase.packages} × ${item.purchase.label}` : item.toBuy.gt(0) ? 'as needed' : 'nothing',
      item.cost && item.cost.gt(0) ? `${cur}${fixed(item.cost, 2)}` : '',
    ]);
    table(doc, COLUMNS, rows);
  }
  doc.moveDown(0.5);
  paragraph(doc, `Total: ${cur}${fixed(list.totalCost, 2)}${list.costComplete ? '' : ' (at least: some items have no price)'}`, { bold: true, size: 12 });
  return { filename: meta.filename ?? 'shopping-list.pdf', buffer: await finishDoc(doc, { businessName: meta.businessName, title: meta.title }) };
}
