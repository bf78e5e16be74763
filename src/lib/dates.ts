/**
 * Day labels for ISO dates ("Mon, Dec 7"; long: "Monday, Dec 7"), in the reader's locale. The formatters are made
 * once: `toLocaleDateString` builds a new Intl.DateTimeFormat on every call, which a 60-client week board (840 cells,
 * each named by its day) paid for hundreds of milliseconds on every render.
 */
const short = new Intl.DateTimeFormat(undefined, { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' });
const long = new Intl.DateTimeFormat(undefined, { weekday: 'long', day: 'numeric', month: 'short', timeZone: 'UTC' });

export function dayLabel(iso: string, longWeekday = false): string {
  return (longWeekday ? long : short).format(new Date(`${iso}T12:00:00Z`));
}

const moment = new Intl.DateTimeFormat(undefined, { weekday: 'short', day: 'numeric', month: 'short', hour: 'numeric', minute: '2-digit' });

/** When something happened ("Wed, Dec 2, 3:13 PM"), on this device's clock: every page writes a moment this way. */
export function momentLabel(iso: string): string {
  return moment.format(new Date(iso));
}

/** "Next prep day: Wednesday, Dec 9", with "(today)" when it is the reader's today. */
export function nextPrepDayTitle(date: string, today: string): string {
  return `Next prep day: ${dayLabel(date, true)}${date === today ? ' (today)' : ''}`;
}

/** Today on this device (or the day of `d` on its clock), as a calendar date: what "today's plate" means to the person holding the phone. */
export function localToday(d: Date = new Date()): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}
