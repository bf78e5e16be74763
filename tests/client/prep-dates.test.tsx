import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { PrepDates } from '@/features/weeks/components/prep-dates';
import { ApiError } from '@/lib/problem';
import { renderInApp } from './render';

// An invented week with two prep days (only the fields the card reads).
const board = { week: { prepDate: '2026-01-04', secondPrepDate: '2026-01-07' } } as BoardDto;
const problem = (status: number, code: string, detail: string, errors?: Record<string, string[]>) =>
  new ApiError({ type: 'about:blank', title: 'Refused', status, code, detail, ...(errors ? { errors } : {}) });

describe('the prep days card', () => {
  it('sends the cleared second prep day as null', () => {
    const onSave = vi.fn();
    renderInApp(<PrepDates board={board} busy={false} error={null} onSave={onSave} />);
    fireEvent.change(screen.getByLabelText(/Second prep day/), { target: { value: '' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save prep days' }));
    expect(onSave).toHaveBeenCalledWith('2026-01-04', null);
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
