import { describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { QueryClientProvider, useQuery } from '@tanstack/react-query';
import { jsonResponse as json, testQueryClient } from './render';
import type { ShoppingListDto } from '@shared/schemas/shopping.schema';
import { shoppingItem, shoppingList } from './shopping-fixtures';
import { shoppingKeys } from '@/features/shopping/api/shopping.keys';
import { ShoppingList } from '@/features/shopping/components/shopping-list';

const list = () => shoppingList([shoppingItem(1)]);

/** The page as the assistant has it: the list read through the query cache, the rows from ShoppingList. */
function Page() {
  const q = useQuery({ queryKey: shoppingKeys.list(7), queryFn: () => fetch('/api/weeks/7/shopping').then((r) => r.json() as Promise<ShoppingListDto>) });
  return q.data ? <ShoppingList list={q.data} weekId={7} /> : null;
}

describe('a tap on the shopping list', () => {
  it('shows on the box at once while a list read is still in flight, and springs back when the save is refused', async () => {
    const pending: { url: string; resolve: (r: Response) => void }[] = [];
    vi.stubGlobal('fetch', vi.fn((url: string) => new Promise<Response>((resolve) => pending.push({ url, resolve }))));
    const qc = testQueryClient();
    qc.setQueryData(shoppingKeys.list(7), list());
    render(
      <QueryClientProvider client={qc}>
        <Page />
      </QueryClientProvider>,
    );
    // A list read is in flight (the cached list is stale), as when the page was just opened or refocused.
    act(() => {
      void qc.invalidateQueries({ queryKey: shoppingKeys.list(7) }); // its answer never comes in this test
    });
    await waitFor(() => expect(pending.some((p) => p.url.endsWith('/shopping'))).toBe(true));

    const box = screen.getByRole('checkbox', { name: /Item 1/ }) as HTMLInputElement;
    fireEvent.click(box);
    expect(box.checked).toBe(true); // at once, before any answer

    await waitFor(() => expect(pending.some((p) => p.url.includes('/shopping/checks/1'))).toBe(true));
    expect(box.checked).toBe(true);
    await act(async () => {
      pending.find((p) => p.url.includes('/shopping/checks/1'))!.resolve(json({ type: 'about:blank', title: 'Error', status: 500, code: 'internal', detail: 'boom' }, 500));
    });
    await waitFor(() => expect(box.checked).toBe(false));
  });
});
