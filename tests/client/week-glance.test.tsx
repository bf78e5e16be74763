import { beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import { jsonResponse as json, renderInApp } from './render';
import { WeekGlance } from '@/features/weeks/components/week-glance';
import { dayLabel, setKitchenZone } from '@/lib/dates';

// The coach's "this week at a glance": invented glance values for the check; "today" is pinned with fake timers.
const week = { id: 7, name: 'Week of Jan 5', startDate: '2026-01-05', endDate: '2026-01-11', prepDate: '2026-01-04', secondPrepDate: '2026-01-07', publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 9, version: 3 };
const glance = (over: Record<string, unknown> = {}) => ({
  week,
  warnings: 2,
  blocks: 0,
  portionsShort: 0,
  nextPrepDate: '2026-01-07',
  publishedAllergens: { clients: 0, plates: 0 },
  ...over,
});

function show(body: unknown) {
  const fetch = vi.fn(async (_url: string) => json(body));
  vi.stubGlobal('fetch', fetch);
  renderInApp(<WeekGlance />);
  return fetch;
}

describe('week glance', () => {
  // Inside the week (Tuesday 6 January) unless a check pins another day.
  beforeEach(() => {
    vi.useFakeTimers({ now: new Date(2026, 0, 6, 9), toFake: ['Date'] });
  });

  it('asks for the glance of the local day and names the next prep day, the warnings and the portions short', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 5, 9), toFake: ['Date'] });
    const fetch = show(glance({ portionsShort: 3, blocks: 1 }));
    expect(await screen.findByText(`Next prep day: ${dayLabel('2026-01-07', true)}`)).toBeTruthy();
    expect(String(fetch.mock.calls[0][0])).toBe('/api/weeks/glance?today=2026-01-05');
    expect(screen.getByText('3 warnings')).toBeTruthy();
    // The week is published (v1): the board's problems stop the next version.
    expect(screen.getByText('1 blocks publishing a new version')).toBeTruthy();
    expect(screen.getByText('3 portions short')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Week of Jan 5' }).getAttribute('href')).toBe('/weeks/7');
  });

  it('asks for the kitchen’s day when the kitchen has a time zone (a coach travelling, or past midnight elsewhere)', async () => {
    // 2026-01-05 22:30 UTC is already Tuesday 6 January, 11:30, in Auckland (UTC+13 in January, IANA tz database).
    vi.useFakeTimers({ now: new Date(Date.UTC(2026, 0, 5, 22, 30)), toFake: ['Date'] });
    setKitchenZone('Pacific/Auckland');
    try {
      const fetch = show(glance());
      await screen.findByText('2 warnings');
      expect(String(fetch.mock.calls[0][0])).toBe('/api/weeks/glance?today=2026-01-06');
    } finally {
      setKitchenZone(null);
    }
  });

  it('says the problems block publishing, for a week never published', async () => {
    show(glance({ week: { ...week, publishedVersion: null }, blocks: 2 }));
    expect(await screen.findByText('2 block publishing')).toBeTruthy();
  });

  it('says "(today)" when the next prep day is today', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 7, 7), toFake: ['Date'] });
    show(glance());
    expect(await screen.findByText(`Next prep day: ${dayLabel('2026-01-07', true)} (today)`)).toBeTruthy();
    expect(screen.getByText('None blocks publishing')).toBeTruthy();
  });

  it('names the week planned after it, with its state and plates', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 8, 9), toFake: ['Date'] });
    show(glance({ nextWeek: { id: 8, name: 'Week of Jan 12', startDate: '2026-01-12', cellCount: 1, publishedVersion: null } }));
    const next = await screen.findByRole('link', { name: 'Week of Jan 12' });
    expect(next.getAttribute('href')).toBe('/weeks/8');
    expect(next.parentElement!.textContent).toBe('After it: Week of Jan 12 · draft · 1 plate placed');
  });

  it('offers to plan the next week from this one when nothing comes after it', async () => {
    show(glance({ nextWeek: null }));
    const plan = await screen.findByRole('link', { name: 'Plan the next week from this one' });
    expect(plan.getAttribute('href')).toBe('/weeks?from=7');
    expect(screen.getByText(/^Nothing planned after this week yet\./)).toBeTruthy();
  });

  it('names the trays the cooling record has thrown away or past a deadline, with a link to that prep day’s record', async () => {
    show(
      glance({
        cooling: {
          thrownAway: [{ trayName: 'Egg slab (2/3)', prepDate: '2026-01-07' }],
          missed: [{ trayName: 'Radish tray', prepDate: '2026-01-04' }],
        },
      }),
    );
    expect(await screen.findByText('Cooling record: 1 tray thrown away, 1 tray past a cooling deadline')).toBeTruthy();
    const links = screen.getAllByRole('link', { name: 'cooling record' }).map((a) => a.getAttribute('href'));
    expect(links).toEqual(['/weeks/7/bake-run?prepDate=2026-01-07', '/weeks/7/bake-run?prepDate=2026-01-04']);
    expect(screen.getByText(/Egg slab \(2\/3\), prep .*: thrown away; its portions no longer count as baked/)).toBeTruthy();
  });

  it('says nothing of cooling when the record has no trouble', async () => {
    show(glance({ cooling: { thrownAway: [], missed: [] } }));
    await screen.findByText('2 warnings');
    expect(screen.queryByText(/Cooling record/)).toBeNull();
  });

  it('says when the published version holds plates with an allergen put on a client’s list since, and leads to the week', async () => {
    show(glance({ publishedAllergens: { clients: 2, plates: 3 } }));
    const notice = (await screen.findByText('Published version 1: 3 plates from today on hold an allergen put on 2 clients’ lists since')).closest('[role="alert"]')!;
    expect(notice.textContent).toContain('Their phones and plan PDFs say not to eat them before asking you.');
    expect(within(notice as HTMLElement).getByRole('link', { name: 'See which on the week' }).getAttribute('href')).toBe('/weeks/7');
  });

  it('words one plate on one client’s list, and says nothing when there is none', async () => {
    show(glance({ publishedAllergens: { clients: 1, plates: 1 } }));
    expect(await screen.findByText('Published version 1: 1 plate from today on holds an allergen put on a client’s list since')).toBeTruthy();
    cleanup();
    show(glance());
    await screen.findByText('2 warnings');
    expect(screen.queryByText(/Published version/)).toBeNull();
  });

  it('says nothing is planned for this week when the latest week has ended, and offers to plan this one from it', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 12, 8), toFake: ['Date'] });
    show(glance({ nextWeek: null, nextPrepDate: null, cooling: { thrownAway: [{ trayName: 'Egg slab', prepDate: '2026-01-07' }], missed: [] } }));
    const notice = (await screen.findByText('Nothing planned for this week')).closest('[role]') as HTMLElement;
    expect(notice.textContent).toContain(`The latest week, Week of Jan 5, ended on ${dayLabel('2026-01-11', true)}. Clients see no plate for today`);
    // This week's board keeps the ended week's rhythm (boards from Monday): Monday 12 January, today.
    expect(within(notice).getByRole('link', { name: 'Plan this week from a copy of it' }).getAttribute('href')).toBe('/weeks?from=7&start=2026-01-12');
    // The ended week's warnings, portions and cooling are not this week's news.
    expect(screen.queryByText('2 warnings')).toBeNull();
    expect(screen.queryByText(/Cooling record/)).toBeNull();
  });

  it('starts this week on the weekday the ended week started on, when the coach looks in mid-week or weeks later', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 14, 8), toFake: ['Date'] }); // Wednesday 14 January
    show(glance({ nextWeek: null, nextPrepDate: null }));
    expect((await screen.findByRole('link', { name: 'Plan this week from a copy of it' })).getAttribute('href')).toBe('/weeks?from=7&start=2026-01-12');
    cleanup();
    vi.useFakeTimers({ now: new Date(2026, 1, 1, 8), toFake: ['Date'] }); // Sunday 1 February
    show(glance({ nextWeek: null, nextPrepDate: null }));
    expect((await screen.findByRole('link', { name: 'Plan this week from a copy of it' })).getAttribute('href')).toBe('/weeks?from=7&start=2026-01-26');
  });

  it('heads a week that has not started yet as coming up', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 2, 8), toFake: ['Date'] });
    show(glance());
    expect(await screen.findByRole('heading', { name: `Coming up: from ${dayLabel('2026-01-05', true)}` })).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'This week at a glance' })).toBeNull();
    expect(screen.getByText('2 warnings')).toBeTruthy();
  });

  it('shows nothing when no week is planned', async () => {
    const fetch = show(glance({ week: null, nextPrepDate: null }));
    await vi.waitFor(() => expect(fetch).toHaveBeenCalled());
    await vi.waitFor(() => expect(screen.queryByLabelText('Loading this week')).toBeNull());
    expect(screen.queryByText(/Next prep day/)).toBeNull();
  });
});
