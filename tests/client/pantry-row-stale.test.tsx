import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { PantryItemDto } from '@shared/schemas/shopping.schema';
import { PantryRow } from '@/features/shopping/components/pantry-forms';
import { pantryQuery } from '@/features/shopping/api/shopping.queries';
import { toast } from 'sonner';
import { createQueryClient } from '@/lib/query-client';
import { jsonResponse, renderInApp, stubVersionedRecord } from './render';

vi.mock('sonner', () => ({ toast: { error: vi.fn(), success: vi.fn() } }));

// An invented pantry row: 900 g of almond flour (kept in grams; a US reader types ounces).
const row = (o: Partial<PantryItemDto> = {}): PantryItemDto => ({
  id: 5, ingredientId: 40, ingredientName: 'Almond flour, example', aisle: 'baking', amount: 900, unit: 'g', display: '900 g', version: 2, updatedAt: '2026-12-01T08:00:00Z', ...o,
});

/** The row as the pantry page lists it; "Refetch" plays the list coming back with someone else's change. */
function Listed({ newer }: { newer: PantryItemDto }) {
  const [item, setItem] = useState(row());
  // The page's pantry list is on screen: a refused save refreshes it (a network round trip).
  useQuery(pantryQuery());
  return (
    <>
      <button type="button" onClick={() => setItem(newer)}>
        Refetch
      </button>
      <ul>
        <PantryRow item={item} unitSystem="metric" />
      </ul>
    </>
  );
}

const amount = () => screen.getByLabelText('Amount') as HTMLInputElement;

afterEach(() => vi.unstubAllGlobals());

describe('a pantry amount changed by someone else meanwhile', () => {
  const theirs = row({ amount: 400, display: '400 g', version: 3 });
  const serve = () => {
    const served = stubVersionedRecord('/api/pantry/5', row(), (_current, body) => row({ amount: Number(body.amount), display: `${String(body.amount)} g` }), (url) =>
      url.startsWith('/api/pantry') || url.startsWith('/api/shopping')
        ? new Promise<Response>((resolve) => setTimeout(() => resolve(jsonResponse({ items: [] })), 30))
        : undefined,
    );
    served.state.current = theirs;
    return served;
  };

  it('keeps the amount typed, refuses the save from the version it started on, and saves it over theirs only when asked', async () => {
    const { writes } = serve();
    // The app's own query client: a failure the row shows is not repeated in a toast.
    renderInApp(<Listed newer={theirs} />, createQueryClient());
    fireEvent.change(amount(), { target: { value: '650' } });
    fireEvent.click(screen.getByRole('button', { name: 'Refetch' }));
    expect(amount().value).toBe('650');
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Someone else saved this amount (now 400 g) while you were editing')).toBeTruthy();
    expect(amount().value).toBe('650');
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(toast.error).not.toHaveBeenCalled();
    fireEvent.click(screen.getByRole('button', { name: 'Keep mine and save again' }));
    await waitFor(() => expect(writes).toHaveLength(2));
    expect(writes.map((w) => [w.amount, w.version])).toEqual([
      ['650', 2],
      ['650', 3],
    ]);
    await waitFor(() => expect(screen.queryByText(/Someone else saved/)).toBeNull());
  });

  it('puts theirs in the field when asked', async () => {
    serve();
    renderInApp(<Listed newer={theirs} />);
    fireEvent.change(amount(), { target: { value: '650' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Reload their version' }));
    expect(amount().value).toBe('400');
  });

  it('shows the newest amount at once when nothing is typed', () => {
    serve();
    renderInApp(<Listed newer={theirs} />);
    expect(amount().value).toBe('900');
    fireEvent.click(screen.getByRole('button', { name: 'Refetch' }));
    expect(amount().value).toBe('400');
  });
});
