import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, within } from '@testing-library/react';
import { useQuery } from '@tanstack/react-query';
import { jsonResponse as json, renderInApp } from './render';
import { weekPublishedAllergensQuery } from '@/features/weeks/api/weeks.queries';
import { PublishedAllergenClashes } from '@/features/weeks/components/published-allergen-clashes';
import { dayLabel } from '@/lib/dates';

// The week page's notice of published plates holding an allergen put on a client's list since; invented names.
function OnPage({ changedSince }: { changedSince?: boolean }) {
  return <PublishedAllergenClashes query={useQuery(weekPublishedAllergensQuery(7, 3, '2026-01-06'))} changedSince={changedSince} />;
}
function show(answer: () => Response, changedSince?: boolean) {
  const fetch = vi.fn(async (_url: string) => answer());
  vi.stubGlobal('fetch', fetch);
  renderInApp(<OnPage changedSince={changedSince} />);
  return fetch;
}
const plate = (date: string, name: string, allergens: string[]) => ({ date, slot: 'Breakfast', name, allergens });

describe('published allergen clashes on a week', () => {
  it('names each client, day, slot, plate and allergen, with the way to the client and what to do', async () => {
    const fetch = show(() =>
      json({
        weekId: 7,
        publishedVersion: 3,
        clients: [
          { clientId: 4, name: 'Ada Client', plates: [plate('2026-01-06', 'Feta slab', ['milk']), plate('2026-01-08', 'Frittata', ['milk', 'egg'])] },
          { clientId: 5, name: 'Ben Client', plates: [plate('2026-01-07', 'Frittata', ['egg'])] },
        ],
      }),
    );
    const title = await screen.findByText('Published version 3: 3 plates from today on hold an allergen put on 2 clients’ lists since');
    expect(String(fetch.mock.calls[0][0])).toBe('/api/weeks/7/published-allergens?today=2026-01-06');
    const notice = title.closest('[role="alert"]') as HTMLElement;
    expect(within(notice).getByRole('link', { name: 'Ada Client' }).getAttribute('href')).toBe('/clients/4');
    expect(within(notice).getByText(`${dayLabel('2026-01-08')}, breakfast: Frittata (Milk and Egg)`)).toBeTruthy();
    expect(within(notice).getByText(`${dayLabel('2026-01-07')}, breakfast: Frittata (Egg)`)).toBeTruthy();
    expect(notice.textContent).toContain('Change them on the board, or allow the allergen there with a reason, then publish a new version.');
  });

  it('words one client and one plate', async () => {
    show(() => json({ weekId: 7, publishedVersion: 3, clients: [{ clientId: 4, name: 'Ada Client', plates: [plate('2026-01-06', 'Feta slab', ['milk'])] }] }));
    const title = await screen.findByText('Published version 3: 1 plate from today on holds an allergen put on Ada Client’s list since');
    expect(title.closest('[role="alert"]')!.textContent).not.toContain('The board has changed since');
  });

  it('says the board changed since that version, when it did: publishing may already take care of them', async () => {
    show(() => json({ weekId: 7, publishedVersion: 3, clients: [{ clientId: 4, name: 'Ada Client', plates: [plate('2026-01-06', 'Feta slab', ['milk'])] }] }), true);
    const title = await screen.findByText(/^Published version 3:/);
    expect(title.closest('[role="alert"]')!.textContent).toContain('The board has changed since version 3: if those changes take care of them, publish a new version now.');
  });

  it('says nothing when no plate holds one', async () => {
    const fetch = show(() => json({ weekId: 7, publishedVersion: 3, clients: [] }));
    await vi.waitFor(() => expect(fetch).toHaveBeenCalled());
    await new Promise((r) => setTimeout(r, 20));
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.queryByText(/Published version/)).toBeNull();
  });

  it('says a failed check failed, and checks again on request', async () => {
    let fail = true;
    const fetch = show(() =>
      fail
        ? json({ type: 'about:blank', title: 'Server error', status: 500, code: 'internal', detail: 'Something went wrong' }, 500)
        : json({ weekId: 7, publishedVersion: 3, clients: [{ clientId: 4, name: 'Ada Client', plates: [plate('2026-01-06', 'Feta slab', ['milk'])] }] }),
    );
    const again = await screen.findByRole('button', { name: 'Check again' });
    expect(screen.getByText('Could not check the published version against the clients’ allergens')).toBeTruthy();
    fail = false;
    fireEvent.click(again);
    expect(await screen.findByText(/1 plate from today on holds an allergen/)).toBeTruthy();
    expect(fetch).toHaveBeenCalledTimes(2);
  });
});
