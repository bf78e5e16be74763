/**
 * Portion count: portions needed by the week board against portions baked, per base tray recipe.
 *
 * Needed: for every board cell, each portion of a tray on the cell's plate × the client's household
 * multiplier, summed per tray and per prep date. Quantities and multipliers may be decimals (half a
 * portion, a household of 1.5); the sum is rounded UP to whole portions per tray and prep date, since
 * a tray is cut into whole portions.
 *
 * Produced: tray count × portions per tray (from the cut plan), per prep date, less the trays thrown away (the
 * cooling record's): their portions are not there to eat. The trays that cover a need count those thrown away too
 * (the tray count that leaves enough once they are gone).
 *
 * With two prep dates a week, portions baked on the later date cannot cover plates before it, so the
 * counts are kept per prep date and a tray's `short` and `spare` are the sums over its prep dates
 * (a tray can be short on Sunday and have spares on Wednesday).
 */
import Decimal from 'decimal.js';
import { compareIsoDates, type IsoDate } from './iso-date';
import { supplyingPrepDate } from './eat-by';

export interface BoardPortion {
  trayId: string;
  /** Portions of this tray on the plate (1, 2, 0.5, …). */
  quantity: Decimal.Value;
  /** The prep date these portions come from; by default the latest prep date on or before the cell's day. */
  prepDate?: IsoDate;
}

export interface BoardCell {
  /** The day of the cell. */
  date: IsoDate;
  /** The client's household multiplier (2 = the plate feeds two people). */
  householdMultiplier: Decimal.Value;
  portions: readonly BoardPortion[];
}

export interface TrayBatch {
  trayId: string;
  prepDate: IsoDate;
  /** Whole trays baked. */
  trayCount: number;
  /** Whole portions one tray is cut into (cut plan). */
  portionsPerTray: number;
  /** Of those trays, how many were thrown away (0 when absent; at most the tray count). */
  lostTrays?: number;
}

export interface InventoryInput {
  /** The week's prep dates (one or two, usually). */
  prepDates: readonly IsoDate[];
  cells: readonly BoardCell[];
  batches: readonly TrayBatch[];
}

export interface PortionTally {
  /** Whole portions needed (rounded up). */
  needed: number;
  /** The unrounded need, for display. */
  neededExact: number;
  produced: number;
  spare: number;
  short: number;
}

export interface PrepDateTally extends PortionTally {
  prepDate: IsoDate;
  /** Trays thrown away on this prep date (not in `produced`). */
  lostTrays: number;
  /** Whole trays that cover the need, or null when no cut plan is known for this tray. */
  traysToCover: number | null;
}

export interface TrayTally extends PortionTally {
  trayId: string;
  /** Trays thrown away, over its prep dates. */
  lostTrays: number;
  /** Sum of the per-prep-date proposals, or null when no cut plan is known. */
  traysToCover: number | null;
  byPrepDate: PrepDateTally[];
}

/** Whole trays needed to cover `needed` portions: ceil(needed / portionsPerTray). */
export function traysToCover(needed: Decimal.Value, portionsPerTray: Decimal.Value): number {
  const n = new Decimal(needed);
  const p = new Decimal(portionsPerTray);
  if (!n.isFinite() || n.lt(0)) throw new RangeError(`Portions needed must be 0 or more: ${String(needed)}`);
  if (!p.isFinite() || p.lte(0)) throw new RangeError(`Portions per tray must be greater than 0: ${String(portionsPerTray)}`);
  return n.div(p).ceil().toNumber();
}

function wholeCount(value: number, name: string, min: number): number {
  if (!Number.isInteger(value) || value < min) throw new RangeError(`${name} must be a whole number, ${min} or more: ${value}`);
  return value;
}

function sourcePrepDate(cell: BoardCell, portion: BoardPortion, prepDates: readonly IsoDate[]): IsoDate {
  if (portion.prepDate) return portion.prepDate;
  if (prepDates.length === 0) throw new RangeError('The week has no prep date to take portions from');
  // A day before every prep date is booked on the first prep date; the week check flags it.
  const sorted = [...prepDates].sort(compareIsoDates);
  return supplyingPrepDate(cell.date, sorted) ?? sorted[0];
}

interface Bucket {
  /** Portions needed, as counts of each distinct exact (quantity × multiplier) product: summed once at the end. */
  needed: Map<Decimal, number>;
  produced: number;
  /** Trays thrown away. */
  lost: number;
  portionsPerTray: number | null;
}

/**
 * The exact product quantity × household multiplier, validated and computed once per distinct pair: a board repeats
 * the same few pairs hundreds of times, and the Decimal arithmetic per cell dominated the count.
 */
function productMemo(): (quantity: Decimal.Value, multiplier: Decimal.Value) => Decimal {
  const products = new Map<string, Decimal>();
  return (quantity, multiplier) => {
    const key = `${String(quantity)}|${String(multiplier)}`;
    let p = products.get(key);
    if (p === undefined) {
      const m = new Decimal(multiplier);
      if (!m.isFinite() || m.lte(0)) throw new RangeError(`Household multiplier must be greater than 0: ${String(multiplier)}`);
      const q = new Decimal(quantity);
      if (!q.isFinite() || q.lt(0)) throw new RangeError(`Portion quantity must be 0 or more: ${String(quantity)}`);
      products.set(key, (p = q.times(m)));
    }
    return p;
  };
}

function neededExactOf(b: Bucket): Decimal {
  let sum = new Decimal(0);
  for (const [product, count] of b.needed) sum = sum.plus(product.times(count));
  return sum;
}

function bucketsByTray(input: InventoryInput): Map<string, Map<IsoDate, Bucket>> {
  const trays = new Map<string, Map<IsoDate, Bucket>>();
  const bucket = (trayId: string, prepDate: IsoDate): Bucket => {
    let byDate = trays.get(trayId);
    if (!byDate) trays.set(trayId, (byDate = new Map()));
    let b = byDate.get(prepDate);
    if (!b) byDate.set(prepDate, (b = { needed: new Map(), produced: 0, lost: 0, portionsPerTray: null }));
    return b;
  };
  const product = productMemo();

  for (const cell of input.cells) {
    if (cell.portions.length === 0) product(0, cell.householdMultiplier); // a bad multiplier is refused even on a plate without trays
    for (const portion of cell.portions) {
      const p = product(portion.quantity, cell.householdMultiplier);
      const b = bucket(portion.trayId, sourcePrepDate(cell, portion, input.prepDates));
      b.needed.set(p, (b.needed.get(p) ?? 0) + 1);
    }
  }

  for (const batch of input.batches) {
    const count = wholeCount(batch.trayCount, 'Tray count', 0);
    const perTray = wholeCount(batch.portionsPerTray, 'Portions per tray', 1);
    const lost = Math.min(count, wholeCount(batch.lostTrays ?? 0, 'Trays thrown away', 0));
    const b = bucket(batch.trayId, batch.prepDate);
    b.produced += (count - lost) * perTray;
    b.lost += lost;
    b.portionsPerTray ??= perTray;
  }
  return trays;
}

function tally(neededExact: Decimal, produced: number): PortionTally {
  const needed = neededExact.ceil().toNumber();
  return {
    needed,
    neededExact: neededExact.toNumber(),
    produced,
    spare: Math.max(0, produced - needed),
    short: Math.max(0, needed - produced),
  };
}

/** Per base tray: portions needed against produced, per prep date and in total. */
export function portionCount(input: InventoryInput): TrayTally[] {
  const result: TrayTally[] = [];
  for (const [trayId, byDate] of bucketsByTray(input)) {
    const knownPerTray = [...byDate.values()].find((b) => b.portionsPerTray !== null)?.portionsPerTray ?? null;
    const byPrepDate: PrepDateTally[] = [...byDate.entries()]
      .sort(([a], [b]) => compareIsoDates(a, b))
      .map(([prepDate, b]) => {
        const t = tally(neededExactOf(b), b.produced);
        const perTray = b.portionsPerTray ?? knownPerTray;
        return { prepDate, ...t, lostTrays: b.lost, traysToCover: perTray === null ? null : traysToCover(t.needed, perTray) + b.lost };
      });
    const sum = (pick: (t: PrepDateTally) => number) => byPrepDate.reduce((s, t) => s + pick(t), 0);
    result.push({
      trayId,
      needed: sum((t) => t.needed),
      neededExact: byPrepDate.reduce((s, t) => s.plus(t.neededExact), new Decimal(0)).toNumber(),
      produced: sum((t) => t.produced),
      spare: sum((t) => t.spare),
      short: sum((t) => t.short),
      lostTrays: sum((t) => t.lostTrays),
      traysToCover: knownPerTray === null ? null : sum((t) => t.traysToCover ?? 0),
      byPrepDate,
    });
  }
  return result;
}
