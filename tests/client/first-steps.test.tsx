import { describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import { jsonResponse as json, renderInApp } from './render';
import { FirstSteps } from '@/app/routes/home/first-steps';

// A new coach's home: how much the workspace already has, as the home glance counts it (invented counts).

function show(have: { trays?: number; plates?: number; clients?: number; ovens?: number; weeks?: number }, fail = false) {
  const setup = { trays: 0, plates: 0, clients: 0, ovens: 0, weeks: 0, ...have };
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string) => {
      const path = String(url).split('?')[0];
      if (path !== '/api/weeks/glance') throw new Error(`unexpected ${path}`);
      if (fail) return json({ status: 500, title: 'Internal server error', detail: 'Something went wrong' }, 500);
      return json({ week: null, warnings: 0, blocks: 0, portionsShort: 0, nextPrepDate: null, setup });
    }),
  );
  renderInApp(<FirstSteps />);
}

describe('first steps', () => {
  it('an empty workspace: nothing done, the first step leads to a new base tray', async () => {
    show({});
    expect(await screen.findByRole('heading', { name: 'First steps' })).toBeTruthy();
    const bar = screen.getByRole('progressbar', { name: 'Steps done' });
    expect(bar.getAttribute('aria-valuenow')).toBe('0');
    expect(bar.getAttribute('aria-valuemax')).toBe('5');
    const steps = screen.getAllByRole('listitem');
    expect(steps.map((s) => s.querySelector('p')?.textContent)).toEqual([
      'Write a base tray (to do)',
      'Make a plate (to do)',
      'Add your clients (to do)',
      'Describe your ovens (to do)',
      'Plan a week (to do)',
    ]);
    expect(within(steps[0]).getByRole('link', { name: 'New base tray' }).getAttribute('href')).toBe('/trays/new');
    expect(within(steps[4]).getByRole('link', { name: 'Week board' }).getAttribute('href')).toBe('/weeks');
  });

  it('ticks off what the workspace has and drops its link', async () => {
    show({ trays: 2, plates: 1, ovens: 1 });
    const bar = await screen.findByRole('progressbar', { name: 'Steps done' });
    expect(bar.getAttribute('aria-valuenow')).toBe('3');
    const steps = screen.getAllByRole('listitem');
    expect(steps[0].textContent).toContain('(done)');
    expect(within(steps[0]).queryByRole('link')).toBeNull();
    expect(steps[2].textContent).toContain('(to do)');
    expect(within(steps[2]).getByRole('link', { name: 'Clients' }).getAttribute('href')).toBe('/clients');
  });

  it('is gone once every step is done', async () => {
    show({ trays: 1, plates: 1, clients: 1, ovens: 1, weeks: 1 });
    await vi.waitFor(() => expect(screen.queryByLabelText('Loading your first steps')).toBeNull());
    expect(screen.queryByRole('heading', { name: 'First steps' })).toBeNull();
  });

  it('shows the error with a way to try again when a list cannot be read', async () => {
    show({}, true);
    expect(await screen.findByRole('button', { name: /try again/i })).toBeTruthy();
  });
});
