import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { PrepDayMailPanel } from '@/features/week-mail/components/prep-day-mail-panel';
import { jsonResponse, renderInApp } from './render';

// An invented week 4 with two prep days (only the fields the panel reads).
const board = { week: { id: 4 }, prepDates: ['2026-01-04', '2026-01-07'] } as unknown as BoardDto;

afterEach(() => vi.unstubAllGlobals());

const posts = (fetchMock: ReturnType<typeof vi.fn>) =>
  fetchMock.mock.calls.map(([url, init]) => ({ url, body: JSON.parse(String((init as RequestInit).body)) as Record<string, unknown> }));

describe('prep-day papers for the kitchen', () => {
  it('sends the chosen prep day with one request id per press, and says who it went to', async () => {
    const fetchMock = vi.fn(async () => jsonResponse({ queued: 1, recipients: [{ name: 'Kit', email: 'kit@example.test' }], repeated: false }, 202));
    vi.stubGlobal('fetch', fetchMock);
    renderInApp(<PrepDayMailPanel board={board} />);
    fireEvent.change(screen.getByLabelText('For prep day'), { target: { value: '2026-01-07' } });
    fireEvent.click(screen.getByRole('button', { name: 'E-mail the shopping list and bake run' }));
    expect(await screen.findByText('Queued for one assistant')).toBeTruthy();
    expect(screen.getByText(/Kit \(kit@example\.test\)/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'E-mail the shopping list and bake run' }));
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(2));
    const [first, second] = posts(fetchMock);
    expect(first.url).toBe('/api/weeks/4/prep-day-mail');
    expect(first.body).toEqual({ prepDate: '2026-01-07', requestId: expect.stringMatching(/^[0-9a-f-]{36}$/) });
    // A new press after a success is a new request.
    expect(second.body.requestId).not.toBe(first.body.requestId);
  });

  it('shows why it was not sent, and retries the same request after a failure', async () => {
    const fetchMock = vi
      .fn()
      .mockResolvedValueOnce(jsonResponse({ type: 'about:blank', title: 'Conflict', status: 409, code: 'conflict', detail: 'No kitchen assistant in this workspace yet: invite one from Team first' }, 409))
      .mockResolvedValueOnce(jsonResponse({ queued: 1, recipients: [{ name: 'Kit', email: 'kit@example.test' }], repeated: false }, 202));
    vi.stubGlobal('fetch', fetchMock);
    renderInApp(<PrepDayMailPanel board={board} />);
    fireEvent.click(screen.getByRole('button', { name: 'E-mail the shopping list and bake run' }));
    expect(await screen.findByText('No kitchen assistant in this workspace yet: invite one from Team first')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'E-mail the shopping list and bake run' }));
    expect(await screen.findByText('Queued for one assistant')).toBeTruthy();
    const [first, second] = posts(fetchMock);
    expect(first.body.prepDate).toBe('2026-01-04');
    expect(second.body.requestId).toBe(first.body.requestId);
  });
});
