import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { PrepDates } from '@/features/weeks/components/prep-dates';
import { ApiError } from '@/lib/problem';
import { renderInApp } from './render';

// An invented week with two prep days (only the fields the card reads).
const board = { week: { prepDate: '2026-01-04', secondPrepDate: '2026-01-07', version: 7 } } as BoardDto;
const moved = (prepDate: string, secondPrepDate: string | null, version: number) => ({ week: { prepDate, secondPrepDate, version } }) as BoardDto;
const problem = (status: number, code: string, detail: string, errors?: Record<string, string[]>) =>
  new ApiError({ type: 'about:blank', title: 'Refused', status, code, detail, ...(errors ? { errors } : {}) });

describe('the prep days card', () => {
  it('sends the cleared second prep day as null', () => {
    const onSave = vi.fn();
    renderInApp(<PrepDates board={board} busy={false} error={null} onSave={onSave} />);
    fireEvent.change(screen.getByLabelText(/Second prep day/), { target: { value: '' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save prep days' }));
    expect(onSave).toHaveBeenCalledWith('2026-01-04', null, 7);
  });

  it('shows the board’s dates as they are now while nothing is typed (someone else moved them)', () => {
    const { rerender } = render(<PrepDates board={board} busy={false} error={null} onSave={() => undefined} />);
    rerender(<PrepDates board={moved('2026-01-03', null, 8)} busy={false} error={null} onSave={() => undefined} />);
    expect((screen.getByLabelText('Prep day') as HTMLInputElement).value).toBe('2026-01-03');
    expect((screen.getByLabelText(/Second prep day/) as HTMLInputElement).value).toBe('');
  });

  it('keeps typed dates through a refresh, and sends the version they were typed on (a 409 when the week changed since)', () => {
    const onSave = vi.fn();
    const { rerender } = render(<PrepDates board={board} busy={false} error={null} onSave={onSave} />);
    fireEvent.change(screen.getByLabelText('Prep day'), { target: { value: '2026-01-05' } });
    rerender(<PrepDates board={moved('2026-01-03', null, 8)} busy={false} error={null} onSave={onSave} />);
    expect((screen.getByLabelText('Prep day') as HTMLInputElement).value).toBe('2026-01-05');
    expect((screen.getByLabelText(/Second prep day/) as HTMLInputElement).value).toBe('2026-01-07');
    fireEvent.click(screen.getByRole('button', { name: 'Save prep days' }));
    // Before, the fields kept the dates they opened with and a save went on the newest version: theirs was undone unasked.
    expect(onSave).toHaveBeenCalledWith('2026-01-05', '2026-01-07', 7);
  });

  it('follows the board again once it holds the typed dates (saved)', () => {
    const { rerender } = render(<PrepDates board={board} busy={false} error={null} onSave={() => undefined} />);
    fireEvent.change(screen.getByLabelText('Prep day'), { target: { value: '2026-01-05' } });
    rerender(<PrepDates board={moved('2026-01-05', '2026-01-07', 8)} busy={false} error={null} onSave={() => undefined} />);
    rerender(<PrepDates board={moved('2026-01-04', '2026-01-07', 9)} busy={false} error={null} onSave={() => undefined} />);
    expect((screen.getByLabelText('Prep day') as HTMLInputElement).value).toBe('2026-01-04');
  });

  it('shows a refusal in the card, saying why (a prep day\'s list already bought)', () => {
    const detail = 'The shopping list for prep Sun 4 Jan was marked bought, so this week keeps its two prep days.';
    renderInApp(<PrepDates board={board} busy={false} error={problem(409, 'conflict', detail)} onSave={() => undefined} />);
    expect(screen.getByText('Prep days not changed')).toBeTruthy();
    expect(screen.getByText(detail)).toBeTruthy();
  });

  it('puts a field error under its field, and leaves a stale version to the board\'s merge prompt', () => {
    const { unmount } = renderInApp(
      <PrepDates board={board} busy={false} error={problem(400, 'validation', 'Invalid', { secondPrepDate: ['The second prep date comes after the first, within the week'] })} onSave={() => undefined} />,
    );
    expect(screen.getByLabelText(/Second prep day/).getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText('The second prep date comes after the first, within the week')).toBeTruthy();
    expect(screen.queryByText('Prep days not changed')).toBeNull();
    unmount();
    renderInApp(<PrepDates board={board} busy={false} error={problem(409, 'stale_version', 'Someone else changed this since you opened it')} onSave={() => undefined} />);
    expect(screen.queryByText('Prep days not changed')).toBeNull();
  });
});
