/**
 * Eat-by dates, freeze/thaw remedies and the food-safety cautions Trayline always shows.
 *
 * Day counting (one rule everywhere): the prep date is day 0. A tray with N fridge days may be eaten
 * up to and including day N, so eat-by = prep date + N days.
 *   Example: prepped Sunday, 4 fridge days → eat by Thursday; Friday is past eat-by.
 * This matches "discard after day 4" for cooked egg dishes and leftovers (USDA FSIS FoodKeeper:
 * 3–4 days refrigerated; Trayline defaults to the upper end, 4 days).
 *
 * Eat-by dates are guidance, not a guarantee: they assume the food was cooled within the Food Code's
 * limits and kept at 40 °F (4 °C) or below the whole time.
 */
import { addDays, compareIsoDates, daysBetween, type IsoDate } from './iso-date';

// ── Food-safety constants ──────────────────────────────────────────────────────────────────────────

/** USDA FSIS Cold Food Storage chart: "Refrigerator (40 °F or below) Freezer (0 °F or below)". */
export const FRIDGE_MAX_F = 40;
export const FRIDGE_MAX_C = 4;
export const FREEZER_MAX_F = 0;
export const FREEZER_MAX_C = -18;

/** FDA Food Code §3-403.11: reheat so all parts reach 165 °F (74 °C) for 15 seconds. */
export const REHEAT_MIN_F = 165;
export const REHEAT_MIN_C = 74;
export const REHEAT_HOLD_SECONDS = 15;

/** USDA FSIS "Danger Zone": perishables out of refrigeration no more than 2 h, or 1 h above 90 °F (32 °C). */
export const ROOM_TEMP_MAX_HOURS = 2;
export const HOT_DAY_ROOM_TEMP_MAX_HOURS = 1;
export const HOT_DAY_THRESHOLD_F = 90;
export const HOT_DAY_THRESHOLD_C = 32;

/** FDA Food Code §3-501.14: cooked food from 135 °F to 70 °F within 2 h, and to 41 °F or below within 6 h in total. */
export const COOLING = {
  startF: 135,
  startC: 57,
  stageOneEndF: 70,
  stageOneEndC: 21,
  stageOneMaxHours: 2,
  finalMaxF: 41,
  finalMaxC: 5,
  totalMaxHours: 6,
} as const;

// ── Storage defaults per food category ─────────────────────────────────────────────────────────────

export type FoodCategory =
  | 'egg-dish'
  | 'cooked-meat-poultry'
  | 'leftovers-meat-fish-egg'
  | 'cooked-vegetables'
  | 'casserole'
  | 'soup-stew';

export interface StorageDefault {
  label: string;
  /** The published refrigerator range, days. */
  fridgeDaysRange: readonly [number, number];
  /** Trayline's default: the upper end of the range (discard after that day). */
  fridgeDays: number;
  /** The published freezer range, months (quality only: food kept at 0 °F stays safe). */
  freezerMonthsRange: readonly [number, number];
  /** Trayline's default: the lower end of the freezer range, in whole weeks (conservative, for quality). */
  freezerWeeks: number;
  source: string;
}

/**
 * Default storage per food category. Refrigerator ≤ 40 °F, freezer 0 °F. A coach may set shorter
 * times per tray; the suggested planner rule (published-values §6b) is 4 days refrigerated at most
 * and 2 months frozen for egg and meat dishes.
 */
export const STORAGE_DEFAULTS: Readonly<Record<FoodCategory, StorageDefault>> = {
  'egg-dish': {
    label: 'Egg dishes (baked egg, frittata, egg casserole)',
    fridgeDaysRange: [3, 4],
    fridgeDays: 4,
    freezerMonthsRange: [2, 3],
    freezerWeeks: 8,
    source: 'USDA FSIS FoodKeeper: egg dishes 3–4 days refrigerated, 2–3 months frozen (after baking)',
  },
  'cooked-meat-poultry': {
    label: 'Cooked meat or poultry',
    fridgeDaysRange: [3, 4],
    fridgeDays: 4,
    freezerMonthsRange: [2, 6],
    freezerWeeks: 8,
    source: 'USDA FSIS Cold Food Storage chart: cooked meat or poultry leftovers 3–4 days, 2–6 months',
  },
  'leftovers-meat-fish-egg': {
    label: 'Cooked dishes with meat, fish, poultry or egg',
    fridgeDaysRange: [3, 4],
    fridgeDays: 4,
    freezerMonthsRange: [2, 3],
    freezerWeeks: 8,
    source: 'USDA FSIS FoodKeeper: leftovers with meat, fish, poultry or egg 3–4 days, 2–3 months',
  },
  'cooked-vegetables': {
    label: 'Cooked vegetables (no meat or egg)',
    fridgeDaysRange: [3, 4],
    fridgeDays: 4,
    freezerMonthsRange: [1, 2],
    freezerWeeks: 4,
    source: 'USDA FSIS FoodKeeper: leftovers without meat or egg 3–4 days, 1–2 months',
  },
  casserole: {
    label: 'Casseroles',
    fridgeDaysRange: [3, 4],
    fridgeDays: 4,
    freezerMonthsRange: [2, 3],
    freezerWeeks: 8,
    source:
      'USDA FSIS FoodKeeper: casseroles 3–4 days; it gives no freezer time, so the leftovers-with-meat-or-egg time (2–3 months) is used (assumption)',
  },
  'soup-stew': {
    label: 'Soups and stews',
    fridgeDaysRange: [3, 4],
    fridgeDays: 4,
    freezerMonthsRange: [2, 3],
    freezerWeeks: 8,
    source: 'USDA FSIS FoodKeeper / Cold Food Storage chart: soups and stews 3–4 days, 2–3 months',
  },
};

/**
 * After a frozen portion has thawed in the refrigerator, eat it on the planned day or at the latest
 * this many days later. Common practice, no source; deliberately shorter than the 3–4 days FSIS
 * allows for leftovers thawed in the refrigerator (from memory).
 */
export const THAWED_EAT_WITHIN_DAYS = 1;

/** Local time for the thaw reminder on the evening before. Common practice, no source. */
export const THAW_REMINDER_TIME = '19:00';

// ── Cautions shown by the UI, labels and PDFs ──────────────────────────────────────────────────────

export type CautionTopic = 'food-safety' | 'diet';

export interface Caution {
  id: string;
  topic: CautionTopic;
  text: string;
  source: string;
}

export const CAUTIONS: readonly Caution[] = [
  {
    id: 'cooling',
    topic: 'food-safety',
    text: 'Cool cooked food fast: from 135 °F (57 °C) to 70 °F (21 °C) within 2 hours, and to 41 °F (5 °C) or below within 6 hours in total.',
    source: 'FDA Food Code §3-501.14',
  },
  {
    id: 'reheating',
    topic: 'food-safety',
    text: 'Reheat until every part reaches 165 °F (74 °C). In a microwave, cover, stir or turn, and let it stand 2 minutes.',
    source: 'FDA Food Code §3-403.11; USDA FSIS safe minimum internal temperatures (leftovers 165 °F)',
  },
  {
    id: 'two-hour-rule',
    topic: 'food-safety',
    text: 'Do not leave food out of the fridge for more than 2 hours, or 1 hour when it is above 90 °F (32 °C).',
    source: 'USDA FSIS, "Danger Zone"',
  },
  {
    id: 'storage-temperatures',
    topic: 'food-safety',
    text: 'Keep the refrigerator at 40 °F (4 °C) or below and the freezer at 0 °F (−18 °C) or below. Thaw frozen portions in the refrigerator.',
    source: 'USDA FSIS Cold Food Storage chart',
  },
  {
    // "If in doubt, throw it out" echoes USDA FSIS consumer advice (from memory).
    id: 'eat-by-guidance',
    topic: 'food-safety',
    text: 'Eat-by dates are guidance, not a guarantee: they assume quick cooling and cold storage all the way. If in doubt, throw it out.',
    source: 'USDA FSIS FoodKeeper storage times',
  },
  {
    id: 'local-codes',
    topic: 'food-safety',
    text: 'Follow your local food code and health authority; where they differ from these defaults, they apply.',
    source: 'Trayline policy',
  },
  {
    id: 'ketogenic-diet',
    topic: 'diet',
    text: "A ketogenic diet can change medication needs (for example for diabetes or blood pressure) and does not suit everyone (for example in pregnancy, with kidney disease, or with a history of eating disorders). Follow your clinician's advice.",
    source: 'Trayline policy: defer to licensed professionals',
  },
];

// ── Eat-by arithmetic ──────────────────────────────────────────────────────────────────────────────

function wholeDays(value: number, name: string): number {
  if (!Number.isInteger(value) || value < 0) throw new RangeError(`${name} must be a whole number, 0 or more: ${value}`);
  return value;
}

/** The last day a portion may be eaten: prep date + fridge days (the prep date is day 0). */
export function eatByDate(prepDate: IsoDate, fridgeDays: number): IsoDate {
  return addDays(prepDate, wholeDays(fridgeDays, 'Fridge days'));
}

/** The last day a frozen portion keeps its quality: prep date + freezer weeks × 7. */
export function freezerQualityDate(prepDate: IsoDate, freezerWeeks: number): IsoDate {
  return addDays(prepDate, wholeDays(freezerWeeks, 'Freezer weeks') * 7);
}

export type PortionStatusKind = 'ok' | 'past-eat-by' | 'before-prep';

export interface PortionDateInput {
  /** The day the plate is planned for. */
  plannedDate: IsoDate;
  /** The prep date of the tray the portion comes from. */
  prepDate: IsoDate;
  fridgeDays: number;
}

export interface PortionStatus {
  status: PortionStatusKind;
  eatBy: IsoDate;
  /** Days from prep to the planned day (0 = eaten on prep day). */
  dayIndex: number;
}

/**
 * Status of a refrigerated portion on its planned day: 'ok' within the window (prep day to eat-by,
 * both included), 'past-eat-by' after it, 'before-prep' when the day comes before the tray is made.
 */
export function portionStatus(input: PortionDateInput): PortionStatus {
  const eatBy = eatByDate(input.prepDate, input.fridgeDays);
  const dayIndex = daysBetween(input.prepDate, input.plannedDate);
  let status: PortionStatusKind = 'ok';
  if (dayIndex < 0) status = 'before-prep';
  else if (compareIsoDates(input.plannedDate, eatBy) > 0) status = 'past-eat-by';
  return { status, eatBy, dayIndex };
}

/**
 * The prep date that supplies a plate on `plannedDate` by default: the latest prep date on or before
 * that day (the freshest). Null when every prep date is later.
 */
export function supplyingPrepDate(plannedDate: IsoDate, prepDates: readonly IsoDate[]): IsoDate | null {
  let best: IsoDate | null = null;
  for (const prep of prepDates) {
    if (compareIsoDates(prep, plannedDate) <= 0 && (best === null || compareIsoDates(prep, best) > 0)) best = prep;
  }
  return best;
}

// ── Remedies for a portion past its eat-by ─────────────────────────────────────────────────────────

export interface PrepDateRemedy {
  kind: 'use-other-prep-date';
  prepDate: IsoDate;
  eatBy: IsoDate;
}

export interface FreezeRemedy {
  kind: 'freeze-and-thaw';
  /** Freeze on the prep day, once cooled. */
  freezeOn: IsoDate;
  /** Evening before the planned day: move the portion from the freezer to the refrigerator. */
  thawReminderOn: IsoDate;
  thawReminderTime: string;
  eatOn: IsoDate;
  /** Eat the thawed portion by this day at the latest. */
  eatByAfterThaw: IsoDate;
  /** Quality limit in the freezer. */
  freezerQualityUntil: IsoDate;
}

export type EatByRemedy = PrepDateRemedy | FreezeRemedy;

export interface RemedyInput extends PortionDateInput {
  /** 0 when the tray should not be frozen. */
  freezerWeeks: number;
  /** All prep dates of the week (one or two, usually). */
  weekPrepDates: readonly IsoDate[];
}

/**
 * Remedy (b): take the portion from another prep date of the week whose window covers the planned
 * day (the latest such date, so the freshest). Null when none fits.
 */
export function otherPrepDateRemedy(input: Omit<RemedyInput, 'freezerWeeks'>): PrepDateRemedy | null {
  const fitting = input.weekPrepDates.filter(
    (prep) => prep !== input.prepDate && portionStatus({ ...input, prepDate: prep }).status === 'ok',
  );
  const prepDate = supplyingPrepDate(input.plannedDate, fitting);
  return prepDate === null ? null : { kind: 'use-other-prep-date', prepDate, eatBy: eatByDate(prepDate, input.fridgeDays) };
}

/** The last day to eat a portion thawed in the refrigerator for `eatOn` (THAWED_EAT_WITHIN_DAYS after it). */
export function thawedEatBy(eatOn: IsoDate): IsoDate {
  return addDays(eatOn, THAWED_EAT_WITHIN_DAYS);
}

/**
 * Remedy (a): freeze the portion on its prep day and thaw it in the refrigerator from the evening
 * before the planned day. Null when the tray is not freezable (0 weeks), when the planned day is past
 * the freezer quality limit, or when the planned day is not at least one day after prep.
 */
export function freezeRemedy(input: Omit<RemedyInput, 'weekPrepDates'>): FreezeRemedy | null {
  if (wholeDays(input.freezerWeeks, 'Freezer weeks') === 0) return null;
  if (daysBetween(input.prepDate, input.plannedDate) < 1) return null;
  const freezerQualityUntil = freezerQualityDate(input.prepDate, input.freezerWeeks);
  if (compareIsoDates(input.plannedDate, freezerQualityUntil) > 0) return null;
  return {
    kind: 'freeze-and-thaw',
    freezeOn: input.prepDate,
    thawReminderOn: addDays(input.plannedDate, -1),
    thawReminderTime: THAW_REMINDER_TIME,
    eatOn: input.plannedDate,
    eatByAfterThaw: thawedEatBy(input.plannedDate),
    freezerQualityUntil,
  };
}

/**
 * Remedies for a portion that is not 'ok' on its planned day, best first: another prep date (fresh,
 * no freezing), then freeze-and-thaw. Empty when the portion is fine or nothing fits.
 */
export function eatByRemedies(input: RemedyInput): EatByRemedy[] {
  const { status } = portionStatus(input);
  if (status === 'ok') return [];
  const remedies: EatByRemedy[] = [];
  const other = otherPrepDateRemedy(input);
  if (other) remedies.push(other);
  if (status === 'past-eat-by') {
    const freeze = freezeRemedy(input);
    if (freeze) remedies.push(freeze);
  }
  return remedies;
}

/** A client's task for one evening: move a frozen portion to the refrigerator for the next day's plate. */
export interface ThawTask {
  /** The evening of this day (at THAW_REMINDER_TIME). */
  thawOn: IsoDate;
  /** The day the plate is eaten. */
  eatOn: IsoDate;
  slot: string;
  name: string;
  /** Eat the thawed portion by this day at the latest. */
  eatByAfterThaw: IsoDate;
}

/**
 * Every thaw task of a client's week, in the order they fall: one per frozen plate that has its thaw evening,
 * from the plans' days (`thawOn` is the evening before the plate's day, see freezeRemedy).
 */
export function thawTasks(
  days: readonly { date: IsoDate; plates: readonly { slot: string; name: string; storage: 'fridge' | 'frozen'; thawOn: IsoDate | null }[] }[],
): ThawTask[] {
  const tasks: ThawTask[] = [];
  for (const d of days) {
    for (const p of d.plates) {
      if (p.storage !== 'frozen' || !p.thawOn) continue;
      tasks.push({ thawOn: p.thawOn, eatOn: d.date, slot: p.slot, name: p.name, eatByAfterThaw: thawedEatBy(d.date) });
    }
  }
  return tasks.sort((a, b) => compareIsoDates(a.thawOn, b.thawOn) || compareIsoDates(a.eatOn, b.eatOn));
}
