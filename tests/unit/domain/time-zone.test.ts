import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canonicalTimeZone, timeZoneChoices, wallClockIn } from '@shared/domain/time-zone';

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
