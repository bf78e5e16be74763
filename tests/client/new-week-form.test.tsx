import { describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { Component as WeeksPage } from '@/app/routes/weeks/weeks.route';
import { jsonResponse, queryClientFor, renderInApp, signedIn } from './render';

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

  it('moves the prep day with the first day of the board until the coach picks one', () => {
    show();
    fireEvent.change(field('First day of the board'), { target: { value: '2026-12-21' } });
    expect(field('Prep day').value).toBe('2026-12-20');
    fireEvent.change(field('Prep day'), { target: { value: '2026-12-19' } });
    fireEvent.change(field('First day of the board'), { target: { value: '2026-12-28' } });
    expect(field('Prep day').value).toBe('2026-12-19');
  });
});
