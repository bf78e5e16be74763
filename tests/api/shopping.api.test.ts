import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import Qty from 'js-quantities';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeIngredient, makeTray, member, type Member } from '../support/factories.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

// Eggs bought by the dozen of "large" pieces; 50 g per large egg (USDA FDC 171287 portion "large").
const eggBody = {
  category: 'eggs',
  pieceWeights: [{ name: 'large', grams: '50' }],
  allergens: ['egg'],
  purchase: { amount: '12', unit: 'large', label: 'dozen large eggs' },
  priceCents: 399,
  aisle: 'dairy-eggs',
};
// Heavy cream: 1 cup = 238 g (USDA SR28, NDB 01053, from memory) → 1.006 g/mL with the NIST cup of 236.5882365 mL.
const creamBody = {
  category: 'dairy',
  densityGPerMl: '1.006',
  pieceWeights: [],
  purchase: { amount: '1', unit: 'quart', label: '1 quart carton' },
  priceCents: 549,
  aisle: 'dairy-eggs',
};
// Cheese in 8 oz packages (the factory's default ingredient: 8 oz block, $3.99).

function preview(who: Member, body: unknown) {
  return who.agent.post('/api/shopping/preview').send(body);
}

describe('shopping list from trays × counts and add-ons', () => {
  it('rounds up to whole packages: 36 eggs → 3 dozen; 30 oz of an 8 oz package → 4 packages, 2 oz spare', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const eggs = await makeIngredient(coach, eggBody);
    const cheese = await makeIngredient(coach);
    // A tray of 12 large eggs and 10 oz of cheese, baked 3 times: 36 eggs and 30 oz (the worked examples).
    const tray = await makeTray(coach, {
      lines: [
        { ingredientId: eggs.id, amountText: '12', unit: 'large', note: '' },
        { ingredientId: cheese.id, amountText: '10', unit: 'oz', note: '' },
      ],
    });
    const res = await preview(assistant, { trays: [{ trayId: tray.id, count: 3 }] }).expect(200);
    const items = res.body.aisles.flatMap((a: { items: unknown[] }) => a.items);
    const egg = items.find((i: { ingredientId: number }) => i.ingredientId === eggs.id);
    const ch = items.find((i: { ingredientId: number }) => i.ingredientId === cheese.id);
    // 36 ÷ 12 per dozen = 3 dozen exactly (a dozen is 12: definition), no spare.
    expect(egg).toMatchObject({ needed: 36, baseUnit: 'large', purchase: { packages: 3, spare: 0 }, costCents: 3 * 399 });
    // 30 oz ÷ 8 oz = 3.75 → 4 packages; 32 − 30 = 2 oz spare. Grams via the NIST ounce (28.349523125 g), js-quantities.
    expect(ch.needed).toBeCloseTo(Qty(30, 'oz').to('g').scalar, 2);
    expect(ch.purchase).toMatchObject({ packages: 4, size: 8, unit: 'oz', label: '8 oz block' });
    expect(ch.purchase.spare).toBeCloseTo(2, 4);
    expect(ch.costCents).toBe(4 * 399);
    // Both are in one aisle, whose label is the store aisle's name.
    expect(res.body.aisles.map((a: { label: string }) => a.label)).toEqual(['Dairy and eggs']);
    expect(res.body.totalCostCents).toBe(3 * 399 + 4 * 399);
    expect(res.body.costComplete).toBe(true);
  });

  it('adds cups and grams of one ingredient in grams (density), across trays and add-ons', async () => {
    const coach = await coachWorkspace(app);
    const cream = await makeIngredient(coach, creamBody);
    const tray = await makeTray(coach, { lines: [{ ingredientId: cream.id, amountText: '1', unit: 'cup', note: '' }] });
    const res = await preview(coach, {
      trays: [{ trayId: tray.id, count: 2 }],
      addOns: [
        { ingredientId: cream.id, amount: '100', unit: 'g' },
        { ingredientId: cream.id, amount: '2', unit: 'tbsp' },
      ],
    }).expect(200);
    const [item] = res.body.aisles[0].items;
    // 2 cups + 2 tbsp in mL by js-quantities (US customary cup and tablespoon), × 1.006 g/mL, + 100 g.
    const ml = Qty(2, 'cup').to('ml').scalar + Qty(2, 'tbsp').to('ml').scalar;
    expect(item.needed).toBeCloseTo(ml * 1.006 + 100, 2);
    // One quart carton: 946.352946 mL (NIST) × 1.006 = 952.03 g ≥ 605.5 g → 1 package.
    expect(item.purchase.packages).toBe(1);
    expect(res.body.aisles).toHaveLength(1);
  });

  it('subtracts the pantry, never below zero, before rounding to packages', async () => {
    const coach = await coachWorkspace(app);
    const cheese = await makeIngredient(coach);
    const eggs = await makeIngredient(coach, eggBody);
    await coach.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '20', unit: 'oz' }).expect(201);
    await coach.agent.post('/api/pantry').send({ ingredientId: eggs.id, amount: '48', unit: 'large' }).expect(201);
    const res = await preview(coach, {
      addOns: [
        { ingredientId: cheese.id, amount: '30', unit: 'oz' },
        { ingredientId: eggs.id, amount: '36', unit: 'large' },
      ],
    }).expect(200);
    const items = res.body.aisles.flatMap((a: { items: unknown[] }) => a.items);
    const ch = items.find((i: { ingredientId: number }) => i.ingredientId === cheese.id);
    const egg = items.find((i: { ingredientId: number }) => i.ingredientId === eggs.id);
    // 30 − 20 = 10 oz to buy → 2 × 8 oz packages, 6 oz spare (arithmetic on the NIST ounce).
    expect(ch.toBuy).toBeCloseTo(Qty(10, 'oz').to('g').scalar, 2);
    expect(ch.purchase.packages).toBe(2);
    expect(ch.purchase.spare).toBeCloseTo(6, 4);
    // 48 on hand covers 36: nothing to buy, nothing negative.
    expect(egg).toMatchObject({ needed: 36, inPantry: 48, fromPantry: 36, toBuy: 0, purchase: { packages: 0 }, costCents: 0 });
    expect(res.body.totalCostCents).toBe(2 * 399);
  });

  it('names a line it cannot convert instead of counting it as zero', async () => {
    const coach = await coachWorkspace(app);
    const cheese = await makeIngredient(coach); // no density
    const res = await preview(coach, { addOns: [{ ingredientId: cheese.id, amount: '1', unit: 'cup' }] }).expect(200);
    expect(res.body.itemCount).toBe(0);
    expect(res.body.problems).toEqual([{ ingredientId: cheese.id, name: cheese.name, message: expect.stringMatching(/density/) }]);
  });

  it('refuses another workspace\'s tray (400 naming the field) and clients (403)', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const client = await member(app, coach, 'client');
    const tray = await makeTray(coach);
    const res = await preview(other, { trays: [{ trayId: tray.id, count: 1 }] }).expect(400);
    expect(res.body.errors).toHaveProperty(['trays.0.trayId']);
    await preview(client, { trays: [] }).expect(403);
  });
});
