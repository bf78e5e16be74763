/** Words the pages and the server's sentences share (English, as every word of the product is). */

const conjunction = new Intl.ListFormat('en-US', { style: 'long', type: 'conjunction' });

/** "A", "A and B", "A, B, and C" (ECMA-402 list formatting, en-US). */
export function andList(items: readonly string[]): string {
  return conjunction.format(items);
}

const names = new Intl.Collator('en-US', { numeric: true });

/**
 * The order of names on every list: alphabetical without regard to capitals first ("almond flour" before "Bacon"),
 * digits read as numbers ("Plate 2" before "Plate 10"), accents after the plain letter ("Eclair", "Éclair", "Eggs").
 * ECMA-402 collation (the Unicode Collation Algorithm with CLDR's English rules, `numeric` as CLDR's `kn`); the
 * database sorts the same names with its "name_order" collation (ICU, `und-u-kn-true`), so a page sorted by the
 * server and one sorted here agree.
 */
export function compareNames(a: string, b: string): number {
  return names.compare(a, b);
}
