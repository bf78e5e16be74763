import { LockMode } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import { allergenConflicts, allergenLabel, type AllergenCode } from '@shared/domain/allergens.js';
import { addDays, compareIsoDates, daysBetween, shortDate, type DateOrder, type IsoDate } from '@shared/domain/iso-date.js';
import { cellKey, computeBoard, coveringBatches, weekTitle } from '@shared/domain/week-board.js';
import { BOARD_DAYS, boardsShareADay, clearStart, pickWeek, weekAfter } from '@shared/domain/week-days.js';
import type { GlanceDto, SetupCountsDto, WeekSummaryDto } from '@shared/schemas/weeks.schema.js';
import { preparedRows } from '../../db/prepared.js';
import type { BoardAnswer, CopyWeekAnswer } from '@shared/schemas/board-answer.js';
import type { z } from 'zod';
import type {
  copyDaySchema,
  copyWeekSchema,
  createWeekSchema,
  putCellsSchema,
  putTraysSchema,
  updateWeekSchema,
} from '@shared/schemas/weeks.schema.js';
import { datesOf, type Actor } from '../../http/authz.js';
import { Conflict, StaleEdit, ValidationError } from '../../http/errors.js';
import { Tray } from '../trays/tray.entity.js';
import { coolingTrouble } from '../bake-runs/cooling.service.js';
import { followPrepDays } from '../bake-runs/bake-run.service.js';
import { Week, WeekCell, WeekPublication, WeekTray, type IWeek, type IWeekCell, type IWeekTray } from './week.entity.js';
import { publishedAllergensOf } from './week-publish.service.js';
import {
  boardInput,
  findWeek,
  getBoard,
  loadBoardById,
  loadBoardData,
  prepDatesOf,
  presentBoard,
  presentWeekSummary,
  todayIso,
  weekDays,
  type BoardCellRow,
  type BoardData,
} from './week-board.service.js';

type CreateWeek = z.output<typeof createWeekSchema>;
type UpdateWeek = z.output<typeof updateWeekSchema>;
type PutCells = z.output<typeof putCellsSchema>;
type PutTrays = z.output<typeof putTraysSchema>;
type CopyDay = z.output<typeof copyDaySchema>;
type CopyWeek = z.output<typeof copyWeekSchema>;

// ── Reading ─────────────────────────────────────────────────────────────────────────────────────────

export async function listWeeks(em: EntityManager, actor: Actor): Promise<WeekSummaryDto[]> {
  const weeks = await em.find(Week, { workspace: actor.workspaceId }, { orderBy: { startDate: 'desc', id: 'desc' } });
  if (!weeks.length) return [];
  const ids = weeks.map((w) => w.id);
  const counts = (await em
    .getConnection()
    .execute(`select week_id, count(*) as n from week_cell where week_id in (${ids.map(() => '?').join(', ')}) group by week_id`, ids)) as {
    week_id: number;
    n: string;
  }[];
  const countOf = new Map(counts.map((r) => [Number(r.week_id), Number(r.n)]));
  const pubs = await em.find(WeekPublication, { week: { $in: ids } }, { fields: ['week', 'number', 'publishedAt'] });
  const pubAt = new Map(pubs.map((p) => [`${p.week.id}|${p.number}`, p.publishedAt]));
  return weeks.map((w) => presentWeekSummary(w, countOf.get(w.id) ?? 0, pubAt.get(`${w.id}|${w.publishedVersion}`) ?? null, datesOf(actor)));
}

// ── Writing the week itself ─────────────────────────────────────────────────────────────────────────

function checkPrepDates(startDate: IsoDate, prepDate: IsoDate, second: IsoDate | null | undefined) {
  const end = addDays(startDate, 6);
  const errors: Record<string, string[]> = {};
  if (compareIsoDates(prepDate, end) > 0) errors.prepDate = ['The prep date must be on or before the last day of the week'];
  if (daysBetween(prepDate, startDate) > 7) errors.prepDate = ['The prep date is more than a week before the board starts'];
  if (second && (compareIsoDates(second, prepDate) <= 0 || compareIsoDates(second, end) > 0)) {
    errors.secondPrepDate = ['The second prep date comes after the first, within the week'];
  }
  if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);
}

/** The advisory lock (with the workspace id) that new weeks of one workspace take while they check their days. */
const WEEK_DAYS_LOCK = 7302;

/**
 * A day is on one board only: a new week may not share a day with another week of the workspace (two boards for
 * one day would leave the client's page, the shopping list and the bake run to guess which one counts). Checked
 * under a per-workspace lock held to the end of the transaction, so two weeks created at once cannot both pass.
 */
async function checkDaysFree(tx: EntityManager, actor: Actor, startDate: IsoDate): Promise<void> {
  await tx.getConnection().execute('select pg_advisory_xact_lock(?, ?)', [WEEK_DAYS_LOCK, actor.workspaceId], 'all', tx.getTransactionContext());
  const weeks = await tx.find(Week, { workspace: actor.workspaceId }, { fields: ['id', 'name', 'startDate'], orderBy: { startDate: 'asc' } });
  const other = weeks.find((w) => boardsShareADay(w.startDate, startDate));
  if (!other) return;
  // The nearest start clear of every week, on the side of the clash the coach asked for.
  const way = compareIsoDates(other.startDate, startDate) <= 0 ? 'later' : 'earlier';
  const order = datesOf(actor);
  const message =
    `"${weekTitle(other, order)}" already plans ${shortDate(other.startDate, order)} – ${shortDate(addDays(other.startDate, BOARD_DAYS - 1), order)}; a day is on one board only. ` +
    `Start this week on ${shortDate(clearStart(weeks, other, way), order)} or ${way}.`;
  throw new ValidationError(message, { startDate: [message] });
}

/** A new week row of the workspace (not flushed). */
function newWeek(em: EntityManager, actor: Actor, v: CreateWeek): IWeek {
  return em.create(Week, {
    workspace: actor.workspaceId,
    name: v.name,
    startDate: v.startDate,
    prepDate: v.prepDate,
    secondPrepDate: v.secondPrepDate ?? null,
  } as never) as IWeek;
}

export async function createWeek(em: EntityManager, actor: Actor, v: CreateWeek): Promise<BoardAnswer> {
  checkPrepDates(v.startDate, v.prepDate, v.secondPrepDate);
  const id = await em.transactional(async (tx) => {
    await checkDaysFree(tx, actor, v.startDate);
    const w = newWeek(tx, actor, v);
    await tx.flush();
    return w.id;
  });
  em.clear();
  return getBoard(em, actor, id);
}

async function stale(em: EntityManager, actor: Actor, week: Pick<IWeek, 'id' | 'version'>): Promise<never> {
  throw new StaleEdit(week.version, await getBoard(em, actor, week.id));
}

async function openForEdit(em: EntityManager, actor: Actor, id: number, version: number): Promise<IWeek> {
  const week = await findWeek(em, actor, id);
  if (week.version !== version) await stale(em, actor, week);
  return week;
}

/**
 * Bumps the week's version with the rows written beside it (one transaction), then answers the new board. The week
 * must still be at the version the edit was checked against: another edit that landed in between makes this a 409
 * (checked when the week is read in the transaction, and again by the versioned UPDATE), never a silent overwrite.
 */
export async function commitWeekEdit(
  em: EntityManager,
  actor: Actor,
  week: Pick<IWeek, 'id' | 'version'>,
  write: (tx: EntityManager, w: IWeek) => Promise<void>,
  /** The answer from the committed version, when the caller can build it without reading the board again. */
  answer?: (version: number) => BoardAnswer,
): Promise<BoardAnswer> {
  const version = await em.transactional(async (tx) => {
    const w = await tx.findOneOrFail(
      Week,
      { id: week.id, workspace: actor.workspaceId },
      { lockMode: LockMode.OPTIMISTIC, lockVersion: week.version, refresh: true },
    );
    await write(tx, w);
    w.updatedAt = new Date();
    await tx.flush();
    return w.version;
  });
  em.clear();
  return answer ? answer(version) : getBoard(em, actor, week.id);
}

/**
 * Tray counts put on other prep days (`dayOf` maps each count's prep day to its new one): one count per tray and
 * prep day, those landing on the same day added up.
 */
function countsOnPrepDays(rows: readonly IWeekTray[], dayOf: (prepDate: IsoDate) => IsoDate) {
  const counts = new Map<string, { tray: number; prepDate: IsoDate; trayCount: number }>();
  for (const t of rows) {
    const prepDate = dayOf(t.prepDate);
    const seen = counts.get(`${t.tray.id} ${prepDate}`);
    if (seen) seen.trayCount += t.trayCount;
    else counts.set(`${t.tray.id} ${prepDate}`, { tray: t.tray.id, prepDate, trayCount: t.trayCount });
  }
  return [...counts.values()];
}

export async function updateWeek(em: EntityManager, actor: Actor, id: number, v: UpdateWeek): Promise<BoardAnswer> {
  const week = await openForEdit(em, actor, id, v.version);
  const prepDate = v.prepDate ?? week.prepDate;
  const second = v.secondPrepDate === undefined ? week.secondPrepDate : v.secondPrepDate;
  checkPrepDates(week.startDate, prepDate, second);
  if (week.secondPrepDate && !second) await keepTripsBought(em, week, datesOf(actor));
  return commitWeekEdit(em, actor, week, async (tx, w) => {
    // Tray counts and cell choices follow their prep day when it moves; a second prep day dropped hands its counts to
    // the first (added up: the plates still need those portions) and its cells go back to the default. Both days can
    // move in one edit (Sunday and Wednesday to Wednesday and Friday): every row is read before any is written, so
    // nothing moves twice, and counts are deleted and written again (one row per tray and prep day).
    const to = new Map<IsoDate, { tray: IsoDate; cell: IsoDate | null }>();
    if (w.prepDate !== prepDate) to.set(w.prepDate, { tray: prepDate, cell: prepDate });
    if (w.secondPrepDate && w.secondPrepDate !== (second ?? null)) to.set(w.secondPrepDate, second ? { tray: second, cell: second } : { tray: prepDate, cell: null });
    if (to.size) {
      await followPrepDays(tx, w.id, new Map([...to].map(([from, target]) => [from, target.cell])));
      const froms = [...to.keys()];
      const cells = await tx.find(WeekCell, { week: w.id, prepDate: { $in: froms } }, { fields: ['id', 'prepDate'] });
      for (const [from, target] of to) {
        const ids = cells.filter((c) => c.prepDate === from).map((c) => c.id);
        if (ids.length) await tx.nativeUpdate(WeekCell, { id: { $in: ids } }, { prepDate: target.cell });
      }
      const moved = await tx.find(WeekTray, { week: w.id, prepDate: { $in: froms } });
      const counts = countsOnPrepDays(moved, (d) => to.get(d)!.tray);
      await tx.nativeDelete(WeekTray, { week: w.id, prepDate: { $in: froms } });
      // Counts already on a day they land on (the first prep day, when the second is dropped): read once, added to.
      const staying = await tx.find(WeekTray, { week: w.id, prepDate: { $in: [...new Set(counts.map((c) => c.prepDate))] } });
      for (const c of counts) {
        const kept = staying.find((t) => t.tray.id === c.tray && t.prepDate === c.prepDate);
        if (kept) kept.trayCount += c.trayCount;
        else tx.create(WeekTray, { week: w.id, ...c } as never);
      }
    }
    if (v.name !== undefined) w.name = v.name;
    w.prepDate = prepDate;
    w.secondPrepDate = second ?? null;
  });
}

/**
 * A week with two prep days has a shopping list per prep day; once one of them is marked bought, its food is in the
 * kitchen and its pantry change recorded. Dropping the second prep day would fold both lists into one whole-week list
 * that no longer knows what was bought: refused (409), saying what to do instead.
 */
async function keepTripsBought(em: EntityManager, week: IWeek, order: DateOrder): Promise<void> {
  const bought = await em.getConnection().execute<{ trip: number }[]>(
    'select trip from shopping_purchase where week_id = ? and trip > 0 order by trip',
    [week.id],
  );
  if (!bought.length) return;
  const dates = [week.prepDate, week.secondPrepDate];
  const which = bought.map((b) => `prep ${shortDate(dates[b.trip - 1] ?? week.prepDate, order)}`).join(' and ');
  throw new Conflict(
    `The shopping list for ${which} was marked bought, so this week keeps its two prep days. To bake everything on the first, set the second prep day's tray counts to 0 and have its plates take their portions from the first.`,
  );
}

export async function deleteWeek(em: EntityManager, actor: Actor, id: number): Promise<void> {
  const week = await findWeek(em, actor, id);
  await em.transactional(async (tx) => {
    await tx.nativeDelete(WeekCell, { week: week.id });
    await tx.nativeDelete(WeekTray, { week: week.id });
    await tx.nativeDelete(WeekPublication, { week: week.id });
    await tx.nativeDelete(Week, { id: week.id, workspace: actor.workspaceId });
  });
}

// ── The board ───────────────────────────────────────────────────────────────────────────────────────

/** Checks cells against the board's clients, days, slots, plates and prep dates, and the allergen rule. */
function checkCells(d: BoardData, cells: PutCells['cells']) {
  const errors: Record<string, string[]> = {};
  const days = new Set(weekDays(d.week));
  const prepDates = new Set(prepDatesOf(d.week));
  const clients = new Map(d.clients.map((c) => [c.id, c]));
  const plates = new Set(d.assemblies.map((a) => a.id));
  // A cell that already plans an archived plate keeps it (a change of storage or prep day); a new one cannot use it.
  const planned = new Map(d.cells.map((c) => [cellKey({ clientId: c.client.id, date: c.date, slot: c.slot }), c.assembly.id]));
  const seen = new Set<string>();
  cells.forEach((c, i) => {
    const at = `cells.${i}`;
    if (!clients.has(c.clientId)) errors[`${at}.clientId`] = ['This client is not in your workspace, or is archived (restore them to plan their plates)'];
    if (!days.has(c.date)) errors[`${at}.date`] = ['This day is not on the board of this week'];
    if (!d.slots.includes(c.slot)) errors[`${at}.slot`] = [`Meal slots of this workspace: ${d.slots.join(', ')}`];
    if (c.prepDate && !prepDates.has(c.prepDate)) errors[`${at}.prepDate`] = ['Not a prep date of this week'];
    const key = cellKey(c);
    if (seen.has(key)) errors[`${at}`] = ['The same cell appears twice'];
    seen.add(key);
    if (c.assemblyId === null) return;
    if (!plates.has(c.assemblyId)) {
      errors[`${at}.assemblyId`] = ['This plate does not exist in your workspace'];
      return;
    }
    const plate = d.assemblies.find((a) => a.id === c.assemblyId)!;
    if (plate.archived && planned.get(key) !== plate.id) {
      errors[`${at}.assemblyId`] = [`${plate.name} is archived: restore it on the Plates page to plan it again`];
      return;
    }
    const client = clients.get(c.clientId);
    if (!client) return;
    const plateAllergens = boardPlateAllergens(d, plate.id);
    const conflicts = allergenConflicts(plateAllergens, (client.allergens ?? []) as AllergenCode[]);
    const overridden = new Set(c.allergenOverrides.map((o) => o.allergen));
    const open = conflicts.filter((a) => !overridden.has(a));
    if (open.length) {
      errors[`${at}.allergenOverrides`] = [
        `${plate.name} contains ${open.map(allergenLabel).join(', ')}, on ${client.name}'s allergen list: choose another plate or override with a reason`,
      ];
    }
  });
  if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);
}

const plateAllergenCache = new WeakMap<BoardData, Map<number, AllergenCode[]>>();
function boardPlateAllergens(d: BoardData, assemblyId: number): AllergenCode[] {
  let map = plateAllergenCache.get(d);
  if (!map) {
    const input = boardInput(d, []);
    map = new Map([...input.plates.values()].map((p) => [p.id, [...p.allergens]]));
    plateAllergenCache.set(d, map);
  }
  return map.get(assemblyId) ?? [];
}

/** Sets, changes or empties cells (a partial update of the board, all-or-nothing). */
export async function putCells(em: EntityManager, actor: Actor, id: number, v: PutCells): Promise<BoardAnswer> {
  // The week and what the cells are checked against, in one round (a drag on the board runs this).
  const data = await loadBoardById(em, actor, id);
  if (data.week.version !== v.version) await stale(em, actor, data.week);
  checkCells(data, v.cells);
  const written = new Map<string, IWeekCell>();
  return commitWeekEdit(
    em,
    actor,
    data.week,
    async (tx, w) => {
      // Only the rows of the edited clients and days (a drag touches one cell; the ORM hydrates and diffs every row read).
      const existing = await tx.find(WeekCell, {
        week: w.id,
        client: { $in: [...new Set(v.cells.map((c) => c.clientId))] },
        date: { $in: [...new Set(v.cells.map((c) => c.date))] },
      });
      const byKey = new Map(existing.map((c) => [cellKey({ clientId: c.client.id, date: c.date, slot: c.slot }), c]));
      for (const c of v.cells) {
        const row = byKey.get(cellKey(c));
        if (c.assemblyId === null) {
          if (row) tx.remove(row);
          continue;
        }
        const values = {
          assembly: c.assemblyId,
          prepDate: c.prepDate ?? null,
          storage: c.storage,
          allergenOverrides: c.allergenOverrides,
        };
        if (row) tx.assign(row, values as never);
        written.set(cellKey(c), row ?? tx.create(WeekCell, { week: w.id, client: c.clientId, date: c.date, slot: c.slot, ...values } as never));
      }
    },
    // The commit held the version the board was read at, so its cells are the ones read plus this edit: answer from
    // the rows already read instead of reading all of them again. Plates, clients and trays are as read a moment
    // before the commit; a change made to them meanwhile shows on the next read, as it would a moment later anyway.
    (version) => presentBoard(withEditedCells(data, version, v.cells, written)),
  );
}

/** The board read before an edit, with the edit's cells in place (removed, replaced or added) and the new version. */
function withEditedCells(data: BoardData, version: number, cells: PutCells['cells'], written: Map<string, IWeekCell>): BoardData {
  const edited = new Set(cells.map((c) => cellKey(c)));
  const kept = data.cells.filter((c) => !edited.has(cellKey({ clientId: c.client.id, date: c.date, slot: c.slot })));
  const placed: BoardCellRow[] = [...written.values()].map((c) => ({
    id: c.id,
    client: { id: c.client.id },
    assembly: { id: c.assembly.id },
    date: c.date,
    slot: c.slot,
    prepDate: c.prepDate ?? null,
    storage: c.storage,
    allergenOverrides: (c.allergenOverrides ?? []) as BoardCellRow['allergenOverrides'],
  }));
  // In the order the board reads them (day, then id), as a fresh read would give them.
  const all = [...kept, ...placed].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : a.id - b.id));
  // An archived client is on the board through their plates: with the last one gone, they leave it (as on a read).
  const planned = new Set(all.map((c) => c.client.id));
  const clients = data.clients.filter((c) => !c.archivedAt || planned.has(c.id));
  return { ...data, week: { ...data.week, version }, clients, cells: all };
}

/** Replaces the week's tray counts. */
export async function putTrays(em: EntityManager, actor: Actor, id: number, v: PutTrays): Promise<BoardAnswer> {
  const week = await openForEdit(em, actor, id, v.version);
  const prepDates = new Set(prepDatesOf(week));
  const trayIds = [...new Set(v.trays.map((t) => t.trayId))];
  const known = new Set((await em.find(Tray, { id: { $in: trayIds }, workspace: actor.workspaceId }, { fields: ['id'] })).map((t) => t.id));
  const errors: Record<string, string[]> = {};
  v.trays.forEach((t, i) => {
    if (!known.has(t.trayId)) errors[`trays.${i}.trayId`] = ['This base tray does not exist in your workspace'];
    if (!prepDates.has(t.prepDate)) errors[`trays.${i}.prepDate`] = ['Not a prep date of this week'];
  });
  if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);
  return replaceTrays(em, actor, week, v.trays);
}

async function replaceTrays(em: EntityManager, actor: Actor, week: IWeek, trays: { trayId: number; prepDate: IsoDate; trayCount: number }[]) {
  return commitWeekEdit(em, actor, week, async (tx, w) => {
    await tx.nativeDelete(WeekTray, { week: w.id });
    const merged = new Map<string, { trayId: number; prepDate: IsoDate; trayCount: number }>();
    for (const t of trays) {
      const k = `${t.trayId}|${t.prepDate}`;
      const prev = merged.get(k);
      merged.set(k, { ...t, trayCount: (prev?.trayCount ?? 0) + t.trayCount });
    }
    for (const t of merged.values()) tx.create(WeekTray, { week: w.id, tray: t.trayId, prepDate: t.prepDate, trayCount: t.trayCount } as never);
  });
}

/** Sets every tray count to cover the portions the board needs (whole trays, per prep date). */
export async function coverTrays(em: EntityManager, actor: Actor, id: number, version: number): Promise<BoardAnswer> {
  const week = await openForEdit(em, actor, id, version);
  const data = await loadBoardData(em, actor, week);
  const batches = coveringBatches(boardInput(data)).filter((b) => b.trayCount > 0);
  return replaceTrays(em, actor, week, batches);
}

/**
 * Copies one day's cells (all clients, or one) onto another day of the same week, replacing what was there. A plate
 * archived since stays behind (no new cell takes it), as in a copied week.
 */
export async function copyDay(em: EntityManager, actor: Actor, id: number, v: CopyDay): Promise<BoardAnswer> {
  const week = await openForEdit(em, actor, id, v.version);
  const days = weekDays(week);
  if (!days.includes(v.fromDate)) throw ValidationError.field('fromDate', 'This day is not on the board of this week');
  if (!days.includes(v.toDate)) throw ValidationError.field('toDate', 'This day is not on the board of this week');
  if (v.fromDate === v.toDate) throw ValidationError.field('toDate', 'Pick another day to copy to');
  const filter = v.clientId ? { client: v.clientId } : {};
  return commitWeekEdit(em, actor, week, async (tx, w) => {
    const from = await tx.find(WeekCell, { week: w.id, date: v.fromDate, assembly: { archived: false }, ...filter });
    await tx.nativeDelete(WeekCell, { week: w.id, date: v.toDate, ...filter });
    for (const c of from) {
      tx.create(WeekCell, {
        week: w.id,
        client: c.client.id,
        date: v.toDate,
        slot: c.slot,
        assembly: c.assembly.id,
        prepDate: null,
        storage: 'fridge',
        allergenOverrides: c.allergenOverrides,
      } as never);
    }
  });
}

/**
 * A new week with the same board shifted to a new start date, and the same tray counts. Archived clients and archived
 * plates stay behind: a copied week plans the people still coached, with the plates still served.
 */
export async function copyWeek(em: EntityManager, actor: Actor, id: number, v: CopyWeek): Promise<CopyWeekAnswer> {
  const source = await findWeek(em, actor, id);
  checkPrepDates(v.startDate, v.prepDate, v.secondPrepDate);
  const shift = daysBetween(source.startDate, v.startDate);
  const { newId, copied } = await em.transactional(async (tx) => {
    await checkDaysFree(tx, actor, v.startDate);
    const w = newWeek(tx, actor, v);
    await tx.flush();
    const mapPrep = (d: IsoDate | null | undefined): IsoDate | null =>
      d && d === source.secondPrepDate ? (v.secondPrepDate ?? null) : null;
    const cells = await tx.find(WeekCell, { week: source.id, client: { archivedAt: null }, assembly: { archived: false } });
    const all = await tx.count(WeekCell, { week: source.id });
    for (const c of cells) {
      tx.create(WeekCell, {
        week: w.id,
        client: c.client.id,
        date: addDays(c.date, shift),
        slot: c.slot,
        assembly: c.assembly.id,
        prepDate: mapPrep(c.prepDate),
        storage: c.storage,
        allergenOverrides: c.allergenOverrides,
      } as never);
    }
    // A source with two prep days copied to a week with one: each tray's counts on both go to that one prep day,
    // added up (a tray is counted once per prep day).
    const sourceCounts = await tx.find(WeekTray, { week: source.id });
    const onNewDays = countsOnPrepDays(sourceCounts, (d) => (d === source.secondPrepDate && v.secondPrepDate ? v.secondPrepDate : v.prepDate));
    for (const t of onNewDays) tx.create(WeekTray, { week: w.id, ...t } as never);
    await tx.flush();
    return { newId: w.id, copied: { meals: cells.length, leftBehind: all - cells.length } };
  });
  em.clear();
  return { ...(await getBoard(em, actor, newId)), copied };
}

// ── Home page ───────────────────────────────────────────────────────────────────────────────────────

/** How many active base trays, plates, clients, ovens and prep weeks the workspace has (one statement). */
async function setupCounts(em: EntityManager, workspaceId: number): Promise<SetupCountsDto> {
  const [row] = await preparedRows<SetupCountsDto>(
    em,
    'trayline_setup_counts',
    `select (select count(*) from tray where workspace_id = $1 and not archived)::int as trays,
            (select count(*) from assembly where workspace_id = $1 and not archived)::int as plates,
            (select count(*) from client where workspace_id = $1 and archived_at is null)::int as clients,
            (select count(*) from oven where workspace_id = $1)::int as ovens,
            (select count(*) from week where workspace_id = $1)::int as weeks`,
    [workspaceId],
  );
  return row;
}

export async function glance(em: EntityManager, actor: Actor, today: IsoDate = todayIso()): Promise<GlanceDto> {
  const [weeks, setup] = await Promise.all([em.find(Week, { workspace: actor.workspaceId }), setupCounts(em, actor.workspaceId)]);
  const week = pickWeek(weeks, today);
  if (!week) return { week: null, nextWeek: null, warnings: 0, blocks: 0, portionsShort: 0, nextPrepDate: null, setup, cooling: { thrownAway: [], missed: [] }, publishedAllergens: { clients: 0, plates: 0 } };
  const after = weekAfter(weeks, week);
  const [data, cooling, clashes] = await Promise.all([
    loadBoardData(em, actor, week),
    coolingTrouble(em, actor.workspaceId, week.id),
    publishedAllergensOf(em, actor, week, today),
  ]);
  const result = computeBoard(boardInput(data));
  const nextPrepDate =
    weeks
      .flatMap((w) => prepDatesOf(w))
      .filter((d) => compareIsoDates(d, today) >= 0)
      .sort(compareIsoDates)[0] ?? null;
  return {
    week: presentWeekSummary(data.week, data.cells.length, data.publishedAt, data.dateOrder),
    nextWeek: after
      ? {
          id: after.id,
          name: weekTitle(after, data.dateOrder),
          startDate: after.startDate,
          cellCount: await em.count(WeekCell, { week: after.id }),
          publishedVersion: after.publishedVersion ?? null,
        }
      : null,
    warnings: result.warnings.filter((w) => w.severity === 'warn').length,
    blocks: result.warnings.filter((w) => w.severity === 'block').length,
    portionsShort: result.inventory.reduce((s, t) => s + t.short, 0),
    nextPrepDate,
    setup,
    cooling,
    publishedAllergens: { clients: clashes.clients.length, plates: clashes.clients.reduce((n, c) => n + c.plates.length, 0) },
  };
}

