import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { OUTBOX_STATUSES, type OutboxStatus } from '@shared/schemas/mail.schema';
import { outboxBusy, outboxQuery } from '@/features/mail/api/mail.queries';
import { useRetryOutbox } from '@/features/mail/api/use-retry-outbox';
import { MAIL_KIND_WORDS, OutboxStatusBadge } from '@/features/mail/components/outbox-status';
import { Button } from '@/components/ui/button';
import { Pager } from '@/components/ui/pager';
import { SelectField } from '@/components/ui/field';
import { Card, EmptyState, Notice, PageHeader, Progress, QueryView, Skeleton } from '@/components/ui/states';
import { errorMessage } from '@/lib/problem';
import { paths } from '@/config/paths';
import { momentLabel } from '@/lib/dates';

/** What each attachment kind is, in words (an unknown kind shows as stored). */
const ATTACHMENT_WORDS: Record<string, string> = { 'week-plan': 'the week plan (PDF)', 'week-thaw-reminders': 'thaw reminders (calendar)' };

export function Component() {
  const [page, setPage] = useState(1);
  const [status, setStatus] = useState<OutboxStatus | ''>('');
  const outbox = useQuery(outboxQuery({ page, status: status || undefined }));
  const retry = useRetryOutbox();
  const [retryError, setRetryError] = useState<string | null>(null);

  const data = outbox.data;
  const busy = outboxBusy(data);
  // Recent: within 10 minutes of when the page read the outbox (it reads again while anything is sending).
  const activeBatches = (data?.batches ?? []).filter((b) => b.pending > 0 || outbox.dataUpdatedAt - new Date(b.createdAt).getTime() < 10 * 60_000);
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Outbox"
        lead="Every e-mail Trayline sends for your workspace: invitations, week plans, the prep-day papers for the kitchen, and word from the cooling record (a tray thrown away, a deadline passed, a tray not written down). Failed messages are tried again automatically (up to 5 times, waiting longer each time)."
      >
        {data?.devMailView && (
          <Link className="inline-flex min-h-11 items-center rounded-lg border border-line-strong px-4 font-bold hover:bg-paper-deep" to={paths.devMail}>
            Caught mail (development)
          </Link>
        )}
      </PageHeader>

      {activeBatches.length > 0 && (
        <Card>
          <h2 className="mb-3 text-xl">Sending to many</h2>
          <div className="flex flex-col gap-4">
            {activeBatches.map((b) => (
              <div key={b.batchId} className="flex flex-col gap-1">
                <Progress value={b.sent} max={b.total} label={`Batch of ${momentLabel(b.createdAt)}: sent`} />
                <p className="text-sm text-ink-soft">
                  <span className="num">{b.pending}</span> waiting · <span className="num">{b.failed}</span> failed
                </p>
              </div>
            ))}
          </div>
        </Card>
      )}

      <Card>
        <div className="mb-4 flex flex-wrap items-end justify-between gap-3">
          <SelectField
            label="Show"
            value={status}
            onChange={(e) => {
              setStatus(e.target.value as OutboxStatus | '');
              setPage(1);
            }}
          >
            <option value="">All messages</option>
            {OUTBOX_STATUSES.map((s) => (
              <option key={s} value={s}>
                {s.charAt(0).toUpperCase() + s.slice(1)} {data ? `(${data.counts[s]})` : ''}
              </option>
            ))}
          </SelectField>
          {busy && (
            <p className="text-sm text-ink-soft" aria-live="polite">
              <span aria-hidden>↻</span> Some messages are on their way; this list refreshes by itself.
            </p>
          )}
        </div>
        {retryError && (
          <div className="mb-3">
            <Notice tone="block" title={retryError} />
          </div>
        )}
        <QueryView
          query={outbox}
          loading={<Skeleton className="h-40 w-full" label="Loading the outbox" />}
          isEmpty={(page) => page.items.length === 0}
          empty={
            <EmptyState title={status ? `No ${status} messages` : 'Nothing sent yet'}>
              Invitations and week plans you send appear here with their delivery status.
            </EmptyState>
          }
        >
          {(page) => (
            <div className="overflow-x-auto">
              <table className="w-full text-left">
                <caption className="sr-only">Messages, newest first</caption>
                <thead>
                  <tr className="border-b border-line text-sm text-ink-faint">
                    <th className="py-2 pr-3">Status</th>
                    <th className="py-2 pr-3">To</th>
                    <th className="py-2 pr-3">What</th>
                    <th className="py-2 pr-3">Queued</th>
                    <th className="py-2 pr-3">Tries</th>
                    <th className="py-2"><span className="sr-only">Actions</span></th>
                  </tr>
                </thead>
                <tbody>
                  {page.items.map((m) => (
                    <tr key={m.id} className="border-b border-line align-top">
                      <td className="py-2 pr-3"><OutboxStatusBadge status={m.status} /></td>
                      <td className="py-2 pr-3 break-all">{m.to}</td>
                      <td className="py-2 pr-3">
                        <p className="font-bold">{MAIL_KIND_WORDS[m.kind] ?? m.kind}</p>
                        <p className="text-sm text-ink-soft">{m.subject}</p>
                        {m.attachments.length > 0 && <p className="text-sm text-ink-faint">Attached: {m.attachments.map((k) => ATTACHMENT_WORDS[k] ?? k).join(', ')}</p>}
                        {m.lastError && m.status !== 'sent' && <p className="text-sm text-signal-700">Last error: {m.lastError}</p>}
                      </td>
                      <td className="py-2 pr-3 text-sm">
                        {momentLabel(m.createdAt)}
                        {m.sentAt && <span className="block text-ink-faint">sent {momentLabel(m.sentAt)}</span>}
                      </td>
                      <td className="num py-2 pr-3">{m.attempts}</td>
                      <td className="py-2">
                        {m.status === 'failed' && (
                          <Button
                            size="sm"
                            variant="secondary"
                            busy={retry.isPending && retry.variables === m.id}
                            onClick={() => {
                              setRetryError(null);
                              retry.mutate(m.id, { onError: (e) => setRetryError(errorMessage(e)) });
                            }}
                          >
                            Send again
                          </Button>
                        )}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </QueryView>
        {data && pages > 1 && (
          <Pager label="Outbox pages" page={page} pages={pages} onPage={setPage} back="Newer" forward="Older" />
        )}
      </Card>
    </div>
  );
}
