import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { BakeRunView } from '@/features/bake-runs/components/bake-run-view';
import { DatesTimesCard } from '@/app/routes/settings/dates-times-card';
import { deviceClockStyle, momentLabel, setClockStyle } from '@/lib/dates';
import { jsonResponse, renderInApp } from './render';
import { twoTrayRun } from './bake-run-fixtures';

const run = twoTrayRun;

afterEach(() => {
  setClockStyle('24h');
  vi.unstubAllGlobals();
});

describe('times of day on the pages', () => {
  it('the device’s own style starts a new workspace: en-US 12-hour, en-GB and de-DE 24-hour (ECMA-402 Intl, CLDR)', () => {
    expect(deviceClockStyle('en-US')).toBe('12h');
    expect(deviceClockStyle('en-GB')).toBe('24h');
    expect(deviceClockStyle('de-DE')).toBe('24h');
  });

  it('a bake run reads 08:00 on a 24-hour workspace and 8:00 AM on a 12-hour one (start, trays, run sheet)', () => {
    const { unmount } = render(<BakeRunView run={run} unit="F" />);
    expect(screen.getAllByText('08:00').length).toBeGreaterThan(0);
    expect(screen.queryByText(/ AM$/)).toBeNull();
    unmount();
    setClockStyle('12h');
    render(<BakeRunView run={run} unit="F" />);
    expect(screen.getAllByText('8:00 AM').length).toBeGreaterThan(0);
    const cards = within(screen.getByRole('list', { name: 'Trays of the run' })).getAllByRole('listitem');
    for (const card of cards) expect(card.textContent).toMatch(/In\d{1,2}:\d\d AM/);
    const sheet = screen.getByRole('list', { name: 'Run sheet' }).textContent ?? '';
    expect(sheet).toMatch(/^8:00 AM/);
    expect(sheet).not.toMatch(/\b08:\d\d\b/);
  });

  it('a moment (outbox, shopping) follows it too', () => {
    setClockStyle('12h');
    expect(momentLabel(new Date(2026, 11, 2, 15, 13).toISOString())).toBe('Wed, Dec 2, 3:13 PM');
    setClockStyle('24h');
    expect(momentLabel(new Date(2026, 11, 2, 15, 13).toISOString())).toBe('Wed, Dec 2, 15:13');
  });

  it('the coach sets it in Settings: one change sent with the version, the date order left alone', async () => {
    const settings = { netCarbRule: 'half-other-polyols', dateOrder: 'month-day', clock: '24h', netCarbRules: [], help: '', version: 4 };
    const calls: [string, RequestInit | undefined][] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string, init?: RequestInit) => {
        calls.push([url, init]);
        return jsonResponse(init?.method === 'PATCH' ? { ...settings, clock: '12h', version: 5 } : settings);
      }),
    );
    renderInApp(<DatesTimesCard />);
    const select = (await screen.findByLabelText('Write times as')) as HTMLSelectElement;
    expect(Array.from(select.options).map((o) => o.textContent)).toEqual(['13:45 (24-hour clock)', '1:45 PM (12-hour clock)']);
    fireEvent.change(select, { target: { value: '12h' } });
    await waitFor(() => expect(calls.some(([, init]) => init?.method === 'PATCH')).toBe(true));
    const patch = calls.find(([, init]) => init?.method === 'PATCH')!;
    expect([patch[0], JSON.parse(String(patch[1]!.body))]).toEqual(['/api/workspace/settings', { clock: '12h', version: 4 }]);
  });
});
