import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as PlatesPage } from '@/app/routes/plates/plates.route';
import { jsonResponse, renderAtRoute, staleResponse } from './render';

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

describe('two people editing one plate', () => {
  it('keeps what was typed when someone else saved meanwhile, and saves it over theirs only when asked', async () => {
    const mine = { ...plate, trays: [{ trayId: 3, trayName: 'Egg slab', portions: 1 }] };
    const theirs = { ...mine, name: 'Egg slab plate (theirs)', version: 2 };
    const puts: Record<string, unknown>[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        if (init?.method === 'PUT') {
          const body = JSON.parse(String(init.body)) as Record<string, unknown>;
          puts.push(body);
          if (body.version !== 2) return staleResponse(theirs);
          return jsonResponse({ ...theirs, name: body.name, version: 3 });
        }
        if (url.includes('/assemblies')) return jsonResponse([mine]);
        if (url.includes('/trays')) return jsonResponse([{ id: 3, name: 'Egg slab' }]);
        // The live preview of the plate's numbers.
        return jsonResponse({ macros: { kcal: 0, fatG: 0, proteinG: 0, carbsG: 0, fiberG: 0, netCarbsG: 0 }, allergens: [], complete: true, addOnGrams: [] });
      }),
    );
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Edit Egg slab plate' }));
    fireEvent.change(await screen.findByLabelText('Plate name'), { target: { value: 'Egg slab plate (mine)' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save plate' }));
    expect(await screen.findByText('Someone else saved this plate while you were editing')).toBeTruthy();
    expect((screen.getByLabelText('Plate name') as HTMLInputElement).value).toBe('Egg slab plate (mine)');
    fireEvent.click(screen.getByRole('button', { name: 'Keep mine and save again' }));
    await waitFor(() => expect(puts.map((p) => [p.name, p.version])).toEqual([
      ['Egg slab plate (mine)', 1],
      ['Egg slab plate (mine)', 2],
    ]));
    // Saved: the editor closes.
    await waitFor(() => expect(screen.queryByLabelText('Plate name')).toBeNull());
  });
});
