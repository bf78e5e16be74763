// The order of names. Outside reference: the Unicode Collation Algorithm (UTS #10) with CLDR's root/English order,
// as ECMA-402's Intl.Collator implements it, `numeric` being CLDR's `kn` key (UTS #35, "colNumeric"): letters compare
// first without regard to case or accents (primary strength), then accents, then case (small before capital in
// CLDR root, tertiary strength); a run of digits compares as a number. The lists below are worked by hand from those
// rules. Plain code-point order (the database's C collation before) would put "Zucchini" before "almond".
import { describe, expect, it } from 'vitest';
import { andList, compareNames } from '@shared/domain/words';

const sorted = (xs: string[]) => [...xs].sort(compareNames);

describe('names in order', () => {
  it('is alphabetical whatever the capitals', () => {
    expect(sorted(['Zucchini', 'almond flour', 'Bacon', 'de Vries', 'Dahl'])).toEqual(['almond flour', 'Bacon', 'Dahl', 'de Vries', 'Zucchini']);
  });

  it('reads digits as numbers', () => {
    expect(sorted(['Plate 10', 'Plate 2', 'Plate 1', 'Plate 11'])).toEqual(['Plate 1', 'Plate 2', 'Plate 10', 'Plate 11']);
    expect(sorted(['Oven 12', 'Oven 3'])).toEqual(['Oven 3', 'Oven 12']);
  });

  it('puts an accented letter beside its plain one, after it when the names are otherwise equal', () => {
    expect(sorted(['Eggs', 'Éclair', 'Eclair', 'Feta'])).toEqual(['Eclair', 'Éclair', 'Eggs', 'Feta']);
  });

  it('breaks a tie of letters by case, small first (CLDR root), so the order is one order', () => {
    expect(sorted(['Bench', 'bench'])).toEqual(['bench', 'Bench']);
    expect(compareNames('bench', 'bench')).toBe(0);
  });
});

describe('lists in words', () => {
  it('joins with "and" and the serial comma (ECMA-402 Intl.ListFormat, en-US)', () => {
    expect(andList([])).toBe('');
    expect(andList(['A'])).toBe('A');
    expect(andList(['A', 'B'])).toBe('A and B');
    expect(andList(['A', 'B', 'C'])).toBe('A, B, and C');
  });
});
