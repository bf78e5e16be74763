import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as IngredientPage } from '@/app/routes/ingredients/ingredient.route';
import { jsonResponse, renderAtRoute, staleResponse, stubVersionedRecord } from './render';

// An invented workspace-own ingredient (a label typed by the coach), as GET /api/ingredients/:id answers it.
const own = (overrides: Record<string, unknown> = {}) => ({
  id: 501,
  slug: 'ws-1-house-pesto',
  name: 'House pesto',
  category: 'condiments',
  shared: false,
  editable: true,
  per100g: { kcal: 500, fatG: 50, satFatG: 8, proteinG: 6, carbsG: 6, fiberG: 2, sugarsG: 1, erythritolG: 0, alluloseG: 0, otherPolyolsG: 0, polyolsG: 0, netCarbsG: 4, sodiumMg: 600 },
  densityGPerMl: null,
  densitySource: null,
  pieceWeights: {},
  allergens: ['milk', 'tree-nuts'],
  purchase: null,
  priceCents: null,
  aisle: 'condiments',
  source: 'package label',
  provenance: 'package-label',
  fdcId: null,
  note: null,
  atwater: { storedKcal: 500, computedKcal: 498, deviation: 0.004, flagged: false, basis: 'relative' },
  netCarbRule: 'half-other-polyols',
  version: 2,
  updatedAt: '2026-11-01T08:00:00.000Z',
  ...overrides,
});

afterEach(() => vi.unstubAllGlobals());

describe('two people editing one ingredient', () => {
  it('keeps what was typed when someone else saved meanwhile; the form’s Save asks again, "Keep mine" saves over theirs', async () => {
    const theirs = own({ name: 'Pesto (theirs)', version: 3 });
    const puts: Record<string, unknown>[] = [];
    let current = own();
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        const method = init?.method ?? 'GET';
        if (method === 'PUT' || method === 'PATCH') {
          const body = JSON.parse(String(init!.body)) as Record<string, unknown>;
          puts.push(body);
          if (body.version !== 3) {
            current = theirs;
            return staleResponse(theirs);
          }
          current = own({ name: body.name, version: 4 });
        }
        return jsonResponse(current);
      }),
    );
    renderAtRoute(<IngredientPage />, '/ingredients/:ingredientId', '/ingredients/501');
    const name = (await screen.findByLabelText('Name')) as HTMLInputElement;
    fireEvent.change(name, { target: { value: 'Pesto (mine)' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('Someone else saved this ingredient while you were editing')).toBeTruthy();
    await screen.findByRole('heading', { name: 'Pesto (theirs)' });
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Pesto (mine)');
    // The form's own Save still sends the version it started from: refused again, nothing overwritten.
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(puts).toHaveLength(2));
    fireEvent.click(await screen.findByRole('button', { name: 'Keep mine and save again' }));
    await screen.findByRole('heading', { name: 'Pesto (mine)' });
    expect(puts.map((p) => [p.name, p.version])).toEqual([
      ['Pesto (mine)', 2],
      ['Pesto (mine)', 2],
      ['Pesto (mine)', 3],
    ]);
    await waitFor(() => expect(screen.queryByText('Someone else saved this ingredient while you were editing')).toBeNull());
  });

  it('loads their version when asked', async () => {
    const theirs = own({ name: 'Pesto (theirs)', version: 3 });
    let current = own();
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        if (init?.method === 'PUT' || init?.method === 'PATCH') {
          current = theirs;
          return staleResponse(theirs);
        }
        return jsonResponse(current);
      }),
    );
    renderAtRoute(<IngredientPage />, '/ingredients/:ingredientId', '/ingredients/501');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Pesto (mine)' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Reload their version' }));
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Pesto (theirs)'));
  });

  it('never saves over a version that arrived under the typing (a refetch on focus): the Save is refused and asks', async () => {
    const { state, writes } = stubVersionedRecord('/api/ingredients/501', own(), (_current, body) => own({ name: body.name }));
    const { qc } = renderAtRoute(<IngredientPage />, '/ingredients/:ingredientId', '/ingredients/501');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Pesto (mine)' } });
    state.current = own({ name: 'Pesto (theirs)', version: 3 });
    await qc.invalidateQueries();
    await screen.findByRole('heading', { name: 'Pesto (theirs)' });
    expect(screen.getByText('Someone else saved this ingredient (version 3) since you started typing')).toBeTruthy();
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Pesto (mine)');
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('Someone else saved this ingredient while you were editing')).toBeTruthy();
    // Sent from version 2, the one the typing started from; before, the refreshed 3 went and theirs was overwritten.
    expect(writes.map((p) => [p.name, p.version])).toEqual([['Pesto (mine)', 2]]);
  });

  it('follows a newer version at once when nothing is typed', async () => {
    const { state } = stubVersionedRecord('/api/ingredients/501', own(), (_current, body) => own({ name: body.name }));
    const { qc } = renderAtRoute(<IngredientPage />, '/ingredients/:ingredientId', '/ingredients/501');
    await screen.findByLabelText('Name');
    state.current = own({ name: 'Pesto (theirs)', version: 3 });
    await qc.invalidateQueries();
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Pesto (theirs)'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
  });

  it('opens a copy made from this page with the copy’s own values and version', async () => {
    const copy = own({ id: 502, slug: 'ws-1-house-pesto-copy', name: 'House pesto (copy)', version: 1 });
    const puts: [string, Record<string, unknown>][] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (at: string, init?: RequestInit) => {
        if (at === '/api/ingredients/501/copy') return jsonResponse(copy, 201);
        if (init?.method === 'PUT' || init?.method === 'PATCH') {
          const body = JSON.parse(String(init.body)) as Record<string, unknown>;
          puts.push([at, body]);
          return at === '/api/ingredients/502' && body.version === 1 ? jsonResponse({ ...copy, name: body.name, version: 2 }) : staleResponse(copy);
        }
        return jsonResponse(at === '/api/ingredients/502' ? copy : own());
      }),
    );
    renderAtRoute(<IngredientPage />, '/ingredients/:ingredientId', '/ingredients/501');
    await screen.findByLabelText('Name');
    fireEvent.click(screen.getByRole('button', { name: 'Copy to my library' }));
    // Before, the form kept the original's values (and version 2) under the copy's heading, and its Save was refused.
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('House pesto (copy)'));
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Pesto, basil-free' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await screen.findByRole('heading', { name: 'Pesto, basil-free' });
    expect(puts.map(([at, p]) => [at, p.name, p.version])).toEqual([['/api/ingredients/502', 'Pesto, basil-free', 1]]);
  });
});

describe('the price of a package, typed in dollars', () => {
  it('shows the stored cents as dollars, and saves what is typed ("4,25") as cents; a third decimal is refused on the field', async () => {
    const patches: Record<string, unknown>[] = [];
    let current = own({ priceCents: 399, purchase: { amount: 6.7, unit: 'oz', label: '6.7 oz jar' } });
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        if (init?.method === 'PATCH') {
          const body = JSON.parse(String(init.body)) as Record<string, unknown>;
          patches.push(body);
          current = own({ ...current, priceCents: body.priceCents, version: 3 });
        }
        return jsonResponse(current);
      }),
    );
    renderAtRoute(<IngredientPage />, '/ingredients/:ingredientId', '/ingredients/501');
    const price = (await screen.findByLabelText('Price per package ($)')) as HTMLInputElement;
    expect(price.value).toBe('3.99');

    fireEvent.change(price, { target: { value: '4.255' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('Give the price to the cent, e.g. 3.99')).toBeTruthy();
    expect(patches).toEqual([]);

    fireEvent.change(price, { target: { value: '4,25' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(patches).toHaveLength(1));
    expect(patches[0]).toMatchObject({ priceCents: 425, version: 2 });
  });
});
