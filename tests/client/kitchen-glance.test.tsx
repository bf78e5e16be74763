import { describe, expect, it, vi } from 'vitest';
import { cleanup, screen } from '@testing-library/react';
import { jsonResponse as json, renderInApp } from './render';
import { KitchenGlance } from '@/features/shopping/components/kitchen-glance';
import { dayLabel } from '@/lib/dates';

// The assistant's "this week": invented week and list values for the check; "today" is pinned with fake timers.
const week = { id: 7, name: 'Week of Jan 5', startDate: '2026-01-05', endDate: '2026-01-11', prepDate: '2026-01-04', secondPrepDate: '2026-01-07', publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 9, version: 3 };
const list = (over: Record<string, unknown> = {}) => ({ weekId: 7, aisles: [], itemCount: 12, checkedCount: 5, totalCostCents: 0, costComplete: true, problems: [], bought: null, ...over });

function show(current: unknown, shopping: unknown = list()) {
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string) => (url.startsWith('/api/weeks/current?') ? json(current) : url.startsWith('/api/weeks/7/shopping') ? json(shopping) : json(null))),
  );
  renderInApp(<KitchenGlance />);
}

describe('kitchen glance', () => {
  it('names the next prep day still to come, the shopping progress, and links the week’s bake run and labels', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 5, 9), toFake: ['Date'] });
    show(week);
    // The kitchen's week for the device's day.
    await vi.waitFor(() => expect(vi.mocked(fetch).mock.calls.map(([u]) => u)).toContain('/api/weeks/current?today=2026-01-05'));
    // Sunday's prep is past on Monday: Wednesday's is next.
    expect(await screen.findByText(`Next prep day: ${dayLabel('2026-01-07', true)}`)).toBeTruthy();
    const bar = await screen.findByRole('progressbar', { name: 'In the trolley' });
    expect(bar.getAttribute('aria-valuenow')).toBe('5');
    expect(bar.getAttribute('aria-valuemax')).toBe('12');
    // Two prep days: the list of the next one (Wednesday's trip).
    expect(screen.getByRole('link', { name: `Shopping list for prep ${dayLabel('2026-01-07')}` }).getAttribute('href')).toBe('/weeks/7/shopping?for=2026-01-07');
    expect(vi.mocked(fetch).mock.calls.map(([u]) => u)).toContain('/api/weeks/7/shopping?prepDate=2026-01-07');
    expect(screen.getByRole('link', { name: 'Bake run' }).getAttribute('href')).toBe('/weeks/7/bake-run');
    expect(screen.getByRole('link', { name: 'Labels' }).getAttribute('href')).toBe('/weeks/7/labels');
    expect(screen.queryByText('Not published yet')).toBeNull();
  });

  it('says when the week is not published, and when the list was marked bought', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 4, 9), toFake: ['Date'] });
    show({ ...week, publishedVersion: null }, list({ bought: { at: '2026-01-03T18:00:00Z', by: 'Kit' } }));
    expect(await screen.findByText(`Next prep day: ${dayLabel('2026-01-04', true)} (today)`)).toBeTruthy();
    expect(await screen.findByText(/^Marked bought .*: the pantry is up to date\.$/)).toBeTruthy();
    expect(screen.getByText('Not published yet')).toBeTruthy();
  });

  it("links the whole week's list when the week has one prep day", async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 3, 9), toFake: ['Date'] });
    show({ ...week, secondPrepDate: null });
    expect((await screen.findByRole('link', { name: 'Shopping list' })).getAttribute('href')).toBe('/weeks/7/shopping');
    expect(await screen.findByRole('progressbar', { name: 'In the trolley' })).toBeTruthy();
    expect(vi.mocked(fetch).mock.calls.map(([u]) => u)).toContain('/api/weeks/7/shopping');
  });

  it('says when the week has no prep day left, and when it has ended with nothing planned after it', async () => {
    vi.useFakeTimers({ now: new Date(2026, 0, 9, 9), toFake: ['Date'] });
    show(week);
    expect(await screen.findByText('No prep day ahead this week')).toBeTruthy();
    expect(screen.getByText('The coach has not planned the next prep day yet.')).toBeTruthy();
    cleanup();
    vi.useFakeTimers({ now: new Date(2026, 0, 12, 9), toFake: ['Date'] });
    show(week);
    expect(await screen.findByText('No prep day planned')).toBeTruthy();
    expect(screen.getByText(`Week of Jan 5 ended on ${dayLabel('2026-01-11', true)}; the coach has not planned the next week yet.`)).toBeTruthy();
  });

  it('shows the empty state when the coach has planned no week', async () => {
    show(null);
    expect(await screen.findByRole('heading', { name: 'No prep week yet' })).toBeTruthy();
  });
});
