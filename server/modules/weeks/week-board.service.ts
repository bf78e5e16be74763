import type { EntityManager } from '@mikro-orm/postgresql';
import { CAUTIONS } from '@shared/domain/eat-by.js';
import { addDays, compareIsoDates, type IsoDate } from '@shared/domain/iso-date.js';
import { cellKey, computeBoard, type BoardInput, type BoardResult } from '@shared/domain/week-board.js';
import type { AllergenCode } from '@shared/domain/allergens.js';
import type { MacroTargets } from '@shared/domain/targets.js';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema.js';
import { WEEK_DAYS, type BoardDto, type BoardCellDto, type WeekSummaryDto } from '@shared/schemas/weeks.schema.js';
import type { Actor } from '../../http/authz.js';
import { NotFound } from '../../http/errors.js';
import { preparedRows } from '../../db/prepared.js';
import { loadPlateRows } from '../assemblies/assembly.service.js';
import { presentAssembly } from '../assemblies/assembly.presenter.js';
import { loadPlateContext, plateFacts, type PlateContext, type PlateRow } from '../assemblies/plate-facts.js';
import { loadClientFacts, mealSlotsOf } from '../clients/client.service.js';
import { plannedTargets } from '../clients/client.presenter.js';
import type { ClientFacts } from '../clients/client.entity.js';
import { Week, WeekPublication, type IWeek, type IWeekCell } from './week.entity.js';

export function weekDays(w: Pick<IWeek, 'startDate'>): IsoDate[] {
  return Array.from({ length: WEEK_DAYS }, (_, i) => addDays(w.startDate, i));
}

export function prepDatesOf(w: Pick<IWeek, 'prepDate' | 'secondPrepDate'>): IsoDate[] {
  return [w.prepDate, ...(w.secondPrepDate ? [w.secondPrepDate] : [])].sort(compareIsoDates);
}

export async function findWeek(em: EntityManager, actor: Actor, id: number): Promise<IWeek> {
  const w = await em.findOne(Week, { id, workspace: actor.workspaceId });
  if (!w) throw new NotFound('Week');
  return w;
}

export function presentWeekSummary(w: IWeek, cellCount: number, publishedAt: Date | null): WeekSummaryDto {
  return {
    id: w.id,
    name: w.name || `Week of ${w.startDate}`,
    startDate: w.startDate,
    endDate: addDays(w.startDate, WEEK_DAYS - 1),
    prepDate: w.prepDate,
    secondPrepDate: w.secondPrepDate ?? null,
    publishedVersion: w.publishedVersion ?? null,
    publishedAt: publishedAt ? publishedAt.toISOString() : null,
    changedSincePublished: w.publishedBoardVersion != null && w.publishedBoardVersion !== w.version,
    cellCount,
    version: w.version,
  };
}

export async function lastPublishedAt(em: EntityManager, week: IWeek): Promise<Date | null> {
  if (!week.publishedVersion) return null;
  const pub = await em.findOne(WeekPublication, { week: week.id, number: week.publishedVersion }, { fields: ['publishedAt'] });
  return pub?.publishedAt ?? null;
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

async function loadCellRows(em: EntityManager, weekId: number): Promise<BoardCellRow[]> {
  const rows = await preparedRows<Omit<BoardCellRow, 'client' | 'assembly'> & { client: number; assembly: number }>(
    em,
    'trayline_week_cells',
    `select id, client_id as client, assembly_id as assembly, date, slot, prep_date as "prepDate", storage,
            allergen_overrides as "allergenOverrides"
       from week_cell where week_id = $1 order by date asc, id asc`,
    [weekId],
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
}

async function loadWeekTrayRows(em: EntityManager, weekId: number): Promise<BoardTrayRow[]> {
  const rows = await preparedRows<{ id: number; tray: number; prepDate: IsoDate; trayCount: number }>(
    em,
    'trayline_week_trays',
    'select id, tray_id as tray, prep_date as "prepDate", tray_count as "trayCount" from week_tray where week_id = $1 order by id asc',
    [weekId],
  );
  return rows.map((r) => ({ id: r.id, tray: { id: r.tray }, prepDate: r.prepDate, trayCount: r.trayCount }));
}

/**
 * Everything a board needs, in a fixed number of queries (no N+1): ~10 whatever the size of the week, read as
 * plain rows (a board holds every client, plate and cell of the week; hydrating them as managed entities cost
 * more than computing the board).
 */
export interface BoardData {
  week: IWeek;
  slots: string[];
  clients: ClientFacts[];
  assemblies: PlateRow[];
  cells: BoardCellRow[];
  trays: BoardTrayRow[];
  ctx: PlateContext;
  publishedAt: Date | null;
}

export async function loadBoardData(em: EntityManager, actor: Actor, week: IWeek): Promise<BoardData> {
  // Independent reads side by side: outside a transaction each takes its own pooled connection (the board waits for
  // the slowest, not the sum); inside one, they queue on the transaction's connection.
  const [slots, clients, assemblies, cells, trays, publishedAt] = await Promise.all([
    mealSlotsOf(em, actor.workspaceId),
    loadClientFacts(em, actor.workspaceId),
    loadPlateRows(em, actor.workspaceId),
    loadCellRows(em, week.id),
    loadWeekTrayRows(em, week.id),
    lastPublishedAt(em, week),
  ]);
  const ctx = await loadPlateContext(em, actor, assemblies, trays.map((t) => t.tray.id));
  return { week, slots, clients, assemblies, cells, trays, ctx, publishedAt };
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
    batches: d.trays.map((t) => ({ trayId: t.tray.id, prepDate: t.prepDate, trayCount: t.trayCount })),
  };
}

export function presentBoard(d: BoardData, result: BoardResult = computeBoard(boardInput(d))): BoardDto {
  const platesDto: AssemblyDto[] = d.assemblies.map((a) => presentAssembly(a, d.ctx));
  return {
    week: presentWeekSummary(d.week, d.cells.length, d.publishedAt),
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
    })),
    plates: platesDto,
    cells: d.cells.map(cellDto),
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
    checks: result.days.map((day) => ({ clientId: Number(day.clientId), date: day.date, totals: day.totals, warnings: day.warnings })),
    inventory: result.inventory,
    cautions: CAUTIONS,
  };
}

export async function getBoard(em: EntityManager, actor: Actor, id: number): Promise<BoardDto> {
  const week = await findWeek(em, actor, id);
  return presentBoard(await loadBoardData(em, actor, week));
}

export { cellKey };
