import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { Component as ClientPage } from '@/app/routes/clients/client.route';
import { emptyClient } from '@/features/clients/components/client-form';
import { jsonResponse, renderAtRoute, staleResponse, stubVersionedRecord } from './render';

// An invented client profile, as the coach reads it (GET /api/clients/:id): the new-client form's starting values.
const profile = (overrides: Record<string, unknown> = {}): Record<string, unknown> & { version: number } => ({
  ...emptyClient,
  id: 7,
  name: 'Olga Paused',
  archivedAt: null,
  email: null,
  targets: {
    mode: 'computed', reeKcal: 1370, tdeeKcal: 1884, targetKcal: 1884, netCarbCapG: 20, proteinG: 105, fatG: 150, notes: [],
    slots: { breakfast: { targetKcal: 565, netCarbCapG: 6, proteinG: 31.5, fatG: 45, share: 0.3 } },
  },
  slotShares: { breakfast: 0.3 },
  account: null,
  invitation: null,
  createdAt: '2026-11-01T08:00:00.000Z',
  updatedAt: '2026-11-01T08:00:00.000Z',
  version: 3,
  ...overrides,
});

const renderProfile = () => renderAtRoute(<ClientPage />, '/clients/:clientId', '/clients/7');

/** The profile as the API keeps it (versions, 409 on a stale one), with the page's side cards answered empty. */
const serveProfile = () =>
  stubVersionedRecord(
    '/api/clients/7',
    profile(),
    (current, body) =>
      'archived' in body ? { ...current, archivedAt: body.archived ? '2026-12-02T10:00:00.000Z' : null } : profile({ ...current, ...body }),
    (url) => (url.includes('/deliveries') ? jsonResponse({ clientId: 7, items: [] }) : url.includes('/published-allergens') ? jsonResponse([]) : undefined),
  );

afterEach(() => vi.unstubAllGlobals());

/**
 * The profile as the API keeps it, its side cards answering slowly once a write went in (as over a real network):
 * `release()` lets them answer. `write` makes the written version.
 */
function serveProfileSlowAfterWrite(write: (current: ReturnType<typeof profile>, body: Record<string, unknown>) => Record<string, unknown>) {
  let release = () => {};
  let written = false;
  const slow = new Promise<void>((r) => (release = r));
  stubVersionedRecord(
    '/api/clients/7',
    profile(),
    (current, body) => {
      written = true;
      return write(current, body);
    },
    async (url) => {
      if (written) await slow;
      return url.includes('/deliveries') ? jsonResponse({ clientId: 7, items: [] }) : url.includes('/published-allergens') ? jsonResponse([]) : undefined;
    },
  );
  return { release: () => release() };
}

describe('archiving a client from their profile', () => {
  it('asks first, sends the version read, then shows since when and offers Restore', async () => {
    const archived = profile({ archivedAt: '2026-12-02T10:00:00.000Z', version: 4 });
    const calls: { method: string; url: string; body: unknown }[] = [];
    let current = profile();
    vi.stubGlobal('confirm', vi.fn(() => true));
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        const method = init?.method ?? 'GET';
        calls.push({ method, url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
        if (url.includes('/deliveries')) return jsonResponse({ clientId: 7, items: [] });
        if (url.includes('/published-allergens')) return jsonResponse([]);
        if (method === 'PATCH') current = archived;
        return jsonResponse(current);
      }),
    );
    renderProfile();
    fireEvent.click(await screen.findByRole('button', { name: 'Archive' }));
    expect(vi.mocked(window.confirm).mock.calls[0][0]).toMatch(/^Archive Olga Paused\? An archived client leaves the client list/);
    await screen.findByRole('button', { name: 'Restore' });
    expect(calls.find((c) => c.method === 'PATCH')).toEqual({ method: 'PATCH', url: '/api/clients/7', body: { archived: true, version: 3 } });
    expect(screen.getByText(/^Archived on /)).toBeTruthy();
    expect(screen.getByText('Restore Olga Paused to invite them.')).toBeTruthy();
  });

  it('does nothing when the coach changes their mind', async () => {
    const fetchMock = vi.fn(async (url: string, _init?: RequestInit) => (url.includes('/deliveries') ? jsonResponse({ clientId: 7, items: [] }) : url.includes('/published-allergens') ? jsonResponse([]) : jsonResponse(profile())));
    vi.stubGlobal('confirm', vi.fn(() => false));
    vi.stubGlobal('fetch', fetchMock);
    renderProfile();
    fireEvent.click(await screen.findByRole('button', { name: 'Archive' }));
    await waitFor(() => expect(window.confirm).toHaveBeenCalled());
    expect(fetchMock.mock.calls.some(([, init]) => (init as RequestInit | undefined)?.method === 'PATCH')).toBe(false);
  });

  it('says an archived client with an account can still sign in, and where to end that', async () => {
    const archived = profile({ archivedAt: '2026-12-02T10:00:00.000Z', account: { email: 'olga@example.test', name: 'Olga Paused' } });
    vi.stubGlobal('fetch', vi.fn(async (url: string) => (url.includes('/deliveries') ? jsonResponse({ clientId: 7, items: [] }) : url.includes('/published-allergens') ? jsonResponse([]) : jsonResponse(archived))));
    renderProfile();
    expect(await screen.findByText(/Olga Paused can still sign in \(olga@example\.test\) and see the weeks they are on/)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Team page' }).getAttribute('href')).toBe('/team');
  });
});

describe('published plates holding an allergen now on the client\'s list', () => {
  const answer = (allergens: unknown) =>
    vi.fn(async (url: string) =>
      url.includes('/deliveries') ? jsonResponse({ clientId: 7, items: [] }) : url.includes('/published-allergens') ? allergens : jsonResponse(profile({ allergens: ['egg'] })),
    );

  it('names each plate, its day and allergen, with the way to its week, and says what to do', async () => {
    const fetchMock = answer(
      jsonResponse([
        {
          weekId: 4, weekName: 'Week of Mon, Jan 12', publishedVersion: 2,
          plates: [
            { date: '2026-01-13', slot: 'breakfast', name: 'Egg slab wrap', allergens: ['egg'] },
            { date: '2026-01-15', slot: 'lunch', name: 'Chive squares', allergens: ['egg', 'milk'] },
          ],
        },
      ]),
    );
    vi.stubGlobal('fetch', fetchMock);
    renderProfile();
    const alert = await screen.findByText('2 published plates from today on hold an allergen now on Olga Paused’s list');
    const box = alert.closest('[role="alert"]') as HTMLElement;
    expect(box.textContent).toContain('breakfast: Egg slab wrap (Egg)');
    expect(box.textContent).toContain('lunch: Chive squares (Egg and Milk)');
    expect(box.textContent).toContain('Change them on the week board, or allow the allergen there with a reason, then publish again.');
    expect(screen.getByRole('link', { name: 'Week of Mon, Jan 12' }).getAttribute('href')).toBe('/weeks/4');
    // The plan sent again is how a client who does not open the app hears of it: the week's "Send plans", on them alone.
    expect(screen.getByRole('link', { name: 'E-mail Olga Paused this week’s plan again' }).getAttribute('href')).toBe('/weeks/4?send=7');
    expect(fetchMock.mock.calls.some(([url]) => /^\/api\/clients\/7\/published-allergens\?today=\d{4}-\d{2}-\d{2}$/.test(url))).toBe(true);
  });

  it('says nothing when there are none, and offers to check again when the check fails', async () => {
    vi.stubGlobal('fetch', answer(jsonResponse([])));
    renderProfile();
    await screen.findByRole('button', { name: 'Archive' });
    expect(screen.queryByText(/published plate/)).toBeNull();
    vi.unstubAllGlobals();
    vi.stubGlobal('fetch', answer(jsonResponse({ title: 'Server error' }, 500)));
    renderProfile();
    expect(await screen.findByText('Could not check the published weeks against this client’s allergens')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Check again' })).toBeTruthy();
  });
});

describe('two people editing one profile', () => {
  /** Someone else saves version 4 while this page holds version 3: a save from 3 is refused (409 with theirs). */
  function raced() {
    const theirs = profile({ name: 'Olga Theirs', version: 4 });
    const patches: Record<string, unknown>[] = [];
    let current = profile();
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        if (url.includes('/deliveries')) return jsonResponse({ clientId: 7, items: [] });
        if (url.includes('/published-allergens')) return jsonResponse([]);
        if (init?.method === 'PATCH') {
          const body = JSON.parse(String(init.body)) as Record<string, unknown>;
          patches.push(body);
          if (body.version !== 4) {
            current = theirs;
            return staleResponse(theirs);
          }
          current = profile({ ...body, version: 5 });
        }
        return jsonResponse(current);
      }),
    );
    return patches;
  }

  it('keeps what was typed when someone else saved meanwhile, and saves it over theirs only when asked', async () => {
    const patches = raced();
    renderProfile();
    const name = (await screen.findByLabelText('Name')) as HTMLInputElement;
    fireEvent.change(name, { target: { value: 'Olga Mine' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    const notice = await screen.findByText('Someone else saved this profile while you were editing');
    expect(notice).toBeTruthy();
    expect(screen.getByText('Their version (4) is saved. Your changes are still here in the form: nothing is lost.')).toBeTruthy();
    // Saved at the foot of a long form: the keyboard moves to the notice at its head (and it scrolls into view).
    expect(document.activeElement?.getAttribute('role')).toBe('alert');
    // The page heading shows theirs; the form still holds what was typed.
    await screen.findByRole('heading', { name: 'Olga Theirs' });
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Mine');
    const keep = screen.getByRole('button', { name: 'Keep mine and save again' });
    keep.focus();
    fireEvent.click(keep);
    await screen.findByRole('heading', { name: 'Olga Mine' });
    expect(patches.map((p) => [p.name, p.version])).toEqual([
      ['Olga Mine', 3],
      ['Olga Mine', 4],
    ]);
    expect(screen.queryByText('Someone else saved this profile while you were editing')).toBeNull();
    // The notice answered goes; the keyboard goes on to the form it was about, not back to the top of the page.
    await waitFor(() => expect(document.activeElement).toBe(screen.getByLabelText('Name')));
  });

  it('loads their version when asked', async () => {
    raced();
    renderProfile();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Olga Mine' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    const reload = await screen.findByRole('button', { name: 'Reload their version' });
    reload.focus();
    fireEvent.click(reload);
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Theirs'));
    expect(screen.queryByText('Someone else saved this profile while you were editing')).toBeNull();
    await waitFor(() => expect(document.activeElement).toBe(screen.getByLabelText('Name')));
  });

  it('keeps what was typed when the coach archives or restores the client meanwhile, and saves it on the new version', async () => {
    vi.stubGlobal('confirm', vi.fn(() => true));
    const { writes: patches } = serveProfile();
    renderProfile();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Olga Mine' } });
    fireEvent.click(screen.getByRole('button', { name: 'Archive' }));
    fireEvent.click(await screen.findByRole('button', { name: 'Restore' }));
    await waitFor(() => expect(patches).toHaveLength(2));
    await screen.findByRole('button', { name: 'Archive' });
    // Archived (version 4) and restored (5) by this coach: the typing stays, with no notice of anyone else's save.
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Mine');
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await screen.findByRole('heading', { name: 'Olga Mine' });
    expect(patches.map((p) => [p.archived ?? p.name, p.version])).toEqual([
      [true, 3],
      [false, 4],
      ['Olga Mine', 5],
    ]);
  });
});

describe('the coach’s own archive, while the page is still refreshing after it', () => {
  it('never says someone else saved the profile, not even for a moment', async () => {
    vi.stubGlobal('confirm', vi.fn(() => true));
    // The page's side cards answer slowly after the archive, as over a real network.
    const { release } = serveProfileSlowAfterWrite((current, body) => ({ ...current, archivedAt: body.archived ? '2026-12-02T10:00:00.000Z' : null }));
    renderProfile();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Olga Mine' } });
    fireEvent.click(screen.getByRole('button', { name: 'Archive' }));
    // The profile already shows version 4 (archived) while the side cards reload.
    await screen.findByRole('button', { name: 'Restore' });
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    release();
    await waitFor(() => expect(screen.queryByText(/Archived on/)).toBeTruthy());
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Mine');
  });
});

describe('leaving the profile', () => {
  it('asks while typing is held, and not once it is saved, even while the page is still refreshing after the save', async () => {
    const confirm = vi.fn(() => false);
    vi.stubGlobal('confirm', confirm);
    const { release } = serveProfileSlowAfterWrite((current, body) => profile({ ...current, ...body }));
    const { router } = renderProfile();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Olga Renamed' } });
    await act(() => router.navigate('/clients'));
    expect(confirm).toHaveBeenCalledTimes(1);
    expect(router.state.location.pathname).toBe('/clients/7');
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await screen.findByRole('heading', { name: 'Olga Renamed' });
    // The side cards are still being read again: the save is in, so leaving is not asked about.
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Renamed'));
    await act(() => router.navigate('/clients'));
    expect(confirm).toHaveBeenCalledTimes(1);
    expect(router.state.location.pathname).toBe('/clients');
    release();
  });
});

describe('a newer version arriving while the profile is open (a refetch on focus, another tab)', () => {
  it('shows it at once in a form with nothing typed', async () => {
    const { state } = serveProfile();
    const { qc } = renderProfile();
    await screen.findByLabelText('Name');
    state.current = profile({ name: 'Olga Theirs', version: 4 });
    await qc.invalidateQueries();
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Theirs'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
  });

  it('keeps the typing, says so, and refuses a save over theirs until asked', async () => {
    const { state, writes: patches } = serveProfile();
    const { qc } = renderProfile();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Olga Mine' } });
    state.current = profile({ name: 'Olga Theirs', version: 4 });
    await qc.invalidateQueries();
    await screen.findByRole('heading', { name: 'Olga Theirs' });
    expect(screen.getByText('Someone else saved this profile (version 4) since you started typing')).toBeTruthy();
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Mine');
    // Save sends the version the typing started from: refused, never a silent save over theirs.
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await screen.findByText('Someone else saved this profile while you were editing');
    expect(patches.map((p) => p.version)).toEqual([3]);
    expect(screen.queryByText(/since you started typing/)).toBeNull();
  });

  it('drops the typing and loads theirs when asked', async () => {
    const { state } = serveProfile();
    const { qc } = renderProfile();
    fireEvent.change(await screen.findByLabelText('Name'), { target: { value: 'Olga Mine' } });
    state.current = profile({ name: 'Olga Theirs', version: 4 });
    await qc.invalidateQueries();
    fireEvent.click(await screen.findByRole('button', { name: 'Drop my typing and load theirs' }));
    await waitFor(() => expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Olga Theirs'));
    expect(screen.queryByText(/Someone else saved/)).toBeNull();
  });
});

describe('the invitation card’s e-mail', () => {
  it('shows the e-mail saved on the profile since the page opened, and keeps one being typed', async () => {
    const { state } = serveProfile();
    const { qc } = renderProfile();
    const invite = (await screen.findByLabelText('E-mail')) as HTMLInputElement;
    expect(invite.value).toBe('');
    // Saved in the form above: the invitation goes to the address just saved, not to the empty box it opened with.
    fireEvent.change(screen.getByLabelText('E-mail (for the invitation)'), { target: { value: 'olga@example.test' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect((screen.getByLabelText('E-mail') as HTMLInputElement).value).toBe('olga@example.test'));
    // Typed here, then changed on the profile elsewhere: what was typed stays.
    fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: 'olga.home@example.test' } });
    state.current = profile({ ...state.current, email: 'olga.work@example.test', version: state.current.version + 1 });
    await act(() => qc.invalidateQueries());
    await waitFor(() => expect((screen.getByLabelText('E-mail (for the invitation)') as HTMLInputElement).value).toBe('olga.work@example.test'));
    expect((screen.getByLabelText('E-mail') as HTMLInputElement).value).toBe('olga.home@example.test');
  });
});
