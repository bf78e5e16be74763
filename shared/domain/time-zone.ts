/**
 * The kitchen's time zone: an IANA zone name ("America/Chicago") the coach sets for the workspace. The bake run and
 * the cooling record are written in the kitchen's wall-clock time ("YYYY-MM-DDTHH:mm", no zone); the server reads
 * its own clock (an instant) in this zone to know what time it is in the kitchen, e.g. to see that a cooling
 * deadline has passed while nobody has the bake-run page open.
 *
 * Zone names and their rules come from the IANA time zone database as the JavaScript engine carries it (ECMA-402
 * Intl.DateTimeFormat); nothing here keeps its own table.
 */

/** The longest zone name stored (the database column's length). */
export const TIME_ZONE_MAX = 64;

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(zone: string): Intl.DateTimeFormat {
  let f = formatters.get(zone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone: zone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
    });
    formatters.set(zone, f);
  }
  return f;
}

/**
 * The zone's name as stored, when the engine knows the zone, or null. A name from the engine's list keeps the list's
 * spelling ("america/chicago" → "America/Chicago"); another name the engine accepts is kept as given when it is
 * written like a zone name ("Asia/Kolkata", which an older zone list carries as "Asia/Calcutta": a browser and the
 * server may list different names for one zone), else as the engine resolves it. Offsets without a place ("+05:00")
 * are not zones a kitchen is in (their daylight time would be wrong) and read as null.
 */
export function canonicalTimeZone(name: string): string | null {
  const text = name.trim();
  if (!text || text.length > TIME_ZONE_MAX || /^[+-]|^etc\/gmt/i.test(text)) return null;
  let resolved: string;
  try {
    resolved = new Intl.DateTimeFormat('en-US', { timeZone: text }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
  const listed = timeZoneChoices().find((z) => z.toLowerCase() === text.toLowerCase());
  if (listed) return listed;
  const written = text.split('/').every((part) => /^[A-Z]/.test(part));
  return written ? text : resolved;
}

/** `instant` as the wall clock of `zone` reads it, "YYYY-MM-DDTHH:mm" (the form the bake run and cooling use). */
export function wallClockIn(instant: Date, zone: string): string {
  const parts: Record<string, string> = {};
  for (const p of formatterFor(zone).formatToParts(instant)) parts[p.type] = p.value;
  return `${parts.year}-${parts.month}-${parts.day}T${parts.hour}:${parts.minute}`;
}

const WALL_RE = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;

/** The wall reading as if it were UTC, in ms; throws on text that is not "YYYY-MM-DDTHH:mm". */
function wallAsUtc(local: string): number {
  const m = WALL_RE.exec(local);
  if (!m) throw new RangeError(`Not a local date-time "YYYY-MM-DDTHH:mm": ${local}`);
  const [y, mo, d, h, mi] = m.slice(1).map(Number);
  return Date.UTC(y, mo - 1, d, h, mi);
}

/** How far the zone's wall clock is ahead of UTC at `ms`, in ms (whole minutes). */
function offsetAt(ms: number, zone: string): number {
  return wallAsUtc(wallClockIn(new Date(ms), zone)) - Math.floor(ms / 60_000) * 60_000;
}

const DAY_MS = 86_400_000;

/**
 * The instant (ms since the epoch) a kitchen's wall-clock reading names in `zone`. A reading the clock shows twice
 * (the hour repeated when daylight time ends) is its first; a reading the clock skips (the hour lost when it begins)
 * is moved on by the jump (2:30 on a spring-forward night is 3:30 daylight time). Both as the ECMA-262 Temporal
 * proposal's "compatible" disambiguation does.
 */
export function instantOfWall(local: string, zone: string): number {
  const wall = wallAsUtc(local);
  // The offsets a day before and after: a zone changes its offset at most once in two days.
  const before = offsetAt(wall - DAY_MS, zone);
  const after = offsetAt(wall + DAY_MS, zone);
  // The same offset a day either side: no change in between (every day but two a year), one answer.
  if (before === after) return wall - before;
  const fits = [before, after].map((o) => wall - o).filter((ms) => offsetAt(ms, zone) === wall - ms);
  if (fits.length) return Math.min(...fits);
  return wall - before;
}

/** The zone names a coach can choose from (the engine's list), with UTC first. */
export function timeZoneChoices(): string[] {
  if (!choices) {
    const supported = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
    choices = ['UTC', ...supported.filter((z) => z !== 'UTC')];
  }
  return [...choices];
}
let choices: string[] | null = null;

/** The device's own zone (a new workspace starts in its coach's), or null when the engine does not say. */
export function deviceTimeZone(): string | null {
  const zone = new Intl.DateTimeFormat().resolvedOptions().timeZone;
  return zone ? canonicalTimeZone(zone) : null;
}

/** A zone's name as people read it: "America/Los_Angeles" → "America/Los Angeles". */
export const zoneName = (zone: string): string => zone.replace(/_/g, ' ');
