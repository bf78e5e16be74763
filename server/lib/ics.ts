import { parseLocalMinutes } from '@shared/domain/bake-run-time.js';

/**
 * A local "YYYY-MM-DDTHH:mm" as a Date whose UTC fields are the wall clock, for an ical-generator event written as a
 * floating time (RFC 5545 §3.3.5 form #1: no time zone, the same clock time wherever the calendar is).
 */
export function floating(local: string): Date {
  const minutes = parseLocalMinutes(local);
  if (minutes === null) throw new Error(`Not a local date-time: ${local}`);
  return new Date(minutes * 60_000);
}
