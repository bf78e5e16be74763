import { afterEach, describe, expect, it } from 'vitest';
import type { MeDto } from '@shared/schemas/auth.schema';
import { followDateOrder, meQuery } from '@/features/auth/api/auth.queries';
import { currentKitchenZone, kitchenNow, kitchenToday, localHhmm, localToday, setKitchenZone } from '@/lib/dates';
import { signedIn, testQueryClient } from './render';

// The kitchen's clock on the pages: the device's instant read in the workspace's time zone. Chicago keeps Central
// Standard Time (UTC−6) in January (15 U.S.C. §260a and §261); Tokyo is UTC+9 with no daylight time (from memory).

afterEach(() => setKitchenZone(null));

describe('the kitchen’s clock on the pages', () => {
  it('follows the signed-in person’s workspace: its zone once set, the device’s own clock when not', () => {
    const qc = testQueryClient();
    const stop = followDateOrder(qc);
    const instant = new Date('2026-01-05T02:10:00Z');
    qc.setQueryData<MeDto>(meQuery().queryKey, signedIn({ timeZone: 'America/Chicago' }));
    expect(currentKitchenZone()).toBe('America/Chicago');
    expect(kitchenNow(instant)).toBe('2026-01-04T20:10');
    expect(kitchenToday(instant)).toBe('2026-01-04');
    // Another workspace (or the coach changed it): Tokyo, the next morning.
    qc.setQueryData<MeDto>(meQuery().queryKey, signedIn({ timeZone: 'Asia/Tokyo' }));
    expect(kitchenNow(instant)).toBe('2026-01-05T11:10');
    // Not set: the device's own clock, as before there was a setting.
    qc.setQueryData<MeDto>(meQuery().queryKey, signedIn({ timeZone: null }));
    expect(currentKitchenZone()).toBeNull();
    expect(kitchenNow(instant)).toBe(`${localToday(instant)}T${localHhmm(instant)}`);
    stop();
  });

  it('a zone this browser does not know reads as not set (the device’s clock), never as an error', () => {
    setKitchenZone('Atlantis/Capital');
    expect(currentKitchenZone()).toBeNull();
    const instant = new Date('2026-07-04T17:00:00Z');
    expect(kitchenNow(instant)).toBe(`${localToday(instant)}T${localHhmm(instant)}`);
  });
});
