const rules = new Intl.PluralRules('en-US');

/**
 * A count with its noun in the right number, by the language's own plural rules (Intl.PluralRules):
 * `counted(1, 'warning')` → "1 warning", `counted(3, 'warning')` → "3 warnings", `counted(2, 'batch', 'batches')`.
 */
export function counted(n: number, one: string, other = `${one}s`): string {
  return `${n} ${rules.select(n) === 'one' ? one : other}`;
}

/** The verb that agrees with a count: `agrees(1, 'blocks', 'block')` → "blocks". */
export function agrees(n: number, one: string, other: string): string {
  return rules.select(n) === 'one' ? one : other;
}

/** Lower case without accents: "Tomás" and "tomas" read the same to a search box (Unicode NFD, marks dropped). */
function folded(s: string): string {
  return s.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase();
}

/**
 * The items whose texts contain every word of `query`, in any order, ignoring case and accents; all of them for an
 * empty query. `filterByText(clients, 'egg ana', (c) => [c.name, ...c.allergens])`.
 */
export function filterByText<T>(items: readonly T[], query: string, texts: (item: T) => readonly string[]): T[] {
  const words = folded(query).split(/\s+/).filter(Boolean);
  if (words.length === 0) return [...items];
  return items.filter((item) => {
    const hay = folded(texts(item).join(' '));
    return words.every((w) => hay.includes(w));
  });
}

/** Each role as people read it on screens. */
export const ROLE_WORDS = { coach: 'Coach', assistant: 'Kitchen assistant', client: 'Client' } as const;
