import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import Qty from 'js-quantities';
import Papa from 'papaparse';
import { PDFParse } from 'pdf-parse';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, EGGS_BY_THE_DOZEN, makeIngredient, makeTray, makeWeek, member, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';
import { shoppingWeek } from '../support/shopping-week.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

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


type Item = { ingredientId: number } & Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const itemsOf = (body: { aisles: { items: Item[] }[] }) => body.aisles.flatMap((a) => a.items);
const itemOf = (body: { aisles: { items: Item[] }[] }, id: number) => itemsOf(body).find((i) => i.ingredientId === id)!;

function preview(who: Member, body: object) {
  return who.agent.post('/api/shopping/preview').send(body);
}

describe('shopping list from trays × counts and add-ons', () => {
  it('rounds up to whole packages: 36 eggs → 3 dozen; 30 oz of an 8 oz package → 4 packages, 2 oz spare', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const eggs = await makeIngredient(coach, EGGS_BY_THE_DOZEN);
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
    const eggs = await makeIngredient(coach, EGGS_BY_THE_DOZEN);
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

describe('shopping trips: a week with two prep days has a list for each', () => {
  /** The shopping week with a second prep day on Wed 01-07: 2 more trays baked then, plates on Thu and Fri from it. */
  async function twoTripWeek(coach: Member) {
    const w = await shoppingWeek(coach);
    let board = (await coach.agent.get(`/api/weeks/${w.weekId}`).expect(200)).body;
    board = (await coach.agent.patch(`/api/weeks/${w.weekId}`).send({ version: board.week.version, secondPrepDate: '2026-01-07' }).expect(200)).body;
    board = (
      await coach.agent
        .put(`/api/weeks/${w.weekId}/trays`)
        .send({ version: board.week.version, trays: [{ trayId: w.tray.id, prepDate: '2026-01-04', trayCount: 3 }, { trayId: w.tray.id, prepDate: '2026-01-07', trayCount: 2 }] })
        .expect(200)
    ).body;
    await coach.agent
      .put(`/api/weeks/${w.weekId}/cells`)
      .send({ version: board.week.version, cells: ['2026-01-08', '2026-01-09'].map((date) => ({ clientId: w.client.id, date, slot: 'breakfast', assemblyId: w.plate.id })) })
      .expect(200);
    return w;
  }

  it('splits trays by their prep day and add-ons by the prep day that supplies the plate; the whole week adds both', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const w = await twoTripWeek(coach);
    const week = (await assistant.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200)).body;
    const first = (await assistant.agent.get(`/api/weeks/${w.weekId}/shopping?prepDate=2026-01-04`).expect(200)).body;
    const second = (await assistant.agent.get(`/api/weeks/${w.weekId}/shopping?prepDate=2026-01-07`).expect(200)).body;
    expect([week.prepDate, first.prepDate, second.prepDate]).toEqual([null, '2026-01-04', '2026-01-07']);
    expect(week.tripDates).toEqual(['2026-01-04', '2026-01-07']);
    // Eggs: 12 per tray; 3 trays on Sun, 2 on Wed (a dozen is 12).
    expect([week, first, second].map((l) => itemOf(l, w.eggs.id).needed)).toEqual([60, 36, 24]);
    expect(itemOf(second, w.eggs.id).purchase.packages).toBe(2);
    // Cheese: 10 oz per tray, plus 1 oz × household of 2 per plate: Mon and Tue from Sunday, Thu and Fri from Wednesday.
    const oz = (n: number) => Qty(n, 'oz').to('g').scalar;
    expect(itemOf(first, w.cheese.id).needed).toBeCloseTo(oz(30 + 4), 2);
    expect(itemOf(second, w.cheese.id).needed).toBeCloseTo(oz(20 + 4), 2);
    expect(itemOf(week, w.cheese.id).needed).toBeCloseTo(oz(50 + 8), 2);
  });

  it('the pantry serves the first trip first; once that trip is bought, the second reads what the pantry holds', async () => {
    const coach = await coachWorkspace(app);
    const w = await twoTripWeek(coach);
    await coach.agent.post('/api/pantry').send({ ingredientId: w.eggs.id, amount: '30', unit: 'large' }).expect(201);
    const list = async (prepDate: string) => (await coach.agent.get(`/api/weeks/${w.weekId}/shopping?prepDate=${prepDate}`).expect(200)).body;
    // 36 eggs on Sunday: 30 from the pantry, 6 to buy → 1 dozen, 6 spare. Wednesday's 24 find the pantry taken.
    expect(itemOf(await list('2026-01-04'), w.eggs.id)).toMatchObject({ fromPantry: 30, toBuy: 6, purchase: { packages: 1, spare: 6 } });
    expect(itemOf(await list('2026-01-07'), w.eggs.id)).toMatchObject({ fromPantry: 0, toBuy: 24, purchase: { packages: 2 } });
    const bought = await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({ prepDate: '2026-01-04' }).expect(200);
    expect(bought.body.pantry.find((p: { ingredientId: number }) => p.ingredientId === w.eggs.id)).toMatchObject({ before: 30, after: 6 });
    // Now the pantry holds the 6 spare eggs, and Wednesday's list uses them.
    expect(itemOf(await list('2026-01-07'), w.eggs.id)).toMatchObject({ fromPantry: 6, toBuy: 18, purchase: { packages: 2, spare: 6 } });
    expect((await list('2026-01-04')).bought).toMatchObject({ by: expect.any(String) });
    // The other lists say so (the pantry they count on now holds what that trip bought).
    const whole = (await coach.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200)).body;
    expect(whole.alsoBought).toEqual([{ prepDate: '2026-01-04', at: expect.any(String) }]);
    expect((await list('2026-01-07')).alsoBought).toEqual(whole.alsoBought);
    expect((await list('2026-01-04')).alsoBought).toEqual([]);
    // The whole week counts the same food: it can no longer be marked bought.
    const refused = await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({}).expect(409);
    expect(refused.body.detail).toMatch(/prep day's list of this week was marked bought already/);
    expect(await sql('select trip from shopping_purchase where week_id = $1', [w.weekId])).toEqual([{ trip: 1 }]);
  });

  it("keeps the second prep day once a prep day's list is bought (409 saying what to do), and moves it freely", async () => {
    const coach = await coachWorkspace(app);
    const w = await twoTripWeek(coach);
    await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({ prepDate: '2026-01-04' }).expect(200);
    const version = async () => (await coach.agent.get(`/api/weeks/${w.weekId}`).expect(200)).body.week.version;
    const before = await version();
    const refused = await coach.agent.patch(`/api/weeks/${w.weekId}`).send({ version: before, secondPrepDate: null }).expect(409);
    expect(refused.body.detail).toMatch(/^The shopping list for prep Sun, Jan 4 was marked bought, so this week keeps its two prep days\./);
    expect(await sql('select second_prep_date::text as d from week where id = $1', [w.weekId])).toEqual([{ d: '2026-01-07' }]);
    expect(await version()).toBe(before);
    // Moving the second prep day keeps its list (trips go by number): allowed.
    const moved = await coach.agent.patch(`/api/weeks/${w.weekId}`).send({ version: before, secondPrepDate: '2026-01-06' }).expect(200);
    expect(moved.body.prepDates).toEqual(['2026-01-04', '2026-01-06']);
    // A week that lost its second prep day before this was refused: "bought" on its whole week says how to go on.
    await sql('update week set second_prep_date = null where id = $1', [w.weekId]);
    const stuck = await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({}).expect(409);
    expect(stuck.body.detail).toBe(
      "A prep day's list of this week was marked bought while it had two prep days: add the second prep day back to mark the rest bought",
    );
    // A week whose prep-day lists were never bought drops its second prep day as before.
    // (The same days, so in a workspace of its own: a day is on one board only.)
    const elsewhere = await coachWorkspace(app);
    const other = await twoTripWeek(elsewhere);
    const v = (await elsewhere.agent.get(`/api/weeks/${other.weekId}`).expect(200)).body.week.version;
    await elsewhere.agent.patch(`/api/weeks/${other.weekId}`).send({ version: v, secondPrepDate: null }).expect(200);
  });

  it('keeps check marks per list, and answers 400 naming prepDate for a day that is not a trip', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const w = await twoTripWeek(coach);
    await assistant.agent.put(`/api/weeks/${w.weekId}/shopping/checks/${w.eggs.id}`).send({ checked: true, prepDate: '2026-01-07' }).expect(200);
    const checked = async (q: string) => itemOf((await assistant.agent.get(`/api/weeks/${w.weekId}/shopping${q}`).expect(200)).body, w.eggs.id).check.checked;
    expect([await checked(''), await checked('?prepDate=2026-01-04'), await checked('?prepDate=2026-01-07')]).toEqual([false, false, true]);

    const bad = await assistant.agent.get(`/api/weeks/${w.weekId}/shopping?prepDate=2026-01-05`).expect(400);
    expect(bad.body.errors).toEqual({ prepDate: ['Not a prep day of this week (2026-01-04 or 2026-01-07)'] });
    const malformed = await assistant.agent.put(`/api/weeks/${w.weekId}/shopping/checks/${w.eggs.id}`).send({ checked: true, prepDate: 'Sunday' }).expect(400);
    expect(Object.keys(malformed.body.errors)).toEqual(['prepDate']);
    // A one-prep-day week of the same days: in a workspace of its own (a day is on one board only).
    const elsewhere = await coachWorkspace(app);
    const single = await shoppingWeek(elsewhere);
    const helper = await member(app, elsewhere, 'assistant');
    const one = await helper.agent.get(`/api/weeks/${single.weekId}/shopping?prepDate=2026-01-04`).expect(400);
    expect(one.body.errors).toEqual({ prepDate: ['This week has one prep day: its list is the whole week'] });
    expect((await helper.agent.get(`/api/weeks/${single.weekId}/shopping`).expect(200)).body.tripDates).toEqual([]);
  });

  it("refuses a trip's purchase once the whole week's list is bought, and answers a repeated one with its record", async () => {
    const coach = await coachWorkspace(app);
    const w = await twoTripWeek(coach);
    const first = await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).expect(200);
    expect(first.body.applied).toBe(true);
    const again = await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({}).expect(200);
    expect(again.body).toEqual({ ...first.body, applied: false });
    const refused = await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({ prepDate: '2026-01-07' }).expect(409);
    expect(refused.body.detail).toBe("The whole week's list was marked bought already: the pantry has it");
    expect(await sql('select trip from shopping_purchase where week_id = $1', [w.weekId])).toEqual([{ trip: 0 }]);
  });

  it('lets only one of a whole-week and a trip purchase made at the same moment through', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const w = await twoTripWeek(coach);
    const answers = await Promise.all([
      coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({}),
      assistant.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).send({ prepDate: '2026-01-04' }),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    expect(await sql('select count(*)::int as n from shopping_purchase where week_id = $1', [w.weekId])).toEqual([{ n: 1 }]);
  });

  it("exports a trip's list as CSV and PDF under the trip's name", async () => {
    const coach = await coachWorkspace(app);
    const w = await twoTripWeek(coach);
    const csv = await coach.agent.get(`/api/weeks/${w.weekId}/shopping.csv?prepDate=2026-01-07`).expect(200);
    expect(csv.headers['content-disposition']).toContain('shopping-list-prep-2026-01-07.csv');
    const rows = Papa.parse<Record<string, string>>(csv.text, { header: true, skipEmptyLines: true }).data;
    expect(rows.find((r) => r.Item === w.eggs.name)).toMatchObject({ Needed: '24', Packages: '2' });
    const pdf = await coach.agent.get(`/api/weeks/${w.weekId}/shopping.pdf?prepDate=2026-01-07`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).toBe(200);
    const parser = new PDFParse({ data: new Uint8Array(pdf.body as Buffer) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('Shopping list for prep Wed, Jan 7, week of Mon, Jan 5');
    expect(text).toContain('2 × dozen large eggs');
  });
});

describe('the prep week\'s shopping list', () => {
  it('adds every tray count and every plate add-on (× household multiplier), rounded to packages', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const w = await shoppingWeek(coach);
    const res = await assistant.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200);
    // 3 trays × 12 eggs = 36 → 3 dozen (a dozen is 12).
    expect(itemOf(res.body, w.eggs.id)).toMatchObject({ needed: 36, purchase: { packages: 3, spare: 0 }, costCents: 1197 });
    // Cheese: 3 trays × 10 oz + 1 oz add-on × 2 (household multiplier) × 2 days = 34 oz → 5 × 8 oz, 6 oz spare.
    const cheese = itemOf(res.body, w.cheese.id);
    expect(cheese.needed).toBeCloseTo(Qty(34, 'oz').to('g').scalar, 2);
    expect(cheese.purchase.packages).toBe(5);
    expect(cheese.purchase.spare).toBeCloseTo(6, 4);
    expect(res.body).toMatchObject({ weekId: w.weekId, itemCount: 2, checkedCount: 0, totalCostCents: 1197 + 5 * 399, bought: null });
  });

  it('saves each check mark on its own: two shoppers tapping at once lose nothing, and a repeated tap changes nothing', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const w = await shoppingWeek(coach);
    const put = (who: Member, id: number, checked: boolean) =>
      who.agent.put(`/api/weeks/${w.weekId}/shopping/checks/${id}`).send({ checked });
    // Both shoppers at the same moment, each on a different item, and both on the same item.
    const [a, b, c] = await Promise.all([put(assistant, w.eggs.id, true), put(coach, w.cheese.id, true), put(coach, w.eggs.id, true)]);
    expect([a.status, b.status, c.status]).toEqual([200, 200, 200]);
    const list = await assistant.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200);
    expect(list.body.checkedCount).toBe(2);
    expect(itemOf(list.body, w.eggs.id).check.checked).toBe(true);
    expect(itemOf(list.body, w.cheese.id).check).toMatchObject({ checked: true, checkedBy: expect.any(String) });
    const rows = await sql<{ ingredient_id: number; checked: boolean }>(
      'select ingredient_id, checked from shopping_check where week_id = $1 order by ingredient_id',
      [w.weekId],
    );
    expect(rows).toEqual([
      { ingredient_id: w.eggs.id, checked: true },
      { ingredient_id: w.cheese.id, checked: true },
    ]);
    // Idempotent: the same tap again keeps the first time; an uncheck clears who and when.
    const again = await put(coach, w.cheese.id, true).expect(200);
    expect(again.body.checkedAt).toBe(itemOf(list.body, w.cheese.id).check.checkedAt);
    const off = await put(assistant, w.eggs.id, false).expect(200);
    expect(off.body).toEqual({ ingredientId: w.eggs.id, checked: false, checkedBy: null, checkedAt: expect.any(String) });
    expect(itemOf((await coach.agent.get(`/api/weeks/${w.weekId}/shopping`)).body, w.cheese.id).check.checked).toBe(true);
    // Many taps in parallel on alternating items end with each item's last state.
    await Promise.all([put(assistant, w.eggs.id, true), put(coach, w.cheese.id, false)]);
    const final = await coach.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200);
    expect(itemOf(final.body, w.eggs.id).check.checked).toBe(true);
    expect(itemOf(final.body, w.cheese.id).check.checked).toBe(false);
    await put(coach, w.eggs.id, 'yes' as never).expect(400);
  });

  it('marks the list bought once: the pantry keeps the spare and loses what the list used, never below zero', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const w = await shoppingWeek(coach);
    const stock = await coach.agent.post('/api/pantry').send({ ingredientId: w.cheese.id, amount: '20', unit: 'oz' }).expect(201);
    // Need 34 oz, pantry 20 → buy 14 oz → 2 × 8 oz packages, 2 oz spare; pantry after = 20 − 20 + 2 = 2 oz.
    const first = await assistant.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).expect(200);
    expect(first.body.applied).toBe(true);
    const [row] = await sql<{ amount: string; version: number }>('select amount, version from pantry_item where id = $1', [stock.body.id]);
    expect(Number(row.amount)).toBeCloseTo(Qty(2, 'oz').to('g').scalar, 3);
    expect(row.version).toBe(2);
    // Eggs: 3 dozen exactly, no spare and no stock → no pantry row.
    expect(await sql('select id from pantry_item where ingredient_id = $1', [w.eggs.id])).toEqual([]);
    // A second call changes nothing and answers the recorded change.
    const second = await coach.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).expect(200);
    expect(second.body).toEqual({ ...first.body, applied: false });
    const [again] = await sql<{ amount: string; version: number }>('select amount, version from pantry_item where id = $1', [stock.body.id]);
    expect(again).toEqual(row);
    expect(await sql('select id from shopping_purchase where week_id = $1', [w.weekId])).toHaveLength(1);
    const list = await assistant.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200);
    expect(list.body.bought).toMatchObject({ at: first.body.at });
    expect(first.body.pantry.every((p: { after: number }) => p.after >= 0)).toBe(true);
  });

  it('exports CSV (papaparse round trip) with one row per item, and escapes spreadsheet formulas', async () => {
    const coach = await coachWorkspace(app);
    const w = await shoppingWeek(coach, { eggs: { name: '=HYPERLINK("x")' } });
    await coach.agent.put(`/api/weeks/${w.weekId}/shopping/checks/${w.eggs.id}`).send({ checked: true }).expect(200);
    const res = await coach.agent.get(`/api/weeks/${w.weekId}/shopping.csv`).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/shopping-list-2026-01-05\.csv/);
    const parsed = Papa.parse<string[]>(res.text.trim());
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header).toEqual(['Aisle', 'Item', 'Needed', 'From pantry', 'To buy', 'Unit', 'Packages', 'Package', 'Spare', 'Estimated cost', 'Checked']);
    expect(rows).toHaveLength(2);
    const egg = rows.find((r) => r[1].includes('HYPERLINK'))!;
    // OWASP "CSV injection": a cell starting with = is prefixed with a quote so a spreadsheet shows it as text.
    expect(egg[1]).toBe(`'=HYPERLINK("x")`);
    expect(egg).toEqual(['Dairy and eggs', egg[1], '36', '0', '36', 'large', '3', 'dozen large eggs', '0 large', '11.97', 'yes']);
    const cheese = rows.find((r) => r !== egg)!;
    expect(cheese.slice(6)).toEqual(['5', '8 oz block', '6 oz', '19.95', 'no']);
  });

  it('renders the list as a PDF through the shared renderer', async () => {
    const coach = await coachWorkspace(app);
    const w = await shoppingWeek(coach);
    const res = await coach.agent.get(`/api/weeks/${w.weekId}/shopping.pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    }).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const parser = new PDFParse({ data: new Uint8Array(res.body as Buffer) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('Dairy and eggs');
    expect(text).toContain('3 × dozen large eggs');
    // Prices on paper as on screen: 3 dozen at $3.99 = $11.97; cheese 34 oz → 5 packages of 8 oz at $3.99 = $19.95.
    expect(text).toContain('$11.97');
    expect(text).toContain('$19.95');
    expect(text).toContain('Total: $31.92');
  });

  it("writes amounts in the reader's measure system: the list, the pantry and the PDF", async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const w = await shoppingWeek(coach);
    // Cheese: 3 trays × 10 oz + the plate's 1 oz add-on × 2 days × a household of 2 = 34 oz = 2 lb 2 oz
    // (16 oz to the pound: NIST Handbook 44 App. C), 963.9 g (js-quantities, a second reference).
    const grams = Qty(34, 'oz').to('g').scalar;
    expect(grams).toBeCloseTo(963.88, 2);
    await assistant.agent.post('/api/pantry').send({ ingredientId: w.cheese.id, amount: '100', unit: 'g' }).expect(201);
    const pdfText = async () => {
      const res = await assistant.agent.get(`/api/weeks/${w.weekId}/shopping.pdf`).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      }).expect(200);
      const parser = new PDFParse({ data: new Uint8Array(res.body as Buffer) });
      const text = (await parser.getText()).text.replace(/\s+/g, ' ');
      await parser.destroy();
      return text;
    };

    // US customary (the default): pounds and ounces, on screen, in the pantry and on paper.
    const us = itemOf((await assistant.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200)).body, w.cheese.id);
    expect(us.neededText).toBe('2 lb 2 oz');
    expect((await assistant.agent.get('/api/pantry').expect(200)).body.items[0].display).toBe('3 ½ oz'); // 100 g = 3.53 oz
    expect(await pdfText()).toContain('2 lb 2 oz');

    // The assistant switches to metric: the same list in grams and kilograms; the coach's stays in US units.
    await assistant.agent.patch('/api/auth/me').send({ unitSystem: 'metric' }).expect(200);
    const metric = itemOf((await assistant.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200)).body, w.cheese.id);
    expect(metric.neededText).toBe('964 g');
    expect(metric.needed).toBeCloseTo(grams, 2);
    expect((await assistant.agent.get('/api/pantry').expect(200)).body.items[0].display).toBe('100 g');
    const text = await pdfText();
    expect(text).toContain('964 g');
    expect(text).not.toContain('2 lb 2 oz');
    // Eggs are counted in their piece, whatever the system.
    expect(text).toContain('36 large');
    expect(itemOf((await coach.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(200)).body, w.cheese.id).neededText).toBe('2 lb 2 oz');
  });

  it('scopes weeks to the workspace (404), refuses clients (403), and finds this week for the assistant', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const client = await member(app, coach, 'client');
    const w = await shoppingWeek(coach);
    await other.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(404);
    await other.agent.put(`/api/weeks/${w.weekId}/shopping/checks/${w.eggs.id}`).send({ checked: true }).expect(404);
    await other.agent.post(`/api/weeks/${w.weekId}/shopping/bought`).expect(404);
    await client.agent.get(`/api/weeks/${w.weekId}/shopping`).expect(403);
    // Another workspace's ingredient on this week's list: 404, nothing written.
    const foreign = await makeIngredient(other);
    await coach.agent.put(`/api/weeks/${w.weekId}/shopping/checks/${foreign.id}`).send({ checked: true }).expect(404);
    expect(await sql('select id from shopping_check where ingredient_id = $1', [foreign.id])).toEqual([]);
    const current = await assistant.agent.get('/api/weeks/current').expect(200);
    expect(current.body).toMatchObject({ id: w.weekId, startDate: '2026-01-05' });
    expect((await other.agent.get('/api/weeks/current').expect(200)).body).toBeNull();
    // The kitchen's week is the one of the next prep day: on Thursday 8 Jan, next week's (prep Sun, Jan 11).
    const next = await makeWeek(coach, { startDate: '2026-01-12', prepDate: '2026-01-11' });
    const thursday = await assistant.agent.get('/api/weeks/current?today=2026-01-08').expect(200);
    expect(thursday.body).toMatchObject({ id: next.week.id, prepDate: '2026-01-11' });
    expect((await assistant.agent.get('/api/weeks/current?today=2026-01-04').expect(200)).body.id).toBe(w.weekId);
    const bad = await assistant.agent.get('/api/weeks/current?today=Thursday').expect(400);
    expect(Object.keys(bad.body.errors)).toEqual(['today']);
  });
});
