import { afterEach, describe, expect, it } from 'vitest';
import { dayLabel, deviceDateOrder, momentLabel, setDateOrder } from '@/lib/dates';

afterEach(() => setDateOrder('month-day'));

describe('a moment as pages write it', () => {
  it('gives the day and the time to the minute, never seconds nor an ISO stamp', () => {
    // Noon UTC on 2 December 2026: still 2 December in every time zone from UTC−11 to UTC+11.
    const text = momentLabel('2026-12-02T12:13:43Z');
    expect(text).toMatch(/^Wed, Dec 2, /);
    expect(text).toMatch(/:13/);
    expect(text).not.toMatch(/:43|2026-12-02|T12/);
  });

  it('writes days as the workspace does (2026-12-02 was a Wednesday; ECMA-402 checks the words in eat-by.test.ts)', () => {
    expect(dayLabel('2026-12-02')).toBe('Wed, Dec 2');
    expect(dayLabel('2026-12-02', true)).toBe('Wednesday, Dec 2');
    setDateOrder('day-month');
    expect(dayLabel('2026-12-02')).toBe('Wed 2 Dec');
    expect(dayLabel('2026-12-02', true)).toBe('Wednesday 2 Dec');
    expect(momentLabel('2026-12-02T12:13:43Z')).toMatch(/^Wed 2 Dec, /);
  });

  it("reads a new workspace's order from the device's locale (CLDR through ECMA-402: Dec 7 in en-US and ja-JP, 7 Dec in en-GB and de-DE)", () => {
    expect(deviceDateOrder('en-US')).toBe('month-day');
    expect(deviceDateOrder('ja-JP')).toBe('month-day');
    expect(deviceDateOrder('en-GB')).toBe('day-month');
    expect(deviceDateOrder('de-DE')).toBe('day-month');
  });
});
