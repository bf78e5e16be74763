import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { CoolingLogDto, CoolingLogRow } from '@shared/schemas/cooling.schema';
import { Component as CoolingLog } from '@/app/routes/bake-runs/cooling-log.route';
import { jsonResponse, renderAtRoute, signedIn } from './render';
import { setTempScale } from '@/lib/temp-scale';

// An invented log of two prep days (its judgements are the server's: tests/api/cooling-log.api.test.ts checks them
// against FDA Food Code §3-501.14; this checks what the page shows of them).
const row = (over: Partial<CoolingLogRow>): CoolingLogRow => ({
  id: 1,
  prepDate: '2026-01-04',
  weekId: 7,
  weekName: 'Week of Mon, Jan 5',
  runTrayId: '3-1',
  trayName: 'Egg slab (1/2)',
  outAt: '2026-01-04T13:10',
  restartedAt: null,
  readings: [
    { at: '2026-01-04T14:10', tempF: 68 },
    { at: '2026-01-04T18:00', tempF: 40 },
  ],
  discarded: false,
  note: '',
  recordedBy: 'Kit Moreno',
  updatedAt: '2026-01-04T18:00:10.000Z',
  version: 1,
  state: 'cooled',
  by70: '2026-01-04T15:10',
  by41: '2026-01-04T19:10',
  reached70At: '2026-01-04T14:10',
  reached41At: '2026-01-04T18:00',
  result: 'Cooled in time',
  ...over,
});

let answer: () => Response;
const asked: string[] = [];
beforeEach(() => {
  asked.length = 0;
  vi.stubGlobal(
    'fetch',
    vi.fn((url: string) => {
      asked.push(url);
      return Promise.resolve(answer());
    }),
  );
});
afterEach(() => {
  vi.unstubAllGlobals();
  setTempScale('F');
});

const log = (rows: CoolingLogRow[]): CoolingLogDto => ({ from: '2026-01-01', to: '2026-01-31', timeZone: null, rows });
const open = (query = '?from=2026-01-01&to=2026-01-31') => renderAtRoute(<CoolingLog />, '/cooling-log', `/cooling-log${query}`, signedIn({ role: 'assistant' }));

describe('the cooling log page', () => {
  it('shows each prep day’s trays with where they ended, the week and the way to its bake run, and a CSV of the same stretch', async () => {
    answer = () =>
      jsonResponse(
        log([
          row({}),
          row({ id: 2, runTrayId: '3-2', trayName: 'Egg slab (2/2)', readings: [{ at: '2026-01-04T14:20', tempF: 68 }], state: 'missed-41', result: 'Missed: not at 41 °F (5 °C) by 19:20', note: 'Fridge door left open' }),
          row({ id: 3, prepDate: '2026-01-11', weekId: null, weekName: null, outAt: '2026-01-11T09:00', readings: [], state: 'discarded', result: 'Thrown away' }),
          row({ id: 4, prepDate: '2026-01-11', weekId: null, weekName: null, runTrayId: '3-2', outAt: '2026-01-11T09:10', readings: [{ at: '2026-01-11T10:00', tempF: 66 }], state: 'to-41', result: '70 °F (21 °C) reached; no reading at 41 °F (5 °C) yet (due by 15:10)' }),
        ]),
      );
    open();
    expect(await screen.findByRole('heading', { name: 'Prep day Sunday, Jan 4' })).toBeTruthy();
    expect(asked).toEqual(['/api/cooling-log?from=2026-01-01&to=2026-01-31']);
    expect(screen.getByRole('status').textContent).toBe('4 trays · 1 cooled in time · 1 missed a deadline · 1 thrown away · 1 waiting for a reading');
    const first = screen.getByRole('region', { name: 'Prep day Sunday, Jan 4' });
    expect(within(first).getByRole('link', { name: 'Week of Mon, Jan 5: bake run' }).getAttribute('href')).toBe('/weeks/7/bake-run?prepDate=2026-01-04#cooling-record-title');
    const [cooled, missed] = within(first).getAllByRole('listitem');
    expect(cooled.textContent).toContain('Out 13:10 · 70 °F (21 °C) by 15:10 · 41 °F (5 °C) by 19:10');
    // 68 °F = 20 °C, 40 °F = 4.4 °C (NIST SP 811), both scales as the e-mails write them.
    expect(cooled.textContent).toContain('14:10 68 °F (20 °C) · 18:00 40 °F (4 °C)');
    expect(missed.textContent).toContain('Missed: not at 41 °F (5 °C) by 19:20');
    expect(missed.textContent).toContain('Note: Fridge door left open');
    const second = screen.getByRole('region', { name: 'Prep day Sunday, Jan 11' });
    expect(second.textContent).toContain('Its week was deleted');
    expect(second.textContent).toContain('No temperature written down.');
    expect(second.textContent).toContain('70 °F (21 °C) reached; no reading at 41 °F (5 °C) yet (due by 15:10)');
    expect(screen.getByRole('link', { name: 'Download CSV' }).getAttribute('href')).toBe('/api/cooling-log.csv?from=2026-01-01&to=2026-01-31');
    // Without the kitchen's time zone, what the newest records are judged on.
    expect(screen.getByText(/^The kitchen’s time zone is not set/).textContent).toContain('the last three days’ trays are judged on the temperatures written down alone');
  });

  it('writes every temperature °C first for a reader who reads °C (their preference)', async () => {
    setTempScale('C');
    answer = () =>
      jsonResponse(
        log([row({}), row({ id: 2, runTrayId: '3-2', trayName: 'Egg slab (2/2)', readings: [{ at: '2026-01-04T14:20', tempF: 68 }], state: 'missed-41', result: 'Missed: not at 41 °F (5 °C) by 19:20' })]),
      );
    open();
    const [cooled, missed] = within(await screen.findByRole('region', { name: 'Prep day Sunday, Jan 4' })).getAllByRole('listitem');
    // FDA Food Code §3-501.14 writes the limits "21°C (70°F)" and "5°C (41°F)"; 68 °F = 20 °C (NIST SP 811).
    expect(cooled.textContent).toContain('Out 13:10 · 21 °C (70 °F) by 15:10 · 5 °C (41 °F) by 19:10');
    expect(cooled.textContent).toContain('14:10 20 °C (68 °F) · 18:00 4 °C (40 °F)');
    expect(missed.textContent).toContain('Missed: not at 5 °C (41 °F) by 19:20');
    expect(screen.getByText(/^Every tray’s cooling record/).textContent).toContain('whether it reached 21 °C (70 °F) within 2 hours and 5 °C (41 °F) within 6');
  });

  it('says nothing of how records are judged once the kitchen has a time zone', async () => {
    answer = () => jsonResponse({ ...log([row({})]), timeZone: 'America/Chicago' });
    open();
    expect(await screen.findByText('Cooled in time')).toBeTruthy();
    expect(screen.queryByText(/time zone is not set/)).toBeNull();
  });

  it('says under the field when the last day comes before the first, and asks the server nothing', async () => {
    answer = () => jsonResponse(log([]));
    open('?from=2026-01-31&to=2026-01-01');
    expect((await screen.findByRole('alert')).textContent).toContain('The last day comes on or after the first.');
    expect(screen.getByLabelText('Last prep day').getAttribute('aria-invalid')).toBe('true');
    expect(screen.queryByRole('link', { name: 'Download CSV' })).toBeNull();
    expect(asked).toEqual([]);
    // Mended: the log is read.
    fireEvent.change(screen.getByLabelText('Last prep day'), { target: { value: '2026-02-28' } });
    expect(await screen.findByText('No cooling records for these prep days')).toBeTruthy();
    expect(asked).toEqual(['/api/cooling-log?from=2026-01-31&to=2026-02-28']);
  });

  it('a date field emptied is said under it, and the page stays (it fell over writing the printed heading)', async () => {
    answer = () => jsonResponse(log([]));
    open('?from=&to=2026-01-31');
    expect((await screen.findByRole('alert')).textContent).toContain('Give the first prep date as a date like 2026-12-06.');
    expect(screen.getByLabelText('First prep day').getAttribute('aria-invalid')).toBe('true');
    expect(asked).toEqual([]);
  });

  it('shows the loading state, then an error with a way to try again', async () => {
    answer = () => jsonResponse({ status: 500, title: 'Server error', detail: 'Something went wrong on our side' }, 500);
    open();
    expect(screen.getByLabelText('Loading the cooling log')).toBeTruthy();
    await waitFor(() => expect(screen.getByRole('button', { name: /try again/i })).toBeTruthy());
  });
});
