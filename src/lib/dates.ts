import { dateWithYear, dayHeading, DEFAULT_DATE_ORDER, shortDate, type DateOrder } from '@shared/domain/iso-date';

/**
 * How this workspace writes dates ("Mon, Dec 7" or "Mon 7 Dec"; the coach's setting, read with the signed-in person:
 * `followDateOrder` in auth.queries.ts keeps it). Pages, printed labels, PDFs and e-mails all write dates this way.
 */
let order: DateOrder = DEFAULT_DATE_ORDER;

export function setDateOrder(next: DateOrder): void {
  order = next;
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

const time = new Intl.DateTimeFormat(undefined, { hour: 'numeric', minute: '2-digit' });

/** When something happened ("Wed, Dec 2, 3:13 PM"), on this device's clock (its time in the device's own style). */
export function momentLabel(iso: string): string {
  const d = new Date(iso);
  return `${dayLabel(localToday(d))}, ${time.format(d)}`;
}

/** "Next prep day: Wednesday, Dec 9", with "(today)" when it is the reader's today. */
export function nextPrepDayTitle(date: string, today: string): string {
  return `Next prep day: ${dayLabel(date, true)}${date === today ? ' (today)' : ''}`;
}

/** Today on this device (or the day of `d` on its clock), as a calendar date: what "today's plate" means to the person holding the phone. */
export function localToday(d: Date = new Date()): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}
