import { useMemo, useRef, useState } from 'react';
import { Link, useLocation, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { allergenConflicts } from '@shared/domain/allergens';
import { flatWarnings } from '@shared/domain/week-check';
import { WarningGroups } from '@/features/weeks/components/warning-groups';
import type { BoardDto, CellInput } from '@shared/schemas/weeks.schema';
import { expandBoard, type BoardAnswer } from '@shared/schemas/board-answer';
import { boardQuery, weekPublishedAllergensQuery } from '@/features/weeks/api/weeks.queries';
import { PublishedAllergenClashes } from '@/features/weeks/components/published-allergen-clashes';
import { weekKeys } from '@/features/weeks/api/weeks.keys';
import { useCopyDay, useCoverTrays, useDeleteWeek, usePublishWeek, usePutCells, usePutTrays, useUpdateWeek, type WeekPageState } from '@/features/weeks/api/use-week-mutations';
import { AllergenOverridePrompt, BoardGrid, type CellEdit } from '@/features/weeks/components/board-grid';
import { countsWithTyped, InventoryPanel, portionSummary } from '@/features/weeks/components/inventory-panel';
import { PublishedVersions } from '@/features/weeks/components/published-versions';
import { PrepDates } from '@/features/weeks/components/prep-dates';
import { CopyDayCard } from '@/features/weeks/components/copy-day-card';
import { SendPlansPanel } from '@/features/mail/components/send-plans-panel';
import { clientsQuery } from '@/features/clients/api/clients.queries';
import { membersQuery } from '@/features/auth/api/auth.queries';
import { PrepDayMailPanel } from '@/features/mail/components/prep-day-mail-panel';
import { Button } from '@/components/ui/button';
import { RevealedAlert } from '@/components/ui/stale-edit-notice';
import { Card, EmptyState, ErrorState, Notice, PageHeader, PageSkeleton } from '@/components/ui/states';
import { Cautions } from '@/components/domain/cautions';
import { errorMessage, isApiError, markShown, reasonOf } from '@/lib/problem';
import { paths } from '@/config/paths';
import { agrees, counted } from '@/lib/words';
import { dayLabel, kitchenToday } from '@/lib/dates';

type Pending = { kind: 'cells'; edit: CellEdit } | { kind: 'other'; label: string; run: (version: number) => void };

export function Component() {
  const id = Number(useParams().weekId);
  const copied = (useLocation().state as WeekPageState | null)?.copied;
  // "?send=3": a client's profile sends the coach here to e-mail that client's plan again.
  const [search] = useSearchParams();
  const sendTo = useMemo(() => search.getAll('send').map(Number).filter((n) => Number.isInteger(n) && n > 0), [search]);
  const qc = useQueryClient();
  const q = useQuery(boardQuery(id));
  const putCells = usePutCells(id);
  const putTrays = usePutTrays(id);
  const cover = useCoverTrays(id);
  const copyDay = useCopyDay(id);
  const publish = usePublishWeek(id);
  const update = useUpdateWeek(id);
  // The sending panels' people: the clients to send plans to, the team to send prep-day papers to.
  const clients = useQuery(clientsQuery());
  const team = useQuery(membersQuery());
  // What clients follow (the published version) against their allergen lists as they stand.
  const current = q.data?.week.publishedVersion ?? null;
  const clashes = useQuery({ ...weekPublishedAllergensQuery(id, current, kitchenToday()), enabled: current !== null });
  const [conflict, setConflict] = useState<Pending | null>(null);
  const [kept, setKept] = useState(0);
  const [conflictSeq, setConflictSeq] = useState(0);
  const [allergen, setAllergen] = useState<{ edit: CellEdit; message: string } | null>(null);
  // The board shows only the clients with something flagged: its own box, or the problem list's "Show only those clients".
  const [onlyFlagged, setOnlyFlagged] = useState(false);
  const boardTop = useRef<HTMLDivElement>(null);
  const showFlagged = () => {
    setOnlyFlagged(true);
    // The keyboard lands on the board's box (ticked), which brings the board into view.
    requestAnimationFrame(() => boardTop.current?.querySelector<HTMLInputElement>('input[data-only-flagged]')?.focus());
  };
  const [error, setError] = useState<string | null>(null);
  const busy = putCells.isPending || putTrays.isPending || cover.isPending || copyDay.isPending || publish.isPending || update.isPending;

  // The week's problem list, blocks first: built once per board answer from the day checks.
  const warnings = useMemo(() => (q.data ? flatWarnings(q.data.checks) : []), [q.data]);

  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const board = q.data;

  /** A 409 loads their board and keeps ours pending: the coach chooses (merge prompt), never a silent overwrite. */
  const onFail = (pending: Pending) => (e: unknown) => {
    markShown(e); // the merge prompt, the allergen prompt or the notice below says it
    if (isApiError(e, 409) && e.problem.code === 'stale_version') {
      const current = e.problem.current as BoardAnswer | undefined;
      if (current) qc.setQueryData(weekKeys.detail(id), expandBoard(current));
      else void q.refetch();
      setConflict(pending);
      setConflictSeq((n) => n + 1);
      return;
    }
    if (pending.kind === 'cells' && isApiError(e, 400)) {
      const msg = Object.entries(e.fieldErrors).find(([k]) => k.endsWith('allergenOverrides'))?.[1]?.[0];
      if (msg) {
        setAllergen({ edit: pending.edit, message: msg });
        return;
      }
    }
    setError(reasonOf(e));
  };

  const sendCells = (edit: CellEdit, version = board.week.version) => {
    setError(null);
    putCells.mutate({ version, cells: edit.cells }, { onError: onFail({ kind: 'cells', edit }) });
  };

  const withVersion = (label: string, run: (version: number) => void) => {
    setError(null);
    run(board.week.version);
    return label;
  };

  const overrideAndSend = (reason: string) => {
    if (!allergen) return;
    const cells: CellInput[] = allergen.edit.cells.map((c) => {
      const client = board.clients.find((x) => x.id === c.clientId);
      const plate = board.plates.find((p) => p.id === c.assemblyId);
      const codes = allergenConflicts(plate?.allergens ?? [], client?.allergens ?? []);
      return { ...c, allergenOverrides: codes.map((allergen) => ({ allergen, reason })) };
    });
    setAllergen(null);
    sendCells({ ...allergen.edit, cells });
  };

  const blocks = warnings.filter((w) => w.severity === 'block');
  const clientName = (id: string) => board.clients.find((c) => String(c.id) === String(id))?.name ?? 'A client';
  /** One problem of the list (three or fewer; a longer list reads by kind): whose day, which day, what. */
  const problemLine = (w: (typeof warnings)[number], i: number) => (
    <p key={i}>
      <span className="font-bold">{clientName(w.clientId)}</span>, {dayLabel(w.date)}: {w.message}
    </p>
  );
  const warns = warnings.filter((w) => w.severity === 'warn');
  const portions = portionSummary(board);

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title={board.week.name}
        lead={`${dayLabel(board.week.startDate)} – ${dayLabel(board.week.endDate)} · prep ${board.prepDates.map((d) => dayLabel(d)).join(' and ')} · ${
          board.week.publishedVersion ? `published v${board.week.publishedVersion}${board.week.changedSincePublished ? ', changed since' : ''}` : 'not published'
        }`}
      >
        <Link to={paths.weeks} className="inline-flex min-h-11 items-center rounded-lg px-3 font-bold underline">
          All weeks
        </Link>
        <Link to={`${paths.weeks}?from=${board.week.id}`} className="inline-flex min-h-11 items-center rounded-lg px-3 font-bold underline">
          Copy to a new week
        </Link>
        <Button
          busy={publish.isPending}
          disabled={busy || blocks.length > 0 || board.cells.length === 0}
          onClick={() => withVersion('publish', (version) => publish.mutate({ version }, { onError: onFail({ kind: 'other', label: 'Publish', run: (v) => publish.mutate({ version: v }) }) }))}
        >
          {board.week.publishedVersion ? 'Publish a new version' : 'Publish to clients'}
        </Button>
      </PageHeader>

      {copied && (
        <Notice tone="info" title={`Copied from ${copied.from}`}>
          {counted(copied.meals, 'meal')} came over, with the tray counts.
          {copied.leftBehind > 0 && ` ${counted(copied.leftBehind, 'meal')} stayed behind: ${agrees(copied.leftBehind, 'its', 'their')} client or plate is archived.`}
        </Notice>
      )}

      {conflict && (
        // Brought into view with the keyboard on it: the change may have been pressed far down the page (tray counts).
        <RevealedAlert key={conflictSeq}>
          <Notice tone="warn" title="Someone else changed this week since you opened it">
            <p>The board now shows their version (v{board.week.version}). Your change was not saved: {conflict.kind === 'cells' ? conflict.edit.label : conflict.label}.</p>
            <div className="mt-2 flex gap-2">
              <Button
                size="sm"
                onClick={() => {
                  const c = conflict;
                  setConflict(null);
                  if (c.kind === 'cells') sendCells(c.edit, board.week.version);
                  else c.run(board.week.version);
                }}
              >
                Apply my change on top of theirs
              </Button>
              <Button
                size="sm"
                variant="secondary"
                onClick={() => {
                  setConflict(null);
                  // Typed prep days go too: the card shows theirs.
                  setKept((k) => k + 1);
                }}
              >
                Keep theirs
              </Button>
            </div>
          </Notice>
        </RevealedAlert>
      )}
      {allergen && <AllergenOverridePrompt message={allergen.message} busy={putCells.isPending} onConfirm={overrideAndSend} onCancel={() => setAllergen(null)} />}
      {error && <Notice tone="block" title={error} />}

      <div className="grid gap-3 sm:grid-cols-3">
        <Notice tone={blocks.length ? 'block' : 'info'} title={blocks.length ? `${counted(blocks.length, 'problem')} ${agrees(blocks.length, 'blocks', 'block')} publishing` : 'Nothing blocks publishing'}>
          {blocks.length > 3 ? <WarningGroups warnings={blocks} clientName={clientName} onShowFlagged={showFlagged} /> : blocks.map(problemLine)}
        </Notice>
        <Notice tone={warns.length ? 'warn' : 'info'} title={counted(warns.length, 'warning')}>
          {warns.length === 0
            ? 'No day over the net-carb cap or short of protein, no dislikes, no allergens allowed.'
            : warns.length > 3
              ? <WarningGroups warnings={warns} clientName={clientName} onShowFlagged={showFlagged} />
              : warns.map(problemLine)}
        </Notice>
        <Notice tone={portions.tone} title={portions.title}>
          {portions.detail}
        </Notice>
      </div>

      <PublishedAllergenClashes query={clashes} changedSince={board.week.changedSincePublished} />

      {board.clients.length === 0 || (board.cells.length === 0 && board.plates.every((p) => p.archived)) ? (
        <EmptyState title={board.clients.length === 0 ? 'No clients to plan' : 'No plates yet'}>
          {board.clients.length === 0 ? (
            <>
              <Link to={paths.clients} className="underline">Add clients</Link> (or restore archived ones) to fill the board.
            </>
          ) : (
            <>
              <Link to={paths.plates} className="underline">Make plates</Link> (or restore archived ones) to fill the board.
            </>
          )}
        </EmptyState>
      ) : (
        <div ref={boardTop}>
          <Card>
            <BoardGrid board={board} busy={busy} onEdit={(edit) => sendCells(edit)} onlyFlagged={onlyFlagged} onOnlyFlagged={setOnlyFlagged} />
          </Card>
        </div>
      )}

      <Card>
        <h2 className="mb-3 text-xl">Published versions</h2>
        <PublishedVersions board={board} />
      </Card>

      <Card className="scroll-mt-20">
        <h2 className="mb-3 text-xl">Send plans</h2>
        <SendPlansPanel board={board} clients={clients} clashes={clashes.data} preselect={sendTo} key={sendTo.join(',')} />
      </Card>

      <Card>
        <h2 className="mb-3 text-xl">Prep-day papers for the kitchen</h2>
        <PrepDayMailPanel board={board} team={team} />
      </Card>

      <CopyDayCard
        board={board}
        busy={copyDay.isPending}
        onCopy={(fromDate, toDate, done) => {
          const run = (version: number) =>
            copyDay.mutate({ version, fromDate, toDate }, { onSuccess: (answer) => done(answer), onError: onFail({ kind: 'other', label: `copy ${dayLabel(fromDate)} to ${dayLabel(toDate)}`, run }) });
          withVersion('copy', run);
        }}
      />

      <Card>
        <h2 className="mb-3 text-xl">Portion count</h2>
        <InventoryPanel
          board={board}
          busy={busy}
          onCover={() => {
            const run = (version: number) => cover.mutate({ version }, { onError: onFail({ kind: 'other', label: 'set tray counts', run }) });
            withVersion('cover', run);
          }}
          onSave={(typed, typedOn) => {
            // Sent from the version the counts were typed on, put over the board as it is when sent: "Apply my change on
            // top of theirs" keeps the counts someone else changed meanwhile, and changes only the ones typed here.
            const run = (version: number) => {
              const latest = (qc.getQueryData(weekKeys.detail(id)) as BoardDto | undefined) ?? board;
              putTrays.mutate({ version, trays: countsWithTyped(latest, typed) }, { onError: onFail({ kind: 'other', label: 'save tray counts', run }) });
            };
            setError(null);
            run(typedOn);
          }}
        />
      </Card>

      <Card>
        <h2 className="mb-3 text-xl">Prep days</h2>
        <PrepDates key={kept} board={board} busy={update.isPending} error={update.error} onSave={(prepDate, secondPrepDate, typedOn) => {
          const run = (version: number) =>
            update.mutate({ version, prepDate, secondPrepDate }, {
              // A stale version goes to the merge prompt; any other refusal is shown in this card, beside its fields.
              onError: (e) => {
                markShown(e);
                if (isApiError(e, 409) && e.problem.code === 'stale_version') onFail({ kind: 'other', label: 'change the prep days', run })(e);
              },
            });
          // Sent from the version the dates were typed on: someone else's change meanwhile is the merge prompt.
          setError(null);
          run(typedOn);
        }} />
      </Card>

      <DeleteWeek board={board} />

      <Cautions topic="food-safety" compact />
    </div>
  );
}

/** Deleting a week: its board, tray counts, shopping marks and publications go (asked first, saying what clients lose). */
function DeleteWeek({ board }: { board: BoardDto }) {
  const del = useDeleteWeek();
  const navigate = useNavigate();
  const [error, setError] = useState<string | null>(null);
  const published = board.week.publishedVersion !== null;
  const ask = published
    ? `Delete ${board.week.name}? It is published: its clients stop seeing these plates. The board, tray counts and shopping marks go too (its cooling records stay in the cooling log). This cannot be undone.`
    : `Delete ${board.week.name}? Its board, tray counts and shopping marks go (its cooling records stay in the cooling log). This cannot be undone.`;
  return (
    <Card>
      <h2 className="mb-2 text-xl">Delete this week</h2>
      <p className="mb-3 text-sm text-ink-soft">
        {published ? 'Published: clients see this week until it is deleted. ' : ''}To plan another week like it, copy it to a new week instead. Its
        cooling records stay in the{' '}
        <Link to={paths.coolingLog} className="font-bold underline">
          cooling log
        </Link>
        .
      </p>
      <Button
        variant="danger"
        busy={del.isPending}
        onClick={() => {
          if (!window.confirm(ask)) return;
          setError(null);
          del.mutate(board.week.id, { onSuccess: () => navigate(paths.weeks), onError: (e) => setError(errorMessage(e)) });
        }}
      >
        Delete week
      </Button>
      {error && (
        <div className="mt-3">
          <Notice tone="block" title="Not deleted">
            {error}
          </Notice>
        </div>
      )}
    </Card>
  );
}
