import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import { day, plate, showMyPlates } from './my-plates-fixtures';

// A client with allergens on their list, on a day whose plate holds one: invented plates and numbers.
const week = (today: ReturnType<typeof plate>) => ({
  weekId: 7, name: 'Week of Mon 12 Jan', publishedVersion: 1, publishedAt: '2026-01-10T18:00:00Z', startDate: '2026-01-12', endDate: '2026-01-18',
  days: [day('2026-01-12', today)], next: null, cautions: [],
});
// Monday 12 January 2026, morning.
const show = (body: unknown) => showMyPlates(body, new Date(2026, 0, 12, 7));

describe("a plate holding an allergen on the client's own list", () => {
  it('says so beside the plate, with what to do when it was not agreed', async () => {
    show(week(plate('Spinach-feta wrap', { allergens: ['milk', 'egg', 'wheat'], allowedAllergens: ['milk', 'wheat'], onYourList: ['milk', 'wheat'] })));
    await screen.findByRole('heading', { level: 2, name: 'Spinach-feta wrap' });
    expect(screen.getByText('Contains: Milk, Egg, Wheat')).toBeTruthy();
    const note = screen.getAllByRole('note').find((n) => n.textContent?.includes('on your allergen list'));
    expect(note?.textContent).toContain('Milk and wheat are on your allergen list');
    expect(note?.textContent).toContain('If you have not agreed it with your coach, do not eat it: ask them first.');
    expect(screen.queryByRole('alert')).toBeNull();
    // The week at a glance marks the day too.
    expect(screen.getByRole('button', { name: /allergen on your list/ }).textContent).toContain('Spinach-feta wrap');
  });

  it('put on their list after the week was published: an alert not to eat it before asking', async () => {
    show(week(plate('Spinach-feta wrap', { allergens: ['milk', 'egg'], allowedAllergens: [], onYourList: ['egg'] })));
    await screen.findByRole('heading', { level: 2, name: 'Spinach-feta wrap' });
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toContain('Egg is on your allergen list, and this plate has it');
    expect(alert.textContent).toContain('Do not eat it: ask your coach first.');
  });

  it('says nothing more of a plate without one', async () => {
    show(week(plate('Egg slab', { allergens: ['egg'], allowedAllergens: [], onYourList: [] })));
    await screen.findByRole('heading', { level: 2, name: 'Egg slab' });
    expect(screen.queryByText(/on your allergen list/)).toBeNull();
    expect(screen.queryByText(/allergen on your list/)).toBeNull();
  });

  it('a plan published before the allowed ones were kept: only to check', async () => {
    show(week(plate('Egg slab', { allergens: ['egg'], onYourList: ['egg'] })));
    await screen.findByRole('heading', { level: 2, name: 'Egg slab' });
    const note = screen.getAllByRole('note').find((n) => n.textContent?.includes('on your allergen list'));
    expect(note?.textContent).toBe('⚠Egg is on your allergen listIf you have not agreed it with your coach, do not eat it: ask them first.');
  });
});

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
});
