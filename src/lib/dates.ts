import { dateWithYear, dayHeading, DEFAULT_DATE_ORDER, shortDate, type DateOrder } from '@shared/domain/iso-date';
import { clockSpan, clockText, DEFAULT_CLOCK, type ClockStyle } from '@shared/domain/clock';
import { wallClockIn } from '@shared/domain/time-zone';

/**
 * How this workspace writes dates ("Mon, Dec 7" or "Mon 7 Dec"; the coach's setting, read with the signed-in person:
 * `followDateOrder` in auth.queries.ts keeps it). Pages, printed labels, PDFs and e-mails all write dates this way.
 */
let order: DateOrder = DEFAULT_DATE_ORDER;

export function setDateOrder(next: DateOrder): void {
  order = next;
}

/** How this workspace writes a time of day ("13:45" or "1:45 PM"; the coach's setting, kept like the date order). */
let clockStyle: ClockStyle = DEFAULT_CLOCK;

export function setClockStyle(next: ClockStyle): void {
  clockStyle = next;
}

/**
 * The kitchen's time zone (the coach's setting, kept like the date order), or null when not set. The bake run and its
 * cooling record are written in the kitchen's wall-clock time: a coach looking in from another zone reads them on the
 * kitchen's clock, and "now" written from their device is the kitchen's now.
 */
let kitchenZone: string | null = null;

export function setKitchenZone(next: string | null): void {
  kitchenZone = next && knownHere(next) ? next : null;
}

/** Whether this browser knows the zone (a zone named by a newer list than the browser's reads as not set). */
function knownHere(zone: string): boolean {
  try {
    wallClockIn(new Date(0), zone);
    return true;
  } catch {
    return false;
  }
}

export function currentKitchenZone(): string | null {
  return kitchenZone;
}

/** The kitchen's wall clock at `d` (this device's clock read in the kitchen's zone, or as it is when none is set), "YYYY-MM-DDTHH:mm". */
export function kitchenNow(d: Date = new Date()): string {
  if (kitchenZone) return wallClockIn(d, kitchenZone);
  return deviceNow(d);
}

/** This device's own clock at `d`, "YYYY-MM-DDTHH:mm". */
export const deviceNow = (d: Date = new Date()): string => `${localToday(d)}T${localHhmm(d)}`;

/** The kitchen's date today, "YYYY-MM-DD". */
export const kitchenToday = (d: Date = new Date()): string => kitchenNow(d).slice(0, 10);

/** A time of day ("HH:MM" or a local "YYYY-MM-DDTHH:MM") as the workspace writes it: "13:45" or "1:45 PM". */
export function timeLabel(time: string): string {
  return clockText(time, clockStyle);
}

/** A span of one day, "08:00–09:33" or "8:00–9:33 AM". */
export function timeSpanLabel(from: string, to: string): string {
  return clockSpan(from, to, clockStyle);
}

/** The workspace's clock style, for shared words that write times (cooling checks, replanned summaries). */
export function currentClockStyle(): ClockStyle {
  return clockStyle;
}

/** The style this device's locale (or `locale`) writes times in (en-US: 12-hour; en-GB: 24-hour). */
export function deviceClockStyle(locale?: string): ClockStyle {
  const cycle = new Intl.DateTimeFormat(locale, { hour: 'numeric' }).resolvedOptions().hourCycle;
  return cycle === 'h11' || cycle === 'h12' ? '12h' : '24h';
}

/** A day in words: "Mon, Dec 7" (long: "Monday, Dec 7"), or "Mon 7 Dec" ("Monday 7 Dec"), as the workspace writes dates. */
export function dayLabel(iso: string, longWeekday = false): string {
  return longWeekday ? dayHeading(iso, order) : shortDate(iso, order);
}

/** An instant's day on this device's clock with its year: "Dec 7, 2026" or "7 Dec 2026". */
export function dateWithYearLabel(instant: string): string {
  return dateWithYear(localToday(new Date(instant)), order);
}

/** An instant's day on this device's clock: "Mon, Dec 7" (long: "Monday, Dec 7"). */
export function instantDayLabel(instant: string, longWeekday = false): string {
  return dayLabel(localToday(new Date(instant)), longWeekday);
}

/** The order this device's locale (or `locale`) writes a day and its month in (en-US: month first; en-GB: day first). */
export function deviceDateOrder(locale?: string): DateOrder {
  const parts = new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'short' }).formatToParts(new Date(Date.UTC(2026, 11, 7, 12)));
  const day = parts.findIndex((p) => p.type === 'day');
  const month = parts.findIndex((p) => p.type === 'month');
  return day >= 0 && month >= 0 && day < month ? 'day-month' : 'month-day';
}

/** When something happened ("Wed, Dec 2, 3:13 PM" or "Wed, Dec 2, 15:13"), on this device's clock. */
export function momentLabel(iso: string): string {
  const d = new Date(iso);
  return `${dayLabel(localToday(d))}, ${timeLabel(localHhmm(d))}`;
}

/** The time of `d` on this device's clock, "HH:MM". */
export function localHhmm(d: Date): string {
  return `${String(d.getHours()).padStart(2, '0')}:${String(d.getMinutes()).padStart(2, '0')}`;
}

/** "Next prep day: Wednesday, Dec 9", with "(today)" when it is the reader's today. */
export function nextPrepDayTitle(date: string, today: string): string {
  return `Next prep day: ${dayLabel(date, true)}${date === today ? ' (today)' : ''}`;
}

/** Today on this device (or the day of `d` on its clock), as a calendar date: what "today's plate" means to the person holding the phone. */
export function localToday(d: Date = new Date()): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}
