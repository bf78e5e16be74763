// Counted nouns follow CLDR's English plural rule (Unicode CLDR, plurals.xml: "one" is i = 1 and v = 0), as
// Intl.PluralRules implements it: 0 and fractions take the plural ("0 warnings", "1.5 portions").
import { describe, expect, it } from 'vitest';
import { agrees, counted, filterByText } from '@/lib/words';

describe('counted nouns', () => {
  it('takes the singular for exactly one, the plural otherwise', () => {
    expect(counted(1, 'warning')).toBe('1 warning');
    expect(counted(0, 'warning')).toBe('0 warnings');
    expect(counted(2, 'warning')).toBe('2 warnings');
    expect(counted(1.5, 'portion')).toBe('1.5 portions');
  });

  it('takes an irregular plural and a verb that agrees', () => {
    expect(counted(3, 'sheet of labels', 'sheets of labels')).toBe('3 sheets of labels');
    expect(`${counted(1, 'problem')} ${agrees(1, 'blocks', 'block')} publishing`).toBe('1 problem blocks publishing');
    expect(`${counted(2, 'problem')} ${agrees(2, 'blocks', 'block')} publishing`).toBe('2 problems block publishing');
  });
});

describe('filtering a list by what is typed', () => {
  // Invented names. Accents are dropped by Unicode canonical decomposition (NFD) and removing the combining marks.
  const people = [
    { name: 'Tomás Ferreira', allergens: ['Milk'] },
    { name: 'Ana Ruiz', allergens: ['Egg', 'Tree nuts'] },
    { name: 'Marcus Bell', allergens: ['Egg'] },
  ];
  const find = (q: string) => filterByText(people, q, (p) => [p.name, ...p.allergens]).map((p) => p.name);

  it('keeps every item for an empty query and matches words in any order, any case, without accents', () => {
    expect(find('  ')).toEqual(['Tomás Ferreira', 'Ana Ruiz', 'Marcus Bell']);
    expect(find('tomas')).toEqual(['Tomás Ferreira']);
    expect(find('egg')).toEqual(['Ana Ruiz', 'Marcus Bell']);
    expect(find('EGG ana')).toEqual(['Ana Ruiz']);
    expect(find('nuts tree')).toEqual(['Ana Ruiz']);
    expect(find('soy')).toEqual([]);
  });
});
