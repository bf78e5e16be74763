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
