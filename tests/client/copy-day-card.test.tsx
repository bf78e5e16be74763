import { describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { CopyDayCard, copyDaySummary } from '@/features/weeks/components/copy-day-card';

// An invented board (demo-style data, not a reference): Monday plans three meals for two clients, one of them on a
// plate archived since; Tuesday is empty.
const plate = (id: number, name: string, archived: boolean) => ({ id, name, archived });
const cell = (clientId: number, date: string, slot: string, assemblyId: number) => ({ clientId, date, slot, assemblyId });
const board = {
  days: ['2026-01-05', '2026-01-06'],
  plates: [plate(1, 'Old frittata plate', true), plate(2, 'Egg cup plate', false), plate(3, 'Radish hash plate', true)],
  cells: [cell(7, '2026-01-05', 'breakfast', 1), cell(7, '2026-01-05', 'lunch', 2), cell(8, '2026-01-05', 'breakfast', 2), cell(8, '2026-01-06', 'lunch', 3)],
} as unknown as BoardDto;

describe('copying a day', () => {
  it('says how many meals went over and which stayed behind with their archived plate', () => {
    expect(copyDaySummary(board, '2026-01-05', '2026-01-06')).toBe('Copied Mon, Jan 5 to Tue, Jan 6: 2 meals. 1 meal stayed behind: "Old frittata plate" is archived.');
    expect(copyDaySummary(board, '2026-01-06', '2026-01-05')).toBe('Copied Tue, Jan 6 to Mon, Jan 5: Mon, Jan 5 has no meals now. 1 meal stayed behind: "Radish hash plate" is archived.');
    const noneArchived = { ...board, plates: board.plates.map((p) => ({ ...p, archived: false })) };
    expect(copyDaySummary(noneArchived, '2026-01-05', '2026-01-06')).toBe('Copied Mon, Jan 5 to Tue, Jan 6: 3 meals.');
    const both = { ...board, cells: [...board.cells, cell(9, '2026-01-05', 'breakfast', 3), cell(9, '2026-01-05', 'lunch', 3)] } as unknown as BoardDto;
    expect(copyDaySummary(both, '2026-01-05', '2026-01-06')).toBe(
      'Copied Mon, Jan 5 to Tue, Jan 6: 2 meals. 3 meals stayed behind: "Old frittata plate" and "Radish hash plate" are archived.',
    );
  });

  it('says it once the server has copied, not when the request leaves; choosing again clears it', () => {
    const onCopy = vi.fn();
    render(<CopyDayCard board={board} busy={false} onCopy={onCopy} />);
    fireEvent.change(screen.getByLabelText('From'), { target: { value: '2026-01-05' } });
    fireEvent.change(screen.getByLabelText('To (replaces that day)'), { target: { value: '2026-01-06' } });
    fireEvent.click(screen.getByRole('button', { name: 'Copy day' }));
    expect(onCopy).toHaveBeenCalledWith('2026-01-05', '2026-01-06', expect.any(Function));
    expect(screen.getByRole('status').textContent).toBe('');
    // The server's answer: the day copied from is as it was.
    const done = onCopy.mock.calls[0][2] as (answer: BoardDto) => void;
    act(() => done(board));
    expect(screen.getByRole('status').textContent).toBe('Copied Mon, Jan 5 to Tue, Jan 6: 2 meals. 1 meal stayed behind: "Old frittata plate" is archived.');
    fireEvent.change(screen.getByLabelText('From'), { target: { value: '2026-01-06' } });
    expect(screen.getByRole('status').textContent).toBe('');
  });
});
