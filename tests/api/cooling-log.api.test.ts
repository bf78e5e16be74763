import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import Papa from 'papaparse';
import { testApp } from '../support/test-app.js';
import { makeTray, makeWeek, twoTrayWeek, type Member } from '../support/factories.js';
import { COOLING_LOG_CSV_COLUMNS } from '@server/modules/bake-runs/cooling-log.js';

// The cooling log against FDA Food Code §3-501.14 (cooling): to 70 °F within 2 hours and to 41 °F within 6 hours in
// total, counted from the time out. Temperatures in both scales by NIST SP 811 ((°F − 32) × 5/9): 68 °F = 20 °C,
// 40 °F = 4.4 °C (4 °C rounded), 41 °F = 5 °C, 70 °F = 21.1 °C (21 °C rounded). Trays and times are made up.

let app: Express;
beforeAll(async () => {
  ({ app } = await testApp());
});

const log = (who: Member, query: string) => who.agent.get(`/api/cooling-log${query}`);

/** A second week of the coach's, its prep day Jan 11, 2026, baking one tray of `trayId`. */
async function secondWeek(coach: Member, trayId: number) {
  const { week } = await makeWeek(coach, { startDate: '2026-01-12', prepDate: '2026-01-11' });
  await coach.agent.put(`/api/weeks/${week.id}/trays`).send({ version: week.version, trays: [{ trayId, prepDate: '2026-01-11', trayCount: 1 }] }).expect(200);
  return week;
}

async function kitchenWithRecords() {
  const day = await twoTrayWeek(app);
  const { coach, assistant, tray, week } = day;
  const put = (weekId: number, runTrayId: string, body: Record<string, unknown>) =>
    assistant.agent.put(`/api/weeks/${weekId}/bake-run/cooling/${runTrayId}`).send(body).expect(200);
  // Tray 2 out at 13:10 and cooled in time (68 °F at 14:10, 40 °F at 18:00); tray 1 out at 13:20, 68 °F at 14:20 and
  // nothing after: its 6-hour deadline, 19:20, has long passed.
  await put(week.id, `${tray.id}-2`, {
    outAt: '2026-01-04T13:10',
    readings: [
      { at: '2026-01-04T18:00', tempF: 40 },
      { at: '2026-01-04T14:10', tempF: 68 },
    ],
  });
  await put(week.id, `${tray.id}-1`, { outAt: '2026-01-04T13:20', readings: [{ at: '2026-01-04T14:20', tempF: 68 }], note: '=SUM(1,2)' });
  const other = await secondWeek(coach, tray.id);
  await put(other.id, `${tray.id}-1`, { outAt: '2026-01-11T09:00', discarded: true, note: 'Dropped on the floor' });
  return { ...day, other };
}

describe('the cooling log', () => {
  it('lists the workspace’s records of the prep days asked for, by prep date and time out, with where each ended', async () => {
    const { coach, assistant, tray, week, other } = await kitchenWithRecords();
    // Another workspace's records on the same days are never in it.
    const elsewhere = await twoTrayWeek(app);
    await elsewhere.assistant.agent
      .put(`/api/weeks/${elsewhere.week.id}/bake-run/cooling/${elsewhere.tray.id}-1`)
      .send({ outAt: '2026-01-04T12:00' })
      .expect(200);

    const res = await log(assistant, '?from=2026-01-01&to=2026-01-31').expect(200);
    expect(res.body).toMatchObject({ from: '2026-01-01', to: '2026-01-31', timeZone: null });
    const rows = res.body.rows as Record<string, unknown>[];
    expect(rows.map((r) => [r.prepDate, r.runTrayId, r.weekId])).toEqual([
      ['2026-01-04', `${tray.id}-2`, week.id],
      ['2026-01-04', `${tray.id}-1`, week.id],
      ['2026-01-11', `${tray.id}-1`, other.id],
    ]);
    expect(rows[0]).toMatchObject({
      outAt: '2026-01-04T13:10',
      by70: '2026-01-04T15:10',
      by41: '2026-01-04T19:10',
      reached70At: '2026-01-04T14:10',
      reached41At: '2026-01-04T18:00',
      state: 'cooled',
      result: 'Cooled in time',
      // Readings in the order they were taken, whatever order they were written in.
      readings: [
        { at: '2026-01-04T14:10', tempF: 68 },
        { at: '2026-01-04T18:00', tempF: 40 },
      ],
    });
    // Past its deadline with no reading at 41 °F (judged after its deadlines: the prep day is long gone).
    expect(rows[1]).toMatchObject({ state: 'missed-41', result: 'Missed: not at 41 °F (5 °C) by 19:20', reached70At: '2026-01-04T14:20' });
    expect(rows[2]).toMatchObject({ state: 'discarded', result: 'Thrown away', note: 'Dropped on the floor', weekName: 'Week of Mon, Jan 12' });
    // The coach reads the same log; a narrower stretch has only its own prep days.
    expect((await log(coach, '?from=2026-01-01&to=2026-01-31').expect(200)).body.rows).toHaveLength(3);
    expect((await log(coach, '?from=2026-01-05&to=2026-01-11').expect(200)).body.rows.map((r: { prepDate: string }) => r.prepDate)).toEqual(['2026-01-11']);
    expect((await log(coach, '?from=2026-02-01&to=2026-02-28').expect(200)).body.rows).toEqual([]);
  });

  it('refuses a stretch it cannot read with a 400 naming the field', async () => {
    const { coach } = await twoTrayWeek(app);
    const bad = async (query: string, field: string, words: RegExp) => {
      const res = await log(coach, query).expect(400);
      expect(Object.keys(res.body.errors)).toEqual([field]);
      expect(res.body.errors[field][0]).toMatch(words);
    };
    await bad('?to=2026-01-31', 'from', /first prep date/);
    await bad('?from=2026-02-30&to=2026-03-01', 'from', /like 2026-12-06/);
    await bad('?from=2026-01-31&to=2026-01-01', 'to', /on or after the first/);
    // 366 days is the most (2028 is a leap year: Jan 1 to Dec 31 is 366 days); one more is refused.
    expect((await log(coach, '?from=2028-01-01&to=2028-12-31').expect(200)).body.rows).toEqual([]);
    await bad('?from=2028-01-01&to=2029-01-01', 'to', /At most 366 days/);
  });

  it('keeps a deleted week’s records: the week is gone from the log’s line, the record is not', async () => {
    const { coach, week, tray } = await kitchenWithRecords();
    await coach.agent.delete(`/api/weeks/${week.id}`).expect(204);
    const rows = (await log(coach, '?from=2026-01-01&to=2026-01-31').expect(200)).body.rows as Record<string, unknown>[];
    expect(rows.map((r) => [r.runTrayId, r.weekId, r.weekName])).toEqual([
      [`${tray.id}-2`, null, null],
      [`${tray.id}-1`, null, null],
      [`${tray.id}-1`, expect.any(Number), 'Week of Mon, Jan 12'],
    ]);
    expect(rows[0].result).toBe('Cooled in time');
    const csv = await coach.agent.get('/api/cooling-log.csv?from=2026-01-01&to=2026-01-31').expect(200);
    expect(csv.text).toContain('(week deleted)');
  });

  it('downloads as CSV: one row per tray, the kitchen’s times, both temperature scales, formulas escaped', async () => {
    const { assistant } = await kitchenWithRecords();
    const res = await assistant.agent.get('/api/cooling-log.csv?from=2026-01-01&to=2026-01-31').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toBe('attachment; filename=cooling-log-2026-01-01-to-2026-01-31.csv');
    const parsed = Papa.parse<string[]>(res.text.trim(), { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    expect(header).toEqual([...COOLING_LOG_CSV_COLUMNS]);
    expect(rows).toHaveLength(3);
    const trayName = rows[0][2];
    expect(trayName).toMatch(/\(2\/2\)$/);
    expect(rows[0]).toEqual([
      '2026-01-04',
      'Week of Mon, Jan 5',
      trayName,
      '2026-01-04 13:10',
      '',
      '2026-01-04 14:10 68 °F (20 °C); 2026-01-04 18:00 40 °F (4 °C)',
      '2026-01-04 15:10',
      '2026-01-04 19:10',
      '2026-01-04 14:10',
      '2026-01-04 18:00',
      'Cooled in time',
      '',
      expect.any(String),
    ]);
    // A note a spreadsheet would run as a formula is written as text (OWASP CSV injection: a leading quote).
    expect(rows[1][11]).toBe("'=SUM(1,2)");
    expect(rows[1][10]).toBe('Missed: not at 41 °F (5 °C) by 19:20');
    expect(rows[2][10]).toBe('Thrown away');
  });

  it('writes the reader’s scale first (their Settings), both scales still in every cell and heading', async () => {
    const { assistant } = await kitchenWithRecords();
    await assistant.agent.patch('/api/auth/me').send({ tempUnit: 'C' }).expect(200);
    const res = await assistant.agent.get('/api/cooling-log.csv?from=2026-01-01&to=2026-01-31').expect(200);
    const [header, ...rows] = Papa.parse<string[]>(res.text.trim(), { skipEmptyLines: true }).data;
    // The FDA Food Code (3-501.14) writes its cooling limits as 21 °C (70 °F) and 5 °C (41 °F) (from memory).
    expect(header.slice(6, 10)).toEqual(['21 °C (70 °F) by', '5 °C (41 °F) by', '21 °C (70 °F) reached at', '5 °C (41 °F) reached at']);
    expect(rows[0][5]).toBe('2026-01-04 14:10 20 °C (68 °F); 2026-01-04 18:00 4 °C (40 °F)');
    expect(rows[1][10]).toBe('Missed: not at 5 °C (41 °F) by 19:20');
    // In °F again: °F first.
    await assistant.agent.patch('/api/auth/me').send({ tempUnit: 'F' }).expect(200);
    const again = await assistant.agent.get('/api/cooling-log.csv?from=2026-01-01&to=2026-01-31').expect(200);
    expect(again.text).toContain('70 °F (21 °C) by');
  });

  it('judges a record of the last days on its readings alone while the kitchen has no time zone, and at the kitchen’s time once it has', async () => {
    const { coach, assistant } = await twoTrayWeek(app);
    const tray = await makeTray(coach);
    // A prep day today (UTC), one tray out at 00:05 with no reading: the server cannot know the kitchen's time.
    const today = new Date().toISOString().slice(0, 10);
    const monday = new Date(Date.parse(`${today}T00:00:00Z`) + 86_400_000 * 7).toISOString().slice(0, 10);
    const { week } = await makeWeek(coach, { startDate: monday, prepDate: today });
    await coach.agent.put(`/api/weeks/${week.id}/trays`).send({ version: week.version, trays: [{ trayId: tray.id, prepDate: today, trayCount: 1 }] }).expect(200);
    await assistant.agent.put(`/api/weeks/${week.id}/bake-run/cooling/${tray.id}-1`).send({ outAt: `${today}T00:05` }).expect(200);
    const row = async () => (await log(coach, `?from=${today}&to=${today}`).expect(200)).body.rows[0];
    expect(await row()).toMatchObject({ state: 'to-70', result: 'No reading at 70 °F (21 °C) yet (due by 02:05)' });
    // In Kiritimati (UTC+14) the kitchen's day is ahead: 00:05 today there was at least 10 hours ago, so both
    // deadlines have passed with no reading (from memory: Pacific/Kiritimati keeps UTC+14 all year).
    const s = await coach.agent.get('/api/workspace/settings').expect(200);
    await coach.agent.patch('/api/workspace/settings').send({ timeZone: 'Pacific/Kiritimati', version: s.body.version }).expect(200);
    const judged = await row();
    expect(judged).toMatchObject({ state: 'missed-70', result: expect.stringMatching(/^Missed: not at 70 °F \(21 °C\) by 02:05$/) });
    expect((await log(coach, `?from=${today}&to=${today}`).expect(200)).body.timeZone).toBe('Pacific/Kiritimati');
  });
});
