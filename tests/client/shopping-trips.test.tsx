import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as ShoppingPage } from '@/app/routes/shopping/shopping.route';
import { shoppingItem, shoppingList } from './shopping-fixtures';
import { jsonResponse, renderAtRoute, signedIn } from './render';

// Week 7 with two invented prep days, Sun 4 Jan and Wed 7 Jan 2026.
const TRIPS = ['2026-01-04', '2026-01-07'];

const renderAt = (url: string) => renderAtRoute(<ShoppingPage />, '/weeks/:weekId/shopping', url, signedIn({ role: 'assistant' }));

afterEach(() => vi.unstubAllGlobals());

describe("a week's shopping trips", () => {
  it('opens the trip in the address, offers the others, and ticks items on that trip’s list', async () => {
    const calls: [string, RequestInit | undefined][] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        calls.push([url, init]);
        if (init?.method === 'PUT') return jsonResponse({ ingredientId: 1, checked: true, checkedBy: 'Kit', checkedAt: '2026-01-07T09:00:00.000Z' });
        const prepDate = new URL(url, 'http://x').searchParams.get('prepDate');
        return jsonResponse({ ...shoppingList([shoppingItem(1)]), prepDate, tripDates: TRIPS });
      }),
    );
    renderAt('/weeks/7/shopping?for=2026-01-07');
    expect(await screen.findByRole('heading', { name: /^Shopping list for prep .*7/ })).toBeTruthy();
    expect(calls[0][0]).toBe('/api/weeks/7/shopping?prepDate=2026-01-07');
    const nav = screen.getByRole('navigation', { name: 'Which list' });
    const links = Array.from(nav.querySelectorAll('a'));
    expect(links.map((a) => [a.textContent, a.getAttribute('aria-current')])).toEqual([
      ['Whole week', null],
      [expect.stringMatching(/^For prep .*4/), null],
      [expect.stringMatching(/^For prep .*7/), 'page'],
    ]);
    expect(screen.getByRole('link', { name: 'CSV' }).getAttribute('href')).toBe('/api/weeks/7/shopping.csv?prepDate=2026-01-07');

    fireEvent.click(screen.getByRole('checkbox'));
    await waitFor(() => expect(calls.some(([, init]) => init?.method === 'PUT')).toBe(true));
    const put = calls.find(([, init]) => init?.method === 'PUT')!;
    expect([put[0], put[1]?.body]).toEqual(['/api/weeks/7/shopping/checks/1', JSON.stringify({ checked: true, prepDate: '2026-01-07' })]);

    fireEvent.click(links[0]);
    await waitFor(() => expect(calls.some(([u]) => u === '/api/weeks/7/shopping')).toBe(true));
    expect(await screen.findByRole('heading', { name: 'Shopping list' })).toBeTruthy();
  });

  it('shows no trip choice for a week with one prep day', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(shoppingList([shoppingItem(1)]))));
    renderAt('/weeks/7/shopping');
    expect(await screen.findByRole('heading', { name: 'Shopping list' })).toBeTruthy();
    expect(screen.queryByRole('navigation', { name: 'Which list' })).toBeNull();
  });
});
