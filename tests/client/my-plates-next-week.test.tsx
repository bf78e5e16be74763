import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, within } from '@testing-library/react';
import { dayLabel } from '@/lib/dates';
import { day, plate, showMyPlates } from './my-plates-fixtures';

// A client's plates on the last evening of a week, with next week published: invented plates and numbers.
const week = (next: unknown, days = [day('2026-01-10', plate('Egg slab')), day('2026-01-11', plate('Chive square'))]) => ({
  weekId: 7, name: 'Week of Mon 5 Jan', publishedVersion: 2, publishedAt: '2026-01-03T18:00:00Z', startDate: '2026-01-05', endDate: '2026-01-11',
  days, next, cautions: [],
});
const nextWeek = {
  weekId: 8, name: 'Week of Mon 12 Jan', publishedVersion: 1, startDate: '2026-01-12', endDate: '2026-01-18',
  days: [day('2026-01-12', plate('Frozen frittata', { storage: 'frozen', thawOn: '2026-01-11', eatBy: null })), day('2026-01-13', plate('Bacon cup'))],
};

// Sunday 11 January 2026, evening.
const show = (body: unknown) => showMyPlates(body, new Date(2026, 0, 11, 18));

describe("a client's plates with next week published", () => {
  it("tells them tonight to move next week's frozen Monday plate to the fridge, and lists next week's days to look ahead", async () => {
    show(week(nextWeek));
    await screen.findByText('Tonight: move a frozen plate to the fridge');
    const tonight = screen.getAllByRole('note').find((n) => n.textContent?.includes('Tonight: move a frozen plate to the fridge'))!;
    expect(tonight.textContent).toContain(`Frozen frittata (breakfast, ${dayLabel('2026-01-12', true)})`);
    const ahead = screen.getByRole('heading', { name: 'Next week' }).closest('section, div')!;
    expect(within(ahead as HTMLElement).getByText(/^Week of Mon 12 Jan, from /)).toBeTruthy();
    fireEvent.click(within(ahead as HTMLElement).getByRole('button', { name: /Bacon cup/ }));
    expect(screen.getByRole('heading', { level: 2, name: 'Bacon cup' })).toBeTruthy();
    // The calendar file is this week's own (none here: no frozen plate on it); next week's files are its own.
    expect(screen.queryByRole('link', { name: 'Thaw reminders for my calendar' })).toBeNull();
    expect(screen.getByRole('link', { name: 'Download next week (PDF)' }).getAttribute('href')).toBe('/api/weeks/mine/plan.pdf?today=2026-01-12');
    expect(screen.getByRole('link', { name: 'Its thaw reminders for my calendar' }).getAttribute('href')).toBe('/api/weeks/mine/thaw-reminders.ics?today=2026-01-12');
  });

  it('shows next week alone when this week has no plates for them', async () => {
    show(week(nextWeek, []));
    expect(await screen.findByRole('heading', { name: 'Next week' })).toBeTruthy();
    expect(screen.queryByText('No plan yet')).toBeNull();
    expect(screen.queryByRole('heading', { name: 'The week at a glance' })).toBeNull();
    expect(screen.queryByRole('link', { name: 'Download my week (PDF)' })).toBeNull();
  });

  it('says nothing of next week while none is published', async () => {
    show(week(null));
    expect(await screen.findByRole('heading', { name: 'The week at a glance' })).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Next week' })).toBeNull();
    expect(screen.queryByText(/move a frozen plate/)).toBeNull();
  });
});

afterEach(() => {
  vi.useRealTimers();
  vi.unstubAllGlobals();
});
