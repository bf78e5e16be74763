import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ReactNode } from 'react';
import { act, renderHook } from '@testing-library/react';
import { QueryClientProvider, useMutation } from '@tanstack/react-query';
import { toast } from 'sonner';
import { createQueryClient } from '@/lib/query-client';
import { ApiError, errorMessage, markShown } from '@/lib/problem';

vi.mock('sonner', () => ({ toast: { error: vi.fn(), success: vi.fn() } }));

const refused = (status: number) => new ApiError({ type: 'about:blank', title: 'Refused', status, code: 'conflict', detail: `Refused (${status})` });

function failingMutation(err: ApiError) {
  const qc = createQueryClient();
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={qc}>{children}</QueryClientProvider>;
  return renderHook(() => useMutation({ mutationFn: async () => Promise.reject(err) }), { wrapper }).result;
}
/** Lets the mutation settle and the deferred toast decide (it waits one task). */
const settle = () => act(() => new Promise((resolve) => setTimeout(resolve, 20)));

afterEach(() => vi.mocked(toast.error).mockClear());

describe('mutation failures: one message, where the person looks', () => {
  it('a failure nobody shows on the page becomes one toast', async () => {
    const m = failingMutation(refused(409));
    act(() => m.current.mutate());
    await settle();
    expect(vi.mocked(toast.error).mock.calls).toEqual([['Refused (409)']]);
  });

  it('a failure the page shows beside its action (errorMessage, or markShown with its own words) is not repeated', async () => {
    const a = failingMutation(refused(409));
    let shown = '';
    act(() => a.current.mutate(undefined, { onError: (e) => (shown = errorMessage(e)) }));
    await settle();
    const b = failingMutation(refused(409));
    act(() => b.current.mutate(undefined, { onError: (e) => markShown(e) }));
    await settle();
    expect(shown).toBe('Refused (409)');
    expect(toast.error).not.toHaveBeenCalled();
  });

  it('a 401 (signed out) makes no toast: the app goes to sign-in', async () => {
    const m = failingMutation(refused(401));
    act(() => m.current.mutate());
    await settle();
    expect(toast.error).not.toHaveBeenCalled();
  });
});
