import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import { Component as MyPlates } from '@/app/routes/my/my-plates.route';
import { jsonResponse, queryClientFor, renderInApp, signedIn } from './render';

// A client with milk on their allergen list, on a day whose plate the coach allowed with milk: invented plates and numbers.
const client = signedIn({ role: 'client', clientId: 3, email: 'dana@example.test', name: 'Dana' });
const macros = { kcal: 420, fatG: 33, proteinG: 24, carbsG: 6, fiberG: 2, netCarbsG: 4 };
const plate = (name: string, over: Record<string, unknown> = {}) => ({
  slot: 'breakfast', name, description: '', macros, allergens: [], trays: [], addOns: [], assemblySteps: [], reheatSteps: [],
  eatBy: '2026-01-14', storage: 'fridge', thawOn: null, prepDate: '2026-01-11', ...over,
});
const week = (today: ReturnType<typeof plate>) => ({
  weekId: 7, name: 'Week of Mon 12 Jan', publishedVersion: 1, publishedAt: '2026-01-10T18:00:00Z', startDate: '2026-01-12', endDate: '2026-01-18',
  days: [{ date: '2026-01-12', plates: [today], totals: macros }], next: null, cautions: [],
});

function show(body: unknown) {
  // Monday 12 January 2026, morning.
  vi.useFakeTimers({ now: new Date(2026, 0, 12, 7), toFake: ['Date'] });
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(body)));
  renderInApp(<MyPlates />, queryClientFor(client));
}

describe("a plate holding an allergen on the client's own list", () => {
  it('says so beside the plate, with what to do when it was not agreed', async () => {
    show(week(plate('Spinach-feta wrap', { allergens: ['milk', 'egg', 'wheat'], allowedAllergens: ['milk', 'wheat'], onYourList: ['milk', 'wheat'] })));
    await screen.findByRole('heading', { level: 2, name: 'Spinach-feta wrap' });
    expect(screen.getByText('Contains: Milk, Egg, Wheat')).toBeTruthy();
    const note = screen.getAllByRole('note').find((n) => n.textContent?.includes('on your allergen list'));
    expect(note?.textContent).toContain('Milk and wheat are on your allergen list');
    expect(note?.textContent).toContain('If you have not agreed it with your coach, do not eat it: ask them first.');
    expect(screen.queryByRole('alert')).toBeNull();
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
