import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { onlineManager } from '@tanstack/react-query';
import { Component as MyPlates } from '@/app/routes/my/my-plates.route';
import { Component as MyTargets } from '@/app/routes/my/my-targets.route';
import { emptyClient } from '@/features/clients/components/client-form';
import { followKeptPerson, signedInPerson } from '@/app/offline';
import { forgetKept, keepAnswer, keptAnswer, keptPerson, KEEP_DAYS } from '@/lib/device-copy';
import type { MeDto } from '@shared/schemas/auth.schema';
import { authKeys } from '@/features/auth/api/auth.keys';
import type { MyWeekDto } from '@shared/schemas/weeks.schema';
import { client, day, plate } from './my-plates-fixtures';
import { jsonResponse, queryClientFor, renderInApp, signedIn, testQueryClient } from './render';

// A client's plan kept on their device, so "My plates" opens without a network: invented plates, dates and people.
const week = (name: string) =>
  ({
    weekId: 7, name: 'Week of Mon 5 Jan', publishedVersion: 2, publishedAt: '2026-01-03T18:00:00Z', startDate: '2026-01-05', endDate: '2026-01-11',
    days: [day('2026-01-07', plate(name, { eatBy: '2026-01-09' }))], next: null, cautions: [],
  }) as unknown as MyWeekDto;
const wednesday = new Date(2026, 0, 7, 7);
const savedAt = new Date(2026, 0, 6, 20, 15).getTime();
const savePlan = (me: MeDto, w: MyWeekDto, at?: number) => keepAnswer('my-week', me, w, at);
/** The plan kept for `me` (the client unless told), as of `now`. */
const keptPlan = (me: Pick<MeDto, 'id' | 'workspaceId'> = client, now?: number) => keptAnswer<MyWeekDto | null>('my-week', me, now);
const minesAsked = (fetch: ReturnType<typeof vi.fn>) => fetch.mock.calls.filter(([u]) => String(u).includes('/weeks/mine')).length;

function openMyPlates(fetch: ReturnType<typeof vi.fn>) {
  vi.useFakeTimers({ now: wednesday, toFake: ['Date'] });
  vi.stubGlobal('fetch', fetch);
  return renderInApp(<MyPlates />, queryClientFor(client));
}

afterEach(() => forgetKept());

describe("a client's plan saved on their device", () => {
  it('keeps each answer of the server, with the person it belongs to', async () => {
    openMyPlates(vi.fn(async () => jsonResponse(week('Chive square'))));
    expect(await screen.findByRole('heading', { level: 2, name: 'Chive square' })).toBeTruthy();
    await waitFor(() => expect(keptPlan()?.data?.days[0].plates[0].name).toBe('Chive square'));
    expect(keptPerson()?.email).toBe(client.email);
    // Files come from the server: offered while it answers.
    expect(screen.getByRole('link', { name: 'Download my week (PDF)' })).toBeTruthy();
  });

  it('opens offline on the saved plan, says when it was saved, offers no files, and reads again once online', async () => {
    savePlan(client, week('Saved square'), savedAt);
    onlineManager.setOnline(false);
    const fetch = vi.fn(async () => jsonResponse(week('Fresh square')));
    openMyPlates(fetch);
    expect(await screen.findByText('Your plan as saved on this device')).toBeTruthy();
    expect(screen.getByText(/^Saved Tue, Jan 6, 20:15\. If your coach has changed your plan since/)).toBeTruthy();
    expect(screen.getByRole('heading', { level: 2, name: 'Saved square' })).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Download my week (PDF)' })).toBeNull();
    // Offline, the read waits: nothing asked of the server, and no "Try again" that could not work.
    expect(minesAsked(fetch)).toBe(0);
    expect(screen.queryByRole('button', { name: 'Try again' })).toBeNull();
    act(() => onlineManager.setOnline(true));
    expect(await screen.findByRole('heading', { level: 2, name: 'Fresh square' })).toBeTruthy();
    expect(screen.queryByText('Your plan as saved on this device')).toBeNull();
    await waitFor(() => expect(keptPlan()?.data?.days[0].plates[0].name).toBe('Fresh square'));
  });

  it('shows the saved plan when the server cannot be reached, with "Try again"', async () => {
    savePlan(client, week('Saved square'), savedAt);
    let reachable = false;
    const fetch = vi.fn(async () => {
      if (!reachable) throw new TypeError('Failed to fetch');
      return jsonResponse(week('Fresh square'));
    });
    openMyPlates(fetch);
    expect(await screen.findByText('Trayline cannot be reached: this is your plan as saved on this device')).toBeTruthy();
    expect(screen.getByRole('heading', { level: 2, name: 'Saved square' })).toBeTruthy();
    reachable = true;
    fireEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('heading', { level: 2, name: 'Fresh square' })).toBeTruthy();
    expect(screen.queryByText(/this is your plan as saved on this device/)).toBeNull();
  });

  it('says so offline when nothing is saved yet (not a page that loads for ever)', async () => {
    onlineManager.setOnline(false);
    openMyPlates(vi.fn(async () => jsonResponse(week('Fresh square'))));
    expect(await screen.findByRole('heading', { name: 'You are offline' })).toBeTruthy();
    expect(screen.getByText(/Your plan has not been saved on this device yet/)).toBeTruthy();
  });

  it("never shows another person's saved plan", async () => {
    savePlan(signedIn({ id: 99, role: 'client', clientId: 8, email: 'other@example.test' }), week('Their square'), savedAt);
    onlineManager.setOnline(false);
    openMyPlates(vi.fn(async () => jsonResponse(week('Fresh square'))));
    expect(await screen.findByRole('heading', { name: 'You are offline' })).toBeTruthy();
    expect(screen.queryByText('Their square')).toBeNull();
  });

  it(`keeps an answer ${KEEP_DAYS} days, for its person in their workspace`, () => {
    savePlan(client, week('Saved square'), savedAt);
    expect(keptPlan(client, savedAt + KEEP_DAYS * 86_400_000)).not.toBeNull();
    expect(keptPlan(client, savedAt + KEEP_DAYS * 86_400_000 + 1)).toBeNull();
    expect(keptPerson(savedAt + KEEP_DAYS * 86_400_000 + 1)).toBeNull();
    expect(keptPlan({ id: client.id + 1, workspaceId: client.workspaceId }, savedAt)).toBeNull();
    expect(keptPlan({ id: client.id, workspaceId: client.workspaceId + 1 }, savedAt)).toBeNull();
  });

  it('is forgotten when its person signs out, is found signed out, or someone else signs in; kept for the same person', () => {
    const qc = testQueryClient();
    const stop = followKeptPerson(qc);
    const keep = () => savePlan(client, week('Saved square'));
    keep();
    qc.setQueryData(authKeys.me(), { ...client });
    expect(keptPlan()).not.toBeNull();
    qc.setQueryData(authKeys.me(), null);
    expect(keptPlan()).toBeNull();
    expect(keptPerson()).toBeNull();
    keep();
    qc.setQueryData(authKeys.me(), signedIn({ id: 2, role: 'coach' }));
    expect(keptPlan()).toBeNull();
    keep();
    qc.setQueryData(authKeys.me(), { ...client, workspaceId: client.workspaceId + 1 });
    expect(keptPlan()).toBeNull();
    stop();
  });
});

describe('a device not kept signed in (a shared computer)', () => {
  const shared = { ...client, staysSignedIn: false };

  it('keeps nothing of its person for offline use', async () => {
    const qc = queryClientFor(shared);
    vi.useFakeTimers({ now: wednesday, toFake: ['Date'] });
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(week('Chive square'))));
    renderInApp(<MyPlates />, qc);
    expect(await screen.findByRole('heading', { level: 2, name: 'Chive square' })).toBeTruthy();
    expect(keptPlan()).toBeNull();
    expect(keptPerson()).toBeNull();
  });

  it('forgets what an earlier kept sign-in of the same person saved, once they sign in here without keeping', () => {
    const qc = testQueryClient();
    const stop = followKeptPerson(qc);
    savePlan(client, week('Saved square'));
    qc.setQueryData(authKeys.me(), { ...client });
    expect(keptPlan()).not.toBeNull();
    qc.setQueryData(authKeys.me(), shared);
    expect(keptPlan()).toBeNull();
    expect(keptPerson()).toBeNull();
    stop();
  });
});

describe("a client's targets without a network", () => {
  // The client's own profile as GET /api/clients/:id answers it (invented numbers).
  const own = (kcal: number) => ({
    ...emptyClient, id: client.clientId, name: client.name, allergens: ['milk'], dislikes: [],
    targets: { mode: 'computed', reeKcal: 1370, tdeeKcal: kcal, targetKcal: kcal, netCarbCapG: 20, proteinG: 105, fatG: 150, notes: [], slots: {} },
    slotShares: {}, version: 1,
  });

  it('are kept with the plan, open offline from there, and say when they were saved', async () => {
    vi.useFakeTimers({ now: wednesday, toFake: ['Date'] });
    keepAnswer('my-targets', client, own(1884), savedAt);
    onlineManager.setOnline(false);
    const fetch = vi.fn(async () => jsonResponse(own(1900)));
    vi.stubGlobal('fetch', fetch);
    renderInApp(<MyTargets />, queryClientFor(client));
    expect(await screen.findByText('Your targets as saved on this device')).toBeTruthy();
    expect(screen.getByText('1884 kcal')).toBeTruthy();
    expect(fetch).not.toHaveBeenCalled();
    act(() => onlineManager.setOnline(true));
    expect(await screen.findByText('1900 kcal')).toBeTruthy();
    expect(screen.queryByText('Your targets as saved on this device')).toBeNull();
    await waitFor(() => expect(keptAnswer<{ targets: { targetKcal: number } }>('my-targets', client)?.data.targets.targetKcal).toBe(1900));
  });
});

describe('the signed-in check without a network', () => {
  it("takes the saved plan's person offline, without asking the server", async () => {
    savePlan(client, week('Saved square'));
    onlineManager.setOnline(false);
    const fetch = vi.fn(async () => jsonResponse(null, 401));
    vi.stubGlobal('fetch', fetch);
    await expect(signedInPerson(testQueryClient())).resolves.toMatchObject({ id: client.id, role: 'client' });
    expect(fetch).not.toHaveBeenCalled();
  });

  it("takes it too when the server cannot be reached; a server's answer still counts", async () => {
    savePlan(client, week('Saved square'));
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))));
    await expect(signedInPerson(testQueryClient())).resolves.toMatchObject({ id: client.id });
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse({ title: 'Server error' }, 500)));
    await expect(signedInPerson(testQueryClient())).rejects.toMatchObject({ status: 500 });
  });

  it('waits for the network when nothing is saved, then asks', async () => {
    onlineManager.setOnline(false);
    const fetch = vi.fn(async () => jsonResponse(signedIn()));
    vi.stubGlobal('fetch', fetch);
    let me: unknown;
    // Mounted, as the app's provider does: a mounted client takes up waiting reads when the network comes back.
    const qc = testQueryClient();
    qc.mount();
    void signedInPerson(qc).then((m) => (me = m));
    await new Promise((r) => setTimeout(r, 50));
    expect(me).toBeUndefined();
    expect(fetch).not.toHaveBeenCalled();
    onlineManager.setOnline(true);
    await waitFor(() => expect(me).toMatchObject({ role: 'coach' }));
    qc.unmount();
  });
});
