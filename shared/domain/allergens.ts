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

const ALLERGEN_BY_WORD = new Map<string, AllergenCode>(
  MAJOR_ALLERGENS.flatMap((a) => [
    [a.code, a.code],
    [a.label.toLowerCase(), a.code],
  ]),
);

/** An allergen as a spreadsheet cell names it ("Tree nuts", "tree nuts", "tree-nuts"), or undefined. */
export function allergenFromWord(word: string): AllergenCode | undefined {
  const w = word.trim().toLowerCase();
  return ALLERGEN_BY_WORD.get(w) ?? ALLERGEN_BY_WORD.get(w.replace(/\s+/g, '-'));
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
 * The allergens on a client's list that a published plate holds and the coach did not allow when publishing: put on
 * the list since (a conflict cannot be published).
 */
export function notAllowed(onList: readonly AllergenCode[], allowed: readonly AllergenCode[]): AllergenCode[] {
  return onList.filter((a) => !allowed.includes(a));
}

/** A note a client reads beside a plate: `stop` when they should not eat it before asking their coach. */
export interface ClientAllergenNote {
  tone: 'warn' | 'stop';
  title: string;
  body: string;
}

const listed = (codes: readonly AllergenCode[]) => andList(codes.map((c, i) => (i === 0 ? allergenLabel(c) : allergenLabel(c).toLowerCase())));
const onTheList = (codes: readonly AllergenCode[]) => `${listed(codes)} ${codes.length === 1 ? 'is' : 'are'} on your allergen list`;
const IF_NOT_AGREED = 'If you have not agreed it with your coach, do not eat it: ask them first.';

/**
 * What a client reads beside a plate that holds allergens on their own list (`onList`: the plate's allergens that are
 * on the list as it stands now), said plainly with what to do. `allowed`: the allergens the coach allowed on that
 * plate when the week was published (the coach's reason stays with the coach); undefined for a plan published before
 * they were kept, when all that can be said is to check. One on the list now that the coach did not allow was added to
 * the list after the plan was published (a conflict cannot be published): the client is told not to eat it.
 */
export function clientAllergenNotes(onList: readonly AllergenCode[], allowed: readonly AllergenCode[] | undefined): ClientAllergenNote[] {
  if (!onList.length) return [];
  if (allowed === undefined) return [{ tone: 'warn', title: onTheList(onList), body: IF_NOT_AGREED }];
  const ok = onList.filter((a) => allowed.includes(a));
  const not = notAllowed(onList, allowed);
  const notes: ClientAllergenNote[] = [];
  if (not.length)
    notes.push({
      tone: 'stop',
      title: `${onTheList(not)}, and this plate has ${not.length === 1 ? 'it' : 'them'}`,
      body: `Your coach planned this plate before ${not.length === 1 ? 'it was' : 'they were'} on your list. Do not eat it: ask your coach first.`,
    });
  if (ok.length) notes.push({ tone: 'warn', title: onTheList(ok), body: `Your coach chose this plate for you knowing that. ${IF_NOT_AGREED}` });
  return notes;
}
