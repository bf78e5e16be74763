import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import type { Orm } from '@server/db/orm.js';
import type { MailRuntime } from '@server/modules/mail/mail-runtime.js';
import { watchCooling } from '@server/modules/bake-runs/cooling-watch.js';
import { agentFor, testApp } from '../support/test-app.js';
import { coachWorkspace, makeClient, makeOven, makeTray, makeWeek, member, PASSWORD, twoTrayWeek, uniq, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';

// The cooling watch: FDA Food Code §3-501.14 (cooling): from 135 °F to 70 °F within 2 hours and to 41 °F within 6
// hours in total; the clock starts when the tray came out (or cooling started again after a reheat).
// The kitchen's time is the server's instant read in the workspace's zone. America/Chicago keeps Central Standard
// Time (UTC−6) in January: the US rule (15 U.S.C. §260a, as amended by the Energy Policy Act of 2005 §110) puts
// daylight time from the second Sunday of March to the first Sunday of November, so Jan 4, 2026 is standard time.
// 120 °F = 49 °C and 75 °F = 24 °C (NIST SP 811: (°F − 32) × 5/9, 48.9 and 23.9).

let app: Express;
let orm: Orm;
let mail: MailRuntime;
beforeAll(async () => {
  ({ app, orm, mail } = await testApp());
});

/** The kitchen's wall clock on Sun Jan 4, 2026 in Chicago ("15:11") as the server's instant (UTC = CST + 6 h). */
const chicago = (hhmm: string, day = '2026-01-04') => {
  const [h, m] = hhmm.split(':').map(Number);
  return new Date(Date.UTC(Number(day.slice(0, 4)), Number(day.slice(5, 7)) - 1, Number(day.slice(8, 10)), h + 6, m));
};

const watch = (at: Date) => watchCooling(orm.em.fork(), { mail, publicUrl: 'http://127.0.0.1:8080' }, at);

async function settings(coach: Member, patch: Record<string, unknown>) {
  const s = await coach.agent.get('/api/workspace/settings').expect(200);
  return coach.agent.patch('/api/workspace/settings').send({ ...patch, version: s.body.version });
}

const mails = (weekId: number) =>
  sql<{ to: string; subject: string; text: string; status: string }>(
    `select "to", subject, text, status from outbox where week_id = $1 and kind = 'cooling-missed' order by id`,
    [weekId],
  );

async function kitchenInChicago() {
  const day = await twoTrayWeek(app);
  const set = await settings(day.coach, { timeZone: 'america/chicago' });
  expect(set.status).toBe(200);
  expect(set.body.timeZone).toBe('America/Chicago');
  return day;
}

describe('the kitchen time zone setting', () => {
  it('is not set for a workspace made without one; the coach sets it by its IANA name (kept in its canonical spelling), clears it with null; an unknown zone is a 400 naming timeZone', async () => {
    const { coach, assistant } = await twoTrayWeek(app);
    expect((await coach.agent.get('/api/workspace/settings').expect(200)).body.timeZone).toBeNull();
    const bad = await settings(coach, { timeZone: 'Mars/Olympus_Mons' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors)).toEqual(['timeZone']);
    expect(bad.body.errors.timeZone[0]).toMatch(/^"Mars\/Olympus_Mons" is not a time zone/);
    // An offset is not a place (its daylight time would be wrong half the year).
    expect((await settings(coach, { timeZone: '+05:30' })).status).toBe(400);
    expect((await settings(coach, { timeZone: 42 })).status).toBe(400);
    expect((await settings(coach, { timeZone: 'Europe/Berlin' })).body).toMatchObject({ timeZone: 'Europe/Berlin', clock: '24h' });
    // Every signed-in person of the workspace reads it with themselves: their pages read the kitchen's clock in it.
    expect((await assistant.agent.get('/api/auth/me').expect(200)).body.timeZone).toBe('Europe/Berlin');
    // Only the coach changes it; nothing was written by the refused ones.
    const s = await coach.agent.get('/api/workspace/settings').expect(200);
    await assistant.agent.patch('/api/workspace/settings').send({ timeZone: 'UTC', version: s.body.version }).expect(403);
    expect((await settings(coach, { timeZone: null })).body.timeZone).toBeNull();
    expect((await settings(coach, { clock: '12h' })).body.timeZone).toBeNull();
  });

  it('starts a new workspace in the zone of its coach’s device; a zone this server does not know is left unset, not refused', async () => {
    const name = uniq('coach');
    const agent = agentFor(app);
    await agent.post('/api/auth/register').send({ name, email: `${name}@example.test`, password: PASSWORD, businessName: 'k', timeZone: 'Asia/Kolkata' }).expect(201);
    expect((await agent.get('/api/workspace/settings').expect(200)).body.timeZone).toBe('Asia/Kolkata');
    const other = agentFor(app);
    const n2 = uniq('coach');
    await other.post('/api/auth/register').send({ name: n2, email: `${n2}@example.test`, password: PASSWORD, businessName: 'k', timeZone: 'Atlantis/Capital' }).expect(201);
    expect((await other.get('/api/workspace/settings').expect(200)).body.timeZone).toBeNull();
  });
});

describe('the cooling watch', () => {
  it('e-mails every coach and kitchen assistant once when a tray passes its 2-hour deadline with no reading at 70 °F, at the kitchen’s time', async () => {
    const { coach, assistant, tray, week } = await kitchenInChicago();
    const client = await member(app, coach, 'client', { clientId: (await makeClient(coach)).id });
    // The assistant reads °C (their own setting): their e-mail puts °C first.
    await assistant.agent.patch('/api/auth/me').send({ tempUnit: 'C' }).expect(200);
    // Out at 13:10; one reading, 120 °F at 13:40. The first stage's deadline is 15:10 (2 hours after).
    await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/cooling/${tray.id}-1`)
      .send({ outAt: '2026-01-04T13:10', readings: [{ at: '2026-01-04T13:40', tempF: 120 }] })
      .expect(200);
    // The cooling record tells its readers the deadlines are watched (and in which zone).
    expect((await assistant.agent.get(`/api/weeks/${week.id}/bake-run/cooling`).expect(200)).body.timeZone).toBe('America/Chicago');
    await watch(chicago('15:10'));
    expect(await mails(week.id)).toEqual([]);
    const run = await watch(chicago('15:11'));
    expect(run.queued).toBeGreaterThanOrEqual(2);
    const sent = await mails(week.id);
    // The coach and the assistant of this workspace; never a client.
    expect(sent.map((m) => m.to).sort()).toEqual([coach.email, assistant.email].sort());
    expect(sent.map((m) => m.to)).not.toContain(client.email);
    const first = sent.find((m) => m.to === coach.email)!;
    expect(first.status).toBe('queued');
    expect(first.subject).toMatch(/ missed its cooling deadline: 70 °F \(21 °C\) by 15:10$/);
    expect(first.text).toContain('had to be at 70 °F (21 °C) or below by 15:10, and no temperature written down in its cooling record shows it was. It came out at 13:10.');
    expect(first.text).toContain('Temperatures written down: 13:40 120 °F (49 °C).');
    expect(first.text).toContain('Reheat it to 165 °F (74 °C) and start cooling again, or throw it away (common practice; your local food code decides).');
    expect(first.text).toContain(`/weeks/${week.id}/bake-run#cooling-record-title`);
    // The same words for the °C reader, each pair turned round (FDA Food Code §3-501.14 pairs 70 °F with 21 °C;
    // 120 °F = 49 °C and 165 °F = 74 °C, NIST SP 811).
    const inC = sent.find((m) => m.to === assistant.email)!;
    expect(inC.subject).toMatch(/ missed its cooling deadline: 21 °C \(70 °F\) by 15:10$/);
    expect(inC.text).toContain('had to be at 21 °C (70 °F) or below by 15:10');
    expect(inC.text).toContain('Temperatures written down: 13:40 49 °C (120 °F).');
    expect(inC.text).toContain('Reheat it to 74 °C (165 °F) and start cooling again');
    expect(inC.text).not.toMatch(/\d °F \(/);
    // The next minutes' runs (and a retried job) send nothing again.
    await watch(chicago('15:12'));
    await watch(chicago('15:12'));
    expect(await mails(week.id)).toHaveLength(2);
  });

  it('watches a reheated tray again from its new start, and the 6-hour stage; says nothing of a tray cooled in time or thrown away', async () => {
    const { assistant, tray, week } = await kitchenInChicago();
    const put = (runTrayId: string, body: Record<string, unknown>) => assistant.agent.put(`/api/weeks/${week.id}/bake-run/cooling/${runTrayId}`).send(body);
    // Tray 1: missed 70 °F by 15:10, reheated and cooled again from 15:20 (deadline 17:20).
    const r1 = await put(`${tray.id}-1`, { outAt: '2026-01-04T13:10', readings: [{ at: '2026-01-04T15:05', tempF: 75 }] }).expect(200);
    await watch(chicago('15:15'));
    expect(await mails(week.id)).toHaveLength(2);
    await put(`${tray.id}-1`, { outAt: '2026-01-04T13:10', restartedAt: '2026-01-04T15:20', readings: r1.body.readings, version: r1.body.version }).expect(200);
    await watch(chicago('17:20'));
    expect(await mails(week.id)).toHaveLength(2);
    await watch(chicago('17:21'));
    const again = (await mails(week.id)).slice(2);
    expect(again).toHaveLength(2);
    expect(again[0].text).toContain('It came out at 13:10, was reheated and cooled again from 15:20.');
    expect(again[0].text).toContain('It has been reheated once already: throw it away');
    // Thrown away now: nothing more about it.
    const r1b = await assistant.agent.get(`/api/weeks/${week.id}/bake-run/cooling`).expect(200);
    const v = r1b.body.records[0].version;
    await put(`${tray.id}-1`, { outAt: '2026-01-04T13:10', restartedAt: '2026-01-04T15:20', readings: r1.body.readings, discarded: true, version: v }).expect(200);
    // Tray 2: 70 °F at 14:00 (in time), never written down at 41 °F: the 6-hour deadline (19:10) passes.
    await put(`${tray.id}-2`, { outAt: '2026-01-04T13:10', readings: [{ at: '2026-01-04T14:00', tempF: 68 }] }).expect(200);
    await watch(chicago('19:10'));
    const before41 = await mails(week.id);
    expect(before41).toHaveLength(4);
    await watch(chicago('19:11'));
    const final = (await mails(week.id)).slice(4);
    expect(final).toHaveLength(2);
    expect(final[0].subject).toMatch(/missed its cooling deadline: 41 °F \(5 °C\) by 19:10$/);
    expect(final[0].text).toContain('\n\nThrow it away (common practice; your local food code decides).\n\n');
  });

  it('says nothing of a tray cooled in time, of a workspace without a time zone, or of a deadline missed more than a day ago', async () => {
    const cooled = await kitchenInChicago();
    await cooled.assistant.agent
      .put(`/api/weeks/${cooled.week.id}/bake-run/cooling/${cooled.tray.id}-1`)
      .send({ outAt: '2026-01-04T13:10', readings: [{ at: '2026-01-04T14:30', tempF: 65 }, { at: '2026-01-04T18:00', tempF: 40 }] })
      .expect(200);
    const unset = await twoTrayWeek(app);
    await unset.assistant.agent.put(`/api/weeks/${unset.week.id}/bake-run/cooling/${unset.tray.id}-1`).send({ outAt: '2026-01-04T13:10', readings: [] }).expect(200);
    await watch(chicago('20:00'));
    // No reading: 70 °F was due at 10:00 Jan 4; a day and a minute after, the watch first looks.
    const old = await kitchenInChicago();
    await old.assistant.agent.put(`/api/weeks/${old.week.id}/bake-run/cooling/${old.tray.id}-1`).send({ outAt: '2026-01-04T08:00', readings: [] }).expect(200);
    await watch(chicago('10:01', '2026-01-05'));
    expect(await mails(old.week.id)).toEqual([]);
    await watch(chicago('10:00', '2026-01-05'));
    expect(await mails(old.week.id)).toHaveLength(2);
    expect(await mails(cooled.week.id)).toEqual([]);
    expect(await mails(unset.week.id)).toEqual([]);
  });

  it('the coach’s glance counts a tray with no reading past its deadline once the kitchen has a time zone (on paper alone it cannot)', async () => {
    const { coach, assistant, tray, week } = await twoTrayWeek(app);
    await assistant.agent.put(`/api/weeks/${week.id}/bake-run/cooling/${tray.id}-1`).send({ outAt: '2026-01-04T13:10', readings: [] }).expect(200);
    const glance = () => coach.agent.get('/api/weeks/glance?today=2026-01-04').expect(200);
    expect((await glance()).body.cooling.missed).toEqual([]);
    await settings(coach, { timeZone: 'America/Chicago' }).then((r) => expect(r.status).toBe(200));
    // The server's clock is long past Jan 4, 2026 15:10 in Chicago.
    expect((await glance()).body.cooling.missed).toEqual([{ trayName: expect.any(String), prepDate: '2026-01-04' }]);
  });
});

describe('the cooling watch on the night the clock changes', () => {
  // 15 U.S.C. §260a: in 2026 Chicago falls back from 2:00 CDT (UTC−5) to 1:00 CST (UTC−6) on Sunday, November 1.
  // A tray out at 23:30 CDT on Oct 31 (04:30Z) must be at 41 °F within 6 hours of real time: by 10:30Z, which the
  // kitchen's clock reads as 04:30 CST (worked by hand; the calendar reading would say 05:30, an hour too late).
  it('e-mails a missed 6-hour deadline at 04:31 by the kitchen’s clock, not at 05:31', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const tray = await makeTray(coach);
    const { week } = await makeWeek(coach, { startDate: '2026-11-02', prepDate: '2026-10-31' });
    await coach.agent
      .put(`/api/weeks/${week.id}/trays`)
      .send({ version: week.version, trays: [{ trayId: tray.id, prepDate: '2026-10-31', trayCount: 1 }] })
      .expect(200);
    await settings(coach, { timeZone: 'America/Chicago' }).then((r) => expect(r.status).toBe(200));
    // 70 °F reached at 00:50 (in time); never written down at 41 °F.
    await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/cooling/${tray.id}-1`)
      .send({ outAt: '2026-10-31T23:30', readings: [{ at: '2026-11-01T00:50', tempF: 65 }] })
      .expect(200);
    await watch(new Date('2026-11-01T10:30:00Z'));
    expect(await mails(week.id)).toEqual([]);
    await watch(new Date('2026-11-01T10:31:00Z'));
    const sent = await mails(week.id);
    expect(sent.map((m) => m.to).sort()).toEqual([coach.email, assistant.email].sort());
    expect(sent[0].subject).toMatch(/ missed its cooling deadline: 41 °F \(5 °C\) by 04:30 the next day$/);
    expect(sent[0].text).toContain('had to be at 41 °F (5 °C) or below by 04:30 the next day');
    expect(sent[0].text).toContain('It came out at 23:30.');
    expect(sent[0].text).toContain('Throw it away (common practice; your local food code decides). The clocks change in between: the deadlines are 2 and 6 hours of real time.');
    // The coach's glance, at the same instant, counts it too.
    const glance = await coach.agent.get('/api/weeks/glance?today=2026-11-01').expect(200);
    expect(glance.body.cooling.missed).toEqual([{ trayName: expect.any(String), prepDate: '2026-10-31' }]);
  });
});

describe('the cooling watch, for a tray forgotten in the record', () => {
  it('on a prep day under way, e-mails the kitchen once about a tray planned out 30 minutes ago or more that the record does not have', async () => {
    const day = await kitchenInChicago();
    const { coach, assistant, week } = day;
    // Two trays, two one-place ovens, one cook, from 08:00 (worked by hand in tests/api/bake-run.api.test.ts: one tray
    // out at 08:37, the other at 08:45).
    await makeOven(coach, { name: 'Left', racks: 1, traysPerRack: 1 });
    await makeOven(coach, { name: 'Right', racks: 1, traysPerRack: 1 });
    const planned = await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ start: '2026-01-04T08:00', cooks: 1, ovenIds: [] }).expect(200);
    const trays = [...(planned.body.run.trays as { id: string; name: string; outAt: string }[])].sort((a, b) => (a.outAt < b.outAt ? -1 : 1));
    expect(trays.map((t) => t.outAt)).toEqual(['2026-01-04T08:37', '2026-01-04T08:45']);
    const [first, second] = trays;
    // Nothing written down yet: the day may not have started (or was called off); the watch says nothing.
    await watch(chicago('10:00'));
    expect(await mails(week.id)).toEqual([]);
    // The first tray out at 08:40, cooling on time.
    await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/cooling/${first.id}`)
      .send({ outAt: '2026-01-04T08:40', readings: [{ at: '2026-01-04T09:00', tempF: 60 }] })
      .expect(200);
    await watch(chicago('09:14'));
    expect(await mails(week.id)).toEqual([]);
    await watch(chicago('09:15'));
    const told = await mails(week.id);
    expect(told.map((m) => m.to).sort()).toEqual([coach.email, assistant.email].sort());
    expect(told[0].subject).toMatch(new RegExp(`: ${second.name.replace(/[()]/g, '\\$&')} is not in the cooling record \\(planned out 08:45\\)$`));
    expect(told[0].text).toContain(`${second.name} (prep day Sun, Jan 4, `);
    expect(told[0].text).toContain('was planned out of the oven at 08:45, 30 min ago, and its cooling record does not have it yet.');
    expect(told[0].text).toContain(`/weeks/${week.id}/bake-run?prepDate=2026-01-04#cooling-record-title`);
    // Once: later runs, and the tray written down, say nothing more.
    await watch(chicago('09:40'));
    await assistant.agent.put(`/api/weeks/${week.id}/bake-run/cooling/${second.id}`).send({ outAt: '2026-01-04T09:20', readings: [] }).expect(200);
    await watch(chicago('09:41'));
    expect(await mails(week.id)).toHaveLength(2);
  });
});
