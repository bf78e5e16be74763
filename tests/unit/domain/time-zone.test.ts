import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canonicalTimeZone, instantOfWall, timeZoneChoices, wallClockIn } from '@shared/domain/time-zone';

// The kitchen's wall clock from the server's instant. Zone rules are the IANA time zone database's as the engine
// carries it; the checks below are the legal rules those zones follow, worked for 2026 by hand:
// - United States: 15 U.S.C. §260a (as amended by the Energy Policy Act of 2005, §110): daylight time from 2:00 a.m.
//   local on the second Sunday of March to 2:00 a.m. local on the first Sunday of November. In 2026 those Sundays
//   are March 8 and November 1 (Jan 1, 2026 was a Thursday). Central time is UTC−6, daylight UTC−5 (15 U.S.C. §261).
// - European Union: Directive 2000/84/EC, Articles 2 and 3: summer time from 01:00 UTC on the last Sunday of March
//   to 01:00 UTC on the last Sunday of October: March 29 and October 25 in 2026. Berlin is UTC+1 (summer UTC+2);
//   London (UK, Summer Time Act 1972 as amended, same dates) UTC+0 (summer UTC+1).

const at = (iso: string) => new Date(iso);

describe('wallClockIn', () => {
  it('reads Chicago on both sides of the 2026 US changes (15 U.S.C. §260a)', () => {
    // Spring forward: 1:59 CST is followed by 3:00 CDT.
    expect(wallClockIn(at('2026-03-08T07:59:00Z'), 'America/Chicago')).toBe('2026-03-08T01:59');
    expect(wallClockIn(at('2026-03-08T08:00:00Z'), 'America/Chicago')).toBe('2026-03-08T03:00');
    // Fall back: 1:59 CDT is followed by 1:00 CST.
    expect(wallClockIn(at('2026-11-01T06:59:00Z'), 'America/Chicago')).toBe('2026-11-01T01:59');
    expect(wallClockIn(at('2026-11-01T07:00:00Z'), 'America/Chicago')).toBe('2026-11-01T01:00');
    // Midday in January (CST) and July (CDT).
    expect(wallClockIn(at('2026-01-04T18:00:00Z'), 'America/Chicago')).toBe('2026-01-04T12:00');
    expect(wallClockIn(at('2026-07-04T17:00:00Z'), 'America/Chicago')).toBe('2026-07-04T12:00');
  });

  it('reads Berlin and London on both sides of the 2026 EU changes (Directive 2000/84/EC)', () => {
    expect(wallClockIn(at('2026-03-29T00:59:00Z'), 'Europe/Berlin')).toBe('2026-03-29T01:59');
    expect(wallClockIn(at('2026-03-29T01:00:00Z'), 'Europe/Berlin')).toBe('2026-03-29T03:00');
    expect(wallClockIn(at('2026-03-29T01:00:00Z'), 'Europe/London')).toBe('2026-03-29T02:00');
    expect(wallClockIn(at('2026-10-25T00:59:00Z'), 'Europe/Berlin')).toBe('2026-10-25T02:59');
    expect(wallClockIn(at('2026-10-25T01:00:00Z'), 'Europe/Berlin')).toBe('2026-10-25T02:00');
    expect(wallClockIn(at('2026-10-25T01:00:00Z'), 'Europe/London')).toBe('2026-10-25T01:00');
  });

  it('writes midnight as 00, never 24, and crosses the date line with the day', () => {
    expect(wallClockIn(at('2026-12-01T06:00:00Z'), 'America/Chicago')).toBe('2026-12-01T00:00');
    expect(wallClockIn(at('2026-12-31T23:30:00Z'), 'UTC')).toBe('2026-12-31T23:30');
    expect(wallClockIn(at('2026-12-31T23:30:00Z'), 'Europe/Berlin')).toBe('2027-01-01T00:30');
  });

  it('in UTC is the instant’s own ISO minute (property, any instant from 1970 to 2100)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 4_102_444_800_000 }), (ms) => {
        const d = new Date(ms);
        expect(wallClockIn(d, 'UTC')).toBe(d.toISOString().slice(0, 16));
      }),
    );
  });
});

describe('canonicalTimeZone', () => {
  it('keeps a listed zone in the list’s spelling and refuses what is not a place', () => {
    expect(canonicalTimeZone('america/chicago')).toBe('America/Chicago');
    expect(canonicalTimeZone(' Europe/Berlin ')).toBe('Europe/Berlin');
    expect(canonicalTimeZone('utc')).toBe('UTC');
    for (const bad of ['', 'Mars/Olympus_Mons', '+05:30', '-0600', 'Etc/GMT+6', 'x'.repeat(80)]) expect(canonicalTimeZone(bad)).toBeNull();
  });

  it('keeps a zone name another engine lists (Asia/Kolkata for Asia/Calcutta, Europe/Kyiv for Europe/Kiev) as written', () => {
    expect(canonicalTimeZone('Asia/Kolkata')).toBe('Asia/Kolkata');
    expect(canonicalTimeZone('Europe/Kyiv')).toBe('Europe/Kyiv');
    // India Standard Time is UTC+5:30 with no daylight time (from memory).
    expect(wallClockIn(at('2026-01-04T06:30:00Z'), canonicalTimeZone('Asia/Kolkata')!)).toBe('2026-01-04T12:00');
  });

  it('accepts every zone the list offers, as itself', () => {
    const zones = timeZoneChoices();
    expect(zones[0]).toBe('UTC');
    expect(zones).toContain('America/Chicago');
    for (const z of zones) expect(canonicalTimeZone(z)).toBe(z);
  });
});

describe('instantOfWall, and real minutes on the kitchen’s wall clock', () => {
  const ms = (iso: string) => Date.parse(iso);
  /** `minutes` of real time after a wall reading, read on the same wall clock (as checkCooling counts its deadlines). */
  const addWallMinutes = (local: string, minutes: number, zone: string) => wallClockIn(new Date(instantOfWall(local, zone) + minutes * 60_000), zone);

  it('reads an ordinary wall time in its zone (Chicago CST UTC−6 in January, CDT UTC−5 in July; 15 U.S.C. §261)', () => {
    expect(instantOfWall('2026-01-04T12:00', 'America/Chicago')).toBe(ms('2026-01-04T18:00:00Z'));
    expect(instantOfWall('2026-07-04T12:00', 'America/Chicago')).toBe(ms('2026-07-04T17:00:00Z'));
    expect(instantOfWall('2026-12-31T23:30', 'UTC')).toBe(ms('2026-12-31T23:30:00Z'));
  });

  it('the hour repeated when Chicago falls back (Nov 1, 2026, 15 U.S.C. §260a) is read as its first, daylight time', () => {
    // 1:30 happens at 06:30Z (CDT) and again at 07:30Z (CST); the first is the one before the change.
    expect(instantOfWall('2026-11-01T01:30', 'America/Chicago')).toBe(ms('2026-11-01T06:30:00Z'));
    expect(instantOfWall('2026-11-01T02:00', 'America/Chicago')).toBe(ms('2026-11-01T08:00:00Z'));
  });

  it('the hour skipped when Chicago springs forward (Mar 8, 2026) moves on by the jump: 2:30 is 3:30 CDT', () => {
    expect(instantOfWall('2026-03-08T02:30', 'America/Chicago')).toBe(ms('2026-03-08T08:30:00Z'));
    expect(wallClockIn(new Date(instantOfWall('2026-03-08T02:30', 'America/Chicago')), 'America/Chicago')).toBe('2026-03-08T03:30');
  });

  it('adds real hours across the night the clock changes (worked by hand from the rules above)', () => {
    // Fall back: out 23:30 CDT (04:30Z) → 2 h = 06:30Z = 01:30 CDT; 6 h = 10:30Z = 04:30 CST (the calendar says 05:30).
    expect(addWallMinutes('2026-10-31T23:30', 120, 'America/Chicago')).toBe('2026-11-01T01:30');
    expect(addWallMinutes('2026-10-31T23:30', 360, 'America/Chicago')).toBe('2026-11-01T04:30');
    // Spring forward: out 23:30 CST (05:30Z) → 6 h = 11:30Z = 06:30 CDT (the calendar says 05:30).
    expect(addWallMinutes('2026-03-07T23:30', 360, 'America/Chicago')).toBe('2026-03-08T06:30');
    // Berlin falls back Oct 25, 2026 at 01:00Z (Directive 2000/84/EC): out 22:00 CEST (20:00Z) → 6 h = 02:00Z = 03:00 CET.
    expect(addWallMinutes('2026-10-24T22:00', 360, 'Europe/Berlin')).toBe('2026-10-25T03:00');
    // A day with no change: the calendar's answer.
    expect(addWallMinutes('2026-01-04T10:10', 360, 'America/Chicago')).toBe('2026-01-04T16:10');
  });

  it('names the instant the wall clock read, for any minute and zone but the repeated hour (property)', () => {
    const zones = ['America/Chicago', 'Europe/Berlin', 'Australia/Adelaide', 'Asia/Tokyo', 'America/St_Johns', 'UTC'];
    fc.assert(
      fc.property(fc.integer({ min: 1_577_836_800_000, max: 2_051_222_400_000 }), fc.constantFrom(...zones), (t, zone) => {
        const minute = Math.floor(t / 60_000) * 60_000;
        const wall = wallClockIn(new Date(t), zone);
        const back = instantOfWall(wall, zone);
        // The same wall reading either way, and the same instant unless the reading repeats (then the first).
        expect(wallClockIn(new Date(back), zone)).toBe(wall);
        expect(back).toBeLessThanOrEqual(minute);
        if (back !== minute) expect(minute - back).toBeLessThanOrEqual(60 * 60_000);
      }),
    );
  });

  it('refuses text that is not a local date-time', () => {
    expect(() => instantOfWall('2026-01-04 12:00', 'UTC')).toThrow(RangeError);
  });
});
