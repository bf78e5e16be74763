import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, member, twoTrayWeek as twoTrayWeekOf } from '../support/factories.js';
import { sql } from '../support/db.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

/** A week whose first prep day (Sun Jan 4, 2026) bakes two trays of one base tray, a client, and its record's path. */
async function twoTrayWeek() {
  const day = await twoTrayWeekOf(app);
  const client = await member(app, day.coach, 'client');
  return { ...day, client, base: `/api/weeks/${day.week.id}/bake-run/cooling` };
}

describe('the cooling record of a prep day', () => {
  it('the assistant writes down a tray out, then its readings; °C readings are kept in °F; a stale version is a 409', async () => {
    const { assistant, coach, tray, week, base } = await twoTrayWeek();
    expect((await assistant.agent.get(base).expect(200)).body).toEqual({ weekId: week.id, prepDate: '2026-01-04', records: [], timeZone: null });

    const first = await assistant.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:10' }).expect(200);
    expect(first.body).toMatchObject({
      runTrayId: `${tray.id}-2`,
      trayName: `${tray.name} (2/2)`,
      outAt: '2026-01-04T10:10',
      restartedAt: null,
      readings: [],
      discarded: false,
      version: 1,
    });
    expect(first.body.recordedBy).toBeTruthy();

    // 21 °C = 69.8 °F and 4.5 °C = 40.1 °F (NIST SP 811: °F = °C × 9/5 + 32).
    const readings = [
      { at: '2026-01-04T11:40', tempC: 21 },
      { at: '2026-01-04T14:00', tempC: 4.5 },
    ];
    const second = await coach.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:10', readings, version: 1 }).expect(200);
    expect(second.body.readings).toEqual([
      { at: '2026-01-04T11:40', tempF: 69.8 },
      { at: '2026-01-04T14:00', tempF: 40.1 },
    ]);
    expect(second.body.version).toBe(2);

    // Someone else's older copy: refused, nothing changed, the current record in the answer.
    const stale = await assistant.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:20', version: 1 }).expect(409);
    expect(stale.body).toMatchObject({ code: 'stale_version', currentVersion: 2, current: { outAt: '2026-01-04T10:10' } });
    // Writing again as if first (no version) is a 409 too: the record exists.
    await assistant.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:20' }).expect(409);

    const list = await assistant.agent.get(`${base}?prepDate=2026-01-04`).expect(200);
    expect(list.body.records).toHaveLength(1);
    expect(list.body.records[0]).toMatchObject({ outAt: '2026-01-04T10:10', version: 2 });
  });

  it('bad input is a 400 naming the field, and nothing is written', async () => {
    const { assistant, tray, base } = await twoTrayWeek();
    const bad = async (body: object, field: string, id = `${tray.id}-1`) => {
      const res = await assistant.agent.put(`${base}/${id}`).send(body).expect(400);
      expect(Object.keys(res.body.errors)).toContain(field);
    };
    await bad({}, 'outAt');
    await bad({ outAt: '2026-01-04 10:10' }, 'outAt');
    // Out on another day than the prep day.
    await bad({ outAt: '2026-01-05T10:10' }, 'outAt');
    // A reading before the tray came out, one with no temperature, one with both scales, one off the thermometer.
    await bad({ outAt: '2026-01-04T10:10', readings: [{ at: '2026-01-04T09:00', tempF: 100 }] }, 'readings.0.at');
    await bad({ outAt: '2026-01-04T10:10', readings: [{ at: '2026-01-04T11:00' }] }, 'readings.0.tempF');
    await bad({ outAt: '2026-01-04T10:10', readings: [{ at: '2026-01-04T11:00', tempF: 60, tempC: 15 }] }, 'readings.0.tempF');
    await bad({ outAt: '2026-01-04T10:10', readings: [{ at: '2026-01-04T11:00', tempF: 900 }] }, 'readings.0.tempF');
    await bad({ outAt: '2026-01-04T10:10', restartedAt: '2026-01-04T09:00' }, 'restartedAt');
    await bad({ outAt: '2026-01-04T10:10', note: 'x'.repeat(501) }, 'note');
    await bad({ outAt: '2026-01-04T10:10', prepDate: '2026-01-09' }, 'prepDate');
    await bad({ outAt: '2026-01-04T10:10' }, 'runTrayId', 'first');
    const [{ n }] = await sql<{ n: string }>('select count(*) as n from cooling_record where week_id = (select week_id from week_tray where tray_id = $1 limit 1)', [tray.id]);
    expect(Number(n)).toBe(0);
  });

  it('a tray the run does not bake is a 404; another workspace sees none of it; a client is refused', async () => {
    const { assistant, client, tray, base } = await twoTrayWeek();
    // Two trays are baked: a third is not in the run.
    await assistant.agent.put(`${base}/${tray.id}-3`).send({ outAt: '2026-01-04T10:10' }).expect(404);
    await assistant.agent.put(`${base}/${tray.id}-1`).send({ outAt: '2026-01-04T10:10' }).expect(200);
    const other = await coachWorkspace(app);
    await other.agent.get(base).expect(404);
    await other.agent.put(`${base}/${tray.id}-1`).send({ outAt: '2026-01-04T10:30', version: 1 }).expect(404);
    await client.agent.get(base).expect(403);
    const [row] = await sql<{ out_at: string }>('select out_at from cooling_record where run_tray_id = $1', [`${tray.id}-1`]);
    expect(row.out_at).toBe('2026-01-04T10:10');
  });

  it('a record written by mistake is cleared with its version; a stale one stays', async () => {
    const { assistant, tray, base } = await twoTrayWeek();
    await assistant.agent.put(`${base}/${tray.id}-1`).send({ outAt: '2026-01-04T10:10' }).expect(200);
    await assistant.agent.delete(`${base}/${tray.id}-1?version=2`).expect(409);
    const noVersion = await assistant.agent.delete(`${base}/${tray.id}-1`).expect(400);
    expect(Object.keys(noVersion.body.errors)).toEqual(['version']);
    expect(noVersion.body.errors.version[0]).toMatch(/^Give the version of the record you read/);
    await assistant.agent.delete(`${base}/${tray.id}-1?version=1`).expect(204);
    expect((await assistant.agent.get(base).expect(200)).body.records).toEqual([]);
    await assistant.agent.delete(`${base}/${tray.id}-1?version=1`).expect(404);
  });

  it('the coach’s glance names the trays thrown away and those whose readings missed a deadline', async () => {
    const { assistant, coach, tray, base } = await twoTrayWeek();
    const today = '2026-01-05';
    expect((await coach.agent.get(`/api/weeks/glance?today=${today}`).expect(200)).body.cooling).toEqual({ thrownAway: [], missed: [] });
    await assistant.agent.put(`${base}/${tray.id}-1`).send({ outAt: '2026-01-04T10:00', discarded: true }).expect(200);
    // 75 °F at 12:30, past 12:10 (2 h after 10:10): FDA Food Code §3-501.14's first stage is missed on paper.
    await assistant.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:10', readings: [{ at: '2026-01-04T12:30', tempF: 75 }] }).expect(200);
    const glance = await coach.agent.get(`/api/weeks/glance?today=${today}`).expect(200);
    expect(glance.body.cooling).toEqual({
      thrownAway: [{ trayName: `${tray.name} (1/2)`, prepDate: '2026-01-04' }],
      missed: [{ trayName: `${tray.name} (2/2)`, prepDate: '2026-01-04' }],
    });
  });

  it('a tray written down as thrown away, or kept after all, is e-mailed to each coach who did not write it, once a change', async () => {
    const { assistant, coach, tray, week, base } = await twoTrayWeek();
    const second = await member(app, coach, 'coach');
    // The second coach reads °C (their own setting).
    await second.agent.patch('/api/auth/me').send({ tempUnit: 'C' }).expect(200);
    type Row = { to: string; subject: string; text: string; html: string };
    const mails = () =>
      sql<Row>(`select "to", subject, text, html from outbox where week_id = $1 and kind = 'cooling-record' order by id`, [week.id]);
    const path = `${base}/${tray.id}-1`;
    // Out at 10:10, 75 °F at 12:30: past 12:10, FDA Food Code §3-501.14's first stage (70 °F within 2 hours) missed.
    const reading = [{ at: '2026-01-04T12:30', tempF: 75 }];
    await assistant.agent.put(path).send({ outAt: '2026-01-04T10:10', readings: reading }).expect(200);
    expect(await mails()).toEqual([]);
    await assistant.agent
      .put(path)
      .send({ outAt: '2026-01-04T10:10', readings: reading, discarded: true, note: 'Left on the rack too long.', version: 1 })
      .expect(200);
    const sent = await mails();
    expect(sent.map((m) => m.to).sort()).toEqual([coach.email, second.email].sort());
    for (const m of sent) {
      expect(m.subject).toBe(`${coach.email.split('@')[0]} kitchen: ${tray.name} (1/2) thrown away on prep day Sun, Jan 4`);
      // 75 °F = 23.9 °C, said to the whole degree (NIST SP 811: °C = (°F − 32) × 5/9).
      expect(m.text).toContain('It came out at 10:10.');
      expect(m.text).toContain('Note in the cooling record:\nLeft on the rack too long.');
      expect(m.text).toContain(`/weeks/${week.id}`);
      expect(m.html).toContain('Left on the rack too long.');
    }
    const to = (email: string) => sent.find((m) => m.to === email)!;
    expect(to(coach.email).text).toContain('Temperatures written down: 12:30 75 °F (24 °C).');
    expect(to(coach.email).text).toContain('It was not at 70 °F (21 °C) by 12:10, 2 hours after it came out (FDA Food Code §3-501.14).');
    // The °C reader's, each pair turned round.
    expect(to(second.email).text).toContain('Temperatures written down: 12:30 24 °C (75 °F).');
    expect(to(second.email).text).toContain('It was not at 21 °C (70 °F) by 12:10, 2 hours after it came out (FDA Food Code §3-501.14).');
    expect(to(second.email).html).toContain('12:30 24 °C (75 °F)');
    // A note saved on the thrown-away record changes nothing to tell.
    await assistant.agent
      .put(path)
      .send({ outAt: '2026-01-04T10:10', readings: reading, discarded: true, note: 'Left on the rack.', version: 2 })
      .expect(200);
    expect(await mails()).toHaveLength(2);
    // Kept after all: the coaches are told its portions count again; thrown away again: told again.
    await assistant.agent.put(path).send({ outAt: '2026-01-04T10:10', readings: reading, discarded: false, version: 3 }).expect(200);
    const kept = (await mails()).slice(2);
    expect(kept).toHaveLength(2);
    for (const m of kept) {
      expect(m.subject).toBe(`${coach.email.split('@')[0]} kitchen: ${tray.name} (1/2) not thrown away after all (prep day Sun, Jan 4)`);
      expect(m.text).toContain('Its portions count as baked again.');
    }
    await assistant.agent.put(path).send({ outAt: '2026-01-04T10:10', readings: reading, discarded: true, version: 4 }).expect(200);
    expect((await mails()).filter((m) => m.subject.includes('(1/2) thrown away'))).toHaveLength(4);
    // A coach who throws a tray away is not told of it; the other coach is. Written as thrown away at once: told too.
    await second.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:20', discarded: true }).expect(200);
    const after = await mails();
    expect(after).toHaveLength(7);
    expect(after[6]).toMatchObject({ to: coach.email });
    expect(after[6].text).toContain('No temperature was written down for it.');
    // Cleared as written by mistake and written again: a new record, told again. 65 °F at 11:00 meets the first stage;
    // 50 °F at 16:40 is past 16:20, 6 hours after 10:20: the second stage (41 °F) is missed.
    await second.agent.delete(`${base}/${tray.id}-2?prepDate=2026-01-04&version=1`).expect(204);
    const late = [
      { at: '2026-01-04T11:00', tempF: 65 },
      { at: '2026-01-04T16:40', tempF: 50 },
    ];
    await second.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:20', readings: late, discarded: true }).expect(200);
    const again = await mails();
    expect(again).toHaveLength(8);
    expect(again[7].text).toContain('Temperatures written down: 11:00 65 °F (18 °C); 16:40 50 °F (10 °C).');
    expect(again[7].text).toContain('It was not at 41 °F (5 °C) by 16:20, 6 hours after it came out (FDA Food Code §3-501.14).');
    // The outbox shows it in words of its own.
    const outbox = await coach.agent.get('/api/outbox?kind=cooling-record').expect(200);
    expect(outbox.body.items.map((i: { kind: string }) => i.kind)).toEqual(Array(8).fill('cooling-record'));
  });

  it('a tray thrown away no longer counts as baked on the week board', async () => {
    const { assistant, coach, tray, week, base } = await twoTrayWeek();
    type Tally = { trayId: string; produced: number; lostTrays: number; byPrepDate: { prepDate: string; produced: number; lostTrays: number }[] };
    const inventory = async () => ((await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body.inventory as Tally[]).find((t) => t.trayId === String(tray.id))!;
    const before = await inventory();
    expect(before.lostTrays).toBe(0);
    const perTray = before.produced / 2;
    expect(perTray).toBeGreaterThan(0);
    await assistant.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:10', discarded: true }).expect(200);
    // Two trays baked, one thrown away: one tray's portions left.
    expect(await inventory()).toMatchObject({ produced: perTray, lostTrays: 1, byPrepDate: [{ prepDate: '2026-01-04', produced: perTray, lostTrays: 1 }] });
    // Not thrown away after all: both count again.
    await assistant.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:10', discarded: false, version: 1 }).expect(200);
    expect(await inventory()).toMatchObject({ produced: 2 * perTray, lostTrays: 0 });
  });

  it('a record outlives the week’s tray count going down, and goes with the week', async () => {
    const { coach, assistant, tray, week, base } = await twoTrayWeek();
    await assistant.agent.put(`${base}/${tray.id}-2`).send({ outAt: '2026-01-04T10:10' }).expect(200);
    const [w] = await sql<{ version: number }>('select version from week where id = $1', [week.id]);
    await coach.agent
      .put(`/api/weeks/${week.id}/trays`)
      .send({ version: w.version, trays: [{ trayId: tray.id, prepDate: '2026-01-04', trayCount: 1 }] })
      .expect(200);
    const list = await assistant.agent.get(base).expect(200);
    expect(list.body.records.map((r: { trayName: string }) => r.trayName)).toEqual([`${tray.name} (2/2)`]);
    await coach.agent.delete(`/api/weeks/${week.id}`).expect(204);
    const [{ n }] = await sql<{ n: string }>('select count(*) as n from cooling_record where week_id = $1', [week.id]);
    expect(Number(n)).toBe(0);
  });
});
