import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { compareNames } from '@shared/domain/words.js';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeAssembly, makeClient, makeIngredient, makeTray } from '../support/factories.js';

// Lists come in the order people read names: alphabetical whatever the capitals, digits as numbers, an accented
// letter beside its plain one. Outside reference: the Unicode Collation Algorithm (UTS #10) with CLDR's root order
// and its numeric key `kn` (UTS #35), which the database applies through ICU (collation "name_order") and the pages
// through ECMA-402 Intl.Collator (compareNames). Both implementations are checked to agree on the same names.

let app: Express;
beforeAll(async () => {
  ({ app } = await testApp());
});

/** Typed in an order no rule produces; the expected order is worked by hand from UTS #10 / CLDR. */
const NAMES = ['Zoe Park', 'plate 10 test', 'Plate 2 test', 'almond Lee', 'Émile Roy', 'Bench 1', 'de Vries', 'Eli Ma', 'bench 1'];
const EXPECTED = ['almond Lee', 'bench 1', 'Bench 1', 'de Vries', 'Eli Ma', 'Émile Roy', 'Plate 2 test', 'plate 10 test', 'Zoe Park'];

describe('names in order, on every list', () => {
  it('sorts the worked example as the hand-worked order, in the pages and in the database alike', () => {
    expect([...NAMES].sort(compareNames)).toEqual(EXPECTED);
  });

  it('lists clients, plates and base trays in that order', async () => {
    const coach = await coachWorkspace(app);
    for (const name of NAMES) await makeClient(coach, { name });
    const clients = (await coach.agent.get('/api/clients').expect(200)).body as { name: string }[];
    expect(clients.map((c) => c.name)).toEqual(EXPECTED);

    const trayNames = ['Tray 12', 'tray 3', 'Tray 1'];
    const trays = [];
    for (const name of trayNames) trays.push(await makeTray(coach, { name }));
    const listed = (await coach.agent.get('/api/trays').expect(200)).body as { name: string }[];
    expect(listed.map((t) => t.name)).toEqual(['Tray 1', 'tray 3', 'Tray 12']);

    for (const name of ['Plate 10', 'avocado plate', 'Plate 9']) await makeAssembly(coach, trays[0]!.id, { name });
    const plates = (await coach.agent.get('/api/assemblies').expect(200)).body as { name: string }[];
    expect(plates.map((p) => p.name)).toEqual(['avocado plate', 'Plate 9', 'Plate 10']);
  });

  it('pages the ingredient library in that order (the database sorts, the page boundary falls in the same place)', async () => {
    const coach = await coachWorkspace(app);
    const mine = ['zz Oil 100', 'zz oil 20', 'zz Óil 3', 'zz oil 3', 'zz Oil 1000'];
    for (const name of mine) await makeIngredient(coach, { name });
    const pages = [];
    for (const page of [1, 2, 3]) {
      const res = await coach.agent.get(`/api/ingredients?scope=mine&q=zz&pageSize=2&page=${page}`).expect(200);
      pages.push(...(res.body.items as { name: string }[]).map((i) => i.name));
    }
    expect(pages).toEqual(['zz oil 3', 'zz Óil 3', 'zz oil 20', 'zz Oil 100', 'zz Oil 1000']);
    expect(pages).toEqual([...mine].sort(compareNames));
    const down = await coach.agent.get('/api/ingredients?scope=mine&q=zz&sort=-name&pageSize=10').expect(200);
    expect(down.body.items.map((i: { name: string }) => i.name)).toEqual([...pages].reverse());
  });
});
