import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { glanceQuery } from '../api/weeks.queries';
import { localToday } from '@/lib/dates';
import { Card, ErrorState, Notice, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { agrees, counted } from '@/lib/words';
import { nextPrepDayTitle } from '@/lib/dates';

/** The coach's "this week at a glance": warnings, portions short, the next prep day. */
export function WeekGlance() {
  const today = localToday();
  const q = useQuery(glanceQuery(today));
  if (q.isPending) return <Skeleton className="h-28 w-full" label="Loading this week" />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  const g = q.data;
  if (!g.week) return null;
  return (
    <Card>
      <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-xl">This week at a glance</h2>
        <Link to={paths.week(g.week.id)} className="font-bold underline">
          {g.week.name}
        </Link>
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        <Notice tone={g.blocks ? 'block' : g.warnings ? 'warn' : 'info'} title={counted(g.blocks + g.warnings, 'warning')}>
          {g.blocks ? `${g.blocks} ${agrees(g.blocks, 'blocks', 'block')} publishing` : 'None blocks publishing'}
        </Notice>
        <Notice tone={g.portionsShort ? 'warn' : 'info'} title={g.portionsShort ? `${counted(g.portionsShort, 'portion')} short` : 'No portion short'} />
        <Notice tone="cold" title={g.nextPrepDate ? nextPrepDayTitle(g.nextPrepDate, today) : 'No prep day ahead'} />
      </div>
      <p className="mt-3">
        {g.nextWeek ? (
          <>
            After it:{' '}
            <Link to={paths.week(g.nextWeek.id)} className="font-bold underline">
              {g.nextWeek.name}
            </Link>{' '}
            · {g.nextWeek.publishedVersion ? `published v${g.nextWeek.publishedVersion}` : 'draft'} · {counted(g.nextWeek.cellCount, 'plate')} placed
          </>
        ) : (
          <>
            Nothing planned after this week yet.{' '}
            <Link to={`${paths.weeks}?from=${g.week.id}`} className="inline-flex min-h-11 items-center font-bold underline">
              Plan the next week from this one
            </Link>
          </>
        )}
      </p>
    </Card>
  );
}
