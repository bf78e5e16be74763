import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { toast } from 'sonner';
import type { ClientDto } from '@shared/schemas/clients.schema';
import { emptyClient } from '@/features/clients/components/client-form';
import { InviteClients, readyToInvite, skippedWords } from '@/features/clients/components/invite-clients';
import { jsonResponse, renderInApp } from './render';

vi.mock('sonner', () => ({ toast: { error: vi.fn(), success: vi.fn() } }));
afterEach(() => vi.unstubAllGlobals());

// Invented profiles, as the coach's list reads them.
const client = (id: number, name: string, over: Partial<ClientDto> = {}): ClientDto =>
  ({
    ...emptyClient,
    id,
    name,
    email: `${name.toLowerCase()}@example.test`,
    archivedAt: null,
    account: null,
    invitation: null,
    version: 1,
    ...over,
  }) as unknown as ClientDto;

describe('inviting the clients not invited yet, in one press', () => {
  it('counts only clients with an e-mail, no account, no open invitation and not archived', () => {
    expect(readyToInvite(client(1, 'Ana'))).toBe(true);
    expect(readyToInvite(client(2, 'Ben', { email: null }))).toBe(false);
    expect(readyToInvite(client(3, 'Cleo', { archivedAt: '2026-12-01T00:00:00.000Z' }))).toBe(false);
    expect(readyToInvite(client(4, 'Dana', { account: { email: 'd@example.test', name: 'Dana' } }))).toBe(false);
    expect(readyToInvite(client(5, 'Eve', { invitation: { email: 'e@example.test', expiresAt: '2026-12-14T00:00:00.000Z' } }))).toBe(false);
  });

  it('says who was not invited and why', () => {
    expect(skippedWords([{ clientId: 1, name: 'Ben', reason: 'invited' }, { clientId: 2, name: 'Cleo', reason: 'no-email' }])).toBe(
      'Ben (already invited) and Cleo (no e-mail address)',
    );
  });

  it('shows nothing when nobody is left to invite', () => {
    vi.stubGlobal('fetch', vi.fn());
    const { container } = renderInApp(<InviteClients clients={[client(2, 'Ben', { email: null })]} />);
    expect(container.textContent).toBe('');
  });

  it('lists who will get an e-mail before anything is sent, sends their ids, then says what was done', async () => {
    const sent: unknown[] = [];
    vi.stubGlobal(
      'fetch',
      vi.fn(async (_url: string, init?: RequestInit) => {
        sent.push(JSON.parse(String(init!.body)));
        return jsonResponse(
          { invited: [{ clientId: 1, name: 'Ana', email: 'ana@example.test' }], skipped: [{ clientId: 3, name: 'Cleo', reason: 'member' }], batchId: 'b1' },
          201,
        );
      }),
    );
    renderInApp(<InviteClients clients={[client(1, 'Ana'), client(2, 'Ben', { email: null }), client(3, 'Cleo')]} />);
    expect(screen.getByText('2 clients have an e-mail address and no invitation yet.')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Invite all 2…' }));
    const group = screen.getByRole('group', { name: 'Invitations to send' });
    expect(within(group).getAllByRole('listitem').map((li) => li.textContent)).toEqual(['Ana ana@example.test', 'Cleo cleo@example.test']);
    expect(sent).toEqual([]);
    fireEvent.click(within(group).getByRole('button', { name: 'Send 2 invitations' }));
    await waitFor(() => expect(toast.success).toHaveBeenCalledWith('Sent 1 invitation'));
    expect(sent).toEqual([{ clientIds: [1, 3] }]);
    const note = screen.getByText('Invited: 1 client').closest('[role="note"]');
    expect(note?.textContent).toContain('Not invited: Cleo (the e-mail is a team member’s).');
    expect(screen.getByRole('link', { name: 'outbox' }).getAttribute('href')).toBe('/outbox');
  });
});
