import { useEffect, useId, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { useQuery, type UseQueryResult } from '@tanstack/react-query';
import type { ClientDto, ClientListItemDto } from '@shared/schemas/clients.schema';
import type { BoardDto, WeekPublishedAllergensDto } from '@shared/schemas/weeks.schema';
import { NOTE_MAX, SKIP_REASON_TEXT, type SendWeekResultDto } from '@shared/schemas/week-mail.schema';
import { outboxBusy, outboxQuery } from '../api/mail.queries';
import { Button } from '@/components/ui/button';
import { TextAreaField } from '@/components/ui/field';
import { ErrorState, Notice, Progress, Skeleton } from '@/components/ui/states';
import { markShown, reasonOf } from '@/lib/problem';
import { localToday } from '@/lib/dates';
import { paths } from '@/config/paths';
import { clientPlanPdfUrl } from '../api/week-mail.queries';
import { useSendWeek } from '../api/use-send-week';
import { counted, filterByText } from '@/lib/words';
import { FILTER_FROM, ListFilter } from '@/components/ui/list-filter';

/** Live progress of one batch: polls the outbox filtered by the batch until nothing waits. */
function BatchProgress({ result }: { result: SendWeekResultDto }) {
  const q = useQuery(outboxQuery({ batchId: result.batchId }));
  if (q.isPending) return <Skeleton className="h-10 w-full" label="Loading the sending progress" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const c = q.data.counts;
  const total = q.data.total;
  const pending = c.queued + c.sending + c.retrying;
  return (
    <div className="flex flex-col gap-2" aria-live="polite">
      <Progress value={c.sent + c.failed} max={total} label={outboxBusy(q.data) ? 'Sending plans' : 'Plans sent'} />
      <p className="num text-sm">
        {c.sent} sent · {pending} waiting{c.retrying ? ` (${c.retrying} retrying)` : ''} · {c.failed} failed
      </p>
      {c.failed > 0 && (
        <Notice tone="block" title={`${counted(c.failed, 'e-mail')} failed`}>
          Open the <Link to={paths.outbox} className="underline">outbox</Link> to see why and send them again.
        </Notice>
      )}
    </div>
  );
}

/**
 * "Send plans": e-mail the week's PUBLISHED plan (PDF attached) to all clients on the board or to some, with a
 * personal note; then a live progress bar of the batch. `clients`: the workspace's clients (the page reads them);
 * `clashes`: the published version's plates holding an allergen put on a client's list since (the page reads them);
 * `preselect`: clients to start with as "only the clients I choose" (a link from a client's profile names them), the
 * panel then scrolled into view.
 */
export function SendPlansPanel({
  board,
  clients,
  clashes,
  preselect = [],
}: {
  board: BoardDto;
  clients: UseQueryResult<ClientListItemDto[]>;
  clashes?: WeekPublishedAllergensDto;
  preselect?: number[];
}) {
  const send = useSendWeek(board.week.id);
  const [mode, setMode] = useState<'all' | 'some'>(preselect.length ? 'some' : 'all');
  const [chosen, setChosen] = useState<Set<number>>(() => new Set(preselect));
  const top = useRef<HTMLDivElement>(null);
  const ready = !clients.isPending && !!board.week.publishedVersion;
  const wantsView = preselect.length > 0;
  useEffect(() => {
    // The card around the panel (its heading) when there is one; the page's top bar covers its scroll margin.
    if (ready && wantsView) (top.current?.closest('section') ?? top.current)?.scrollIntoView?.({ block: 'start' });
  }, [ready, wantsView]);
  const [note, setNote] = useState('');
  const [find, setFind] = useState('');
  const [result, setResult] = useState<SendWeekResultDto | null>(null);
  const [error, setError] = useState<string | null>(null);
  const groupId = useId();

  const published = board.week.publishedVersion;
  const onBoard = new Set(board.cells.map((c) => c.clientId));
  const profiles = (clients.data ?? []).filter((c): c is ClientDto => 'email' in c);
  const listed = profiles.filter((c) => onBoard.has(c.id));
  const withEmail = listed.filter((c) => c.email);
  // Choosing among many clients: a search over the list (what is chosen stays chosen when it is filtered out).
  const shownClients = filterByText(listed, find, (c) => [c.name, c.email ?? '']);
  const clashing = new Map((clashes?.publishedVersion === published ? clashes.clients : []).map((c) => [c.clientId, c.plates.length]));
  const clashingWithEmail = withEmail.filter((c) => clashing.has(c.id)).map((c) => c.id);

  if (!published) {
    return <Notice tone="info" title="Publish the week first">Clients receive the published plan; publish it, then send it here.</Notice>;
  }
  if (clients.isPending) return <Skeleton className="h-24 w-full" label="Loading clients" />;
  if (clients.isError) return <ErrorState error={clients.error} retry={() => clients.refetch()} />;
  if (listed.length === 0) {
    return <Notice tone="info" title="No client has plates on this week">Place plates on the board and publish before sending.</Notice>;
  }

  const toggle = (id: number) =>
    setChosen((s) => {
      const n = new Set(s);
      if (n.has(id)) n.delete(id);
      else n.add(id);
      return n;
    });

  // A client chosen through a link who is not on the board or has no e-mail cannot be sent to: not counted, not sent.
  const sendable = new Set(withEmail.map((c) => c.id));
  const picked = [...chosen].filter((id) => sendable.has(id));

  const submit = () => {
    setError(null);
    const clientIds = mode === 'some' ? picked : undefined;
    send.mutate(
      { clientIds, note: note.trim() || undefined, requestId: crypto.randomUUID(), today: localToday() },
      {
        onSuccess: (r) => setResult(r),
        onError: (e) => {
          markShown(e);
          setError(reasonOf(e));
        },
      },
    );
  };

  return (
    <div ref={top} className="flex flex-col gap-4">
      {board.week.changedSincePublished && (
        <Notice tone="warn" title={`The board changed since version ${published} was published`}>
          Clients receive version {published}, as published. Publish a new version first to send the changes.
        </Notice>
      )}
      {clashing.size > 0 && (
        <Notice
          tone="warn"
          title={`${clashing.size === 1 ? `${clashes!.clients[0].name}’s published plates hold an allergen put on their list` : `${clashing.size} clients’ published plates hold an allergen put on their lists`} since version ${published}`}
        >
          Their PDFs say not to eat those plates before asking you. To send plans without them, change the plates on the board (or allow the allergen
          with a reason) and publish a new version first.
          {clashingWithEmail.length > 0 && (
            <div className="mt-2">
              <Button
                size="sm"
                variant="secondary"
                onClick={() => {
                  setMode('some');
                  setChosen(new Set(clashingWithEmail));
                }}
              >
                {clashing.size === 1 ? `Send to ${clashes!.clients[0].name} only` : `Choose only ${clashingWithEmail.length === 1 ? 'the one with an e-mail' : `these ${clashingWithEmail.length}`}`}
              </Button>
            </div>
          )}
        </Notice>
      )}
      <form
        className="flex flex-col gap-4"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 font-bold">Send to</legend>
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" name={`${groupId}-mode`} checked={mode === 'all'} onChange={() => setMode('all')} />
            All clients on this week with an e-mail ({withEmail.length} of {listed.length})
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input type="radio" name={`${groupId}-mode`} checked={mode === 'some'} onChange={() => setMode('some')} />
            Only the clients I choose
          </label>
          {mode === 'some' && listed.length > FILTER_FROM && (
            <ListFilter label="Find a client" placeholder="name or e-mail" value={find} onChange={setFind} shown={shownClients.length} total={listed.length} />
          )}
          <ul className="grid gap-1 sm:grid-cols-2" aria-label="Clients on this week">
            {(mode === 'some' ? shownClients : listed).map((c) => (
              <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 rounded-lg bg-paper px-3 py-2">
                <label className="flex min-h-9 items-center gap-2">
                  <input
                    type="checkbox"
                    disabled={mode === 'all' || !c.email}
                    checked={mode === 'all' ? !!c.email : chosen.has(c.id)}
                    onChange={() => toggle(c.id)}
                  />
                  <span>
                    {c.name}
                    <span className="block text-sm text-ink-soft">{c.email ?? 'No e-mail on the profile: add one to send'}</span>
                    {clashing.has(c.id) && (
                      <span className="block text-sm font-bold text-signal-700">⚠ {counted(clashing.get(c.id)!, 'plate')} with an allergen on their list</span>
                    )}
                  </span>
                </label>
                <a className="text-sm underline" href={clientPlanPdfUrl(board.week.id, c.id)} target="_blank" rel="noreferrer">
                  PDF
                </a>
              </li>
            ))}
          </ul>
        </fieldset>
        <TextAreaField
          label="Personal note (optional)"
          value={note}
          maxLength={NOTE_MAX}
          rows={3}
          onChange={(e) => setNote(e.target.value)}
          hint={`${note.length} / ${NOTE_MAX} characters; it goes in the e-mail and on the PDF`}
        />
        {error && <Notice tone="block" title="Not sent">{error}</Notice>}
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" busy={send.isPending} disabled={send.isPending || (mode === 'some' && picked.length === 0) || (mode === 'all' && withEmail.length === 0)}>
            {mode === 'all' ? `Send to ${counted(withEmail.length, 'client')}` : `Send to ${counted(picked.length, 'client')}`}
          </Button>
          <Link to={paths.outbox} className="underline">
            Open the outbox
          </Link>
        </div>
      </form>

      {result && (
        <div className="flex flex-col gap-2 rounded-lg border border-line-strong p-3">
          <p className="font-bold">
            {result.repeated ? 'Already sent: this is the same batch' : `${counted(result.queued, 'plan')} queued`} (published version {result.publicationVersion})
          </p>
          {result.queued > 0 && <BatchProgress result={result} />}
          {result.skipped.length > 0 && (
            <Notice tone="warn" title={`${counted(result.skipped.length, 'client')} skipped`}>
              <ul>
                {result.skipped.map((s) => (
                  <li key={s.clientId}>
                    {s.name ?? `Client ${s.clientId}`}: {SKIP_REASON_TEXT[s.reason]}
                  </li>
                ))}
              </ul>
            </Notice>
          )}
        </div>
      )}
    </div>
  );
}
