import { describe, expect, it } from 'vitest';
import { logCheck } from '@server/modules/bake-runs/cooling-log.js';
import type { CoolingEntry } from '@shared/domain/cooling.js';

// How the cooling log judges a record against FDA Food Code §3-501.14 (70 °F within 2 h, 41 °F within 6 h of the time
// out) when the server does not know the kitchen's time. The bound: a time out on the prep day, a restart within a
// day of it, the last deadline 6 hours after (05:59 two days after the prep day at the latest); no zone runs more
// than 12 hours behind UTC (from memory: the furthest behind is UTC−12), so from the third day after the prep day
// (UTC) every deadline has passed everywhere. Readings are made up.

const entry = (over: Partial<CoolingEntry> = {}): CoolingEntry => ({ outAt: '2026-01-04T23:30', restartedAt: null, readings: [], discarded: false, ...over });
const atUtc = (iso: string) => new Date(iso);

describe('the cooling log without the kitchen’s time zone', () => {
  it('judges a record on its readings alone until the third day after its prep day, then after its deadlines', () => {
    // Two days after: the kitchen may be at UTC−12 with the restart's 6 hours still running; only readings count.
    expect(logCheck(entry(), '2026-01-04', null, atUtc('2026-01-06T23:59:00Z')).state).toBe('to-70');
    // Three days after: past every deadline in every zone; no reading at 70 °F is a missed first stage.
    expect(logCheck(entry(), '2026-01-04', null, atUtc('2026-01-07T00:00:00Z')).state).toBe('missed-70');
    const cooled = entry({ readings: [{ at: '2026-01-05T01:00', tempF: 65 }, { at: '2026-01-05T05:00', tempF: 40 }] });
    expect(logCheck(cooled, '2026-01-04', null, atUtc('2026-02-01T00:00:00Z')).state).toBe('cooled');
    const only70 = entry({ readings: [{ at: '2026-01-05T01:00', tempF: 65 }] });
    expect(logCheck(only70, '2026-01-04', null, atUtc('2026-02-01T00:00:00Z'))).toMatchObject({ state: 'missed-41', by41: '2026-01-05T05:30' });
    // A restart a day later is judged from the restart, and is past its deadlines too by then.
    const restarted = entry({ restartedAt: '2026-01-05T23:00', readings: [{ at: '2026-01-06T00:30', tempF: 60 }] });
    expect(logCheck(restarted, '2026-01-04', null, atUtc('2026-01-07T00:00:00Z'))).toMatchObject({ state: 'missed-41', by41: '2026-01-06T05:00' });
  });

  it('with the kitchen’s zone, judges at the kitchen’s time (Chicago is UTC−6 in January: 15 U.S.C. §260a, §261)', () => {
    // Out 23:30 CST on Jan 4 = 05:30Z on Jan 5; 70 °F due 07:30Z.
    expect(logCheck(entry(), '2026-01-04', 'America/Chicago', atUtc('2026-01-05T07:30:00Z')).state).toBe('to-70');
    expect(logCheck(entry(), '2026-01-04', 'America/Chicago', atUtc('2026-01-05T07:31:00Z')).state).toBe('missed-70');
  });
});
