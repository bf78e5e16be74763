import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { jsonResponse as json, renderInApp } from './render';
import type { BoardDto, WeekPublishedAllergensDto } from '@shared/schemas/weeks.schema';
import { SendPlansPanel } from '@/features/mail/components/send-plans-panel';
import { localToday } from '@/lib/dates';
import { useQuery } from '@tanstack/react-query';
import { clientsQuery } from '@/features/clients/api/clients.queries';

// Invented names and addresses for the check.
const clients = [
  { id: 1, name: 'Ada Client', email: 'ada@example.test', householdMultiplier: '1' },
  { id: 2, name: 'Ben Client', email: null, householdMultiplier: '1' },
  { id: 3, name: 'Cy Off-board', email: 'cy@example.test', householdMultiplier: '1' },
];
const board = (over: Partial<BoardDto['week']> = {}) =>
  ({
    week: { id: 7, publishedVersion: 2, changedSincePublished: false, ...over },
    cells: [
      { clientId: 1, date: '2026-01-05', slot: 'breakfast', assemblyId: 1, prepDate: null, storage: 'fridge', allergenOverrides: [] },
      { clientId: 2, date: '2026-01-05', slot: 'breakfast', assemblyId: 1, prepDate: null, storage: 'fridge', allergenOverrides: [] },
    ],
  }) as unknown as BoardDto;
/** The panel as the week page gives it: the clients read through the API. */
function PanelOnPage({ board: b, clashes, preselect }: { board: BoardDto; clashes?: WeekPublishedAllergensDto; preselect?: number[] }) {
  return <SendPlansPanel board={b} clients={useQuery(clientsQuery())} clashes={clashes} preselect={preselect} />;
}
function renderPanel(
  b: BoardDto,
  send: (body: Record<string, unknown>) => Response,
  clashes?: WeekPublishedAllergensDto,
  preselect?: number[],
  profiles: readonly Record<string, unknown>[] = clients,
) {
  const calls: { url: string; body: Record<string, unknown> | null }[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      const body = init?.body ? (JSON.parse(String(init.body)) as Record<string, unknown>) : null;
      calls.push({ url, body });
      if (url === '/api/clients') return json(profiles);
      if (url === '/api/weeks/7/send') return send(body!);
      if (url.startsWith('/api/outbox')) {
        return json({ items: [], total: 1, page: 1, pageSize: 25, counts: { queued: 0, sending: 0, retrying: 0, sent: 1, failed: 0 }, batches: [] });
      }
      return json({ type: 'about:blank', title: 'Not found', status: 404, code: 'not_found', detail: url }, 404);
    }),
  );
  renderInApp(<PanelOnPage board={b} clashes={clashes} preselect={preselect} />);
  return calls;
}

describe('send plans panel', () => {
  it('finds a client among many when choosing, and keeps those chosen while the search hides them', async () => {
    const many = ['Ann Bell', 'Bo Chen', 'Cy Diaz', 'Di Evans', 'Ed Ford', 'Flo Gray', 'Gus Hale', 'Hal Ito', 'Ivy Jones'].map((name, i) => ({
      id: 10 + i,
      name,
      email: `c${i}@example.test`,
      householdMultiplier: '1',
    }));
    const b = {
      week: { id: 7, publishedVersion: 2, changedSincePublished: false },
      cells: many.map((c) => ({ clientId: c.id, date: '2026-01-05', slot: 'breakfast', assemblyId: 1, prepDate: null, storage: 'fridge', allergenOverrides: [] })),
    } as unknown as BoardDto;
    const calls = renderPanel(b, () => json({ batchId: 'b-2', queued: 2, publicationVersion: 2, skipped: [], repeated: false }, 202), undefined, undefined, many);
    const list = await screen.findByRole('list', { name: 'Clients on this week' });
    expect(screen.queryByLabelText('Find a client')).toBeNull(); // all of them: nothing to find
    fireEvent.click(screen.getByRole('radio', { name: 'Only the clients I choose' }));
    fireEvent.change(screen.getByLabelText('Find a client'), { target: { value: 'gray' } });
    expect(within(list).getAllByRole('listitem')).toHaveLength(1);
    expect(screen.getByText('1 of 9 shown')).toBeTruthy();
    fireEvent.click(within(list).getByRole('checkbox', { name: /Flo Gray/ }));
    fireEvent.change(screen.getByLabelText('Find a client'), { target: { value: 'c8@' } });
    fireEvent.click(within(list).getByRole('checkbox', { name: /Ivy Jones/ }));
    fireEvent.change(screen.getByLabelText('Find a client'), { target: { value: '' } });
    expect(within(list).getAllByRole('listitem')).toHaveLength(9);
    fireEvent.click(screen.getByRole('button', { name: 'Send to 2 clients' }));
    await screen.findByText(/2 plans queued/);
    expect(calls.find((c) => c.url === '/api/weeks/7/send')!.body).toMatchObject({ clientIds: [15, 18] });
  });

  it('asks to publish first when the week was never published', () => {
    renderPanel(board({ publishedVersion: null }), () => json({}));
    expect(screen.getByText('Publish the week first')).toBeTruthy();
  });

  it('lists the clients on the board, counts only those with an e-mail, and sends to the ones chosen with the note', async () => {
    const calls = renderPanel(board({ changedSincePublished: true }), () =>
      json({ batchId: 'b-1', queued: 1, publicationVersion: 2, skipped: [], repeated: false }, 202),
    );
    const list = await screen.findByRole('list', { name: 'Clients on this week' });
    expect(within(list).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      expect.stringContaining('Ada Client'),
      expect.stringContaining('No e-mail on the profile'),
    ]);
    expect(screen.getByText(/The board changed since version 2 was published/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Send to 1 client' })).toBeTruthy();

    fireEvent.click(screen.getByRole('radio', { name: 'Only the clients I choose' }));
    const none = screen.getByRole('button', { name: 'Send to 0 clients' }) as HTMLButtonElement;
    expect(none.disabled).toBe(true);
    const [ada, ben] = within(list).getAllByRole('checkbox') as HTMLInputElement[];
    expect(ben.disabled).toBe(true); // no e-mail: cannot be chosen
    fireEvent.click(ada);
    fireEvent.change(screen.getByLabelText('Personal note (optional)'), { target: { value: 'Enjoy the week' } });
    fireEvent.click(screen.getByRole('button', { name: 'Send to 1 client' }));

    await screen.findByText(/1 plan queued/);
    const sent = calls.find((c) => c.url === '/api/weeks/7/send')!.body!;
    // The coach's today goes along: sent mid-week, the e-mail counts the allergen plates still ahead.
    expect(sent).toMatchObject({ clientIds: [1], note: 'Enjoy the week', today: localToday() });
    expect(typeof sent.requestId).toBe('string');
    await waitFor(() => expect(screen.getByText(/1 sent · 0 waiting · 0 failed/)).toBeTruthy());
    expect(calls.some((c) => c.url === '/api/outbox?batchId=b-1')).toBe(true);
  });

  it('warns of published plates holding an allergen put on a client’s list since, beside that client, and still lets the coach send', async () => {
    const plates = [
      { date: '2026-01-06', slot: 'Breakfast', name: 'Feta slab', allergens: ['milk' as const] },
      { date: '2026-01-08', slot: 'Breakfast', name: 'Feta slab', allergens: ['milk' as const] },
    ];
    renderPanel(board(), () => json({}), { weekId: 7, publishedVersion: 2, clients: [{ clientId: 1, name: 'Ada Client', plates }] });
    expect(await screen.findByText('Ada Client’s published plates hold an allergen put on their list since version 2')).toBeTruthy();
    expect(screen.getByText(/Their PDFs say not to eat those plates before asking you/)).toBeTruthy();
    const [ada, ben] = within(screen.getByRole('list', { name: 'Clients on this week' })).getAllByRole('listitem');
    expect(ada.textContent).toContain('⚠ 2 plates with an allergen on their list');
    expect(ben.textContent).not.toContain('⚠');
    expect((screen.getByRole('button', { name: 'Send to 1 client' }) as HTMLButtonElement).disabled).toBe(false);
  });

  it('chooses only the clients whose published plates hold an allergen on their list, with one press', async () => {
    const plates = [{ date: '2026-01-06', slot: 'Breakfast', name: 'Feta slab', allergens: ['milk' as const] }];
    const calls = renderPanel(board(), () => json({ batchId: 'b-2', queued: 1, publicationVersion: 2, skipped: [], repeated: false }, 202), {
      weekId: 7,
      publishedVersion: 2,
      clients: [{ clientId: 1, name: 'Ada Client', plates }],
    });
    fireEvent.click(await screen.findByRole('button', { name: 'Send to Ada Client only' }));
    expect((screen.getByRole('radio', { name: 'Only the clients I choose' }) as HTMLInputElement).checked).toBe(true);
    const [ada, ben] = within(screen.getByRole('list', { name: 'Clients on this week' })).getAllByRole('checkbox') as HTMLInputElement[];
    expect([ada.checked, ben.checked]).toEqual([true, false]);
    fireEvent.click(screen.getByRole('button', { name: 'Send to 1 client' }));
    await screen.findByText(/1 plan queued/);
    expect(calls.find((c) => c.url === '/api/weeks/7/send')!.body).toMatchObject({ clientIds: [1] });
  });

  it('offers no such press when the only client concerned has no e-mail', async () => {
    const plates = [{ date: '2026-01-06', slot: 'Breakfast', name: 'Feta slab', allergens: ['milk' as const] }];
    renderPanel(board(), () => json({}), { weekId: 7, publishedVersion: 2, clients: [{ clientId: 2, name: 'Ben Client', plates }] });
    expect(await screen.findByText('Ben Client’s published plates hold an allergen put on their list since version 2')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /only/ })).toBeNull();
  });

  it('starts on the clients a link names, counting only those it can send to', async () => {
    // Ada (on the board, with an e-mail), Ben (no e-mail) and Cy (not on the board) named by the link.
    const calls = renderPanel(board(), () => json({ batchId: 'b-3', queued: 1, publicationVersion: 2, skipped: [], repeated: false }, 202), undefined, [1, 2, 3]);
    const list = await screen.findByRole('list', { name: 'Clients on this week' });
    expect((screen.getByRole('radio', { name: 'Only the clients I choose' }) as HTMLInputElement).checked).toBe(true);
    expect((within(list).getAllByRole('checkbox')[0] as HTMLInputElement).checked).toBe(true);
    fireEvent.click(screen.getByRole('button', { name: 'Send to 1 client' }));
    await screen.findByText(/1 plan queued/);
    expect(calls.find((c) => c.url === '/api/weeks/7/send')!.body).toMatchObject({ clientIds: [1] });
  });

  it('says nothing of a check made against an older published version', async () => {
    const plates = [{ date: '2026-01-06', slot: 'Breakfast', name: 'Feta slab', allergens: ['milk' as const] }];
    renderPanel(board(), () => json({}), { weekId: 7, publishedVersion: 1, clients: [{ clientId: 1, name: 'Ada Client', plates }] });
    await screen.findByRole('list', { name: 'Clients on this week' });
    expect(screen.queryByText(/published plates hold an allergen/)).toBeNull();
    expect(screen.queryByText(/⚠/)).toBeNull();
  });

  it('shows why a send was refused and keeps the form', async () => {
    renderPanel(board(), () =>
      json({ type: 'about:blank', title: 'Bad request', status: 400, code: 'validation', detail: 'Invalid input', errors: { note: ['Note is too long'] } }, 400),
    );
    fireEvent.click(await screen.findByRole('button', { name: 'Send to 1 client' }));
    expect(await screen.findByText('Note is too long')).toBeTruthy();
    expect(screen.getByText('Not sent')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Send to 1 client' })).toBeTruthy();
  });
});
