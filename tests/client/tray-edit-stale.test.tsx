import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { TrayDto } from '@shared/schemas/trays.schema';
import { Component as TrayPage } from '@/app/routes/trays/tray-detail.route';
import { renderAtRoute, stubVersionedRecord } from './render';

// An invented archived egg-slab tray (demo-like values), as GET /api/trays/:id answers it.
const tray = (overrides: Partial<TrayDto> = {}): TrayDto => ({
  id: 12,
  name: 'Spinach egg slab',
  description: '',
  lines: [{ id: 1, position: 0, ingredientId: 30, ingredientName: 'Egg, whole, raw', amountText: '12', unit: 'each', note: '', grams: 600 }],
  pan: { code: 'half-sheet', label: 'Half sheet', length: 18, width: 13, unit: 'in' },
  panLining: 'parchment',
  bake: { category: 'egg-slab', categoryLabel: 'Egg slab', tempF: 350, minMinutes: 20, maxMinutes: 25 },
  yieldFactor: 1,
  cutPlan: { kind: 'grid', rows: 3, columns: 4 },
  portions: 12,
  storage: { fridgeDays: 4, freezerWeeks: 8 },
  reheatSteps: [],
  reheat: { minF: 165, minC: 74, source: 'FDA Food Code 3-403.11' },
  allergens: ['egg'],
  tags: [],
  photo: null,
  isDemo: false,
  archived: true,
  version: 3,
  createdAt: '2026-11-01T08:00:00.000Z',
  updatedAt: '2026-11-01T08:00:00.000Z',
  ...overrides,
});

afterEach(() => vi.unstubAllGlobals());

describe('the tray editor and saves made meanwhile', () => {
  const serve = (start: TrayDto) =>
    stubVersionedRecord('/api/trays/12', start, (current, body) =>
      tray({ name: String(body.name), archived: 'archived' in body ? Boolean(body.archived) : current.archived }),
    );

  it('keeps the typing and saves it on the restored version, with no word of anyone else', async () => {
    const { writes } = serve(tray());
    renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Spinach egg slab, less salt' } });
    fireEvent.click(screen.getByRole('button', { name: 'Restore' }));
    await screen.findByText('Restored.');
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    await waitFor(() => expect(writes).toHaveLength(2));
    await waitFor(() => expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Spinach egg slab, less salt'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    // The restore went from 3; the editor's save, begun on 3, goes on 4 (this coach's own restore).
    expect(writes.map((p) => [p.name, p.archived, p.version])).toEqual([
      ['Spinach egg slab', false, 3],
      ['Spinach egg slab, less salt', undefined, 4],
    ]);
  });

  it('still says so when someone else saved the tray meanwhile, and saves over theirs only when asked', async () => {
    const { state, writes } = serve(tray({ archived: false }));
    renderAtRoute(<TrayPage />, '/trays/:trayId', '/trays/12');
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Mine' } });
    state.current = tray({ archived: false, name: 'Theirs', version: 4 });
    fireEvent.click(screen.getByRole('button', { name: /^Save/ }));
    expect(await screen.findByText('Someone else saved this tray while you were editing')).toBeTruthy();
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Mine');
    fireEvent.click(screen.getByRole('button', { name: 'Keep mine and save again' }));
    await waitFor(() => expect(writes).toHaveLength(2));
    expect(writes.map((p) => [p.name, p.version])).toEqual([
      ['Mine', 3],
      ['Mine', 4],
    ]);
  });
});
