import { describe, expect, it } from 'vitest';
import { boardsShareADay, firstFreeMonday, nextMonday } from '@shared/domain/week-days';

// The weekday of a date read independently of the project's date code: ECMAScript's Intl.DateTimeFormat (ECMA-402).
const weekday = (iso: string) => new Intl.DateTimeFormat('en-US', { weekday: 'long', timeZone: 'UTC' }).format(new Date(`${iso}T12:00:00Z`));

describe('the Monday a new board starts on', () => {
  it('is the Monday after today, for every day of two weeks (ECMA-402 weekday names as the reference)', () => {
    // 2026-11-30 … 2026-12-13: Monday to Sunday, twice.
    for (let d = 30; d < 44; d++) {
      const today = d <= 30 ? `2026-11-${d}` : `2026-12-${String(d - 30).padStart(2, '0')}`;
      const monday = nextMonday(today);
      expect(weekday(monday), `${today} → ${monday}`).toBe('Monday');
      const gap = (Date.parse(monday) - Date.parse(today)) / 86_400_000;
      expect(gap, `${today} → ${monday}`).toBeGreaterThanOrEqual(1);
      expect(gap).toBeLessThanOrEqual(7);
    }
    expect(weekday('2026-12-03')).toBe('Thursday');
    expect(nextMonday('2026-12-03')).toBe('2026-12-07');
    expect(nextMonday('2026-12-07')).toBe('2026-12-14'); // today a Monday: next week's
    expect(nextMonday('2026-12-27')).toBe('2026-12-28'); // across a year end
  });

  it('skips weeks a board plans already (a day is on one board only), wherever they start', () => {
    expect(firstFreeMonday('2026-12-03', [])).toBe('2026-12-07');
    expect(firstFreeMonday('2026-12-03', [{ startDate: '2026-11-30' }])).toBe('2026-12-07'); // this week's board ends Sunday
    expect(firstFreeMonday('2026-12-03', [{ startDate: '2026-12-07' }, { startDate: '2026-12-14' }])).toBe('2026-12-21');
    // A board starting on a Wednesday covers Wed … Tue: the Monday of its second week is taken, the next is free.
    expect(firstFreeMonday('2026-12-03', [{ startDate: '2026-12-09' }])).toBe('2026-12-21');
    expect(firstFreeMonday('2026-12-03', [{ startDate: '2026-12-01' }])).toBe('2026-12-14');
  });

  it('two boards share a day when their first days are under seven days apart', () => {
    expect(boardsShareADay('2026-12-07', '2026-12-13')).toBe(true);
    expect(boardsShareADay('2026-12-07', '2026-12-14')).toBe(false);
    expect(boardsShareADay('2026-12-14', '2026-12-08')).toBe(true);
    expect(boardsShareADay('2026-12-14', '2026-12-07')).toBe(false);
  });
});
