import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeIngredient, member } from '../support/factories.js';
import { shoppingWeek } from '../support/shopping-week.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

describe('container labels', () => {
  it('prints one label per container with per-portion macros rounded per 21 CFR 101.9(c)', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    // One portion = 100 g of one ingredient (a tray of 100 g cut into 1 piece, no add-on), so the label shows the
    // ingredient's per-100 g values rounded. Invented values, Atwater-consistent within 15 %.
    const slab = await makeIngredient(coach, {
      kcal: '52', fatG: '4.76', satFatG: '1', proteinG: '2.6', carbsG: '0.7', sugarsG: '0.2', allergens: ['milk'],
    });
    const w = await shoppingWeek(coach, {
      multiplier: '1',
      trayCount: 3,
      tray: {
        lines: [{ ingredientId: slab.id, amountText: '100', unit: 'g', note: '' }],
        cutPlan: { kind: 'pieces', pieces: 1 },
        yieldFactor: 1,
        storage: { fridgeDays: 4, freezerWeeks: 8 },
      },
    });
    const res = await assistant.agent.get(`/api/weeks/${w.weekId}/labels?layout=a4-3x7&prepDate=2026-01-04`).expect(200);
    expect(res.body).toMatchObject({ layout: 'a4-3x7', prepDate: '2026-01-04', prepDates: ['2026-01-04'] });
    // 2 plates on the board + (3 portions baked − 2 used) = 1 spare portion → 3 containers.
    expect(res.body.labels).toHaveLength(3);
    expect(res.body.labels.map((l: { kind: string }) => l.kind)).toEqual(['plate', 'plate', 'spare']);
    const [mon, tue, spare] = res.body.labels;
    expect(mon).toMatchObject({ planned: { date: '2026-01-05', slot: 'breakfast' }, portions: null });
    // Whose it is, for printing one client's labels again; a spare portion is no one's.
    expect([mon.clientId, tue.clientId, spare.clientId]).toEqual([w.client.id, w.client.id, null]);
    expect(tue).toMatchObject({ planned: { date: '2026-01-06', slot: 'breakfast' }, portions: null });
    expect(mon.subtitle).toBe(tue.subtitle);
    // Eat-by = prep date + fridge days (shared/domain/eat-by.ts rule: the prep date is day 0): 01-04 + 4 = 01-08.
    expect(mon).toMatchObject({ madeOn: '2026-01-04', eatBy: '2026-01-08', freezeBy: '2026-01-08', frozenBestBy: null });
    expect(mon.reheat).toMatch(/165 °F/);
    expect(mon.url).toBe('http://127.0.0.1:8080/my-plates?date=2026-01-05');
    expect(mon.qr).toMatch(/^data:image\/svg\+xml;base64,/);
    expect(Buffer.from(mon.qr.split(',')[1], 'base64').toString()).toContain('<svg');
    // 21 CFR 101.9(c): calories > 50 → nearest 10 (52 → 50); fat < 5 g → nearest 0.5 g (4.76 → 5 g);
    // carbohydrate < 1 g → "less than 1 g" (0.7); protein ≥ 1 g → nearest 1 g (2.6 → 3 g).
    expect(spare).toMatchObject({
      title: w.tray.name,
      subtitle: 'Spare portion',
      planned: null,
      eatBy: '2026-01-08',
      macros: { calories: '50', fat: '5 g', carbohydrate: 'less than 1 g', protein: '3 g', netCarbs: 'less than 1 g' },
      allergens: ['milk'],
      allergenText: 'Contains: Milk',
      onClientList: [],
    });
    expect(spare.url).toBe(`http://127.0.0.1:8080/trays/${w.tray.id}`);
    // The plate = 100 g slab + 1 oz (28.349523125 g, NIST) of the factory cheese (350 kcal, 30 g fat, 20 g protein,
    // 2 g carbohydrate per 100 g): 52 + 99.22 = 151.2 kcal → 150; fat 4.76 + 8.505 = 13.3 g → 13 g (≥ 5 g: nearest 1 g);
    // carbohydrate 0.7 + 0.567 = 1.27 g → 1 g; protein 2.6 + 5.67 = 8.27 g → 8 g.
    expect(mon.macros).toEqual({ calories: '150', fat: '13 g', carbohydrate: '1 g', protein: '8 g', netCarbs: '1 g' });
    expect(mon.title).toBe((await coach.agent.get(`/api/clients/${w.client.id}`)).body.name);
  });

  it('marks on a plate’s label the allergens on its client’s list, read as the list stands', async () => {
    const coach = await coachWorkspace(app);
    const w = await shoppingWeek(coach, { multiplier: '1' });
    const labels = async () => (await coach.agent.get(`/api/weeks/${w.weekId}/labels?prepDate=2026-01-04`).expect(200)).body.labels as { kind: string; allergens: string[]; onClientList: string[] }[];
    const before = await labels();
    expect(before.filter((l) => l.kind === 'plate').map((l) => l.onClientList)).toEqual([[], []]);
    // The plate holds milk (the factory cheese, and egg from the eggs); milk and soy put on the client's list.
    expect(before[0].allergens).toContain('milk');
    const profile = (await coach.agent.get(`/api/clients/${w.client.id}`).expect(200)).body;
    await coach.agent.patch(`/api/clients/${w.client.id}`).send({ allergens: ['milk', 'soy'], version: profile.version }).expect(200);
    const after = await labels();
    expect(after.map((l) => [l.kind, l.onClientList])).toEqual([
      ['plate', ['milk']],
      ['plate', ['milk']],
      ...after.filter((l) => l.kind === 'spare').map(() => ['spare', []]),
    ]);
  });

  it('says how many portions a household container holds, and a frozen plate’s best-quality day instead of a freeze-by', async () => {
    const coach = await coachWorkspace(app);
    const w = await shoppingWeek(coach, { multiplier: '2', tray: { storage: { fridgeDays: 4, freezerWeeks: 8 } } });
    const board = (await coach.agent.get(`/api/weeks/${w.weekId}`).expect(200)).body;
    await coach.agent
      .put(`/api/weeks/${w.weekId}/cells`)
      .send({
        version: board.week.version,
        cells: [
          { clientId: w.client.id, date: '2026-01-05', slot: 'breakfast', assemblyId: w.plate.id },
          { clientId: w.client.id, date: '2026-01-06', slot: 'breakfast', assemblyId: w.plate.id, storage: 'frozen' },
        ],
      })
      .expect(200);
    const res = await coach.agent.get(`/api/weeks/${w.weekId}/labels?prepDate=2026-01-04`).expect(200);
    const [mon, tue] = res.body.labels;
    expect(mon).toMatchObject({ portions: '2', eatBy: '2026-01-08', freezeBy: '2026-01-08', frozenBestBy: null });
    // Frozen on prep day: eaten on its day (thawed the evening before); best quality for the tray's 8 freezer weeks,
    // 2026-01-04 + 56 days = 2026-03-01 (worked by hand).
    expect(tue).toMatchObject({ portions: '2', planned: { date: '2026-01-06', slot: 'breakfast' }, eatBy: '2026-01-06', freezeBy: null, frozenBestBy: '2026-03-01' });
  });

  it('marks the plates of a tray the prep day is short of: trays thrown away in the cooling record, or too few set', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    // One portion per tray (cut into 1 piece), a plate on Mon and Tue, household multiplier 1: 2 portions needed.
    const w = await shoppingWeek(coach, { multiplier: '1', trayCount: 3, tray: { cutPlan: { kind: 'pieces', pieces: 1 } } });
    const labels = async () => (await assistant.agent.get(`/api/weeks/${w.weekId}/labels?prepDate=2026-01-04`).expect(200)).body;
    const covered = await labels();
    expect(covered.short).toEqual([]);
    expect(covered.labels.map((l: { shortTrays: string[] }) => l.shortTrays)).toEqual([[], [], []]);

    // Two of the three trays thrown away: 1 portion for 2 plates → 1 short; no spare; both plates marked.
    const cooling = `/api/weeks/${w.weekId}/bake-run/cooling`;
    for (const k of [1, 2]) {
      await assistant.agent.put(`${cooling}/${w.tray.id}-${k}`).send({ outAt: '2026-01-04T10:00', discarded: true }).expect(200);
    }
    const lost = await labels();
    expect(lost.short).toEqual([{ trayId: w.tray.id, trayName: w.tray.name, portions: 1, lostTrays: 2, trayCount: 3, plateLabels: 2 }]);
    expect(lost.labels.map((l: { kind: string; shortTrays: string[] }) => [l.kind, l.shortTrays])).toEqual([
      ['plate', [w.tray.name]],
      ['plate', [w.tray.name]],
    ]);

    // Kept after all, and the coach sets one tray for two plates: short by 1 with nothing thrown away.
    for (const k of [1, 2]) {
      await assistant.agent.put(`${cooling}/${w.tray.id}-${k}`).send({ outAt: '2026-01-04T10:00', discarded: false, version: 1 }).expect(200);
    }
    const board = (await coach.agent.get(`/api/weeks/${w.weekId}`).expect(200)).body;
    await coach.agent
      .put(`/api/weeks/${w.weekId}/trays`)
      .send({ version: board.week.version, trays: [{ trayId: w.tray.id, prepDate: '2026-01-04', trayCount: 1 }] })
      .expect(200);
    const few = await labels();
    expect(few.short).toEqual([{ trayId: w.tray.id, trayName: w.tray.name, portions: 1, lostTrays: 0, trayCount: 1, plateLabels: 2 }]);
  });

  it('names bad input (prep date outside the week, unknown layout), scopes the week, and refuses clients', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const client = await member(app, coach, 'client');
    const w = await shoppingWeek(coach);
    const bad = await coach.agent.get(`/api/weeks/${w.weekId}/labels?prepDate=2026-01-09`).expect(400);
    expect(bad.body.errors).toHaveProperty('prepDate');
    const layout = await coach.agent.get(`/api/weeks/${w.weekId}/labels?layout=vendor-5160`).expect(400);
    expect(layout.body.errors).toHaveProperty('layout');
    await other.agent.get(`/api/weeks/${w.weekId}/labels`).expect(404);
    await client.agent.get(`/api/weeks/${w.weekId}/labels`).expect(403);
    const fine = await coach.agent.get(`/api/weeks/${w.weekId}/labels`).expect(200);
    expect(fine.body.layout).toBe('letter-2x5');
  });
});
