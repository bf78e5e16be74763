/**
 * The week board, computed in one pass: every client-day checked against the client's targets and rules
 * (week-check.ts), every portion's eat-by date with remedies (eat-by.ts), and the portion count against the trays
 * baked (inventory.ts). Pure: the server loads everything in a few batched queries and calls this once.
 *
 * - A cell's plate macros are what the client eats; the household multiplier only scales the portions cooked.
 * - A cell's portions come from its own prep date when the coach picked one, otherwise from the latest prep date on
 *   or before the cell's day (the freshest); a day before every prep date is booked on the first one and flagged.
 * - A cell stored 'frozen' follows the freeze-and-thaw remedy: frozen on its prep day, thawed the evening before.
 */
import { eatByRemedies, portionStatus, supplyingPrepDate, type EatByRemedy, type PortionStatusKind } from './eat-by';
import { portionCount, type BoardCell, type BoardPortion, type TrayTally } from './inventory';
import { compareIsoDates, shortDate, type DateOrder, type IsoDate } from './iso-date';
import type { AllergenCode } from './allergens';
import type { MacroTargets } from './targets';
import { checkWeek, type AllergenOverride, type CellMacros, type CellPortion, type CheckCell, type DayCheck, type WeekWarning } from './week-check';

/** What a week is called where a person reads it: its name, or "Week of Mon, Dec 7" when it has none. */
export function weekTitle(w: { name?: string | null; startDate: IsoDate }, order: DateOrder): string {
  return w.name || `Week of ${shortDate(w.startDate, order)}`;
}

/** A published week's title as the workspace writes dates now (`name` as published, for snapshots without `ownName`). */
export function snapshotTitle(s: { name: string; ownName?: string; startDate: IsoDate }, order: DateOrder): string {
  return s.ownName === undefined ? s.name : weekTitle({ name: s.ownName, startDate: s.startDate }, order);
}

/** A week's prep days (one or two), earliest first. */
export function prepDatesOf(w: { prepDate: IsoDate; secondPrepDate?: IsoDate | null }): IsoDate[] {
  return [w.prepDate, ...(w.secondPrepDate ? [w.secondPrepDate] : [])].sort(compareIsoDates);
}

/**
 * A week's shopping trips: its prep dates when it has two (each is shopped from a list of its own: its trays and the
 * plates it supplies), else none (one prep day: the whole week's list is the trip).
 */
export function tripDatesOf(w: { prepDate: IsoDate; secondPrepDate?: IsoDate | null }): IsoDate[] {
  return w.secondPrepDate ? prepDatesOf(w) : [];
}

/** The trip to shop for next: the first of a week's trips on or after `today`, else null (the whole week's list). */
export function nextTripOf(w: { prepDate: IsoDate; secondPrepDate?: IsoDate | null }, today: IsoDate): IsoDate | null {
  return tripDatesOf(w).find((d) => compareIsoDates(d, today) >= 0) ?? null;
}

export interface BoardClient {
  id: number;
  householdMultiplier: string;
  /** Targets for the planned part of the day (the board's meal slots). */
  targets: MacroTargets;
  allergens: readonly AllergenCode[];
  dislikes: readonly string[];
}

export interface BoardTray {
  id: number;
  fridgeDays: number;
  freezerWeeks: number;
  /** Portions one tray is cut into, or null when the cut plan is unknown. */
  portionsPerTray: number | null;
}

export interface BoardPlate {
  id: number;
  macros: CellMacros;
  allergens: readonly AllergenCode[];
  /** Ingredient names, tray names and tags: what a dislike is compared against. */
  terms: readonly string[];
  trays: readonly { trayId: number; portions: string }[];
}

export type CellStorage = 'fridge' | 'frozen';

export interface BoardCellInput {
  clientId: number;
  date: IsoDate;
  slot: string;
  assemblyId: number;
  /** The prep date the portions come from; null = the default (latest on or before the day). */
  prepDate: IsoDate | null;
  storage: CellStorage;
  allergenOverrides: readonly AllergenOverride[];
}

export interface BoardBatch {
  trayId: number;
  prepDate: IsoDate;
  trayCount: number;
  /** Of those, the trays the cooling record has thrown away (absent: none). */
  lostTrays?: number;
}

export interface BoardInput {
  prepDates: readonly IsoDate[];
  clients: readonly BoardClient[];
  plates: ReadonlyMap<number, BoardPlate>;
  trays: ReadonlyMap<number, BoardTray>;
  cells: readonly BoardCellInput[];
  batches: readonly BoardBatch[];
}

export interface CellPortionResult {
  trayId: number;
  prepDate: IsoDate;
  eatBy: IsoDate;
  status: PortionStatusKind;
  storage: CellStorage;
  remedies: EatByRemedy[];
}

export interface CellResult {
  clientId: number;
  date: IsoDate;
  slot: string;
  portions: CellPortionResult[];
}

export interface BoardResult {
  days: DayCheck[];
  warnings: WeekWarning[];
  cells: CellResult[];
  inventory: TrayTally[];
}

export function cellKey(c: { clientId: number; date: IsoDate; slot: string }): string {
  return `${c.clientId}|${c.date}|${c.slot}`;
}

/** The prep date a cell's portions come from. */
export function cellPrepDate(cell: Pick<BoardCellInput, 'date' | 'prepDate'>, prepDates: readonly IsoDate[]): IsoDate {
  if (cell.prepDate) return cell.prepDate;
  const sorted = [...prepDates].sort(compareIsoDates);
  if (sorted.length === 0) throw new RangeError('The week has no prep date');
  return supplyingPrepDate(cell.date, sorted) ?? sorted[0];
}

/**
 * Per-board memo: a board repeats the same few (day, prep date, tray, storage) combinations hundreds of times, so
 * each eat-by answer is computed once (the date arithmetic dominates the cost of a large board).
 */
interface Memo {
  prep: Map<string, IsoDate>;
  portion: Map<string, Omit<CellPortionResult, 'trayId'>>;
}

function memoPrepDate(memo: Memo, cell: Pick<BoardCellInput, 'date' | 'prepDate'>, prepDates: readonly IsoDate[]): IsoDate {
  const key = `${cell.date}|${cell.prepDate ?? ''}`;
  let v = memo.prep.get(key);
  if (v === undefined) memo.prep.set(key, (v = cellPrepDate(cell, prepDates)));
  return v;
}

/** What a cell's eat-by needs to know about one tray of its plate. */
export type PortionTray = Pick<BoardTray, 'fridgeDays' | 'freezerWeeks'> & { trayId: number };

const newMemo = (): Memo => ({ prep: new Map(), portion: new Map() });

/**
 * One cell's portions: for each tray of its plate, the prep date it comes from, its eat-by, its status and the
 * remedies when it is past its eat-by. The board computes every cell with this; the board page computes the
 * selected cell with it (the board answer does not carry every cell's portions).
 */
export function cellEatBy(
  cell: Pick<BoardCellInput, 'date' | 'prepDate' | 'storage'>,
  trays: readonly PortionTray[],
  weekPrepDates: readonly IsoDate[],
): CellPortionResult[] {
  return portionsWithMemo(cell, trays, weekPrepDates, newMemo());
}

function portionsWithMemo(
  cell: Pick<BoardCellInput, 'date' | 'prepDate' | 'storage'>,
  trays: readonly PortionTray[],
  weekPrepDates: readonly IsoDate[],
  memo: Memo,
): CellPortionResult[] {
  const prepDate = memoPrepDate(memo, cell, weekPrepDates);
  const out: CellPortionResult[] = [];
  for (const tray of trays) {
    const key = `${cell.date}|${prepDate}|${tray.fridgeDays}|${tray.freezerWeeks}|${cell.storage}`;
    let r = memo.portion.get(key);
    if (!r) {
      const { status, eatBy } = portionStatus({ plannedDate: cell.date, prepDate, fridgeDays: tray.fridgeDays });
      const remedies =
        cell.storage === 'frozen' || status === 'ok'
          ? []
          : eatByRemedies({
              plannedDate: cell.date,
              prepDate,
              fridgeDays: tray.fridgeDays,
              freezerWeeks: tray.freezerWeeks,
              weekPrepDates,
            });
      memo.portion.set(key, (r = { prepDate, eatBy, status, storage: cell.storage, remedies }));
    }
    out.push({ trayId: tray.trayId, prepDate: r.prepDate, eatBy: r.eatBy, status: r.status, storage: r.storage, remedies: r.remedies });
  }
  return out;
}

function cellPortions(cell: BoardCellInput, plate: BoardPlate, input: BoardInput, memo: Memo): CellPortionResult[] {
  const trays: PortionTray[] = [];
  for (const part of plate.trays) {
    const tray = input.trays.get(part.trayId);
    if (tray) trays.push({ trayId: part.trayId, fridgeDays: tray.fridgeDays, freezerWeeks: tray.freezerWeeks });
  }
  return portionsWithMemo(cell, trays, input.prepDates, memo);
}

/** What every cell with the same plate, day, prep date and storage shares (computed once per board). */
interface CellShape {
  portions: CellPortionResult[];
  checkPortions: CheckCell['portions'];
  inventoryPortions: BoardCell['portions'];
}

/** The whole board: day checks (blocks first), per-cell eat-by and remedies, and the portion count. */
export function computeBoard(input: BoardInput): BoardResult {
  const clients = new Map(input.clients.map((c) => [c.id, c]));
  const byDay = new Map<string, { client: BoardClient; date: IsoDate; cells: CheckCell[] }>();
  const cellResults: CellResult[] = [];
  const inventoryCells: BoardCell[] = [];
  const memo = newMemo();
  // A board repeats the same few plate × day × prep date × storage combinations for every client: their portions,
  // eat-by and counting rows are computed once and shared (read-only) by the cells.
  const shapes = new Map<string, CellShape>();

  for (const cell of input.cells) {
    const client = clients.get(cell.clientId);
    const plate = input.plates.get(cell.assemblyId);
    if (!client || !plate) continue;
    const shapeKey = `${cell.assemblyId}|${cell.date}|${cell.prepDate ?? ''}|${cell.storage}`;
    let shape = shapes.get(shapeKey);
    if (!shape) {
      const portions = cellPortions(cell, plate, input, memo);
      const checkPortions: CellPortion[] = [];
      for (const p of portions) {
        const tray = input.trays.get(p.trayId)!;
        checkPortions.push({ trayId: String(p.trayId), prepDate: p.prepDate, fridgeDays: tray.fridgeDays, storage: p.storage, freezerWeeks: tray.freezerWeeks });
      }
      const prepDate = portions[0]?.prepDate ?? memoPrepDate(memo, cell, input.prepDates);
      const inventoryPortions: BoardPortion[] = [];
      for (const t of plate.trays) if (input.trays.has(t.trayId)) inventoryPortions.push({ trayId: String(t.trayId), quantity: t.portions, prepDate });
      shapes.set(shapeKey, (shape = { portions, checkPortions, inventoryPortions }));
    }
    cellResults.push({ clientId: cell.clientId, date: cell.date, slot: cell.slot, portions: shape.portions });

    const key = `${cell.clientId}|${cell.date}`;
    let day = byDay.get(key);
    if (!day) byDay.set(key, (day = { client, date: cell.date, cells: [] }));
    day.cells.push({
      slot: cell.slot,
      macros: plate.macros,
      allergens: plate.allergens,
      terms: plate.terms,
      allergenOverrides: cell.allergenOverrides,
      portions: shape.checkPortions,
    });

    inventoryCells.push({ date: cell.date, householdMultiplier: client.householdMultiplier, portions: shape.inventoryPortions });
  }

  const { days, warnings } = checkWeek(
    [...byDay.values()].map((d) => ({
      clientId: String(d.client.id),
      date: d.date,
      targets: d.client.targets,
      clientAllergens: d.client.allergens,
      clientDislikes: d.client.dislikes,
      cells: d.cells,
    })),
  );

  // A tray the board needs but nobody has set a count for yet counts as 0 trays (so its cut plan is known).
  const batches = [...input.batches];
  const counted = new Set(batches.map((b) => `${b.trayId}|${b.prepDate}`));
  for (const shape of shapes.values()) {
    for (const p of shape.inventoryPortions) {
      const batchKey = `${p.trayId}|${p.prepDate}`;
      if (counted.has(batchKey)) continue;
      counted.add(batchKey);
      batches.push({ trayId: Number(p.trayId), prepDate: p.prepDate!, trayCount: 0 });
    }
  }
  const inventory = portionCount({
    prepDates: input.prepDates,
    cells: inventoryCells,
    batches: batches
      .filter((b) => input.trays.get(b.trayId)?.portionsPerTray)
      .map((b) => ({
        trayId: String(b.trayId),
        prepDate: b.prepDate,
        trayCount: b.trayCount,
        portionsPerTray: input.trays.get(b.trayId)!.portionsPerTray!,
        ...(b.lostTrays ? { lostTrays: b.lostTrays } : {}),
      })),
  });

  return { days, warnings, cells: cellResults, inventory };
}

/**
 * Tray counts that cover the need: for each tray and prep date with a known cut plan, ceil(needed ÷ portions per
 * tray); counts for trays the board no longer needs are kept at 0.
 */
export function coveringBatches(input: BoardInput): BoardBatch[] {
  const { inventory } = computeBoard(input);
  const out: BoardBatch[] = [];
  for (const t of inventory) {
    for (const p of t.byPrepDate) {
      if (p.traysToCover === null) continue;
      out.push({ trayId: Number(t.trayId), prepDate: p.prepDate, trayCount: p.traysToCover });
    }
  }
  // Trays only in the batches (no cell needs them): 0.
  for (const b of input.batches) {
    if (!out.some((o) => o.trayId === b.trayId && o.prepDate === b.prepDate)) out.push({ trayId: b.trayId, prepDate: b.prepDate, trayCount: 0 });
  }
  return out;
}
