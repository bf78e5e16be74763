import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as PlatesPage } from '@/app/routes/plates/plates.route';
import { jsonResponse, renderAtRoute, staleResponse } from './render';

// Two invented plates, as GET /api/assemblies lists them (only the fields the page reads).
const plate = (overrides: Record<string, unknown> = {}) => ({
  id: 5,
  name: 'Egg slab plate',
  description: '',
  trays: [{ trayId: 3, trayName: 'Egg slab', portions: 1 }],
  addOns: [],
  assemblySteps: [],
  reheatSteps: [],
  macros: { kcal: 300, netCarbsG: 3, proteinG: 20, fatG: 22 },
  allergens: [],
  complete: true,
  archived: false,
  version: 1,
  ...overrides,
});
const other = plate({ id: 6, name: 'Bacon cup plate', version: 4 });

afterEach(() => vi.unstubAllGlobals());

/**
 * The API as the plates page sees it: the list (plate 5 as `state.current`), saves and archives with versions and
 * 409s; `state.slowList` holds the list's answers back until released (a refresh over a real network).
 */
function serve() {
  const state = { current: plate(), hold: null as Promise<void> | null };
  const writes: { url: string; body: Record<string, unknown> }[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      if (init?.method === 'PUT') {
        const body = JSON.parse(String(init.body)) as Record<string, unknown>;
        writes.push({ url, body });
        const id = Number(url.split('/')[3]);
        if (id !== 5) return jsonResponse({ ...other, ...body, version: other.version + 1 });
        if (body.version !== state.current.version) return staleResponse(state.current);
        const changed = url.endsWith('/archived') ? { archived: body.archived } : { name: body.name };
        state.current = plate({ ...state.current, ...changed, version: state.current.version + 1 });
        return jsonResponse(state.current);
      }
      if (url.startsWith('/api/assemblies/preview')) {
        return jsonResponse({ macros: { kcal: 0, fatG: 0, proteinG: 0, carbsG: 0, fiberG: 0, netCarbsG: 0 }, allergens: [], complete: true, addOnGrams: [] });
      }
      if (url.startsWith('/api/assemblies')) {
        if (state.hold) await state.hold;
        return jsonResponse([state.current, other]);
      }
      if (url.includes('/trays')) return jsonResponse([{ id: 3, name: 'Egg slab' }]);
      return jsonResponse([]);
    }),
  );
  return { state, writes };
}

const nameField = () => screen.getByLabelText('Plate name') as HTMLInputElement;

describe('the plate editor and versions saved meanwhile', () => {
  it('follows a newer version at once when nothing is typed', async () => {
    const { state } = serve();
    const { qc } = renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Edit Egg slab plate' }));
    await screen.findByLabelText('Plate name');
    state.current = plate({ name: 'Egg slab plate (theirs)', version: 2 });
    await qc.invalidateQueries();
    await waitFor(() => expect(nameField().value).toBe('Egg slab plate (theirs)'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
  });

  it('keeps the typing when a newer version arrives, says so, and never saves over theirs unasked', async () => {
    const { state, writes } = serve();
    const { qc } = renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Edit Egg slab plate' }));
    fireEvent.change(await screen.findByLabelText('Plate name'), { target: { value: 'Mine' } });
    state.current = plate({ name: 'Theirs', version: 2 });
    await qc.invalidateQueries();
    expect(await screen.findByText('Someone else saved this plate (version 2) since you started typing')).toBeTruthy();
    expect(nameField().value).toBe('Mine');
    fireEvent.click(screen.getByRole('button', { name: 'Save plate' }));
    expect(await screen.findByText('Someone else saved this plate while you were editing')).toBeTruthy();
    expect(writes.map((w) => [w.body.name, w.body.version])).toEqual([['Mine', 1]]);
    fireEvent.click(screen.getByRole('button', { name: 'Reload their version' }));
    await waitFor(() => expect(nameField().value).toBe('Theirs'));
  });

  it('counts typing in the steps as typing', async () => {
    const { state } = serve();
    const { qc } = renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Edit Egg slab plate' }));
    const steps = await screen.findByLabelText(/Assembly steps/);
    fireEvent.change(steps, { target: { value: 'Warm the slab; add the greens.' } });
    state.current = plate({ name: 'Theirs', version: 2 });
    await qc.invalidateQueries();
    expect(await screen.findByText('Someone else saved this plate (version 2) since you started typing')).toBeTruthy();
    expect((screen.getByLabelText(/Assembly steps/) as HTMLTextAreaElement).value).toBe('Warm the slab; add the greens.');
  });

  it('opens the plate whose Edit was pressed, even with another plate’s editor open', async () => {
    const { writes } = serve();
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Edit Egg slab plate' }));
    await screen.findByRole('heading', { name: 'Edit Egg slab plate' });
    fireEvent.click(screen.getByRole('button', { name: 'Edit Bacon cup plate' }));
    // Before, the first plate's editor stayed: its values would have been saved onto it, not the one chosen.
    await screen.findByRole('heading', { name: 'Edit Bacon cup plate' });
    expect(nameField().value).toBe('Bacon cup plate');
    fireEvent.click(screen.getByRole('button', { name: 'Save plate' }));
    await waitFor(() => expect(writes).toHaveLength(1));
    expect([writes[0].url, writes[0].body.name, writes[0].body.version]).toEqual(['/api/assemblies/6', 'Bacon cup plate', 4]);
  });

  it('keeps the typing through the coach’s own archive, with no word of anyone else, and saves on the new version', async () => {
    const { state, writes } = serve();
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Edit Egg slab plate' }));
    fireEvent.change(await screen.findByLabelText('Plate name'), { target: { value: 'Mine' } });
    let release = () => {};
    state.hold = new Promise<void>((r) => (release = r));
    fireEvent.click(screen.getByRole('button', { name: 'Archive Egg slab plate' }));
    await waitFor(() => expect(writes).toHaveLength(1));
    // The list's refresh is under way: the editor has not heard of version 2 from anyone else.
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    release();
    state.hold = null;
    await screen.findByText(/Archived “Egg slab plate”/);
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    expect(nameField().value).toBe('Mine');
    fireEvent.click(screen.getByRole('button', { name: 'Save plate' }));
    await waitFor(() => expect(writes).toHaveLength(2));
    expect(writes.map((w) => [w.url, w.body.name ?? w.body.archived, w.body.version])).toEqual([
      ['/api/assemblies/5/archived', true, 1],
      ['/api/assemblies/5', 'Mine', 2],
    ]);
    await waitFor(() => expect(screen.queryByLabelText('Plate name')).toBeNull());
  });

  it('asks before typing in one plate is dropped for another plate or by Close; a save closes without asking', async () => {
    const confirm = vi.fn(() => false);
    vi.stubGlobal('confirm', confirm);
    const { writes } = serve();
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Edit Egg slab plate' }));
    fireEvent.change(await screen.findByLabelText('Plate name'), { target: { value: 'Mine' } });
    await waitFor(() => expect(screen.getByRole('button', { name: 'Save plate' })).toBeTruthy());
    fireEvent.click(screen.getByRole('button', { name: 'Edit Bacon cup plate' }));
    expect(confirm).toHaveBeenLastCalledWith('Drop what you typed in “Egg slab plate”? It is not saved.');
    expect(nameField().value).toBe('Mine');
    fireEvent.click(screen.getByRole('button', { name: 'Close' }));
    expect(confirm).toHaveBeenCalledTimes(2);
    expect(nameField().value).toBe('Mine');
    fireEvent.click(screen.getByRole('button', { name: 'Save plate' }));
    await waitFor(() => expect(screen.queryByLabelText('Plate name')).toBeNull());
    expect(writes).toHaveLength(1);
    expect(confirm).toHaveBeenCalledTimes(2);
    // With nothing typed, Edit on another plate just opens it.
    fireEvent.click(screen.getByRole('button', { name: 'Edit Bacon cup plate' }));
    await screen.findByRole('heading', { name: 'Edit Bacon cup plate' });
    fireEvent.click(screen.getByRole('button', { name: 'Edit Mine' }));
    await screen.findByRole('heading', { name: 'Edit Mine' });
    expect(confirm).toHaveBeenCalledTimes(2);
  });
});
