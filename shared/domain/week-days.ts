import { addDays, daysBetween, weekdayOf, type IsoDate } from './iso-date';

/** Days on one week's board. */
export const BOARD_DAYS = 7;

/** Whether two weeks' boards (each seven days from its first) share a day. */
export function boardsShareADay(aStart: IsoDate, bStart: IsoDate): boolean {
  return Math.abs(daysBetween(aStart, bStart)) < BOARD_DAYS;
}

/** The Monday after `today` (a week after it, when today is a Monday). */
export function nextMonday(today: IsoDate): IsoDate {
  return addDays(today, (8 - weekdayOf(today)) % 7 || 7);
}

/**
 * The first Monday after today whose board shares no day with a week of the workspace (a day is on one board
 * only): next week's, unless a week plans some of its days already. Looks ten years ahead at most.
 */
export function firstFreeMonday(today: IsoDate, weeks: readonly { startDate: IsoDate }[]): IsoDate {
  let start = nextMonday(today);
  for (let i = 0; i < 520 && weeks.some((w) => boardsShareADay(w.startDate, start)); i++) start = addDays(start, BOARD_DAYS);
  return start;
}

/**
 * The nearest first day for a new board clear of every week, stepping from a week it would clash with: 'later' gives
 * the first start after that week (and after any week right behind it), 'earlier' the last start before it.
 */
export function clearStart(weeks: readonly { startDate: IsoDate }[], clash: { startDate: IsoDate }, way: 'later' | 'earlier'): IsoDate {
  const step = way === 'later' ? BOARD_DAYS : -BOARD_DAYS;
  let start = addDays(clash.startDate, step);
  for (let i = 0; i < 520; i++) {
    const next = weeks.find((w) => boardsShareADay(w.startDate, start));
    if (!next) break;
    start = addDays(next.startDate, step);
  }
  return start;
}

/** The week covering `today`, else the next one to start, else the latest (null when there is none). */
export function pickWeek<T extends { startDate: IsoDate }>(weeks: readonly T[], today: IsoDate): T | null {
  const sorted = [...weeks].sort((a, b) => daysBetween(b.startDate, a.startDate));
  const current = sorted.find((w) => daysBetween(w.startDate, today) >= 0 && daysBetween(w.startDate, today) < BOARD_DAYS);
  return current ?? sorted.find((w) => daysBetween(today, w.startDate) > 0) ?? sorted[sorted.length - 1] ?? null;
}

/** The first week to start after `week` (null when none does). */
export function weekAfter<T extends { startDate: IsoDate }>(weeks: readonly T[], week: { startDate: IsoDate }): T | null {
  let next: T | null = null;
  for (const w of weeks) if (daysBetween(week.startDate, w.startDate) > 0 && (!next || daysBetween(w.startDate, next.startDate) > 0)) next = w;
  return next;
}

/**
 * The kitchen's week: the one whose next prep day (today included) comes first, whichever board it is on (from
 * Thursday the kitchen shops for next week's Sunday); with no prep day ahead, `pickWeek`'s.
 */
export function kitchenWeek<T extends { startDate: IsoDate; prepDate: IsoDate; secondPrepDate?: IsoDate | null }>(
  weeks: readonly T[],
  today: IsoDate,
): T | null {
  let best: { week: T; date: IsoDate } | null = null;
  for (const week of weeks) {
    for (const date of [week.prepDate, week.secondPrepDate]) {
      if (!date || daysBetween(today, date) < 0) continue;
      const sooner = !best || daysBetween(date, best.date) > 0 || (date === best.date && daysBetween(week.startDate, best.week.startDate) > 0);
      if (sooner) best = { week, date };
    }
  }
  return best?.week ?? pickWeek(weeks, today);
}
