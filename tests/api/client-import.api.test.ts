import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, clientInput, member, uniq, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';
import Papa from 'papaparse';
import { clientImportTemplate } from '@shared/schemas/clients.schema.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

const HEADER =
  'name,email,portions_per_plate,sex,age,height,weight,activity,goal,net_carb_cap_g,protein_g_per_kg,protein_g_per_lb,target_kcal,target_net_carbs_g,target_protein_g,target_fat_g,allergens,dislikes,health_notes';

const send = (who: Member, csv: string, fields: Record<string, string> = {}) => {
  let req = who.agent.post('/api/clients/import');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', Buffer.from(csv), { filename: 'clients.csv', contentType: 'text/csv' });
};

const clientRows = (workspaceId: number) =>
  sql<{ name: string; email: string | null; household_multiplier: string; height_cm: string; weight_kg: string; protein_g_per_kg: string; target_mode: string; allergens: string[]; dislikes: string[]; health_notes: string }>(
    `select name, email, household_multiplier, height_cm, weight_kg, protein_g_per_kg, target_mode, allergens, dislikes, health_notes
       from client where workspace_id = $1 order by name`,
    [workspaceId],
  );

describe('POST /api/clients/import (CSV of client profiles, all or nothing)', () => {
  it('creates every profile in one go, reading measures as people write them, and sends no invitation', async () => {
    const coach = await coachWorkspace(app);
    const csv = [
      HEADER,
      // The Mifflin–St Jeor worked example of clients.api.test.ts (Am J Clin Nutr 1990;51:241–247): a woman of 40,
      // 165 cm, 65 kg, lightly active: 1815 kcal a day; the protein default 1.5 g/kg gives 98 g.
      'Ana Demo,ana@example.test,1,female,40,165 cm,65 kg,Lightly active,maintain,,,,,,,,"Tree nuts; milk","cilantro; olives",Knee surgery in March',
      // US measures: 5 ft 5 in = 65 in × 2.54 = 165.1 cm; 143 lb × 0.45359237 = 64.86 kg (NIST HB 44 App. C);
      // 0.7 g protein per lb = 1.54 g per kg.
      `Ben Demo,,2,M,52,5'5",143 lb,very active,Lose weight,25,,0.7,,,,,,,`,
      // A number alone in the coach's units (US by default: inches and pounds); typed targets, all four.
      'Cleo Demo,cleo@example.test,"1,5",F,33,64,150,moderate,gain,,1.6,,2100,30,120,170,sesame,,',
    ].join('\r\n');
    const res = await send(coach, csv).expect(201);
    expect(res.body).toMatchObject({ created: 3, names: ['Ana Demo', 'Ben Demo', 'Cleo Demo'], withEmail: 2 });
    expect(res.body.ids).toHaveLength(3);

    const rows = await clientRows(coach.workspaceId);
    expect(rows).toEqual([
      {
        name: 'Ana Demo', email: 'ana@example.test', household_multiplier: '1.00', height_cm: '165.00', weight_kg: '65.00',
        protein_g_per_kg: '1.50', target_mode: 'computed', allergens: ['tree-nuts', 'milk'], dislikes: ['cilantro', 'olives'], health_notes: 'Knee surgery in March',
      },
      {
        name: 'Ben Demo', email: null, household_multiplier: '2.00', height_cm: '165.10', weight_kg: '64.86',
        protein_g_per_kg: '1.54', target_mode: 'computed', allergens: [], dislikes: [], health_notes: '',
      },
      {
        // 64 in = 162.56 cm; 150 lb = 68.04 kg; "1,5" portions read with a decimal comma.
        name: 'Cleo Demo', email: 'cleo@example.test', household_multiplier: '1.50', height_cm: '162.56', weight_kg: '68.04',
        protein_g_per_kg: '1.60', target_mode: 'manual', allergens: ['sesame'], dislikes: [], health_notes: '',
      },
    ]);
    // The imported profile's targets are what the form would compute for the same person.
    const list = await coach.agent.get('/api/clients').expect(200);
    const ana = list.body.find((c: { name: string }) => c.name === 'Ana Demo');
    expect(ana.targets).toMatchObject({ mode: 'computed', reeKcal: 1320, tdeeKcal: 1815, targetKcal: 1815, proteinG: 98 });
    const formMade = await coach.agent
      .post('/api/clients')
      .send(clientInput({ name: 'Ana by hand', sex: 'female', weightKg: '65', heightCm: '165', ageYears: 40, activity: 'light', goal: 'maintain' }))
      .expect(201);
    expect(ana.targets.targetKcal).toBe(formMade.body.targets.targetKcal);
    const cleo = list.body.find((c: { name: string }) => c.name === 'Cleo Demo');
    expect(cleo.targets).toMatchObject({ mode: 'manual', targetKcal: 2100, netCarbCapG: 30, proteinG: 120, fatG: 170 });
    expect(cleo.invitation).toBeNull();
    // No invitation made, nothing queued to send.
    expect(await sql('select id from invitation where workspace_id = $1', [coach.workspaceId])).toEqual([]);
    expect(await sql('select id from outbox where workspace_id = $1', [coach.workspaceId])).toEqual([]);
  });

  it.each(['us', 'metric'] as const)('imports the %s template a coach downloads as it is', async (units) => {
    const coach = await coachWorkspace(app);
    const [fields, data] = clientImportTemplate(units);
    await send(coach, Papa.unparse({ fields, data }), { units }).expect(201);
    const rows = await clientRows(coach.workspaceId);
    expect(rows.map((r) => [r.name, r.target_mode])).toEqual([
      ['Example client (delete this row)', 'computed'],
      ['Example with typed targets (delete this row)', 'manual'],
    ]);
    // 5 ft 6 in = 167.64 cm, 163 lb = 73.94 kg, 0.7 g/lb = 1.54 g/kg (NIST HB 44 App. C); metric as written.
    expect(rows[0]).toMatchObject(
      units === 'us'
        ? { height_cm: '167.64', weight_kg: '73.94', protein_g_per_kg: '1.54', allergens: ['tree-nuts', 'milk'] }
        : { height_cm: '168.00', weight_kg: '74.00', protein_g_per_kg: '1.50', allergens: ['tree-nuts', 'milk'] },
    );
  });

  it('reads a number alone in centimetres and kilograms for a metric import', async () => {
    const coach = await coachWorkspace(app);
    const csv = ['name;sex;age;height;weight;activity;goal', 'Dana Demo;female;45;170;72,5;sedentary;lose'].join('\n');
    await send(coach, csv, { units: 'metric' }).expect(201);
    const [row] = await clientRows(coach.workspaceId);
    expect(row).toMatchObject({ height_cm: '170.00', weight_kg: '72.50', household_multiplier: '1.00', target_mode: 'computed' });
  });

  it('writes nothing when any row fails, and answers 400 with line, column and reason for each problem', async () => {
    const coach = await coachWorkspace(app);
    await coach.agent.post('/api/clients').send(clientInput({ name: 'Eve Demo' })).expect(201);
    const csv = [
      HEADER,
      'Good Demo,,1,female,40,165 cm,65 kg,light,maintain,,,,,,,,,,',
      'Bad Demo,not-an-email,1,other,forty,5.7,heavy,couch,shrink,,,,,,,,celery,,',
      'Half targets,,1,male,40,180 cm,80 kg,active,maintain,,,,2000,,150,,,,',
      'Both proteins,,1,male,40,180 cm,80 kg,active,maintain,,1.5,0.7,,,,,,,',
      'eve demo,,1,female,40,165 cm,65 kg,light,maintain,,,,,,,,,,',
      'Good Demo,,1,female,41,166 cm,66 kg,light,maintain,,,,,,,,,,',
      'Young Demo,,1,female,9,120 cm,30 kg,light,maintain,,,,,,,,,,',
      'Half year Demo,,1,female,40.5,165 cm,65 kg,light,maintain,,,,,,,,,,',
    ].join('\n');
    const res = await send(coach, csv).expect(400);
    expect(res.body.code).toBe('import_rejected');
    const report = res.body.report as { line: number; column: string; reason: string; code?: string }[];
    expect(report).toEqual(
      expect.arrayContaining([
        { line: 3, column: 'email', reason: expect.any(String) },
        { line: 3, column: 'sex', reason: expect.stringMatching(/write female or male/) },
        { line: 3, column: 'age', reason: expect.stringMatching(/Age: enter a number/) },
        { line: 3, column: 'height', reason: expect.stringMatching(/would be 5.7 inches: write 5 ft 7 in/) },
        { line: 3, column: 'weight', reason: expect.stringMatching(/write 74 kg or 163 lb/) },
        { line: 3, column: 'activity', reason: expect.stringMatching(/"couch": write one of sedentary/) },
        { line: 3, column: 'goal', reason: expect.stringMatching(/"shrink": write one of lose, maintain, gain/) },
        { line: 3, column: 'allergens', reason: expect.stringMatching(/"celery" is not one of the nine major allergens.*dislikes/) },
        { line: 4, column: 'target_net_carbs_g', reason: expect.stringMatching(/all four columns/) },
        { line: 4, column: 'target_fat_g', reason: expect.stringMatching(/all four columns/) },
        { line: 5, column: 'protein_g_per_lb', reason: 'Give protein per kg or per lb, not both' },
        { line: 6, column: 'name', reason: expect.stringMatching(/"eve demo" is already one of your clients/), code: 'name_taken' },
        { line: 7, column: 'name', reason: 'Same name as line 2' },
        { line: 8, column: 'age', reason: 'Age must be 14 or more' },
        { line: 9, column: 'age', reason: 'Age: enter whole years' },
      ]),
    );
    // Each cell is reported once: an unreadable cell is not reported again as missing.
    expect(report.filter((p) => p.line === 3 && p.column === 'sex')).toHaveLength(1);
    expect(report.filter((p) => p.line === 9)).toHaveLength(1);
    expect(report.some((p) => p.line === 2)).toBe(false);
    expect((await clientRows(coach.workspaceId)).map((r) => r.name)).toEqual(['Eve Demo']);
  });

  it('refuses the same file a second time (an import adds clients, it does not double them), archived ones too', async () => {
    const coach = await coachWorkspace(app);
    const csv = [HEADER, 'Finn Demo,,1,male,30,180 cm,80 kg,moderate,maintain,,,,,,,,,,'].join('\n');
    const first = await send(coach, csv).expect(201);
    await coach.agent.patch(`/api/clients/${first.body.ids[0]}`).send({ version: 1, archived: true }).expect(200);
    const again = await send(coach, csv).expect(400);
    expect(again.body.report).toEqual([
      { line: 2, column: 'name', reason: expect.stringMatching(/already one of your clients \(archived\)/), code: 'name_taken' },
    ]);
    expect(await clientRows(coach.workspaceId)).toHaveLength(1);
  });

  it('keeps to the importing workspace: another workspace’s clients do not clash and do not see the new ones', async () => {
    const coachA = await coachWorkspace(app);
    const coachB = await coachWorkspace(app);
    const name = uniq('Gus Demo');
    const csv = [HEADER, `${name},,1,male,30,180 cm,80 kg,moderate,maintain,,,,,,,,,,`].join('\n');
    await send(coachA, csv).expect(201);
    await send(coachB, csv).expect(201);
    const listB = await coachB.agent.get('/api/clients').expect(200);
    expect(listB.body).toHaveLength(1);
    expect((await clientRows(coachA.workspaceId)).map((r) => r.name)).toEqual([name]);
  });

  it('exports what the import reads back: another workspace importing the file gets the same profiles', async () => {
    const coachA = await coachWorkspace(app);
    const coachB = await coachWorkspace(app);
    const csv = [
      HEADER,
      `Kai Demo,kai@example.test,2,male,61,5'9",201 lb,sedentary,lose,25,,0.6,,,,,"peanuts; soy","liver, sardines","Type 2 diabetes: agree carbs with the GP.
Second line, with a comma"`,
      `=Leo Demo,,1,female,35,171 cm,58.4 kg,active,gain,30,1.8,,2400,30,105,185,,,`,
      `Mia Demo,,1,female,50,160 cm,70 kg,light,maintain,,,,,,,,,,`,
    ].join('\n');
    const first = await send(coachA, csv).expect(201);
    // An archived client is not in the copy.
    const mia = first.body.ids[first.body.names.indexOf('Mia Demo')];
    await coachA.agent.patch(`/api/clients/${mia}`).send({ version: 1, archived: true }).expect(200);

    const exported = await coachA.agent.get('/api/clients.csv').expect(200);
    expect(exported.headers['content-type']).toMatch(/^text\/csv/);
    expect(exported.headers['content-disposition']).toMatch(/^attachment; filename="?clients.csv"?$/);
    const parsed = Papa.parse<Record<string, string>>(exported.text, { header: true, skipEmptyLines: true });
    expect(parsed.data.map((r) => r.name)).toEqual(["'=Leo Demo", 'Kai Demo']); // a formula-like cell is escaped (OWASP)
    // 5 ft 9 in = 175.26 cm, 201 lb = 91.17 kg (NIST HB 44 App. C), written with their units.
    expect(parsed.data[1]).toMatchObject({ height: '175.26 cm', weight: '91.17 kg', protein_g_per_kg: '1.32', allergens: 'peanuts; soy', target_kcal: '' });
    expect(parsed.data[0]).toMatchObject({ target_kcal: '2400', target_fat_g: '185' });

    await send(coachB, exported.text, { units: 'us' }).expect(201);
    const kept = (await clientRows(coachA.workspaceId)).filter((r) => r.name !== 'Mia Demo');
    expect(await clientRows(coachB.workspaceId)).toEqual(kept);
    const listB = await coachB.agent.get('/api/clients').expect(200);
    expect(listB.body.find((c: { name: string }) => c.name === '=Leo Demo').targets).toMatchObject({ mode: 'manual', targetKcal: 2400 });
  });

  it('answers 400 naming the field for a bad option or no file, 415 for a file that is not CSV, 403 to an assistant', async () => {
    const coach = await coachWorkspace(app);
    const bad = await send(coach, HEADER, { units: 'furlongs' }).expect(400);
    expect(bad.body.errors.units).toBeDefined();
    const none = await coach.agent.post('/api/clients/import').field('units', 'us').expect(400);
    expect(none.body.errors.file).toBeDefined();
    await coach.agent
      .post('/api/clients/import')
      .attach('file', Buffer.from([0xff, 0xfe, 0x00, 0x41]), { filename: 'clients.csv', contentType: 'text/csv' })
      .expect(415);
    const header = await send(coach, 'name,shoe_size\nHal,44').expect(400);
    expect(header.body.report).toEqual(
      expect.arrayContaining([
        { line: 1, column: 'shoe_size', reason: expect.stringMatching(/Unknown column/) },
        { line: 1, column: 'sex', reason: 'Required column is missing' },
      ]),
    );
    const assistant = await member(app, coach, 'assistant');
    await send(assistant, [HEADER, 'Ida Demo,,1,female,30,165 cm,60 kg,light,maintain,,,,,,,,,,'].join('\n')).expect(403);
    expect(await clientRows(coach.workspaceId)).toEqual([]);
  });
});
