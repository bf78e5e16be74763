/**
 * How the workspace writes a time of day: '24h' ("08:33", "13:45") or '12h' ("8:33 AM", "1:45 PM"). Pages, the
 * printed run sheet, PDFs, calendar files and e-mails all write times this way (the coach's setting; a new workspace
 * starts with the style of the device its coach signs up on). Time inputs stay the device's own.
 */
export const CLOCK_STYLES = ['24h', '12h'] as const;
export type ClockStyle = (typeof CLOCK_STYLES)[number];
export const DEFAULT_CLOCK: ClockStyle = '24h';

/** A stored value as a ClockStyle (anything but '12h' reads as the default). */
export const toClockStyle = (v: string | null | undefined): ClockStyle => (v === '12h' ? '12h' : DEFAULT_CLOCK);

/**
 * A time of day in words: `time` is "HH:MM" or a local date-time "YYYY-MM-DDTHH:MM[:SS]". 24-hour: "08:33"; 12-hour:
 * "8:33 AM", noon "12:00 PM", midnight "12:00 AM" (the US convention, as Intl's en-US writes it).
 */
export function clockText(time: string, style: ClockStyle): string {
  const hhmm = time.length > 5 ? time.slice(11, 16) : time;
  if (!/^\d{2}:\d{2}$/.test(hhmm)) throw new RangeError(`Not a time of day: ${time}`);
  if (style === '24h') return hhmm;
  const h = Number(hhmm.slice(0, 2));
  return `${h % 12 === 0 ? 12 : h % 12}:${hhmm.slice(3)} ${h < 12 ? 'AM' : 'PM'}`;
}

/** "08:00–09:33" or "8:00–9:33 AM" (one AM/PM when both share it), for a span on one day. */
export function clockSpan(from: string, to: string, style: ClockStyle): string {
  const a = clockText(from, style);
  const b = clockText(to, style);
  if (style === '12h' && a.slice(-2) === b.slice(-2)) return `${a.slice(0, -3)}–${b}`;
  return `${a}–${b}`;
}

/** A span of whole minutes in words: "17 min", "2 h", "2 h 5 min". */
export function minutesSpan(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  return h === 0 ? `${m} min` : m === 0 ? `${h} h` : `${h} h ${m} min`;
}
