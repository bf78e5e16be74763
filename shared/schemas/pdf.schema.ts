import type { TempScale } from '../domain/temperature';
import type { DateOrder } from '../domain/iso-date';
import type { ReheatGroup } from '../domain/reheat';
/**
 * Plain data the PDF renderers take. The server modules that own the rows (week board, shopping list, bake run)
 * build these objects; the renderers in server/modules/pdf/ only lay them out.
 */

/** Macros of one portion, one plate or one day. Numbers as the presenter rounded them (decimal strings or numbers). */
export interface PdfMacros {
  kcal: number | string;
  fatG: number | string;
  proteinG: number | string;
  netCarbsG: number | string;
  carbsG: number | string;
}

/** A client's daily targets; a missing field is "no target". */
export interface PdfTargets {
  kcal?: number | string | null;
  fatG?: number | string | null;
  proteinG?: number | string | null;
  /** The net-carb cap (a maximum, not a goal). */
  netCarbsG?: number | string | null;
}

export interface WeekPlanPdfSlot {
  /** Meal slot of the board ("breakfast", "lunch"…). */
  slot: string;
  plateName: string;
  /** Portions of this plate eaten in this slot (usually 1; a household multiplier can raise it). */
  portions: number | string;
  assemblySteps: string[];
  /** How to reheat it, in groups (shared/domain/reheat.ts `reheatGroups`). */
  reheat: ReheatGroup[];
  macros: PdfMacros;
  /** ISO date (YYYY-MM-DD) of the earliest eat-by of the portions on this plate. */
  eatBy: string | null;
  /** "Frozen: move to the fridge the evening before" and similar notes. */
  notes?: string[];
}

export interface WeekPlanPdfDay {
  /** ISO date YYYY-MM-DD. */
  date: string;
  slots: WeekPlanPdfSlot[];
  /** Sum of the slots' macros (computed by the caller with decimal.js). */
  totals: PdfMacros;
}

export interface WeekPlanPdfData {
  /** Coach's business name: the page header. */
  businessName: string;
  clientName: string;
  /** ISO date of the week's first day. */
  weekStart: string;
  /** How the workspace writes dates (absent: month-day). */
  dateOrder?: DateOrder;
  targets: PdfTargets;
  /**
   * What the targets cover, when not the whole day: e.g. "breakfast and lunch, 50 % of your day" (the board plans
   * those meals; the targets are their share of the day's).
   */
  targetsCover?: string | null;
  days: WeekPlanPdfDay[];
  /** The coach's personal note, if any. */
  note?: string | null;
  /** Caution texts with their sources (shared/domain/eat-by.ts CAUTIONS by default). */
  cautions?: { text: string; source: string }[];
  /** The scale the client reads first (their °F / °C preference when they have an account; absent: °F). */
  tempScale?: TempScale;
}
