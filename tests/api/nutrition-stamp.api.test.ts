import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, ingredientInput, makeIngredient, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';
import { forgetCalcRows } from '@server/modules/ingredients/ingredient.service.js';

/**
 * The nutrition stamp (migration Migration20261202030000_nutrition_stamp) and the library rows the recipe
 * calculation keeps under it: whoever changes an ingredient or the net-carb rule, and however (the API, SQL by hand
 * as another tool or instance would), the next calculation answers from the new values. Amounts and nutrient values
 * are invented test values; the arithmetic is per 100 g × grams ÷ 100.
 */
let app: Express;
let coachA: Member;
let coachB: Member;

const stampOf = async (workspaceId: number) =>
  (await sql<{ version: string }>('select version::text as version from nutrition_stamp where workspace_id = $1', [workspaceId]))[0]?.version;

beforeAll(async () => {
  app = (await testApp()).app;
  coachA = await coachWorkspace(app);
  coachB = await coachWorkspace(app);
});

const calc = (coach: Member, ingredientId: number, grams = '200') =>
  coach.agent.post('/api/calc/recipe').send({ items: [{ ingredientId, amount: grams, unit: 'g' }], portions: 1 });

describe('nutrition stamp', () => {
  it('a new workspace has one; its own ingredient writes move it and leave other workspaces alone', async () => {
    const a0 = await stampOf(coachA.workspaceId);
    const b0 = await stampOf(coachB.workspaceId);
    expect(a0).toMatch(/^\d+$/);
    expect(b0).toMatch(/^\d+$/);

    const ing = await makeIngredient(coachA);
    const a1 = await stampOf(coachA.workspaceId);
    expect(BigInt(a1!)).toBeGreaterThan(BigInt(a0!));
    expect(await stampOf(coachB.workspaceId)).toBe(b0);

    await sql('update ingredient set kcal = kcal + 1 where id = $1', [ing.id]);
    const a2 = await stampOf(coachA.workspaceId);
    expect(BigInt(a2!)).toBeGreaterThan(BigInt(a1!));

    // A statement that changes no row moves nothing.
    await sql('update ingredient set kcal = 1 where id = -1');
    expect(await stampOf(coachA.workspaceId)).toBe(a2);

    await sql('delete from ingredient where id = $1', [ing.id]);
    expect(BigInt((await stampOf(coachA.workspaceId))!)).toBeGreaterThan(BigInt(a2!));
    expect(await stampOf(coachB.workspaceId)).toBe(b0);
  });

  it('a shared row (no workspace) moves every workspace; the net-carb rule moves its own only when it changes', async () => {
    const a0 = await stampOf(coachA.workspaceId);
    const b0 = await stampOf(coachB.workspaceId);
    const [shared] = await sql<{ id: number }>(
      `insert into ingredient (name, category, kcal, fat_g, protein_g, carbs_g, source, created_at, updated_at)
       values ('Stamp test shared row', 'other', 10, 0, 0, 2, 'test', now(), now()) returning id`,
    );
    const a1 = await stampOf(coachA.workspaceId);
    const b1 = await stampOf(coachB.workspaceId);
    expect(BigInt(a1!)).toBeGreaterThan(BigInt(a0!));
    expect(BigInt(b1!)).toBeGreaterThan(BigInt(b0!));
    await sql('delete from ingredient where id = $1', [shared.id]);

    const a2 = await stampOf(coachA.workspaceId);
    const b2 = await stampOf(coachB.workspaceId);
    await sql('update workspace set net_carb_rule = net_carb_rule where id = $1', [coachA.workspaceId]);
    expect(await stampOf(coachA.workspaceId)).toBe(a2);
    await sql(`update workspace set net_carb_rule = 'full' where id = $1`, [coachA.workspaceId]);
    expect(BigInt((await stampOf(coachA.workspaceId))!)).toBeGreaterThan(BigInt(a2!));
    expect(await stampOf(coachB.workspaceId)).toBe(b2);
    await sql(`update workspace set net_carb_rule = 'half-other-polyols' where id = $1`, [coachA.workspaceId]);
  });
});

describe('POST /api/calc/recipe answers from the database as it is now', () => {
  it('an ingredient changed by SQL (another instance, another tool) reads anew on the very next calculation', async () => {
    const ing = await makeIngredient(coachA, { kcal: '350' });
    const first = await calc(coachA, ing.id).expect(200);
    expect(first.body.total.kcal).toBe(700); // 350 kcal/100 g × 200 g
    expect((await calc(coachA, ing.id).expect(200)).body.total.kcal).toBe(700); // answered from the kept rows

    await sql('update ingredient set kcal = 400 where id = $1', [ing.id]);
    expect((await calc(coachA, ing.id).expect(200)).body.total.kcal).toBe(800);

    // Through the API as well.
    const dto = (await coachA.agent.get(`/api/ingredients/${ing.id}`).expect(200)).body;
    await coachA.agent
      .patch(`/api/ingredients/${ing.id}`)
      .send({ ...ingredientInput({ name: ing.name, kcal: '300' }), version: dto.version })
      .expect(200);
    expect((await calc(coachA, ing.id).expect(200)).body.total.kcal).toBe(600);
  });

  it('a net-carb rule changed by SQL applies on the next calculation', async () => {
    // 10 g carbs, 2 g fibre, 4 g other sugar alcohols per 100 g; 200 g.
    const ing = await makeIngredient(coachA, { carbsG: '10', fiberG: '2', otherPolyolsG: '4' });
    expect((await calc(coachA, ing.id).expect(200)).body.total.netCarbsG).toBe(12); // (10 − 2 − 4/2) × 2
    await sql(`update workspace set net_carb_rule = 'full' where id = $1`, [coachA.workspaceId]);
    const full = (await calc(coachA, ing.id).expect(200)).body;
    expect(full.netCarbRule).toBe('full');
    expect(full.total.netCarbsG).toBe(8); // (10 − 2 − 4) × 2
    await sql(`update workspace set net_carb_rule = 'half-other-polyols' where id = $1`, [coachA.workspaceId]);
    expect((await calc(coachA, ing.id).expect(200)).body.total.netCarbsG).toBe(12);
  });

  it("another workspace's ingredient stays out, before and after that workspace's own calculation kept it", async () => {
    const ofB = await makeIngredient(coachB);
    expect((await calc(coachA, ofB.id).expect(400)).body.errors).toHaveProperty(['items.0.ingredientId']);
    await calc(coachB, ofB.id).expect(200);
    expect((await calc(coachA, ofB.id).expect(400)).body.errors).toHaveProperty(['items.0.ingredientId']);
    // An id a calculation did not find (kept as "not in the library") is found once the ingredient exists.
    const before = await makeIngredient(coachA);
    await calc(coachA, before.id + 1).expect(400);
    const next = await makeIngredient(coachA);
    expect(next.id).toBe(before.id + 1);
    await calc(coachA, next.id).expect(200);
  });

  it('kept rows and a fresh read give the same answer, line by line', async () => {
    const a = await makeIngredient(coachA, { kcal: '123.4567', fatG: '9.8765', satFatG: '3.21', densityGPerMl: '0.913' });
    const b = await makeIngredient(coachA, { kcal: '45', proteinG: '7.25' });
    const body = {
      items: [
        { ingredientId: a.id, amount: '1 1/2', unit: 'cup' },
        { ingredientId: b.id, amount: '3', unit: 'slices' },
        { ingredientId: a.id, amount: '2-3', unit: 'tbsp' },
      ],
      portions: 7,
      yieldFactor: '0.85',
    };
    forgetCalcRows();
    const cold = (await coachA.agent.post('/api/calc/recipe').send(body).expect(200)).body;
    const warm = (await coachA.agent.post('/api/calc/recipe').send(body).expect(200)).body;
    expect(warm).toEqual(cold);
  });
});
