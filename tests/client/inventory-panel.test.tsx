import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { countsWithTyped, InventoryPanel } from '@/features/weeks/components/inventory-panel';

// An invented week: two base trays on one prep day (only the fields the panel reads).
const row = (trayId: number, needed: number, produced: number) => ({
  trayId,
  byPrepDate: [{ prepDate: '2026-01-04', needed, produced, lostTrays: 0, short: Math.max(0, needed - produced), spare: Math.max(0, produced - needed) }],
});
const board = (version: number, eggTrays: number, baconTrays: number) =>
  ({
    week: { version },
    trays: [
      { trayId: 1, name: 'Egg slab', prepDate: '2026-01-04', trayCount: eggTrays },
      { trayId: 2, name: 'Oven bacon', prepDate: '2026-01-04', trayCount: baconTrays },
    ],
    plates: [],
    inventory: [row(1, 20, eggTrays * 12), row(2, 10, baconTrays * 8)],
  }) as unknown as BoardDto;

describe('the tray counts of the portion count', () => {
  it('sends only what was typed, with the version it was typed on, even after a refresh', () => {
    const onSave = vi.fn();
    const { rerender } = render(<InventoryPanel board={board(7, 2, 1)} busy={false} onCover={() => undefined} onSave={onSave} />);
    fireEvent.change(screen.getByLabelText(/Trays of Egg slab/), { target: { value: '3' } });
    // Someone else set the bacon to 2 trays meanwhile: the board refreshes under the typing.
    rerender(<InventoryPanel board={board(8, 2, 2)} busy={false} onCover={() => undefined} onSave={onSave} />);
    expect((screen.getByLabelText(/Trays of Egg slab/) as HTMLInputElement).value).toBe('3');
    expect((screen.getByLabelText(/Trays of Oven bacon/) as HTMLInputElement).value).toBe('2');
    fireEvent.click(screen.getByRole('button', { name: 'Save tray counts' }));
    // Before, every count went on the newest version: a count changed under the typing was saved over unasked.
    expect(onSave).toHaveBeenCalledWith(new Map([['1|2026-01-04', 3]]), 7);
  });

  it('puts typed counts over the board as it is when sent, keeping the others (the API replaces every count)', () => {
    expect(countsWithTyped(board(8, 2, 2), new Map([['1|2026-01-04', 3]]))).toEqual([
      { trayId: 1, prepDate: '2026-01-04', trayCount: 3 },
      { trayId: 2, prepDate: '2026-01-04', trayCount: 2 },
    ]);
  });
});
