import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { PublishedVersions } from '@/features/weeks/components/published-versions';
import { jsonResponse, renderInApp } from './render';

// An invented week as the board has it (only the fields the history reads).
const board = (week: Partial<BoardDto['week']>) => ({ week: { id: 3, publishedVersion: null, changedSincePublished: false, ...week } }) as BoardDto;

afterEach(() => vi.unstubAllGlobals());

describe('published versions of a week', () => {
  it('lists them newest first, says which one clients see and that the board changed since', async () => {
    const fetchMock = vi.fn(async (_url: string) =>
      jsonResponse([
        { number: 2, publishedAt: '2026-12-01T09:12:00.000Z', publishedBy: 'Ada Coach' },
        { number: 1, publishedAt: '2026-11-28T18:40:00.000Z', publishedBy: null },
      ]),
    );
    vi.stubGlobal('fetch', fetchMock);
    renderInApp(<PublishedVersions board={board({ publishedVersion: 2, changedSincePublished: true })} />);
    const items = await screen.findAllByRole('listitem');
    expect(items.map((i) => i.textContent)).toEqual([
      expect.stringMatching(/^Version 2 · .* · Ada CoachClients see this one$/),
      expect.stringMatching(/^Version 1 · [^·]+$/),
    ]);
    expect(screen.getByText('The board has changed since version 2: publish again for clients to see the changes.')).toBeTruthy();
    expect(fetchMock.mock.calls[0][0]).toBe('/api/weeks/3/publications');
  });

  it('asks for nothing before the first publication', () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    renderInApp(<PublishedVersions board={board({})} />);
    expect(screen.getByText('Not published yet: clients see nothing of this week.')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
