/**
 * The nine major food allergens of US law.
 *
 * - Eight from the Food Allergen Labeling and Consumer Protection Act of 2004 (FALCPA,
 *   21 U.S.C. 321(qq)): milk, egg, fish, crustacean shellfish, tree nuts, peanuts, wheat, soybeans.
 * - Sesame, added by the FASTER Act (Pub. L. 117-11, signed 23 April 2021), labelling required for
 *   foods entering interstate commerce on or after 1 January 2023.
 *
 * Trayline stores the code; the label is what people read. Coaches may track other sensitivities
 * (celery, mustard, …) as dislikes; those are not part of this legal list.
 */

import { andList } from './words';

export const MAJOR_ALLERGENS = [
  { code: 'milk', label: 'Milk', law: 'FALCPA 2004' },
  { code: 'egg', label: 'Egg', law: 'FALCPA 2004' },
  { code: 'fish', label: 'Fish', law: 'FALCPA 2004' },
  { code: 'crustacean-shellfish', label: 'Crustacean shellfish', law: 'FALCPA 2004' },
  { code: 'tree-nuts', label: 'Tree nuts', law: 'FALCPA 2004' },
  { code: 'peanuts', label: 'Peanuts', law: 'FALCPA 2004' },
  { code: 'wheat', label: 'Wheat', law: 'FALCPA 2004' },
  { code: 'soy', label: 'Soy', law: 'FALCPA 2004' },
  { code: 'sesame', label: 'Sesame', law: 'FASTER Act 2021' },
] as const;

export type MajorAllergen = (typeof MAJOR_ALLERGENS)[number];
export type AllergenCode = MajorAllergen['code'];

/** The nine codes in the order above (the order used for display). */
export const ALLERGEN_CODES: readonly AllergenCode[] = MAJOR_ALLERGENS.map((a) => a.code);

export function isAllergenCode(value: unknown): value is AllergenCode {
  return typeof value === 'string' && (ALLERGEN_CODES as readonly string[]).includes(value);
}

export function allergenLabel(code: AllergenCode): string {
  const found = MAJOR_ALLERGENS.find((a) => a.code === code);
  if (!found) throw new RangeError(`Unknown allergen code: ${String(code)}`);
  return found.label;
}

/** Allergens present in both lists, once each, in display order. */
export function allergenConflicts(
  plateAllergens: readonly AllergenCode[],
  clientAllergens: readonly AllergenCode[],
): AllergenCode[] {
  const plate = new Set(plateAllergens);
  const client = new Set(clientAllergens);
  return ALLERGEN_CODES.filter((code) => plate.has(code) && client.has(code));
}

/**
 * What a client reads beside a plate that holds allergens on their own list, allowed by the coach for that day (the
 * coach's reason stays with the coach): said plainly, with what to do when it was not agreed. Null when none.
 */
export function allowedAllergenWords(codes: readonly AllergenCode[]): { title: string; body: string } | null {
  if (!codes.length) return null;
  const names = codes.map((c, i) => (i === 0 ? allergenLabel(c) : allergenLabel(c).toLowerCase()));
  return {
    title: `${andList(names)} ${codes.length === 1 ? 'is' : 'are'} on your allergen list`,
    body: 'Your coach chose this plate for you knowing that. If you have not agreed it with your coach, do not eat it: ask them first.',
  };
}
