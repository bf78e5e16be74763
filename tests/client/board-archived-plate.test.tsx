import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { BoardGrid } from '@/features/weeks/components/board-grid';

// An invented two-plate board (demo-style data, not a reference): one plate archived after it was planned on Monday.
const plateOf = (id: number, name: string, archived: boolean) =>
  ({
    id,
    name,
    description: '',
    trays: [],
    addOns: [],
    assemblySteps: [],
    reheatSteps: [],
    nutrition: null,
    macros: { kcal: 400, fatG: 30, proteinG: 25, carbsG: 5, fiberG: 2, netCarbsG: 3 },
    complete: true,
    allergens: [],
    archived,
    version: 1,
    updatedAt: '2026-11-01T00:00:00.000Z',
  }) satisfies AssemblyDto;

const board = {
  week: { id: 1, name: 'Board test', startDate: '2026-01-05', endDate: '2026-01-11', prepDate: '2026-01-04', secondPrepDate: null, publishedVersion: null, publishedAt: null, changedSincePublished: false, cellCount: 1, version: 3 },
  days: ['2026-01-05', '2026-01-06'],
  slots: ['breakfast'],
  prepDates: ['2026-01-04'],
  clients: [{ id: 7, name: 'Ann', householdMultiplier: '1', allergens: [], dislikes: [], targets: { targetKcal: 1800, netCarbCapG: 20, proteinG: 100, fatG: 140 }, archived: false }],
  plates: [plateOf(1, 'Old frittata plate', true), plateOf(2, 'Egg cup plate', false)],
  cells: [{ clientId: 7, date: '2026-01-05', slot: 'breakfast', assemblyId: 1, prepDate: null, storage: 'fridge', allergenOverrides: [] }],
  trays: [],
  checks: [],
  inventory: [],
  cautions: [],
} as unknown as BoardDto;

describe('the week board and an archived plate', () => {
  it('keeps it on the cell that plans it but offers only current plates for other cells', () => {
    render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} />);
    const palette = screen.getByRole('complementary', { name: 'Plates' });
    expect(within(palette).queryByText('Old frittata plate')).toBeNull();
    expect(within(palette).getByText('Egg cup plate')).toBeTruthy();

    // The Monday cell still shows it, and its picker names it as archived.
    // The cell says the plate is archived, in its words and its name for a screen reader.
    const monday = screen.getByRole('button', { name: /Mon.*: Old frittata plate \(archived\)$/ });
    expect(monday.textContent).toContain('Old frittata plate (archived)');
    fireEvent.click(monday);
    const picker = screen.getByLabelText('Plate') as HTMLSelectElement;
    expect([...picker.options].map((o) => o.text)).toEqual(['Empty', 'Old frittata plate (archived)', 'Egg cup plate']);

    // An empty cell's picker does not offer it.
    fireEvent.click(screen.getByRole('button', { name: /Tue.*: empty/ }));
    expect([...(screen.getByLabelText('Plate') as HTMLSelectElement).options].map((o) => o.text)).toEqual(['Empty', 'Egg cup plate']);
  });
});

describe('one day of the board at a time', () => {
  it('shows the whole week by default at a laptop, and a single day when chosen', () => {
    render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} />);
    const grid = screen.getByRole('region', { name: /Week board/ });
    expect(within(grid).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Client', 'Mon, Jan 5', 'Tue, Jan 6']);
    expect(screen.getByRole('complementary', { name: 'Plates' }).querySelector('details')?.open).toBe(true);
    fireEvent.change(screen.getByLabelText('Days shown'), { target: { value: '2026-01-06' } });
    expect(within(grid).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Client', 'Tue, Jan 6']);
    expect(within(grid).queryByRole('button', { name: /Mon.*Old frittata plate/ })).toBeNull();
    expect(within(grid).getByRole('button', { name: /Tue.*: empty/ })).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Days shown'), { target: { value: '' } });
    expect(within(grid).getAllByRole('columnheader')).toHaveLength(3);
  });

  it('starts on one day on a phone-sized screen (the first, when today is not on the board)', () => {
    const matchMedia = vi.fn((q: string) => ({ matches: q === '(max-width: 639px)', media: q }) as unknown as MediaQueryList);
    vi.stubGlobal('matchMedia', matchMedia);
    try {
      render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} />);
      const grid = screen.getByRole('region', { name: /Week board/ });
      expect(within(grid).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Client', 'Mon, Jan 5']);
      expect((screen.getByLabelText('Days shown') as HTMLSelectElement).value).toBe('2026-01-05');
      // The plates to drag are folded away (a cell is filled by tapping it there); at a laptop they are open.
      expect(screen.getByRole('complementary', { name: 'Plates' }).querySelector('details')?.open).toBe(false);
    } finally {
      vi.unstubAllGlobals();
    }
  });
});
