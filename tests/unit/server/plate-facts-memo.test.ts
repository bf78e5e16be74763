import { describe, expect, it } from 'vitest';
import { computePlateFacts, plateFacts, trayFacts, type PlateContext, type PlateRow, type TrayRow } from '../../../server/modules/assemblies/plate-facts';
import type { TrayIngredient } from '../../../server/modules/trays/tray-nutrition';
import type { NetCarbRule } from '@shared/domain/nutrition';

// The memo must never answer a stale plate: each fact a plate's macros, allergens and terms read changes the answer,
// and the memoized answer equals a fresh computation. Values invented for the check (the nutrition math is checked
// against USDA FoodData Central in nutrition.test.ts).
const ingredient = (id: number, name: string, per100g: Partial<TrayIngredient['facts']['per100g']>, allergens: TrayIngredient['allergens'] = []): TrayIngredient => ({
  id,
  name,
  facts: {
    name,
    densityGPerMl: '1',
    pieceWeights: {},
    per100g: { kcal: '100', fatG: '5', satFatG: '1', proteinG: '10', carbsG: '4', fiberG: '1', sugarsG: '1', erythritolG: '0', alluloseG: '0', otherPolyolsG: '0', sodiumMg: '100', ...per100g },
  },
  allergens,
  priceCents: null,
  purchaseAmount: null,
  purchaseUnit: null,
});
const egg = ingredient(1, 'Egg', { proteinG: '12.6' }, ['egg']);
const cheese = ingredient(2, 'Cream cheese', { fatG: '34' }, ['milk']);
const tray: TrayRow = {
  id: 5, name: 'Slab', fridgeDays: 4, freezerWeeks: 8, cutKind: 'grid', cutRows: 3, cutColumns: 4, cutPieces: null, yieldFactor: '1',
  tags: [], reheatSteps: [], archived: false, lines: [{ ingredientId: 1, amount: '600', unit: 'g' }],
};
const rule: NetCarbRule = { kind: 'half-other-polyols' };
const ctxOf = (opts: { t?: TrayRow; ings?: TrayIngredient[]; r?: NetCarbRule } = {}): PlateContext => {
  const ings = new Map((opts.ings ?? [egg, cheese]).map((i) => [i.id, i]));
  const r = opts.r ?? rule;
  const t = opts.t ?? tray;
  return { rule: r, ingredients: ings, trays: new Map([[t.id, trayFacts(t, ings, r)]]) };
};
const plate: PlateRow = {
  id: 9, name: 'Memo plate', version: 1, updatedAt: new Date(0),
  items: [
    { id: 1, position: 0, tray: { id: 5 }, portions: '2', ingredient: null, amountText: '', amount: null, unit: '' },
    { id: 2, position: 1, tray: null, portions: null, ingredient: { id: 2 }, amountText: '30', amount: '30', unit: 'g' },
  ],
};
const withItem = (i: number, over: Partial<PlateRow['items'][number]>): PlateRow => ({ ...plate, items: plate.items.map((it, n) => (n === i ? { ...it, ...over } : it)) });

const cases: [string, PlateRow, PlateContext][] = [
  ['tray portions', withItem(0, { portions: '1' }), ctxOf()],
  ['add-on amount', withItem(1, { amount: '45', amountText: '45' }), ctxOf()],
  ['add-on unit', withItem(1, { unit: 'oz' }), ctxOf()],
  ['add-on ingredient facts', plate, ctxOf({ ings: [egg, ingredient(2, 'Cream cheese', { fatG: '30' }, ['milk'])] })],
  ['add-on allergens', plate, ctxOf({ ings: [egg, ingredient(2, 'Cream cheese', { fatG: '34' }, ['milk', 'soy'])] })],
  ['tray line (through the tray facts)', plate, ctxOf({ t: { ...tray, lines: [{ ingredientId: 1, amount: '700', unit: 'g' }] } })],
  ['tray name (a dislike term)', plate, ctxOf({ t: { ...tray, name: 'Frittata' } })],
  ['plate name', { ...plate, name: 'Other name' }, ctxOf()],
];

describe('plateFacts (memoized across requests)', () => {
  it.each(cases)('a changed %s gives the fresh answer, not the memoized one', (_what, p, ctx) => {
    const before = plateFacts(plate, ctxOf());
    const after = plateFacts(p, ctx);
    expect(after).toEqual(computePlateFacts(p, ctx));
    expect(after).not.toEqual(before);
  });

  it('a changed net-carb rule gives the fresh net carbs', () => {
    const polyol = [egg, ingredient(2, 'Cream cheese', { carbsG: '10', otherPolyolsG: '4' }, ['milk'])];
    const half = plateFacts(plate, ctxOf({ ings: polyol }));
    const full = plateFacts(plate, ctxOf({ ings: polyol, r: { kind: 'full' } }));
    expect(full.macros.netCarbsG).toBe(computePlateFacts(plate, ctxOf({ ings: polyol, r: { kind: 'full' } })).macros.netCarbsG);
    expect(full.macros.netCarbsG).not.toBe(half.macros.netCarbsG);
  });

  it('answers one frozen value for the same facts in another request (a new context)', () => {
    const a = plateFacts(plate, ctxOf());
    const b = plateFacts({ ...plate, items: plate.items.map((i) => ({ ...i })) }, ctxOf());
    expect(b).toBe(a);
    expect(Object.isFrozen(a) && Object.isFrozen(a.allergens) && Object.isFrozen(a.terms) && Object.isFrozen(a.trays) && Object.isFrozen(a.macros)).toBe(true);
    expect(a.allergens).toEqual(['milk', 'egg']);
  });
});
