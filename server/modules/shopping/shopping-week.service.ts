import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { UniqueConstraintViolationException } from '@mikro-orm/core';
import type { MarkBoughtDto, ShoppingCheckDto, ShoppingListDto, ShoppingNeedsValues } from '@shared/schemas/shopping.schema.js';
import { measureOf, type Actor } from '../../http/authz.js';
import { Conflict, NotFound, ValidationError } from '../../http/errors.js';
import { User } from '../auth/user.entity.js';
import { findWeek, loadBoardData, prepDatesOf, type BoardData } from '../weeks/week-board.service.js';
import { cellPrepDate, tripDatesOf } from '@shared/domain/week-board.js';
import { itemsOf as assemblyItemsOf } from '../assemblies/plate-facts.js';
import type { IWeek } from '../weeks/week.entity.js';
import { listWeeks } from '../weeks/week.service.js';
import { todayIso } from '../weeks/week-board.service.js';
import { kitchenWeek } from '@shared/domain/week-days.js';
import type { IsoDate } from '@shared/domain/iso-date.js';
import type { WeekSummaryDto } from '@shared/schemas/weeks.schema.js';
import { PantryItem } from './pantry.entity.js';
import { pantryAmount } from './pantry.service.js';
import { loadShoppingIngredients } from './shopping-ingredient.js';
import { ShoppingCheck, ShoppingPurchase, type IShoppingPurchase } from './shopping.entity.js';
import { presentShoppingList } from './shopping.presenter.js';
import { computeLaterShoppingList, computeShoppingList, itemsOf, type ComputedShoppingList } from './shopping.service.js';

/** Which list: 0 for the whole week, else the trip's number (1, 2); a 400 naming prepDate for a date not a trip's. */
function tripOf(week: IWeek, prepDate: IsoDate | undefined): number {
  if (prepDate === undefined) return 0;
  const dates = tripDatesOf(week);
  const i = dates.indexOf(prepDate);
  if (i < 0) {
    throw ValidationError.field(
      'prepDate',
      dates.length ? `Not a prep day of this week (${dates.join(' or ')})` : 'This week has one prep day: its list is the whole week',
    );
  }
  return i + 1;
}

/**
 * What a prep week asks the shop for: the tray counts of every prep date (× the tray's lines) and the add-ons of
 * every plate on the board (× the client's household multiplier). For one trip (`prepDate`): that prep date's tray
 * counts and the add-ons of the plates it supplies (a cell's own prep date, else the latest one on or before its day).
 */
export function weekNeeds(data: BoardData, prepDate?: IsoDate): ShoppingNeedsValues {
  const trays = data.trays
    .filter((t) => t.trayCount > 0 && (!prepDate || t.prepDate === prepDate))
    .map((t) => ({ trayId: t.tray.id, count: t.trayCount }));
  const plates = new Map(data.assemblies.map((a) => [a.id, a]));
  const multipliers = new Map(data.clients.map((c) => [c.id, new Decimal(c.householdMultiplier ?? 1)]));
  const prepDates = prepDatesOf(data.week);
  const addOns: ShoppingNeedsValues['addOns'] = [];
  for (const cell of data.cells) {
    if (prepDate && cellPrepDate({ date: cell.date, prepDate: cell.prepDate ?? null }, prepDates) !== prepDate) continue;
    const plate = plates.get(cell.assembly.id);
    if (!plate) continue;
    const times = multipliers.get(cell.client.id) ?? new Decimal(1);
    for (const item of assemblyItemsOf(plate)) {
      if (!item.ingredient || item.amount === null || item.amount === undefined || !item.unit) continue;
      addOns.push({ ingredientId: item.ingredient.id, amount: new Decimal(item.amount).times(times).toFixed(), unit: item.unit });
    }
  }
  return { trays, addOns };
}

/**
 * A list of the week: the whole week (trip 0), or one trip. The pantry serves the trips in order: a later trip's
 * list leaves out what an earlier trip not yet bought takes from it (once that trip is marked bought, the pantry
 * itself says what is left).
 */
async function computeForWeek(em: EntityManager, actor: Actor, week: IWeek, trip: number): Promise<ComputedShoppingList> {
  const data = await loadBoardData(em, actor, week);
  if (trip === 0) return computeShoppingList(em, actor, weekNeeds(data));
  const dates = tripDatesOf(week);
  const bought = new Set(
    (await em.find(ShoppingPurchase, { week: week.id, trip: { $gte: 1, $lt: trip } }, { fields: ['trip'] })).map((p) => p.trip),
  );
  const earlier = dates.slice(0, trip - 1).map((d, i) => ({ input: weekNeeds(data, d), takesPantry: !bought.has(i + 1) }));
  return computeLaterShoppingList(em, actor, earlier, weekNeeds(data, dates[trip - 1]));
}

async function userNames(em: EntityManager, ids: readonly number[]): Promise<Map<number, string>> {
  const unique = [...new Set(ids)];
  if (!unique.length) return new Map();
  const users = await em.find(User, { id: { $in: unique } }, { fields: ['id', 'name'] });
  return new Map(users.map((u) => [u.id, u.name]));
}

async function checksOf(em: EntityManager, weekId: number, trip: number): Promise<Map<number, ShoppingCheckDto>> {
  const rows = await em.find(ShoppingCheck, { week: weekId, trip });
  const names = await userNames(em, rows.filter((r) => r.checkedBy).map((r) => r.checkedBy!.id));
  return new Map(
    rows.map((r) => [
      r.ingredient.id,
      {
        checked: r.checked,
        checkedBy: r.checkedBy ? (names.get(r.checkedBy.id) ?? null) : null,
        checkedAt: r.checkedAt ? r.checkedAt.toISOString() : null,
      },
    ]),
  );
}

async function boughtOf(em: EntityManager, purchase: IShoppingPurchase | null) {
  if (!purchase) return null;
  const names = await userNames(em, purchase.boughtBy ? [purchase.boughtBy.id] : []);
  return { at: purchase.boughtAt.toISOString(), by: purchase.boughtBy ? (names.get(purchase.boughtBy.id) ?? null) : null };
}

/** A list of the week (the whole week, or the trip before `prepDate`): computed now, with its check marks. */
export async function weekShoppingList(em: EntityManager, actor: Actor, weekId: number, prepDate?: IsoDate): Promise<ShoppingListDto> {
  const week = await findWeek(em, actor, weekId);
  const trip = tripOf(week, prepDate);
  const [computed, checks, purchases] = await Promise.all([
    computeForWeek(em, actor, week, trip),
    checksOf(em, week.id, trip),
    em.find(ShoppingPurchase, { week: week.id }, { orderBy: { trip: 'asc' } }),
  ]);
  const dates = tripDatesOf(week);
  return presentShoppingList(computed, {
    weekId: week.id,
    prepDate: prepDate ?? null,
    tripDates: dates,
    system: measureOf(actor),
    checks,
    bought: await boughtOf(em, purchases.find((p) => p.trip === trip) ?? null),
    alsoBought: purchases
      .filter((p) => p.trip !== trip)
      .map((p) => ({ prepDate: p.trip === 0 ? null : (dates[p.trip - 1] ?? null), at: p.boughtAt.toISOString() })),
  });
}

/** A computed list of a week (domain objects, for the CSV and PDF exports). */
export async function weekShoppingExport(em: EntityManager, actor: Actor, weekId: number, prepDate?: IsoDate) {
  const week = await findWeek(em, actor, weekId);
  const trip = tripOf(week, prepDate);
  const [computed, checks] = await Promise.all([computeForWeek(em, actor, week, trip), checksOf(em, week.id, trip)]);
  const dto = presentShoppingList(computed, { weekId: week.id, prepDate: prepDate ?? null, tripDates: tripDatesOf(week), system: measureOf(actor), checks });
  return { week, computed, dto };
}

/**
 * Checks or unchecks one item. One row per (week, ingredient), written with a single upsert: concurrent taps on
 * different items never touch each other's rows, and repeating the same tap changes nothing (the first
 * checker and time stay).
 */
export async function setCheck(
  em: EntityManager,
  actor: Actor,
  weekId: number,
  ingredientId: number,
  checked: boolean,
  prepDate?: IsoDate,
): Promise<ShoppingCheckDto & { ingredientId: number }> {
  const week = await findWeek(em, actor, weekId);
  const trip = tripOf(week, prepDate);
  if (!(await loadShoppingIngredients(em, actor, [ingredientId])).has(ingredientId)) throw new NotFound('Ingredient');
  const knex = em.getKnex();
  await knex.raw(
    `insert into shopping_check (workspace_id, week_id, trip, ingredient_id, checked, checked_by_id, checked_at)
     values (?, ?, ?, ?, ?, ?, now())
     on conflict (week_id, trip, ingredient_id) do update
       set checked = excluded.checked, checked_by_id = excluded.checked_by_id, checked_at = excluded.checked_at
       where shopping_check.checked is distinct from excluded.checked`,
    [actor.workspaceId, week.id, trip, ingredientId, checked, checked ? actor.userId : null],
  );
  const row = await em.fork().findOneOrFail(ShoppingCheck, { week: week.id, trip, ingredient: ingredientId });
  const names = await userNames(em, row.checkedBy ? [row.checkedBy.id] : []);
  return {
    ingredientId,
    checked: row.checked,
    checkedBy: row.checkedBy ? (names.get(row.checkedBy.id) ?? null) : null,
    checkedAt: row.checkedAt ? row.checkedAt.toISOString() : null,
  };
}

function presentPurchase(p: IShoppingPurchase, applied: boolean): MarkBoughtDto {
  return {
    applied,
    at: p.boughtAt.toISOString(),
    pantry: (p.changes ?? []).map((c) => ({ ...c, before: Number(c.before), after: Number(c.after) })),
  };
}

/**
 * The whole week and its trips count the same food: a purchase of the other kind refuses this one (409). Checked
 * inside the purchase's transaction with the week row locked, so a whole-week and a trip purchase made at the same
 * moment cannot both pass (the unique (week, trip) row only stops two of the same list).
 */
async function refuseOtherKind(tx: EntityManager, week: IWeek, trip: number): Promise<void> {
  await tx.getConnection().execute('select id from week where id = ? for update', [week.id], 'all', tx.getTransactionContext());
  const other = await tx.findOne(ShoppingPurchase, { week: week.id, trip: trip === 0 ? { $ne: 0 } : 0 }, { fields: ['id'] });
  if (!other) return;
  throw new Conflict(
    trip !== 0
      ? "The whole week's list was marked bought already: the pantry has it"
      : tripDatesOf(week).length
        ? "A prep day's list of this week was marked bought already: mark the other prep day's list bought instead of the whole week"
        : // Only in weeks that lost their second prep day before that was refused (updateWeek keeps it now).
          "A prep day's list of this week was marked bought while it had two prep days: add the second prep day back to mark the rest bought",
  );
}

/**
 * Marks a list bought (the whole week's, or a trip's): for every item, the pantry keeps what the list did not use
 * plus the spare of the packages bought (new amount = on hand − used from the pantry + spare, never below zero).
 * Once per list: the first call records the change; any later call returns that record and changes nothing. The
 * whole week and its trips count the same food: once one kind is bought, the other is refused (409).
 */
export async function markBought(em: EntityManager, actor: Actor, weekId: number, prepDate?: IsoDate): Promise<MarkBoughtDto> {
  const week = await findWeek(em, actor, weekId);
  const trip = tripOf(week, prepDate);
  const done = await em.findOne(ShoppingPurchase, { week: week.id, trip });
  if (done) return presentPurchase(done, false);
  const computed = await computeForWeek(em, actor, week, trip);
  try {
    return await em.transactional(async (tx) => {
      await refuseOtherKind(tx, week, trip);
      const rows = await tx.find(PantryItem, { workspace: actor.workspaceId });
      const byIngredient = new Map(rows.map((r) => [r.ingredient.id, r]));
      const changes: IShoppingPurchase['changes'] = [];
      for (const item of itemsOf(computed.list)) {
        const id = Number(item.ingredientId);
        const spare = item.purchase ? Decimal.max(item.purchase.spare, 0) : new Decimal(0);
        const row = byIngredient.get(id);
        // The row as it is now (someone may have edited it since the list was computed).
        const before = row ? new Decimal(row.amount) : new Decimal(0);
        const after = pantryAmount(before.minus(item.fromPantry).plus(spare));
        if (after.eq(before)) continue;
        if (row) {
          row.amount = after.toFixed(4);
          row.unit = item.base.unit;
        } else {
          tx.create(PantryItem, { workspace: actor.workspaceId, ingredient: id, amount: after.toFixed(4), unit: item.base.unit });
        }
        changes.push({ ingredientId: id, name: item.name, before: before.toFixed(4), after: after.toFixed(4), unit: item.base.unit });
      }
      const purchase = tx.create(ShoppingPurchase, {
        workspace: actor.workspaceId,
        week: week.id,
        trip,
        boughtBy: actor.userId,
        changes,
      });
      await tx.flush();
      return presentPurchase(purchase, true);
    });
  } catch (e) {
    // Two "mark bought" at once: the unique week row lets one through; the other reports the recorded one.
    if (!(e instanceof UniqueConstraintViolationException)) throw e;
    const recorded = await em.fork().findOneOrFail(ShoppingPurchase, { week: week.id, trip });
    return presentPurchase(recorded, false);
  }
}

/**
 * The kitchen's week: the one of the next prep day (today included), whichever board it is on; with no prep day
 * ahead, the week covering today, else the next, else the latest.
 */
export async function currentWeek(em: EntityManager, actor: Actor, today: IsoDate = todayIso()): Promise<WeekSummaryDto | null> {
  return kitchenWeek(await listWeeks(em, actor), today);
}
