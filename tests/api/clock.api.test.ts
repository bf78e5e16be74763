import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import ICAL from 'ical.js';
import { testApp, agentFor } from '../support/test-app.js';
import { pdfTextOf } from '../support/pdf-text.js';
import { coachWorkspace, makeOven, member, PASSWORD, twoTrayWeek, uniq, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';

// How a workspace writes a time of day: 24-hour ("08:40") or 12-hour ("8:40 AM"); the 12-hour words are checked
// against ECMA-402 Intl (en-US) in tests/unit/domain/clock.test.ts.

let app: Express;
beforeAll(async () => {
  ({ app } = await testApp());
});

async function setClock(coach: Member, clock: string) {
  const s = await coach.agent.get('/api/workspace/settings').expect(200);
  return coach.agent.patch('/api/workspace/settings').send({ clock, version: s.body.version });
}

/**
 * Two trays, two one-place ovens, one cook, from 08:00 on Sun Jan 4, 2026 (worked by hand in
 * tests/api/bake-run.api.test.ts: one tray 08:12–08:37, the other 08:20–08:45).
 */
async function twoOvenDay() {
  const day = await twoTrayWeek(app);
  await makeOven(day.coach, { name: 'Left', racks: 1, traysPerRack: 1 });
  await makeOven(day.coach, { name: 'Right', racks: 1, traysPerRack: 1 });
  const planned = await day.coach.agent.put(`/api/weeks/${day.week.id}/bake-run/settings`).send({ start: '2026-01-04T08:00', cooks: 1, ovenIds: [] }).expect(200);
  return { ...day, planned };
}

describe('times of day, as the workspace writes them', () => {
  it('are 24-hour by default; the coach switches the workspace to 12-hour: the run sheet, its calendar, the words of a replanned day and their messages follow', async () => {
    const { coach, assistant, week, planned } = await twoOvenDay();
    expect((await coach.agent.get('/api/workspace/settings').expect(200)).body.clock).toBe('24h');
    expect((await assistant.agent.get('/api/auth/me').expect(200)).body.clock).toBe('24h');
    expect(await pdfTextOf(assistant.agent, `/api/weeks/${week.id}/bake-run.pdf`)).toContain('start 08:00, last tray out 08:45');

    const changed = await setClock(coach, '12h');
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ clock: '12h', dateOrder: 'month-day', netCarbRule: 'half-other-polyols' });
    // Everyone in the workspace, on their next request.
    expect((await assistant.agent.get('/api/auth/me').expect(200)).body.clock).toBe('12h');
    const sheet = await pdfTextOf(assistant.agent, `/api/weeks/${week.id}/bake-run.pdf`);
    expect(sheet).toContain('start 8:00 AM, last tray out 8:45 AM');
    expect(sheet).not.toMatch(/\b08:\d\d\b/);
    // The calendar keeps machine times (RFC 5545 floating local times); its words follow the setting. Read with ical.js.
    const ics = await assistant.agent.get(`/api/weeks/${week.id}/bake-run.ics`).expect(200);
    const events = new ICAL.Component(ICAL.parse(ics.text)).getAllSubcomponents('vevent').map((v) => new ICAL.Event(v));
    const bake = events.find((e) => /\bin (Left|Right), rack/.test(e.summary))!;
    expect(bake.startDate.toString()).toMatch(/^2026-01-04T08:(12|20):00$/);
    expect(bake.description).toMatch(/pull by 8:\d\d AM at the latest\.$/);

    // 08:40: the first tray came out; the rest planned again from then. The run's words say 8:40 AM.
    const [first] = planned.body.run.trays as { id: string }[];
    const ovens = planned.body.ovens as { id: number }[];
    const again = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds: ovens.map((o) => o.id), out: [first.id], from: '2026-01-04T08:40', version: 1 })
      .expect(200);
    expect(again.body.run.cautions[0]).toMatch(/^Planned again from 8:40 AM: 1 tray already out is kept as planned/);
    expect(await pdfTextOf(assistant.agent, `/api/weeks/${week.id}/bake-run.pdf`)).toContain(
      'Planned again at 8:40 AM: one tray already out is kept as planned, with their cooling deadlines; the one tray still to bake is planned from 8:40 AM.',
    );
    // A start after the rest's time is refused in the same words (400 naming the field).
    const late = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ start: '2026-01-04T08:50', version: 2 }).expect(400);
    expect(late.body.errors.start).toEqual(['The rest of this run is planned from 8:40 AM (trays already out): the start can be 8:40 AM at the latest.']);
  });

  it('a tray thrown away is e-mailed to the coaches with its times in the workspace’s style', async () => {
    const { coach, assistant, tray, week } = await twoTrayWeek(app);
    await setClock(coach, '12h').then((r) => expect(r.status).toBe(200));
    // Out at 13:10; 75 °F at 15:30 is past 15:10, 2 hours after: FDA Food Code §3-501.14's first stage missed.
    // 75 °F = 24 °C (NIST SP 811: (°F − 32) × 5/9 = 23.9).
    await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/cooling/${tray.id}-1`)
      .send({ outAt: '2026-01-04T13:10', readings: [{ at: '2026-01-04T15:30', tempF: 75 }], discarded: true })
      .expect(200);
    const [mail] = await sql<{ text: string }>(`select text from outbox where week_id = $1 and kind = 'cooling-record'`, [week.id]);
    expect(mail.text).toContain('It was not at 70 °F (21 °C) by 3:10 PM, 2 hours after it came out (FDA Food Code §3-501.14).');
    expect(mail.text).toContain('3:30 PM 75 °F (24 °C)');
    expect(mail.text).not.toMatch(/\b1[35]:\d\d\b/);
  });

  it('refuses an unknown style (400 naming clock) and keeps the date order when only the clock changes; only the coach sets it', async () => {
    const coach = await coachWorkspace(app);
    const bad = await setClock(coach, '36h');
    expect(bad.status).toBe(400);
    expect(bad.body.errors.clock).toEqual(['Choose how times are written: 24h or 12h']);
    const s = await coach.agent.get('/api/workspace/settings').expect(200);
    await coach.agent.patch('/api/workspace/settings').send({ dateOrder: 'day-month', version: s.body.version }).expect(200);
    const twelve = await setClock(coach, '12h');
    expect(twelve.body).toMatchObject({ clock: '12h', dateOrder: 'day-month' });
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.patch('/api/workspace/settings').send({ clock: '24h', version: twelve.body.version }).expect(403);
    expect((await coach.agent.get('/api/workspace/settings').expect(200)).body.clock).toBe('12h');
  });

  it('starts a new workspace in the style its coach signs up with (the form sends the device style)', async () => {
    const name = uniq('coach');
    const agent = agentFor(app);
    await agent.post('/api/auth/register').send({ name, email: `${name}@example.test`, password: PASSWORD, businessName: `${name} kitchen`, clock: '12h' }).expect(201);
    expect((await agent.get('/api/auth/me').expect(200)).body.clock).toBe('12h');
    const bad = await agentFor(app)
      .post('/api/auth/register')
      .send({ name, email: `${uniq('coach')}@example.test`, password: PASSWORD, businessName: 'x', clock: 'sundial' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors)).toEqual(['clock']);
  });
});
