import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import Qty from 'js-quantities';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, EGGS_BY_THE_DOZEN, makeIngredient, member } from '../support/factories.js';
import { sql } from '../support/db.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

describe('pantry', () => {
  it('an assistant adds, edits and deletes what is on hand; amounts are stored in the base unit', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const cheese = await makeIngredient(coach);

    // 1 lb → grams: 453.59237 g exactly (NIST Handbook 44 Appendix C); checked against js-quantities.
    const created = await assistant.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '1', unit: 'lb' }).expect(201);
    const lbInGrams = Qty(1, 'lb').to('g').scalar;
    expect(created.body).toMatchObject({ ingredientId: cheese.id, unit: 'g', version: 1 });
    expect(created.body.amount).toBeCloseTo(lbInGrams, 3);
    const [row] = await sql<{ amount: string; unit: string; workspace_id: number }>(
      'select amount, unit, workspace_id from pantry_item where id = $1',
      [created.body.id],
    );
    expect(row).toEqual({ amount: '453.5924', unit: 'g', workspace_id: coach.workspaceId });

    // Typed unit spellings are normalised ("ounces" → oz): 8 oz = 226.796185 g (NIST).
    const edited = await assistant.agent
      .patch(`/api/pantry/${created.body.id}`)
      .send({ amount: '8', unit: 'ounces', version: 1 })
      .expect(200);
    expect(edited.body.amount).toBeCloseTo(Qty(8, 'oz').to('g').scalar, 3);
    expect(edited.body.version).toBe(2);

    // "1,500 g" on hand: a US thousands separator or a decimal comma? Refused, naming the field (it read 1.5 g).
    const ambiguous = await assistant.agent.patch(`/api/pantry/${created.body.id}`).send({ amount: '1,500', unit: 'g', version: 2 }).expect(400);
    expect(ambiguous.body.errors.amount[0]).toMatch(/"1,500" is ambiguous: write 1500/);
    const comma = await assistant.agent.patch(`/api/pantry/${created.body.id}`).send({ amount: '226,8', unit: 'g', version: 2 }).expect(200);
    expect(comma.body.amount).toBe(226.8);

    const list = await coach.agent.get('/api/pantry').expect(200);
    expect(list.body.items.map((i: { id: number }) => i.id)).toEqual([created.body.id]);

    await assistant.agent.delete(`/api/pantry/${created.body.id}`).expect(204);
    expect(await sql('select id from pantry_item where id = $1', [created.body.id])).toEqual([]);
  });

  it('counts eggs in pieces, and converts grams to pieces with the piece weight', async () => {
    const coach = await coachWorkspace(app);
    const eggs = await makeIngredient(coach, EGGS_BY_THE_DOZEN);
    // 18 large eggs as typed.
    const a = await coach.agent.post('/api/pantry').send({ ingredientId: eggs.id, amount: '18', unit: 'large' }).expect(201);
    expect(a.body).toMatchObject({ amount: 18, unit: 'large', display: '18 large' });
    // 300 g ÷ 50 g per large egg = 6 large (USDA FDC 171287 piece weight).
    const b = await coach.agent.patch(`/api/pantry/${a.body.id}`).send({ amount: '300', unit: 'g', version: 1 }).expect(200);
    expect(b.body).toMatchObject({ amount: 6, unit: 'large' });
  });

  it('never stores a negative amount, names the field, and refuses units the ingredient cannot convert', async () => {
    const coach = await coachWorkspace(app);
    const cheese = await makeIngredient(coach); // no density
    const neg = await coach.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '-5', unit: 'g' }).expect(400);
    expect(neg.body.errors).toHaveProperty('amount');
    const cup = await coach.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '1', unit: 'cup' }).expect(400);
    expect(cup.body.errors.unit[0]).toMatch(/density/);
    const missing = await coach.agent.post('/api/pantry').send({ ingredientId: 999999, amount: '1', unit: 'g' }).expect(400);
    expect(missing.body.errors).toHaveProperty('ingredientId');
    expect(await sql('select id from pantry_item where workspace_id = $1', [coach.workspaceId])).toEqual([]);
  });

  it('keeps one row per ingredient (409 names the existing row) and refuses a stale edit with the current record', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const cheese = await makeIngredient(coach);
    const first = await coach.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '100', unit: 'g' }).expect(201);
    const dup = await assistant.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '5', unit: 'g' }).expect(409);
    expect(dup.body).toMatchObject({ code: 'conflict', existingId: first.body.id });

    await coach.agent.patch(`/api/pantry/${first.body.id}`).send({ amount: '200', unit: 'g', version: 1 }).expect(200);
    const stale = await assistant.agent.patch(`/api/pantry/${first.body.id}`).send({ amount: '50', unit: 'g', version: 1 }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 2, current: { amount: 200 } });
    const [row] = await sql<{ amount: string }>('select amount from pantry_item where id = $1', [first.body.id]);
    expect(row.amount).toBe('200.0000');
  });

  it('another workspace cannot see or change the pantry (404), and clients are refused', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const client = await member(app, coach, 'client');
    const cheese = await makeIngredient(coach);
    const item = await coach.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '100', unit: 'g' }).expect(201);
    await other.agent.get(`/api/pantry/${item.body.id}`).expect(404);
    await other.agent.patch(`/api/pantry/${item.body.id}`).send({ amount: '1', unit: 'g', version: 1 }).expect(404);
    await other.agent.delete(`/api/pantry/${item.body.id}`).expect(404);
    // Another workspace's ingredient is not in this library.
    const foreign = await other.agent.post('/api/pantry').send({ ingredientId: cheese.id, amount: '1', unit: 'g' }).expect(400);
    expect(foreign.body.errors).toHaveProperty('ingredientId');
    expect((await other.agent.get('/api/pantry').expect(200)).body.items).toEqual([]);
    await client.agent.get('/api/pantry').expect(403);
  });
});
