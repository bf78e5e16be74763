import { describe, expect, it, vi } from 'vitest';
import type { ReactNode } from 'react';
import { act, renderHook, waitFor } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { ShoppingListDto } from '@shared/schemas/shopping.schema';
import { shoppingItem, shoppingList } from './shopping-fixtures';
import { shoppingKeys } from '@/features/shopping/api/shopping.keys';
import { useSetCheck } from '@/features/shopping/api/use-shopping-mutations';

const list = () => shoppingList([shoppingItem(1), shoppingItem(2)]);

function setup() {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity }, mutations: { retry: false } } });
  qc.setQueryData(shoppingKeys.list(7), list());
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={qc}>{children}</QueryClientProvider>;
  return { qc, wrapper };
}

const checkedOf = (qc: QueryClient, id: number) =>
  qc.getQueryData<ShoppingListDto>(shoppingKeys.list(7))!.aisles[0].items.find((i) => i.ingredientId === id)!.check.checked;


describe('check marks on the shopping list (optimistic, with rollback)', () => {
  it('shows the mark at once, keeps it when saved, and rolls back only the refused tap', async () => {
    const resolvers: ((r: Response) => void)[] = [];
    const fetchMock = vi.fn((url: string) => {
      if (url.endsWith('/shopping')) return Promise.resolve(new Response(JSON.stringify(list()), { headers: { 'content-type': 'application/json' } }));
      return new Promise<Response>((resolve) => resolvers.push(resolve));
    });
    vi.stubGlobal('fetch', fetchMock);
    const { qc, wrapper } = setup();
    const { result } = renderHook(() => useSetCheck(7), { wrapper });

    act(() => {
      result.current.mutate({ ingredientId: 1, checked: true });
      result.current.mutate({ ingredientId: 2, checked: true });
    });
    // Optimistic: both marks show before any answer, and the count follows.
    await waitFor(() => expect(checkedOf(qc, 1) && checkedOf(qc, 2)).toBe(true));
    expect(qc.getQueryData<ShoppingListDto>(shoppingKeys.list(7))!.checkedCount).toBe(2);
    await waitFor(() => expect(resolvers).toHaveLength(2));
    const puts = fetchMock.mock.calls.map((c) => c as unknown as [string, RequestInit]).filter(([, init]) => init?.method === 'PUT');
    expect(puts.map(([u, init]) => [u, init.body])).toEqual([
      ['/api/weeks/7/shopping/checks/1', JSON.stringify({ checked: true })],
      ['/api/weeks/7/shopping/checks/2', JSON.stringify({ checked: true })],
    ]);

    // Item 1 is saved; item 2 is refused: only item 2 goes back.
    await act(async () => {
      resolvers[0](new Response(JSON.stringify({ ingredientId: 1, checked: true, checkedBy: 'Kit', checkedAt: '2026-01-04T10:00:00.000Z' }), { headers: { 'content-type': 'application/json' } }));
      resolvers[1](
        new Response(JSON.stringify({ type: 'about:blank', title: 'Error', status: 500, code: 'internal', detail: 'boom' }), {
          status: 500,
          headers: { 'content-type': 'application/problem+json' },
        }),
      );
    });
    await waitFor(() => expect(checkedOf(qc, 2)).toBe(false));
    expect(checkedOf(qc, 1)).toBe(true);
  });
});
