import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import type { BakeRunResult } from '@shared/domain/bake-run-types';
import { BakeRunTimers, type KitchenChange, type MoveStart } from '@/features/bake-runs/components/bake-run-timers';
import { ApiError } from '@/lib/problem';

// Invented runs (only the fields the timers card reads) of one tray, "Egg slab", in the left oven.
const step = (kind: string, minute: number, tempF = 350) => ({ kind, minute, trayId: 't1', oven: 'Left', tempF });
const runOf = (events: ReturnType<typeof step>[], start = '2026-01-04T08:00') =>
  ({ start, trays: [{ id: 't1', name: 'Egg slab', outAt: `${start.slice(0, 10)}T08:30`, outMinute: 30 }], events }) as unknown as BakeRunResult;
/** In at 08:12, checked at 08:30, from `start`. */
const runAt = (start: string) => runOf([step('tray-in', 12), step('first-check', 30)], start);
const problem = (status: number, code: string, detail: string, errors?: Record<string, string[]>) =>
  new ApiError({ type: 'about:blank', title: 'Refused', status, code, detail, ...(errors ? { errors } : {}) });
const move = (over: Partial<MoveStart> = {}): MoveStart => ({ saving: false, error: null, onMove: vi.fn(), onReload: vi.fn(), ...over });

describe('now and next on prep day', () => {
  it('counts down to a tray’s time out and to the cooling deadlines too, not only to checks', () => {
    const run = runOf([step('first-check', 30), step('tray-out', 35), step('cool-to-70-by', 155, 70), step('fridge-41-by', 395, 41)]);
    render(<BakeRunTimers run={run} unit="F" nowMinute={33} />);
    const items = screen.getAllByRole('listitem').map((li) => li.textContent?.replace(/\s+/g, ' '));
    // The check 3 minutes ago has dropped off (past events stay 2 minutes); the rest count down.
    expect(items).toEqual(['in 2 minEgg slab out', 'in 122 minEgg slab at 70 °F or below by now', 'in 362 minEgg slab at 41 °F or below, in the fridge, by now']);
  });

  it('a tray taken out at its check time is one line, the check', () => {
    const run = runOf([step('first-check', 30), step('tray-out', 30)]);
    render(<BakeRunTimers run={run} unit="F" nowMinute={20} />);
    expect(screen.getAllByRole('listitem').map((li) => li.textContent)).toEqual(['in 10 minCheck Egg slab']);
  });
});

describe('moving a run to when the kitchen really started', () => {
  it('sends the typed time on the run’s day, and says so once the plan starts there', () => {
    const m = move();
    const { rerender } = render(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={5} move={m} />);
    fireEvent.click(screen.getByText('Started at another time?'));
    expect(screen.getByText(/Planned 08:00/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText(/Started at/), { target: { value: '08:40' } });
    fireEvent.click(screen.getByRole('button', { name: 'Move the plan' }));
    expect(m.onMove).toHaveBeenCalledWith('2026-01-04T08:40');
    // The answer is the plan from 08:40.
    rerender(<BakeRunTimers run={runAt('2026-01-04T08:40')} unit="F" nowMinute={0} move={m} />);
    expect(screen.getByRole('status').textContent).toBe('The plan now starts at 08:40.');
  });

  it('puts a refused time under the field, and a stale run behind a reload', () => {
    const reload = vi.fn();
    const { unmount } = render(
      <BakeRunTimers
        run={runAt('2026-01-04T08:00')}
        unit="F"
        nowMinute={5}
        move={move({ error: problem(400, 'validation', 'Invalid', { start: ['The run starts on its prep day, Sunday 4 January 2026: keep that date and change the time.'] }) })}
      />,
    );
    expect(screen.getByLabelText(/Started at/).getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/keep that date and change the time/)).toBeTruthy();
    unmount();
    render(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={5} move={move({ error: problem(409, 'stale_version', 'Someone else changed this'), onReload: reload })} />);
    expect(screen.getByText('Someone changed this run meanwhile')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Load their version' }));
    expect(reload).toHaveBeenCalled();
    expect(screen.queryByText('Start not moved')).toBeNull();
  });

  it('offers the time it is when the question is opened, not when the page was', () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    try {
      vi.setSystemTime(new Date(2026, 0, 4, 7, 50));
      render(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={-10} move={move()} />);
      vi.setSystemTime(new Date(2026, 0, 4, 8, 22));
      const details = screen.getByText('Started at another time?').closest('details')!;
      details.open = true;
      fireEvent(details, new Event('toggle'));
      expect((screen.getByLabelText(/Started at/) as HTMLInputElement).value).toBe('08:22');
    } finally {
      vi.useRealTimers();
    }
  });

  it('is not offered where the run is not saved (the planner gives no move)', () => {
    render(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={5} />);
    expect(screen.queryByText('Started at another time?')).toBeNull();
  });
});

describe('the kitchen as it is on prep day', () => {
  const ovens = [{ id: 1, name: 'Left' }, { id: 2, name: 'Right' }];
  const kitchenOf = (over: Partial<KitchenChange> = {}): KitchenChange => ({
    allOvens: ovens,
    ovenIds: [1, 2],
    cooks: 2,
    done: null,
    version: 3,
    saving: false,
    error: null,
    onChange: vi.fn(),
    onReload: vi.fn(),
    ...over,
  });
  const box = (name: string) => screen.getByRole('checkbox', { name }) as HTMLInputElement;

  it('sends the ovens that work and the cooks who came, from the version shown, and says what the plan now uses', () => {
    const k = kitchenOf();
    const { rerender } = render(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={-20} kitchen={k} />);
    fireEvent.click(screen.getByText('An oven down or a cook missing?'));
    fireEvent.click(box('Right'));
    fireEvent.change(screen.getByLabelText('Cooks here today'), { target: { value: '1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Plan again' }));
    expect(k.onChange).toHaveBeenCalledWith(1, [1], 3, { out: [] });
    // Sent, not yet answered: nothing claims it is planned again.
    expect(screen.queryByText(/^Planned again/)).toBeNull();
    // The answer: the run now uses the left oven and one cook (version 4).
    rerender(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={-20} kitchen={{ ...k, ovenIds: [1], cooks: 1, version: 4 }} />);
    expect(screen.getByText('Planned again with Left and one cook.')).toBeTruthy();
    expect(box('Right').checked).toBe(false);
  });

  it('follows a change saved elsewhere while nothing is ticked, and keeps the person’s own choice otherwise', () => {
    const k = kitchenOf();
    const { rerender } = render(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={-20} kitchen={k} />);
    rerender(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={-20} kitchen={{ ...k, cooks: 3, version: 4 }} />);
    expect((screen.getByLabelText('Cooks here today') as HTMLInputElement).value).toBe('3');
    fireEvent.click(box('Left'));
    rerender(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={-20} kitchen={{ ...k, cooks: 1, version: 5 }} />);
    expect(box('Left').checked).toBe(false);
    expect((screen.getByLabelText('Cooks here today') as HTMLInputElement).value).toBe('3');
    fireEvent.click(screen.getByRole('button', { name: 'Plan again' }));
    // Sent against version 4, the one its choice started from: the server answers 409 rather than overwrite 5.
    expect(k.onChange).toHaveBeenCalledWith(3, [2], 4, { out: [] });
  });

  it('names a refused oven choice and puts a stale run behind a reload', () => {
    const reload = vi.fn();
    const { unmount } = render(
      <BakeRunTimers
        run={runAt('2026-01-04T08:00')}
        unit="F"
        nowMinute={-20}
        kitchen={kitchenOf({ error: problem(400, 'validation', 'Invalid', { ovenIds: ['At least one oven has to work to bake.'] }) })}
      />,
    );
    expect(screen.getByRole('alert').textContent).toBe('⚠ At least one oven has to work to bake.');
    unmount();
    render(<BakeRunTimers run={runAt('2026-01-04T08:00')} unit="F" nowMinute={-20} kitchen={kitchenOf({ error: problem(409, 'stale_version', 'Stale'), onReload: reload })} />);
    fireEvent.click(screen.getByRole('button', { name: 'Load their version' }));
    expect(reload).toHaveBeenCalled();
  });

  it('says a refusal about a field the form does not show (nothing ticked, so no "plan the rest from") instead of dropping it', () => {
    render(
      <BakeRunTimers
        run={runAt('2026-01-04T08:00')}
        unit="F"
        nowMinute={-20}
        kitchen={kitchenOf({ error: problem(400, 'validation', 'Invalid', { from: ['The run starts at 08:00: plan the rest from then or later.'] }) })}
      />,
    );
    expect(screen.getByText('Not planned again')).toBeTruthy();
    expect(screen.getByText('The run starts at 08:00: plan the rest from then or later.')).toBeTruthy();
  });

  // Part-way through the day (invented run): the slabs came out at 08:37 and 08:45; the crackers went into the left
  // oven at 09:40 and are due at 10:15.
  const midDay = {
    start: '2026-01-04T08:00',
    trays: [
      { id: '7-1', name: 'Egg slab (1/2)', oven: 'Left', inMinute: 12, outAt: '2026-01-04T08:37', outMinute: 37 },
      { id: '9-1', name: 'Seed crackers', oven: 'Left', inMinute: 100, outAt: '2026-01-04T10:15', outMinute: 135 },
      { id: '7-2', name: 'Egg slab (2/2)', oven: 'Right', inMinute: 20, outAt: '2026-01-04T08:45', outMinute: 45 },
    ],
    events: [step('tray-in', 100)],
  } as unknown as BakeRunResult;

  it('part-way through, offers the trays planned out by now ticked and plans the rest from a time', () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date(2026, 0, 4, 9, 50));
    try {
      const k = kitchenOf();
      const { rerender } = render(<BakeRunTimers run={midDay} unit="F" nowMinute={110} kitchen={k} />);
      const details = screen.getByText('An oven down or a cook missing?').closest('details')!;
      details.open = true;
      fireEvent(details, new Event('toggle'));
      // Ticked, in the order they come out: the slabs out by 09:50, and the crackers baking in an oven that works
      // (they stay in): the rest waits until they come out.
      const trays = () => (screen.getAllByRole('checkbox').slice(3) as HTMLInputElement[]).map((b) => [b.parentElement?.textContent, b.checked]); // after the sound and the two ovens
      expect(trays()).toEqual([
        ['Egg slab (1/2) · out 08:37', true],
        ['Egg slab (2/2) · out 08:45', true],
        ['Seed crackers · out 10:15', true],
      ]);
      expect((screen.getByLabelText('Plan the rest from') as HTMLInputElement).value).toBe('10:15');
      // The left oven is what broke down: the crackers in it are baked again, the rest is planned from now.
      fireEvent.click(box('Left'));
      expect(trays()[2]).toEqual(['Seed crackers · out 10:15', false]);
      expect((screen.getByLabelText('Plan the rest from') as HTMLInputElement).value).toBe('09:50');
      fireEvent.click(screen.getByRole('button', { name: 'Plan again' }));
      expect(k.onChange).toHaveBeenCalledWith(2, [2], 3, { out: ['7-1', '7-2'], from: '2026-01-04T09:50' });
      // The answer says what the plan now is.
      rerender(
        <BakeRunTimers run={midDay} unit="F" nowMinute={110} kitchen={{ ...k, ovenIds: [2], version: 4, done: { from: '2026-01-04T09:50', out: ['7-1', '7-2'] } }} />,
      );
      expect(screen.getByRole('status').textContent).toBe('Planned again with Right and 2 cooks from 09:50; 2 trays already out kept as planned.');
    } finally {
      vi.useRealTimers();
    }
  });

  it('sends the time a ticked tray really came out, only where it differs from the plan', () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date(2026, 0, 4, 9, 50));
    try {
      const k = kitchenOf();
      render(<BakeRunTimers run={midDay} unit="F" nowMinute={110} kitchen={k} />);
      const details = screen.getByText('An oven down or a cook missing?').closest('details')!;
      details.open = true;
      fireEvent(details, new Event('toggle'));
      fireEvent.click(screen.getByText('A tray came out at another time?'));
      // Each ticked tray offers its planned time out.
      expect((screen.getByLabelText('Egg slab (2/2) came out at') as HTMLInputElement).value).toBe('08:45');
      fireEvent.change(screen.getByLabelText('Egg slab (1/2) came out at'), { target: { value: '08:41' } });
      fireEvent.click(screen.getByRole('button', { name: 'Plan again' }));
      expect(k.onChange).toHaveBeenCalledWith(2, [1, 2], 3, {
        out: ['7-1', '9-1', '7-2'], // in the run's order
        from: '2026-01-04T10:15',
        outAt: { '7-1': '2026-01-04T08:41' },
      });
    } finally {
      vi.useRealTimers();
    }
  });

  it('unticking every tray plans the day from its start again; a refused time is said under its field', () => {
    const k = kitchenOf({ done: { from: '2026-01-04T09:50', out: ['7-1'] } });
    const { unmount } = render(<BakeRunTimers run={midDay} unit="F" nowMinute={-5} kitchen={k} />);
    fireEvent.click(screen.getByText('An oven down or a cook missing?'));
    expect(box('Egg slab (1/2) · out 08:37').checked).toBe(true);
    expect(box('Egg slab (2/2) · out 08:45').checked).toBe(false);
    expect((screen.getByLabelText('Plan the rest from') as HTMLInputElement).value).toBe('09:50');
    fireEvent.click(box('Egg slab (1/2) · out 08:37'));
    expect(screen.getByText('Nothing ticked: the day is planned again from its start, 08:00.')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Plan again' }));
    expect(k.onChange).toHaveBeenCalledWith(2, [1, 2], 3, { out: [] });
    unmount();
    render(
      <BakeRunTimers
        run={midDay}
        unit="F"
        nowMinute={110}
        kitchen={kitchenOf({ done: { from: '2026-01-04T07:50', out: ['7-1'] }, error: problem(400, 'validation', 'Invalid', { from: ['The run starts at 08:00: plan the rest from then or later.'] }) })}
      />,
    );
    expect(screen.getByRole('alert').textContent).toBe('⚠ The run starts at 08:00: plan the rest from then or later.');
  });
});
