import { describe, expect, it } from 'vitest';
import { boardsShareADay, clearStart, firstFreeMonday, kitchenWeek, nextMonday, pickWeek, weekAfter } from '@shared/domain/week-days';

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

  it('a refused start is pointed to the nearest clear one, past weeks right behind or before the clash', () => {
    const weeks = [{ startDate: '2026-12-07' }, { startDate: '2026-12-14' }, { startDate: '2026-11-30' }];
    expect(clearStart(weeks, { startDate: '2026-12-07' }, 'later')).toBe('2026-12-21');
    expect(clearStart(weeks, { startDate: '2026-12-07' }, 'earlier')).toBe('2026-11-23');
    expect(clearStart([{ startDate: '2026-12-07' }], { startDate: '2026-12-07' }, 'later')).toBe('2026-12-14');
    // A board starting on a Thursday blocks until the Wednesday after: the next clear start is that Thursday.
    expect(clearStart([{ startDate: '2026-12-07' }, { startDate: '2026-12-17' }], { startDate: '2026-12-07' }, 'later')).toBe('2026-12-24');
  });

  it('two boards share a day when their first days are under seven days apart', () => {
    expect(boardsShareADay('2026-12-07', '2026-12-13')).toBe(true);
    expect(boardsShareADay('2026-12-07', '2026-12-14')).toBe(false);
    expect(boardsShareADay('2026-12-14', '2026-12-08')).toBe(true);
    expect(boardsShareADay('2026-12-14', '2026-12-07')).toBe(false);
  });
});

describe('which week a page is about', () => {
  // Invented weeks: this one (Mon 30 Nov, prep Sun 29 Nov and Wed 2 Dec) and the next (Mon 7 Dec, prep Sat 5 Dec).
  const thisWeek = { id: 1, startDate: '2026-11-30', prepDate: '2026-11-29', secondPrepDate: '2026-12-02' };
  const nextWeek = { id: 2, startDate: '2026-12-07', prepDate: '2026-12-05', secondPrepDate: null };
  const ids = (w: { id: number } | null) => w?.id ?? null;

  it("the coach's and the client's: the week covering today, else the next to start, else the latest", () => {
    expect(ids(pickWeek([nextWeek, thisWeek], '2026-12-03'))).toBe(1);
    expect(ids(pickWeek([nextWeek, thisWeek], '2026-12-06'))).toBe(1); // Sunday: the last day of this board
    expect(ids(pickWeek([nextWeek, thisWeek], '2026-12-07'))).toBe(2);
    expect(ids(pickWeek([nextWeek, thisWeek], '2026-11-20'))).toBe(1); // before both: the next to start
    expect(ids(pickWeek([nextWeek, thisWeek], '2027-01-20'))).toBe(2); // after both: the latest
    expect(pickWeek([], '2026-12-03')).toBeNull();
  });

  it('the week after one: the first to start after it, whatever the order given', () => {
    const later = { id: 3, startDate: '2026-12-21', prepDate: '2026-12-20', secondPrepDate: null };
    expect(ids(weekAfter([later, nextWeek, thisWeek], thisWeek))).toBe(2);
    expect(ids(weekAfter([later, nextWeek, thisWeek], nextWeek))).toBe(3);
    expect(weekAfter([later, nextWeek, thisWeek], later)).toBeNull();
  });

  it("the kitchen's: the week of the next prep day, today included, whichever board it is on", () => {
    expect(ids(kitchenWeek([nextWeek, thisWeek], '2026-11-29'))).toBe(1); // prep day today
    expect(ids(kitchenWeek([nextWeek, thisWeek], '2026-11-30'))).toBe(1); // Wednesday's prep is next
    expect(ids(kitchenWeek([nextWeek, thisWeek], '2026-12-02'))).toBe(1);
    expect(ids(kitchenWeek([nextWeek, thisWeek], '2026-12-03'))).toBe(2); // Thursday: next week's Saturday
    expect(ids(kitchenWeek([thisWeek], '2026-12-03'))).toBe(1); // nothing ahead: the week covering today
    expect(ids(kitchenWeek([nextWeek, thisWeek], '2026-12-08'))).toBe(2);
    expect(kitchenWeek([], '2026-12-03')).toBeNull();
  });
});
