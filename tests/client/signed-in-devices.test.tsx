import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { SignedInDeviceDto } from '@shared/schemas/auth.schema';
import { lastActiveLabel, SignedInDevices } from '@/features/auth/components/signed-in-devices';
import { setClockStyle } from '@/lib/dates';
import { jsonResponse, renderInApp } from './render';

// Invented devices of one person. Times are built on the device's own clock (new Date(y, m, d, h, min)), so the
// words do not depend on the machine's time zone.
const at = (day: number, h: number, min: number) => new Date(2026, 11, day, h, min).toISOString();
const device = (id: string, more: Partial<SignedInDeviceDto>): SignedInDeviceDto => ({
  id: id.repeat(24).slice(0, 24), current: false, device: null, signedInAt: null, lastActiveAt: at(2, 9, 0), untilBrowserCloses: false, ...more,
});
const laptop = device('a', { current: true, device: 'Safari on a macOS computer', signedInAt: at(1, 8, 5), lastActiveAt: new Date().toISOString() });
const phone = device('b', { device: 'Chrome on an Android phone', signedInAt: at(2, 15, 13), lastActiveAt: at(3, 7, 40) });
const old = device('c', {});
const kitchen = device('d', { device: 'Firefox on a Linux computer', signedInAt: at(2, 6, 0), lastActiveAt: at(2, 6, 30), untilBrowserCloses: true });

beforeEach(() => setClockStyle('12h'));
afterEach(() => {
  setClockStyle('24h');
  vi.unstubAllGlobals();
});

/** The API as the list sees it: GET answers `list()`; a change is recorded and answered by `change`. */
function stubDevicesApi(list: () => SignedInDeviceDto[], change: (method: string, url: string) => Response) {
  const calls: string[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      const method = init?.method ?? 'GET';
      calls.push(`${method} ${url}`);
      return method === 'GET' ? jsonResponse(list()) : change(method, url);
    }),
  );
  return calls;
}

describe('signed-in devices (Settings)', () => {
  it('lists this device first, then the others with when they signed in and were last used; only others can be signed out', async () => {
    stubDevicesApi(() => [laptop, phone, old, kitchen], () => jsonResponse({}, 500));
    renderInApp(<SignedInDevices />);
    const rows = within(await screen.findByRole('list', { name: 'Devices signed in as you' })).getAllByRole('listitem');
    expect(rows.map((r) => r.textContent)).toEqual([
      'Safari on a macOS computer (this device)Signed in Tue, Dec 1, 8:05 AM',
      'Chrome on an Android phoneSigned in Wed, Dec 2, 3:13 PM · last active Thu, Dec 3, 7:40 AMSign out',
      'A device signed in before Trayline noted devicesSigned in earlier · last active Wed, Dec 2, 9:00 AMSign out',
      // Signed in without "Keep me signed in".
      'Firefox on a Linux computerSigned in Wed, Dec 2, 6:00 AM · last active Wed, Dec 2, 6:30 AM · until its browser closesSign out',
    ]);
    expect(within(rows[0]).queryByRole('button')).toBeNull();
    expect(screen.getByRole('button', { name: 'Sign out Chrome on an Android phone, signed in Wed, Dec 2, 3:13 PM' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Sign out everywhere else' })).toBeTruthy();
  });

  it('"active now" within two minutes of the last request (the server keeps it to a minute)', () => {
    const now = Date.parse('2026-12-03T10:00:00Z');
    expect(lastActiveLabel('2026-12-03T09:58:30Z', now)).toBe('active now');
    expect(lastActiveLabel('2026-12-03T09:57:59Z', now)).toMatch(/^last active /);
  });

  it('signs out one device and reads the list again', async () => {
    let current = [laptop, phone];
    const calls = stubDevicesApi(() => current, () => {
      current = [laptop];
      return new Response(null, { status: 204 });
    });
    renderInApp(<SignedInDevices />);
    fireEvent.click(await screen.findByRole('button', { name: /^Sign out Chrome on an Android phone/ }));
    await waitFor(() => expect(screen.queryByText('Chrome on an Android phone')).toBeNull());
    expect(calls).toEqual(['GET /api/auth/devices', `DELETE /api/auth/devices/${'b'.repeat(24)}`, 'GET /api/auth/devices']);
    expect(screen.getByText('You are signed in on this device only.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Sign out everywhere else' })).toBeNull();
  });

  it('asks before signing out everywhere else; no sends nothing, yes sends it once', async () => {
    let current = [laptop, phone, old];
    const calls = stubDevicesApi(() => current, () => {
      current = [laptop];
      return jsonResponse({ signedOut: 2 });
    });
    vi.stubGlobal('confirm', vi.fn(() => false));
    renderInApp(<SignedInDevices />);
    fireEvent.click(await screen.findByRole('button', { name: 'Sign out everywhere else' }));
    expect(vi.mocked(window.confirm).mock.calls[0][0]).toBe(
      'Sign out the 2 other devices? Whoever uses them must sign in again; this device stays signed in.',
    );
    expect(calls).toEqual(['GET /api/auth/devices']);
    vi.stubGlobal('confirm', vi.fn(() => true));
    fireEvent.click(screen.getByRole('button', { name: 'Sign out everywhere else' }));
    await screen.findByText('You are signed in on this device only.');
    expect(calls).toEqual(['GET /api/auth/devices', 'POST /api/auth/devices/sign-out-others', 'GET /api/auth/devices']);
  });

  it('says a refusal, and the list stays', async () => {
    stubDevicesApi(() => [laptop, phone], () => jsonResponse({ title: 'Not Found', status: 404, detail: 'Signed-in device not found' }, 404));
    renderInApp(<SignedInDevices />);
    fireEvent.click(await screen.findByRole('button', { name: /^Sign out Chrome on an Android phone/ }));
    expect(await screen.findByText('That device was not signed out')).toBeTruthy();
    expect(screen.getByText('Signed-in device not found')).toBeTruthy();
    expect(screen.getByText('Chrome on an Android phone')).toBeTruthy();
  });

  it('loading, then an error with a way to try again', async () => {
    let fail = true;
    stubDevicesApi(() => {
      if (fail) throw new Error('down');
      return [laptop];
    }, () => jsonResponse({}, 500));
    renderInApp(<SignedInDevices />);
    expect(screen.getByRole('status', { name: 'Loading the devices signed in' })).toBeTruthy();
    const retry = await screen.findByRole('button', { name: /Try again/ });
    fail = false;
    fireEvent.click(retry);
    expect(await screen.findByText('Safari on a macOS computer')).toBeTruthy();
  });
});
