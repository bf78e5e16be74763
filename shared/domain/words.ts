/** Words the pages and the server's sentences share (English, as every word of the product is). */

const conjunction = new Intl.ListFormat('en-US', { style: 'long', type: 'conjunction' });

/** "A", "A and B", "A, B, and C" (ECMA-402 list formatting, en-US). */
export function andList(items: readonly string[]): string {
  return conjunction.format(items);
}
