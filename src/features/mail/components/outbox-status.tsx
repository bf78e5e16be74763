import type { MailKind, OutboxStatus } from '@shared/schemas/mail.schema';

/** What each kind of e-mail is, in words (the outbox and a client's delivery log). */
export const MAIL_KIND_WORDS: Record<MailKind, string> = {
  invitation: 'Invitation',
  'password-reset': 'Password reset',
  'password-changed': 'Password changed',
  'week-plan': 'Week plan',
  'shopping-list': 'Shopping list',
  'bake-run': 'Bake run',
  'prep-day': 'Prep-day papers',
  'cooling-record': 'Cooling record: tray thrown away or kept',
  'cooling-missed': 'Cooling record: a deadline passed or a tray not written down',
};

const LOOK: Record<OutboxStatus, { icon: string; label: string; cls: string }> = {
  queued: { icon: '…', label: 'Queued', cls: 'border-line-strong bg-paper-deep text-ink' },
  sending: { icon: '↗', label: 'Sending', cls: 'border-frost bg-frost-50 text-ink' },
  sent: { icon: '✓', label: 'Sent', cls: 'border-herb bg-paper-card text-ink' },
  retrying: { icon: '↻', label: 'Retrying', cls: 'border-caution bg-caution-50 text-ink' },
  failed: { icon: '✖', label: 'Failed', cls: 'border-signal bg-signal-50 text-ink' },
};

/** A status as icon + word (never colour alone). */
export function OutboxStatusBadge({ status }: { status: OutboxStatus }) {
  const l = LOOK[status];
  return (
    <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-sm font-bold ${l.cls}`}>
      <span aria-hidden>{l.icon}</span>
      {l.label}
    </span>
  );
}
