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
 * "Monday 7 December 2026" from "2026-12-07": a calendar date in words for printed plans, e-mails and the
 * sentences of the week check (always English; the pages use the reader's locale, src/lib/dates.ts).
 */
export function longDate(iso: IsoDate): string {
  const [y, m, d] = iso.split('-').map(Number);
  return `${WEEKDAYS[weekdayOf(iso)]} ${d} ${MONTHS[m - 1]} ${y}`;
}

/** "Wed 9 Dec" from "2026-12-09" (as longDate, short). */
export function shortDate(iso: IsoDate): string {
  const [, m, d] = iso.split('-').map(Number);
  return `${WEEKDAYS[weekdayOf(iso)].slice(0, 3)} ${d} ${MONTHS[m - 1].slice(0, 3)}`;
}
