import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, screen, waitFor } from '@testing-library/react';
import { Component as IngredientsPage } from '@/app/routes/ingredients/ingredients.route';
import { jsonResponse, renderAtRoute } from './render';

afterEach(() => vi.unstubAllGlobals());

describe('the ingredient search box', () => {
  it('shows the search of the address it is opened at, and follows a new address (the menu link, Back)', async () => {
    const fetchMock = vi.fn(async (_url: string) => jsonResponse({ items: [], total: 0, page: 1, pageSize: 25, netCarbRule: 'half-other-polyols' }));
    vi.stubGlobal('fetch', fetchMock);
    const { router } = renderAtRoute(<IngredientsPage />, '/ingredients', '/ingredients?q=egg');
    const box = (await screen.findByLabelText('Search by name')) as HTMLInputElement;
    expect(box.value).toBe('egg');
    // The menu's "Ingredients" link from the same page: the list shows everything, so the box must not say "egg".
    await act(() => router.navigate('/ingredients'));
    await waitFor(() => expect((screen.getByLabelText('Search by name') as HTMLInputElement).value).toBe(''));
    await act(() => router.navigate(-1));
    await waitFor(() => expect((screen.getByLabelText('Search by name') as HTMLInputElement).value).toBe('egg'));
    expect(fetchMock.mock.calls.map(([url]) => url)).toContain('/api/ingredients?q=egg&scope=all&page=1&pageSize=25&sort=name');
  });
});
