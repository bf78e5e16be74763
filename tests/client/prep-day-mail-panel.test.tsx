import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import type { MemberDto } from '@shared/schemas/auth.schema';
import { PrepDayMailPanel, addressesOf } from '@/features/mail/components/prep-day-mail-panel';
import { jsonResponse, renderInApp, testQueryClient } from './render';
import { QueryClientProvider, useQuery } from '@tanstack/react-query';
import { MemoryRouter } from 'react-router-dom';
import { membersQuery } from '@/features/auth/api/auth.queries';

// An invented week 4 with two prep days (only the fields the panel reads), and an invented team.
const board = { week: { id: 4 }, prepDates: ['2026-01-04', '2026-01-07'] } as unknown as BoardDto;
const person = (userId: number, name: string, role: MemberDto['role']): MemberDto => ({
  id: userId, userId, name, email: `${name.toLowerCase()}@example.test`, role, clientId: null, clientName: null, joinedAt: '2026-11-02T09:00:00.000Z', you: role === 'coach',
});
const team = [person(1, 'Ada', 'coach'), person(2, 'Kit', 'assistant'), person(3, 'Lee', 'assistant'), person(4, 'Olga', 'client')];
const sentTo = (...names: string[]) => ({ queued: names.length, recipients: names.map((n) => ({ name: n, email: `${n.toLowerCase()}@example.test`, account: true })), repeated: false });

afterEach(() => vi.unstubAllGlobals());

/** The members read answers `members`; each POST gets the next of `answers`. */
function fakeApi(answers: Response[], members: unknown = team) {
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    if (url === '/api/members') return members instanceof Response ? members : jsonResponse(members);
    if (init?.method === 'POST') return answers.shift()!;
    throw new Error(`unexpected ${url}`);
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}
const posts = (fetchMock: ReturnType<typeof vi.fn>) =>
  fetchMock.mock.calls
    .filter(([, init]) => (init as RequestInit | undefined)?.method === 'POST')
    .map(([url, init]) => ({ url, body: JSON.parse(String((init as RequestInit).body)) as Record<string, unknown> }));
/** The panel as the week page gives it: the team read through the API. */
function PanelOnPage({ board: b }: { board: BoardDto }) {
  return <PrepDayMailPanel board={b} team={useQuery(membersQuery())} />;
}
const sendButton = () => screen.getByRole('button', { name: 'E-mail the shopping list and bake run' });

describe('prep-day papers for the kitchen', () => {
  it('sends the chosen prep day to every assistant by default, one request id per press, and says who it went to', async () => {
    const fetchMock = fakeApi([jsonResponse(sentTo('Kit', 'Lee'), 202), jsonResponse(sentTo('Kit', 'Lee'), 202)]);
    renderInApp(<PanelOnPage board={board} />);
    expect((await screen.findByRole('checkbox', { name: /Kit/ }) as HTMLInputElement).checked).toBe(true);
    expect(screen.queryByRole('checkbox', { name: /Olga|Ada/ })).toBeNull();
    fireEvent.change(screen.getByLabelText('For prep day'), { target: { value: '2026-01-07' } });
    fireEvent.click(sendButton());
    expect(await screen.findByText('Queued for 2 people')).toBeTruthy();
    expect(screen.getByText(/Kit \(kit@example\.test\), Lee \(lee@example\.test\)/)).toBeTruthy();
    fireEvent.click(sendButton());
    await waitFor(() => expect(posts(fetchMock)).toHaveLength(2));
    const [first, second] = posts(fetchMock);
    expect(first.url).toBe('/api/weeks/4/prep-day-mail');
    expect(first.body).toEqual({ prepDate: '2026-01-07', requestId: expect.stringMatching(/^[0-9a-f-]{36}$/), assistantIds: [2, 3] });
    // A new press after a success is a new request.
    expect(second.body.requestId).not.toBe(first.body.requestId);
  });

  it('sends for the prep day chosen as it is now: a second prep day moved to another date is still the one chosen', async () => {
    const fetchMock = fakeApi([jsonResponse(sentTo('Kit', 'Lee'), 202)]);
    const qc = testQueryClient();
    // In a router (the panel links to the outbox) and a query client, kept across the rerender below.
    const { rerender } = render(
      <MemoryRouter>
        <QueryClientProvider client={qc}>
          <PanelOnPage board={board} />
        </QueryClientProvider>
      </MemoryRouter>,
    );
    await screen.findByRole('checkbox', { name: /Kit/ });
    fireEvent.change(screen.getByLabelText('For prep day'), { target: { value: '2026-01-07' } });
    // The second prep day moved to the 8th (someone else, or this coach further down the page).
    const moved = { ...board, prepDates: ['2026-01-04', '2026-01-08'] } as unknown as BoardDto;
    rerender(
      <MemoryRouter>
        <QueryClientProvider client={qc}>
          <PanelOnPage board={moved} />
        </QueryClientProvider>
      </MemoryRouter>,
    );
    expect((screen.getByLabelText('For prep day') as HTMLSelectElement).value).toBe('2026-01-08');
    fireEvent.click(sendButton());
    // Before, the gone day (the 7th) was sent, and refused as no prep day of the week.
    await waitFor(() => expect(posts(fetchMock)).toHaveLength(1));
    expect(posts(fetchMock)[0].body.prepDate).toBe('2026-01-08');
  });

  it('leaves out an assistant unticked and adds other addresses', async () => {
    const fetchMock = fakeApi([
      jsonResponse({ queued: 2, recipients: [{ name: 'Lee', email: 'lee@example.test', account: true }, { name: 'kitchen@example.test', email: 'kitchen@example.test', account: false }], repeated: false }, 202),
    ]);
    renderInApp(<PanelOnPage board={board} />);
    fireEvent.click(await screen.findByRole('checkbox', { name: /Kit/ }));
    fireEvent.change(screen.getByLabelText('Other addresses (optional)'), { target: { value: 'kitchen@example.test, ' } });
    fireEvent.click(sendButton());
    expect(await screen.findByText(/Lee \(lee@example\.test\), kitchen@example\.test\./)).toBeTruthy();
    expect(posts(fetchMock)[0].body).toMatchObject({ assistantIds: [3], alsoTo: ['kitchen@example.test'] });
    expect(addressesOf(' a@example.test;b@example.test\nc@example.test ')).toEqual(['a@example.test', 'b@example.test', 'c@example.test']);
  });

  it('puts a bad address\'s error under the field, naming it', async () => {
    fakeApi([jsonResponse({ type: 'about:blank', title: 'Invalid', status: 400, code: 'validation', detail: 'Invalid', errors: { 'alsoTo.1': ['Enter a valid e-mail address'] } }, 400)]);
    renderInApp(<PanelOnPage board={board} />);
    await screen.findByRole('checkbox', { name: /Kit/ });
    fireEvent.change(screen.getByLabelText('Other addresses (optional)'), { target: { value: 'kitchen@example.test, kitchen' } });
    fireEvent.click(sendButton());
    expect(await screen.findByText('kitchen: Enter a valid e-mail address')).toBeTruthy();
    expect(screen.getByLabelText('Other addresses (optional)').getAttribute('aria-invalid')).toBe('true');
  });

  it('shows why it was not sent, and retries the same request after a failure; without the team it leaves the choice to the server', async () => {
    const fetchMock = fakeApi(
      [
        jsonResponse({ type: 'about:blank', title: 'Conflict', status: 409, code: 'conflict', detail: 'No kitchen assistant in this workspace yet: invite one from Team, or give an e-mail address to send to' }, 409),
        jsonResponse(sentTo('Kit'), 202),
      ],
      jsonResponse({ type: 'about:blank', title: 'Unavailable', status: 503, detail: 'Down' }, 503),
    );
    renderInApp(<PanelOnPage board={board} />);
    expect(await screen.findByText('The team could not be read: every kitchen assistant gets it.')).toBeTruthy();
    fireEvent.click(sendButton());
    expect(await screen.findByText(/^No kitchen assistant in this workspace yet/)).toBeTruthy();
    fireEvent.click(sendButton());
    expect(await screen.findByText('Queued for 1 person')).toBeTruthy();
    const [first, second] = posts(fetchMock);
    expect(first.body).toEqual({ prepDate: '2026-01-04', requestId: expect.any(String) });
    expect(second.body.requestId).toBe(first.body.requestId);
  });
});
