import type { EntityManager } from '@mikro-orm/postgresql';
import { CAUTIONS } from '@shared/domain/eat-by.js';
import { addDays, type DateOrder, type IsoDate } from '@shared/domain/iso-date.js';
import { cellKey, computeBoard, prepDatesOf, weekTitle, type BoardInput, type BoardResult } from '@shared/domain/week-board.js';
import type { AllergenCode } from '@shared/domain/allergens.js';
import type { MacroTargets } from '@shared/domain/targets.js';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema.js';
import { type BoardCellDto, type WeekSummaryDto } from '@shared/schemas/weeks.schema.js';
import { BOARD_DAYS } from '@shared/domain/week-days.js';
import { cellAnswer, dayAnswer, type BoardAnswer } from '@shared/schemas/board-answer.js';
import { datesOf, type Actor } from '../../http/authz.js';
import { NotFound } from '../../http/errors.js';
import { preparedRows } from '../../db/prepared.js';
import { loadPlateRows } from '../assemblies/assembly.service.js';
import { presentAssembly } from '../assemblies/assembly.presenter.js';
import { loadWorkspacePlateContext, plateFacts, type PlateContext, type PlateRow } from '../assemblies/plate-facts.js';
import { loadClientFacts, mealSlotsFrom } from '../clients/client.service.js';
import { toNetCarbRule } from '../ingredients/ingredient.service.js';
import type { NetCarbRule } from '@shared/domain/nutrition.js';
import { plannedTargets } from '../clients/client.presenter.js';
import type { ClientFacts } from '../clients/client.entity.js';
import { Week, type IWeek, type IWeekCell } from './week.entity.js';

/** Today's date in UTC: what a request that names no `today` is read against. */
export const todayIso = (): IsoDate => new Date().toISOString().slice(0, 10);

export function weekDays(w: Pick<IWeek, 'startDate'>): IsoDate[] {
  return Array.from({ length: BOARD_DAYS }, (_, i) => addDays(w.startDate, i));
}

export { prepDatesOf };

export async function findWeek(em: EntityManager, actor: Actor, id: number): Promise<IWeek> {
  const w = await em.findOne(Week, { id, workspace: actor.workspaceId });
  if (!w) throw new NotFound('Week');
  return w;
}

export function presentWeekSummary(w: BoardWeek, cellCount: number, publishedAt: Date | null, order: DateOrder): WeekSummaryDto {
  return {
    id: w.id,
    name: weekTitle(w, order),
    startDate: w.startDate,
    endDate: addDays(w.startDate, BOARD_DAYS - 1),
    prepDate: w.prepDate,
    secondPrepDate: w.secondPrepDate ?? null,
    publishedVersion: w.publishedVersion ?? null,
    publishedAt: publishedAt ? publishedAt.toISOString() : null,
    changedSincePublished: w.publishedBoardVersion != null && w.publishedBoardVersion !== w.version,
    cellCount,
    version: w.version,
  };
}

/** When the week's current published version was published (a prepared read: it rides beside a board's other reads). */
export async function lastPublishedAt(em: EntityManager, week: Pick<IWeek, 'id' | 'publishedVersion'>): Promise<Date | null> {
  if (!week.publishedVersion) return null;
  const [pub] = await preparedRows<{ publishedAt: string | Date }>(
    em,
    'trayline_week_published_at',
    'select published_at as "publishedAt" from week_publication where week_id = $1 and number = $2',
    [week.id, week.publishedVersion],
  );
  return pub ? new Date(pub.publishedAt) : null;
}

/**
 * A board cell as the board reads it: a plain row (a week holds hundreds of cells; hydrating each as a managed
 * entity cost more than the whole board computation). Writes still go through the WeekCell entity.
 */
export interface BoardCellRow {
  id: number;
  client: { id: number };
  assembly: { id: number };
  date: IsoDate;
  slot: string;
  prepDate?: IsoDate | null;
  storage: string;
  allergenOverrides: { allergen: string; reason: string }[];
}

async function loadCellRows(em: EntityManager, workspaceId: number, weekId: number): Promise<BoardCellRow[]> {
  const rows = await preparedRows<Omit<BoardCellRow, 'client' | 'assembly'> & { client: number; assembly: number }>(
    em,
    'trayline_week_cells',
    `select c.id, c.client_id as client, c.assembly_id as assembly, c.date, c.slot, c.prep_date as "prepDate", c.storage,
            c.allergen_overrides as "allergenOverrides"
       from week_cell c join week w on w.id = c.week_id
      where c.week_id = $1 and w.workspace_id = $2 order by c.date collate "C" asc, c.id asc`,
    [weekId, workspaceId],
  );
  return rows.map((r) => ({
    id: r.id,
    client: { id: r.client },
    assembly: { id: r.assembly },
    date: r.date,
    slot: r.slot,
    prepDate: r.prepDate,
    storage: r.storage,
    allergenOverrides: r.allergenOverrides ?? [],
  }));
}

/** A week's tray count as the board reads it (a plain row). */
export interface BoardTrayRow {
  id: number;
  tray: { id: number };
  prepDate: IsoDate;
  trayCount: number;
  /** Of those trays, the ones the prep day's cooling record has thrown away (still in the run: number ≤ count). */
  lostTrays: number;
}

async function loadWeekTrayRows(em: EntityManager, workspaceId: number, weekId: number): Promise<BoardTrayRow[]> {
  const rows = await preparedRows<{ id: number; tray: number; prepDate: IsoDate; trayCount: number; lostTrays: number }>(
    em,
    'trayline_week_trays',
    // Thrown away: cooling records of this tray's run ids ("<tray id>-<k>") on that prep date, k within the count.
    `select t.id, t.tray_id as tray, t.prep_date as "prepDate", t.tray_count as "trayCount",
            (select count(*) from cooling_record c
              where c.week_id = t.week_id and c.prep_date = t.prep_date and c.discarded
                and split_part(c.run_tray_id, '-', 1) = t.tray_id::text
                and split_part(c.run_tray_id, '-', 2)::int <= t.tray_count)::int as "lostTrays"
       from week_tray t join week w on w.id = t.week_id
      where t.week_id = $1 and w.workspace_id = $2 order by t.id asc`,
    [weekId, workspaceId],
  );
  return rows.map((r) => ({ id: r.id, tray: { id: r.tray }, prepDate: r.prepDate, trayCount: r.trayCount, lostTrays: r.lostTrays }));
}

/** The week fields a board reads (the Week entity, or a plain row read with the board). */
export type BoardWeek = Pick<IWeek, 'id' | 'name' | 'startDate' | 'prepDate' | 'secondPrepDate' | 'publishedVersion' | 'publishedBoardVersion' | 'version'>;

/**
 * Everything a board needs, read in one round of prepared statements side by side (no N+1, no statement waiting
 * for another: the trays and ingredients the plates name are found in SQL), as plain rows (a board holds every
 * client, plate and cell of the week; hydrating them as managed entities cost more than computing the board).
 */
export interface BoardData {
  week: BoardWeek;
  slots: string[];
  clients: ClientFacts[];
  assemblies: PlateRow[];
  cells: BoardCellRow[];
  trays: BoardTrayRow[];
  ctx: PlateContext;
  publishedAt: Date | null;
  /** How the workspace writes dates (the week's title when it has no name). */
  dateOrder: DateOrder;
}

/** The workspace settings a board reads: meal slots and the net-carb rule (one row). */
async function boardSettings(em: EntityManager, workspaceId: number): Promise<{ slots: string[]; rule: NetCarbRule }> {
  const [ws] = await preparedRows<{ mealSlots: string[] | null; netCarbRule: string }>(
    em,
    'trayline_board_settings',
    'select meal_slots as "mealSlots", net_carb_rule as "netCarbRule" from workspace where id = $1',
    [workspaceId],
  );
  if (!ws) throw new NotFound('Workspace');
  return { slots: mealSlotsFrom(ws.mealSlots), rule: toNetCarbRule(ws.netCarbRule) };
}

/** A week of the workspace as a plain row with the time of its latest publication, or null. */
async function readBoardWeek(em: EntityManager, workspaceId: number, id: number): Promise<(BoardWeek & { publishedAt: Date | null }) | null> {
  const [row] = await preparedRows<BoardWeek & { publishedAt: string | Date | null }>(
    em,
    'trayline_board_week',
    `select w.id, w.name, w.start_date as "startDate", w.prep_date as "prepDate", w.second_prep_date as "secondPrepDate",
            w.published_version as "publishedVersion", w.published_board_version as "publishedBoardVersion", w.version,
            p.published_at as "publishedAt"
       from week w left join week_publication p on p.week_id = w.id and p.number = w.published_version
      where w.id = $1 and w.workspace_id = $2`,
    [id, workspaceId],
  );
  return row ? { ...row, publishedAt: row.publishedAt ? new Date(row.publishedAt) : null } : null;
}

async function loadBoardParts(em: EntityManager, actor: Actor, weekId: number) {
  const settings = boardSettings(em, actor.workspaceId);
  const [{ slots }, clients, assemblies, cells, trays, ctx] = await Promise.all([
    settings,
    loadClientFacts(em, actor.workspaceId, weekId),
    loadPlateRows(em, actor.workspaceId),
    loadCellRows(em, actor.workspaceId, weekId),
    loadWeekTrayRows(em, actor.workspaceId, weekId),
    loadWorkspacePlateContext(em, actor.workspaceId, weekId, settings.then((s) => s.rule)),
  ]);
  return { slots, clients, assemblies, cells, trays, ctx, dateOrder: datesOf(actor) };
}

/** A board's data for a week already read (e.g. locked for an edit, in its transaction). */
export async function loadBoardData(em: EntityManager, actor: Actor, week: BoardWeek): Promise<BoardData> {
  const [parts, publishedAt] = await Promise.all([loadBoardParts(em, actor, week.id), lastPublishedAt(em, week)]);
  return { week, publishedAt, ...parts };
}

/** A board's data by week id: the week row is read in the same round as the rest (NotFound outside the workspace). */
export async function loadBoardById(em: EntityManager, actor: Actor, id: number): Promise<BoardData> {
  const [week, parts] = await Promise.all([readBoardWeek(em, actor.workspaceId, id), loadBoardParts(em, actor, id)]);
  if (!week) throw new NotFound('Week');
  const { publishedAt, ...w } = week;
  return { week: w, publishedAt, ...parts };
}

export function cellDto(c: BoardCellRow | IWeekCell): BoardCellDto {
  return {
    clientId: c.client.id,
    date: c.date,
    slot: c.slot,
    assemblyId: c.assembly.id,
    prepDate: c.prepDate ?? null,
    storage: (c.storage as 'fridge' | 'frozen') ?? 'fridge',
    allergenOverrides: (c.allergenOverrides ?? []) as { allergen: AllergenCode; reason: string }[],
  };
}

/** A client's planned targets, computed once per loaded board (the input and the DTO both need them). */
const targetsMemo = new WeakMap<BoardData, Map<number, MacroTargets>>();
function targetsOf(d: BoardData, c: ClientFacts): MacroTargets {
  let memo = targetsMemo.get(d);
  if (!memo) targetsMemo.set(d, (memo = new Map()));
  let t = memo.get(c.id);
  if (!t) memo.set(c.id, (t = plannedTargets(c, d.slots)));
  return t;
}

/** The pure board input from loaded rows, with `cells` replaced when given (to check an edit before saving it). */
export function boardInput(d: BoardData, cells: readonly BoardCellDto[] = d.cells.map(cellDto)): BoardInput {
  const plates = new Map(
    d.assemblies.map((a) => {
      const f = plateFacts(a, d.ctx);
      return [a.id, { id: a.id, macros: { kcal: f.macros.kcal, netCarbsG: f.macros.netCarbsG, proteinG: f.macros.proteinG, fatG: f.macros.fatG }, allergens: f.allergens, terms: f.terms, trays: f.trays }];
    }),
  );
  return {
    prepDates: prepDatesOf(d.week),
    clients: d.clients.map((c) => ({
      id: c.id,
      householdMultiplier: String(c.householdMultiplier),
      targets: targetsOf(d, c),
      allergens: (c.allergens ?? []) as AllergenCode[],
      dislikes: c.dislikes ?? [],
    })),
    plates,
    trays: new Map([...d.ctx.trays.values()].map((t) => [t.id, { id: t.id, fridgeDays: t.fridgeDays, freezerWeeks: t.freezerWeeks, portionsPerTray: t.portionsPerTray }])),
    cells: cells.map((c) => ({
      clientId: c.clientId,
      date: c.date,
      slot: c.slot,
      assemblyId: c.assemblyId,
      prepDate: c.prepDate ?? null,
      storage: c.storage,
      allergenOverrides: c.allergenOverrides,
    })),
    batches: d.trays.map((t) => ({ trayId: t.tray.id, prepDate: t.prepDate, trayCount: t.trayCount, ...(t.lostTrays ? { lostTrays: t.lostTrays } : {}) })),
  };
}

/** The board answer (shared/schemas/board-answer.ts: cell defaults and warning sentences left out; pages expand it). */
export function presentBoard(d: BoardData, result: BoardResult = computeBoard(boardInput(d))): BoardAnswer {
  const platesDto: AssemblyDto[] = d.assemblies.map((a) => presentAssembly(a, d.ctx));
  return {
    week: presentWeekSummary(d.week, d.cells.length, d.publishedAt, d.dateOrder),
    dateOrder: d.dateOrder,
    days: weekDays(d.week),
    slots: d.slots,
    prepDates: prepDatesOf(d.week),
    clients: d.clients.map((c) => ({
      id: c.id,
      name: c.name,
      householdMultiplier: String(Number(c.householdMultiplier)),
      allergens: (c.allergens ?? []) as AllergenCode[],
      dislikes: c.dislikes ?? [],
      targets: targetsOf(d, c),
      archived: c.archivedAt != null,
    })),
    plates: platesDto,
    cells: d.cells.map((c) => cellAnswer(cellDto(c))),
    trays: d.trays.map((t) => {
      const f = d.ctx.trays.get(t.tray.id);
      return {
        trayId: t.tray.id,
        name: f?.name ?? 'Unknown tray',
        prepDate: t.prepDate,
        trayCount: t.trayCount,
        portionsPerTray: f?.portionsPerTray ?? null,
        fridgeDays: f?.fridgeDays ?? 0,
        freezerWeeks: f?.freezerWeeks ?? 0,
      };
    }),
    checks: result.days.map((day) => dayAnswer(Number(day.clientId), day.date, day.totals, day.warnings)),
    inventory: result.inventory,
    cautions: CAUTIONS,
  };
}

export async function getBoard(em: EntityManager, actor: Actor, id: number): Promise<BoardAnswer> {
  return presentBoard(await loadBoardById(em, actor, id));
}

export { cellKey };
