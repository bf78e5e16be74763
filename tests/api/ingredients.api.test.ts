import { beforeAll, describe, expect, it } from 'vitest';
import Decimal from 'decimal.js';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, ingredientInput, makeAssembly, makeIngredient, makeTray, member, trayInput, uniq, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';
import { seedReferenceIngredients } from '@server/db/seeders/ingredient-seed.js';
import { SEED_INGREDIENTS } from '@server/db/seeders/data/ingredients.data.js';
import { compareNames } from '@shared/domain/words.js';

let app: Express;
let coachA: Member;
let assistantA: Member;
let clientA: Member;
let coachB: Member;


async function idOf(slug: string): Promise<number> {
  const [row] = await sql<{ id: number }>('select id from ingredient where slug = $1', [slug]);
  return row.id;
}

const ownCount = async (workspaceId: number) =>
  Number((await sql<{ n: string }>('select count(*) as n from ingredient where workspace_id = $1', [workspaceId]))[0].n);

/** Rounds half up to 0.01 like the API's JSON (toNutrientNumbers). */
const r2 = (d: Decimal) => d.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toNumber();

beforeAll(async () => {
  const t = await testApp();
  app = t.app;
  // Tables are emptied before each API file: put the shared reference rows back (what every start does).
  await seedReferenceIngredients(t.orm.em.fork());
  coachA = await coachWorkspace(app);
  assistantA = await member(app, coachA, 'assistant');
  clientA = await member(app, coachA, 'client');
  coachB = await coachWorkspace(app);
});

describe('reference seed', () => {
  it('upserts every seeded ingredient by slug as a shared row, and a second run changes nothing', async () => {
    const before = await sql<{ n: string; v: string }>(
      'select count(*) as n, sum(version) as v from ingredient where workspace_id is null',
    );
    expect(Number(before[0].n)).toBe(SEED_INGREDIENTS.length);
    await seedReferenceIngredients((await testApp()).orm.em.fork());
    const after = await sql<{ n: string; v: string }>('select count(*) as n, sum(version) as v from ingredient where workspace_id is null');
    expect(after[0]).toEqual(before[0]);
  });

  it('updates a changed reference row in place (same id) on the next run', async () => {
    const id = await idOf('egg-whole');
    await sql(`update ingredient set kcal = 1 where slug = 'egg-whole'`);
    await seedReferenceIngredients((await testApp()).orm.em.fork());
    const [row] = await sql<{ id: number; kcal: string }>(`select id, kcal from ingredient where slug = 'egg-whole'`);
    expect(row).toEqual({ id, kcal: '143.0000' });
  });
});

describe('GET /api/ingredients (search, paging, sort)', () => {
  it('lists shared rows to coach and assistant, paged, with the per-100 g facts and the Atwater flag', async () => {
    const res = await coachA.agent.get('/api/ingredients?pageSize=10&page=1').expect(200);
    expect(res.body.total).toBe(SEED_INGREDIENTS.length);
    expect(res.body.items).toHaveLength(10);
    expect(res.body).toMatchObject({ page: 1, pageSize: 10, netCarbRule: 'half-other-polyols' });
    // In name order (UTS #10 / CLDR root with numeric digits; tests/api/name-order.api.test.ts).
    const names: string[] = res.body.items.map((i: { name: string }) => i.name);
    expect(names).toEqual([...names].sort(compareNames));
    const item = res.body.items[0];
    expect(Object.keys(item.per100g)).toEqual(
      expect.arrayContaining(['kcal', 'netCarbsG', 'proteinG', 'fatG', 'sodiumMg', 'polyolsG']),
    );
    expect(item).toMatchObject({ shared: true, editable: false });
    expect(item.atwater).toHaveProperty('flagged');

    const page2 = await assistantA.agent.get('/api/ingredients?pageSize=10&page=2').expect(200);
    const ids1 = res.body.items.map((i: { id: number }) => i.id);
    expect(page2.body.items.map((i: { id: number }) => i.id).some((id: number) => ids1.includes(id))).toBe(false);
  });

  it('searches by name (case-insensitive, % is literal), filters by category and sorts by kcal', async () => {
    const res = await coachA.agent.get('/api/ingredients?q=EGG&pageSize=100').expect(200);
    expect(res.body.total).toBeGreaterThanOrEqual(3);
    for (const i of res.body.items) expect(i.name.toLowerCase()).toContain('egg');
    // "%" and "_" are searched as themselves, not as LIKE wildcards.
    const pct = await coachA.agent.get(`/api/ingredients?q=${encodeURIComponent('80%')}`).expect(200);
    expect(pct.body.total).toBeGreaterThan(0);
    for (const i of pct.body.items) expect(i.name).toContain('80%');
    const under = await coachA.agent.get('/api/ingredients?q=_').expect(200);
    expect(under.body.total).toBe(0);
    const fats = await coachA.agent.get('/api/ingredients?category=fats-oils&sort=-kcal&pageSize=100').expect(200);
    expect(fats.body.total).toBeGreaterThan(0);
    const kcals = fats.body.items.map((i: { per100g: { kcal: number } }) => i.per100g.kcal);
    expect(kcals).toEqual([...kcals].sort((a, b) => b - a));
    for (const i of fats.body.items) expect(i.category).toBe('fats-oils');
    const any = await coachA.agent.get('/api/ingredients?category=&pageSize=1').expect(200);
    expect(any.body.total).toBeGreaterThan(fats.body.total);
    const wrong = await coachA.agent.get('/api/ingredients?category=cheese').expect(400);
    expect(wrong.body.errors).toEqual({ category: ['Not a category'] });
  });

  it('flags a seeded row whose stored kcal is far from 4-9-4 (cocoa powder) and not whole eggs', async () => {
    // USDA SR28 whole egg (FDC 171287): 9.51×9 + 12.56×4 + 0.72×4 = 138.71 kcal vs 143 stored: 3 % apart, not flagged.
    const egg = await coachA.agent.get(`/api/ingredients/${await idOf('egg-whole')}`).expect(200);
    expect(egg.body.atwater).toMatchObject({ flagged: false, storedKcal: 143, computedKcal: 138.7 });
  });

  it('answers 400 naming a bad query field, and 403 to a client', async () => {
    const bad = await coachA.agent.get('/api/ingredients?pageSize=1000').expect(400);
    expect(bad.body.errors).toHaveProperty('pageSize');
    const sort = await coachA.agent.get('/api/ingredients?sort=price').expect(400);
    expect(sort.body.errors).toHaveProperty('sort');
    await clientA.agent.get('/api/ingredients').expect(403);
  });
});

describe('workspace-own ingredients (CRUD, isolation, locking)', () => {
  it('creates, reads, updates and deletes an own ingredient; the DB row follows', async () => {
    const created = await coachA.agent
      .post('/api/ingredients')
      .send(ingredientInput({ name: 'House cheddar blend', otherPolyolsG: '', fiberG: '0.5' }))
      .expect(201);
    expect(created.body).toMatchObject({ name: 'House cheddar blend', shared: false, editable: true, version: 1 });
    expect(created.body.pieceWeights).toEqual({ slice: 21 });
    expect(created.body.purchase).toEqual({ amount: 8, unit: 'oz', label: '8 oz block' });
    const [row] = await sql<{ workspace_id: number; kcal: string; fiber_g: string }>(
      'select workspace_id, kcal, fiber_g from ingredient where id = $1',
      [created.body.id],
    );
    expect(row).toEqual({ workspace_id: coachA.workspaceId, kcal: '350.0000', fiber_g: '0.5000' });

    // The assistant reads it but cannot change it.
    const seen = await assistantA.agent.get(`/api/ingredients/${created.body.id}`).expect(200);
    expect(seen.body.editable).toBe(false);
    await assistantA.agent.patch(`/api/ingredients/${created.body.id}`).send({ ...ingredientInput(), version: 1 }).expect(403);

    const upd = await coachA.agent
      .patch(`/api/ingredients/${created.body.id}`)
      .send({ ...ingredientInput({ name: 'House cheddar blend', kcal: '360' }), version: 1 })
      .expect(200);
    expect(upd.body).toMatchObject({ version: 2, per100g: { kcal: 360 } });

    await coachA.agent.delete(`/api/ingredients/${created.body.id}`).expect(204);
    expect(await sql('select id from ingredient where id = $1', [created.body.id])).toEqual([]);
  });

  it('400s name the field: a part larger than its whole, a bad allergen, a purchase unit that is not measurable', async () => {
    const res = await coachA.agent
      .post('/api/ingredients')
      .send(ingredientInput({ allergens: ['milk', 'celery'], kcal: 'lots' }))
      .expect(400);
    expect(Object.keys(res.body.errors).sort()).toEqual(['allergens.1', 'kcal']);
    // Checks between fields run once every field reads well.
    const sat = await coachA.agent.post('/api/ingredients').send(ingredientInput({ satFatG: '40', fatG: '30' })).expect(400);
    expect(sat.body.errors.satFatG[0]).toMatch(/cannot be more than fat/);
    const unit = await coachA.agent
      .post('/api/ingredients')
      .send(ingredientInput({ purchase: { amount: '1', unit: 'tub', label: 'tub' } }))
      .expect(400);
    expect(unit.body.errors['purchase.unit'][0]).toMatch(/piece names/);
    const carbs = await coachA.agent.post('/api/ingredients').send(ingredientInput({ carbsG: '2', fiberG: '5' })).expect(400);
    expect(carbs.body.errors.carbsG[0]).toMatch(/at least/);
  });

  it('refuses a second own ingredient of the same name', async () => {
    const first = await makeIngredient(coachA);
    const res = await coachA.agent.post('/api/ingredients').send(ingredientInput({ name: first.name.toUpperCase() })).expect(400);
    expect(res.body.errors.name[0]).toMatch(/already has/);
  });

  it('keeps one row when the same new name is saved twice at the same instant (the database’s unique index), in any case', async () => {
    for (let round = 0; round < 5; round++) {
      const name = uniq('Racing cheese');
      const answers = await Promise.all([
        coachA.agent.post('/api/ingredients').send(ingredientInput({ name })),
        coachA.agent.post('/api/ingredients').send(ingredientInput({ name: name.toUpperCase() })),
      ]);
      const statuses = answers.map((a) => a.status).sort();
      // The service's check sees the other row (400), or both pass it and the index refuses the second (409).
      expect([[201, 400], [201, 409]]).toContainEqual(statuses);
      const refused = answers.find((a) => a.status !== 201)!;
      expect(refused.body.errors.name[0]).toMatch(/already has/);
      const rows = await sql('select id from ingredient where workspace_id = $1 and lower(name) = lower($2)', [coachA.workspaceId, name]);
      expect(rows).toHaveLength(1);
    }
  });

  it('keeps workspaces apart: the other coach neither lists nor reads nor edits the row (404)', async () => {
    const mine = await makeIngredient(coachA, { name: uniq('Secret spice') });
    const list = await coachB.agent.get(`/api/ingredients?q=${encodeURIComponent('Secret spice')}`).expect(200);
    expect(list.body.total).toBe(0);
    await coachB.agent.get(`/api/ingredients/${mine.id}`).expect(404);
    await coachB.agent.patch(`/api/ingredients/${mine.id}`).send({ ...ingredientInput(), version: 1 }).expect(404);
    await coachB.agent.delete(`/api/ingredients/${mine.id}`).expect(404);
    const own = await coachA.agent.get('/api/ingredients?scope=mine&pageSize=100').expect(200);
    expect(own.body.items.map((i: { id: number }) => i.id)).toContain(mine.id);
    for (const i of own.body.items) expect(i.shared).toBe(false);
  });

  it('a shared reference row is read-only (403 with the copy hint); "copy to my library" makes an own row', async () => {
    const eggId = await idOf('egg-whole');
    const [before] = await sql<{ version: number }>('select version from ingredient where id = $1', [eggId]);
    const res = await coachA.agent.patch(`/api/ingredients/${eggId}`).send({ ...ingredientInput(), version: 1 }).expect(403);
    expect(res.body.detail).toMatch(/read-only.*Copy to my library/);
    await coachA.agent.delete(`/api/ingredients/${eggId}`).expect(403);
    const copy = await coachA.agent.post(`/api/ingredients/${eggId}/copy`).expect(201);
    expect(copy.body).toMatchObject({ name: 'Eggs, whole, raw', shared: false, editable: true, slug: null });
    expect(copy.body.per100g.kcal).toBe(143);
    const again = await coachA.agent.post(`/api/ingredients/${eggId}/copy`).expect(201);
    expect(again.body.name).toBe('Eggs, whole, raw (copy)');
    const [shared] = await sql<{ version: number }>('select version from ingredient where id = $1', [eggId]);
    expect(shared.version).toBe(before.version);
  });

  it('409 stale_version with the current record when the version is old', async () => {
    const ing = await makeIngredient(coachA);
    await coachA.agent.patch(`/api/ingredients/${ing.id}`).send({ ...ingredientInput({ name: ing.name, kcal: '300' }), version: 1 }).expect(200);
    const stale = await coachA.agent
      .patch(`/api/ingredients/${ing.id}`)
      .send({ ...ingredientInput({ name: ing.name, kcal: '310' }), version: 1 })
      .expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 2, current: { id: ing.id, per100g: { kcal: 300 } } });
    const [row] = await sql<{ kcal: string }>('select kcal from ingredient where id = $1', [ing.id]);
    expect(row.kcal).toBe('300.0000');
  });

  it('409 naming the base trays and plates that use the ingredient, and the row stays', async () => {
    const onTray = await makeIngredient(coachA);
    const tray = await makeTray(coachA, {}, onTray.id);
    const res = await coachA.agent.delete(`/api/ingredients/${onTray.id}`).expect(409);
    expect(res.body).toMatchObject({ code: 'in_use', detail: `"${onTray.name}" cannot be deleted while base tray "${tray.name}" uses it: take it out there first.` });
    // Only a plate's add-on uses this one: the message says so (it said "a base tray" whatever used it).
    const addOn = await makeIngredient(coachA);
    const plate = await makeAssembly(coachA, tray.id, { addOns: [{ ingredientId: addOn.id, amountText: '1', unit: 'oz', note: '' }] });
    const res2 = await coachA.agent.delete(`/api/ingredients/${addOn.id}`).expect(409);
    expect(res2.body.detail).toBe(`"${addOn.name}" cannot be deleted while plate "${plate.name}" uses it: take it out there first.`);
    // Used by both: both named.
    await coachA.agent.post('/api/trays').send(trayInput(addOn.id, { name: 'Second tray' })).expect(201);
    const res3 = await coachA.agent.delete(`/api/ingredients/${addOn.id}`).expect(409);
    expect(res3.body.detail).toBe(`"${addOn.name}" cannot be deleted while base tray "Second tray" and plate "${plate.name}" use it: take it out there first.`);
    expect(await sql('select id from ingredient where id = any($1)', [[onTray.id, addOn.id]])).toHaveLength(2);
  });
});

describe('POST /api/ingredients/import (CSV, all or nothing)', () => {
  const header = 'name,category,kcal,fat_g,sat_fat_g,protein_g,carbs_g,fiber_g,sodium_mg,density_g_per_ml,piece_weights,allergens,purchase_amount,purchase_unit,purchase_label,price_cents,aisle,source';

  it('imports every row in one go and reports what it created', async () => {
    const before = await ownCount(coachA.workspaceId);
    const csv = [
      header,
      `Imported pesto,condiments,450,45,7,5,6,2,700,0.95,,"Tree nuts; milk",6.7,oz,6.7 oz jar,549,condiments,package label`,
      `"Imported bacon, thick",meat,417,39.69,13.296,12.62,1.28,0,662,,slice:28,,1,lb,1 lb pack,699,meat-deli,"USDA SR28 10123"`,
    ].join('\n');
    const res = await coachA.agent.post('/api/ingredients/import').attach('file', Buffer.from(csv), { filename: 'mine.csv', contentType: 'text/csv' }).expect(201);
    expect(res.body.created).toBe(2);
    expect(await ownCount(coachA.workspaceId)).toBe(before + 2);
    const [pesto] = await sql<{ allergens: string[]; density_g_per_ml: string }>(
      `select allergens, density_g_per_ml from ingredient where name = 'Imported pesto' and workspace_id = $1`,
      [coachA.workspaceId],
    );
    expect(pesto).toEqual({ allergens: ['milk', 'tree-nuts'], density_g_per_ml: '0.9500' });
  });

  it('writes nothing when any row fails, and answers 400 with line, column and reason for each problem', async () => {
    const before = await ownCount(coachA.workspaceId);
    const csv = [
      header,
      `Good row,dairy,100,5,1,10,3,0,100,,,,,,,,,label`,
      `Bad kcal,dairy,lots,5,1,10,3,0,100,,,celery,,,,,,label`,
      `"Multi
line name",dairy,100,5,1,10,3,0,100,,,,,,,,nowhere,label`,
      `Too much sat fat,dairy,100,5,9,10,3,0,100,,,,,,,,,label`,
      `Two rounds in one,dairy,lots,5,9,10,3,4,100,,,,,,,,,label`,
    ].join('\n');
    const res = await coachA.agent.post('/api/ingredients/import').attach('file', Buffer.from(csv), { filename: 'bad.csv', contentType: 'text/csv' }).expect(400);
    expect(res.body.code).toBe('import_rejected');
    expect(res.body.report).toEqual(
      expect.arrayContaining([
        { line: 3, column: 'kcal', reason: expect.stringMatching(/number/) },
        { line: 3, column: 'allergens', reason: expect.any(String) },
        // The quoted name spans lines 4–5: the row is reported on the line it starts.
        { line: 4, column: 'aisle', reason: expect.stringMatching(/Choose a store aisle/) },
        // Line 6 reads well field by field; the check between fields names saturated fat.
        { line: 6, column: 'sat_fat_g', reason: expect.stringMatching(/cannot be more than fat/) },
        // A row with a field that does not read still has its other fields checked against each other in the same
        // report (saturated fat over fat, fiber over total carbohydrate), so the file is mended in one round.
        { line: 7, column: 'kcal', reason: expect.stringMatching(/number/) },
        { line: 7, column: 'sat_fat_g', reason: expect.stringMatching(/cannot be more than fat/) },
        { line: 7, column: 'carbs_g', reason: expect.stringMatching(/includes fiber/) },
      ]),
    );
    expect(res.body.report.some((p: { line: number }) => p.line === 2)).toBe(false);
    expect(await ownCount(coachA.workspaceId)).toBe(before);
  });

  it('reads a decimal comma (a semicolon file from a spreadsheet), and refuses "1,717" rather than guess a thousand-fold', async () => {
    // Bacon's sodium as a US table writes it (1,717 mg per 100 g) would be 1.717 mg read as a decimal comma, and
    // 1717 mg read as a thousands separator: the file says which, or nothing is imported.
    const semi = header.replace(/,/g, ';');
    const ambiguous = [semi, `Comma bacon;meat;417;39,69;13,3;12,62;1,28;0;1,717;;;;;;;;;package label`].join('\n');
    const res = await coachA.agent.post('/api/ingredients/import').attach('file', Buffer.from(ambiguous), { filename: 'eu.csv', contentType: 'text/csv' }).expect(400);
    expect(res.body.report).toEqual([{ line: 2, column: 'sodium_mg', reason: expect.stringMatching(/"1,717" is ambiguous: write 1717/) }]);
    const plain = [semi, `Comma bacon;meat;417;39,69;13,3;12,62;1,28;0;1717;;;;;;;;;package label`].join('\n');
    await coachA.agent.post('/api/ingredients/import').attach('file', Buffer.from(plain), { filename: 'eu.csv', contentType: 'text/csv' }).expect(201);
    const [row] = await sql<{ fat_g: string; sodium_mg: string }>(`select fat_g, sodium_mg from ingredient where name = 'Comma bacon' and workspace_id = $1`, [
      coachA.workspaceId,
    ]);
    expect(row).toEqual({ fat_g: '39.6900', sodium_mg: '1717.0000' });
  });

  it('reads the delimiter off the header line: a short semicolon file whose decimal commas outnumber its semicolons, and a tab file', async () => {
    // Papa Parse's own guess took the commas of "44,0;4,6" for the delimiter in this file (ending with a line break, as
    // a saved file does) and reported the header as one unknown column.
    const semi = ['name;category;kcal;fat_g;protein_g;carbs_g;fiber_g;source', 'Semicolon mascarpone;dairy;429;44,0;4,6;4,8;0;package label', ''].join('\n');
    await coachA.agent.post('/api/ingredients/import').attach('file', Buffer.from(semi), { filename: 'eu.csv', contentType: 'text/csv' }).expect(201);
    const tabs = ['name\tcategory\tkcal\tfat_g\tprotein_g\tcarbs_g\tfiber_g\tsource', 'Tab mascarpone\tdairy\t429\t44.0\t4.6\t4.8\t0\tpackage label'].join('\n');
    await coachA.agent.post('/api/ingredients/import').attach('file', Buffer.from(tabs), { filename: 'tabs.csv', contentType: 'text/csv' }).expect(201);
    const rows = await sql<{ name: string; fat_g: string; protein_g: string }>(
      `select name, fat_g, protein_g from ingredient where name like '% mascarpone' and workspace_id = $1 order by name`,
      [coachA.workspaceId],
    );
    expect(rows).toEqual([
      { name: 'Semicolon mascarpone', fat_g: '44.0000', protein_g: '4.6000' },
      { name: 'Tab mascarpone', fat_g: '44.0000', protein_g: '4.6000' },
    ]);
  });

  it('reports a missing required column and an unknown one on line 1', async () => {
    const res = await coachA.agent
      .post('/api/ingredients/import')
      .attach('file', Buffer.from('name,kcal,colour\nX,1,red\n'), { filename: 'x.csv', contentType: 'text/csv' })
      .expect(400);
    expect(res.body.report).toEqual(
      expect.arrayContaining([
        { line: 1, column: 'colour', reason: expect.stringMatching(/Unknown column/) },
        { line: 1, column: 'source', reason: 'Required column is missing' },
      ]),
    );
  });

  it('refuses a file over 1 MB (413), a non-CSV file (415) and a request without a file (400)', async () => {
    const big = Buffer.alloc(1024 * 1024 + 10, 'a');
    const tooBig = await coachA.agent.post('/api/ingredients/import').attach('file', big, { filename: 'big.csv', contentType: 'text/csv' });
    expect(tooBig.status).toBe(413);
    const png = await coachA.agent
      .post('/api/ingredients/import')
      .attach('file', Buffer.from([0x89, 0x50, 0x4e, 0x47]), { filename: 'x.png', contentType: 'image/png' });
    expect(png.status).toBe(415);
    const binary = await coachA.agent
      .post('/api/ingredients/import')
      .attach('file', Buffer.from([0xff, 0xfe, 0x00, 0x41]), { filename: 'x.csv', contentType: 'text/csv' });
    expect(binary.status).toBe(415);
    const none = await coachA.agent.post('/api/ingredients/import').send({}).expect(400);
    expect(none.body.errors).toHaveProperty('file');
  });
});

describe('POST /api/ingredients/import with existing=update (change in a spreadsheet, import again)', () => {
  const header = 'name,category,kcal,fat_g,sat_fat_g,protein_g,carbs_g,fiber_g,sodium_mg,density_g_per_ml,piece_weights,allergens,purchase_amount,purchase_unit,purchase_label,price_cents,aisle,source';
  const upload = (who: Member, csv: string, existing?: string) => {
    const req = who.agent.post('/api/ingredients/import');
    if (existing !== undefined) req.field('existing', existing);
    return req.attach('file', Buffer.from(csv), { filename: 'mine.csv', contentType: 'text/csv' });
  };
  const row = async (workspaceId: number, name: string) =>
    (await sql<{ id: number; version: number; price_cents: number | null; kcal: string; density_source: string | null; piece_weights: Record<string, number> }>(
      'select id, version, price_cents, kcal, density_source, piece_weights from ingredient where workspace_id = $1 and name = $2',
      [workspaceId, name],
    ))[0];

  it('gives a named own ingredient the file’s values (its version moves on, a form open on it meets a 409), creates the new ones, and counts the rest unchanged', async () => {
    const coach = await coachWorkspace(app);
    const first = [
      header,
      `Cream cheese (house),dairy,342,34,19,6,4.1,0,321,1.02,,milk,8,oz,8 oz block,249,dairy-eggs,package label`,
      `Seed crackers (house),wraps-breads,480,38,4,18,20,16,350,,cracker:4,sesame,1,each,1 box,599,bakery,package label`,
    ].join('\n');
    expect((await upload(coach, first).expect(201)).body).toMatchObject({ created: 2, updated: 0, unchanged: 0 });
    // Set by hand since (the form): where its density came from, which the file does not carry.
    await sql(`update ingredient set density_source = 'weighed a cup' where workspace_id = $1 and name = 'Cream cheese (house)'`, [coach.workspaceId]);
    const before = await row(coach.workspaceId, 'Cream cheese (house)');
    const crackers = await row(coach.workspaceId, 'Seed crackers (house)');

    // The price of the cream cheese changes (same name in another case); the crackers' row says what is stored
    // ("38.0" is 38); one new row.
    const second = [
      header,
      `cream cheese (HOUSE),dairy,342,34,19,6,4.1,0,321,1.02,,milk,8,oz,8 oz block,279,dairy-eggs,package label`,
      `Seed crackers (house),wraps-breads,480,38.0,4,18,20,16,350,,cracker:4,sesame,1,each,1 box,599,bakery,package label`,
      `Pork rinds (house),meat,544,31,11,61,0,0,1818,,,,3,oz,3 oz bag,299,health-food,package label`,
    ].join('\n');
    const res = await upload(coach, second, 'update').expect(201);
    expect(res.body).toMatchObject({ created: 1, updated: 1, unchanged: 1, updatedIds: [before.id], updatedNames: ['cream cheese (HOUSE)'] });
    const after = await row(coach.workspaceId, 'cream cheese (HOUSE)');
    expect(after).toMatchObject({ id: before.id, version: before.version + 1, price_cents: 279, density_source: 'weighed a cup' });
    expect(await row(coach.workspaceId, 'Seed crackers (house)')).toEqual(crackers);

    // The coach's form, opened before the import, saves on the old version: 409 (optimistic locking), nothing lost.
    const form = ingredientInput({ name: 'Cream cheese (house)', version: before.version });
    const stale = await coach.agent.patch(`/api/ingredients/${before.id}`).set('x-trayline-csrf', '1').send(form);
    expect(stale.status).toBe(409);
    expect((await row(coach.workspaceId, 'cream cheese (HOUSE)')).price_cents).toBe(279);
  });

  it('reads its own export back as all unchanged, and leaves the shared library alone (a shared name becomes an own row)', async () => {
    const coach = await coachWorkspace(app);
    const csv = [
      header,
      `"=Sweet drops (house)",sweeteners,0,0,0,0,100,0,5,1.1,,,60,ml,2 fl oz bottle,1099,baking,package label`,
      `"Bread, seeded (house)",wraps-breads,265.5,18.25,2.1,11,12.75,8.5,320,0.45,slice:32; heel:20,"sesame; egg",1,each,"1 loaf",799,bakery,package label`,
    ].join('\n');
    await upload(coach, csv).expect(201);
    const versions = await sql('select id, version from ingredient where workspace_id = $1 order by id', [coach.workspaceId]);
    const exported = (await coach.agent.get('/api/ingredients.csv').expect(200)).text;
    // The formula-like name went out escaped ("'=…", OWASP CSV injection) and comes back as the same ingredient.
    expect(exported).toContain(`"'=Sweet drops (house)"`);
    expect((await upload(coach, exported, 'update').expect(201)).body).toMatchObject({ created: 0, updated: 0, unchanged: 2 });
    expect(await sql('select id, version from ingredient where workspace_id = $1 order by id', [coach.workspaceId])).toEqual(versions);

    const shared = await sql('select * from ingredient where slug = $1', ['egg-whole']);
    const [{ name }] = await sql<{ name: string }>('select name from ingredient where slug = $1', ['egg-whole']);
    const sharedName = [header, `"${name}",eggs,1,1,0,1,0,0,1,,,egg,,,,,,my scale`].join('\n');
    expect((await upload(coach, sharedName, 'update').expect(201)).body).toMatchObject({ created: 1, updated: 0 });
    expect(await sql('select * from ingredient where slug = $1', ['egg-whole'])).toEqual(shared);
  });

  it('writes nothing when any row fails (the good rows’ updates included), refuses a name twice in the file, and names a bad option', async () => {
    const coach = await coachWorkspace(app);
    await upload(coach, [header, `Butter (house),dairy,717,81,51,0.9,0.1,0,11,,,milk,1,lb,1 lb,499,dairy-eggs,label`].join('\n')).expect(201);
    const before = await row(coach.workspaceId, 'Butter (house)');
    const bad = [
      header,
      `Butter (house),dairy,717,81,51,0.9,0.1,0,11,,,milk,1,lb,1 lb,549,dairy-eggs,label`,
      `Ghee (house),fats-oils,lots,99,60,0,0,0,0,,,milk,,,,,,label`,
      `butter (house),dairy,717,81,51,0.9,0.1,0,11,,,milk,1,lb,1 lb,599,dairy-eggs,label`,
    ].join('\n');
    const res = await upload(coach, bad, 'update').expect(400);
    expect(res.body.report).toEqual([
      { line: 3, column: 'kcal', reason: expect.stringMatching(/Energy/) },
      { line: 4, column: 'name', reason: 'Same name as line 2' },
    ]);
    expect(await row(coach.workspaceId, 'Butter (house)')).toEqual(before);
    expect(await ownCount(coach.workspaceId)).toBe(1);

    // Without the option (or with "refuse"), a name already in the library is a problem, as before.
    const again = [header, `Butter (house),dairy,717,81,51,0.9,0.1,0,11,,,milk,1,lb,1 lb,549,dairy-eggs,label`].join('\n');
    for (const existing of [undefined, 'refuse']) {
      const refused = await upload(coach, again, existing).expect(400);
      expect(refused.body.report).toEqual([{ line: 2, column: 'name', reason: 'Your library already has "Butter (house)"', code: 'name_taken' }]);
    }
    const odd = await upload(coach, again, 'merge').expect(400);
    expect(odd.body.errors).toHaveProperty('existing');
    expect(await row(coach.workspaceId, 'Butter (house)')).toEqual(before);
  });
});

describe('POST /api/calc/recipe', () => {
  it('worked example: 12 large eggs + ½ cup heavy cream, 6 portions, yield 0.9', async () => {
    const egg = await idOf('egg-whole');
    const cream = await idOf('heavy-cream');
    const res = await assistantA.agent
      .post('/api/calc/recipe')
      .send({ items: [{ ingredientId: egg, amount: '12', unit: 'large' }, { ingredientId: cream, amount: '½', unit: 'cups' }], portions: 6, yieldFactor: '0.9' })
      .expect(200);

    // Seeded values, per 100 g: egg, whole, raw = USDA SR Legacy FDC 171287 (kcal 143, fat 9.51, sat 3.126,
    // protein 12.56, carb 0.72, fiber 0, sugars 0.37, sodium 142); heavy whipping cream = FDC 170859 (340, 36.08,
    // 23.032, 2.84, 2.74, 0, 2.92, 27). One large egg = 50 g (FDC 171287 portion "large"). Cream density: USDA
    // portion 1 cup = 238 g over the NIST cup of 236.5882365 mL = 1.00597… g/mL, stored to 0.001 → 1.006.
    const eggG = new Decimal(12).times(50); // 600 g
    const creamG = new Decimal('236.5882365').div(2).times('1.006'); // 119.0039… g
    const per = (a: string, b: string) => eggG.times(a).div(100).plus(creamG.times(b).div(100));
    const total = {
      kcal: per('143', '340'),
      fatG: per('9.51', '36.08'),
      satFatG: per('3.126', '23.032'),
      proteinG: per('12.56', '2.84'),
      carbsG: per('0.72', '2.74'),
      sugarsG: per('0.37', '2.92'),
      sodiumMg: per('142', '27'),
    };
    expect(res.body.total).toMatchObject({
      kcal: r2(total.kcal), // 858 + 404.61 = 1262.61
      fatG: r2(total.fatG),
      satFatG: r2(total.satFatG),
      proteinG: r2(total.proteinG),
      carbsG: r2(total.carbsG),
      fiberG: 0,
      sugarsG: r2(total.sugarsG),
      polyolsG: 0,
      // No fibre and no sugar alcohols: net carbs equal total carbohydrate under every rule.
      netCarbsG: r2(total.carbsG),
      sodiumMg: r2(total.sodiumMg),
      // The cooked mass is the raw mass × the yield factor; nutrients do not change with it.
      massG: r2(eggG.plus(creamG).times('0.9')),
    });
    expect(res.body.total.kcal).toBe(1262.61);
    expect(res.body.perPortion).toMatchObject({
      kcal: r2(total.kcal.div(6)),
      proteinG: r2(total.proteinG.div(6)),
      massG: r2(eggG.plus(creamG).times('0.9').div(6)),
    });
    expect(res.body.lines.map((l: { grams: number }) => l.grams)).toEqual([600, r2(creamG)]);
  });

  it('two large eggs are 100 g, so one portion of 12 eggs cut 6 ways reads USDA FDC 171287 per 100 g', async () => {
    const res = await coachA.agent
      .post('/api/calc/recipe')
      .send({ items: [{ ingredientId: await idOf('egg-whole'), amount: 12, unit: 'large' }], portions: 6 })
      .expect(200);
    expect(res.body.perPortion).toMatchObject({ kcal: 143, fatG: 9.51, proteinG: 12.56, carbsG: 0.72, sodiumMg: 142, massG: 100 });
  });

  it('reads typed amounts: "1 1/2", "¾" and the midpoint of "1-2"', async () => {
    const oil = await idOf('olive-oil');
    const body = (amount: string) => ({ items: [{ ingredientId: oil, amount, unit: 'g' }], portions: 1 });
    const mass = async (amount: string) => (await coachA.agent.post('/api/calc/recipe').send(body(amount)).expect(200)).body.total.massG;
    expect(await mass('1 1/2')).toBe(1.5);
    expect(await mass('¾')).toBe(0.75);
    expect(await mass('1-2')).toBe(1.5);
    const bad = await coachA.agent.post('/api/calc/recipe').send(body('a pinch')).expect(400);
    expect(bad.body.errors).toHaveProperty(['items.0.amount']);
  });

  it('400 naming the ingredient and the missing density, on items.N.unit', async () => {
    const res = await coachA.agent
      .post('/api/calc/recipe')
      .send({
        items: [
          { ingredientId: await idOf('egg-whole'), amount: '2', unit: 'large' },
          { ingredientId: await idOf('chicken-breast'), amount: '1', unit: 'cup' },
        ],
        portions: 2,
      })
      .expect(400);
    expect(Object.keys(res.body.errors)).toEqual(['items.1.unit']);
    expect(res.body.errors['items.1.unit'][0]).toMatch(/Chicken breast, boneless, skinless, raw has no density/);
    const piece = await coachA.agent
      .post('/api/calc/recipe')
      .send({ items: [{ ingredientId: await idOf('chicken-breast'), amount: '1', unit: 'slice' }], portions: 1 })
      .expect(400);
    expect(piece.body.errors['items.0.unit'][0]).toMatch(/no weight for one "slice"/);
  });

  it('another workspace\'s ingredient is not in your library (400 on items.N.ingredientId)', async () => {
    const theirs = await makeIngredient(coachB);
    const res = await coachA.agent
      .post('/api/calc/recipe')
      .send({ items: [{ ingredientId: theirs.id, amount: '10', unit: 'g' }], portions: 1 })
      .expect(400);
    expect(res.body.errors['items.0.ingredientId'][0]).toMatch(new RegExp(`id ${theirs.id}`));
  });
});

describe('workspace settings: the net-carb rule', () => {
  it('coach reads and changes the rule; calc and the library follow; a stale version is 409', async () => {
    const coach = await coachWorkspace(app);
    const s = await coach.agent.get('/api/workspace/settings').expect(200);
    expect(s.body).toMatchObject({ netCarbRule: 'half-other-polyols', version: 1 });
    expect(s.body.help).toMatch(/No US regulation defines "net carbs"/);
    expect(s.body.netCarbRules.map((r: { kind: string }) => r.kind).sort()).toEqual(['fiber-only', 'full', 'half-other-polyols']);

    // 100 g of maltitol (seeded as defined composition: total carbohydrate 100 g, all of it a sugar alcohol other
    // than erythritol) + 100 g of blanched almonds (USDA FDC 170568: carbohydrate 18.67 g, fibre 9.9 g).
    // Rules (common practice, no source): half → 118.67 − 9.9 − 100/2 = 58.77; full → 118.67 − 9.9 − 100 = 8.77;
    // fiber-only → 118.67 − 9.9 = 108.77.
    const body = {
      items: [
        { ingredientId: await idOf('maltitol'), amount: '100', unit: 'g' },
        { ingredientId: await idOf('almond-flour'), amount: '100', unit: 'g' },
      ],
      portions: 1,
    };
    const net = async () => (await coach.agent.post('/api/calc/recipe').send(body).expect(200)).body.total.netCarbsG;
    expect(await net()).toBe(58.77);

    const changed = await coach.agent.patch('/api/workspace/settings').send({ netCarbRule: 'full', version: 1 }).expect(200);
    expect(changed.body).toMatchObject({ netCarbRule: 'full', version: 2 });
    expect(await net()).toBe(8.77);
    const lib = await coach.agent.get(`/api/ingredients/${await idOf('maltitol')}`).expect(200);
    expect(lib.body).toMatchObject({ netCarbRule: 'full', per100g: { netCarbsG: 0, polyolsG: 100 } });

    const stale = await coach.agent.patch('/api/workspace/settings').send({ netCarbRule: 'fiber-only', version: 1 }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 2, current: { netCarbRule: 'full' } });
    await coach.agent.patch('/api/workspace/settings').send({ netCarbRule: 'fiber-only', version: 2 }).expect(200);
    expect(await net()).toBe(108.77);
    const [ws] = await sql<{ net_carb_rule: string }>('select net_carb_rule from workspace where id = $1', [coach.workspaceId]);
    expect(ws.net_carb_rule).toBe('fiber-only');
  });

  it('is for the coach only; a bad rule is 400 naming the field', async () => {
    await assistantA.agent.get('/api/workspace/settings').expect(403);
    await assistantA.agent.patch('/api/workspace/settings').send({ netCarbRule: 'full', version: 1 }).expect(403);
    const bad = await coachA.agent.patch('/api/workspace/settings').send({ netCarbRule: 'keto-magic', version: 1 }).expect(400);
    expect(bad.body.errors).toHaveProperty('netCarbRule');
  });
});

describe('GET /api/ingredients.csv (the coach’s own ingredients, in the import’s columns)', () => {
  it('exports what the import reads back: another workspace importing the file gets the same ingredients', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    // Two invented ingredients with every column filled, and a name a spreadsheet would run as a formula.
    const header = 'name,category,kcal,fat_g,sat_fat_g,protein_g,carbs_g,fiber_g,sugars_g,erythritol_g,allulose_g,other_polyols_g,sodium_mg,density_g_per_ml,piece_weights,allergens,purchase_amount,purchase_unit,purchase_label,price_cents,aisle,source,note';
    const csv = [
      header,
      `"Seed bread, sliced (demo)",wraps-breads,265.5,18.25,2.1,11,12.75,8.5,0.8,0,0,1.25,320,0.45,slice:32; heel:20,"sesame; egg",1,each,"1 loaf, 14 slices",799,bakery,package label,"keep frozen, slice from frozen"`,
      `=Sweet drops (demo),sweeteners,0,0,0,0,100,0,0,60,30,0,5,1.1,,,60,ml,2 fl oz bottle,1099,baking,package label,`,
    ].join('\r\n');
    const imported = await coach.agent.post('/api/ingredients/import').attach('file', Buffer.from(csv), { filename: 'mine.csv', contentType: 'text/csv' });
    expect(imported.body.report ?? []).toEqual([]);

    const res = await coach.agent.get('/api/ingredients.csv').expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe('attachment; filename=ingredients.csv');
    const lines = res.text.split('\r\n');
    expect(lines[0]).toBe(header);
    // Ordered by name; a formula-like cell is escaped (OWASP CSV injection: a leading quote), decimals as typed.
    expect(lines.slice(1)).toEqual([
      `"'=Sweet drops (demo)",sweeteners,0,0,0,0,100,0,0,60,30,0,5,1.1,,,60,ml,2 fl oz bottle,1099,baking,package label,`,
      `"Seed bread, sliced (demo)",wraps-breads,265.5,18.25,2.1,11,12.75,8.5,0.8,0,0,1.25,320,0.45,heel:20; slice:32,egg; sesame,1,each,"1 loaf, 14 slices",799,bakery,package label,"keep frozen, slice from frozen"`,
    ]);
    // (Piece weights in the order PostgreSQL's jsonb keeps keys: shorter names first.)
    // Only the coach's own rows: no shared reference row, nothing of another workspace.
    expect(lines).toHaveLength(3);

    // Read back by another workspace's import: the same values (the escaped name loses the quote the export put on it).
    await other.agent.post('/api/ingredients/import').attach('file', Buffer.from(res.text), { filename: 'ingredients.csv', contentType: 'text/csv' }).expect(201);
    const cols = 'name, category, kcal, fat_g, sat_fat_g, protein_g, carbs_g, fiber_g, sugars_g, erythritol_g, allulose_g, other_polyols_g, sodium_mg, density_g_per_ml, piece_weights, allergens, purchase_amount, purchase_unit, purchase_label, price_cents, aisle, source, note';
    const mine = await sql(`select ${cols} from ingredient where workspace_id = $1 order by name`, [coach.workspaceId]);
    const theirs = await sql(`select ${cols} from ingredient where workspace_id = $1 order by name`, [other.workspaceId]);
    expect(theirs).toEqual(mine);

    // The assistant and the client may not take the library away.
    await (await member(app, coach, 'assistant')).agent.get('/api/ingredients.csv').expect(403);
  });
});

