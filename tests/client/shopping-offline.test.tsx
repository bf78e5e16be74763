import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { onlineManager } from '@tanstack/react-query';
import { Component as ShoppingPage } from '@/app/routes/shopping/shopping.route';
import { Component as ShoppingThisWeek } from '@/app/routes/shopping/shopping-this-week.route';
import { keptListName, pendingTicks } from '@/features/shopping/api/use-shopping-mutations';
import { forgetKept, keepAnswer, keepForKeptPerson, keptAnswer, keptNames } from '@/lib/device-copy';
import type { ShoppingListDto } from '@shared/schemas/shopping.schema';
import { jsonResponse, renderAtRoute, signedIn } from './render';
import { shoppingItem, shoppingList } from './shopping-fixtures';

// The shopping list in a store with no signal: kept on the phone, ticked there, sent once back online (invented list).
const assistant = signedIn({ id: 5, role: 'assistant', email: 'sam@example.test', name: 'Sam' });
const list = () => shoppingList([shoppingItem(1), shoppingItem(2)]);
const keptList = () => keptAnswer<ShoppingListDto>(keptListName(7, null), assistant);
const puts = (fetch: ReturnType<typeof vi.fn>) =>
  fetch.mock.calls.filter(([, init]) => (init as RequestInit | undefined)?.method === 'PUT').map(([u, init]) => [String(u), JSON.parse(String((init as RequestInit).body))]);

/** A server that answers the list, and each tick with its mark (or `refuse` it). */
function server({ refuse = false } = {}) {
  return vi.fn(async (url: string, init?: RequestInit) => {
    if (init?.method === 'PUT') {
      if (refuse) return jsonResponse({ title: 'This list was marked bought', status: 409 }, 409);
      const id = Number(url.split('/').pop());
      return jsonResponse({ ingredientId: id, ...JSON.parse(String(init.body)), checkedBy: 'Sam', checkedAt: '2026-01-07T10:00:00Z' });
    }
    return jsonResponse(list());
  });
}

const open = () => renderAtRoute(<ShoppingPage />, '/weeks/:weekId/shopping', '/weeks/7/shopping', assistant);

afterEach(() => forgetKept());

describe('the shopping list without a network', () => {
  it('is kept on the device; offline it opens from there, says so, offers no files; ticks wait, are kept, and go once online', async () => {
    vi.stubGlobal('fetch', server());
    const first = open();
    expect(await screen.findByText('0 of 2 checked', { exact: false })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'CSV' })).toBeTruthy();
    await waitFor(() => expect(keptList()?.data.itemCount).toBe(2));
    first.unmount();

    onlineManager.setOnline(false);
    const fetch = server();
    vi.stubGlobal('fetch', fetch);
    open();
    expect(await screen.findByText('Your list as saved on this device')).toBeTruthy();
    expect(screen.getByText(/Ticks are kept on this device and sent once you are back online/)).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'CSV' })).toBeNull();
    expect(screen.queryByRole('link', { name: 'PDF' })).toBeNull();
    fireEvent.click(screen.getByRole('checkbox', { name: /Item 1/ }));
    expect(await screen.findByText('1 of 2 checked', { exact: false })).toBeTruthy();
    expect(pendingTicks(7, null)).toEqual([{ ingredientId: 1, checked: true }]);
    expect(puts(fetch)).toEqual([]);
    // The tick is in the kept copy too: the page closed now opens with it.
    await waitFor(() => expect(keptList()?.data.checkedCount).toBe(1));

    act(() => onlineManager.setOnline(true));
    await waitFor(() => expect(puts(fetch)).toEqual([['/api/weeks/7/shopping/checks/1', { checked: true }]]));
    await waitFor(() => expect(pendingTicks(7, null)).toEqual([]));
    await waitFor(() => expect(screen.queryByText('Your list as saved on this device')).toBeNull());
  });

  it('sends a tick left unsent when the page was closed offline, once the list opens again', async () => {
    keepAnswer(keptListName(7, null), assistant, list());
    keepForKeptPerson('shopping-ticks:7:week', { 2: true });
    const fetch = server();
    vi.stubGlobal('fetch', fetch);
    open();
    await waitFor(() => expect(puts(fetch)).toEqual([['/api/weeks/7/shopping/checks/2', { checked: true }]]));
    await waitFor(() => expect(pendingTicks(7, null)).toEqual([]));
  });

  it('lets go of a tick the server refuses (rolled back), rather than sending it again and again', async () => {
    keepAnswer(keptListName(7, null), assistant, list());
    keepForKeptPerson('shopping-ticks:7:week', { 2: true });
    vi.stubGlobal('fetch', server({ refuse: true }));
    open();
    await waitFor(() => expect(pendingTicks(7, null)).toEqual([]));
    expect(await screen.findByText('0 of 2 checked', { exact: false })).toBeTruthy();
  });

  it('rolls back a tick that fails on the way (the server out of reach) and keeps nothing to send later', async () => {
    let reachable = true;
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        if (init?.method === 'PUT' && !reachable) throw new TypeError('Failed to fetch');
        return jsonResponse(list());
      }),
    );
    open();
    expect(await screen.findByText('0 of 2 checked', { exact: false })).toBeTruthy();
    reachable = false;
    fireEvent.click(screen.getByRole('checkbox', { name: /Item 1/ }));
    await waitFor(() => expect((screen.getByRole('checkbox', { name: /Item 1/ }) as HTMLInputElement).checked).toBe(false));
    expect(pendingTicks(7, null)).toEqual([]);
  });

  it('shows the kept list with "Try again" when the server cannot be reached', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 7, 9), toFake: ['Date'] });
    keepAnswer(keptListName(7, null), assistant, list(), new Date(2026, 0, 6, 18, 30).getTime());
    let reachable = false;
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        if (!reachable) throw new TypeError('Failed to fetch');
        return jsonResponse(shoppingList([shoppingItem(1), shoppingItem(2), shoppingItem(3)]));
      }),
    );
    open();
    expect(await screen.findByText('Trayline cannot be reached: this is your list as saved on this device')).toBeTruthy();
    expect(screen.getByText(/^Saved Tue, Jan 6, 18:30\./)).toBeTruthy();
    reachable = true;
    fireEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('0 of 3 checked', { exact: false })).toBeTruthy();
    expect(screen.queryByText(/as saved on this device/)).toBeNull();
  });

  it('keeps the list on screen when reading it again fails, and says so', async () => {
    let reachable = true;
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => {
        if (!reachable) throw new TypeError('Failed to fetch');
        return jsonResponse(list());
      }),
    );
    const { qc } = open();
    expect(await screen.findByText('0 of 2 checked', { exact: false })).toBeTruthy();
    reachable = false;
    await act(() => qc.refetchQueries());
    expect(await screen.findByText('Could not read the list again')).toBeTruthy();
    expect(screen.getByRole('checkbox', { name: /Item 1/ })).toBeTruthy();
  });

  it("keeps one week's lists: another week's are let go", async () => {
    keepAnswer(keptListName(3, null), assistant, { ...list(), weekId: 3 });
    keepAnswer(keptListName(7, '2026-01-08'), assistant, list());
    vi.stubGlobal('fetch', server());
    open();
    await waitFor(() => expect(keptNames('shopping:').sort()).toEqual(['shopping:7:2026-01-08', 'shopping:7:week']));
  });

  it('"Shopping list" in the menu offers the list kept on the device while offline', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 7, 9), toFake: ['Date'] });
    keepAnswer(keptListName(7, '2026-01-08'), assistant, list(), new Date(2026, 0, 6, 18, 30).getTime());
    onlineManager.setOnline(false);
    vi.stubGlobal('fetch', server());
    renderAtRoute(<ShoppingThisWeek />, '/shopping', '/shopping', assistant);
    expect(await screen.findByRole('heading', { name: 'You are offline' })).toBeTruthy();
    expect(screen.getByRole('link', { name: /^Open the shopping list saved Tue, Jan 6, 18:30$/ }).getAttribute('href')).toBe('/weeks/7/shopping?for=2026-01-08');
  });
});
