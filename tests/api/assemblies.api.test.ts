import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeAssembly, makeClient, makeIngredient, makeTray, makeWeek, member } from '../support/factories.js';
import { sql } from '../support/db.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});


// Avoirdupois ounce = 28.349523125 g exactly (NIST Handbook 44, Appendix C).
const OZ_G = 28.349523125;

describe('plates (assemblies)', () => {
  it('adds tray portions and add-ons into the plate’s macros and allergens', async () => {
    const coach = await coachWorkspace(app);
    // Test ingredient per 100 g: 350 kcal, 30 g fat, 20 g protein, 2 g carbs, milk; a slice weighs 21 g.
    const cheese = await makeIngredient(coach);
    // Tray: 8 oz of it, cut 4 × 4 = 16 portions.
    const tray = await makeTray(coach, {}, cheese.id);
    const res = await coach.agent
      .post('/api/assemblies')
      .send({
        name: 'Cheese plate',
        trays: [{ trayId: tray.id, portions: 2 }],
        addOns: [{ ingredientId: cheese.id, amountText: '1', unit: 'slice', note: 'on top' }],
        assemblySteps: ['Stack', 'Wrap'],
        reheatSteps: ['Microwave 60 s'],
      })
      .expect(201);
    // Expected by hand: 2 portions = 2 × 8 oz / 16 = 28.349523125 g; plus a 21 g slice → 49.349523125 g of cheese.
    const grams = (2 * 8 * OZ_G) / 16 + 21;
    expect(res.body.nutrition.kcal).toBeCloseTo((grams * 350) / 100, 1);
    expect(res.body.macros.proteinG).toBeCloseTo((grams * 20) / 100, 1);
    expect(res.body.macros.fatG).toBeCloseTo((grams * 30) / 100, 1);
    expect(res.body.allergens).toEqual(['milk']);
    expect(res.body.complete).toBe(true);
    expect(res.body.trays[0]).toMatchObject({ trayId: tray.id, portions: 2, fridgeDays: 4 });
    expect(res.body.addOns[0]).toMatchObject({ ingredientId: cheese.id, grams: 21, note: 'on top' });
    const rows = await sql('select position, tray_id, ingredient_id from assembly_item where assembly_id = $1 order by position', [res.body.id]);
    expect(rows).toEqual([
      { position: 0, tray_id: tray.id, ingredient_id: null },
      { position: 1, tray_id: null, ingredient_id: cheese.id },
    ]);
  });

  it('previews an unsaved plate: the same numbers the saved plate gets, a 400 naming a part it cannot use, nothing written', async () => {
    const coach = await coachWorkspace(app);
    const cheese = await makeIngredient(coach); // 350 kcal, 30 g fat, 20 g protein per 100 g; milk; slice 21 g
    const tray = await makeTray(coach, {}, cheese.id); // 8 oz cut 4 × 4
    const parts = { trays: [{ trayId: tray.id, portions: 2 }], addOns: [{ ingredientId: cheese.id, amountText: '1', unit: 'slice', note: '' }] };
    const before = await sql<{ n: string }>('select count(*) as n from assembly');
    const preview = await coach.agent.post('/api/assemblies/preview').send(parts).expect(200);
    // By hand, as above: 2 × 8 oz / 16 + 21 g = 49.349523125 g of the ingredient (NIST ounce).
    const grams = (2 * 8 * OZ_G) / 16 + 21;
    expect(preview.body.macros.kcal).toBeCloseTo((grams * 350) / 100, 1);
    expect(preview.body.macros.proteinG).toBeCloseTo((grams * 20) / 100, 1);
    expect(preview.body).toMatchObject({ allergens: ['milk'], complete: true, addOnGrams: [21] });
    expect(await sql('select count(*) as n from assembly')).toEqual(before);
    // Saved, the plate has the numbers the preview showed.
    const saved = await coach.agent.post('/api/assemblies').send({ name: 'Previewed plate', ...parts }).expect(201);
    expect(saved.body.macros).toEqual(preview.body.macros);
    // A part it cannot use: the field is named, as on save.
    const bad = await coach.agent
      .post('/api/assemblies/preview')
      .send({ trays: [], addOns: [{ ingredientId: cheese.id, amountText: '1', unit: 'cup', note: '' }] })
      .expect(400);
    expect(Object.keys(bad.body.errors)).toEqual(['addOns.0.unit']);
    // Nothing on the plate yet: zeros, not an error.
    const empty = await coach.agent.post('/api/assemblies/preview').send({ trays: [], addOns: [] }).expect(200);
    expect(empty.body).toMatchObject({ macros: { kcal: 0, proteinG: 0 }, allergens: [], complete: true, addOnGrams: [] });
  });

  it('answers 400 naming the line for a tray of another workspace or an amount that cannot be weighed', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const foreign = await makeTray(other);
    const cheese = await makeIngredient(coach); // no density: cups cannot be weighed
    const res = await coach.agent
      .post('/api/assemblies')
      .send({ name: 'Bad', trays: [{ trayId: foreign.id, portions: 1 }], addOns: [{ ingredientId: cheese.id, amountText: '1', unit: 'cup' }] })
      .expect(400);
    expect(Object.keys(res.body.errors)).toEqual(expect.arrayContaining(['trays.0.trayId', 'addOns.0.unit']));
    const empty = await coach.agent.post('/api/assemblies').send({ name: 'Empty' }).expect(400);
    expect(empty.body.errors).toHaveProperty('trays');
  });

  it('refuses a stale edit with 409 and the current plate', async () => {
    const coach = await coachWorkspace(app);
    const tray = await makeTray(coach);
    const plate = await makeAssembly(coach, tray.id);
    const body = { name: 'Renamed', trays: [{ trayId: tray.id, portions: 1.5 }] };
    const ok = await coach.agent.put(`/api/assemblies/${plate.id}`).send({ ...body, version: plate.version }).expect(200);
    expect(ok.body.version).toBe(plate.version + 1);
    expect(ok.body.trays[0].portions).toBe(1.5);
    const late = await coach.agent.put(`/api/assemblies/${plate.id}`).send({ ...body, name: 'Late', version: plate.version }).expect(409);
    expect(late.body).toMatchObject({ code: 'stale_version', currentVersion: plate.version + 1, current: { name: 'Renamed' } });
  });

  it('keeps plates per workspace, lets the assistant read them, and archives a plate on a board instead of deleting it', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const tray = await makeTray(coach);
    const plate = await makeAssembly(coach, tray.id);
    await other.agent.get(`/api/assemblies/${plate.id}`).expect(404);
    expect((await other.agent.get('/api/assemblies').expect(200)).body).toEqual([]);
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.get(`/api/assemblies/${plate.id}`).expect(200);
    await assistant.agent.post('/api/assemblies').send({ name: 'x', trays: [{ trayId: tray.id, portions: 1 }] }).expect(403);

    const client = await makeClient(coach);
    const board = await makeWeek(coach);
    await coach.agent
      .put(`/api/weeks/${board.week.id}/cells`)
      .send({ version: board.week.version, cells: [{ clientId: client.id, date: '2026-01-05', slot: 'breakfast', assemblyId: plate.id }] })
      .expect(200);
    // A plate on a board is archived instead of deleted, and the answer says where it is planned (the week has no
    // name: "Week of" its first day, Mon, Jan 5 2026).
    const del = await coach.agent.delete(`/api/assemblies/${plate.id}`).expect(200);
    expect(del.body).toMatchObject({ archived: true, plannedOn: '1 meal on the board of Week of Mon, Jan 5', plate: { id: plate.id, archived: true } });
    expect(await sql('select archived from assembly where id = $1', [plate.id])).toEqual([{ archived: true }]);
    expect(await sql('select id from assembly where id = $1', [plate.id])).toHaveLength(1);
    const unused = await makeAssembly(coach, tray.id);
    await coach.agent.delete(`/api/assemblies/${unused.id}`).expect(204);
    expect(await sql('select id from assembly where id = $1', [unused.id])).toEqual([]);
  });

  it('archives a plate: the board keeps its cells, a new cell cannot use it, and restoring brings it back', async () => {
    const coach = await coachWorkspace(app);
    const tray = await makeTray(coach);
    const plate = await makeAssembly(coach, tray.id);
    const [ann, bo] = [await makeClient(coach), await makeClient(coach)];
    const board = await makeWeek(coach);
    const planned = await coach.agent
      .put(`/api/weeks/${board.week.id}/cells`)
      .send({ version: board.week.version, cells: [{ clientId: ann.id, date: '2026-01-05', slot: 'breakfast', assemblyId: plate.id }] })
      .expect(200);

    const archived = await coach.agent.put(`/api/assemblies/${plate.id}/archived`).send({ archived: true, version: plate.version }).expect(200);
    expect(archived.body).toMatchObject({ id: plate.id, archived: true, version: plate.version + 1 });
    // The same request again with the old version is a stale edit (409), not a second change.
    const late = await coach.agent.put(`/api/assemblies/${plate.id}/archived`).send({ archived: false, version: plate.version }).expect(409);
    expect(late.body).toMatchObject({ code: 'stale_version', currentVersion: plate.version + 1, current: { archived: true } });
    // Bad input names the field and changes nothing.
    const bad = await coach.agent.put(`/api/assemblies/${plate.id}/archived`).send({ archived: 'yes', version: archived.body.version }).expect(400);
    expect(JSON.stringify(bad.body)).toContain('archived');
    expect(await sql('select archived, version from assembly where id = $1', [plate.id])).toEqual([{ archived: true, version: plate.version + 1 }]);

    // The board still shows it with its cell; the list marks it archived; the setup counts leave it out.
    const week = await coach.agent.get(`/api/weeks/${board.week.id}`).expect(200);
    expect(week.body.cells).toEqual([expect.objectContaining({ clientId: ann.id, assemblyId: plate.id })]);
    expect(week.body.plates.find((p: { id: number }) => p.id === plate.id)).toMatchObject({ archived: true });
    expect((await coach.agent.get('/api/assemblies').expect(200)).body.find((p: { id: number }) => p.id === plate.id).archived).toBe(true);

    // The planned cell keeps it through a change of storage; a new cell with it is refused naming the cell.
    const kept = await coach.agent
      .put(`/api/weeks/${board.week.id}/cells`)
      .send({ version: planned.body.week.version, cells: [{ clientId: ann.id, date: '2026-01-05', slot: 'breakfast', assemblyId: plate.id, storage: 'frozen' }] })
      .expect(200);
    const refused = await coach.agent
      .put(`/api/weeks/${board.week.id}/cells`)
      .send({ version: kept.body.week.version, cells: [{ clientId: bo.id, date: '2026-01-06', slot: 'breakfast', assemblyId: plate.id }] })
      .expect(400);
    expect(refused.body.errors['cells.0.assemblyId']).toEqual([`${plate.name} is archived: restore it on the Plates page to plan it again`]);

    // Copies leave it behind: no new cell takes an archived plate (a copied day replaces the target day; a copied week
    // starts without it).
    const tuesday = await coach.agent
      .post(`/api/weeks/${board.week.id}/copy-day`)
      .send({ version: kept.body.week.version, fromDate: '2026-01-05', toDate: '2026-01-06' })
      .expect(200);
    expect(tuesday.body.cells.map((c: { date: string }) => c.date)).toEqual(['2026-01-05']);
    const copiedWeek = await coach.agent.post(`/api/weeks/${board.week.id}/copy`).send({ startDate: '2026-01-12', prepDate: '2026-01-11' }).expect(201);
    expect(copiedWeek.body.cells).toEqual([]);
    expect(copiedWeek.body.copied).toEqual({ meals: 0, leftBehind: 1 });

    const restored = await coach.agent.put(`/api/assemblies/${plate.id}/archived`).send({ archived: false, version: archived.body.version }).expect(200);
    expect(restored.body.archived).toBe(false);
    await coach.agent
      .put(`/api/weeks/${board.week.id}/cells`)
      .send({ version: tuesday.body.week.version, cells: [{ clientId: bo.id, date: '2026-01-06', slot: 'breakfast', assemblyId: plate.id }] })
      .expect(200);
  });
});
