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
