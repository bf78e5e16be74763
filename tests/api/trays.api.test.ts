import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import Decimal from 'decimal.js';
import type { Express } from 'express';
import { agentFor, testApp } from '../support/test-app.js';
import { coachWorkspace, makeIngredient, makeTray, member, PASSWORD, trayInput, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';
import { seedReferenceIngredients } from '@server/db/seeders/ingredient-seed.js';
import { SEED_INGREDIENTS } from '@server/db/seeders/data/ingredients.data.js';
import { seedDemoTrays, DEMO_TRAYS } from '@server/db/seeders/tray-demo.js';
import { User } from '@server/modules/auth/user.entity.js';
import { Workspace } from '@server/modules/workspaces/workspace.entity.js';

let app: Express;
let closeOwn: () => Promise<void>;
let filesDir: string;
let tempDir: string;
let coach: Member;
let assistant: Member;
let client: Member;
let other: Member;
let ingredientId: number;
let seedDemo: (m: Member) => Promise<void>;


beforeAll(async () => {
  tempDir = await fs.mkdtemp(path.join(os.tmpdir(), 'trayline-trays-'));
  // Under a folder whose name starts with a dot, as the app's own default (FILES_DIR=.data/files).
  filesDir = path.join(tempDir, '.data', 'files');
  const own = await testApp({ FILES_DIR: filesDir });
  app = own.app;
  seedDemo = async (m: Member) => {
    const em = own.orm.em.fork();
    await em.transactional(async (tx) => {
      const ws = await tx.findOneOrFail(Workspace, m.workspaceId);
      const user = await tx.findOneOrFail(User, m.userId);
      await seedDemoTrays({ em: tx, workspace: ws, coach: user, assistant: user, clientUsers: [] });
    });
  };
  closeOwn = async () => {
    await Promise.allSettled([own.orm.close(true), own.pool.end()]);
  };
  // The shared reference ingredients (seeded on every start in the app; here once for this file).
  await seedReferenceIngredients(own.orm.em.fork());
  coach = await coachWorkspace(app);
  assistant = await member(app, coach, 'assistant');
  client = await member(app, coach, 'client');
  other = await coachWorkspace(app);
  ingredientId = (await makeIngredient(coach)).id;
});

afterAll(async () => {
  await closeOwn();
  await fs.rm(tempDir, { recursive: true, force: true });
});

const slugId = async (slug: string) =>
  (await sql<{ id: number }>('select id from ingredient where slug = $1 and workspace_id is null', [slug]))[0].id;

describe('who sees and edits base trays', () => {
  it('coach creates; assistant reads but cannot write; a client sees no trays until plans exist', async () => {
    const tray = await makeTray(coach, {}, ingredientId);
    expect((await assistant.agent.get(`/api/trays/${tray.id}`)).status).toBe(200);
    expect((await assistant.agent.get('/api/trays')).body.map((t: { id: number }) => t.id)).toContain(tray.id);
    const put = await assistant.agent.put(`/api/trays/${tray.id}`).send({ ...trayInput(ingredientId), version: 1 });
    expect(put.status).toBe(403);
    expect(put.body.code).toBe('forbidden');
    // trayIdsInClientPlan(): a client without a published plan sees no trays.
    expect((await client.agent.get('/api/trays').expect(200)).body).toEqual([]);
    expect((await client.agent.get(`/api/trays/${tray.id}`)).status).toBe(404);
    expect((await client.agent.get(`/api/trays/${tray.id}/portion-card`)).status).toBe(404);
  });

  it('another workspace gets 404 for the id and never sees the tray in its list', async () => {
    const tray = await makeTray(coach, {}, ingredientId);
    expect((await other.agent.get(`/api/trays/${tray.id}`)).status).toBe(404);
    expect((await other.agent.get('/api/trays')).body).toEqual([]);
    const del = await other.agent.delete(`/api/trays/${tray.id}`);
    expect(del.status).toBe(404);
    expect((await sql('select id from tray where id = $1', [tray.id])).length).toBe(1);
  });

  it("a line may not use another workspace's ingredient (400 naming the line)", async () => {
    const theirs = await makeIngredient(other);
    const res = await coach.agent.post('/api/trays').send(trayInput(theirs.id));
    expect(res.status).toBe(400);
    expect(res.body.errors['lines.0.ingredientId']).toBeDefined();
  });
});

describe('creating and editing', () => {
  it('stores ordered lines with the amount as typed and derives allergens from the ingredients', async () => {
    const egg = await slugId('egg-whole');
    const almond = await slugId('almond-flour');
    const res = await coach.agent
      .post('/api/trays')
      .send(
        trayInput(egg, {
          lines: [
            { ingredientId: egg, amountText: '1 1/2', unit: 'large', note: 'room temperature' },
            { ingredientId: almond, amountText: '½', unit: 'cups', note: '' },
            { ingredientId, amountText: '2-4', unit: 'oz', note: '' },
          ],
        }),
      )
      .expect(201);
    // Allergen codes from the seed data: egg (egg), almond flour (tree nuts), test cheese (milk).
    expect(res.body.allergens).toEqual(['milk', 'egg', 'tree-nuts']);
    expect(res.body.lines.map((l: { amountText: string; unit: string }) => `${l.amountText} ${l.unit}`)).toEqual([
      '1 1/2 large',
      '½ cup',
      '2-4 oz',
    ]);
    const rows = await sql<{ position: number; amount: string; amount_text: string }>(
      'select position, amount, amount_text from tray_line where tray_id = $1 order by position',
      [res.body.id],
    );
    // parseAmount: 1 1/2 = 1.5; ½ = 0.5; the range 2-4 keeps its midpoint 3.
    expect(rows.map((r) => [r.position, Number(r.amount)])).toEqual([[1, 1.5], [2, 0.5], [3, 3]]);
    // The reheat temperature is FDA Food Code 3-403.11: 165 °F (74 °C).
    expect(res.body.reheat).toMatchObject({ minF: 165, minC: 74 });
  });

  it('400 names each bad field', async () => {
    const res = await coach.agent.post('/api/trays').send(
      trayInput(ingredientId, {
        name: '',
        lines: [{ ingredientId, amountText: 'lots', unit: 'oz' }],
        pan: { code: 'custom', width: 10 },
        bake: { category: 'egg-slab', tempF: 350, minMinutes: 30, maxMinutes: 20 },
      }),
    );
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors)).toEqual(
      expect.arrayContaining(['name', 'lines.0.amountText', 'pan.length', 'bake.maxMinutes']),
    );
  });

  it('a volume of an ingredient without density is refused on the line unit', async () => {
    // The test cheese of the factories has no density.
    const res = await coach.agent.post('/api/trays').send(trayInput(ingredientId, { lines: [{ ingredientId, amountText: '1', unit: 'cup' }] }));
    expect(res.status).toBe(400);
    expect(res.body.errors['lines.0.unit'][0]).toMatch(/density/);
  });

  it('a stale save answers 409 with the current record; the right version saves and moves on', async () => {
    const tray = await makeTray(coach, {}, ingredientId);
    const first = await coach.agent
      .put(`/api/trays/${tray.id}`)
      .send({ ...trayInput(ingredientId, { name: 'Renamed slab' }), version: tray.version })
      .expect(200);
    expect(first.body.version).toBe(tray.version + 1);
    const stale = await coach.agent
      .put(`/api/trays/${tray.id}`)
      .send({ ...trayInput(ingredientId, { name: 'Mine' }), version: tray.version });
    expect(stale.status).toBe(409);
    expect(stale.body.code).toBe('stale_version');
    expect(stale.body.currentVersion).toBe(first.body.version);
    expect(stale.body.current).toMatchObject({ id: tray.id, name: 'Renamed slab', version: first.body.version });
    const [row] = await sql<{ name: string }>('select name from tray where id = $1', [tray.id]);
    expect(row.name).toBe('Renamed slab');
  });

  it('changing only the lines still moves the version on', async () => {
    const tray = await makeTray(coach, {}, ingredientId);
    const body = trayInput(ingredientId, { name: tray.name, lines: [{ ingredientId, amountText: '9', unit: 'oz' }] });
    const res = await coach.agent.put(`/api/trays/${tray.id}`).send({ ...body, description: 'A test tray', version: tray.version }).expect(200);
    expect(res.body.version).toBe(tray.version + 1);
    expect(res.body.lines).toHaveLength(1);
    expect(res.body.lines[0].amountText).toBe('9');
  });

  it('DELETE removes a tray no plan uses; archived trays are filtered out unless asked for', async () => {
    const gone = await makeTray(coach, {}, ingredientId);
    await coach.agent.delete(`/api/trays/${gone.id}`).expect(204);
    expect((await sql('select id from tray where id = $1', [gone.id])).length).toBe(0);
    expect((await sql('select id from tray_line where tray_id = $1', [gone.id])).length).toBe(0);

    const kept = await makeTray(coach, {}, ingredientId);
    await coach.agent
      .put(`/api/trays/${kept.id}`)
      .send({ ...trayInput(ingredientId, { name: kept.name }), version: kept.version, archived: true })
      .expect(200);
    const active = (await coach.agent.get('/api/trays').expect(200)).body.map((t: { id: number }) => t.id);
    const archived = (await coach.agent.get('/api/trays?archived=true').expect(200)).body.map((t: { id: number }) => t.id);
    const all = (await coach.agent.get('/api/trays?archived=all').expect(200)).body.map((t: { id: number }) => t.id);
    expect(active).not.toContain(kept.id);
    expect(archived).toContain(kept.id);
    expect(all).toContain(kept.id);
  });

  it('duplicate makes an active copy with the same lines and no photo', async () => {
    const tray = await makeTray(coach, { tags: ['egg-free'] }, ingredientId);
    const copy = await coach.agent.post(`/api/trays/${tray.id}/duplicate`).expect(201);
    expect(copy.body.id).not.toBe(tray.id);
    expect(copy.body.name).toBe(`${tray.name} (copy)`);
    expect(copy.body.tags).toEqual(['egg-free']);
    expect(copy.body.lines.map((l: { amountText: string }) => l.amountText)).toEqual(['8']);
    expect(copy.body.photo).toBeNull();
  });
});

describe('library filters', () => {
  it('free of an allergen, and net carbs per portion at most N', async () => {
    const spinach = await slugId('spinach');
    const egg = await slugId('egg-whole');
    const veg = await makeTray(coach, { name: 'Filter veg', lines: [{ ingredientId: spinach, amountText: '400', unit: 'g' }], tags: ['veg'] }, spinach);
    const eggy = await makeTray(coach, { name: 'Filter egg', lines: [{ ingredientId: egg, amountText: '12', unit: 'large' }], tags: ['veg'] }, egg);
    const freeOfEgg = (await coach.agent.get('/api/trays?freeOf=egg&tag=veg').expect(200)).body.map((t: { id: number }) => t.id);
    expect(freeOfEgg).toContain(veg.id);
    expect(freeOfEgg).not.toContain(eggy.id);
    // Spinach FDC 168462: 3.63 g carbs − 2.2 g fibre per 100 g → 400 g = 5.72 g net, ÷ 16 = 0.3575 g per portion.
    // Egg FDC 171287: 0.72 g carbs, 0 fibre per 100 g → 12 × 50 g = 4.32 g net, ÷ 16 = 0.27 g per portion.
    const low = (await coach.agent.get('/api/trays?maxNetCarbs=0.3&tag=veg').expect(200)).body.map((t: { id: number }) => t.id);
    expect(low).toEqual([eggy.id]);
    expect((await coach.agent.get('/api/trays?freeOf=gluten')).status).toBe(400);
  });
});

describe('worked example: spinach egg slab on a half sheet, 16 portions', () => {
  // Values per 100 g from the seeded reference rows, which the test reads back from the seed data and checks
  // against the published values (shared reference "published-values" §5, USDA FoodData Central SR Legacy):
  // - egg FDC 171287: 143 kcal, 9.51 g fat, 12.56 g protein, 0.72 g carbs, 0 g fibre; large egg 50 g (§5b);
  //   priced 399 ¢ per dozen large (illustrative demo price in the seed data).
  // - heavy cream FDC 170859: 340 kcal, 36.08 g fat, 2.84 g protein, 2.74 g carbs, 0 g fibre.
  // - spinach FDC 168462: 23 kcal, 0.39 g fat, 2.86 g protein, 3.63 g carbs, 2.2 g fibre.
  const seed = (slug: string) => SEED_INGREDIENTS.find((s) => s.slug === slug)!;
  let trayId: number;

  beforeAll(async () => {
    expect([seed('egg-whole').kcal, seed('egg-whole').fatG, seed('egg-whole').proteinG, seed('egg-whole').carbsG]).toEqual([143, 9.51, 12.56, 0.72]);
    expect(seed('egg-whole').pieceWeights.large).toBe(50);
    expect([seed('heavy-cream').kcal, seed('heavy-cream').fatG, seed('heavy-cream').proteinG, seed('heavy-cream').carbsG]).toEqual([340, 36.08, 2.84, 2.74]);
    expect([seed('spinach').kcal, seed('spinach').fatG, seed('spinach').proteinG, seed('spinach').carbsG, seed('spinach').fiberG]).toEqual([23, 0.39, 2.86, 3.63, 2.2]);
    const [egg, cream, spinach] = await Promise.all(['egg-whole', 'heavy-cream', 'spinach'].map(slugId));
    const res = await coach.agent
      .post('/api/trays')
      .send(
        trayInput(egg, {
          name: 'Worked example slab',
          lines: [
            { ingredientId: egg, amountText: '12', unit: 'large' },
            { ingredientId: cream, amountText: '120', unit: 'g' },
            { ingredientId: spinach, amountText: '60', unit: 'g' },
          ],
          pan: { code: 'half-sheet' },
          yieldFactor: 0.9,
          cutPlan: { kind: 'grid', rows: 4, columns: 4 },
        }),
      )
      .expect(201);
    trayId = res.body.id;
  });

  it('portion card: grams, size in the pan, macros, net carbs, energy shares and cost', async () => {
    const card = (await coach.agent.get(`/api/trays/${trayId}/portion-card`).expect(200)).body;
    // By hand (per 100 g values above):
    //   eggs 12 × 50 g = 600 g: 858 kcal, 57.06 fat, 75.36 protein, 4.32 carbs
    //   cream 120 g: 408 kcal, 43.296 fat, 3.408 protein, 3.288 carbs
    //   spinach 60 g: 13.8 kcal, 0.234 fat, 1.716 protein, 2.178 carbs, 1.32 fibre
    //   total 1279.8 kcal, 100.59 g fat, 80.484 g protein, 9.786 g carbs, 1.32 g fibre
    //   per portion (÷ 16): 79.9875 kcal, 6.286875 fat, 5.03025 protein, 0.611625 carbs, 0.0825 fibre
    //   net carbs (no sugar alcohols, so every rule is carbs − fibre): 0.529125
    //   grams: raw 780 g × yield 0.9 = 702 g ÷ 16 = 43.875 g
    expect(card.portions).toBe(16);
    expect(card.perPortion.kcal).toBe(79.99);
    expect(card.perPortion.fatG).toBe(6.29);
    expect(card.perPortion.proteinG).toBe(5.03);
    expect(card.perPortion.carbsG).toBe(0.61);
    expect(card.perPortion.fiberG).toBe(0.08);
    expect(card.perPortion.netCarbsG).toBe(0.53);
    expect(card.gramsPerPortion).toBe(43.88);
    // Half sheet 18 × 13 in (trade size, published-values §8) cut 4 × 4: 18/4 = 4.5 in by 13/4 = 3.25 in.
    expect(card.portionSize).toBe('4.5 × 3.25 in');
    expect(card.portionArea).toBe(14.63); // 234 in² ÷ 16 = 14.625
    // Energy shares with the general factors 9/4/4 and 2 kcal/g fibre (21 CFR 101.9(c)(1)(i)(B)/(C)):
    //   fat 6.286875 × 9 = 56.581875; protein 5.03025 × 4 = 20.121; carbs (0.611625 − 0.0825) × 4 + 0.0825 × 2 = 2.2815
    //   total 78.984375 → fat 71.6 %, protein 25.5 %, carbs 2.9 %
    expect(card.energyShares).toEqual({ fatPct: 71.6, proteinPct: 25.5, carbsPct: 2.9 });
    // Cost from the seed prices and package sizes: grams used ÷ grams in one package × price.
    //   eggs: 600 g of a 12 × 50 g dozen at 399 ¢ → 399 ¢
    //   cream: 1 pint = 473.176473 mL (NIST HB 44) × density → grams; 120 g of it at 449 ¢
    //   spinach: 10 oz = 283.49523125 g (NIST HB 44); 60 g of it at 349 ¢
    const creamPint = new Decimal('473.176473').times(seed('heavy-cream').densityGPerMl!);
    const total = new Decimal(399)
      .plus(new Decimal(120).div(creamPint).times(seed('heavy-cream').priceCents!))
      .plus(new Decimal(60).div('283.49523125').times(seed('spinach').priceCents!));
    expect(card.costPerPortionCents).toBe(total.div(16).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber());
    expect(card.unpricedIngredients).toEqual([]);
    expect(card.allergens).toEqual(['milk', 'egg']);
  });

  it('scale to 40 portions: 3 whole trays, 8 spare, amounts in kitchen units', async () => {
    const res = (await coach.agent.post(`/api/trays/${trayId}/scale`).send({ targetPortions: 40, system: 'us' }).expect(200)).body;
    // 40 ÷ 16 → 3 trays (ceiling), 48 baked, 8 spare.
    expect([res.trays, res.portionsBaked, res.spare, res.factor]).toEqual([3, 48, 8, 3]);
    // Lines typed in grams are shown as weights in the person's system (US here):
    // 36 large eggs; cream 360 g ÷ 28.349523125 g per oz (NIST HB 44) = 12.70 oz → nearest ¼ oz = 12 ¾ oz;
    // spinach 180 g ÷ 28.349523125 = 6.35 oz → nearest ¼ oz = 6 ¼ oz.
    expect(new Decimal(360).div('28.349523125').toNumber()).toBeCloseTo(12.7, 2);
    expect(res.lines.map((l: { display: string }) => l.display)).toEqual(['36 large', '12 ¾ oz', '6 ¼ oz']);
    expect(res.roundingNote).toMatch(/rounded only for display/);
  });

  it('scale to a full sheet: factor 2 by area, same portion size gives 32 portions; metric on request', async () => {
    const res = (await coach.agent.post(`/api/trays/${trayId}/scale`).send({ pan: { code: 'full-sheet' }, system: 'metric' }).expect(200)).body;
    // 26 × 18 = 468 in² ÷ 18 × 13 = 234 in² → 2 (trade sizes, published-values §8).
    expect(res.factor).toBe(2);
    expect(res.portionsAtSameSize).toBe(32);
    expect(res.lines.map((l: { display: string }) => l.display)).toEqual(['24 large', '240 g', '120 g']);
  });

  it('a volume line scales as a volume: 1 cup × 2.25 = 2 ¼ cups (US) or 532 mL (metric)', async () => {
    const cream = await slugId('heavy-cream');
    const tray = await makeTray(coach, { lines: [{ ingredientId: cream, amountText: '1', unit: 'cup' }] }, cream);
    const us = (await coach.agent.post(`/api/trays/${tray.id}/scale`).send({ factor: 2.25, system: 'us' }).expect(200)).body;
    expect(us.lines[0].display).toBe('2 ¼ cups');
    // 2.25 × 236.5882365 mL (US cup, NIST HB 44) = 532.32 mL → whole mL.
    const metric = (await coach.agent.post(`/api/trays/${tray.id}/scale`).send({ factor: 2.25, system: 'metric' }).expect(200)).body;
    expect(metric.lines[0].display).toBe('532 mL');
  });

  it('without a system, the person\'s own unit setting is used', async () => {
    await coach.agent.patch('/api/auth/me').send({ unitSystem: 'metric' }).expect(200);
    const res = (await coach.agent.post(`/api/trays/${trayId}/scale`).send({ factor: 1 }).expect(200)).body;
    expect(res.system).toBe('metric');
    expect(res.lines.map((l: { display: string }) => l.display)).toEqual(['12 large', '120 g', '60 g']);
    await coach.agent.patch('/api/auth/me').send({ unitSystem: 'us' }).expect(200);
  });

  it('scale refuses two answers at once', async () => {
    const res = await coach.agent.post(`/api/trays/${trayId}/scale`).send({ factor: 2, targetPortions: 40 });
    expect(res.status).toBe(400);
    expect(res.body.errors.factor).toBeDefined();
  });
});

describe('photos', () => {
  const png = () => sharp({ create: { width: 800, height: 600, channels: 3, background: '#d98b3a' } }).png().toBuffer();

  it('uploads a PNG, serves it and a WebP thumbnail, and stores metadata in PostgreSQL', async () => {
    const tray = await makeTray(coach, {}, ingredientId);
    const up = await coach.agent.post(`/api/trays/${tray.id}/photo`).attach('photo', await png(), 'slab.png').expect(200);
    expect(up.body).toMatchObject({ width: 800, height: 600, contentType: 'image/png' });
    const [row] = await sql<{ file_path: string; thumb_path: string; content_type: string }>(
      'select file_path, thumb_path, content_type from tray_photo where tray_id = $1',
      [tray.id],
    );
    expect(row.content_type).toBe('image/png');
    await fs.access(path.join(filesDir, row.file_path));
    const photo = await assistant.agent.get(`/api/trays/${tray.id}/photo`).buffer(true).expect(200);
    expect(photo.headers['content-type']).toMatch(/image\/png/);
    const thumb = await coach.agent.get(`/api/trays/${tray.id}/thumbnail`).buffer(true).expect(200);
    expect(thumb.headers['content-type']).toMatch(/image\/webp/);
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(480);
    // Asked again each time (RFC 9111 §5.2.2.4 no-cache: a stored copy is used only once the server says so), with
    // its ETag a 304 (RFC 9110 §13.1.2 If-None-Match): signed out, the same question is refused.
    for (const served of [photo, thumb]) {
      expect(served.headers['cache-control']).toBe('private, no-cache');
      expect(served.headers.etag).toBeTruthy();
    }
    // Signed in on a shared computer (not kept signed in): no copy kept at all (RFC 9111 §5.2.2.5 no-store).
    const shared = agentFor(app);
    await shared.post('/api/auth/login').send({ email: coach.email, password: PASSWORD, staySignedIn: false }).expect(200);
    expect((await shared.get(`/api/trays/${tray.id}/thumbnail`).buffer(true).expect(200)).headers['cache-control']).toBe('no-store');
    const which = { photo: photo.headers.etag as string, thumbnail: thumb.headers.etag as string };
    for (const [name, etag] of Object.entries(which)) {
      const again = await coach.agent.get(`/api/trays/${tray.id}/${name}`).set('if-none-match', etag).expect(304);
      expect(again.body).toEqual({});
      await request(app).get(`/api/trays/${tray.id}/${name}`).set('if-none-match', etag).expect(401);
    }
    // A file gone from the disk (a restore without the files folder) is a 404 naming the photo, not a server error.
    await fs.rm(path.join(filesDir, row.thumb_path));
    const gone = await coach.agent.get(`/api/trays/${tray.id}/thumbnail`).expect(404);
    expect(gone.body).toMatchObject({ status: 404, detail: 'Photo not found' });
    // Deleting the tray removes the files too.
    await coach.agent.delete(`/api/trays/${tray.id}`).expect(204);
    await expect(fs.access(path.join(filesDir, row.file_path))).rejects.toThrow();
  });

  it('refuses a file that only claims to be an image (415) and one over 5 MB (413)', async () => {
    const tray = await makeTray(coach, {}, ingredientId);
    const fake = await coach.agent.post(`/api/trays/${tray.id}/photo`).attach('photo', Buffer.from('not really a png'), {
      filename: 'slab.png',
      contentType: 'image/png',
    });
    expect(fake.status).toBe(415);
    expect(fake.body.errors.photo).toBeDefined();
    const big = Buffer.concat([await png(), Buffer.alloc(5 * 1024 * 1024)]);
    const tooBig = await coach.agent.post(`/api/trays/${tray.id}/photo`).attach('photo', big, 'big.png');
    expect(tooBig.status).toBe(413);
    expect((await sql('select id from tray_photo where tray_id = $1', [tray.id])).length).toBe(0);
  });
});

describe('demo trays', () => {
  it('the demo step makes 6–8 demo trays whose derived allergens fit their names', async () => {
    const demoCoach = await coachWorkspace(app);
    await seedDemo(demoCoach);
    const list = (await demoCoach.agent.get('/api/trays').expect(200)).body as Array<{
      name: string;
      isDemo: boolean;
      allergens: string[];
      perPortion: { netCarbsG: number } | null;
    }>;
    expect(list.length).toBe(DEMO_TRAYS.length);
    expect(list.length).toBeGreaterThanOrEqual(6);
    expect(list.length).toBeLessThanOrEqual(8);
    expect(list.every((t) => t.isDemo && t.perPortion !== null)).toBe(true);
    const byName = new Map(list.map((t) => [t.name, t]));
    expect(byName.get('Egg-free coconut-flax slab')!.allergens).not.toContain('egg');
    expect(byName.get('Dairy-free chive egg slab')!.allergens).not.toContain('milk');
    expect(byName.get('Oven bacon')!.allergens).toEqual([]);
    expect(byName.get('Cream-cheese almond batter slab')!.allergens).toEqual(['milk', 'egg', 'tree-nuts']);
  });
});
