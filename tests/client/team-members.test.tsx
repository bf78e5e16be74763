import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { MemberDto } from '@shared/schemas/auth.schema';
import { TeamMembers } from '@/features/auth/components/team-members';
import { jsonResponse, renderInApp, signedIn } from './render';

// An invented team: the coach (asking), one kitchen assistant, one client member.
const person = (id: number, name: string, role: MemberDto['role'], more: Partial<MemberDto> = {}): MemberDto => ({
  id, userId: 100 + id, name, email: `${name.split(' ')[0].toLowerCase()}@example.test`, role, clientId: null, clientName: null,
  joinedAt: '2026-11-02T09:00:00.000Z', you: false, ...more,
});
const team = [person(1, 'Ada Coach', 'coach', { you: true }), person(2, 'Lee Prep', 'assistant'), person(3, 'Olga Client', 'client', { clientId: 7, clientName: 'Olga Client' })];

afterEach(() => vi.unstubAllGlobals());

/**
 * The API as the Team list sees it, with "yes" to every question: GET answers the team; a change (DELETE, PATCH)
 * answers what `change` gives and the team reads as it says from then on. Returns the calls made, with their bodies.
 */
function stubTeamApi(change: () => { team: MemberDto[]; answer: Response }) {
  let current = team;
  const calls: string[] = [];
  vi.stubGlobal('confirm', vi.fn(() => true));
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init?: RequestInit) => {
      calls.push(`${init?.method ?? 'GET'} ${url}${init?.body ? ` ${String(init.body)}` : ''}`);
      if (init?.method && init.method !== 'GET') {
        const next = change();
        current = next.team;
        return next.answer;
      }
      return jsonResponse(current);
    }),
  );
  return calls;
}

describe('people with access (Team page)', () => {
  it('lists everyone with their role; a coach or assistant can change role, and anyone but you can be removed', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(team)));
    renderInApp(<TeamMembers workspaceName="Example Prep" />);
    const rows = within(await screen.findByRole('list', { name: 'People with access' })).getAllByRole('listitem');
    expect(rows.map((r) => r.textContent)).toEqual([
      'Ada Coach (you)Coach · ada@example.test · joined Nov 2, 2026',
      'Lee PrepKitchen assistant · lee@example.test · joined Nov 2, 2026Make coachRemove access',
      'Olga ClientClient · olga@example.test · joined Nov 2, 2026Remove access',
    ]);
    expect(within(rows[0]).queryByRole('button')).toBeNull();
    expect(screen.getAllByRole('button', { name: /^Remove .*'s access$/ })).toHaveLength(2);
  });

  it('asks first, then removes the access and reads the list again', async () => {
    const calls = stubTeamApi(() => ({ team: team.filter((m) => m.id !== 2), answer: new Response(null, { status: 204 }) }));
    renderInApp(<TeamMembers workspaceName="Example Prep" />);
    fireEvent.click(await screen.findByRole('button', { name: "Remove Lee Prep's access" }));
    expect(vi.mocked(window.confirm).mock.calls[0][0]).toMatch(/^Remove Lee Prep's access to Example Prep\? They are signed out/);
    await waitFor(() => expect(screen.queryByText('Lee Prep')).toBeNull());
    expect(calls).toEqual(['GET /api/members', 'DELETE /api/members/2', 'GET /api/members']);
  });

  it('does nothing when the coach changes their mind, and shows a refusal', async () => {
    const fetchMock = vi.fn(async (_url: string, init?: RequestInit) =>
      // Another coach removed them meanwhile.
      init?.method === 'DELETE' ? jsonResponse({ title: 'Not Found', status: 404, detail: 'Member not found' }, 404) : jsonResponse(team),
    );
    vi.stubGlobal('fetch', fetchMock);
    vi.stubGlobal('confirm', vi.fn(() => false));
    renderInApp(<TeamMembers workspaceName="Example Prep" />);
    fireEvent.click(await screen.findByRole('button', { name: "Remove Olga Client's access" }));
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'DELETE')).toBe(false);
    vi.stubGlobal('confirm', vi.fn(() => true));
    fireEvent.click(screen.getByRole('button', { name: "Remove Olga Client's access" }));
    expect(await screen.findByText('Member not found')).toBeTruthy();
    expect(screen.getByText('Access not removed')).toBeTruthy();
  });
});

describe('changing a role', () => {
  it('asks first, naming what the person will see, then makes the assistant a coach and reads the list again', async () => {
    const promoted = team.map((m) => (m.id === 2 ? { ...m, role: 'coach' as const } : m));
    const calls = stubTeamApi(() => ({ team: promoted, answer: jsonResponse(promoted[1]) }));
    renderInApp(<TeamMembers workspaceName="Example Prep" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Make Lee Prep a coach' }));
    expect(vi.mocked(window.confirm).mock.calls[0][0]).toBe("Make Lee Prep a coach? They get everything you have: clients' profiles with health notes, planning, publishing, the team.");
    expect(await screen.findByRole('button', { name: 'Make Lee Prep a kitchen assistant' })).toBeTruthy();
    expect(calls).toEqual(['GET /api/members', 'PATCH /api/members/2 {"role":"coach"}', 'GET /api/members']);
  });

  it('shows the refusal when the workspace would lose its last coach', async () => {
    const two = [team[0], person(4, 'Bea Coach', 'coach')];
    vi.stubGlobal('confirm', vi.fn(() => true));
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) =>
        init?.method === 'PATCH' ? jsonResponse({ title: 'Conflict', status: 409, detail: 'The workspace needs a coach: make someone else a coach first' }, 409) : jsonResponse(two),
      ),
    );
    renderInApp(<TeamMembers workspaceName="Example Prep" />);
    fireEvent.click(await screen.findByRole('button', { name: 'Make Bea Coach a kitchen assistant' }));
    expect(await screen.findByText('The workspace needs a coach: make someone else a coach first')).toBeTruthy();
    expect(screen.getByText('Role not changed')).toBeTruthy();
  });
});

describe('the Team page', () => {
  it("says when someone who joined by invitation has had their access removed since", async () => {
    const { Component: TeamPage } = await import('@/app/routes/team/team.route');
    const invitation = (id: number, email: string) => ({ id, email, role: 'assistant', expiresAt: '2026-11-16T09:00:00.000Z', acceptedAt: '2026-11-03T09:00:00.000Z' });
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string) => {
        if (url === '/api/invitations') return jsonResponse([invitation(9, 'Lee@example.test'), invitation(8, 'sam@example.test')]);
        if (url === '/api/members') return jsonResponse(team);
        if (url === '/api/auth/me') return jsonResponse(signedIn());
        throw new Error(`unexpected ${url}`);
      }),
    );
    renderInApp(<TeamPage />);
    const lee = (await screen.findByText('Lee@example.test')).closest('tr')!;
    await waitFor(() => expect(within(lee).getByText('Joined')).toBeTruthy());
    expect(within(screen.getByText('sam@example.test').closest('tr')!).getByText('Joined; access removed since')).toBeTruthy();
  });
});
