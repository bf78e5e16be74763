/**
 * The week board as the API sends it, and back into the shape the pages read.
 *
 * A board holds every cell and client-day of the week (840 cells and 420 day checks for 60 clients with two meal
 * slots), so its answer leaves out what the page can restore exactly:
 * - a cell's fields at their defaults (no prep date picked, kept in the fridge, no allergen allowed by the coach);
 * - a day check's empty warning list, and on each warning the client and day (its check's).
 * The week check gives warnings as facts; `expandBoard` words each one with `warningMessage`
 * (shared/domain/week-check.ts), the one wording.
 * `expandBoard` gives the full `BoardDto`; every reader of a board answer goes through it.
 */
import type { IsoDate } from '../domain/iso-date';
import { warningMessage, type WarningData, type WeekWarning, type WordedWarning } from '../domain/week-check';
import type { BoardCellDto, BoardDayDto, BoardDto } from './weeks.schema';

/** A cell as sent: `prepDate`, `storage` and `allergenOverrides` only when they differ from the defaults. */
export interface BoardCellAnswer {
  clientId: number;
  date: IsoDate;
  slot: string;
  assemblyId: number;
  prepDate?: IsoDate;
  storage?: 'frozen';
  allergenOverrides?: BoardCellDto['allergenOverrides'];
}

/** A client-day as sent: `warnings` only when there are some, each without its client, day and sentence. */
export interface BoardDayAnswer {
  clientId: number;
  date: IsoDate;
  totals: BoardDayDto['totals'];
  warnings?: WarningData[];
}

export type BoardAnswer = Omit<BoardDto, 'cells' | 'checks'> & { cells: BoardCellAnswer[]; checks: BoardDayAnswer[] };

/** What a copied week says besides its board: the meals it copied and those left behind (archived client or plate). */
export interface WeekCopied {
  meals: number;
  leftBehind: number;
}
export type CopyWeekAnswer = BoardAnswer & { copied: WeekCopied };

/** A cell for the answer (defaults left out). */
export function cellAnswer(c: BoardCellDto): BoardCellAnswer {
  const out: BoardCellAnswer = { clientId: c.clientId, date: c.date, slot: c.slot, assemblyId: c.assemblyId };
  if (c.prepDate) out.prepDate = c.prepDate;
  if (c.storage === 'frozen') out.storage = 'frozen';
  if (c.allergenOverrides.length) out.allergenOverrides = c.allergenOverrides;
  return out;
}

/** A day check for the answer (its client and day said once, no sentences). */
export function dayAnswer(clientId: number, date: IsoDate, totals: BoardDayDto['totals'], warnings: readonly WeekWarning[]): BoardDayAnswer {
  if (warnings.length === 0) return { clientId, date, totals };
  return { clientId, date, totals, warnings: warnings.map(warningData) };
}

function warningData(w: WeekWarning): WarningData {
  // Copy every field but the two the day check carries (no spread-and-delete: a board has hundreds).
  const out: Record<string, unknown> = {};
  for (const k in w) if (k !== 'clientId' && k !== 'date') out[k] = (w as unknown as Record<string, unknown>)[k];
  return out as WarningData;
}

/** The board the pages read, from the answer: defaults restored, warnings worded. */
export function expandBoard(a: BoardAnswer): BoardDto {
  return {
    ...a,
    cells: a.cells.map((c) => ({
      clientId: c.clientId,
      date: c.date,
      slot: c.slot,
      assemblyId: c.assemblyId,
      prepDate: c.prepDate ?? null,
      storage: c.storage ?? 'fridge',
      allergenOverrides: c.allergenOverrides ?? [],
    })),
    checks: a.checks.map((d) => ({
      clientId: d.clientId,
      date: d.date,
      totals: d.totals,
      warnings: (d.warnings ?? []).map((w) => ({ ...w, clientId: String(d.clientId), date: d.date, message: warningMessage(w, d.date, a.dateOrder) }) as WordedWarning),
    })),
  };
}
