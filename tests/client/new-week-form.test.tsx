import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { QueryClientProvider } from '@tanstack/react-query';
import { Component as WeeksPage } from '@/app/routes/weeks/weeks.route';
import { Component as WeekPage } from '@/app/routes/weeks/week.route';
import { jsonResponse, queryClientFor, renderAtRoute, renderInApp, signedIn } from './render';

// The coach's "New week" form; an invented coach, "today" pinned with fake timers (Wednesday 2 December 2026).
const coach = signedIn();

function show() {
  vi.useFakeTimers({ now: new Date(2026, 11, 2, 9), toFake: ['Date'] });
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse([])));
  renderInApp(<WeeksPage />, queryClientFor(coach));
}

const field = (label: string) => screen.getByLabelText(label) as HTMLInputElement;

describe('new week form', () => {
  it('starts the board next Monday with the prep day the Sunday before', () => {
    show();
    expect(field('First day of the board').value).toBe('2026-12-07');
    expect(field('Prep day').value).toBe('2026-12-06');
  });

  it("skips a week a board plans already (a day is on one board only), and shows the server's refusal under the first day", async () => {
    vi.useFakeTimers({ now: new Date(2026, 11, 2, 9), toFake: ['Date'] });
    // An invented next week, already planned: Mon 7 – Sun 13 Dec.
    const planned = {
      id: 5, name: 'Next week', startDate: '2026-12-07', endDate: '2026-12-13', prepDate: '2026-12-05', secondPrepDate: null,
      publishedVersion: null, publishedAt: null, changedSincePublished: false, cellCount: 0, version: 1,
    };
    const refusal = '"Next week" already plans Mon 7 Dec – Sun 13 Dec; a day is on one board only. Start this week on Mon 14 Dec or later.';
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) =>
        init?.method === 'POST'
          ? jsonResponse({ type: 'about:blank', title: 'Bad request', status: 400, code: 'validation', detail: refusal, errors: { startDate: [refusal] } }, 400)
          : jsonResponse([planned]),
      ),
    );
    renderInApp(<WeeksPage />, queryClientFor(coach));
    await screen.findByLabelText('Start from');
    expect(field('First day of the board').value).toBe('2026-12-14');
    expect(field('Prep day').value).toBe('2026-12-13');
    // A copy of it: its prep day falls on the same day of the week (a Saturday, two days before the board).
    fireEvent.change(screen.getByLabelText('Start from'), { target: { value: '5' } });
    expect(field('Prep day').value).toBe('2026-12-12');
    fireEvent.change(screen.getByLabelText('Start from'), { target: { value: '' } });
    fireEvent.change(field('First day of the board'), { target: { value: '2026-12-09' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create' }));
    expect(await screen.findByText(refusal)).toBeTruthy();
    expect(field('First day of the board').getAttribute('aria-invalid')).toBe('true');
  });

  it('a refusal no field shows (the week to copy from is gone) is said under the form; a name has its own error and a length cap', async () => {
    vi.useFakeTimers({ now: new Date(2026, 11, 2, 9), toFake: ['Date'] });
    let answer = { errors: { fromId: ['The week to copy from is not there any more'] } as Record<string, string[]> };
    const source = {
      id: 5, name: 'Last week', startDate: '2026-11-30', endDate: '2026-12-06', prepDate: '2026-11-29', secondPrepDate: null,
      publishedVersion: null, publishedAt: null, changedSincePublished: false, cellCount: 3, version: 1,
    };
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) =>
        init?.method === 'POST'
          ? jsonResponse({ type: 'about:blank', title: 'Bad request', status: 400, code: 'validation', detail: 'Invalid input', ...answer }, 400)
          : jsonResponse([source]),
      ),
    );
    renderInApp(<WeeksPage />, queryClientFor(coach));
    fireEvent.change(await screen.findByLabelText('Start from'), { target: { value: '5' } });
    fireEvent.click(screen.getByRole('button', { name: 'Copy' }));
    expect(await screen.findByText('The week to copy from is not there any more')).toBeTruthy();
    expect(field('Name (optional)').maxLength).toBe(120);
    answer = { errors: { name: ['Too long'] } };
    fireEvent.click(screen.getByRole('button', { name: 'Copy' }));
    expect(await screen.findByText('Too long')).toBeTruthy();
    expect(field('Name (optional)').getAttribute('aria-invalid')).toBe('true');
    expect(screen.queryByText('The week to copy from is not there any more')).toBeNull();
  });

  it("lists each week with its kitchen pages: an assistant reaches last week's labels, not the board", async () => {
    const last = {
      id: 4, name: 'Week of 30 Nov', startDate: '2026-11-30', endDate: '2026-12-06', prepDate: '2026-11-29', secondPrepDate: null,
      publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 14, version: 3,
    };
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse([last])));
    renderInApp(<WeeksPage />, queryClientFor(signedIn({ role: 'assistant' })));
    const pages = await screen.findByRole('list', { name: 'Week of 30 Nov: kitchen pages' });
    const hrefs = Array.from(pages.querySelectorAll('a')).map((a) => [a.textContent, a.getAttribute('href')]);
    expect(hrefs).toEqual([
      ['Shopping list', '/weeks/4/shopping'],
      ['Bake run', '/weeks/4/bake-run'],
      ['Labels', '/weeks/4/labels'],
    ]);
    expect(screen.queryByRole('link', { name: 'Week of 30 Nov' })).toBeNull();
    expect(screen.queryByRole('heading', { name: 'New week' })).toBeNull();
  });

  it('moves the prep day with the first day of the board until the coach picks one', () => {
    show();
    fireEvent.change(field('First day of the board'), { target: { value: '2026-12-21' } });
    expect(field('Prep day').value).toBe('2026-12-20');
    fireEvent.change(field('Prep day'), { target: { value: '2026-12-19' } });
    fireEvent.change(field('First day of the board'), { target: { value: '2026-12-28' } });
    expect(field('Prep day').value).toBe('2026-12-19');
  });

  it('copies an earlier week when the coach starts from it: its second prep day moves to the same day of the new board', async () => {
    vi.useFakeTimers({ now: new Date(2026, 11, 2, 9), toFake: ['Date'] });
    // An invented earlier week: board Mon 30 Nov – Sun 6 Dec, prep Sun 29 Nov and Wed 2 Dec.
    const earlier = {
      id: 4, name: 'Week of 30 Nov', startDate: '2026-11-30', endDate: '2026-12-06', prepDate: '2026-11-29', secondPrepDate: '2026-12-02',
      publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 14, version: 3,
    };
    const posts: { url: string; body: unknown }[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        if (init?.method === 'POST') {
          posts.push({ url, body: JSON.parse(String(init.body)) });
          return jsonResponse({ week: { ...earlier, id: 9 }, days: [], slots: [], prepDates: [], clients: [], plates: [], cells: [], trays: [], checks: [], inventory: [], cautions: [] }, 201);
        }
        return jsonResponse([earlier]);
      }),
    );
    renderInApp(<WeeksPage />, queryClientFor(coach));
    const from = (await screen.findByLabelText('Start from')) as HTMLSelectElement;
    expect(field('Second prep day').value).toBe('');
    fireEvent.change(from, { target: { value: '4' } });
    expect(field('Second prep day').value).toBe('2026-12-09');
    expect(screen.getByText(/Archived clients and archived plates stay behind/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Copy' }));
    await waitFor(() => expect(posts).toHaveLength(1));
    expect(posts[0]).toEqual({
      url: '/api/weeks/4/copy',
      body: { name: '', startDate: '2026-12-07', prepDate: '2026-12-06', secondPrepDate: '2026-12-09' },
    });
  });

  it('starts on the day a link gives (this week, from the glance), never proposing a prep day gone by', async () => {
    // Wednesday 9 December 2026; the week of 30 Nov ended on Sunday 6 Dec (invented).
    vi.useFakeTimers({ now: new Date(2026, 11, 9, 9), toFake: ['Date'] });
    const earlier = {
      id: 4, name: 'Week of 30 Nov', startDate: '2026-11-30', endDate: '2026-12-06', prepDate: '2026-11-29', secondPrepDate: '2026-12-02',
      publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 14, version: 3,
    };
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse([earlier])));
    render(
      <MemoryRouter initialEntries={['/weeks?from=4&start=2026-12-07']}>
        <QueryClientProvider client={queryClientFor(coach)}>
          <WeeksPage />
        </QueryClientProvider>
      </MemoryRouter>,
    );
    await screen.findByText(/Archived clients and archived plates stay behind/);
    expect(field('First day of the board').value).toBe('2026-12-07');
    // Its prep days shifted (Sun 6 Dec, Wed 9 Dec): the first is gone by, so today; the second, today too, is dropped.
    expect(field('Prep day').value).toBe('2026-12-09');
    expect(field('Second prep day').value).toBe('');
  });

  it('follows the address: the menu link from a copy form opens a new empty week, unless another week was picked', async () => {
    const earlier = {
      id: 4, name: 'Week of 30 Nov', startDate: '2026-11-30', endDate: '2026-12-06', prepDate: '2026-11-29', secondPrepDate: null,
      publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 14, version: 3,
    };
    const later = { ...earlier, id: 5, name: 'Week of 7 Dec', startDate: '2026-12-07', endDate: '2026-12-13', prepDate: '2026-12-06' };
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse([earlier, later])));
    const { router } = renderAtRoute(<WeeksPage />, '/weeks', '/weeks?from=4', coach);
    const from = () => screen.getByLabelText('Start from') as HTMLSelectElement;
    await waitFor(() => expect(from().value).toBe('4'));
    await act(() => router.navigate('/weeks'));
    await waitFor(() => expect(from().value).toBe(''));
    expect(screen.getByRole('button', { name: 'Create' })).toBeTruthy();
    // Opened from the later week's board, then the earlier one picked here: the coach's pick stays.
    await act(() => router.navigate('/weeks?from=5'));
    await waitFor(() => expect(from().value).toBe('5'));
    fireEvent.change(from(), { target: { value: '4' } });
    await act(() => router.navigate('/weeks'));
    expect(from().value).toBe('4');
    expect(screen.getByRole('button', { name: 'Copy' })).toBeTruthy();
  });

  it('opens the copied week saying what came over and what stayed behind', async () => {
    const earlier = {
      id: 4, name: 'Week of 30 Nov', startDate: '2026-11-30', endDate: '2026-12-06', prepDate: '2026-11-29', secondPrepDate: null,
      publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 14, version: 3,
    };
    const copy = { id: 9, name: 'Week of 7 Dec', startDate: '2026-12-07', endDate: '2026-12-13', prepDate: '2026-12-06', secondPrepDate: null, publishedVersion: null, publishedAt: null, changedSincePublished: false, cellCount: 12, version: 1 };
    const board = { week: copy, days: ['2026-12-07'], slots: ['breakfast'], prepDates: ['2026-12-06'], clients: [], plates: [], cells: [], trays: [], checks: [], inventory: [], cautions: [] };
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        if (init?.method === 'POST') return jsonResponse({ ...board, copied: { meals: 12, leftBehind: 2 } }, 201);
        if (url === '/api/weeks/9') return jsonResponse(board);
        return jsonResponse(url === '/api/weeks' ? [earlier] : []);
      }),
    );
    render(
      <MemoryRouter initialEntries={['/weeks']}>
        <QueryClientProvider client={queryClientFor(coach)}>
          <Routes>
            <Route path="/weeks" element={<WeeksPage />} />
            <Route path="/weeks/:weekId" element={<WeekPage />} />
          </Routes>
        </QueryClientProvider>
      </MemoryRouter>,
    );
    fireEvent.change(await screen.findByLabelText('Start from'), { target: { value: '4' } });
    fireEvent.click(screen.getByRole('button', { name: 'Copy' }));
    expect(await screen.findByText('Copied from Week of 30 Nov')).toBeTruthy();
    expect(screen.getByText(/^12 meals came over, with the tray counts\. 2 meals stayed behind: their client or plate is archived\.$/)).toBeTruthy();
  });
});

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
});
