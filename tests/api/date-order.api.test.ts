import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import ICAL from 'ical.js';
import { testApp, agentFor } from '../support/test-app.js';
import { pdfTextOf } from '../support/pdf-text.js';
import { coachWorkspace, makeAssembly, makeClient, makeIngredient, makeTray, makeWeek, member, PASSWORD, uniq, type Member } from '../support/factories.js';
import { shoppingWeek } from '../support/shopping-week.js';

// How a workspace writes dates in words. Calendar facts (outside reference: ECMA-402 Intl with CLDR data, checked in
// tests/unit/domain/eat-by.test.ts): 2026-01-05 was a Monday, 2026-01-04 a Sunday.

let app: Express;
beforeAll(async () => {
  ({ app } = await testApp());
});

async function setOrder(coach: Member, dateOrder: string) {
  const s = await coach.agent.get('/api/workspace/settings').expect(200);
  return coach.agent.patch('/api/workspace/settings').send({ dateOrder, version: s.body.version });
}

describe('dates in words, as the workspace writes them', () => {
  it('is month first by default; the coach switches the whole workspace to day first (pages read it from /me)', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    expect((await coach.agent.get('/api/workspace/settings').expect(200)).body.dateOrder).toBe('month-day');
    expect((await assistant.agent.get('/api/auth/me').expect(200)).body.dateOrder).toBe('month-day');
    const board = await makeWeek(coach, { name: '' });
    const before = await coach.agent.get('/api/weeks').expect(200);
    expect(before.body.find((w: { id: number }) => w.id === board.week.id).name).toBe('Week of Mon, Jan 5');

    const changed = await setOrder(coach, 'day-month');
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ dateOrder: 'day-month', netCarbRule: 'half-other-polyols' });
    // Everyone in the workspace, on their next request: the assistant too.
    expect((await assistant.agent.get('/api/auth/me').expect(200)).body.dateOrder).toBe('day-month');
    const after = await assistant.agent.get('/api/weeks').expect(200);
    expect(after.body.find((w: { id: number }) => w.id === board.week.id).name).toBe('Week of Mon 5 Jan');
    const detail = await coach.agent.get(`/api/weeks/${board.week.id}`).expect(200);
    expect(detail.body).toMatchObject({ dateOrder: 'day-month', week: { name: 'Week of Mon 5 Jan' } });
    // The server's own sentences follow it (the one-board refusal).
    const clash = await coach.agent.post('/api/weeks').send({ startDate: '2026-01-07', prepDate: '2026-01-06' }).expect(400);
    expect(clash.body.errors.startDate[0]).toBe(
      '"Week of Mon 5 Jan" already plans Mon 5 Jan – Sun 11 Jan; a day is on one board only. Start this week on Mon 12 Jan or later.',
    );
  });

  it('prints the shopping list in the chosen words', async () => {
    const coach = await coachWorkspace(app);
    const w = await shoppingWeek(coach);
    expect(await pdfTextOf(coach.agent, `/api/weeks/${w.weekId}/shopping.pdf`)).toContain('Shopping list, week of Mon, Jan 5');
    await setOrder(coach, 'day-month').then((r) => expect(r.status).toBe(200));
    const text = await pdfTextOf(coach.agent, `/api/weeks/${w.weekId}/shopping.pdf`);
    expect(text).toContain('Shopping list, week of Mon 5 Jan');
    expect(text).not.toContain('Jan 5');
  });

  it("a client's published week, its plan PDF and thaw reminders follow the setting without publishing again", async () => {
    const coach = await coachWorkspace(app);
    const ing = await makeIngredient(coach);
    const tray = await makeTray(coach, { storage: { fridgeDays: 7, freezerWeeks: 8 } }, ing.id);
    const plate = await makeAssembly(coach, tray.id);
    const client = await makeClient(coach);
    const board = await makeWeek(coach, { name: '' });
    const filled = await coach.agent
      .put(`/api/weeks/${board.week.id}/cells`)
      .send({ version: board.week.version, cells: [{ clientId: client.id, date: '2026-01-06', slot: 'breakfast', assemblyId: plate.id, storage: 'frozen' }] })
      .expect(200);
    await coach.agent.post(`/api/weeks/${board.week.id}/publish`).send({ version: filled.body.week.version }).expect(200);
    const dana = await member(app, coach, 'client', { clientId: client.id });
    const mine = async () => (await dana.agent.get('/api/weeks/mine?today=2026-01-05').expect(200)).body;
    expect((await mine()).name).toBe('Week of Mon, Jan 5');
    expect(await pdfTextOf(dana.agent, '/api/weeks/mine/plan.pdf?today=2026-01-05')).toContain('Week of Monday, January 5, 2026');

    await setOrder(coach, 'day-month').then((r) => expect(r.status).toBe(200));
    expect((await mine()).name).toBe('Week of Mon 5 Jan');
    const pdf = await pdfTextOf(dana.agent, '/api/weeks/mine/plan.pdf?today=2026-01-05');
    expect(pdf).toContain('Week of Monday 5 January 2026');
    expect(pdf).toContain('on the evening of Monday 5 January 2026');
    const ics = await dana.agent.get('/api/weeks/mine/thaw-reminders.ics?today=2026-01-05').expect(200);
    // Read with ical.js (an RFC 5545 parser), not by string matching.
    const cal = new ICAL.Component(ICAL.parse(ics.text));
    expect(cal.getFirstPropertyValue('x-wr-calname')).toBe('Thaw reminders, Week of Mon 5 Jan');
    const [event] = cal.getAllSubcomponents('vevent').map((v) => new ICAL.Event(v));
    expect(event.description).toMatch(/^For breakfast on Tuesday 6 January 2026\. .* Eat it by Wednesday 7 January 2026 at the latest\.$/);
  });

  it("follows the workspace a person works in: switching workspaces switches the order", async () => {
    const first = await coachWorkspace(app);
    const second = await coachWorkspace(app);
    await setOrder(second, 'day-month').then((r) => expect(r.status).toBe(200));
    const helper = await member(app, first, 'assistant');
    const inv = await second.agent.post('/api/invitations').send({ email: helper.email, role: 'assistant' }).expect(201);
    const token = String(inv.body.link).split('/invite/')[1];
    const joined = await helper.agent.post(`/api/invitations/${token}/accept`).send({ name: 'ignored', password: PASSWORD }).expect(200);
    expect(joined.body).toMatchObject({ workspaceId: second.workspaceId, dateOrder: 'day-month' });
    const back = await helper.agent.put('/api/auth/workspace').send({ workspaceId: first.workspaceId }).expect(200);
    expect(back.body).toMatchObject({ workspaceId: first.workspaceId, dateOrder: 'month-day' });
    expect((await helper.agent.get('/api/auth/me').expect(200)).body.dateOrder).toBe('month-day');
  });

  it('keeps the net-carb rule when only the date order changes, and the other way round', async () => {
    const coach = await coachWorkspace(app);
    await setOrder(coach, 'day-month').then((r) => expect(r.status).toBe(200));
    const s = await coach.agent.get('/api/workspace/settings').expect(200);
    const rule = await coach.agent.patch('/api/workspace/settings').send({ netCarbRule: 'full', version: s.body.version }).expect(200);
    expect(rule.body).toMatchObject({ netCarbRule: 'full', dateOrder: 'day-month' });
  });

  it('refuses an unknown order (400 naming dateOrder) and a stale version (409), changing nothing', async () => {
    const coach = await coachWorkspace(app);
    const bad = await setOrder(coach, 'year-first');
    expect(bad.status).toBe(400);
    expect(bad.body.errors.dateOrder[0]).toBe('Choose how dates are written: month-day or day-month');
    const s = await coach.agent.get('/api/workspace/settings').expect(200);
    await coach.agent.patch('/api/workspace/settings').send({ dateOrder: 'day-month', version: s.body.version }).expect(200);
    const stale = await coach.agent.patch('/api/workspace/settings').send({ dateOrder: 'month-day', version: s.body.version });
    expect(stale.status).toBe(409);
    expect((await coach.agent.get('/api/workspace/settings').expect(200)).body.dateOrder).toBe('day-month');
    // Only the coach sets it.
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.patch('/api/workspace/settings').send({ dateOrder: 'month-day', version: 1 }).expect(403);
  });

  it('starts a new workspace in the order its coach signs up with (the form sends the device order)', async () => {
    const name = uniq('coach');
    const agent = agentFor(app);
    await agent
      .post('/api/auth/register')
      .send({ name, email: `${name}@example.test`, password: PASSWORD, businessName: `${name} kitchen`, dateOrder: 'day-month' })
      .expect(201);
    expect((await agent.get('/api/auth/me').expect(200)).body.dateOrder).toBe('day-month');
    const bad = await agentFor(app)
      .post('/api/auth/register')
      .send({ name, email: `${uniq('coach')}@example.test`, password: PASSWORD, businessName: 'x', dateOrder: 'sideways' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors)).toEqual(['dateOrder']);
  });
});
