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
  version: 1,
};
const refusal = '"Egg slab plate" is planned for 13 meals on the board of Demo week: take it off that board first, or keep it.';

afterEach(() => vi.unstubAllGlobals());

function stubApi(deleteAnswer: Response) {
  const calls: string[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      calls.push(`${init?.method ?? 'GET'} ${url}`);
      if (init?.method === 'DELETE') return deleteAnswer;
      if (url.includes('/assemblies')) return jsonResponse([plate]);
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

  it('a plate planned on a board is refused with where it is planned, shown on the page', async () => {
    const calls = stubApi(jsonResponse({ type: 'about:blank', title: 'Conflict', status: 409, code: 'in_use', detail: refusal }, 409));
    vi.stubGlobal('confirm', vi.fn(() => true));
    renderAtRoute(<PlatesPage />, '/plates', '/plates');
    fireEvent.click(await screen.findByRole('button', { name: 'Delete Egg slab plate' }));
    await waitFor(() => expect(screen.getByText(refusal)).toBeTruthy());
    expect(calls).toContain('DELETE /api/assemblies/5');
  });
});
