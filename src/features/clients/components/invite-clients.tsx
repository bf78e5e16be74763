import { useState } from 'react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import type { InviteClientsResultDto, InviteSkipReason } from '@shared/schemas/auth.schema';
import type { ClientDto } from '@shared/schemas/clients.schema';
import { andList } from '@shared/domain/words';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { agrees, counted } from '@/lib/words';
import { paths } from '@/config/paths';
import { useInviteClients } from '../api/use-client-mutations';

/** A client who can be invited now: not archived, an e-mail on the profile, no account and no invitation open. */
export const readyToInvite = (c: ClientDto) => !c.archivedAt && !!c.email && !c.account && !c.invitation;

const SKIP_WORDS: Record<InviteSkipReason, string> = {
  archived: 'archived',
  'no-email': 'no e-mail address',
  joined: 'already joined',
  invited: 'already invited',
  member: 'the e-mail is a team member’s',
};

/** "Ben Demo (already invited)": who was not invited, and why. */
export const skippedWords = (skipped: InviteClientsResultDto['skipped']) => andList(skipped.map((s) => `${s.name} (${SKIP_WORDS[s.reason]})`));

/**
 * The clients not invited yet who have an e-mail, invited in one press (after an import, say): the press first lists
 * who will get an e-mail, and nothing is sent until the coach confirms.
 */
export function InviteClients({ clients }: { clients: ClientDto[] }) {
  const ready = clients.filter(readyToInvite);
  const [open, setOpen] = useState(false);
  const [done, setDone] = useState<InviteClientsResultDto | null>(null);
  const invite = useInviteClients();
  if (!ready.length && !done) return null;

  const send = () =>
    invite.mutate(
      ready.map((c) => c.id),
      {
        onSuccess: (res) => {
          setOpen(false);
          setDone(res);
          if (res.invited.length) toast.success(`Sent ${counted(res.invited.length, 'invitation')}`);
        },
      },
    );

  return (
    <div className="flex flex-col gap-3">
      {ready.length > 0 && (
        <div className="flex flex-wrap items-center gap-3">
          <p className="text-sm">
            {counted(ready.length, 'client')} {agrees(ready.length, 'has', 'have')} an e-mail address and no invitation yet.
          </p>
          {/* Stays where it is (the keyboard's place is kept); it opens and closes the list below. */}
          <Button variant="secondary" size="sm" onClick={() => { setDone(null); setOpen((o) => !o); }} aria-expanded={open}>
            Invite {ready.length === 1 ? 'them' : `all ${ready.length}`}…
          </Button>
        </div>
      )}
      {open && ready.length > 0 && (
        <div className="flex flex-col gap-2 rounded-lg border border-line-strong p-3" role="group" aria-label="Invitations to send">
          <p className="font-bold">
            {ready.length === 1 ? 'They get' : 'Each of them gets'} an e-mail with a link to their own plates, good for 14 days:
          </p>
          <ul className="flex max-h-64 list-disc flex-col gap-0.5 overflow-y-auto pl-5 text-sm">
            {ready.map((c) => (
              <li key={c.id}>
                {c.name} <span className="text-ink-soft">{c.email}</span>
              </li>
            ))}
          </ul>
          <div className="flex flex-wrap gap-2">
            <Button onClick={send} busy={invite.isPending}>
              Send {counted(ready.length, 'invitation')}
            </Button>
            <Button variant="ghost" onClick={() => setOpen(false)} disabled={invite.isPending}>
              Not now
            </Button>
          </div>
        </div>
      )}
      {done && (
        <Notice tone="info" title={done.invited.length ? `Invited: ${counted(done.invited.length, 'client')}` : 'Nobody new to invite'}>
          {done.invited.length > 0 && (
            <p>
              The e-mails are on their way: follow them in the <Link className="underline" to={paths.outbox}>outbox</Link>.
            </p>
          )}
          {done.skipped.length > 0 && <p>Not invited: {skippedWords(done.skipped)}.</p>}
        </Notice>
      )}
    </div>
  );
}
