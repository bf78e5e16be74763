import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { BoardGrid } from '@/features/weeks/components/board-grid';

// An invented nine-client board (demo-style data, not a reference): one client's Monday has a warning.
const names = ['Ann Bell', 'Bo Chen', 'Cy Diaz', 'Di Evans', 'Ed Ford', 'Flo Gray', 'Gus Hale', 'Hal Ito', 'Ivy Jones'];
const board = {
  week: { id: 1, name: 'Board test', startDate: '2026-01-05', endDate: '2026-01-11', prepDate: '2026-01-04', secondPrepDate: null, publishedVersion: null, publishedAt: null, changedSincePublished: false, cellCount: 0, version: 3 },
  days: ['2026-01-05', '2026-01-06'],
  slots: ['breakfast'],
  prepDates: ['2026-01-04'],
  clients: names.map((name, i) => ({ id: i + 1, name, householdMultiplier: '1', allergens: [], dislikes: [], targets: { targetKcal: 1800, netCarbCapG: 20, proteinG: 100, fatG: 140 }, archived: false })),
  plates: [],
  cells: [],
  trays: [],
  checks: [
    {
      clientId: 5,
      date: '2026-01-05',
      totals: { kcal: 0, fatG: 0, proteinG: 0, carbsG: 0, fiberG: 0, netCarbsG: 0 },
      warnings: [{ kind: 'protein-short', severity: 'warn', proteinG: 0, floorG: 90, targetG: 100, message: 'Protein 0 g is below the 90 g floor (target 100 g).' }],
    },
  ],
  inventory: [],
  cautions: [],
} as unknown as BoardDto;

const rowNames = () => within(screen.getByRole('region', { name: /Week board/ })).queryAllByRole('rowheader').map((h) => h.textContent ?? '');

describe('a long board, a client at a time', () => {
  it('finds a client by name and shows how many rows are shown', () => {
    render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} />);
    expect(rowNames()).toHaveLength(9);
    fireEvent.change(screen.getByLabelText('Find a client'), { target: { value: 'gray' } });
    expect(rowNames()).toHaveLength(1);
    expect(rowNames()[0]).toContain('Flo Gray');
    expect(screen.getByText('1 of 9 shown')).toBeTruthy();
  });

  it('shows only the clients with something flagged, and says so when a search finds none of them', () => {
    render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} />);
    const only = screen.getByLabelText('Only clients with something flagged (1 of 9)') as HTMLInputElement;
    fireEvent.click(only);
    expect(rowNames()).toHaveLength(1);
    expect(rowNames()[0]).toContain('Ed Ford');

    fireEvent.change(screen.getByLabelText('Find a client'), { target: { value: 'ann' } });
    expect(rowNames()).toHaveLength(0);
    expect(screen.getByText(/No client on this board matches “ann”/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Show every client' }));
    expect(rowNames()).toHaveLength(9);
    expect(only.checked).toBe(false);
    expect((screen.getByLabelText('Find a client') as HTMLInputElement).value).toBe('');
  });

  it('follows the page when the page holds the choice (the week’s problem list shows only those clients)', () => {
    const onOnlyFlagged = vi.fn();
    render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} onlyFlagged onOnlyFlagged={onOnlyFlagged} />);
    expect(rowNames()).toHaveLength(1);
    const only = screen.getByLabelText('Only clients with something flagged (1 of 9)') as HTMLInputElement;
    expect(only.checked).toBe(true);
    fireEvent.click(only);
    expect(onOnlyFlagged).toHaveBeenCalledWith(false);
  });

  it('keeps the row whose cell is open when its last warning is fixed, until the cell is closed', () => {
    const { rerender } = render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} onlyFlagged onOnlyFlagged={vi.fn()} />);
    fireEvent.click(screen.getByRole('button', { name: /^Ed Ford, Mon, Jan 5, breakfast: empty$/ }));
    expect(screen.getByRole('region', { name: 'Selected cell' })).toBeTruthy();
    // The board answers again without the warning (the coach placed a plate with enough protein).
    rerender(<BoardGrid board={{ ...board, checks: [] }} busy={false} onEdit={vi.fn()} onlyFlagged onOnlyFlagged={vi.fn()} />);
    expect(rowNames()).toHaveLength(1);
    expect(screen.getByRole('region', { name: 'Selected cell' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: /^Close/ }));
    expect(rowNames()).toHaveLength(0);
    expect(screen.getByText(/No client on this board has anything flagged/)).toBeTruthy();
  });

  it('keeps the copy of the row of days out of sight (and of screen readers) while the table’s own row shows', () => {
    render(<BoardGrid board={board} busy={false} onEdit={vi.fn()} />);
    const pinned = screen.getByTestId('pinned-days');
    expect(pinned.getAttribute('aria-hidden')).toBe('true');
    expect(pinned.querySelectorAll('th')).toHaveLength(0);
  });
});
