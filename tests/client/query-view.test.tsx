import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { QueryClient, QueryClientProvider, useQuery } from '@tanstack/react-query';
import { EmptyState, QueryView } from '@/components/ui/states';

// A read's three states before its content, as every list page shows them through QueryView.
function List({ load }: { load: () => Promise<string[]> }) {
  const q = useQuery({ queryKey: ['things'], queryFn: load });
  return (
    <QueryView query={q} isEmpty={(d) => d.length === 0} empty={<EmptyState title="Nothing here yet" />}>
      {(d) => (
        <ul>
          {d.map((t) => (
            <li key={t}>{t}</li>
          ))}
        </ul>
      )}
    </QueryView>
  );
}

const show = (load: () => Promise<string[]>) =>
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <List load={load} />
    </QueryClientProvider>,
  );

describe('QueryView', () => {
  it('shows the skeleton while loading, then the content', async () => {
    let resolve: (v: string[]) => void = () => {};
    show(() => new Promise((r) => (resolve = r)));
    expect(screen.getByRole('status', { name: 'Loading page' })).toBeTruthy();
    resolve(['Egg slab', 'Batter squares']);
    expect((await screen.findAllByRole('listitem')).map((li) => li.textContent)).toEqual(['Egg slab', 'Batter squares']);
    expect(screen.queryByRole('status')).toBeNull();
  });

  it('shows the empty state when there is nothing', async () => {
    show(() => Promise.resolve([]));
    expect(await screen.findByRole('heading', { name: 'Nothing here yet' })).toBeTruthy();
    expect(screen.queryByRole('list')).toBeNull();
  });

  it('shows the error with a retry that reads again', async () => {
    let calls = 0;
    show(() => (++calls === 1 ? Promise.reject(new Error('The kitchen is offline')) : Promise.resolve(['Egg slab'])));
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Could not load this');
    fireEvent.click(screen.getByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(screen.getByRole('listitem').textContent).toBe('Egg slab'));
    expect(calls).toBe(2);
  });
});
