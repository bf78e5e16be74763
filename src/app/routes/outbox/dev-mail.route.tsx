import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { caughtAttachmentUrl, caughtMailListQuery, caughtMailQuery } from '@/features/mail/api/mail.queries';
import { Button } from '@/components/ui/button';
import { Pager } from '@/components/ui/pager';
import { Card, EmptyState, ErrorState, Notice, PageHeader, Skeleton } from '@/components/ui/states';
import { isApiError } from '@/lib/problem';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'medium' });
const kb = (n: number) => `${Math.max(1, Math.round(n / 1024))} KB`;

function Message({ id }: { id: number }) {
  const q = useQuery(caughtMailQuery(id));
  if (q.isPending) return <Skeleton className="h-32 w-full" label="Loading the message" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const m = q.data;
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm text-ink-soft">From {m.from} · Message-ID <span className="font-mono">{m.messageId}</span></p>
      <pre className="max-h-96 overflow-auto whitespace-pre-wrap rounded-lg bg-paper p-3 text-sm">{m.text ?? '(no plain-text part)'}</pre>
    </div>
  );
}

/** What the local mail catcher caught (development): each message of this workspace, with its attachments. */
export function Component() {
  const [page, setPage] = useState(1);
  const [open, setOpen] = useState<number | null>(null);
  const list = useQuery(caughtMailListQuery(page));
  const pages = list.data ? Math.max(1, Math.ceil(list.data.total / list.data.pageSize)) : 1;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Caught mail" lead="Development only: the local mail catcher keeps every message instead of delivering it. Only this workspace's messages are shown." />
      <Card>
        {list.isPending ? (
          <Skeleton className="h-40 w-full" label="Loading caught mail" />
        ) : list.isError ? (
          isApiError(list.error, 404) ? (
            <Notice tone="info" title="The dev mail view is off here">
              It is on when mail goes to the local catcher (SMTP_HOST on 127.0.0.1) and DEV_MAIL_VIEW is 1.
            </Notice>
          ) : (
            <ErrorState error={list.error} retry={() => list.refetch()} />
          )
        ) : list.data.items.length === 0 ? (
          <EmptyState title="No mail caught yet">Invite someone or send a week plan; the message shows up here.</EmptyState>
        ) : (
          <ul className="flex flex-col divide-y divide-line">
            {list.data.items.map((m) => (
              <li key={m.id} className="flex flex-col gap-2 py-3">
                <div className="flex flex-wrap items-start justify-between gap-2">
                  <div>
                    <p className="font-bold">{m.subject || '(no subject)'}</p>
                    <p className="text-sm text-ink-soft">To {m.to} · {when(m.receivedAt)}</p>
                  </div>
                  <Button size="sm" variant="secondary" aria-expanded={open === m.id} onClick={() => setOpen(open === m.id ? null : m.id)}>
                    {open === m.id ? 'Hide' : 'Read'}
                  </Button>
                </div>
                {m.attachments.length > 0 && (
                  <ul className="flex flex-wrap gap-2 text-sm">
                    {m.attachments.map((a) => (
                      <li key={a.index}>
                        <a className="font-bold underline" href={caughtAttachmentUrl(m.id, a.index)} target="_blank" rel="noreferrer">
                          {a.filename}
                        </a>{' '}
                        <span className="text-ink-faint">({a.contentType}, {kb(a.size)})</span>
                      </li>
                    ))}
                  </ul>
                )}
                {open === m.id && <Message id={m.id} />}
              </li>
            ))}
          </ul>
        )}
        {list.data && pages > 1 && (
          <Pager label="Caught mail pages" page={page} pages={pages} onPage={setPage} back="Newer" forward="Older" />
        )}
      </Card>
    </div>
  );
}
