import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { MAIL_KIND_WORDS, OutboxStatusBadge } from './outbox-status';
import { EmptyState, ErrorState, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { deliveriesQuery } from '../api/week-mail.queries';
import { counted } from '@/lib/words';
import { momentLabel } from '@/lib/dates';

/** "Plans sent": the e-mails of one client, newest first, with their status (refreshes while some wait). */
export function DeliveryLog({ clientId }: { clientId: number }) {
  const q = useQuery(deliveriesQuery(clientId));
  if (q.isPending) return <Skeleton className="h-20 w-full" label="Loading the delivery log" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  if (q.data.items.length === 0) {
    return <EmptyState title="Nothing sent yet">Send a published week from its board (“Send plans”).</EmptyState>;
  }
  return (
    <ul className="flex flex-col gap-2">
      {q.data.items.map((m) => (
        <li key={m.id} className="flex flex-col gap-1 rounded-lg bg-paper p-3 sm:flex-row sm:items-center sm:justify-between">
          <div className="min-w-0">
            <p className="font-bold">
              {MAIL_KIND_WORDS[m.kind] ?? m.kind}
              {m.weekId && m.weekName ? (
                <>
                  {' · '}
                  <Link to={paths.week(m.weekId)} className="underline">
                    {m.weekName}
                  </Link>
                </>
              ) : null}
            </p>
            <p className="text-sm text-ink-soft">
              To {m.to} · queued <time dateTime={m.createdAt}>{momentLabel(m.createdAt)}</time>
              {m.sentAt && (
                <>
                  {' · sent '}
                  <time dateTime={m.sentAt}>{momentLabel(m.sentAt)}</time>
                </>
              )}
              {m.attachments.length > 0 && ` · ${counted(m.attachments.length, 'attachment')}`}
            </p>
            {m.note && <p className="text-sm italic">“{m.note}”</p>}
            {m.lastError && m.status !== 'sent' && <p className="text-sm text-signal-700">{m.lastError}</p>}
          </div>
          <OutboxStatusBadge status={m.status} />
        </li>
      ))}
    </ul>
  );
}
