import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { CAUTIONS } from '@shared/domain/eat-by.js';
import { addDays, compareIsoDates, type IsoDate } from '@shared/domain/iso-date.js';
import { cellKey, computeBoard, snapshotTitle, type BoardResult } from '@shared/domain/week-board.js';
import { worded } from '@shared/domain/week-check.js';
import { pickWeek, weekAfter } from '@shared/domain/week-days.js';
import type { AssemblyDto, PlateMacrosDto } from '@shared/schemas/assemblies.schema.js';
import { notAllowed, type AllergenCode } from '@shared/domain/allergens.js';
import type {
  MyDayDto,
  MyPlateDto,
  MyWeekDto,
  PublishedAllergenPlateDto,
  PublishedAllergenWeekDto,
  WeekPublicationDto,
  WeekPublishedAllergensDto,
  WeekSnapshot,
} from '@shared/schemas/weeks.schema.js';
import type { BoardAnswer } from '@shared/schemas/board-answer.js';
import { datesOf, type Actor } from '../../http/authz.js';
import { Conflict, StaleEdit } from '../../http/errors.js';
import { AssemblyItem } from '../assemblies/assembly.entity.js';
import { Client } from '../clients/client.entity.js';
import { findClient } from '../clients/client.service.js';
import { Week, WeekPublication, WeekTray, type IWeek, type IWeekPublication } from './week.entity.js';
import { boardInput, findWeek, getBoard, loadBoardData, presentBoard, prepDatesOf, todayIso, type BoardData } from './week-board.service.js';
import { preparedRows } from '../../db/prepared.js';

const r1 = (d: Decimal) => d.toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber();

function sumMacros(list: PlateMacrosDto[]): PlateMacrosDto {
  const keys = ['kcal', 'fatG', 'proteinG', 'carbsG', 'fiberG', 'netCarbsG'] as const;
  const out = {} as PlateMacrosDto;
  for (const k of keys) out[k] = r1(list.reduce((s, m) => s.plus(m[k]), new Decimal(0)));
  return out;
}

function myPlate(
  plate: AssemblyDto,
  slot: string,
  eat: BoardResult['cells'][number] | undefined,
  date: IsoDate,
  prepDate: IsoDate,
  overrides: readonly { allergen: AllergenCode }[],
): MyPlateDto {
  const storage = eat?.portions[0]?.storage ?? 'fridge';
  const eatBys = (eat?.portions ?? []).map((p) => p.eatBy).sort(compareIsoDates);
  return {
    slot,
    name: plate.name,
    description: plate.description,
    macros: plate.macros,
    allergens: plate.allergens,
    allowedAllergens: plate.allergens.filter((a) => overrides.some((o) => o.allergen === a)),
    trays: plate.trays.map((t) => ({ trayId: t.trayId, name: t.trayName, portions: t.portions, reheatSteps: t.reheatSteps })),
    addOns: plate.addOns.map((a) => ({ name: a.ingredientName, amountText: a.amountText, unit: a.unit, note: a.note })),
    assemblySteps: plate.assemblySteps,
    reheatSteps: plate.reheatSteps,
    eatBy: storage === 'frozen' ? null : (eatBys[0] ?? null),
    storage,
    thawOn: storage === 'frozen' ? addDays(date, -1) : null,
    prepDate,
  };
}

/** Every client's days as clients will read them. */
export function buildSnapshot(d: BoardData, board: BoardAnswer, result: BoardResult): WeekSnapshot {
  const plates = new Map(board.plates.map((p) => [p.id, p]));
  const eat = new Map(result.cells.map((c) => [cellKey(c), c]));
  const slotOrder = (s: string) => board.slots.indexOf(s);
  const clients: WeekSnapshot['clients'] = {};
  for (const client of board.clients) {
    const cells = board.cells.filter((c) => c.clientId === client.id);
    if (!cells.length) continue;
    const trayIds = new Set<number>();
    const days: MyDayDto[] = board.days
      .map((date) => {
        const list = cells
          .filter((c) => c.date === date)
          .sort((a, b) => slotOrder(a.slot) - slotOrder(b.slot))
          .flatMap((c) => {
            const plate = plates.get(c.assemblyId);
            if (!plate) return [];
            plate.trays.forEach((t) => trayIds.add(t.trayId));
            const e = eat.get(cellKey(c));
            return [myPlate(plate, c.slot, e, date, e?.portions[0]?.prepDate ?? c.prepDate ?? d.week.prepDate, c.allergenOverrides ?? [])];
          });
        return { date, plates: list, totals: sumMacros(list.map((p) => p.macros)) };
      })
      .filter((day) => day.plates.length > 0);
    clients[String(client.id)] = { days, trayIds: [...trayIds] };
  }
  return {
    weekId: d.week.id,
    name: board.week.name,
    ownName: d.week.name ?? '',
    startDate: board.week.startDate,
    endDate: board.week.endDate,
    prepDates: prepDatesOf(d.week),
    clients,
  };
}

/**
 * Publishes the board as the next version: the snapshot is what clients read until the next publication. Refused
 * (409) while a blocking problem remains (an allergen without an override, a portion past its eat-by date or planned
 * before its tray is made).
 */
export async function publishWeek(em: EntityManager, actor: Actor, id: number, version: number): Promise<BoardAnswer> {
  const week = await findWeek(em, actor, id);
  if (week.version !== version) throw new StaleEdit(week.version, await getBoard(em, actor, id));
  const data = await loadBoardData(em, actor, week);
  const result = computeBoard(boardInput(data));
  // The refusal is read by a person: its problems come worded.
  const blocks = result.warnings.filter((w) => w.severity === 'block').map((w) => worded(w, data.dateOrder));
  if (blocks.length) {
    throw new Conflict(`${blocks.length === 1 ? '1 problem' : `${blocks.length} problems`} must be solved before publishing: ${blocks[0].message}`, { blocks });
  }
  if (!data.cells.length) throw new Conflict('The board is empty: place plates before publishing');
  const snapshot = buildSnapshot(data, presentBoard(data, result), result);
  await em.transactional(async (tx) => {
    const w = await tx.findOneOrFail(Week, { id: week.id, workspace: actor.workspaceId });
    const number = (w.publishedVersion ?? 0) + 1;
    tx.create(WeekPublication, { workspace: actor.workspaceId, week: w.id, number, snapshot, publishedBy: actor.userId } as never);
    w.publishedVersion = number;
    // The flush bumps the version by one: that is the board version clients now see.
    w.publishedBoardVersion = w.version + 1;
    await tx.flush();
  });
  em.clear();
  return getBoard(em, actor, id);
}

/** A week's published versions, newest first, with who published each (by name). */
export async function listPublications(em: EntityManager, actor: Actor, id: number): Promise<WeekPublicationDto[]> {
  const week = await findWeek(em, actor, id);
  const rows = await preparedRows<{ number: number; publishedAt: string | Date; publishedBy: string | null }>(
    em,
    'trayline_week_publications',
    `select p.number, p.published_at as "publishedAt", u.name as "publishedBy"
       from week_publication p left join app_user u on u.id = p.published_by
      where p.week_id = $1 order by p.number desc`,
    [week.id],
  );
  return rows.map((r) => ({ ...r, publishedAt: new Date(r.publishedAt).toISOString() }));
}

/** Latest publication of the workspace's most recent published weeks (by start date). */
async function latestPublications(em: EntityManager, workspaceId: number, limit: number) {
  const weeks = await em.find(
    Week,
    { workspace: workspaceId, publishedVersion: { $ne: null } },
    { orderBy: { startDate: 'desc', id: 'desc' }, limit },
  );
  if (!weeks.length) return [] as { week: IWeek; pub: IWeekPublication }[];
  const pubs = await em.find(WeekPublication, { $or: weeks.map((w) => ({ week: w.id, number: w.publishedVersion! })) });
  const byWeek = new Map(pubs.map((p) => [p.week.id, p]));
  return weeks.filter((w) => byWeek.has(w.id)).map((w) => ({ week: w, pub: byWeek.get(w.id)! }));
}

/** A client's published days with each plate's allergens that are on their list as it stands now (`onYourList`). */
export function withYourList(days: readonly MyDayDto[], list: readonly string[]): MyDayDto[] {
  return days.map((d) => ({ ...d, plates: d.plates.map((p) => ({ ...p, onYourList: p.allergens.filter((a) => list.includes(a)) })) }));
}

/**
 * One client's plates in a published snapshot, from `today` on, holding an allergen on their list as it stands now
 * that the coach did not allow when publishing. A plan published before the allowed ones were kept is left out: what
 * was allowed in it cannot be told (the client's page asks them to check).
 */
function clashingPlates(snapshot: WeekSnapshot, clientId: number, list: readonly string[], today: IsoDate): PublishedAllergenPlateDto[] {
  if (!list.length) return [];
  return withYourList(snapshot.clients[String(clientId)]?.days ?? [], list)
    .filter((d) => compareIsoDates(d.date, today) >= 0)
    .flatMap((d) =>
      d.plates.flatMap((p) => {
        if (p.allowedAllergens === undefined) return [];
        const allergens = notAllowed(p.onYourList ?? [], p.allowedAllergens);
        return allergens.length ? [{ date: d.date, slot: p.slot, name: p.name, allergens }] : [];
      }),
    );
}

/** The plates of the client's published weeks, from `today` on, that `clashingPlates` finds, week by week. */
export async function publishedAllergens(em: EntityManager, actor: Actor, clientId: number, today: IsoDate = todayIso()): Promise<PublishedAllergenWeekDto[]> {
  const client = await findClient(em, actor, clientId);
  if (!client.allergens.length) return [];
  const weeks = await em.find(
    Week,
    { workspace: actor.workspaceId, publishedVersion: { $ne: null }, startDate: { $gte: addDays(today, -6) } },
    { fields: ['id', 'startDate', 'publishedVersion'], orderBy: { startDate: 'asc', id: 'asc' } },
  );
  if (!weeks.length) return [];
  const pubs = await em.find(WeekPublication, { $or: weeks.map((w) => ({ week: w.id, number: w.publishedVersion! })) });
  const order = datesOf(actor);
  return weeks.flatMap((w) => {
    const pub = pubs.find((p) => p.week.id === w.id);
    const plates = pub ? clashingPlates(pub.snapshot, clientId, client.allergens, today) : [];
    return pub && plates.length ? [{ weekId: w.id, weekName: snapshotTitle(pub.snapshot, order), publishedVersion: pub.number, plates }] : [];
  });
}

/**
 * A week's published version, from `today` on, client by client: the plates `clashingPlates` finds (clients without
 * any are left out). Each client's list is read as it stands now, an archived client's too (their plan still holds).
 */
export async function weekPublishedAllergens(em: EntityManager, actor: Actor, weekId: number, today: IsoDate = todayIso()): Promise<WeekPublishedAllergensDto> {
  return publishedAllergensOf(em, actor, await findWeek(em, actor, weekId), today);
}

/** `weekPublishedAllergens` for a week row already read (of the actor's workspace): the home glance has it. */
export async function publishedAllergensOf(em: EntityManager, actor: Actor, week: Pick<IWeek, 'id' | 'publishedVersion'>, today: IsoDate): Promise<WeekPublishedAllergensDto> {
  const none = { weekId: week.id, publishedVersion: week.publishedVersion ?? null, clients: [] };
  const pub = week.publishedVersion ? await em.findOne(WeekPublication, { week: week.id, number: week.publishedVersion }) : null;
  return pub ? { ...none, clients: await clashesByClient(em, actor, pub.snapshot, today) } : none;
}

/** `clashingPlates` for every client in a snapshot, by name; one query for the clients' lists. */
async function clashesByClient(em: EntityManager, actor: Actor, snapshot: WeekSnapshot, today: IsoDate): Promise<WeekPublishedAllergensDto['clients']> {
  const ids = Object.keys(snapshot.clients).map(Number);
  if (!ids.length) return [];
  const clients = await em.find(Client, { id: { $in: ids }, workspace: actor.workspaceId }, { fields: ['id', 'name', 'allergens'], orderBy: { name: 'asc', id: 'asc' } });
  return clients.flatMap((c) => {
    const plates = clashingPlates(snapshot, c.id, c.allergens, today);
    return plates.length ? [{ clientId: c.id, name: c.name, plates }] : [];
  });
}

/** The client's published week: the one covering `today`, else the next, else the latest. Null when none. */
export async function myWeek(em: EntityManager, actor: Actor, today: IsoDate = todayIso()): Promise<MyWeekDto | null> {
  if (actor.clientId === null) return null;
  const weeks = await em.find(Week, { workspace: actor.workspaceId, publishedVersion: { $ne: null } }, { fields: ['id', 'startDate', 'publishedVersion'] });
  const current = pickWeek(weeks, today);
  if (!current) return null;
  const after = weekAfter(weeks, current);
  const [pub, nextPub, client] = await Promise.all([
    em.findOne(WeekPublication, { week: current.id, number: current.publishedVersion! }),
    after ? em.findOne(WeekPublication, { week: after.id, number: after.publishedVersion! }) : null,
    em.findOne(Client, { id: actor.clientId, workspace: actor.workspaceId }, { fields: ['allergens'] }),
  ]);
  if (!pub) return null;
  const list = client?.allergens ?? [];
  const mine = pub.snapshot.clients[String(actor.clientId)];
  const nextDays = withYourList(nextPub?.snapshot.clients[String(actor.clientId)]?.days ?? [], list);
  return {
    weekId: current.id,
    name: snapshotTitle(pub.snapshot, datesOf(actor)),
    publishedVersion: pub.number,
    publishedAt: pub.publishedAt.toISOString(),
    startDate: pub.snapshot.startDate,
    endDate: pub.snapshot.endDate,
    days: withYourList(mine?.days ?? [], list),
    next:
      nextPub && nextDays.length
        ? {
            weekId: nextPub.snapshot.weekId,
            name: snapshotTitle(nextPub.snapshot, datesOf(actor)),
            publishedVersion: nextPub.number,
            startDate: nextPub.snapshot.startDate,
            endDate: nextPub.snapshot.endDate,
            days: nextDays,
          }
        : null,
    cautions: CAUTIONS,
  };
}

// ── Hooks for the trays module ─────────────────────────────────────────────────────────────────────

/** Trays in the signed-in client's published plans (the latest publication of the 8 most recent published weeks). */
export async function publishedTrayIdsForClient(em: EntityManager, actor: Actor): Promise<number[]> {
  if (actor.role !== 'client' || actor.clientId === null) return [];
  const list = await latestPublications(em, actor.workspaceId, 8);
  const ids = new Set<number>();
  for (const { pub } of list) for (const id of pub.snapshot.clients[String(actor.clientId)]?.trayIds ?? []) ids.add(id);
  return [...ids];
}

/** Whether a plate or a week uses this tray (then it is archived, never deleted). */
export async function trayInUse(em: EntityManager, workspaceId: number, trayId: number): Promise<boolean> {
  const items = await em.count(AssemblyItem, { tray: trayId, assembly: { workspace: workspaceId } });
  const batches = await em.count(WeekTray, { tray: trayId, week: { workspace: workspaceId } });
  return items + batches > 0;
}
