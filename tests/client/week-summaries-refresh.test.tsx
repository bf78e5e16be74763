import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { renderHook, waitFor } from '@testing-library/react';
import { useCreateWeek, usePutCells } from '@/features/weeks/api/use-week-mutations';
import { glanceQuery, myWeekQuery } from '@/features/weeks/api/weeks.queries';
import { currentWeekQuery } from '@/features/shopping/api/shopping.queries';
import { weekKeys } from '@/features/weeks/api/weeks.keys';
import { jsonResponse, queryClientFor, signedIn } from './render';

// After a week changes, what sums weeks up is read again: the coach's glance, the kitchen's week, the client's week.
const board = { week: { id: 9, version: 2 }, days: [], slots: [], prepDates: [], clients: [], plates: [], cells: [], trays: [], checks: [], inventory: [], cautions: [] };

function setUp() {
  const qc = queryClientFor(signedIn());
  for (const key of [glanceQuery('2026-12-03').queryKey, currentWeekQuery('2026-12-03').queryKey, myWeekQuery('2026-12-03').queryKey, weekKeys.list()]) {
    qc.setQueryData(key, { cached: true });
  }
  qc.setQueryData(weekKeys.detail(5), { week: { id: 5 } });
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(board, 201)));
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={qc}>{children}</QueryClientProvider>;
  const stale = () =>
    [glanceQuery('2026-12-03').queryKey, currentWeekQuery('2026-12-03').queryKey, myWeekQuery('2026-12-03').queryKey, weekKeys.list()].map(
      (key) => qc.getQueryState(key)?.isInvalidated,
    );
  return { qc, wrapper, stale };
}

describe('week summaries after a change', () => {
  it('a new week reads the glance, the kitchen week and the lists again; another board stays as cached', async () => {
    const { qc, wrapper, stale } = setUp();
    const { result } = renderHook(() => useCreateWeek(), { wrapper });
    result.current.mutate({ name: '', startDate: '2026-12-07', prepDate: '2026-12-06' });
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(stale()).toEqual([true, true, true, true]);
    expect(qc.getQueryState(weekKeys.detail(5))?.isInvalidated).toBe(false);
  });

  it('a board edit does the same (the glance counts its warnings)', async () => {
    const { wrapper, stale } = setUp();
    const { result } = renderHook(() => usePutCells(9), { wrapper });
    result.current.mutate({ version: 1, cells: [] });
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(stale()).toEqual([true, true, true, true]);
  });
});

afterEach(() => vi.unstubAllGlobals());
