import { describe, expect, it } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { dayLabel } from '@/lib/dates';
import { day, plate, showMyPlates } from './my-plates-fixtures';

// Which day a client's phone opens on, and what it says once the published week is over: invented plates and dates.
const week = (days: ReturnType<typeof day>[]) => ({
  weekId: 7, name: 'Week of Mon 5 Jan', publishedVersion: 2, publishedAt: '2026-01-03T18:00:00Z', startDate: '2026-01-05', endDate: '2026-01-11',
  days, next: null, cautions: [],
});
const days = [
  day('2026-01-05', plate('Egg slab', { eatBy: '2026-01-08' })),
  day('2026-01-07', plate('Chive square', { eatBy: '2026-01-08' })),
  day('2026-01-09', plate('Bacon cup', { eatBy: '2026-01-11' })),
  day('2026-01-10', plate('Frozen frittata', { storage: 'frozen', thawOn: '2026-01-09', eatBy: null })),
];

describe("which day a client's plates open on", () => {
  it("opens on today's plate, with its eat-by date", async () => {
    showMyPlates(week(days), new Date(2026, 0, 7, 7));
    expect(await screen.findByRole('heading', { level: 1, name: "Today's plate" })).toBeTruthy();
    expect(screen.getByRole('heading', { level: 2, name: 'Chive square' })).toBeTruthy();
    expect(screen.getByText(`Eat by ${dayLabel('2026-01-08', true)}`)).toBeTruthy();
  });

  it('opens on the next day with a plate, said as the next plate, when today has none', async () => {
    showMyPlates(week(days), new Date(2026, 0, 8, 7));
    expect(await screen.findByRole('heading', { level: 1, name: 'My plates' })).toBeTruthy();
    expect(screen.getByText(`Next plate: ${dayLabel('2026-01-09', true)}`)).toBeTruthy();
    expect(screen.getByRole('heading', { level: 2, name: 'Bacon cup' })).toBeTruthy();
    // Friday evening is when Saturday's frozen plate goes to the fridge: still ahead, so said.
    expect(screen.getByRole('button', { name: /Bacon cup/ }).textContent).toContain('❄ thaw tonight');
  });

  it('never opens on a day gone by: no more plates this week', async () => {
    showMyPlates(week(days), new Date(2026, 0, 11, 7));
    expect(await screen.findByRole('heading', { name: 'No more plates this week' })).toBeTruthy();
    expect(screen.queryByRole('heading', { level: 2, name: 'Egg slab' })).toBeNull();
  });

  it('says the last plan has ended when no week covers today, and marks a past plate as past its eat-by date', async () => {
    showMyPlates(week(days), new Date(2026, 0, 12, 7));
    expect(await screen.findByRole('heading', { name: 'Nothing planned today' })).toBeTruthy();
    expect(screen.getByText(new RegExp(`Your last plan ended on ${dayLabel('2026-01-11', true)}\\. Your coach has not published your next week yet`))).toBeTruthy();
    expect(screen.getByText(dayLabel('2026-01-12', true))).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Your last week' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Download last week (PDF)' })).toBeTruthy();
    // Evenings gone by are no longer "tonight".
    expect(screen.queryByText(/thaw tonight/)).toBeNull();
    expect(screen.queryByRole('link', { name: 'Thaw reminders for my calendar' })).toBeNull();
    // Looking back at a day: its plate is past its eat-by date, and the page says not to eat it.
    fireEvent.click(screen.getByRole('button', { name: /Bacon cup/ }));
    expect(screen.getByRole('heading', { level: 2, name: 'Bacon cup' })).toBeTruthy();
    expect(screen.getByText(`Past its eat-by date (${dayLabel('2026-01-11', true)})`)).toBeTruthy();
    expect(screen.getByText('If it is still in your fridge, throw it away: do not eat it.')).toBeTruthy();
    expect(screen.queryByText(/move a frozen plate/)).toBeNull();
  });
});
