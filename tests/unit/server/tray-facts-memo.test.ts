import { describe, expect, it } from 'vitest';
import { computeTrayFacts, trayFacts, type TrayRow } from '../../../server/modules/assemblies/plate-facts';
import type { TrayIngredient } from '../../../server/modules/trays/tray-nutrition';
import type { NetCarbRule, NutrientVector } from '@shared/domain/nutrition';

// The memo must never answer a stale tray: each fact the tray's nutrition, allergens and terms read changes the
// answer, and the memoized answer equals a fresh computation. Values invented for the check (the nutrition math is
// checked against USDA FoodData Central in nutrition.test.ts).
const egg: TrayIngredient = {
  id: 1,
  name: 'Egg, whole, raw',
  facts: {
    name: 'Egg, whole, raw',
    densityGPerMl: '1.03',
    pieceWeights: { large: '50' },
    per100g: { kcal: '143', fatG: '9.5', satFatG: '3.1', proteinG: '12.6', carbsG: '0.7', fiberG: '0', sugarsG: '0.4', erythritolG: '0', alluloseG: '0', otherPolyolsG: '0', sodiumMg: '142' },
  },
  allergens: ['egg'],
  priceCents: null,
  purchaseAmount: null,
  purchaseUnit: null,
};
const base: TrayRow = {
  id: 5,
  name: 'Memo slab',
  fridgeDays: 4,
  freezerWeeks: 8,
  cutKind: 'grid',
  cutRows: 3,
  cutColumns: 4,
  cutPieces: null,
  yieldFactor: '0.9',
  tags: ['egg slab'],
  reheatSteps: ['Warm it.'],
  archived: false,
  lines: [{ ingredientId: 1, amount: '12', unit: 'large' }],
};
const rule: NetCarbRule = { kind: 'half-other-polyols' };
const withEgg = (over: Partial<TrayIngredient['facts']['per100g']> = {}, rest: Partial<TrayIngredient> = {}) =>
  new Map([[1, { ...egg, ...rest, facts: { ...egg.facts, per100g: { ...egg.facts.per100g, ...over } } }]]);

const cases: [string, TrayRow, Map<number, TrayIngredient>, NetCarbRule][] = [
  ['line amount', { ...base, lines: [{ ingredientId: 1, amount: '10', unit: 'large' }] }, withEgg(), rule],
  ['line unit', { ...base, lines: [{ ingredientId: 1, amount: '12', unit: 'oz' }] }, withEgg(), rule],
  ['cut plan', { ...base, cutColumns: 6 }, withEgg(), rule],
  ['cooked yield', { ...base, yieldFactor: '1' }, withEgg(), rule],
  ['nutrient per 100 g', base, withEgg({ proteinG: '13' }), rule],
  ['piece weight', base, new Map([[1, { ...egg, facts: { ...egg.facts, pieceWeights: { large: '56' } } }]]), rule],
  ['allergens', base, withEgg({}, { allergens: ['egg', 'milk'] }), rule],
  ['ingredient name', base, withEgg({}, { name: 'Egg, large', facts: { ...egg.facts, name: 'Egg, large' } }), rule],
  ['tags', { ...base, tags: ['frittata'] }, withEgg(), rule],
  ['fridge days', { ...base, fridgeDays: 3 }, withEgg(), rule],
];

describe('trayFacts (memoized)', () => {
  it.each(cases)('a changed %s gives the fresh answer, not the memoized one', (_what, tray, ingredients, r) => {
    const before = trayFacts(base, withEgg(), rule);
    const after = trayFacts(tray, ingredients, r);
    expect(after).toEqual(computeTrayFacts(tray, ingredients, r));
    expect(after).not.toEqual(before);
  });

  it('a changed net-carb rule gives the fresh answer (same tray, same ingredient)', () => {
    // 3 g carbohydrate and 2 g other polyols per 100 g: half the polyols leave 2 g net, all of them 1 g.
    const polyols = withEgg({ carbsG: '3', otherPolyolsG: '2' });
    const before = trayFacts(base, polyols, rule);
    const after = trayFacts(base, polyols, { kind: 'full' });
    expect(after).toEqual(computeTrayFacts(base, polyols, { kind: 'full' }));
    const net = (f: typeof after) => (f.perPortion as NutrientVector | null)?.netCarbsG.toString();
    expect(net(after)).not.toBe(net(before));
  });

  it('shares one frozen answer for the same facts, arrays included', () => {
    const a = trayFacts({ ...base }, withEgg(), rule);
    const b = trayFacts({ ...base, lines: [...base.lines] }, withEgg(), { ...rule });
    expect(b).toBe(a);
    expect(Object.isFrozen(a) && Object.isFrozen(a.terms) && Object.isFrozen(a.allergens) && Object.isFrozen(a.reheatSteps)).toBe(true);
    expect(a.perPortion?.proteinG.toString()).toBe(computeTrayFacts(base, withEgg(), rule).perPortion?.proteinG.toString());
  });
});
