import { useQuery } from '@tanstack/react-query';
import type { BoardDto } from '@shared/schemas/weeks.schema';
import { ErrorState, Skeleton } from '@/components/ui/states';
import { publicationsQuery } from '../api/weeks.queries';
import { momentLabel } from '@/lib/dates';

/** The week's published versions, newest first: when, by whom, and which one clients see now. */
export function PublishedVersions({ board }: { board: BoardDto }) {
  const current = board.week.publishedVersion;
  const q = useQuery({ ...publicationsQuery(board.week.id, current), enabled: current !== null });
  if (current === null) return <p className="text-sm text-ink-soft">Not published yet: clients see nothing of this week.</p>;
  if (q.isPending) return <Skeleton className="h-12 w-full" label="Loading published versions" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  return (
    <>
      {board.week.changedSincePublished && (
        <p className="mb-2 text-sm">The board has changed since version {current}: publish again for clients to see the changes.</p>
      )}
      <ol className="flex flex-col divide-y divide-line text-sm">
        {q.data.map((p) => (
          <li key={p.number} className="flex flex-wrap justify-between gap-x-4 py-2">
            <span>
              <span className="font-bold">Version {p.number}</span> · {momentLabel(p.publishedAt)}
              {p.publishedBy ? ` · ${p.publishedBy}` : ''}
            </span>
            {p.number === current && <span className="font-bold">Clients see this one</span>}
          </li>
        ))}
      </ol>
    </>
  );
}
