/**
 * Local wall-clock times of a bake run: "YYYY-MM-DDTHH:mm", no time zone, minute resolution.
 * A bake run lasts hours, so a daylight-saving jump inside it is not modelled: minutes are added to the calendar
 * reading as if every day had 24 h (the run sheet shows the kitchen clock the cook reads at the start). Cooling
 * deadlines, which can run past 2 a.m., are counted in real hours once the kitchen's zone is known
 * (`instantOfWall` and `wallClockIn` in time-zone.ts, in `checkCooling`).
 */

const LOCAL_RE = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;

/** Minutes since 1970-01-01T00:00 of the local reading, or null when the text is not a valid local date-time. */
export function parseLocalMinutes(text: string): number | null {
  const m = LOCAL_RE.exec(text);
  if (!m) return null;
  const [y, mo, d, h, mi] = m.slice(1).map(Number);
  if (mo < 1 || mo > 12 || d < 1 || h > 23 || mi > 59) return null;
  const ms = Date.UTC(y, mo - 1, d, h, mi);
  const back = new Date(ms);
  if (back.getUTCFullYear() !== y || back.getUTCMonth() !== mo - 1 || back.getUTCDate() !== d) return null;
  return Math.round(ms / 60_000);
}

export function isLocalDateTime(text: string): boolean {
  return parseLocalMinutes(text) !== null;
}

function pad(value: number, width = 2): string {
  return String(value).padStart(width, '0');
}

/** Formats minutes since 1970-01-01T00:00 (local reading) as "YYYY-MM-DDTHH:mm". */
export function formatLocalMinutes(minutes: number): string {
  const d = new Date(minutes * 60_000);
  return (
    `${pad(d.getUTCFullYear(), 4)}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())}` +
    `T${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}`
  );
}

/** Minutes since 1970-01-01T00:00 of a local reading; throws on one that is not a valid local date-time. */
export function requireLocalMinutes(text: string): number {
  const m = parseLocalMinutes(text);
  if (m === null) throw new RangeError(`Not a local date-time "YYYY-MM-DDTHH:mm": ${text}`);
  return m;
}

/** `start` plus whole minutes, as a local reading. Throws on an invalid start. */
export function addLocalMinutes(start: string, minutes: number): string {
  return formatLocalMinutes(requireLocalMinutes(start) + minutes);
}
