import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeOven, makeWeek, member, ovenInput, twoTrayWeek as twoTrayWeekOf } from '../support/factories.js';
import { sql } from '../support/db.js';
import { DEFAULT_BAKE_RULES } from '@shared/domain/bake-rules-defaults.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});


/** One conventional oven, 2 racks × 1 tray; heating 25 °F/min, cooling 15 °F/min (the defaults; common practice, no source). */
const LEFT = { name: 'Left', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 };

const run = (over: Record<string, unknown> = {}) => ({
  start: '2026-12-06T08:00',
  cooks: 1,
  ambientF: 70,
  ovens: [LEFT],
  trays: [
    { id: 'hot', name: 'Roasted radish', tempF: 425, minMinutes: 14, maxMinutes: 16, handsOnMinutes: 0 },
    { id: 'cool', name: 'Egg slab', tempF: 350, minMinutes: 14, maxMinutes: 16, handsOnMinutes: 0 },
  ],
  ...over,
});

describe('POST /api/calc/bake-run', () => {
  it('a large run is planned off the request thread: the thread that answers requests is never held for long', async () => {
    // 60 trays over 3 ovens and 2 cooks take a few hundred milliseconds to plan (invented values, as the bench's).
    const temps = [350, 400, 425, 375];
    const big = run({
      cooks: 2,
      ovens: [LEFT, { ...LEFT, name: 'Right', racks: 3, convection: true }, { ...LEFT, name: 'Back' }],
      trays: Array.from({ length: 60 }, (_, i) => ({ id: `t${i}`, name: `Tray ${i}`, tempF: temps[i % 4], minMinutes: 15 + (i % 3) * 5, maxMinutes: 25 + (i % 3) * 5, handsOnMinutes: 4 + (i % 5) })),
    });
    const coach = await coachWorkspace(app);
    await coach.agent.post('/api/calc/bake-run').send(run()).expect(200); // a worker is up
    // The API runs in this process: how long its event loop was held shows whether other requests had to wait.
    const held = monitorEventLoopDelay({ resolution: 5 });
    held.enable();
    const started = performance.now();
    const res = await coach.agent.post('/api/calc/bake-run').send(big).expect(200);
    const took = performance.now() - started;
    held.disable();
    expect(res.body.trays).toHaveLength(60);
    // Planned on the request thread, the loop is held for the whole plan (~0.35 s here); off it, only for reading
    // the request and writing the answer.
    expect(held.max / 1e6).toBeLessThan(Math.max(100, took / 3));
  });

  it('bakes the lower set point first when heating is faster than cooling (worked by hand)', async () => {
    const coach = await coachWorkspace(app);
    const res = await coach.agent.post('/api/calc/bake-run').send(run()).expect(200);
    // Worked by hand from the model (shared/domain/bake-run-model.ts), ambient 70 °F, ±10 °F tolerance so the two
    // trays cannot share a set point:
    //   350 first: preheat ceil((350 − 70) / 25) = ceil(11.2) = 12 min → egg slab 08:12–08:26 (14 min alone);
    //              raise 350 → 425: heat 75 / 25 = 3 min → ready 08:29; radish 08:29–08:43. Session 43 min.
    //   425 first: preheat ceil(355 / 25) = ceil(14.2) = 15 min → radish 08:15–08:29; lower 425 → 350: cool
    //              75 / 15 = 5 min → 08:34; egg slab 08:34–08:48. Session 48 min.
    // The rates favour 350 then 425 (3 min of heating beats 5 min of cooling): 43 minutes.
    expect(res.body.sessionMinutes).toBe(43);
    expect(res.body.lowerBoundMinutes).toBeLessThanOrEqual(43);
    expect(res.body.trays).toEqual([
      expect.objectContaining({ id: 'cool', oven: 'Left', tempF: 350, inAt: '2026-12-06T08:12', outAt: '2026-12-06T08:26', bakeMinutes: 14 }),
      expect.objectContaining({ id: 'hot', oven: 'Left', tempF: 425, inAt: '2026-12-06T08:29', outAt: '2026-12-06T08:43', bakeMinutes: 14 }),
    ]);
    for (const t of res.body.trays) expect(t.rack).toBeGreaterThanOrEqual(1);
    const ovenEvents = res.body.events.filter((e: { kind: string }) => ['preheat', 'setpoint-change', 'ready'].includes(e.kind));
    expect(ovenEvents).toEqual([
      expect.objectContaining({ at: '2026-12-06T08:00', kind: 'preheat', oven: 'Left', trayId: null, tempF: 350 }),
      expect.objectContaining({ at: '2026-12-06T08:12', kind: 'ready', tempF: 350 }),
      expect.objectContaining({ at: '2026-12-06T08:26', kind: 'setpoint-change', tempF: 425, fromF: 350 }),
      expect.objectContaining({ at: '2026-12-06T08:29', kind: 'ready', tempF: 425 }),
    ]);
    // FDA Food Code §3-501.14: 70 °F within 2 hours of 135 °F → the egg slab (out 08:26) by 10:26.
    expect(res.body.events).toContainEqual(
      expect.objectContaining({ kind: 'cool-to-70-by', trayId: 'cool', at: '2026-12-06T10:26', tempF: 70 }),
    );
    expect(res.body.cautions.length).toBeGreaterThan(0);
  });

  it('accepts °C: 180 °C = 356 °F (NIST SP 811: °F = °C × 9/5 + 32)', async () => {
    const coach = await coachWorkspace(app);
    const res = await coach.agent
      .post('/api/calc/bake-run')
      .send(run({ trays: [{ id: 'c', name: 'Batter slab', tempC: 180, minMinutes: 15, maxMinutes: 20, handsOnMinutes: 0 }] }))
      .expect(200);
    expect(res.body.trays[0].tempF).toBe(356);
    // Preheat ceil((356 − 70) / 25) = ceil(11.44) = 12 min, then 15 min alone: 27 min.
    expect(res.body.sessionMinutes).toBe(27);
  });

  it.each([
    ['no ovens', { ovens: [] }, 'ovens'],
    ['a tray hotter than every oven', { ovens: [{ ...LEFT, maxF: 400 }] }, 'trays.0.tempF'],
    ['minutes ≤ 0', { trays: [{ id: 'a', name: 'A', tempF: 350, minMinutes: 0, maxMinutes: 10, handsOnMinutes: 0 }] }, 'trays.0.minMinutes'],
    ['max < min', { trays: [{ id: 'a', name: 'A', tempF: 350, minMinutes: 20, maxMinutes: 10, handsOnMinutes: 0 }] }, 'trays.0.maxMinutes'],
    ['a bad start', { start: '2026-12-06 8am' }, 'start'],
    ['no cooks', { cooks: 0 }, 'cooks'],
  ])('400 naming the field: %s', async (_what, over, field) => {
    const coach = await coachWorkspace(app);
    const res = await coach.agent.post('/api/calc/bake-run').send(run(over)).expect(400);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(res.body.code).toBe('validation');
    expect(Object.keys(res.body.errors)).toContain(field);
  });

  it('resolves ruleId from the workspace rules; another workspace rule is a 400 on trays.N.ruleId', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const rules = (await coach.agent.get('/api/bake-rules').expect(200)).body as { id: number; category: string }[];
    const egg = rules.find((r) => r.category === 'egg-slab')!;
    const res = await coach.agent
      .post('/api/calc/bake-run')
      .send(run({ trays: [{ id: 'e1', ruleId: egg.id }] }))
      .expect(200);
    // Egg slab default: 350 °F, 25–30 min (common practice, no source); USDA FSIS egg dishes 160 °F.
    expect(res.body.trays[0]).toMatchObject({ id: 'e1', tempF: 350, bakeMinutes: 25 });
    expect(res.body.events).toContainEqual(expect.objectContaining({ kind: 'first-check', trayId: 'e1', internalF: 160 }));
    // Preheat 12 min; hands-on 10 min (rule) ends before that, so in at 08:12, out 08:37.
    expect(res.body.sessionMinutes).toBe(37);

    const theirs = (await other.agent.get('/api/bake-rules').expect(200)).body[0].id;
    const bad = await coach.agent.post('/api/calc/bake-run').send(run({ trays: [{ id: 'x', ruleId: theirs }] })).expect(400);
    expect(Object.keys(bad.body.errors)).toEqual(['trays.0.ruleId']);
  });
});

describe('bake rules', () => {
  it('seeds the defaults once per workspace, coach edits with optimistic locking, assistant reads', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const list = (await assistant.agent.get('/api/bake-rules').expect(200)).body as { id: number; category: string; minInternalF: number | null; minInternalSource: string | null; version: number }[];
    expect(list.map((r) => r.category).sort()).toEqual(DEFAULT_BAKE_RULES.map((r) => r.category).sort());
    // USDA FSIS Safe Minimum Internal Temperatures: poultry 165 °F, egg dishes 160 °F, named as the source.
    expect(list.find((r) => r.category === 'poultry-pieces')).toMatchObject({ minInternalF: 165 });
    expect(list.find((r) => r.category === 'egg-slab')?.minInternalSource).toMatch(/USDA FSIS/);
    const rows = await sql<{ n: string }>('select count(*) as n from bake_rule where workspace_id = $1', [coach.workspaceId]);
    expect(Number(rows[0].n)).toBe(DEFAULT_BAKE_RULES.length);

    const egg = list.find((r) => r.category === 'egg-slab')!;
    const body = { label: 'Egg slab', tempC: 180, minMinutes: 24, maxMinutes: 28, handsOnMinutes: 12, minInternalF: 160 };
    await assistant.agent.put(`/api/bake-rules/${egg.id}`).send({ ...body, version: egg.version }).expect(403);
    const saved = await coach.agent.put(`/api/bake-rules/${egg.id}`).send({ ...body, version: egg.version }).expect(200);
    // 180 °C → 356 °F (NIST SP 811); defaults: convection −25 °F, crowding +10 % (common practice, no source).
    expect(saved.body).toMatchObject({ tempF: 356, tempC: 180, convectionDeltaF: 25, crowdingPct: 10, version: egg.version + 1 });
    const stale = await coach.agent.put(`/api/bake-rules/${egg.id}`).send({ ...body, version: egg.version }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: egg.version + 1 });
    const [row] = await sql<{ temp_f: string; version: number }>('select temp_f, version from bake_rule where id = $1', [egg.id]);
    expect(row).toEqual({ temp_f: '356.0000', version: egg.version + 1 });

    const bad = await coach.agent.put(`/api/bake-rules/${egg.id}`).send({ ...body, maxMinutes: 10, version: 2 }).expect(400);
    expect(Object.keys(bad.body.errors)).toContain('maxMinutes');

    // Delete keeps the row: the defaults are not seeded again; creating the category again revives it.
    await coach.agent.delete(`/api/bake-rules/${egg.id}`).expect(204);
    expect((await coach.agent.get('/api/bake-rules').expect(200)).body).toHaveLength(DEFAULT_BAKE_RULES.length - 1);
    await coach.agent.get(`/api/bake-rules/${egg.id}`).expect(404);
    const again = await coach.agent
      .post('/api/bake-rules')
      .send({ category: 'egg-slab', label: 'Egg slab again', tempF: 340, minMinutes: 26, maxMinutes: 32, handsOnMinutes: 10 })
      .expect(201);
    expect(again.body).toMatchObject({ id: egg.id, tempF: 340 });
    await coach.agent
      .post('/api/bake-rules')
      .send({ category: 'egg-slab', label: 'Dup', tempF: 340, minMinutes: 26, maxMinutes: 32, handsOnMinutes: 10 })
      .expect(409);
    const custom = await coach.agent
      .post('/api/bake-rules')
      .send({ category: 'meatballs', label: 'Meatballs', tempF: 400, minMinutes: 18, maxMinutes: 22, handsOnMinutes: 15, crowdingPct: 12 })
      .expect(201);
    expect(custom.body).toMatchObject({ category: 'meatballs', crowdingPct: 12, rackPreference: 'any' });
  });
});

describe('ovens', () => {
  it('CRUD with defaults, °C maximum, 409 on a stale version or a taken name; assistant reads only', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.post('/api/ovens').send(ovenInput()).expect(403);
    const created = await coach.agent.post('/api/ovens').send({ name: 'Left oven', racks: 2, traysPerRack: 1, maxC: 260 }).expect(201);
    // Defaults: heating 25 °F/min, cooling 15 °F/min door ajar (common practice, no source); 260 °C = 500 °F (NIST SP 811).
    expect(created.body).toMatchObject({ heatFPerMin: 25, coolFPerMin: 15, maxF: 500, maxC: 260, convection: false, version: 1 });
    expect((await assistant.agent.get('/api/ovens').expect(200)).body).toHaveLength(1);
    await coach.agent.post('/api/ovens').send({ name: 'Left oven', racks: 1, traysPerRack: 1 }).expect(409);

    const put = { name: 'Left oven', racks: 3, traysPerRack: 2, convection: true, heatFPerMin: 20, coolFPerMin: 10, maxF: 550 };
    const saved = await coach.agent.put(`/api/ovens/${created.body.id}`).send({ ...put, version: 1 }).expect(200);
    expect(saved.body).toMatchObject({ racks: 3, traysPerRack: 2, convection: true, version: 2 });
    const stale = await coach.agent.put(`/api/ovens/${created.body.id}`).send({ ...put, version: 1 }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 2 });
    const [row] = await sql<{ racks: number; heat_fper_min: string }>('select racks, heat_fper_min from oven where id = $1', [created.body.id]);
    expect(row).toEqual({ racks: 3, heat_fper_min: '20.0000' });

    const bad = await coach.agent.post('/api/ovens').send({ name: '', racks: 0, traysPerRack: 1 }).expect(400);
    expect(Object.keys(bad.body.errors)).toEqual(expect.arrayContaining(['name', 'racks']));

    await coach.agent.delete(`/api/ovens/${created.body.id}`).expect(204);
    expect(await sql('select id from oven where id = $1', [created.body.id])).toEqual([]);
  });

  it('keeps workspaces apart: another workspace’s oven, rule and week are not found', async () => {
    const a = await coachWorkspace(app);
    const b = await coachWorkspace(app);
    const oven = await makeOven(a);
    const rule = (await a.agent.get('/api/bake-rules').expect(200)).body[0];
    const week = (await makeWeek(a)).week;
    await b.agent.get(`/api/ovens/${oven.id}`).expect(404);
    await b.agent.put(`/api/ovens/${oven.id}`).send({ ...ovenInput(), version: 1 }).expect(404);
    await b.agent.delete(`/api/ovens/${oven.id}`).expect(404);
    await b.agent.get(`/api/bake-rules/${rule.id}`).expect(404);
    await b.agent.delete(`/api/bake-rules/${rule.id}`).expect(404);
    await b.agent.get(`/api/weeks/${week.id}/bake-run`).expect(404);
    expect((await b.agent.get('/api/ovens').expect(200)).body).toEqual([]);
    expect(await sql('select id from oven where id = $1', [oven.id])).toHaveLength(1);
  });
});

/**
 * A workspace with an assistant and a week baking two of the factory tray on its prep day, 2026-01-04 (egg-slab,
 * 350 °F, 25–30 min, its own values; the default egg-slab rule: hands-on 10 min).
 */
const twoTrayWeek = () => twoTrayWeekOf(app);

describe('the bake run of a prep week', () => {
  it('plans the week’s tray counts in the workspace ovens; settings with a version; PDF and iCal', async () => {
    const { coach, assistant, tray, week } = await twoTrayWeek();

    const empty = await assistant.agent.get(`/api/weeks/${week.id}/bake-run`).expect(200);
    expect(empty.body.run).toBeNull();
    expect(empty.body.problems.join(' ')).toMatch(/oven/i);
    await coach.agent.get(`/api/weeks/${week.id}/bake-run.pdf`).expect(409);

    const oven = await makeOven(coach, { name: 'Left', racks: 2, traysPerRack: 1 });
    const got = await assistant.agent.get(`/api/weeks/${week.id}/bake-run`).expect(200);
    expect(got.body.settings).toEqual({ prepDate: '2026-01-04', start: '2026-01-04T08:00', cooks: 1, handsOnMinutes: {}, ovenIds: [], done: null, version: null });
    expect(got.body.trays).toEqual([expect.objectContaining({ trayId: tray.id, trayCount: 2, tempF: 350, minMinutes: 25, handsOnMinutes: 10 })]);
    // Worked by hand: one cook preps 10 + 10 min (ready 08:10 and 08:20); preheat ceil(280 / 25) = 12 min.
    // Tray 1 in 08:12. Tray 2 in 08:20: both in, each progresses 1 / (1 + 0.10) per minute (crowding +10 %,
    // common practice, no source). Tray 1 has 8 min by 08:20 and needs 17 more → 18.7 → out at the first whole
    // minute 08:39; tray 2 has 19 × 1/1.1 = 17.27 by 08:39, then 7.73 alone → out 08:47. Session 47 min.
    expect(got.body.run.trays).toHaveLength(2);
    expect(got.body.run.sessionMinutes).toBe(47);
    expect(got.body.run.trays.map((t: { inAt: string; outAt: string }) => [t.inAt, t.outAt])).toEqual([
      ['2026-01-04T08:12', '2026-01-04T08:39'],
      ['2026-01-04T08:20', '2026-01-04T08:47'],
    ]);

    const settings = { start: '2026-01-04T09:30', cooks: 2, handsOnMinutes: { [String(tray.id)]: 0 }, ovenIds: [oven.id] };
    await assistant.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send(settings).expect(403);
    const saved = await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send(settings).expect(200);
    expect(saved.body.settings).toMatchObject({ start: '2026-01-04T09:30', cooks: 2, version: 1 });
    // No hands-on: both in at 09:42 (preheat 12 min), 25 min × 1.1 crowded = 27.5 → out 10:10 (first whole minute).
    expect(saved.body.run.sessionMinutes).toBe(40);
    await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send(settings).expect(409);
    const stale = await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ ...settings, version: 7 }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 1 });
    await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ ...settings, cooks: 1, version: 1 }).expect(200);
    const [row] = await sql<{ cooks: number; version: number; oven_ids: number[] }>(
      'select cooks, version, oven_ids from bake_run_setting where week_id = $1',
      [week.id],
    );
    expect(row).toEqual({ cooks: 1, version: 2, oven_ids: [oven.id] });
    const badOven = await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ ...settings, ovenIds: [999999], version: 2 }).expect(400);
    expect(Object.keys(badOven.body.errors)).toEqual(['ovenIds']);
    await coach.agent.get(`/api/weeks/${week.id}/bake-run?prepDate=2026-01-09`).expect(400);

    // A start on another day than the prep day is refused, naming the field.
    const otherDay = await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ ...settings, start: '2026-01-05T09:30', version: 2 }).expect(400);
    expect(Object.keys(otherDay.body.errors)).toEqual(['start']);

    const pdf = await assistant.agent.get(`/api/weeks/${week.id}/bake-run.pdf`).buffer(true).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(Buffer.from(pdf.body).subarray(0, 5).toString()).toBe('%PDF-');
    // The title names the prep day as people write it (Sunday, January 4, 2026), not as an ISO date.
    const parser = new PDFParse({ data: new Uint8Array(Buffer.from(pdf.body)) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('prep Sun, Jan 4');
    expect(text).not.toContain('prep 2026-01-04');
    expect(text).toContain('Preheat to 350 °F (177 °C)');
    // Downloaded by someone who reads °C (their own setting): °C first (350 °F = 177 °C, NIST SP 811), and the cooling
    // columns' heads in °C (FDA Food Code §3-501.14 pairs 70 °F with 21 °C and 41 °F with 5 °C).
    await assistant.agent.patch('/api/auth/me').send({ tempUnit: 'C' }).expect(200);
    const inC = await assistant.agent.get(`/api/weeks/${week.id}/bake-run.pdf`).buffer(true).expect(200);
    const cParser = new PDFParse({ data: new Uint8Array(Buffer.from(inC.body)) });
    const cText = (await cParser.getText()).text.replace(/\s+/g, ' ');
    await cParser.destroy();
    expect(cText).toContain('Preheat to 177 °C (350 °F)');
    expect(cText).toContain('21 °C by 5 °C by');
    const cIcs = await assistant.agent.get(`/api/weeks/${week.id}/bake-run.ics`).expect(200);
    expect(cIcs.text).toContain('SUMMARY:Preheat Left to 177 °C (350 °F)');
    // The coach's own download keeps their °F.
    const coachPdf = await coach.agent.get(`/api/weeks/${week.id}/bake-run.pdf`).buffer(true).expect(200);
    const fParser = new PDFParse({ data: new Uint8Array(Buffer.from(coachPdf.body)) });
    expect((await fParser.getText()).text.replace(/\s+/g, ' ')).toContain('70 °F by 41 °F by');
    await fParser.destroy();
    const ics = await coach.agent.get(`/api/weeks/${week.id}/bake-run.ics`).expect(200);
    expect(ics.text).toContain('SUMMARY:Preheat Left to 350 °F (177 °C)');
    expect(ics.headers['content-type']).toMatch(/text\/calendar/);
    // RFC 5545 floating local times: preheat at 09:30 (just in time for the 09:42 start).
    expect(ics.text).toMatch(/BEGIN:VCALENDAR/);
    expect(ics.text).toMatch(/DTSTART:20260104T093000/);
    expect(ics.text).toMatch(/BEGIN:VALARM/);
  });
});

describe('a prep day moved on the week', () => {
  it('takes its saved bake-run settings along (the start at the same clock time), even when both days move onto each other’s dates', async () => {
    const { coach, week } = await twoTrayWeek();
    const oven = await makeOven(coach, { name: 'Left', racks: 2, traysPerRack: 1 });
    const saved = { start: '2026-01-04T09:30', cooks: 2, handsOnMinutes: {}, ovenIds: [oven.id] };
    await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send(saved).expect(200);
    const weekVersion = async () => (await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body.week.version as number;
    const settingsOn = async (prepDate: string) => (await coach.agent.get(`/api/weeks/${week.id}/bake-run?prepDate=${prepDate}`).expect(200)).body.settings;

    // Sunday's prep moved to Saturday: the kitchen's cooks and oven come along, the start on Saturday at 09:30.
    await coach.agent.patch(`/api/weeks/${week.id}`).send({ version: await weekVersion(), prepDate: '2026-01-03' }).expect(200);
    expect(await settingsOn('2026-01-03')).toMatchObject({ start: '2026-01-03T09:30', cooks: 2, ovenIds: [oven.id] });
    // Moved is changed: a page still holding the version from before is told (409), never overwrites it.
    await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ ...saved, start: '2026-01-03T10:00', version: 1 }).expect(409);

    // A second prep day with its own settings; then Saturday and Wednesday move to Wednesday and Friday in one edit.
    await coach.agent.patch(`/api/weeks/${week.id}`).send({ version: await weekVersion(), secondPrepDate: '2026-01-07' }).expect(200);
    await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ ...saved, prepDate: '2026-01-07', start: '2026-01-07T14:00', cooks: 3 }).expect(200);
    await coach.agent.patch(`/api/weeks/${week.id}`).send({ version: await weekVersion(), prepDate: '2026-01-07', secondPrepDate: '2026-01-09' }).expect(200);
    expect(await settingsOn('2026-01-07')).toMatchObject({ start: '2026-01-07T09:30', cooks: 2 });
    expect(await settingsOn('2026-01-09')).toMatchObject({ start: '2026-01-09T14:00', cooks: 3 });

    // The second prep day dropped: its settings go (the first keeps its own).
    await coach.agent.patch(`/api/weeks/${week.id}`).send({ version: await weekVersion(), secondPrepDate: null }).expect(200);
    expect(await sql('select prep_date, cooks from bake_run_setting where week_id = $1', [week.id])).toEqual([{ prep_date: '2026-01-07', cooks: 2 }]);
  });
});

describe('moving a run to the time the kitchen really started', () => {
  it('the assistant moves the start on prep day; the plan shifts, the other settings stay, a stale version is a 409', async () => {
    const { coach, assistant, week } = await twoTrayWeek();
    await makeOven(coach, { name: 'Left', racks: 2, traysPerRack: 1 });

    // No settings saved yet: the move creates them with the defaults (one cook, every oven, the rules' hands-on).
    const moved = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ prepDate: '2026-01-04', start: '2026-01-04T08:40' }).expect(200);
    expect(moved.body.settings).toEqual({ prepDate: '2026-01-04', start: '2026-01-04T08:40', cooks: 1, handsOnMinutes: {}, ovenIds: [], done: null, version: 1 });
    // The worked example of the test above (start 08:00: in 08:12 and 08:20, out 08:39 and 08:47), 40 minutes later.
    expect(moved.body.run.trays.map((t: { inAt: string; outAt: string }) => [t.inAt, t.outAt])).toEqual([
      ['2026-01-04T08:52', '2026-01-04T09:19'],
      ['2026-01-04T09:00', '2026-01-04T09:27'],
    ]);
    expect(moved.body.run.sessionMinutes).toBe(47);

    // The coach's cooks stay when the start moves again.
    await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ start: '2026-01-04T08:40', cooks: 2, version: 1 }).expect(200);
    const again = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ start: '2026-01-04T09:05', version: 2 }).expect(200);
    expect(again.body.settings).toMatchObject({ start: '2026-01-04T09:05', cooks: 2, version: 3 });

    // A stale version (someone moved it meanwhile), or none while settings exist: 409 with the current settings.
    const stale = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ start: '2026-01-04T09:10', version: 2 }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 3, current: { start: '2026-01-04T09:05' } });
    await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ start: '2026-01-04T09:10' }).expect(409);
    // Another day, a prep day the week does not have, a start that is not a time: 400 naming the field.
    const otherDay = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ start: '2026-01-05T09:10', version: 3 }).expect(400);
    expect(Object.keys(otherDay.body.errors)).toEqual(['start']);
    expect(otherDay.body.errors.start[0]).toMatch(/Sunday, January 4, 2026/);
    const badDay = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ prepDate: '2026-01-06', start: '2026-01-06T09:10', version: 3 }).expect(400);
    expect(Object.keys(badDay.body.errors)).toEqual(['prepDate']);
    const notTime = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ start: 'nine', version: 3 }).expect(400);
    expect(Object.keys(notTime.body.errors)).toEqual(['start']);
    const [row] = await sql<{ start: string; cooks: number; version: number }>('select start, cooks, version from bake_run_setting where week_id = $1', [week.id]);
    expect(row).toEqual({ start: '2026-01-04T09:05', cooks: 2, version: 3 });
  });
});

describe('the kitchen as it is on prep day', () => {
  it('the assistant takes a broken oven out and sets the cooks who came; the start stays; bad input and stale versions change nothing', async () => {
    const { coach, assistant, tray, week } = await twoTrayWeek();
    const left = await makeOven(coach, { name: 'Left', racks: 2, traysPerRack: 1 });
    const right = await makeOven(coach, { name: 'Right', racks: 2, traysPerRack: 1 });
    const planned = await coach.agent
      .put(`/api/weeks/${week.id}/bake-run/settings`)
      .send({ start: '2026-01-04T08:00', cooks: 2, handsOnMinutes: { [String(tray.id)]: 10 }, ovenIds: [] })
      .expect(200);
    // Worked by hand (rules as in the first test): two cooks prep both trays by 08:10, both ovens preheat 12 min:
    // one tray in each oven at 08:12, 25 min uncrowded → out 08:37, a 37-minute session.
    expect(planned.body.run.sessionMinutes).toBe(37);
    expect(planned.body.run.ovens.filter((o: { setPoints: unknown[] }) => o.setPoints.length).map((o: { name: string }) => o.name).sort()).toEqual(['Left', 'Right']);

    // Prep day: the right oven is out of order. Both trays go into the left one at 08:12, crowded (+10 %, common
    // practice, no source): 25 × 1.1 = 27.5 min → out at the first whole minute, 08:40.
    const down = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 2, ovenIds: [left.id], version: 1 }).expect(200);
    expect(down.body.settings).toMatchObject({ start: '2026-01-04T08:00', cooks: 2, ovenIds: [left.id], handsOnMinutes: { [String(tray.id)]: 10 }, version: 2 });
    expect(down.body.ovens.map((o: { name: string }) => o.name)).toEqual(['Left']);
    expect(down.body.run.sessionMinutes).toBe(40);
    expect(down.body.run.trays.map((t: { inAt: string; outAt: string }) => [t.inAt, t.outAt])).toEqual([
      ['2026-01-04T08:12', '2026-01-04T08:40'],
      ['2026-01-04T08:12', '2026-01-04T08:40'],
    ]);

    // The oven is mended: every oven is stored as "every oven" (an oven added later counts too).
    const mended = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 2, ovenIds: [right.id, left.id], version: 2 }).expect(200);
    expect(mended.body.settings).toMatchObject({ ovenIds: [], version: 3 });

    // No oven, an oven of no one's, no cooks: 400 naming the field; a stale version: 409 with the current settings.
    const none = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 2, ovenIds: [], version: 3 }).expect(400);
    expect(none.body.errors.ovenIds).toEqual(['At least one oven has to work to bake.']);
    const unknown = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 2, ovenIds: [999999], version: 3 }).expect(400);
    expect(Object.keys(unknown.body.errors)).toEqual(['ovenIds']);
    const noCook = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 0, ovenIds: [left.id], version: 3 }).expect(400);
    expect(Object.keys(noCook.body.errors)).toEqual(['cooks']);
    const stale = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 1, ovenIds: [left.id], version: 2 }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 3, current: { cooks: 2, ovenIds: [] } });
    const [row] = await sql<{ cooks: number; oven_ids: number[]; version: number }>('select cooks, oven_ids, version from bake_run_setting where week_id = $1', [week.id]);
    expect(row).toEqual({ cooks: 2, oven_ids: [], version: 3 });
  });
});

type PlannedTray = { id: string; oven: string; inAt: string; outAt: string };
const timesOf = (trays: PlannedTray[]) => trays.map((t) => [t.id, t.oven, t.inAt, t.outAt]);

/**
 * Two trays, two one-place ovens ("Left", "Right"), one cook, from 08:00 (settings version 1). Worked by hand in the
 * first test below: the first tray 08:12–08:37 in one oven, the second 08:20–08:45 in the other.
 */
async function twoOvenDay() {
  const day = await twoTrayWeek();
  const ovens = [await makeOven(day.coach, { name: 'Left', racks: 1, traysPerRack: 1 }), await makeOven(day.coach, { name: 'Right', racks: 1, traysPerRack: 1 })];
  const planned = await day.coach.agent.put(`/api/weeks/${day.week.id}/bake-run/settings`).send({ start: '2026-01-04T08:00', cooks: 1, ovenIds: [] }).expect(200);
  const [first, second] = planned.body.run.trays as PlannedTray[];
  return { ...day, ovens, planned, first, second };
}

describe('planning the rest of the day again part-way through', () => {
  it('keeps the trays already out as planned, with their cooling deadlines, and plans the rest from the time given', async () => {
    const { coach, assistant, tray, week, planned, ovens: [left, right] } = await twoOvenDay();
    // Worked by hand (rules as in the first test: 350 °F, 25 min, hands-on 10 min, preheat ceil(280 / 25) = 12 min),
    // one tray per oven: the cook preps the first tray 08:00–08:10 and the second 08:10–08:20; the first goes in at
    // 08:12 (its oven ready), out 08:37; the second in the other oven at 08:20, out 08:45.
    const before: PlannedTray[] = planned.body.run.trays;
    expect(before.map((t) => [t.inAt, t.outAt])).toEqual([
      ['2026-01-04T08:12', '2026-01-04T08:37'],
      ['2026-01-04T08:20', '2026-01-04T08:45'],
    ]);
    const [first, second] = before;
    expect(first.id).not.toBe(second.id);

    // 08:40: the second tray's oven fails with the tray in it (spoiled); the first tray came out at 08:37.
    const working = second.oven === 'Left' ? right : left;
    const again = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds: [working.id], out: [first.id], from: '2026-01-04T08:40', version: 1 })
      .expect(200);
    expect(again.body.settings).toMatchObject({ start: '2026-01-04T08:00', done: { from: '2026-01-04T08:40', out: [first.id] }, version: 2 });
    // The first tray as it was; the second from 08:40 in the working oven: prepped again 08:40–08:50, the oven
    // preheated from cold (12 min) → in at 08:52, out 09:17, 77 minutes after the day's start.
    const run = again.body.run;
    expect(run.start).toBe('2026-01-04T08:00');
    expect(timesOf(run.trays)).toEqual([
      [first.id, first.oven, '2026-01-04T08:12', '2026-01-04T08:37'],
      [second.id, working.name, '2026-01-04T08:52', '2026-01-04T09:17'],
    ]);
    expect(run.trays.map((t: { inMinute: number; outMinute: number }) => [t.inMinute, t.outMinute])).toEqual([
      [12, 37],
      [52, 77],
    ]);
    expect(run).toMatchObject({ sessionMinutes: 77, endAt: '2026-01-04T09:17' });
    // The lower bound is the rest's own, counted from 08:40: the planner's bound for that one tray alone from 08:40.
    const t = again.body.trays[0];
    const alone = await coach.agent
      .post('/api/calc/bake-run')
      .send({
        start: '2026-01-04T08:40',
        cooks: 1,
        ambientF: 70,
        ovens: [ovenInput({ name: working.name, racks: 1, traysPerRack: 1 })],
        trays: [{ id: 'rest', name: 'rest', tempF: t.tempF, minMinutes: t.minMinutes, maxMinutes: t.maxMinutes, handsOnMinutes: t.handsOnMinutes }],
      })
      .expect(200);
    expect(alone.body.sessionMinutes).toBe(37);
    expect(run.lowerBoundMinutes).toBe(40 + alone.body.lowerBoundMinutes);
    expect(run.gapPct).toBe(Number((((77 - run.lowerBoundMinutes) / run.lowerBoundMinutes) * 100).toFixed(1)));
    // The kept tray's cooling deadlines still run: 135 → 70 °F within 2 h and → 41 °F within 6 h of coming out
    // (FDA Food Code 2022 §3-501.14(A)).
    const deadlines = run.events
      .filter((e: { trayId: string; kind: string }) => e.trayId === first.id && (e.kind === 'cool-to-70-by' || e.kind === 'fridge-41-by'))
      .map((e: { kind: string; at: string; minute: number }) => [e.kind, e.at, e.minute]);
    expect(deadlines).toEqual([
      ['cool-to-70-by', '2026-01-04T10:37', 157],
      ['fridge-41-by', '2026-01-04T14:37', 397],
    ]);
    // The first tray baked in the oven still working (the other had the second tray); the words say what happened.
    expect(first.oven).toBe(working.name);
    expect(run.ovens.map((o: { name: string }) => o.name)).toEqual([working.name]);
    expect(run.cautions[0]).toMatch(/^Planned again from 08:40: 1 tray already out is kept as planned/);
    const minutes = run.events.map((e: { minute: number }) => e.minute);
    expect(minutes).toEqual([...minutes].sort((a, b) => a - b));
    // The run sheet PDF and the calendar follow.
    const pdf = await assistant.agent.get(`/api/weeks/${week.id}/bake-run.pdf`).buffer(true).expect(200);
    const parser = new PDFParse({ data: new Uint8Array(Buffer.from(pdf.body)) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('Planned again at 08:40: one tray already out is kept as planned, with their cooling deadlines; the one tray still to bake is planned from 08:40.');
    const ics = await coach.agent.get(`/api/weeks/${week.id}/bake-run.ics`).expect(200);
    expect(ics.text).toContain('SUMMARY:Preheat Left to 350 °F (177 °C)');
    expect(ics.text).toMatch(/DTSTART:20260104T085200/);
    expect(ics.text).toMatch(/DTSTART:20260104T081200/);
    // Another read gives the same plan (it is stored, not kept in the process).
    const read = await coach.agent.get(`/api/weeks/${week.id}/bake-run`).expect(200);
    expect(timesOf(read.body.run.trays)).toEqual(timesOf(run.trays));

    // Refused, nothing written: no time for the rest, a time on another day or before the start, a tray the run
    // does not have, and moving the day's start past the rest's.
    const noFrom = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 1, ovenIds: [working.id], out: [first.id], version: 2 }).expect(400);
    expect(Object.keys(noFrom.body.errors)).toEqual(['from']);
    const otherDay = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds: [working.id], out: [first.id], from: '2026-01-05T08:40', version: 2 })
      .expect(400);
    expect(Object.keys(otherDay.body.errors)).toEqual(['from']);
    const early = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds: [working.id], out: [first.id], from: '2026-01-04T07:40', version: 2 })
      .expect(400);
    expect(early.body.errors.from[0]).toMatch(/starts at 08:00/);
    const stranger = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds: [working.id], out: [`${tray.id}-9`], from: '2026-01-04T08:40', version: 2 })
      .expect(400);
    expect(stranger.body.errors.out[0]).toMatch(new RegExp(`No tray ${tray.id}-9`));
    const badId = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 1, ovenIds: [working.id], out: ['first'], from: '2026-01-04T08:40', version: 2 }).expect(400);
    expect(Object.keys(badId.body.errors)).toEqual(['out.0']);
    const late = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/start`).send({ start: '2026-01-04T08:45', version: 2 }).expect(400);
    expect(late.body.errors.start[0]).toMatch(/08:40 at the latest/);
    await coach.agent.put(`/api/weeks/${week.id}/bake-run/settings`).send({ start: '2026-01-04T08:45', cooks: 1, version: 2 }).expect(400);
    const [row] = await sql<{ version: number; done: { from: string } }>('select version, done from bake_run_setting where week_id = $1', [week.id]);
    expect(row).toMatchObject({ version: 2, done: { from: '2026-01-04T08:40' } });

    // Without `out`, what was said stays (a cook arrives: two cooks now).
    const cook = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 2, ovenIds: [working.id], version: 2 }).expect(200);
    expect(cook.body.settings.done).toEqual({ from: '2026-01-04T08:40', out: [first.id] });

    // Both out (09:17): the day's plan is what happened, the cooling deadlines of both still counted.
    const all = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 2, ovenIds: [working.id], out: [first.id, second.id], from: '2026-01-04T09:20', version: 3 })
      .expect(200);
    expect(timesOf(all.body.run.trays)).toEqual(timesOf(run.trays));
    expect(all.body.run.cautions[0]).toMatch(/^Every tray is out of the oven: 2 trays already out are kept as planned/);
    expect(all.body.run.events.filter((e: { kind: string }) => e.kind === 'fridge-41-by')).toHaveLength(2);
    expect(all.body.run.sessionMinutes).toBe(77);

    // The coach lowers the tray count to one: the second tray is neither baked nor counted as out any more.
    const board = (await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body;
    await coach.agent
      .put(`/api/weeks/${week.id}/trays`)
      .send({ version: board.week.version, trays: [{ trayId: tray.id, prepDate: '2026-01-04', trayCount: 1 }] })
      .expect(200);
    const fewer = await assistant.agent.get(`/api/weeks/${week.id}/bake-run`).expect(200);
    expect(fewer.body.settings.done).toEqual({ from: '2026-01-04T09:20', out: [`${tray.id}-1`] });
    expect(fewer.body.run.trays.map((t: PlannedTray) => t.id)).toEqual([`${tray.id}-1`]);

    // `out: []`: the whole day planned from its start again, with the kitchen as it is now.
    const fresh = await assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 2, ovenIds: [left.id, right.id], out: [], version: 4 }).expect(200);
    expect(fresh.body.settings).toMatchObject({ done: null, ovenIds: [], version: 5 });
    expect(fresh.body.run.trays.every((t: PlannedTray) => t.inAt < '2026-01-04T08:40')).toBe(true);
  });

  it('an oven still at its set point when the rest starts is not preheated again', async () => {
    const { assistant, week, first, second, ovens } = await twoOvenDay();
    const working = ovens.find((o) => o.name === first.oven)!;

    // 08:30: the second tray's oven fails with it inside; the first stays in its oven until 08:37, so the rest is
    // planned from 08:37, when that oven is still at 350 °F. Worked by hand: the second tray is prepped again
    // 08:37–08:47 and goes straight in (no preheat: cold, it would wait for ceil(280 / 25) = 12 minutes, until 08:49),
    // out at 08:47 + 25 = 09:12.
    const hot = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds: [working.id], out: [first.id], from: '2026-01-04T08:37', version: 1 })
      .expect(200);
    expect(timesOf(hot.body.run.trays)).toEqual([
      [first.id, first.oven, '2026-01-04T08:12', '2026-01-04T08:37'],
      [second.id, first.oven, '2026-01-04T08:47', '2026-01-04T09:12'],
    ]);
    const setPoints = hot.body.run.ovens.find((o: { name: string }) => o.name === first.oven).setPoints;
    expect(setPoints).toEqual([expect.objectContaining({ tempF: 350, fromF: 350, changeAt: '2026-01-04T08:37', readyAt: '2026-01-04T08:37' })]);
    expect(hot.body.run.events.some((e: { kind: string }) => e.kind === 'preheat')).toBe(false);
    expect(hot.body.run.cautions[0]).toContain(`${first.oven} from 350 °F (177 °C) (on at that time), any other oven from cold`);
  });

  it('a tray that came out at another time keeps that time, and its cooling deadlines count from it', async () => {
    const { assistant, week, first, second, ovens } = await twoOvenDay();
    const ovenIds = ovens.map((o) => o.id);
    const send = (body: Record<string, unknown>) => assistant.agent.put(`/api/weeks/${week.id}/bake-run/kitchen`).send({ cooks: 1, ovenIds, from: '2026-01-04T08:50', version: 1, ...body });

    // Refused, naming the tray's time: a tray not ticked as out, a time before it went in (08:12), another day.
    const notOut = await send({ out: [first.id], outAt: { [second.id]: '2026-01-04T08:48' } }).expect(400);
    expect(Object.keys(notOut.body.errors)).toEqual([`outAt.${second.id}`]);
    const beforeIn = await send({ out: [first.id], outAt: { [first.id]: '2026-01-04T08:05' } }).expect(400);
    expect(beforeIn.body.errors[`outAt.${first.id}`][0]).toMatch(/went in at 08:12/);
    await send({ out: [first.id], outAt: { [first.id]: '2026-01-05T08:41' } }).expect(400);

    // The first tray came out at 08:41, four minutes after its planned 08:37: in at 08:12 still, 29 minutes in, and
    // its cooling deadlines 2 h and 6 h after 08:41 (FDA Food Code §3-501.14), not after 08:37.
    const moved = await send({ out: [first.id], outAt: { [first.id]: '2026-01-04T08:41' } }).expect(200);
    const kept = moved.body.run.trays.find((t: PlannedTray) => t.id === first.id);
    expect(kept).toMatchObject({ inAt: '2026-01-04T08:12', outAt: '2026-01-04T08:41', inMinute: 12, outMinute: 41, bakeMinutes: 29 });
    const steps = moved.body.run.events
      .filter((e: { trayId: string }) => e.trayId === first.id)
      .map((e: { kind: string; at: string }) => [e.kind, e.at.slice(11)]);
    expect(steps).toEqual(
      expect.arrayContaining([
        ['tray-in', '08:12'],
        ['tray-out', '08:41'],
        ['cool-to-70-by', '10:41'],
        ['fridge-41-by', '14:41'],
      ]),
    );
    // Said again later (the same time), nothing moves further.
    const again = await send({ out: [first.id], outAt: { [first.id]: '2026-01-04T08:41' }, version: 2 }).expect(200);
    expect(again.body.run.trays.find((t: PlannedTray) => t.id === first.id).outAt).toBe('2026-01-04T08:41');
  });

  it('a tray the cooling record has out at another time keeps that time when the rest is planned again', async () => {
    const { assistant, week, first, ovens } = await twoOvenDay();
    const ovenIds = ovens.map((o) => o.id);
    // Written down as out at 08:33, four minutes before its planned 08:37 (taken out early: it was done).
    await assistant.agent.put(`/api/weeks/${week.id}/bake-run/cooling/${first.id}`).send({ outAt: '2026-01-04T08:33' }).expect(200);
    const planned = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds, out: [first.id], from: '2026-01-04T08:50', version: 1 })
      .expect(200);
    // Its deadlines run from 08:33 (FDA Food Code §3-501.14: 2 h to 70 °F, 6 h to 41 °F), not from the planned 08:37.
    expect(planned.body.run.trays.find((t: PlannedTray) => t.id === first.id)).toMatchObject({ inAt: '2026-01-04T08:12', outAt: '2026-01-04T08:33' });
    const deadlines = planned.body.run.events
      .filter((e: { trayId: string; kind: string }) => e.trayId === first.id && /cool-to|fridge/.test(e.kind))
      .map((e: { kind: string; at: string }) => [e.kind, e.at.slice(11)]);
    expect(deadlines).toEqual([
      ['cool-to-70-by', '10:33'],
      ['fridge-41-by', '14:33'],
    ]);
    // A time given with the change wins over the record's.
    const given = await assistant.agent
      .put(`/api/weeks/${week.id}/bake-run/kitchen`)
      .send({ cooks: 1, ovenIds, out: [first.id], from: '2026-01-04T08:50', outAt: { [first.id]: '2026-01-04T08:35' }, version: 2 })
      .expect(200);
    expect(given.body.run.trays.find((t: PlannedTray) => t.id === first.id).outAt).toBe('2026-01-04T08:35');
  });
});

