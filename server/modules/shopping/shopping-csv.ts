import Papa from 'papaparse';
import type { ShoppingListDto } from '@shared/schemas/shopping.schema.js';

export const SHOPPING_CSV_COLUMNS = [
  'Aisle',
  'Item',
  'Needed',
  'From pantry',
  'To buy',
  'Unit',
  'Packages',
  'Package',
  'Spare',
  'Estimated cost',
  'Checked',
] as const;

const cents = (c: number | null) => (c === null ? '' : (c / 100).toFixed(2));

/**
 * The list as CSV (RFC 4180 via papaparse): one row per item in aisle order; amounts in the base unit (g or pieces),
 * packages and spare in the purchase unit. Cells that a spreadsheet would run as a formula are escaped.
 */
export function shoppingCsv(list: ShoppingListDto): string {
  const rows = list.aisles.flatMap((a) =>
    a.items.map((i) => [
      a.label,
      i.name,
      i.needed,
      i.fromPantry,
      i.toBuy,
      i.baseUnit,
      i.purchase ? i.purchase.packages : '',
      i.purchase ? i.purchase.label : '',
      i.purchase ? `${i.purchase.spare} ${i.purchase.unit}` : '',
      cents(i.costCents),
      i.check.checked ? 'yes' : 'no',
    ]),
  );
  return Papa.unparse({ fields: [...SHOPPING_CSV_COLUMNS], data: rows }, { escapeFormulae: true, newline: '\r\n' });
}
