import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import type { Orm } from '@server/db/orm.js';
import { commitWeekEdit } from '@server/modules/weeks/week.service.js';
import { findWeek, loadBoardData } from '@server/modules/weeks/week-board.service.js';
import {
  coachWorkspace,
  makeAssembly,
  makeClient,
  makeIngredient,
  makeTray,
  makeWeek,
  ingredientInput,
  member,
  type Member,
} from '../support/factories.js';
import ICAL from 'ical.js';
import { pdfTextOf } from '../support/pdf-text.js';
import { sql } from '../support/db.js';
import { cellEatBy } from '@shared/domain/week-board.js';
import { flatWarnings } from '@shared/domain/week-check.js';
import { expandBoard, type BoardAnswer } from '@shared/schemas/board-answer.js';

/** A cell's portions (prep date, eat-by, status, remedies) as the board page shows them from the board answer. */
function portionsOn(answer: BoardAnswer, date: string) {
  const board = expandBoard(answer);
  const cell = board.cells.find((c) => c.date === date)!;
  const plate = board.plates.find((p) => p.id === cell.assemblyId)!;
  return cellEatBy(cell, plate.trays, board.prepDates);
}

let app: Express;
let orm: Orm;
beforeAll(async () => {
  ({ app, orm } = await testApp());
});


// Board days: Mon 2026-01-05 … Sun 2026-01-11; prep on Sun 2026-01-04 (the factory's default week).
const DAYS = ['2026-01-05', '2026-01-06', '2026-01-07', '2026-01-08', '2026-01-09', '2026-01-10', '2026-01-11'];

async function setup(coach: Member, opts: { household?: string; allergens?: string[]; fridgeDays?: number } = {}) {
  const ing = await makeIngredient(coach); // contains milk
  // Cut 4 × 4 = 16 portions per tray.
  const tray = await makeTray(coach, { storage: { fridgeDays: opts.fridgeDays ?? 4, freezerWeeks: 8 } }, ing.id);
  const plate = await makeAssembly(coach, tray.id);
  const client = await makeClient(coach, { householdMultiplier: opts.household ?? '1', allergens: opts.allergens ?? [] });
  const board = await makeWeek(coach);
  return { ing, tray, plate, client, week: board.week };
}

async function fillWeek(coach: Member, weekId: number, version: number, clientId: number, assemblyId: number, days = DAYS) {
  return coach.agent
    .put(`/api/weeks/${weekId}/cells`)
    .send({ version, cells: days.map((date) => ({ clientId, date, slot: 'breakfast', assemblyId })) });
}

describe('portion count', () => {
  it('needs plates × household multiplier and proposes whole trays (inventory arithmetic)', async () => {
    const coach = await coachWorkspace(app);
    const { tray, plate, client, week } = await setup(coach, { household: '3', fridgeDays: 7 });
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id);
    expect(filled.status).toBe(200);
    // 7 days × 1 portion × household of 3 = 21 portions; no trays yet → 21 short.
    expect(filled.body.inventory).toEqual([
      expect.objectContaining({ trayId: String(tray.id), needed: 21, produced: 0, short: 21, spare: 0, traysToCover: 2 }),
    ]);
    const one = await coach.agent
      .put(`/api/weeks/${week.id}/trays`)
      .send({ version: filled.body.week.version, trays: [{ trayId: tray.id, prepDate: '2026-01-04', trayCount: 1 }] })
      .expect(200);
    // 1 tray × 16 portions = 16 produced → 5 short.
    expect(one.body.inventory[0]).toMatchObject({ needed: 21, produced: 16, short: 5, spare: 0 });
    const covered = await coach.agent.post(`/api/weeks/${week.id}/trays/cover`).send({ version: one.body.week.version }).expect(200);
    // ceil(21 / 16) = 2 trays → 32 produced, 11 spare.
    expect(covered.body.trays).toEqual([expect.objectContaining({ trayId: tray.id, prepDate: '2026-01-04', trayCount: 2, portionsPerTray: 16 })]);
    expect(covered.body.inventory[0]).toMatchObject({ needed: 21, produced: 32, short: 0, spare: 11 });
    const [row] = await sql<{ tray_count: number }>('select tray_count from week_tray where week_id = $1', [week.id]);
    expect(row.tray_count).toBe(2);
  });
});

describe('what the board reads in one round', () => {
  it('names a tray counted for the week that no plate uses, with its cut plan and spares; another week of the workspace is apart', async () => {
    const coach = await coachWorkspace(app);
    const { ing, plate, client, week } = await setup(coach);
    // A second tray on no plate, counted only in this week: the board finds it through the tray counts alone.
    const extra = await makeTray(coach, { name: 'Counted only' }, ing.id);
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id, DAYS.slice(0, 2));
    await coach.agent
      .put(`/api/weeks/${week.id}/trays`)
      .send({ version: filled.body.week.version, trays: [{ trayId: extra.id, prepDate: '2026-01-04', trayCount: 1 }] })
      .expect(200);
    const board = expandBoard((await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body as BoardAnswer);
    expect(board.trays).toEqual([expect.objectContaining({ trayId: extra.id, name: 'Counted only', trayCount: 1, portionsPerTray: 16 })]);
    expect(board.inventory.find((t) => t.trayId === String(extra.id))).toMatchObject({ needed: 0, produced: 16, spare: 16 });
    expect(board.cells).toHaveLength(2);
    expect(board.week).toMatchObject({ id: week.id, cellCount: 2, publishedAt: null });

    const other = (await makeWeek(coach, { startDate: '2026-01-12', prepDate: '2026-01-11' })).week;
    const otherBoard = expandBoard((await coach.agent.get(`/api/weeks/${other.id}`).expect(200)).body as BoardAnswer);
    expect(otherBoard.cells).toEqual([]);
    expect(otherBoard.trays).toEqual([]);
  });
});

describe('the board after a library edit', () => {
  it('reads the tray and plate macros from the edited ingredient (nothing kept from an earlier load)', async () => {
    const coach = await coachWorkspace(app);
    const { ing, plate, client, week } = await setup(coach);
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0]]);
    const before = expandBoard(filled.body as BoardAnswer);
    const current = (await coach.agent.get(`/api/ingredients/${ing.id}`).expect(200)).body as Record<string, unknown>;
    await coach.agent
      .patch(`/api/ingredients/${ing.id}`)
      .send({ ...ingredientInput({ name: current.name as string }), proteinG: '40', version: current.version })
      .expect(200);
    const after = expandBoard((await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body as BoardAnswer);
    const protein = (b: typeof before) => b.plates.find((p) => p.id === plate.id)!.macros.proteinG;
    // The plate is one tray portion of that ingredient only: doubling its protein per 100 g doubles the plate's.
    expect(protein(after)).toBeCloseTo(protein(before) * 2, 0);
    expect(after.checks[0].totals.proteinG).toBe(protein(after));
  });
});

describe('eat-by on the board', () => {
  // USDA FSIS FoodKeeper / Cold Food Storage chart (published-values §6b): egg dishes and cooked leftovers keep
  // 3–4 days refrigerated at 40 °F or below. Trayline counts the prep day as day 0: prepped Sunday 2026-01-04 with
  // 4 fridge days → eat by Thursday 2026-01-08; Friday is past it.
  it('flags a portion past its eat-by, offers freeze-and-thaw, blocks publishing until it is applied', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id);
    const friday = { portions: portionsOn(filled.body, '2026-01-09') };
    expect(friday.portions[0]).toMatchObject({ prepDate: '2026-01-04', eatBy: '2026-01-08', status: 'past-eat-by' });
    expect(friday.portions[0].remedies).toEqual([
      expect.objectContaining({ kind: 'freeze-and-thaw', freezeOn: '2026-01-04', thawReminderOn: '2026-01-08', eatOn: '2026-01-09' }),
    ]);
    const thursday = { portions: portionsOn(filled.body, '2026-01-08') };
    expect(thursday.portions[0].status).toBe('ok');
    const pastDays = flatWarnings(expandBoard(filled.body).checks).filter((w: { kind: string }) => w.kind === 'past-eat-by').map((w: { date: string }) => w.date);
    expect(pastDays).toEqual(['2026-01-09', '2026-01-10', '2026-01-11']);

    const refused = await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: filled.body.week.version }).expect(409);
    expect(refused.body.code).toBe('conflict');
    expect(refused.body.blocks.length).toBeGreaterThanOrEqual(3);
    expect(refused.body.detail).toMatch(new RegExp(`^${refused.body.blocks.length} problems must be solved before publishing: \\S`));
    expect(refused.body.blocks[0]).toMatchObject({ kind: 'past-eat-by', message: expect.stringMatching(/^Past its eat-by date: /) });

    // Apply the remedy: frozen on prep day, thawed the evening before.
    const frozen = await coach.agent
      .put(`/api/weeks/${week.id}/cells`)
      .send({
        version: filled.body.week.version,
        cells: DAYS.slice(4).map((date) => ({ clientId: client.id, date, slot: 'breakfast', assemblyId: plate.id, storage: 'frozen' })),
      })
      .expect(200);
    expect(flatWarnings(expandBoard(frozen.body).checks).filter((w: { kind: string }) => w.kind === 'past-eat-by')).toEqual([]);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: frozen.body.week.version }).expect(200);

    // The client's thaw reminders for a calendar, read back with ical.js (Mozilla's RFC 5545 parser): the evening
    // before each frozen plate, at 19:00 on the phone's own clock (floating time), with an alarm.
    const me = await member(app, coach, 'client', { clientId: client.id });
    const ics = await me.agent.get('/api/weeks/mine/thaw-reminders.ics?today=2026-01-05').expect(200);
    expect(ics.headers['content-type']).toMatch(/^text\/calendar/);
    expect(ics.headers['cache-control']).toBe('private, no-store');
    expect(ics.headers['content-disposition']).toMatch(/^attachment; filename="?thaw-reminders-2026-01-05\.ics"?$/);
    const events = new ICAL.Component(ICAL.parse(ics.text)).getAllSubcomponents('vevent').map((v) => new ICAL.Event(v));
    expect(events.map((e) => [e.startDate.toString(), e.startDate.zone?.tzid])).toEqual([
      ['2026-01-08T19:00:00', 'floating'],
      ['2026-01-09T19:00:00', 'floating'],
      ['2026-01-10T19:00:00', 'floating'],
    ]);
    expect(events.every((e) => e.summary === `Move tomorrow's ${plate.name} to the fridge`)).toBe(true);
    expect(events[0].description).toContain('For breakfast on Friday, January 9, 2026');
    expect(events.every((e) => e.component.getAllSubcomponents('valarm').length === 1)).toBe(true);
    // USDA FSIS: thaw in a refrigerator at 40 °F (4 °C) or below; a client who reads °C gets °C first.
    expect(events[0].description).toContain('Thaw it in the refrigerator at 40 °F (4 °C) or below');
    await me.agent.patch('/api/auth/me').send({ tempUnit: 'C' }).expect(200);
    const inC = await me.agent.get('/api/weeks/mine/thaw-reminders.ics?today=2026-01-05').expect(200);
    const firstC = new ICAL.Event(new ICAL.Component(ICAL.parse(inC.text)).getAllSubcomponents('vevent')[0]);
    expect(firstC.description).toContain('Thaw it in the refrigerator at 4 °C (40 °F) or below');
    const bad = await me.agent.get('/api/weeks/mine/thaw-reminders.ics?today=someday').expect(400);
    expect(Object.keys(bad.body.errors)).toEqual(['today']);
    const other = await member(app, coach, 'client', { clientId: (await makeClient(coach, { name: 'Nothing frozen' })).id });
    const none = await other.agent.get('/api/weeks/mine/thaw-reminders.ics?today=2026-01-05').expect(200);
    expect(new ICAL.Component(ICAL.parse(none.text)).getAllSubcomponents('vevent')).toEqual([]);
  });

  it('a second prep date supplies the later days (remedy b)', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const withSecond = await coach.agent.patch(`/api/weeks/${week.id}`).send({ version: week.version, secondPrepDate: '2026-01-07' }).expect(200);
    const filled = await fillWeek(coach, week.id, withSecond.body.week.version, client.id, plate.id);
    // Wednesday's prep (4 fridge days) covers Wed–Sun: eat by Sunday 2026-01-11.
    const sunday = { portions: portionsOn(filled.body, '2026-01-11') };
    expect(sunday.portions[0]).toMatchObject({ prepDate: '2026-01-07', eatBy: '2026-01-11', status: 'ok' });
    expect(flatWarnings(expandBoard(filled.body).checks).filter((w: { severity: string }) => w.severity === 'block')).toEqual([]);
    expect(filled.body.cautions.map((c: { id: string }) => c.id)).toEqual(
      expect.arrayContaining(['cooling', 'reheating', 'two-hour-rule', 'local-codes']),
    );
  });
});

describe('the week board', () => {
  it('answers each cell edit with the board a fresh read gives (placed, replaced, moved to frozen, overridden, emptied)', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach, { allergens: ['milk'] });
    const other = await makeAssembly(coach, (await makeTray(coach, {}, (await makeIngredient(coach, { allergens: [] })).id)).id, { name: 'No milk plate' });
    const second = await makeClient(coach, { name: 'Second client' });
    let version = week.version;
    const edits = [
      [{ clientId: second.id, date: DAYS[2], slot: 'breakfast', assemblyId: plate.id }, { clientId: second.id, date: DAYS[0], slot: 'breakfast', assemblyId: other.id }],
      [{ clientId: second.id, date: DAYS[2], slot: 'breakfast', assemblyId: other.id }],
      [{ clientId: second.id, date: DAYS[5], slot: 'breakfast', assemblyId: plate.id, storage: 'frozen', prepDate: '2026-01-04' }],
      [{ clientId: client.id, date: DAYS[1], slot: 'breakfast', assemblyId: plate.id, allergenOverrides: [{ allergen: 'milk', reason: 'Lactose-free, client confirmed' }] }],
      [{ clientId: second.id, date: DAYS[0], slot: 'breakfast', assemblyId: null }],
    ];
    for (const cells of edits) {
      const put = await coach.agent.put(`/api/weeks/${week.id}/cells`).send({ version, cells }).expect(200);
      const read = await coach.agent.get(`/api/weeks/${week.id}`).expect(200);
      expect(put.body).toEqual(read.body);
      expect(put.body.week.version).toBe(version + 1);
      version = put.body.week.version;
    }
    expect(expandBoard(await coach.agent.get(`/api/weeks/${week.id}`).then((r) => r.body)).cells.map((c) => [c.clientId, c.date, c.assemblyId, c.storage])).toEqual([
      [client.id, DAYS[1], plate.id, 'fridge'],
      [second.id, DAYS[2], other.id, 'fridge'],
      [second.id, DAYS[5], plate.id, 'frozen'],
    ]);
  });

  it('refuses an allergen conflict unless the coach overrides it with a reason', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach, { allergens: ['milk'] });
    const cell = { clientId: client.id, date: DAYS[0], slot: 'breakfast', assemblyId: plate.id };
    const refused = await coach.agent.put(`/api/weeks/${week.id}/cells`).send({ version: week.version, cells: [cell] }).expect(400);
    expect(refused.body.errors['cells.0.allergenOverrides'][0]).toMatch(/Milk/);
    expect(await sql('select id from week_cell where week_id = $1', [week.id])).toEqual([]);
    const ok = await coach.agent
      .put(`/api/weeks/${week.id}/cells`)
      .send({ version: week.version, cells: [{ ...cell, allergenOverrides: [{ allergen: 'milk', reason: 'Lactose-free version agreed with client' }] }] })
      .expect(200);
    expect(flatWarnings(expandBoard(ok.body).checks)).toEqual(
      expect.arrayContaining([expect.objectContaining({ kind: 'allergen', severity: 'warn', overridden: true })]),
    );
  });

  it('two edits from two browsers: the second gets 409 with the current board, never a silent overwrite', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const other = await makeAssembly(coach, (plate.trays as { trayId: number }[])[0].trayId, { name: 'Other plate' });
    const first = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0]]);
    expect(first.status).toBe(200);
    const second = await fillWeek(coach, week.id, week.version, client.id, other.id, [DAYS[0]]);
    expect(second.status).toBe(409);
    expect(second.body).toMatchObject({ code: 'stale_version', currentVersion: first.body.week.version });
    expect(second.body.current.cells).toEqual([expect.objectContaining({ assemblyId: plate.id, date: DAYS[0] })]);
    const rows = await sql<{ assembly_id: number }>('select assembly_id from week_cell where week_id = $1', [week.id]);
    expect(rows).toEqual([{ assembly_id: plate.id }]);
  });

  it('an edit checked against a version another edit has since replaced is refused in its transaction (409), nothing written', async () => {
    const coach = await coachWorkspace(app);
    const { week } = await setup(coach);
    const actor = { userId: coach.userId, workspaceId: coach.workspaceId, role: 'coach', email: coach.email, name: 'Coach', clientId: null } as const;
    // The edit was checked at version v; another edit lands before it commits.
    const [{ version }] = await sql<{ version: number }>('select version from week where id = $1', [week.id]);
    await sql('update week set version = version + 1 where id = $1', [week.id]);
    let wrote = false;
    const attempt = commitWeekEdit(orm.em.fork(), actor, { id: week.id, version }, async () => {
      wrote = true;
    });
    await expect(attempt).rejects.toMatchObject({ name: 'OptimisticLockError' });
    expect(wrote).toBe(false);
    expect(await sql('select version from week where id = $1', [week.id])).toEqual([{ version: version + 1 }]);
  });

  it('two edits sent at the same moment from the same version: exactly one lands, the other gets 409', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const other = await makeAssembly(coach, (plate.trays as { trayId: number }[])[0].trayId, { name: 'Other plate' });
    for (let round = 0; round < 5; round++) {
      const [{ version }] = await sql<{ version: number }>('select version from week where id = $1', [week.id]);
      const [a, b] = await Promise.all([
        fillWeek(coach, week.id, version, client.id, plate.id, [DAYS[0]]),
        fillWeek(coach, week.id, version, client.id, other.id, [DAYS[0]]),
      ]);
      expect([a.status, b.status].sort()).toEqual([200, 409]);
      const winner = a.status === 200 ? plate.id : other.id;
      const rows = await sql<{ assembly_id: number; version: number }>(
        'select c.assembly_id, w.version from week_cell c join week w on w.id = c.week_id where c.week_id = $1',
        [week.id],
      );
      expect(rows).toEqual([{ assembly_id: winner, version: version + 1 }]);
    }
  });

  it('shows day totals against the client’s targets, copies a day and a week', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0]]);
    const check = expandBoard(filled.body).checks.find((c: { date: string }) => c.date === DAYS[0])!;
    const plateDto = filled.body.plates.find((p: { id: number }) => p.id === plate.id);
    expect(check.totals.kcal).toBeCloseTo(plateDto.macros.kcal, 0);
    // One small cheese portion is far below breakfast's protein share: flagged.
    expect(check.warnings.map((w: { kind: string }) => w.kind)).toContain('protein-short');

    const copied = await coach.agent
      .post(`/api/weeks/${week.id}/copy-day`)
      .send({ version: filled.body.week.version, fromDate: DAYS[0], toDate: DAYS[1] })
      .expect(200);
    expect(copied.body.cells.map((c: { date: string }) => c.date).sort()).toEqual([DAYS[0], DAYS[1]]);

    const next = await coach.agent
      .post(`/api/weeks/${week.id}/copy`)
      .send({ startDate: '2026-01-12', prepDate: '2026-01-11' })
      .expect(201);
    expect(next.body.week.id).not.toBe(week.id);
    expect(next.body.cells.map((c: { date: string }) => c.date).sort()).toEqual(['2026-01-12', '2026-01-13']);
    // The copy says what came over: both meals, none left behind.
    expect(next.body.copied).toEqual({ meals: 2, leftBehind: 0 });
  });

  it('copies a week with two prep days to a week with one: each tray counted on both days is counted once, added up', async () => {
    const coach = await coachWorkspace(app);
    const { tray, plate, client } = await setup(coach);
    const two = (await makeWeek(coach, { startDate: '2026-02-02', prepDate: '2026-02-01', secondPrepDate: '2026-02-04' })).week;
    const filled = await fillWeek(coach, two.id, two.version, client.id, plate.id, ['2026-02-02', '2026-02-06']);
    expect(filled.status).toBe(200);
    await coach.agent
      .put(`/api/weeks/${two.id}/trays`)
      .send({
        version: filled.body.week.version,
        trays: [
          { trayId: tray.id, prepDate: '2026-02-01', trayCount: 1 },
          { trayId: tray.id, prepDate: '2026-02-04', trayCount: 2 },
        ],
      })
      .expect(200);
    // It used to fail on the one-row-per-tray-and-prep-day rule (409 "That already exists").
    const one = await coach.agent.post(`/api/weeks/${two.id}/copy`).send({ startDate: '2026-02-09', prepDate: '2026-02-08' }).expect(201);
    expect(one.body.week).toMatchObject({ prepDate: '2026-02-08', secondPrepDate: null });
    expect(one.body.trays).toEqual([expect.objectContaining({ trayId: tray.id, prepDate: '2026-02-08', trayCount: 3 })]);
    expect(expandBoard(one.body as BoardAnswer).cells.map((c) => [c.date, c.prepDate ?? null])).toEqual([
      ['2026-02-09', null],
      ['2026-02-13', null],
    ]);
    // Copied with two prep days, each keeps its own.
    const both = await coach.agent
      .post(`/api/weeks/${two.id}/copy`)
      .send({ startDate: '2026-02-16', prepDate: '2026-02-15', secondPrepDate: '2026-02-18' })
      .expect(201);
    expect(both.body.trays.map((t: { prepDate: string; trayCount: number }) => [t.prepDate, t.trayCount]).sort()).toEqual([
      ['2026-02-15', 1],
      ['2026-02-18', 2],
    ]);
  });

  it('moves both prep days in one edit (Sunday and Wednesday to Wednesday and Friday): counts and cell choices each follow their own day once', async () => {
    const coach = await coachWorkspace(app);
    const { tray, plate, client } = await setup(coach);
    const two = (await makeWeek(coach, { startDate: '2026-03-02', prepDate: '2026-03-01', secondPrepDate: '2026-03-04' })).week;
    // Thursday's plate from Sunday's prep (explicit), Friday's from Wednesday's.
    const placed = await coach.agent
      .put(`/api/weeks/${two.id}/cells`)
      .send({
        version: two.version,
        cells: [
          { clientId: client.id, date: '2026-03-05', slot: 'breakfast', assemblyId: plate.id, prepDate: '2026-03-01' },
          { clientId: client.id, date: '2026-03-06', slot: 'breakfast', assemblyId: plate.id, prepDate: '2026-03-04' },
        ],
      })
      .expect(200);
    const counted = await coach.agent
      .put(`/api/weeks/${two.id}/trays`)
      .send({ version: placed.body.week.version, trays: [{ trayId: tray.id, prepDate: '2026-03-01', trayCount: 1 }, { trayId: tray.id, prepDate: '2026-03-04', trayCount: 2 }] })
      .expect(200);
    // It used to fail on the one-row-per-tray-and-prep-day rule (409 "That already exists"), or move Sunday's twice.
    const moved = await coach.agent
      .patch(`/api/weeks/${two.id}`)
      .send({ version: counted.body.week.version, prepDate: '2026-03-04', secondPrepDate: '2026-03-06' })
      .expect(200);
    expect(moved.body.trays.map((t: { prepDate: string; trayCount: number }) => [t.prepDate, t.trayCount]).sort()).toEqual([
      ['2026-03-04', 1],
      ['2026-03-06', 2],
    ]);
    expect(expandBoard(moved.body as BoardAnswer).cells.map((c) => [c.date, c.prepDate])).toEqual([
      ['2026-03-05', '2026-03-04'],
      ['2026-03-06', '2026-03-06'],
    ]);

    // The second prep day dropped: its counts go to the first, added up; its cells back to the default.
    const one = await coach.agent.patch(`/api/weeks/${two.id}`).send({ version: moved.body.week.version, secondPrepDate: null }).expect(200);
    expect(one.body.trays).toEqual([expect.objectContaining({ trayId: tray.id, prepDate: '2026-03-04', trayCount: 3 })]);
    expect(expandBoard(one.body as BoardAnswer).cells.map((c) => [c.date, c.prepDate ?? null])).toEqual([
      ['2026-03-05', '2026-03-04'],
      ['2026-03-06', null],
    ]);
    expect(await sql('select prep_date, tray_count from week_tray where week_id = $1', [two.id])).toEqual([{ prep_date: '2026-03-04', tray_count: 3 }]);
  });

  it('an archived client stays on the weeks where they have plates, leaves the others and copied weeks', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const other = await makeClient(coach, { name: 'Still coached' });
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0], DAYS[1]]);
    expect(filled.status).toBe(200);
    const profile = (await coach.agent.get(`/api/clients/${client.id}`).expect(200)).body;
    await coach.agent.patch(`/api/clients/${client.id}`).send({ archived: true, version: profile.version }).expect(200);

    // The week they eat from keeps them, marked, with their plates and portions counted.
    const kept = (await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body;
    const ids = kept.clients.map((c: { id: number; archived: boolean }) => [c.id, c.archived]);
    expect(ids).toEqual(expect.arrayContaining([[client.id, true], [other.id, false]]));
    expect(kept.cells).toHaveLength(2);
    expect(kept.inventory[0]).toMatchObject({ needed: 2 });
    // Their plates there can still change (moved to another day).
    const moved = await coach.agent
      .put(`/api/weeks/${week.id}/cells`)
      .send({ version: kept.week.version, cells: [{ clientId: client.id, date: DAYS[1], slot: 'breakfast', assemblyId: null }, { clientId: client.id, date: DAYS[2], slot: 'breakfast', assemblyId: plate.id }] })
      .expect(200);
    expect(moved.body.cells.map((c: { date: string }) => c.date).sort()).toEqual([DAYS[0], DAYS[2]]);

    // A copied week leaves them out; on a week without their plates they are not on the board and cannot be placed.
    const next = (await coach.agent.post(`/api/weeks/${week.id}/copy`).send({ startDate: '2026-01-12', prepDate: '2026-01-11' }).expect(201)).body;
    expect(next.cells).toEqual([]);
    expect(next.copied).toEqual({ meals: 0, leftBehind: 2 });
    expect(next.clients.map((c: { id: number }) => c.id)).toEqual([other.id]);
    const refused = await fillWeek(coach, next.week.id, next.week.version, client.id, plate.id, ['2026-01-12']);
    expect(refused.status).toBe(400);
    expect(refused.body.errors).toEqual({ 'cells.0.clientId': ['This client is not in your workspace, or is archived (restore them to plan their plates)'] });
    expect(await sql('select id from week_cell where week_id = $1', [next.week.id])).toEqual([]);

    // With their last plate there gone they leave that board too; the answer to the edit is what a read gives.
    const cleared = await coach.agent
      .put(`/api/weeks/${week.id}/cells`)
      .send({ version: moved.body.week.version, cells: [DAYS[0], DAYS[2]].map((date) => ({ clientId: client.id, date, slot: 'breakfast', assemblyId: null })) })
      .expect(200);
    expect(cleared.body.clients.map((c: { id: number }) => c.id)).toEqual([other.id]);
    expect((await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body).toEqual(cleared.body);

    // Restored, they are back on every board.
    const archived = (await coach.agent.get(`/api/clients/${client.id}`).expect(200)).body;
    await coach.agent.patch(`/api/clients/${client.id}`).send({ archived: false, version: archived.version }).expect(200);
    const back = (await coach.agent.get(`/api/weeks/${next.week.id}`).expect(200)).body;
    expect(back.clients.map((c: { id: number }) => c.id).sort()).toEqual([client.id, other.id].sort());
  });

  it('flags a dislike typed as people say it against the library name of an ingredient in the tray', async () => {
    const coach = await coachWorkspace(app);
    const { plate, week, ing } = await setup(coach);
    const client = await makeClient(coach, { dislikes: ['Cheeses'] });
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0]]);
    const dislikes = flatWarnings(expandBoard(filled.body).checks).filter((w) => w.kind === 'dislike');
    expect(dislikes).toEqual([
      expect.objectContaining({ clientId: String(client.id), date: DAYS[0], term: 'cheeses', matched: ing.name.toLowerCase(), severity: 'warn' }),
    ]);
    expect(dislikes[0].message).toBe(`The client dislikes cheeses (${ing.name.toLowerCase()}).`);
  });

  it('answers 400 naming the field for a day off the board or an unknown slot', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const res = await coach.agent
      .put(`/api/weeks/${week.id}/cells`)
      .send({ version: week.version, cells: [{ clientId: client.id, date: '2026-02-01', slot: 'supper', assemblyId: plate.id }] })
      .expect(400);
    expect(Object.keys(res.body.errors)).toEqual(expect.arrayContaining(['cells.0.date', 'cells.0.slot']));
  });
});

describe('one board per day', () => {
  it('refuses a new week or a copy that shares a day with another week of the workspace (400 naming startDate); the next day is free', async () => {
    const coach = await coachWorkspace(app);
    await makeWeek(coach, { name: 'Week one' }); // Mon 2026-01-05 … Sun 01-11
    const later = await coach.agent.post('/api/weeks').send({ startDate: '2026-01-08', prepDate: '2026-01-07' }).expect(400);
    expect(later.body.errors).toEqual({
      startDate: ['"Week one" already plans Mon, Jan 5 – Sun, Jan 11; a day is on one board only. Start this week on Mon, Jan 12 or later.'],
    });
    const earlier = await coach.agent.post('/api/weeks').send({ startDate: '2025-12-30', prepDate: '2025-12-29' }).expect(400);
    expect(earlier.body.errors.startDate[0]).toMatch(/Start this week on Mon, Dec 29 or earlier\.$/);
    // Sun 2026-01-11 is the first week's last day: a board from the Monday after, and from the Tuesday before it, fit.
    const next = await coach.agent.post('/api/weeks').send({ startDate: '2026-01-12', prepDate: '2026-01-11' }).expect(201);
    await coach.agent.post('/api/weeks').send({ startDate: '2025-12-29', prepDate: '2025-12-28' }).expect(201);
    const copy = await coach.agent.post(`/api/weeks/${next.body.week.id}/copy`).send({ startDate: '2026-01-18', prepDate: '2026-01-17' }).expect(400);
    expect(copy.body.errors.startDate[0]).toMatch(/^"Week of Mon, Jan 12" already plans Mon, Jan 12 – Sun, Jan 18;/);
    expect((await coach.agent.get('/api/weeks').expect(200)).body).toHaveLength(3);
    // With the weeks of 29 Dec, 5 Jan and 12 Jan planned, a start inside 5 Jan's is pointed past all three.
    const crowded = await coach.agent.post('/api/weeks').send({ startDate: '2026-01-07', prepDate: '2026-01-06' }).expect(400);
    expect(crowded.body.errors.startDate[0]).toMatch(/^"Week one" already plans Mon, Jan 5 – Sun, Jan 11; .* Start this week on Mon, Jan 19 or later\.$/);
    // Another workspace plans its own days.
    await makeWeek(await coachWorkspace(app));
  });

  it('two weeks of the same days created at the same moment: exactly one lands', async () => {
    const coach = await coachWorkspace(app);
    const body = { startDate: '2026-03-02', prepDate: '2026-03-01' };
    const answers = await Promise.all([1, 2, 3].map(() => coach.agent.post('/api/weeks').send(body)));
    expect(answers.map((a) => a.status).sort()).toEqual([201, 400, 400]);
    expect(await sql('select count(*)::int as n from week where workspace_id = $1', [coach.workspaceId])).toEqual([{ n: 1 }]);
  });
});

describe('publishing and the client view', () => {
  it("a client also reads the next published week: its days, and a frozen first-day plate's thaw on this week's last evening", async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach, { fridgeDays: 7 });
    const other = await makeClient(coach, { name: 'Other' });
    const a = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0]]);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: a.body.week.version }).expect(200);
    const me = await member(app, coach, 'client', { clientId: client.id });
    const mine = async (today: string) => (await me.agent.get(`/api/weeks/mine?today=${today}`).expect(200)).body;
    expect((await mine('2026-01-11')).next).toBeNull();

    // Next week (Mon, Jan 12): Monday's breakfast frozen (it thaws in the fridge on the evening before), Tuesday's not.
    const next = (await makeWeek(coach, { startDate: '2026-01-12', prepDate: '2026-01-11' })).week;
    const cell = (clientId: number, date: string, storage: string) => ({ clientId, date, slot: 'breakfast', assemblyId: plate.id, storage });
    const filled = await coach.agent
      .put(`/api/weeks/${next.id}/cells`)
      .send({ version: next.version, cells: [cell(client.id, '2026-01-12', 'frozen'), cell(client.id, '2026-01-13', 'fridge'), cell(other.id, '2026-01-12', 'fridge')] })
      .expect(200);
    // A draft is not the client's to read.
    expect((await mine('2026-01-11')).next).toBeNull();
    await coach.agent.post(`/api/weeks/${next.id}/publish`).send({ version: filled.body.week.version }).expect(200);

    const sunday = await mine('2026-01-11');
    expect(sunday.weekId).toBe(week.id);
    expect(sunday.next).toMatchObject({ weekId: next.id, name: 'Week of Mon, Jan 12', startDate: '2026-01-12', endDate: '2026-01-18', publishedVersion: 1 });
    expect(sunday.next.days.map((d: { date: string }) => d.date)).toEqual(['2026-01-12', '2026-01-13']);
    expect(sunday.next.days[0].plates[0]).toMatchObject({ name: plate.name, storage: 'frozen', thawOn: '2026-01-11' });
    // Only their own: the other client's plate is not in it.
    expect(sunday.next.days[0].plates).toHaveLength(1);
    // From Monday next week is the client's week, with nothing after it.
    const monday = await mine('2026-01-12');
    expect([monday.weekId, monday.next]).toEqual([next.id, null]);
    // Next week's own files, asked for from its first day (the page's links): its plan and its thaw reminder.
    const pdf = await me.agent.get('/api/weeks/mine/plan.pdf?today=2026-01-12').expect(200);
    expect(pdf.headers['content-type']).toMatch(/^application\/pdf/);
    const ics = await me.agent.get('/api/weeks/mine/thaw-reminders.ics?today=2026-01-12').expect(200);
    const events = new ICAL.Component(ICAL.parse(ics.text)).getAllSubcomponents('vevent');
    expect(events.map((e) => e.getFirstPropertyValue('dtstart')?.toString().slice(0, 10))).toEqual(['2026-01-11']);
  });

  it('a plate holding an allergen on the client\'s list, allowed by the coach, is said to the client on the page and in the PDF (the reason stays with the coach)', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach, { allergens: ['milk'], fridgeDays: 7 });
    const plain = await makeAssembly(coach, (await makeTray(coach, {}, (await makeIngredient(coach, { allergens: [] })).id)).id, { name: 'No milk plate' });
    const reason = 'Lactose-free version, agreed with the client in writing';
    const filled = await coach.agent
      .put(`/api/weeks/${week.id}/cells`)
      .send({
        version: week.version,
        cells: [
          { clientId: client.id, date: DAYS[0], slot: 'breakfast', assemblyId: plate.id, allergenOverrides: [{ allergen: 'milk', reason }] },
          { clientId: client.id, date: DAYS[1], slot: 'breakfast', assemblyId: plain.id },
        ],
      })
      .expect(200);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: filled.body.week.version }).expect(200);
    const me = await member(app, coach, 'client', { clientId: client.id });
    type Plates = { plates: { allergens: string[]; allowedAllergens: string[]; onYourList: string[] }[] }[];
    const read = async () => (await me.agent.get('/api/weeks/mine?today=2026-01-05').expect(200)).body as { days: Plates };
    const mine = await read();
    expect(mine.days.map((d) => d.plates.map((p) => [p.allergens, p.allowedAllergens, p.onYourList]))).toEqual([
      [[['milk'], ['milk'], ['milk']]],
      [[[], [], []]],
    ]);
    expect(JSON.stringify(mine)).not.toContain(reason);
    const text = await pdfTextOf(me.agent, '/api/weeks/mine/plan.pdf?today=2026-01-05');
    expect(text).toContain('Milk is on your allergen list. Your coach chose this plate for you knowing that.');
    expect(text.match(/on your allergen list/g)).toHaveLength(1);
    expect(text).not.toContain(reason);

    // Milk taken off the client's list after publishing: nothing more is said; put back with soy: said again.
    const profile = (await coach.agent.get(`/api/clients/${client.id}`).expect(200)).body;
    const off = (await coach.agent.patch(`/api/clients/${client.id}`).send({ allergens: [], version: profile.version }).expect(200)).body;
    expect((await read()).days[0].plates[0].onYourList).toEqual([]);
    expect(await pdfTextOf(me.agent, '/api/weeks/mine/plan.pdf?today=2026-01-05')).not.toContain('on your allergen list');
    await coach.agent.patch(`/api/clients/${client.id}`).send({ allergens: ['milk', 'soy'], version: off.version }).expect(200);
    expect((await read()).days[0].plates[0].onYourList).toEqual(['milk']);
  });

  it('an allergen put on the client\'s list after the week was published: the plate holding it says not to eat it before asking', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach, { fridgeDays: 7 });
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0]]);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: filled.body.week.version }).expect(200);
    const profile = (await coach.agent.get(`/api/clients/${client.id}`).expect(200)).body;
    await coach.agent.patch(`/api/clients/${client.id}`).send({ allergens: ['milk'], version: profile.version }).expect(200);
    const me = await member(app, coach, 'client', { clientId: client.id });
    const mine = (await me.agent.get('/api/weeks/mine?today=2026-01-05').expect(200)).body;
    expect(mine.days[0].plates[0]).toMatchObject({ allergens: ['milk'], allowedAllergens: [], onYourList: ['milk'] });
    const text = await pdfTextOf(me.agent, '/api/weeks/mine/plan.pdf?today=2026-01-05');
    expect(text).toContain('Milk is on your allergen list, and this plate has it. Your coach planned this plate before it was on your list. Do not eat it: ask your coach first.');
  });

  it('the coach reads which published plates, from today on, hold an allergen put on the client\'s list after publishing', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach, { fridgeDays: 7 });
    const plain = await makeAssembly(coach, (await makeTray(coach, {}, (await makeIngredient(coach, { allergens: [] })).id)).id, { name: 'No milk plate' });
    const cells = [
      { clientId: client.id, date: DAYS[0], slot: 'breakfast', assemblyId: plate.id },
      { clientId: client.id, date: DAYS[1], slot: 'breakfast', assemblyId: plain.id },
      { clientId: client.id, date: DAYS[2], slot: 'breakfast', assemblyId: plate.id },
    ];
    const filled = await coach.agent.put(`/api/weeks/${week.id}/cells`).send({ version: week.version, cells }).expect(200);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: filled.body.week.version }).expect(200);
    const clash = (today: string) => coach.agent.get(`/api/clients/${client.id}/published-allergens?today=${today}`);
    // Nothing on the list: nothing to say.
    expect((await clash(DAYS[0]).expect(200)).body).toEqual([]);
    const profile = (await coach.agent.get(`/api/clients/${client.id}`).expect(200)).body;
    const changed = (await coach.agent.patch(`/api/clients/${client.id}`).send({ allergens: ['milk'], version: profile.version }).expect(200)).body;
    const milk = (date: string) => ({ date, slot: 'breakfast', name: plate.name, allergens: ['milk'] });
    expect((await clash(DAYS[0]).expect(200)).body).toEqual([{ weekId: week.id, weekName: 'Week of Mon, Jan 5', publishedVersion: 1, plates: [milk(DAYS[0]), milk(DAYS[2])] }]);
    // From Wednesday on, Monday's plate is eaten: only Wednesday's is left; after the week, none.
    expect((await clash(DAYS[2]).expect(200)).body[0].plates).toEqual([milk(DAYS[2])]);
    expect((await clash('2026-01-12').expect(200)).body).toEqual([]);
    // Published again with Monday's allowed and Wednesday's changed: nothing left.
    const board = (await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body;
    const fixed = await coach.agent
      .put(`/api/weeks/${week.id}/cells`)
      .send({
        version: board.week.version,
        cells: [
          { ...cells[0], allergenOverrides: [{ allergen: 'milk', reason: 'Lactose-free version agreed with the client' }] },
          { ...cells[2], assemblyId: plain.id },
        ],
      })
      .expect(200);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: fixed.body.week.version }).expect(200);
    expect((await clash(DAYS[0]).expect(200)).body).toEqual([]);
    expect(changed.allergens).toEqual(['milk']);
    // A bad day is named; another workspace's coach finds no such client.
    expect((await clash('someday').expect(400)).body.errors.today).toBeDefined();
    await (await coachWorkspace(app)).agent.get(`/api/clients/${client.id}/published-allergens`).expect(404);
  });

  it('a week\'s published version is read against its clients\' lists as they stand: the week, client by client, and the home glance', async () => {
    const coach = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach, { fridgeDays: 7 });
    const other = await makeClient(coach, { name: 'Aaron Other' });
    const cells = [DAYS[0], DAYS[3]].flatMap((date) => [client.id, other.id].map((clientId) => ({ clientId, date, slot: 'breakfast', assemblyId: plate.id })));
    const draft = () => coach.agent.get(`/api/weeks/${week.id}/published-allergens?today=${DAYS[0]}`).expect(200);
    // Not published: nothing clients follow yet.
    expect((await draft()).body).toEqual({ weekId: week.id, publishedVersion: null, clients: [] });
    const filled = await coach.agent.put(`/api/weeks/${week.id}/cells`).send({ version: week.version, cells }).expect(200);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: filled.body.week.version }).expect(200);
    const read = (today: string) => coach.agent.get(`/api/weeks/${week.id}/published-allergens?today=${today}`).expect(200);
    const glance = async (today: string) => (await coach.agent.get(`/api/weeks/glance?today=${today}`).expect(200)).body.publishedAllergens;
    expect((await read(DAYS[0])).body).toEqual({ weekId: week.id, publishedVersion: 1, clients: [] });
    expect(await glance(DAYS[0])).toEqual({ clients: 0, plates: 0 });

    // Milk put on the first client's list after publishing: their two plates, not the other client's.
    const profile = (await coach.agent.get(`/api/clients/${client.id}`).expect(200)).body;
    await coach.agent.patch(`/api/clients/${client.id}`).send({ allergens: ['milk'], version: profile.version }).expect(200);
    const milk = (date: string) => ({ date, slot: 'breakfast', name: plate.name, allergens: ['milk'] });
    expect((await read(DAYS[0])).body).toEqual({ weekId: week.id, publishedVersion: 1, clients: [{ clientId: client.id, name: client.name, plates: [milk(DAYS[0]), milk(DAYS[3])] }] });
    expect(await glance(DAYS[0])).toEqual({ clients: 1, plates: 2 });
    // From Tuesday on, Monday's plate is eaten.
    expect((await read(DAYS[1])).body.clients[0].plates).toEqual([milk(DAYS[3])]);
    expect(await glance(DAYS[1])).toEqual({ clients: 1, plates: 1 });
    // Both clients, sorted by name; an archived client's plan still counts.
    const second = (await coach.agent.get(`/api/clients/${other.id}`).expect(200)).body;
    await coach.agent.patch(`/api/clients/${other.id}`).send({ allergens: ['milk', 'egg'], archived: true, version: second.version }).expect(200);
    expect((await read(DAYS[0])).body.clients.map((c: { name: string; plates: unknown[] }) => [c.name, c.plates.length])).toEqual([
      ['Aaron Other', 2],
      [client.name, 2],
    ]);
    expect(await glance(DAYS[0])).toEqual({ clients: 2, plates: 4 });

    // A bad day is named; another workspace's coach finds no such week.
    expect((await coach.agent.get(`/api/weeks/${week.id}/published-allergens?today=soon`).expect(400)).body.errors.today).toBeDefined();
    await (await coachWorkspace(app)).agent.get(`/api/weeks/${week.id}/published-allergens`).expect(404);
  });

  it('a client reads only their own published plates; edits stay hidden until the next publication', async () => {
    const coach = await coachWorkspace(app);
    const { tray, plate, client, week } = await setup(coach, { fridgeDays: 7 });
    const otherClient = await makeClient(coach, { name: 'Other' });
    const otherTray = await makeTray(coach);
    const otherPlate = await makeAssembly(coach, otherTray.id, { name: 'Not yours' });
    const a = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0], DAYS[1]]);
    const b = await fillWeek(coach, week.id, a.body.week.version, otherClient.id, otherPlate.id, [DAYS[0]]);
    const published = await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: b.body.week.version }).expect(200);
    expect(published.body.week).toMatchObject({ publishedVersion: 1, changedSincePublished: false });

    const me = await member(app, coach, 'client', { clientId: client.id });
    const mine = await me.agent.get('/api/weeks/mine?today=2026-01-05').expect(200);
    expect(mine.body).toMatchObject({ weekId: week.id, publishedVersion: 1 });
    expect(mine.body.days.map((d: { date: string }) => d.date)).toEqual([DAYS[0], DAYS[1]]);
    expect(mine.body.days[0].plates[0]).toMatchObject({ name: plate.name, eatBy: '2026-01-11', storage: 'fridge', assemblySteps: ['Plate it'] });
    expect(JSON.stringify(mine.body)).not.toContain('Not yours');

    // The trays hook: a client may read the trays of their published plan, and no others.
    await me.agent.get(`/api/trays/${tray.id}`).expect(200);
    await me.agent.get(`/api/trays/${otherTray.id}`).expect(404);
    // Never the board or another client's profile.
    await me.agent.get(`/api/weeks/${week.id}`).expect(403);
    await me.agent.get(`/api/clients/${otherClient.id}`).expect(404);

    // The coach changes the board: the client still sees version 1 until the coach publishes again.
    const edited = await fillWeek(coach, week.id, published.body.week.version, client.id, plate.id, [DAYS[2]]);
    expect(edited.body.week.changedSincePublished).toBe(true);
    const still = await me.agent.get('/api/weeks/mine?today=2026-01-05').expect(200);
    expect(still.body.days).toHaveLength(2);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: edited.body.week.version }).expect(200);
    const now = await me.agent.get('/api/weeks/mine?today=2026-01-05').expect(200);
    expect(now.body.publishedVersion).toBe(2);
    expect(now.body.days).toHaveLength(3);
    const pubs = await sql<{ number: number; at: Date }>('select number, published_at as at from week_publication where week_id = $1 order by number', [week.id]);
    expect(pubs.map((p) => p.number)).toEqual([1, 2]);
    // The history the board shows: newest first, when, by whom.
    const history = await coach.agent.get(`/api/weeks/${week.id}/publications`).expect(200);
    const [coachRow] = await sql<{ name: string }>('select name from app_user where id = $1', [coach.userId]);
    expect(history.body).toEqual(
      [...pubs].reverse().map((p) => ({ number: p.number, publishedAt: p.at.toISOString(), publishedBy: coachRow.name })),
    );

    // The time of the current publication, as the board read and the reads behind the shopping list and labels give it.
    const [{ at }] = await sql<{ at: Date }>('select published_at as at from week_publication where week_id = $1 and number = 2', [week.id]);
    const board = await coach.agent.get(`/api/weeks/${week.id}`).expect(200);
    expect(board.body.week.publishedAt).toBe(at.toISOString());
    const actor = { userId: coach.userId, workspaceId: coach.workspaceId, role: 'coach', email: coach.email, name: 'Coach', clientId: null } as const;
    const em = orm.em.fork();
    const data = await loadBoardData(em, actor, await findWeek(em, actor, week.id));
    expect(data.publishedAt?.toISOString()).toBe(at.toISOString());
  });

  it('deletes a published week with everything hung on it; its client then has no published plan; another workspace gets 404', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const { plate, client, week, ing } = await setup(coach, { fridgeDays: 7 });
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id, [DAYS[0]]);
    const counted = await coach.agent.post(`/api/weeks/${week.id}/trays/cover`).send({ version: filled.body.week.version }).expect(200);
    await coach.agent.post(`/api/weeks/${week.id}/publish`).send({ version: counted.body.week.version }).expect(200);
    await coach.agent.put(`/api/weeks/${week.id}/shopping/checks/${ing.id}`).send({ checked: true }).expect(200);
    const me = await member(app, coach, 'client', { clientId: client.id });
    expect((await me.agent.get('/api/weeks/mine?today=2026-01-05').expect(200)).body).toMatchObject({ weekId: week.id });

    await other.agent.delete(`/api/weeks/${week.id}`).expect(404);
    await coach.agent.delete(`/api/weeks/${week.id}`).expect(204);
    for (const table of ['week', 'week_cell', 'week_tray', 'week_publication', 'shopping_check']) {
      const column = table === 'week' ? 'id' : 'week_id';
      expect(await sql(`select 1 from ${table} where ${column} = $1`, [week.id])).toEqual([]);
    }
    expect((await me.agent.get('/api/weeks/mine?today=2026-01-05').expect(200)).body).toBeNull();
    await coach.agent.get(`/api/weeks/${week.id}`).expect(404);
    await coach.agent.delete(`/api/weeks/${week.id}`).expect(404);
  });

  it('keeps the board from assistants and other workspaces; the home glance counts problems', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const { plate, client, week } = await setup(coach);
    const filled = await fillWeek(coach, week.id, week.version, client.id, plate.id);
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.get(`/api/weeks/${week.id}`).expect(403);
    const list = await assistant.agent.get('/api/weeks').expect(200);
    expect(list.body).toEqual([expect.objectContaining({ id: week.id, cellCount: 7 })]);
    await other.agent.get(`/api/weeks/${week.id}`).expect(404);
    await other.agent.put(`/api/weeks/${week.id}/cells`).send({ version: filled.body.week.version, cells: [{ clientId: client.id, date: DAYS[0], slot: 'breakfast', assemblyId: null }] }).expect(404);
    const glance = await coach.agent.get('/api/weeks/glance?today=2026-01-03').expect(200);
    expect(glance.body).toMatchObject({ week: { id: week.id }, nextPrepDate: '2026-01-04', portionsShort: 7 });
    expect(glance.body.blocks).toBe(3);
    // The glance's week is the board's own summary.
    expect(glance.body.week).toEqual((await coach.agent.get(`/api/weeks/${week.id}`).expect(200)).body.week);
    // How far the workspace is set up (the home's first steps): one tray, plate, client and week, no oven; the other
    // workspace has none of them.
    expect(glance.body.setup).toEqual({ trays: 1, plates: 1, clients: 1, ovens: 0, weeks: 1 });
    const empty = await other.agent.get('/api/weeks/glance?today=2026-01-03').expect(200);
    expect(empty.body).toEqual({
      week: null,
      nextWeek: null,
      warnings: 0,
      blocks: 0,
      portionsShort: 0,
      nextPrepDate: null,
      setup: { trays: 0, plates: 0, clients: 0, ovens: 0, weeks: 0 },
      cooling: { thrownAway: [], missed: [] },
      publishedAllergens: { clients: 0, plates: 0 },
    });
    // Nothing after this week yet; then a copy of it the week after, named with its state and plates.
    expect(glance.body.nextWeek).toBeNull();
    const copy = await coach.agent.post(`/api/weeks/${week.id}/copy`).send({ startDate: '2026-01-12', prepDate: '2026-01-11' }).expect(201);
    const later = await coach.agent.get('/api/weeks/glance?today=2026-01-08').expect(200);
    expect(later.body.week.id).toBe(week.id);
    expect(later.body.nextWeek).toEqual({ id: copy.body.week.id, name: 'Week of Mon, Jan 12', startDate: '2026-01-12', cellCount: 7, publishedVersion: null });
    // On the copy's own days it is the glance's week, with nothing after it.
    const then = await coach.agent.get('/api/weeks/glance?today=2026-01-13').expect(200);
    expect([then.body.week.id, then.body.nextWeek]).toEqual([copy.body.week.id, null]);
  });
});
