import { describe, expect, it, vi } from 'vitest';
import { render, screen } from '@testing-library/react';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { QueryClientProvider } from '@tanstack/react-query';
import { Component as ShoppingThisWeek } from '@/app/routes/shopping/shopping-this-week.route';
import { Component as LabelsThisWeek } from '@/app/routes/shopping/labels-this-week.route';
import { jsonResponse, queryClientFor, signedIn } from './render';
import { dayLabel } from '@/lib/dates';

// "Shopping list" and "Labels" in the assistant's navigation; an invented week, "today" pinned with fake timers.
const week = {
  id: 7, name: 'Week of Jan 5', startDate: '2026-01-05', endDate: '2026-01-11', prepDate: '2026-01-04', secondPrepDate: '2026-01-07',
  publishedVersion: 1, publishedAt: null, changedSincePublished: false, cellCount: 9, version: 3,
};

function open(page: 'shopping' | 'labels', now: Date) {
  vi.useFakeTimers({ now, toFake: ['Date'] });
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(week)));
  render(
    <MemoryRouter initialEntries={[`/${page}`]}>
      <QueryClientProvider client={queryClientFor(signedIn({ role: 'assistant' }))}>
        <Routes>
          <Route path="/shopping" element={<ShoppingThisWeek />} />
          <Route path="/labels" element={<LabelsThisWeek />} />
          <Route path="/weeks/:id/shopping" element={<p>the list opened</p>} />
          <Route path="/weeks/:id/labels" element={<p>the labels opened</p>} />
        </Routes>
      </QueryClientProvider>
    </MemoryRouter>,
  );
}

describe("the assistant's shopping list and labels from the navigation", () => {
  it('opens the list of the next prep day still ahead', async () => {
    open('shopping', new Date(2026, 0, 6, 9));
    expect(await screen.findByText('the list opened')).toBeTruthy();
  });

  it('says no prep day is ahead rather than open a list whose prep days have passed, with the way to it', async () => {
    open('shopping', new Date(2026, 0, 9, 9));
    expect(await screen.findByRole('heading', { name: 'No prep day ahead' })).toBeTruthy();
    expect(screen.getByText(`Week of Jan 5’s prep days (${dayLabel('2026-01-04', true)} and ${dayLabel('2026-01-07', true)}) have passed, and no later prep day is planned yet.`)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Open Week of Jan 5’s shopping list' }).getAttribute('href')).toBe('/weeks/7/shopping');
    expect(screen.queryByText('the list opened')).toBeNull();
  });

  it('opens the labels as they are after prep day (printing one again is common)', async () => {
    open('labels', new Date(2026, 0, 9, 9));
    expect(await screen.findByText('the labels opened')).toBeTruthy();
  });
});
