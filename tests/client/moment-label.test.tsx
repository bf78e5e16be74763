import { describe, expect, it } from 'vitest';
import { momentLabel } from '@/lib/dates';

describe('a moment as pages write it', () => {
  it('gives the day and the time to the minute, never seconds nor an ISO stamp', () => {
    // Noon UTC on 2 December 2026: still 2 December in every time zone from UTC−11 to UTC+11.
    const text = momentLabel('2026-12-02T12:13:43Z');
    expect(text).toMatch(/Dec/);
    expect(text).toMatch(/\b2\b/);
    expect(text).toMatch(/:13/);
    expect(text).not.toMatch(/:43|2026-12-02|T12/);
  });
});
