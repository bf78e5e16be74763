import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import ICAL from 'ical.js';
import { pdfText } from '../support/pdf-text.js';
import { shoppingWeek } from '../support/shopping-week.js';
import type { Orm } from '@server/db/orm.js';
import { startMailCatcher, type MailCatcher } from '@server/modules/mail/mail-catcher.js';
import { startMail, type MailRuntime } from '@server/modules/mail/mail-runtime.js';
import { agentFor, testApp } from '../support/test-app.js';
import { coachWorkspace, makeAssembly, makeClient, makeIngredient, makeTray, makeWeek, member, uniq, type Member } from '../support/factories.js';
import { TEST_DATABASE_URL } from '../support/db.js';
import { freePort, sql, until } from '../support/mail-support.js';

/**
 * Sending a published prep week: one outbox row per client with an e-mail (one transaction), the send worker
 * delivers to the in-process catcher, and the caught message carries the week-plan PDF built from the published
 * snapshot. Amounts are invented test values.
 */
let app: Express;
let orm: Orm;
let catcher: MailCatcher | null = null;
let worker: MailRuntime | null = null;

beforeAll(async () => {
  const t = await testApp();
  app = t.app;
  orm = t.orm;
  const port = await freePort();
  catcher = await startMailCatcher({ port, databaseUrl: TEST_DATABASE_URL });
  worker = await startMail({
    databaseUrl: TEST_DATABASE_URL,
    publicUrl: 'http://127.0.0.1:5173',
    orm,
    smtp: { host: '127.0.0.1', port, secure: false, from: 'Trayline <no-reply@trayline.test>' },
    retry: { retryLimit: 3, retryDelay: 1, retryBackoff: false, expireInSeconds: 10 },
    pollingIntervalSeconds: 0.5,
    maintenanceIntervalSeconds: 1,
    applicationName: 'trayline-week-mail-test',
  });
});

afterAll(async () => {
  await worker?.stop();
  await catcher?.stop();
});

const DAYS = ['2026-01-05', '2026-01-06'];

/**
 * A published week: Ana (e-mail) eats plate A on two days, Ben (e-mail) plate B on one day, Cy (no e-mail) plate A
 * on one day; Dee (e-mail) has no plates. Ingredient: 350 kcal, 30 g fat, 20 g protein, 2 g carbs per 100 g.
 */
async function publishedWeek(coach: Member, opts: { publish?: boolean; anaSecondDayFrozen?: boolean } = {}) {
  const ing = await makeIngredient(coach, { allergens: [] });
  // 16 oz of the ingredient per tray, cut 4 × 4 = 16 portions: 1 oz per portion.
  const tray = await makeTray(coach, { lines: [{ ingredientId: ing.id, amountText: '16', unit: 'oz', note: '' }], yieldFactor: 1 }, ing.id);
  const plateA = await makeAssembly(coach, tray.id, { name: uniq('Herb frittata square') });
  const plateB = await makeAssembly(coach, tray.id, { name: uniq('Double frittata'), trays: [{ trayId: tray.id, portions: 2 }] });
  const ana = await makeClient(coach, { name: uniq('Ana'), email: `${uniq('ana')}@example.test` });
  const ben = await makeClient(coach, { name: uniq('Ben'), email: `${uniq('ben')}@example.test` });
  const cy = await makeClient(coach, { name: uniq('Cy'), email: null });
  const dee = await makeClient(coach, { name: uniq('Dee'), email: `${uniq('dee')}@example.test` });
  const board = await makeWeek(coach);
  const cell = (clientId: number, date: string, assemblyId: number) => ({ clientId, date, slot: 'breakfast', assemblyId });
  const filled = await coach.agent
    .put(`/api/weeks/${board.week.id}/cells`)
    .send({
      version: board.week.version,
      cells: [
        cell(ana.id, DAYS[0], plateA.id),
        { ...cell(ana.id, DAYS[1], plateA.id), ...(opts.anaSecondDayFrozen ? { prepDate: '2026-01-04', storage: 'frozen' } : {}) },
        cell(ben.id, DAYS[0], plateB.id),
        cell(cy.id, DAYS[0], plateA.id),
      ],
    })
    .expect(200);
  const trays = await coach.agent
    .put(`/api/weeks/${board.week.id}/trays`)
    .send({ version: filled.body.week.version, trays: [{ trayId: tray.id, prepDate: '2026-01-04', trayCount: 1 }] })
    .expect(200);
  if (opts.publish !== false) {
    await coach.agent.post(`/api/weeks/${board.week.id}/publish`).send({ version: trays.body.week.version }).expect(200);
  }
  return { weekId: board.week.id, plateA, plateB, ana, ben, cy, dee };
}

type Row = { id: number; to: string; client_id: number; status: string; batch_id: string; idempotency_key: string; note: string | null; attachments: { pdf: string; payload: Record<string, unknown> }[] };
const rowsOfBatch = (batchId: string) => sql<Row>('select * from outbox where batch_id = $1 order by id', [batchId]);

const binary = (res: { on: (e: string, f: (c?: Buffer) => void) => void }, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c) => chunks.push(c!));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('sending a week', () => {
  it('a client with a frozen plate also gets the thaw reminders as a calendar file, and the e-mail says so', async () => {
    const coach = await coachWorkspace(app);
    const w = await publishedWeek(coach, { anaSecondDayFrozen: true });
    // Ana has an account and reads °C: the calendar file is written for her.
    const anaAccount = await member(app, coach, 'client', { clientId: w.ana.id });
    await anaAccount.agent.patch('/api/auth/me').send({ tempUnit: 'C' }).expect(200);
    const res = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ clientIds: [w.ana.id, w.ben.id] }).expect(202);
    const rows = await rowsOfBatch(res.body.batchId);
    const payload = (clientId: number) => ({ weekId: w.weekId, clientId, publicationVersion: 1, note: null });
    const ana = rows.find((r) => r.client_id === w.ana.id)!;
    const ben = rows.find((r) => r.client_id === w.ben.id)!;
    expect(ana.attachments).toEqual([
      { pdf: 'week-plan', payload: payload(w.ana.id) },
      { pdf: 'week-thaw-reminders', payload: payload(w.ana.id) },
    ]);
    expect(ben.attachments).toEqual([{ pdf: 'week-plan', payload: payload(w.ben.id) }]);

    await until(async () => (await sql<Row>('select status from outbox where id = $1', [ana.id]))[0].status === 'sent', 20_000, 'sent');
    const [caught] = await sql<{ id: number; text: string }>('select id, text from caught_mail where message_id = $1', [`<${ana.idempotency_key}@trayline>`]);
    expect(caught.text).toContain('the calendar file attached reminds you on the evening before');
    const atts = await sql<{ filename: string; content_type: string; content: Buffer }>(
      'select filename, content_type, content from caught_mail_attachment where mail_id = $1 order by position',
      [caught.id],
    );
    expect(atts.map((a) => a.content_type.split(';')[0])).toEqual(['application/pdf', 'text/calendar']);
    expect(atts[1].filename).toBe('thaw-reminders-2026-01-05.ics');
    // Read back with ical.js (Mozilla's RFC 5545 parser): Tuesday's frozen plate thaws on Monday evening at 19:00.
    const events = new ICAL.Component(ICAL.parse(atts[1].content.toString('utf8'))).getAllSubcomponents('vevent').map((v) => new ICAL.Event(v));
    expect(events.map((e) => [e.startDate.toString(), e.summary])).toEqual([['2026-01-05T19:00:00', `Move tomorrow's ${w.plateA.name} to the fridge`]]);
    // USDA FSIS: thaw in a refrigerator at 40 °F (4 °C) or below, °C first for her.
    expect(events[0].description).toContain('Thaw it in the refrigerator at 4 °C (40 °F) or below');
  });

  it('the e-mail says how many plates hold an allergen on the client\'s list, and that the PDF says which', async () => {
    const coach = await coachWorkspace(app);
    const milky = await makeAssembly(coach, (await makeTray(coach, {}, (await makeIngredient(coach)).id)).id, { name: uniq('Cheese square') }); // milk
    const eve = await makeClient(coach, { name: uniq('Eve'), email: `${uniq('eve')}@example.test`, allergens: ['milk'] });
    const fay = await makeClient(coach, { name: uniq('Fay'), email: `${uniq('fay')}@example.test` });
    const board = await makeWeek(coach);
    const allowed = { allergenOverrides: [{ allergen: 'milk', reason: 'Hard cheese agreed with her' }] };
    const cell = (clientId: number, date: string, extra = {}) => ({ clientId, date, slot: 'breakfast', assemblyId: milky.id, ...extra });
    const filled = await coach.agent
      .put(`/api/weeks/${board.week.id}/cells`)
      .send({ version: board.week.version, cells: [cell(eve.id, DAYS[0], allowed), cell(eve.id, DAYS[1], allowed), cell(fay.id, DAYS[0])] })
      .expect(200);
    await coach.agent.post(`/api/weeks/${board.week.id}/publish`).send({ version: filled.body.week.version }).expect(200);
    const res = await coach.agent.post(`/api/weeks/${board.week.id}/send`).send({}).expect(202);
    const texts = new Map((await rowsOfBatch(res.body.batchId)).map((r) => [r.client_id, (r as Row & { text: string }).text]));
    expect(texts.get(eve.id)).toContain('2 plates hold an allergen on your list: the PDF says which, and what to do, beside each.');
    // Milk is not on Fay's list: nothing said.
    expect(texts.get(fay.id)).not.toContain('allergen');

    // Sent with the coach's today: on the first day all are ahead (as above); mid-week, how many are still ahead;
    // after the last, none (each press of Send is its own request).
    const sentOn = async (today: string) => {
      const r = await coach.agent.post(`/api/weeks/${board.week.id}/send`).send({ clientIds: [eve.id], today, requestId: randomUUID() }).expect(202);
      return (await rowsOfBatch(r.body.batchId))[0] as Row & { text: string };
    };
    expect((await sentOn(DAYS[0])).text).toContain('2 plates hold an allergen on your list: the PDF says which, and what to do, beside each.');
    // 2026-01-06 is a Tuesday (the workspace writes dates month first).
    expect((await sentOn(DAYS[1])).text).toContain(
      '2 plates this week hold an allergen on your list, 1 of them from Tuesday, Jan 6 on: the PDF says which, and what to do, beside each.',
    );
    expect((await sentOn('2026-01-09')).text).toContain('2 plates earlier this week held an allergen on your list, none from Friday, Jan 9 on: the PDF says which.');
    const bad = await coach.agent.post(`/api/weeks/${board.week.id}/send`).send({ clientIds: [eve.id], today: '2026-13-01' }).expect(400);
    expect(JSON.stringify(bad.body.errors)).toContain('today');
  });

  it('to all: one e-mail per client with an e-mail on the published board; the PDF holds that client’s plates and macros', async () => {
    const coach = await coachWorkspace(app);
    const w = await publishedWeek(coach);
    const res = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ note: 'Drink water, sleep well.' }).expect(202);
    expect(res.body).toMatchObject({ queued: 2, publicationVersion: 1, repeated: false });
    expect(res.body.batchId).toMatch(/^[0-9a-f-]{36}$/);
    // Cy is on the board without an e-mail; Dee has an e-mail but no plates (not a candidate for "all").
    expect(res.body.skipped).toEqual([{ clientId: w.cy.id, name: w.cy.name, reason: 'no-email' }]);

    const rows = await rowsOfBatch(res.body.batchId);
    expect(rows.map((r) => [r.client_id, r.to]).sort()).toEqual([[w.ana.id, w.ana.email], [w.ben.id, w.ben.email]].sort());
    for (const r of rows) {
      expect(r.note).toBe('Drink water, sleep well.');
      expect(r.attachments).toEqual([{ pdf: 'week-plan', payload: { weekId: w.weekId, clientId: r.client_id, publicationVersion: 1, note: 'Drink water, sleep well.' } }]);
    }

    // The published plates as the clients read them: the PDF must show the same plates and numbers.
    const anaMember = await member(app, coach, 'client', { clientId: w.ana.id });
    const mine = await anaMember.agent.get('/api/weeks/mine').expect(200);
    const anaPlate = mine.body.days[0].plates[0];
    // By hand: 1 oz = 28.349523125 g (NIST Handbook 44, exact), × 350 kcal / 100 g = 99.2 kcal; fat 30 g / 100 g → 8.5 g.
    expect(anaPlate.macros.kcal).toBeCloseTo(99.2, 0);
    expect(Number(anaPlate.macros.fatG)).toBeCloseTo(8.5, 1);

    const anaRow = rows.find((r) => r.client_id === w.ana.id)!;
    await until(async () => (await sql<Row>('select status from outbox where id = $1', [anaRow.id]))[0].status === 'sent', 20_000, 'sent');
    const [caught] = await sql<{ id: number; to: string; subject: string; text: string }>(
      'select id, "to", subject, text from caught_mail where message_id = $1',
      [`<${anaRow.idempotency_key}@trayline>`],
    );
    expect(caught.to).toBe(w.ana.email);
    expect(caught.subject).toContain('your plates for the week of');
    expect(caught.text).toContain('Drink water, sleep well.');
    const [att] = await sql<{ filename: string; content_type: string; content: Buffer }>(
      'select filename, content_type, content from caught_mail_attachment where mail_id = $1',
      [caught.id],
    );
    expect(att.content_type).toBe('application/pdf');
    expect(att.filename).toMatch(/^week-2026-01-05-.+\.pdf$/);
    const text = await pdfText(att.content);
    expect(text).toContain(w.plateA.name);
    expect(text).not.toContain(w.plateB.name);
    expect(text).toContain(w.ana.name);
    expect(text).toContain(`${coach.email.split('@')[0]} kitchen`); // the workspace name heads the page
    expect(text).toContain('Drink water, sleep well.');
    // The PDF prints kcal with 0 and grams with 1 decimal place.
    expect(text).toContain(String(Math.round(anaPlate.macros.kcal)));
    expect(text).toContain(Number(anaPlate.macros.fatG).toFixed(1));
    expect(text).toContain(Number(anaPlate.macros.proteinG).toFixed(1));

    // Ben's e-mail carries Ben's plate (two portions of the tray: twice the numbers).
    const benRow = rows.find((r) => r.client_id === w.ben.id)!;
    await until(async () => (await sql<Row>('select status from outbox where id = $1', [benRow.id]))[0].status === 'sent', 20_000, 'sent');
    const [benAtt] = await sql<{ content: Buffer }>(
      'select a.content from caught_mail_attachment a join caught_mail m on m.id = a.mail_id where m.message_id = $1',
      [`<${benRow.idempotency_key}@trayline>`],
    );
    const benText = await pdfText(benAtt.content);
    expect(benText).toContain(w.plateB.name);
    expect(benText).not.toContain(w.plateA.name);
    expect(benText).toContain((Number(anaPlate.macros.fatG) * 2).toFixed(1));

    // The outbox shows the batch's progress; the delivery log of Ana lists the e-mail.
    const outbox = await coach.agent.get(`/api/outbox?batchId=${res.body.batchId}`).expect(200);
    expect(outbox.body.total).toBe(2);
    const log = await coach.agent.get(`/api/clients/${w.ana.id}/deliveries`).expect(200);
    // Every e-mail of that client (the invitation of Ana's account too), newest first.
    const ids = log.body.items.map((i: { id: number }) => i.id);
    expect(ids).toEqual([...ids].sort((x: number, y: number) => y - x));
    expect(log.body.items.map((i: { kind: string }) => i.kind).sort()).toEqual(['invitation', 'week-plan']);
    const plan = log.body.items.find((i: { kind: string }) => i.kind === 'week-plan');
    expect(plan).toMatchObject({ id: anaRow.id, to: w.ana.email, weekId: w.weekId, status: 'sent', note: 'Drink water, sleep well.', attachments: ['week-plan'] });
    expect(plan.weekName).toBe('Week of Mon, Jan 5'); // an unnamed week: its start day in words (2026-01-05 was a Monday)
  });

  it('to chosen clients: skips those without an e-mail, without plates or not in the workspace', async () => {
    const coach = await coachWorkspace(app);
    const w = await publishedWeek(coach);
    const stranger = await makeClient(await coachWorkspace(app), { email: 'x@example.test' });
    const res = await coach.agent
      .post(`/api/weeks/${w.weekId}/send`)
      .send({ clientIds: [w.ben.id, w.cy.id, w.dee.id, stranger.id] })
      .expect(202);
    expect(res.body.queued).toBe(1);
    expect(res.body.skipped).toEqual([
      { clientId: w.cy.id, name: w.cy.name, reason: 'no-email' },
      { clientId: w.dee.id, name: w.dee.name, reason: 'not-on-board' },
      { clientId: stranger.id, name: null, reason: 'unknown-client' },
    ]);
    const rows = await rowsOfBatch(res.body.batchId);
    expect(rows.map((r) => r.to)).toEqual([w.ben.email]);
    expect(rows[0].note).toBeNull();
  });

  it('a repeated request does not send twice: same requestId → same batch; same send within seconds → same batch', async () => {
    const coach = await coachWorkspace(app);
    const w = await publishedWeek(coach);
    const requestId = randomUUID();
    const first = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ note: 'Hi', requestId }).expect(202);
    const again = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ note: 'Hi', requestId }).expect(202);
    expect(again.body).toMatchObject({ batchId: first.body.batchId, queued: 2, repeated: true });
    // A double click without a requestId: the same week version, note and clients within the window.
    const a = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ note: 'Bye' }).expect(202);
    const b = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ note: 'Bye' }).expect(202);
    expect(a.body.repeated).toBe(false);
    expect(b.body).toMatchObject({ batchId: a.body.batchId, repeated: true });
    // A different note is a new send.
    const c = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ note: 'Another note' }).expect(202);
    expect(c.body.batchId).not.toBe(a.body.batchId);
    const [n] = await sql<{ n: string }>('select count(*) as n from outbox where week_id = $1', [w.weekId]);
    expect(Number(n.n)).toBe(6);
  });

  it('refuses an unpublished week (409), a client (403), another workspace (404) and a note over 1000 characters (400)', async () => {
    // The draft in a workspace of its own: the published week below plans the same days (one board per day).
    const drafter = await coachWorkspace(app);
    const draft = await publishedWeek(drafter, { publish: false });
    const refused = await drafter.agent.post(`/api/weeks/${draft.weekId}/send`).send({}).expect(409);
    expect(refused.body.detail ?? refused.body.title).toMatch(/publish/i);
    const [n] = await sql<{ n: string }>('select count(*) as n from outbox where week_id = $1', [draft.weekId]);
    expect(n.n).toBe('0');

    const coach = await coachWorkspace(app);
    const w = await publishedWeek(coach);
    const client = await member(app, coach, 'client', { clientId: w.ana.id });
    await client.agent.post(`/api/weeks/${w.weekId}/send`).send({}).expect(403);
    const other = await coachWorkspace(app);
    await other.agent.post(`/api/weeks/${w.weekId}/send`).send({}).expect(404);
    await other.agent.get(`/api/clients/${w.ana.id}/deliveries`).expect(404);
    await other.agent.get(`/api/weeks/${w.weekId}/clients/${w.ana.id}/plan.pdf`).expect(404);
    const long = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ note: 'x'.repeat(1001) }).expect(400);
    expect(long.body.errors['body.note'] ?? long.body.errors.note).toBeDefined();
    const ids = await coach.agent.post(`/api/weeks/${w.weekId}/send`).send({ clientIds: ['a'] }).expect(400);
    expect(JSON.stringify(ids.body.errors)).toContain('clientIds');
  });
});

describe('week-plan PDF downloads', () => {
  it('the coach downloads any client’s published plan; a client only their own latest published week', async () => {
    const coach = await coachWorkspace(app);
    const w = await publishedWeek(coach);
    const pdf = await coach.agent.get(`/api/weeks/${w.weekId}/clients/${w.ben.id}/plan.pdf`).buffer(true).parse(binary).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(pdf.headers['content-disposition']).toContain('attachment');
    const text = await pdfText(pdf.body as Buffer);
    expect(text).toContain(w.plateB.name);
    expect(text).toContain(w.ben.name);
    // The board plans breakfast only: the targets are breakfast's share of the day (30 % by default), and say so.
    expect(text).toContain('Targets for breakfast, 30 % of your day');
    expect(text).not.toContain('Daily targets');
    // Dee has no plates in the published week.
    await coach.agent.get(`/api/weeks/${w.weekId}/clients/${w.dee.id}/plan.pdf`).expect(404);

    const ana = await member(app, coach, 'client', { clientId: w.ana.id });
    const own = await ana.agent.get('/api/weeks/mine/plan.pdf?today=2026-01-05').buffer(true).parse(binary).expect(200);
    const bad = await ana.agent.get('/api/weeks/mine/plan.pdf?today=tomorrow').expect(400);
    expect(JSON.stringify(bad.body.errors)).toContain('today');
    const ownText = await pdfText(own.body as Buffer);
    expect(ownText).toContain(w.ana.name);
    expect(ownText).toContain(w.plateA.name);
    expect(ownText).not.toContain(w.ben.name);
    expect(ownText).not.toContain(w.plateB.name);
    // A client never reaches the coach's route, and a client without plates gets 404.
    await ana.agent.get(`/api/weeks/${w.weekId}/clients/${w.ana.id}/plan.pdf`).expect(403);
    const dee = await member(app, coach, 'client', { clientId: w.dee.id });
    await dee.agent.get('/api/weeks/mine/plan.pdf').expect(404);
    await agentFor(app).get('/api/weeks/mine/plan.pdf').expect(401);
  });

  it("writes add-ons typed in the other measure system in the client's too, once they choose one", async () => {
    const coach = await coachWorkspace(app);
    // A plate with 1 oz of cheese as an add-on, on the client's board (tests/support/shopping-week.ts).
    const w = await shoppingWeek(coach);
    const board = await coach.agent.get(`/api/weeks/${w.weekId}`).expect(200);
    await coach.agent.post(`/api/weeks/${w.weekId}/publish`).send({ version: board.body.week.version }).expect(200);
    const coachCopy = async () => pdfText((await coach.agent.get(`/api/weeks/${w.weekId}/clients/${w.client.id}/plan.pdf`).buffer(true).parse(binary).expect(200)).body as Buffer);
    // No account yet: as the coach typed it.
    expect(await coachCopy()).toMatch(/Add: 1 oz Test cheese/);
    const client = await member(app, coach, 'client', { clientId: w.client.id });
    await client.agent.patch('/api/auth/me').send({ unitSystem: 'metric' }).expect(200);
    // 1 oz = 28.349523125 g (NIST Handbook 44 App. C), shown to the gram: "28 g", beside what the coach typed.
    const own = await pdfText((await client.agent.get('/api/weeks/mine/plan.pdf?today=2026-01-05').buffer(true).parse(binary).expect(200)).body as Buffer);
    expect(own).toMatch(/Add: 1 oz \(28 g\) Test cheese/);
    expect(await coachCopy()).toMatch(/Add: 1 oz \(28 g\) Test cheese/); // the coach's copy is the client's plan
    // Back to US customary: nothing to convert.
    await client.agent.patch('/api/auth/me').send({ unitSystem: 'us' }).expect(200);
    expect(await coachCopy()).toMatch(/Add: 1 oz Test cheese/);

    // Temperatures: °F first until the client reads °C first; then the plan writes °C first, as FDA Food Code
    // §3-403.11 writes the reheating limit, "74°C (165°F)", and the safety notes the same way.
    const flat = async () => (await coachCopy()).replace(/\s+/g, ' ');
    expect(await flat()).toContain('Heat until every part reaches 165 °F (74 °C).');
    await client.agent.patch('/api/auth/me').send({ tempUnit: 'C' }).expect(200);
    const inC = await flat();
    expect(inC).toContain('Heat until every part reaches 74 °C (165 °F).');
    expect(inC).toContain('Keep the refrigerator at 4 °C (40 °F) or below and the freezer at −18 °C (0 °F) or below.');
    expect(inC).not.toContain('165 °F (74 °C)');
  });

  it('an unpublished week has no plan PDF (409)', async () => {
    const coach = await coachWorkspace(app);
    const w = await publishedWeek(coach, { publish: false });
    await coach.agent.get(`/api/weeks/${w.weekId}/clients/${w.ana.id}/plan.pdf`).expect(409);
  });
});
