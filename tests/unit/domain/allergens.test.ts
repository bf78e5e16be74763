import { describe, expect, it } from 'vitest';
import {
  ALLERGEN_CODES,
  MAJOR_ALLERGENS,
  allergenConflicts,
  clientAllergenNotes,
  allergenLabel,
  isAllergenCode,
  type AllergenCode,
} from '@shared/domain/allergens';

// The US major food allergens (published-values §9):
// FALCPA 2004, 21 U.S.C. 321(qq): milk, egg, fish, crustacean shellfish, tree nuts, wheat, peanuts, soybeans;
// FASTER Act 2021 (Pub. L. 117-11): sesame, the ninth.
const FALCPA_2004 = ['milk', 'egg', 'fish', 'crustacean shellfish', 'tree nuts', 'peanuts', 'wheat', 'soy'];
const FASTER_ACT_2021 = ['sesame'];

describe('MAJOR_ALLERGENS against FALCPA 2004 + FASTER Act 2021', () => {
  it('holds exactly nine, with unique codes', () => {
    expect(MAJOR_ALLERGENS).toHaveLength(FALCPA_2004.length + FASTER_ACT_2021.length);
    expect(new Set(ALLERGEN_CODES).size).toBe(9);
  });

  it.each([
    ...FALCPA_2004.map((name) => ({ name, law: 'FALCPA 2004' })),
    ...FASTER_ACT_2021.map((name) => ({ name, law: 'FASTER Act 2021' })),
  ])('$name comes from $law', ({ name, law }) => {
    const found = MAJOR_ALLERGENS.find((a) => a.label.toLowerCase() === name);
    expect(found?.law).toBe(law);
    expect(found?.code).toBe(name.replace(/ /g, '-'));
  });

  it.each(['celery', 'mustard', 'lupin', 'molluscs', 'sulphites', 'gluten', 'coconut'])(
    '%s is not a US major allergen (it is EU Annex II only, or not listed)',
    (code) => {
      expect(isAllergenCode(code)).toBe(false);
    },
  );
});

describe('helpers', () => {
  it.each([
    { code: 'crustacean-shellfish' as AllergenCode, label: 'Crustacean shellfish' },
    { code: 'tree-nuts' as AllergenCode, label: 'Tree nuts' },
    { code: 'soy' as AllergenCode, label: 'Soy' },
  ])('allergenLabel($code) = $label', ({ code, label }) => {
    expect(allergenLabel(code)).toBe(label);
  });

  it('rejects an unknown code', () => {
    expect(() => allergenLabel('celery' as AllergenCode)).toThrow(RangeError);
  });

  it.each([
    { plate: ['egg', 'milk'], client: ['milk', 'tree-nuts'], conflicts: ['milk'] },
    { plate: ['sesame', 'tree-nuts', 'milk', 'milk'], client: ['milk', 'sesame', 'tree-nuts'], conflicts: ['milk', 'tree-nuts', 'sesame'] },
    { plate: ['egg'], client: [], conflicts: [] },
  ] as { plate: AllergenCode[]; client: AllergenCode[]; conflicts: AllergenCode[] }[])(
    'allergenConflicts($plate, $client) = $conflicts (once each, in list order)',
    ({ plate, client, conflicts }) => {
      expect(allergenConflicts(plate, client)).toEqual(conflicts);
    },
  );
});

describe('clientAllergenNotes (what a client reads of the allergens on their list that a plate holds)', () => {
  const NOT_AGREED = 'If you have not agreed it with your coach, do not eat it: ask them first.';
  it('says nothing without one', () => {
    expect(clientAllergenNotes([], ['milk'])).toEqual([]);
    expect(clientAllergenNotes([], undefined)).toEqual([]);
  });
  it('allowed by the coach: names them in a list as English writes one (ECMA-402 list format, en-US) and says what to do', () => {
    expect(clientAllergenNotes(['milk'], ['milk'])).toEqual([
      { tone: 'warn', title: 'Milk is on your allergen list', body: `Your coach chose this plate for you knowing that. ${NOT_AGREED}` },
    ]);
    expect(clientAllergenNotes(['milk', 'wheat'], ['milk', 'wheat'])[0].title).toBe('Milk and wheat are on your allergen list');
    expect(clientAllergenNotes(['milk', 'wheat', 'sesame'], ['milk', 'wheat', 'sesame'])[0].title).toBe('Milk, wheat, and sesame are on your allergen list');
  });
  it('on the list and not allowed (added to the list after the plan was published): not to be eaten before asking, said first', () => {
    expect(clientAllergenNotes(['milk', 'egg'], ['milk'])).toEqual([
      { tone: 'stop', title: 'Egg is on your allergen list, and this plate has it', body: 'Your coach planned this plate before it was on your list. Do not eat it: ask your coach first.' },
      { tone: 'warn', title: 'Milk is on your allergen list', body: `Your coach chose this plate for you knowing that. ${NOT_AGREED}` },
    ]);
    expect(clientAllergenNotes(['egg', 'soy'], [])).toEqual([
      { tone: 'stop', title: 'Egg and soy are on your allergen list, and this plate has them', body: 'Your coach planned this plate before they were on your list. Do not eat it: ask your coach first.' },
    ]);
  });
  it('a plan published before the allowed ones were kept: only to check', () => {
    expect(clientAllergenNotes(['egg'], undefined)).toEqual([{ tone: 'warn', title: 'Egg is on your allergen list', body: NOT_AGREED }]);
  });
});
