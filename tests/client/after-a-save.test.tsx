import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { Component as PlatesPage } from '@/app/routes/plates/plates.route';
import { useRecipePreview, useUpdateTray } from '@/features/trays/api/use-tray-mutations';
import { meQuery } from '@/features/auth/api/auth.queries';
import { createQueryClient } from '@/lib/query-client';
import { jsonResponse, signedIn } from './render';

// One invented plate made from tray 2, as GET /api/assemblies lists it (only the fields the list reads).
const plate = (kcal: number) => ({
  id: 5, name: 'Egg slab plate', description: '', trays: [], addOns: [], assemblySteps: [], reheatSteps: [],
  macros: { kcal, netCarbsG: 3, proteinG: 20, fatG: 22 }, allergens: [], archived: false, version: 1,
});

/** The tray page's part that matters here: a Save of tray 2, and a live calculation that stores nothing. */
function TrayActions() {
  const save = useUpdateTray(2);
  const preview = useRecipePreview();
  return (
    <>
      <button onClick={() => save.mutate({ version: 3 } as never)}>Save the tray</button>
      <button onClick={() => preview.mutate({ items: [], portions: 1 } as never)}>Work out the numbers</button>
      {save.isSuccess && <p>Tray saved</p>}
      {preview.isSuccess && <p>Numbers worked out</p>}
    </>
  );
}

afterEach(() => vi.unstubAllGlobals());

describe('pages read again after a save elsewhere (the app’s query client)', () => {
  it('shows a plate’s new numbers after its tray is saved, at once rather than after the reads’ 30 s', async () => {
    let kcal = 300;
    const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
      if (init?.method === 'PUT') {
        kcal = 400; // more cream cheese in the tray: the plate made from it is richer
        return jsonResponse({ id: 2, version: 4 });
      }
      if (init?.method === 'POST') return jsonResponse({ total: {}, perPortion: {} });
      return jsonResponse(url.startsWith('/api/assemblies') ? [plate(kcal)] : []);
    });
    vi.stubGlobal('fetch', fetchMock);
    const qc = createQueryClient();
    qc.setDefaultOptions({ ...qc.getDefaultOptions(), queries: { ...qc.getDefaultOptions().queries, retry: false } });
    qc.setQueryData(meQuery().queryKey, signedIn());
    const router = createMemoryRouter(
      [
        { path: '/plates', element: <PlatesPage /> },
        { path: '/trays/2', element: <TrayActions /> },
      ].map((r) => ({ ...r, element: <QueryClientProvider client={qc}>{r.element}</QueryClientProvider> })),
      { initialEntries: ['/plates'] },
    );
    render(<RouterProvider router={router} />);
    await screen.findByText(/300 kcal/);
    const listReads = () => fetchMock.mock.calls.filter(([url, init]) => url.startsWith('/api/assemblies') && (init?.method ?? 'GET') === 'GET').length;
    expect(listReads()).toBe(1);

    // A calculation stores nothing: back on the plates page within the 30 s, the list is not read again.
    await act(() => router.navigate('/trays/2'));
    fireEvent.click(screen.getByRole('button', { name: 'Work out the numbers' }));
    await screen.findByText('Numbers worked out');
    await act(() => router.navigate('/plates'));
    await screen.findByText(/300 kcal/);
    expect(listReads()).toBe(1);

    // The tray saved: the plates page, opened again at once, reads its list again and shows the new numbers.
    await act(() => router.navigate('/trays/2'));
    fireEvent.click(screen.getByRole('button', { name: 'Save the tray' }));
    await screen.findByText('Tray saved');
    await act(() => router.navigate('/plates'));
    expect(await screen.findByText(/400 kcal/)).toBeTruthy();
    expect(listReads()).toBe(2);
  });
});
