import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { DatesTimesCard } from '@/app/routes/settings/dates-times-card';
import { setClockStyle } from '@/lib/dates';
import { jsonResponse, renderInApp } from './render';

// The kitchen's time zone in Settings: the zones come from the engine's IANA list (ECMA-402
// Intl.supportedValuesOf), grouped by region; "Kitchen time now" is the device's instant read in the chosen zone.

const base = { netCarbRule: 'half-other-polyols', dateOrder: 'month-day', clock: '24h', netCarbRules: [], help: '', version: 4 };

function serve(settings: Record<string, unknown>) {
  const calls: [string, RequestInit | undefined][] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      calls.push([url, init]);
      const sent = init?.body ? JSON.parse(String(init.body)) : {};
      return jsonResponse(init?.method === 'PATCH' ? { ...settings, ...sent, version: 5 } : settings);
    }),
  );
  return calls;
}

const patches = (calls: [string, RequestInit | undefined][]) => calls.filter(([, i]) => i?.method === 'PATCH').map(([, i]) => JSON.parse(String(i!.body)));

afterEach(() => {
  setClockStyle('24h');
  vi.useRealTimers();
  vi.unstubAllGlobals();
});

describe('the kitchen time zone in Settings', () => {
  it('not set: says the cooling watch is off; the zones are grouped by region, by place; choosing one sends it with the version', async () => {
    const calls = serve({ ...base, timeZone: null });
    renderInApp(<DatesTimesCard />);
    const select = (await screen.findByLabelText('Kitchen time zone')) as HTMLSelectElement;
    expect(select.value).toBe('');
    expect(select.options[0].textContent).toBe('Not set (no cooling e-mails)');
    expect(screen.getByText(/^Not set: cooling deadlines are watched only on the bake-run page while it is open\./)).toBeTruthy();
    const america = select.querySelector('optgroup[label="America"]') as HTMLOptGroupElement;
    expect(within(america as unknown as HTMLElement).getByRole('option', { name: 'Chicago' })).toBeTruthy();
    expect(within(america as unknown as HTMLElement).getByRole('option', { name: 'Indiana / Tell City' })).toBeTruthy();
    const groups = Array.from(select.querySelectorAll('optgroup')).map((g) => g.label);
    expect(groups.at(-1)).toBe('Other');
    expect(groups.slice(0, -1)).toEqual([...groups.slice(0, -1)].sort((a, b) => a.localeCompare(b)));
    fireEvent.change(select, { target: { value: 'America/Chicago' } });
    await waitFor(() => expect(patches(calls)).toEqual([{ timeZone: 'America/Chicago', version: 4 }]));
  });

  it('set: shows the kitchen’s time now in the workspace’s style; "Not set" sends null', async () => {
    // 2026-01-04 18:05 UTC is 12:05 in Chicago (CST, UTC−6: 15 U.S.C. §260a puts January in standard time).
    vi.useFakeTimers({ now: new Date('2026-01-04T18:05:00Z'), toFake: ['Date'] });
    const calls = serve({ ...base, timeZone: 'America/Chicago' });
    renderInApp(<DatesTimesCard />);
    const select = (await screen.findByLabelText('Kitchen time zone')) as HTMLSelectElement;
    expect(select.value).toBe('America/Chicago');
    expect(screen.getByText(/^Kitchen time now in America\/Chicago: Sun, Jan 4, 12:05\. Trayline watches the cooling record/)).toBeTruthy();
    fireEvent.change(select, { target: { value: '' } });
    await waitFor(() => expect(patches(calls)).toEqual([{ timeZone: null, version: 4 }]));
  });

  it('offers the device’s zone when the kitchen’s is another', async () => {
    const calls = serve({ ...base, timeZone: 'Pacific/Auckland' });
    renderInApp(<DatesTimesCard />);
    const device = new Intl.DateTimeFormat().resolvedOptions().timeZone;
    const use = await screen.findByRole('button', { name: 'Use this device’s time zone' });
    expect(use.parentElement?.textContent).toContain(`This device is in ${device.replace(/_/g, ' ')}.`);
    fireEvent.click(use);
    await waitFor(() => expect(patches(calls)).toEqual([{ timeZone: expect.stringMatching(/^(UTC|Etc\/UTC|\w+\/\w+)/), version: 4 }]));
  });
});
