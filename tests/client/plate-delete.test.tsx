import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as PlatesPage } from '@/app/routes/plates/plates.route';
import { jsonResponse, renderAtRoute } from './render';

// One invented plate, as GET /api/assemblies lists it (only the fields the list reads).
const plate = {
  id: 5,
  name: 'Egg slab plate',
  description: '',
  trays: [],
  addOns: [],
  assemblySteps: [],
  reheatSteps: [],
  macros: { kcal: 300, netCarbsG: 3, proteinG: 20, fatG: 22 },
  allergens: [],
  archived: false,
  version: 1,
};

afterEach(() => vi.unstubAllGlobals());

/** The API as the page sees it: the list (after a change, the changed plate), a DELETE's and a PUT's answers. */
function stubApi(deleteAnswer: Response, plates: (typeof plate)[] = [plate]) {
  const calls: string[] = [];
  let list = plates;
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      calls.push(`${init?.method ?? 'GET'} ${url}${init?.body ? ` ${String(init.body)}` : ''}`);
      if (init?.method === 'DELETE') return deleteAnswer;
      if (init?.method === 'PUT' && url.endsWith('/archived')) {
        const body = JSON.parse(String(init.body)) as { archived: boolean; version: number };
        const id = Number(url.split('/').at(-2));
        list = list.map((p) => (p.id === id ? { ...p, archived: body.archived, version: p.version + 1 } : p));
        return jsonResponse(list.find((p) => p.id === id));
      }
      if (url.includes('/assemblies')) return jsonResponse(list);
      return jsonResponse([]);
    }),
  );
  return calls;
}

describe('deleting a plate', () => {
  it('asks first: saying no sends nothing', async () => {
    const calls = stubApi(new Response(null, { status: 204 }));
    const confirm = vi.fn(() => false);
    vi.stubGlobal('confirm', confirm);
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Delete Egg slab plate' }));
    expect(confirm).toHaveBeenCalledWith(expect.stringContaining('Delete the plate "Egg slab plate"?'));
    expect(calls.filter((c) => c.startsWith('DELETE'))).toEqual([]);
  });

  it('a plate planned on a board is archived instead, and the page says where it is planned', async () => {
    const answer = { archived: true, plannedOn: '13 meals on the board of Demo week', plate: { ...plate, archived: true, version: 2 } };
    const calls = stubApi(jsonResponse(answer));
    vi.stubGlobal('confirm', vi.fn(() => true));
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Delete Egg slab plate' }));
    const status = await screen.findByRole('status');
    expect(status.textContent).toMatch(/^“Egg slab plate” is planned for 13 meals on the board of Demo week, so it was archived instead\. An archived plate leaves this list/);
    expect(calls).toContain('DELETE /api/assemblies/5');
  });
});

describe('archiving a plate', () => {
  const second = { ...plate, id: 6, name: 'Bacon cup plate' };

  it('moves it to "Archived plates", where Restore brings it back (with its version)', async () => {
    const calls = stubApi(new Response(null, { status: 204 }), [plate, second]);
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Archive Egg slab plate' }));
    await waitFor(() => expect(screen.getByRole('status').textContent).toMatch(/^Archived “Egg slab plate”\./));
    expect(calls).toContain('PUT /api/assemblies/5/archived {"archived":true,"version":1}');
    // The current list no longer shows it; the Show menu counts both.
    await waitFor(() => expect(screen.queryByRole('heading', { name: 'Egg slab plate' })).toBeNull());
    const showMenu = screen.getByLabelText('Show') as HTMLSelectElement;
    expect([...showMenu.options].map((o) => o.text)).toEqual(['Current plates (1)', 'Archived plates (1)']);
    fireEvent.change(showMenu, { target: { value: 'archived' } });
    expect(await screen.findByText('Archived')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Restore Egg slab plate' }));
    await waitFor(() => expect(calls).toContain('PUT /api/assemblies/5/archived {"archived":false,"version":2}'));
    await waitFor(() => expect(screen.getByRole('status').textContent).toBe('Restored “Egg slab plate”: it is back in the list and the board’s pickers.'));
  });
});
