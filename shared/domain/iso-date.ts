/**
 * Plain calendar dates as ISO strings 'YYYY-MM-DD'.
 *
 * A prep date, an eat-by date or a planned day is a calendar day, not an instant. All arithmetic
 * runs on UTC midnights, so a daylight-saving change in the machine's time zone can never shift a
 * date by one day.
 */

/** A calendar date written 'YYYY-MM-DD'. */
export type IsoDate = string;

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
const MIN_YEAR = 1900;
const MAX_YEAR = 2999;
const MS_PER_DAY = 86_400_000;

/**
 * Parse caches: a week board compares the same few dozen dates thousands of times. Only valid dates are stored
 * (so an invalid one still throws every time); the maps are pure memos of deterministic functions, bounded, and
 * cleared when full.
 */
const CACHE_LIMIT = 4_096;
const parsed = new Map<string, number>();
const written = new Map<number, IsoDate>();

/**
 * True when `value` is a real calendar date written 'YYYY-MM-DD' (so '2025-02-30' is false), in the years 1900 to
 * 2999: the dates of plans, far enough from year 9999 that a week's arithmetic stays in four-digit years.
 */
export function isIsoDate(value: unknown): value is IsoDate {
  if (typeof value !== 'string') return false;
  if (parsed.has(value)) return true;
  const match = ISO_DATE.exec(value);
  if (!match) return false;
  const [, y, m, d] = match.map(Number);
  if (y < MIN_YEAR || y > MAX_YEAR) return false;
  const date = new Date(0);
  date.setUTCFullYear(y, m - 1, d);
  return date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d;
}

function toUtcMs(value: IsoDate): number {
  const known = typeof value === 'string' ? parsed.get(value) : undefined;
  if (known !== undefined) return known;
  if (!isIsoDate(value)) throw new RangeError(`Not an ISO calendar date (YYYY-MM-DD): ${String(value)}`);
  const [y, m, d] = value.split('-').map(Number);
  const date = new Date(0);
  date.setUTCFullYear(y, m - 1, d);
  const ms = date.getTime();
  if (parsed.size >= CACHE_LIMIT) parsed.clear();
  parsed.set(value, ms);
  return ms;
}

function fromUtcMs(ms: number): IsoDate {
  const known = written.get(ms);
  if (known !== undefined) return known;
  const date = new Date(ms);
  const y = String(date.getUTCFullYear()).padStart(4, '0');
  const m = String(date.getUTCMonth() + 1).padStart(2, '0');
  const d = String(date.getUTCDate()).padStart(2, '0');
  const text = `${y}-${m}-${d}`;
  if (written.size >= CACHE_LIMIT) written.clear();
  written.set(ms, text);
  return text;
}

/** The date `days` calendar days after `date` (negative goes back). `days` must be a whole number. */
export function addDays(date: IsoDate, days: number): IsoDate {
  if (!Number.isInteger(days)) throw new RangeError(`Days must be a whole number: ${days}`);
  return fromUtcMs(toUtcMs(date) + days * MS_PER_DAY);
}

/** Whole calendar days from `from` to `to` (positive when `to` is later). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return Math.round((toUtcMs(to) - toUtcMs(from)) / MS_PER_DAY);
}

/** Day of the week, 0 = Sunday … 6 = Saturday. */
export function weekdayOf(date: IsoDate): number {
  return new Date(toUtcMs(date)).getUTCDay();
}

/** Negative when a is earlier, 0 when equal, positive when later (valid ISO dates only). */
export function compareIsoDates(a: IsoDate, b: IsoDate): number {
  return daysBetween(b, a);
}

const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/**
 * How a workspace writes dates in words (a coach's setting: the pages, printed plans, labels, e-mails and messages
 * all follow it): 'month-day' ("Mon, Dec 7"; as en-US writes them) or 'day-month' ("Mon 7 Dec"; as en-GB does).
 */
export const DATE_ORDERS = ['month-day', 'day-month'] as const;
export type DateOrder = (typeof DATE_ORDERS)[number];
export const DEFAULT_DATE_ORDER: DateOrder = 'month-day';

/** A stored value as a DateOrder (anything but 'day-month' reads as the default). */
export const toDateOrder = (v: string | null | undefined): DateOrder => (v === 'day-month' ? 'day-month' : DEFAULT_DATE_ORDER);

function parts(iso: IsoDate) {
  const [y, m, d] = iso.split('-').map(Number);
  return { y, month: MONTHS[m - 1], d, weekday: WEEKDAYS[weekdayOf(iso)] };
}

/**
 * A calendar date in full words for printed plans and e-mails: "Monday, December 7, 2026" (month-day) or
 * "Monday 7 December 2026" (day-month). Always English.
 */
export function longDate(iso: IsoDate, order: DateOrder): string {
  const { y, month, d, weekday } = parts(iso);
  return order === 'day-month' ? `${weekday} ${d} ${month} ${y}` : `${weekday}, ${month} ${d}, ${y}`;
}

/** "Wed, Dec 9" (month-day) or "Wed 9 Dec" (day-month) from "2026-12-09": a day in a list, a title or a sentence. */
export function shortDate(iso: IsoDate, order: DateOrder): string {
  const { month, d, weekday } = parts(iso);
  return order === 'day-month' ? `${weekday.slice(0, 3)} ${d} ${month.slice(0, 3)}` : `${weekday.slice(0, 3)}, ${month.slice(0, 3)} ${d}`;
}

/** "Wednesday, Dec 9" (month-day) or "Wednesday 9 Dec" (day-month): a day's heading, its weekday in full. */
export function dayHeading(iso: IsoDate, order: DateOrder): string {
  const { month, d, weekday } = parts(iso);
  return order === 'day-month' ? `${weekday} ${d} ${month.slice(0, 3)}` : `${weekday}, ${month.slice(0, 3)} ${d}`;
}

/** "Dec 7, 2026" (month-day) or "7 Dec 2026" (day-month): a date with its year and no weekday (when someone joined). */
export function dateWithYear(iso: IsoDate, order: DateOrder): string {
  const { y, month, d } = parts(iso);
  return order === 'day-month' ? `${d} ${month.slice(0, 3)} ${y}` : `${month.slice(0, 3)} ${d}, ${y}`;
}
