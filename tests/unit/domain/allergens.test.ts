import { describe, expect, it } from 'vitest';
import {
  ALLERGEN_CODES,
  MAJOR_ALLERGENS,
  allergenConflicts,
  allowedAllergenWords,
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

describe('allowedAllergenWords (what a client reads of an allergen the coach allowed)', () => {
  it('says nothing without one', () => {
    expect(allowedAllergenWords([])).toBeNull();
  });
  it('names them in a list as English writes one (ECMA-402 list format, en-US) and says what to do', () => {
    expect(allowedAllergenWords(['milk'])?.title).toBe('Milk is on your allergen list');
    expect(allowedAllergenWords(['milk', 'wheat'])?.title).toBe('Milk and wheat are on your allergen list');
    expect(allowedAllergenWords(['milk', 'wheat', 'sesame'])?.title).toBe('Milk, wheat, and sesame are on your allergen list');
    expect(allowedAllergenWords(['egg'])?.body).toBe('Your coach chose this plate for you knowing that. If you have not agreed it with your coach, do not eat it: ask them first.');
  });
});
