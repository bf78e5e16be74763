import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { PDFParse } from 'pdf-parse';
import type { Orm } from '@server/db/orm.js';
import { attachmentRenderer } from '@server/modules/mail/attachment-registry.js';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeOven, member } from '../support/factories.js';
import { shoppingWeek } from '../support/shopping-week.js';
import { sql } from '../support/db.js';

let app: Express;
let orm: Orm;
beforeAll(async () => {
  ({ app, orm } = await testApp());
});

const pdfText = async (buffer: Buffer) => {
  const parser = new PDFParse({ data: new Uint8Array(buffer) });
  const text = (await parser.getText()).text.replace(/\s+/g, ' ');
  await parser.destroy();
  return text;
};

type OutboxRow = { to: string; kind: string; subject: string; text: string; week_id: number; attachments: { pdf: string; payload: Record<string, unknown> }[] };

/** A workspace with an oven, the shopping week, and two kitchen assistants: Kit (US measures) and Lee (metric). */
async function kitchenOfTwo() {
  const coach = await coachWorkspace(app);
  const kit = await member(app, coach, 'assistant');
  const lee = await member(app, coach, 'assistant');
  // Lee reads metric amounts; the papers are written for each reader.
  await lee.agent.patch('/api/auth/me').send({ unitSystem: 'metric' }).expect(200);
  await makeOven(coach);
  return { coach, kit, lee, w: await shoppingWeek(coach) };
}

describe("e-mailing a prep day's papers to the kitchen", () => {
  it('queues one e-mail per assistant with the shopping list and the bake run, rendered for that reader; a repeated request queues nothing', async () => {
    const { coach, kit, lee, w } = await kitchenOfTwo();
    const requestId = '0b6c9a52-3f1e-4c1a-9d7e-2a4b5c6d7e8f';
    const sent = await coach.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: '2026-01-04', requestId }).expect(202);
    expect(sent.body).toEqual({
      queued: 2,
      recipients: [
        { name: 'assistant person', email: kit.email, account: true },
        { name: 'assistant person', email: lee.email, account: true },
      ],
      repeated: false,
    });
    const again = await coach.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: '2026-01-04', requestId }).expect(200);
    expect(again.body).toMatchObject({ queued: 0, repeated: true });

    const rows = await sql<OutboxRow>("select \"to\", kind, subject, text, week_id, attachments from outbox where workspace_id = $1 and kind = 'prep-day' order by id", [coach.workspaceId]);
    expect(rows.map((r) => r.to)).toEqual([kit.email, lee.email]);
    expect(rows[0]).toMatchObject({ week_id: w.weekId, subject: expect.stringContaining('prep day Sun, Jan 4, shopping list and bake run') });
    // One prep day: the link opens the week's list.
    expect(rows[0].text).toContain(`Open the shopping list: http://127.0.0.1:8080/weeks/${w.weekId}/shopping\n`);
    expect(rows[0].attachments.map((a) => a.pdf)).toEqual(['prep-day-shopping', 'prep-day-bake-run']);

    // What the mail job attaches when each e-mail leaves.
    const render = (kind: string, payload: Record<string, unknown>) => attachmentRenderer(kind)!(orm.em.fork(), payload);
    const kitList = await pdfText((await render('prep-day-shopping', rows[0].attachments[0].payload)).buffer);
    expect(kitList).toContain('Shopping list, week of Mon, Jan 5');
    // 3 trays × 10 oz + 1 oz × 2 portions × 2 days = 34 oz of cheese: "2 lb 2 oz" for Kit, grams for Lee.
    expect(kitList).toContain('2 lb 2 oz');
    const leeList = await pdfText((await render('prep-day-shopping', rows[1].attachments[0].payload)).buffer);
    expect(leeList).toMatch(/964 g/);
    const bake = await render('prep-day-bake-run', rows[0].attachments[1].payload);
    expect(bake.filename).toBe('bake-run-2026-01-04.pdf');
    expect(await pdfText(bake.buffer)).toContain('Bake run, Week of Mon, Jan 5, prep Sun, Jan 4');

    // Someone who left the workspace gets no papers: the render fails, so the mail is marked failed rather than sent.
    await sql('delete from membership where user_id = $1', [lee.userId]);
    await expect(render('prep-day-shopping', rows[1].attachments[0].payload)).rejects.toThrow(/no longer in this workspace/);
  });

  it('says why it cannot send: a day that is not a prep day (400), nothing to bake (409), no assistant (409); other workspaces get 404', async () => {
    const coach = await coachWorkspace(app);
    const w = await shoppingWeek(coach);
    const notPrep = await coach.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: '2026-01-05' }).expect(400);
    expect(notPrep.body.errors).toEqual({ prepDate: ['Not a prep day of this week (2026-01-04)'] });
    const noOven = await coach.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: '2026-01-04' }).expect(409);
    expect(noOven.body.detail).toContain('No ovens');
    await makeOven(coach);
    const nobody = await coach.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: '2026-01-04' }).expect(409);
    expect(nobody.body.detail).toBe('No kitchen assistant in this workspace yet: invite one from Team, or give an e-mail address to send to');
    expect(await sql("select id from outbox where workspace_id = $1 and kind = 'prep-day'", [coach.workspaceId])).toEqual([]);
    const other = await coachWorkspace(app);
    await other.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: '2026-01-04' }).expect(404);
    const bad = await coach.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: 'Sunday', requestId: 'x' }).expect(400);
    expect(Object.keys(bad.body.errors).sort()).toEqual(['prepDate', 'requestId']);
  });

  it('sends to the assistants chosen and to addresses without an account (papers in the sender\'s measures, no link)', async () => {
    const { coach, kit, lee, w } = await kitchenOfTwo();
    const sent = await coach.agent
      .post(`/api/weeks/${w.weekId}/prep-day-mail`)
      .send({ prepDate: '2026-01-04', assistantIds: [lee.userId], alsoTo: [' Kitchen@Example.test ', 'kitchen@example.test', lee.email] })
      .expect(202);
    // Kit is not chosen; the shared inbox once (addresses compare without case); Lee once.
    expect(sent.body).toEqual({
      queued: 2,
      recipients: [
        { name: 'assistant person', email: lee.email, account: true },
        { name: 'kitchen@example.test', email: 'kitchen@example.test', account: false },
      ],
      repeated: false,
    });
    const rows = await sql<OutboxRow>("select \"to\", kind, subject, text, week_id, attachments from outbox where workspace_id = $1 and kind = 'prep-day' order by id", [coach.workspaceId]);
    expect(rows.map((r) => r.to)).toEqual([lee.email, 'kitchen@example.test']);
    expect(rows.map((r) => r.to)).not.toContain(kit.email);
    expect(rows[1].text).toMatch(/^Hello,\n\nthe shopping list and the bake run for prep day Sun, Jan 4 .* as it is when this e-mail leaves\.\n/);
    expect(rows[1].text).not.toContain('Open the shopping list');
    expect(rows[0].text).toContain('Open the shopping list');
    // The shared inbox's papers are the coach's (US measures); Lee's are metric.
    const render = (kind: string, payload: Record<string, unknown>) => attachmentRenderer(kind)!(orm.em.fork(), payload);
    expect(rows[1].attachments[0].payload).toMatchObject({ userId: coach.userId });
    expect(await pdfText((await render('prep-day-shopping', rows[1].attachments[0].payload)).buffer)).toContain('2 lb 2 oz');
    expect(await pdfText((await render('prep-day-shopping', rows[0].attachments[0].payload)).buffer)).toMatch(/964 g/);
  });

  it('answers 400 naming the field: someone who is not an assistant, a bad address, nobody chosen', async () => {
    const coach = await coachWorkspace(app);
    const kit = await member(app, coach, 'assistant');
    const client = await member(app, coach, 'client');
    await makeOven(coach);
    const w = await shoppingWeek(coach);
    const send = (body: Record<string, unknown>) => coach.agent.post(`/api/weeks/${w.weekId}/prep-day-mail`).send({ prepDate: '2026-01-04', ...body });
    const notAssistant = await send({ assistantIds: [kit.userId, client.userId] }).expect(400);
    expect(notAssistant.body.errors).toEqual({ 'assistantIds.1': ['Not a kitchen assistant of this workspace'] });
    const badAddress = await send({ alsoTo: ['kitchen'] }).expect(400);
    expect(Object.keys(badAddress.body.errors)).toEqual(['alsoTo.0']);
    const tooMany = await send({ alsoTo: ['a', 'b', 'c', 'd', 'e', 'f'].map((x) => `${x}@example.test`) }).expect(400);
    expect(Object.keys(tooMany.body.errors)).toEqual(['alsoTo']);
    const nobody = await send({ assistantIds: [], alsoTo: [] }).expect(400);
    expect(nobody.body.errors).toEqual({ assistantIds: ['Choose at least one kitchen assistant, or give an e-mail address'] });
    expect(await sql("select id from outbox where workspace_id = $1 and kind = 'prep-day'", [coach.workspaceId])).toEqual([]);
    // With no assistant at all, an address alone is enough.
    const solo = await coachWorkspace(app);
    await makeOven(solo);
    const sw = await shoppingWeek(solo);
    const only = await solo.agent.post(`/api/weeks/${sw.weekId}/prep-day-mail`).send({ prepDate: '2026-01-04', alsoTo: ['kitchen@example.test'] }).expect(202);
    expect(only.body.queued).toBe(1);
  });
});
