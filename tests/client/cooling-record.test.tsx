import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import type { BakeRunResult } from '@shared/domain/bake-run-types';
import type { CoolingRecordDto } from '@shared/schemas/cooling.schema';
import { CoolingRecord, readingAt } from '@/features/bake-runs/components/cooling-record';
import { BakeRunTimers } from '@/features/bake-runs/components/bake-run-timers';
import { minutesSpan } from '@shared/domain/clock';
import { setKitchenZone } from '@/lib/dates';
import { jsonResponse, renderInApp, testQueryClient } from './render';

// An invented run of two trays (only the fields the cooling record and the timers read), prep day Sun Jan 4, 2026.
const tray = (id: string, name: string, outAt: string, outMinute: number) => ({ id, name, oven: 'Left', outAt: `2026-01-04T${outAt}`, outMinute });
const step = (kind: string, minute: number, trayId: string, tempF = 350) => ({
  kind,
  minute,
  at: `2026-01-04T${String(8 + Math.floor(minute / 60)).padStart(2, '0')}:${String(minute % 60).padStart(2, '0')}`,
  trayId,
  oven: 'Left',
  tempF,
});
const run = {
  start: '2026-01-04T08:00',
  trays: [tray('3-1', 'Egg slab (1/2)', '08:30', 30), tray('3-2', 'Egg slab (2/2)', '08:45', 45)],
  events: [
    step('first-check', 30, '3-1'),
    step('tray-out', 30, '3-1'),
    step('cool-to-70-by', 150, '3-1', 70),
    step('fridge-41-by', 390, '3-1', 41),
    step('first-check', 45, '3-2'),
    step('cool-to-70-by', 165, '3-2', 70),
    step('fridge-41-by', 405, '3-2', 41),
  ].sort((a, b) => a.minute - b.minute),
} as unknown as BakeRunResult;

const record = (over: Partial<CoolingRecordDto> = {}): CoolingRecordDto => ({
  runTrayId: '3-1',
  trayName: 'Egg slab (1/2)',
  outAt: '2026-01-04T08:36',
  restartedAt: null,
  readings: [],
  discarded: false,
  note: '',
  recordedBy: 'Kit Moreno',
  updatedAt: '2026-01-04T08:36:10.000Z',
  version: 1,
  ...over,
});

let records: CoolingRecordDto[] = [];
let timeZone: string | null = null;
const calls: [string, RequestInit | undefined][] = [];
beforeEach(() => {
  records = [];
  timeZone = null;
  calls.length = 0;
  vi.useFakeTimers({ toFake: ['Date'] });
  vi.setSystemTime(new Date(2026, 0, 4, 8, 40));
  vi.stubGlobal(
    'fetch',
    vi.fn((url: string, init?: RequestInit) => {
      calls.push([url, init]);
      if (!init?.method || init.method === 'GET') return Promise.resolve(jsonResponse({ weekId: 7, prepDate: '2026-01-04', records, timeZone }));
      if (init.method === 'PUT') {
        const body = JSON.parse(String(init.body));
        if (body.readings?.some((r: { tempF?: number }) => (r.tempF ?? 0) > 250))
          return Promise.resolve(jsonResponse({ status: 400, code: 'validation', detail: 'Invalid', errors: { 'readings.0.tempF': ['Above 250 °F: check the reading.'] } }, 400));
        const saved = record({ ...body, readings: body.readings ?? [], runTrayId: url.split('/').pop(), version: (body.version ?? 0) + 1 });
        records = [...records.filter((r) => r.runTrayId !== saved.runTrayId), saved];
        return Promise.resolve(jsonResponse(saved));
      }
      return Promise.resolve(new Response(null, { status: 204 }));
    }),
  );
});
afterEach(() => {
  setKitchenZone(null);
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

const puts = () => calls.filter(([, init]) => init?.method === 'PUT').map(([url, init]) => [url, JSON.parse(String(init!.body))]);

describe('the cooling record on prep day', () => {
  it('writes a tray down as out now, then a reading typed in °C, and says where it stands against the Food Code', async () => {
    renderInApp(<CoolingRecord weekId={7} run={run} unit="C" role="assistant" />);
    const cards = await screen.findAllByRole('listitem');
    fireEvent.click(within(cards[0]).getByRole('button', { name: 'Out now' }));
    await waitFor(() => expect(puts()).toEqual([['/api/weeks/7/bake-run/cooling/3-1', { outAt: '2026-01-04T08:40', prepDate: '2026-01-04' }]]));
    // 70 °F = 21 °C, 41 °F = 5 °C; deadlines 2 h and 6 h after 08:40 (FDA Food Code §3-501.14).
    // The page reads °C first (its switch): the Food Code limits too, "21°C (70°F)" and "5°C (41°F)" as §3-501.14 writes them.
    expect(await screen.findByText(/Cool to 21 °C \(70 °F\) or below by 10:40, then to 5 °C \(41 °F\) or below by 14:40/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Food temperature (°C)'), { target: { value: '20.5' } });
    fireEvent.change(screen.getByLabelText(/Taken at/), { target: { value: '10:15' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add reading' }));
    await waitFor(() => expect(puts()).toHaveLength(2));
    expect(puts()[1][1]).toMatchObject({ outAt: '2026-01-04T08:40', readings: [{ at: '2026-01-04T10:15', tempC: 20.5 }], version: 1 });
    expect(screen.getByRole('status').textContent).toContain('1 of 2 out');
  });

  it('takes a reading straight after "Out now" while the list is still being read again (a slow connection)', async () => {
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    const cards = await screen.findAllByRole('listitem');
    // From here on the list's reads never answer: only the saved record, as the PUT gave it, is on the page.
    const fetch = vi.mocked(globalThis.fetch);
    const answer = fetch.getMockImplementation()!;
    fetch.mockImplementation((url, init) => (!init?.method || init.method === 'GET' ? new Promise<Response>(() => {}) : answer(url, init)));
    fireEvent.click(within(cards[0]).getByRole('button', { name: 'Out now' }));
    await screen.findByText(/Cool to 70 °F \(21 °C\) or below by 10:40/);
    const add = screen.getByRole('button', { name: 'Add reading' }) as HTMLButtonElement;
    await waitFor(() => expect(add.disabled).toBe(false));
    fireEvent.change(screen.getByLabelText('Food temperature (°F)'), { target: { value: '66' } });
    fireEvent.change(screen.getByLabelText(/Taken at/), { target: { value: '10:15' } });
    fireEvent.click(add);
    await waitFor(() => expect(puts()).toHaveLength(2));
    expect(puts()[1][1]).toMatchObject({ readings: [{ at: '2026-01-04T10:15', tempF: 66 }], version: 1 });
  });

  it('puts a refused reading under its field, and says a missed deadline with what to do', async () => {
    records = [record({ readings: [{ at: '2026-01-04T10:30', tempF: 80 }] })];
    vi.setSystemTime(new Date(2026, 0, 4, 10, 40));
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    // Out 08:36: 70 °F was due by 10:36.
    const alert = await screen.findByText(/Not at 70 °F \(21 °C\) by 10:36/);
    expect(alert.textContent).toContain('Reheat it to 165 °F (74 °C) and start cooling again, or throw it away');
    expect(screen.getByRole('status').textContent).toContain('1 missed a deadline');
    fireEvent.change(screen.getByLabelText('Food temperature (°F)'), { target: { value: '900' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add reading' }));
    expect(await screen.findByText('Above 250 °F: check the reading.')).toBeTruthy();
    // Reheated: cooling again from the time typed.
    fireEvent.change(screen.getByLabelText(/cooling again from/), { target: { value: '10:50' } });
    fireEvent.click(screen.getByRole('button', { name: 'Cool again from then' }));
    await waitFor(() => expect(puts().at(-1)![1]).toMatchObject({ restartedAt: '2026-01-04T10:50', version: 1 }));
  });

  it('shows a note written elsewhere when the page refreshes, unless a note is being typed here', async () => {
    records = [record()];
    const qc = testQueryClient();
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />, qc);
    const field = async () => (await screen.findByLabelText('Note')) as HTMLInputElement;
    expect((await field()).value).toBe('');
    // The coach notes something on their laptop; this phone reads the records again (every minute, or on focus).
    records = [record({ note: 'Moved to the walk-in at 10:05', version: 2 })];
    await qc.invalidateQueries();
    // Before, the box kept the note it opened with: "Save note" then put the old text back over the coach's.
    await waitFor(async () => expect((await field()).value).toBe('Moved to the walk-in at 10:05'));
    fireEvent.change(await field(), { target: { value: 'Moved to the walk-in at 10:05; lid on' } });
    records = [record({ note: 'Another note', version: 3 })];
    await qc.invalidateQueries();
    await screen.findByText('Note: Another note');
    expect((await field()).value).toBe('Moved to the walk-in at 10:05; lid on');
    // Saving it would replace theirs: the box says so, and the save asks first (here: not now).
    expect(screen.getByText('Someone else changed the note meanwhile (shown below); saving puts yours in its place.')).toBeTruthy();
    const confirm = vi.fn(() => false);
    vi.stubGlobal('confirm', confirm);
    fireEvent.click(screen.getByRole('button', { name: 'Save note' }));
    expect(confirm).toHaveBeenCalledWith('The note was changed meanwhile to “Another note”. Put yours in its place?');
    expect(puts()).toHaveLength(0);
    // Asked again and meant: saved, and the box is plain again.
    confirm.mockReturnValue(true);
    fireEvent.click(screen.getByRole('button', { name: 'Save note' }));
    await waitFor(() => expect(puts()).toHaveLength(1));
    expect(puts()[0][1]).toMatchObject({ note: 'Moved to the walk-in at 10:05; lid on', version: 3 });
    await screen.findByText('Note: Moved to the walk-in at 10:05; lid on');
    expect(screen.queryByText(/saving puts yours in its place/)).toBeNull();
  });

  it('saves a note without asking when nobody else changed it meanwhile', async () => {
    records = [record()];
    const confirm = vi.fn(() => true);
    vi.stubGlobal('confirm', confirm);
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    fireEvent.change(await screen.findByLabelText('Note'), { target: { value: 'Lid on at 10:20' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save note' }));
    await waitFor(() => expect(puts()).toHaveLength(1));
    expect(confirm).not.toHaveBeenCalled();
    await screen.findByText('Note: Lid on at 10:20');
    expect(screen.queryByText(/saving puts yours in its place/)).toBeNull();
  });

  it('throws a tray away, and says its portions no longer count and who is told', async () => {
    records = [record()];
    const { unmount } = renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Thrown away' }));
    await waitFor(() => expect(puts()).toEqual([['/api/weeks/7/bake-run/cooling/3-1', expect.objectContaining({ discarded: true, version: 1 })]]));
    expect(await screen.findByText(/the coach gets an e-mail about it\./)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Not thrown away after all' })).toBeTruthy();
    unmount();
    // The coach reads that the other coaches are told (the one who wrote it is not).
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="coach" />);
    expect(await screen.findByText(/any other coach of the team gets an e-mail about it\./)).toBeTruthy();
  });

  it('a tray cooled in time reads short: its readings on one line, the changes folded away until asked for', async () => {
    // Out 08:36; 66 °F at 10:05 (70 °F within 2 h) and 39 °F at 12:10 (41 °F within 6 h): FDA Food Code §3-501.14 met.
    records = [record({ readings: [{ at: '2026-01-04T12:10', tempF: 39 }, { at: '2026-01-04T10:05', tempF: 66 }] })];
    vi.setSystemTime(new Date(2026, 0, 4, 12, 30));
    const confirm = vi.fn(() => true);
    vi.stubGlobal('confirm', confirm);
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    const card = (await screen.findByText(/^✓ /)).closest('li')!;
    expect(within(card).getByText('Readings: 10:05 66 °F · 12:10 39 °F')).toBeTruthy();
    // Nothing left to write down: no reading form; "Thrown away" and each reading's "Remove" wait in the fold.
    expect(within(card).queryByRole('form', { name: /Add a reading/ })).toBeNull();
    const fold = within(card).getByText('Change this record').closest('details')!;
    expect(fold.open).toBe(false);
    for (const name of ['Thrown away', 'Remove the 10:05 reading', 'Remove the 12:10 reading', 'Save note']) {
      expect(within(card).getAllByRole('button', { name })).toEqual([within(fold).getByRole('button', { name })]);
    }
    // A reading written down by mistake is still removed from there.
    fireEvent.click(within(fold).getByRole('button', { name: 'Remove the 12:10 reading' }));
    expect(confirm).toHaveBeenCalledWith('Remove the 12:10 reading of 39 °F?');
    await waitFor(() => expect(puts()).toHaveLength(1));
    expect(puts()[0][1]).toMatchObject({ readings: [{ at: '2026-01-04T10:05', tempF: 66 }], version: 1 });
    // Not cooled any more (41 °F still to reach): the card opens out again with its reading form.
    expect(await within(card).findByRole('button', { name: 'Add reading' })).toBeTruthy();
    expect(within(card).queryByText(/^Readings: /)).toBeNull();
    expect(within(card).getByText('Note, or written down by mistake?')).toBeTruthy();
  });

  it('says whether a missed deadline is e-mailed: by the kitchen’s clock once it has a time zone; else the coach gets the way to Settings', async () => {
    const { unmount } = renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="coach" />);
    const off = await screen.findByText(/^Missed deadlines show on this page only/);
    expect(within(off).getByRole('link', { name: 'Settings' }).getAttribute('href')).toBe('/settings');
    unmount();
    const again = renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    expect((await screen.findByText(/^Missed deadlines show on this page only/)).textContent).toContain('until the coach sets the kitchen’s time zone in Settings.');
    again.unmount();
    timeZone = 'America/Los_Angeles';
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    const watched = (await screen.findByText(/e-mailed to every coach and kitchen assistant/)).textContent;
    expect(watched).toContain('or not written down 30 minutes after its planned time out,');
    expect(watched).toContain('by the kitchen’s clock (America/Los Angeles), even with this page closed.');
  });

  it('reads the kitchen’s clock, not the device’s, once the kitchen has a time zone (a coach looking in from elsewhere)', async () => {
    // 02:10 UTC on Jan 5 is 20:10 on Jan 4 in Chicago (CST, UTC−6; 15 U.S.C. §261): still the prep day in the kitchen.
    vi.setSystemTime(new Date('2026-01-05T02:10:00Z'));
    setKitchenZone('America/Chicago');
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="coach" />);
    const cards = await screen.findAllByRole('listitem');
    fireEvent.click(within(cards[0]).getByRole('button', { name: 'Out now' }));
    await waitFor(() => expect(puts()).toEqual([['/api/weeks/7/bake-run/cooling/3-1', { outAt: '2026-01-04T20:10', prepDate: '2026-01-04' }]]));
    expect(await screen.findByText(/Cool to 70 °F \(21 °C\) or below by 22:10, then to 41 °F \(5 °C\) or below by 02:10 the next day/)).toBeTruthy();
    // The page says whose clock its times are (the device's own reading depends on where the test runs).
    const device = new Date();
    const here = `${String(device.getHours()).padStart(2, '0')}:${String(device.getMinutes()).padStart(2, '0')}`;
    const note = screen.getByText('This device is on another clock').closest('[role="note"]')?.textContent;
    expect(note).toContain(`Times on this page, and the ones you type, are the kitchen’s (America/Chicago): 20:10 there now, ${here}`);
  });

  it('before prep day there is nothing to write down', async () => {
    vi.setSystemTime(new Date(2026, 0, 3, 18, 0));
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    expect(await screen.findByText(/Nothing to write down before prep day/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Out now' })).toBeNull();
  });

  it('a reading typed before the time out is taken as after midnight', () => {
    expect(readingAt('23:10', '2026-01-04T20:30')).toBe('2026-01-04T23:10');
    expect(readingAt('01:15', '2026-01-04T20:30')).toBe('2026-01-05T01:15');
  });
});

describe('now and next follows the cooling record', () => {
  it('a tray written down as out has no check left, and its deadlines count from when it came out', () => {
    const lines = (cooling: CoolingRecordDto[]) => {
      const { unmount } = render(<BakeRunTimers run={run} unit="F" nowMinute={40} cooling={cooling} />);
      const out = screen.getAllByRole('listitem').map((li) => li.textContent?.replace(/\s+/g, ' '));
      unmount();
      return out;
    };
    // Planned: the second tray's check at 08:45, then the first tray's 70 °F deadline at 10:30.
    expect(lines([])).toEqual(['in 5 minCheck Egg slab (2/2)', 'in 110 minEgg slab (1/2) at 70 °F or below by now', 'in 125 minEgg slab (2/2) at 70 °F or below by now', 'in 350 minEgg slab (1/2) at 41 °F or below, in the fridge, by now']);
    // The first tray came out at 08:36: its deadlines are 10:36 and 14:36 (116 and 356 minutes from 08:40).
    expect(lines([record()])).toEqual(['in 5 minCheck Egg slab (2/2)', 'in 116 minEgg slab (1/2) at 70 °F or below by now', 'in 125 minEgg slab (2/2) at 70 °F or below by now', 'in 356 minEgg slab (1/2) at 41 °F or below, in the fridge, by now']);
  });
});

describe('trays due out and not written down', () => {
  const text = (el: HTMLElement) => (el.textContent ?? '').replace(/\s+/g, ' ');
  it('now and next names them, with their planned time out and the way to the cooling record', () => {
    // 08:40: the first tray was planned out at 08:30 (10 minutes ago), the second at 08:45.
    const { unmount } = render(<BakeRunTimers run={run} unit="F" nowMinute={40} cooling={[]} />);
    const note = screen.getByRole('note');
    expect(text(note)).toContain('Due out by now, not in the cooling record: Egg slab (1/2) (planned out 08:30).');
    expect(within(note).getByRole('link', { name: 'Go to the cooling record' }).getAttribute('href')).toBe('#cooling-record-title');
    unmount();
    // Written down: nothing to ask. No cooling record on the page (the planner's try-out run): nothing either.
    for (const cooling of [[record()], undefined]) {
      const r = render(<BakeRunTimers run={run} unit="F" nowMinute={40} cooling={cooling} />);
      expect(screen.queryByText(/not in the cooling record/)).toBeNull();
      r.unmount();
    }
  });

  it('the cooling record marks the tray due out, and not the one still to come, and offers its planned time out', async () => {
    renderInApp(<CoolingRecord weekId={7} run={run} unit="F" role="assistant" />);
    const list = await screen.findByRole('list', { name: 'Trays cooling' });
    const [first, second] = within(list).getAllByRole('listitem');
    expect(text(first)).toContain('Left · planned out 08:30 · ⚠ due 10 min ago');
    expect(text(second)).toContain('Left · planned out 08:45');
    expect(text(second)).not.toContain('due');
    // Its time out is offered as planned (one tap when it came out then); the tray still to come offers now.
    expect((within(first).getByLabelText('Or came out at') as HTMLInputElement).value).toBe('08:30');
    expect((within(second).getByLabelText('Or came out at') as HTMLInputElement).value).toBe('08:40');
  });

  it('says a long wait in hours and minutes', () => {
    expect([minutesSpan(10), minutesSpan(60), minutesSpan(125)]).toEqual(['10 min', '1 h', '2 h 5 min']);
  });
});
