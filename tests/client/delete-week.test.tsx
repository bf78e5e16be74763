import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ReactNode } from 'react';
import { act, renderHook } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import type { WeekSummaryDto } from '@shared/schemas/weeks.schema';
import { weekKeys } from '@/features/weeks/api/weeks.keys';
import { useDeleteWeek } from '@/features/weeks/api/use-week-mutations';
import { testQueryClient } from './render';

// Two invented weeks in the cached list; the first is deleted.
const week = (id: number, name: string) => ({ id, name }) as WeekSummaryDto;

afterEach(() => vi.unstubAllGlobals());

describe('deleting a week', () => {
  it('drops it from the cached list and its board at once, before any list read answers', async () => {
    const fetchMock = vi.fn((_url: string, init?: RequestInit) =>
      init?.method === 'DELETE' ? Promise.resolve(new Response(null, { status: 204 })) : new Promise<Response>(() => undefined),
    );
    vi.stubGlobal('fetch', fetchMock);
    const qc = testQueryClient();
    qc.setQueryData(weekKeys.list(), [week(1, 'Week of Mon 7 Dec'), week(2, 'Demo week')]);
    qc.setQueryData(weekKeys.detail(1), { week: week(1, 'Week of Mon 7 Dec') });
    const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={qc}>{children}</QueryClientProvider>;
    const { result } = renderHook(() => useDeleteWeek(), { wrapper });
    await act(async () => {
      result.current.mutate(1);
    });
    await vi.waitFor(() => expect(result.current.isSuccess).toBe(true));
    expect(qc.getQueryData<WeekSummaryDto[]>(weekKeys.list())?.map((w) => w.name)).toEqual(['Demo week']);
    expect(qc.getQueryData(weekKeys.detail(1))).toBeUndefined();
    expect(fetchMock.mock.calls[0][0]).toBe('/api/weeks/1');
  });
});
