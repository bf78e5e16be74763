import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { compareIsoDates } from '@shared/domain/iso-date';
import { nextTripOf, prepDatesOf } from '@shared/domain/week-board';
import { Card, EmptyState, Notice, Progress, QueryView, Skeleton } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { TileLink } from '@/components/ui/tile-link';
import { dayLabel, instantDayLabel, kitchenToday, nextPrepDayTitle } from '@/lib/dates';
import { currentWeekQuery, shoppingListQuery } from '../api/shopping.queries';

function ShoppingProgress({ weekId, prepDate }: { weekId: number; prepDate: string | null }) {
  const q = useQuery(shoppingListQuery(weekId, prepDate));
  return (
    <QueryView query={q} loading={<Skeleton className="h-10 w-full" label="Loading the shopping list" />}>
      {(list) =>
        list.bought ? (
          <p>Marked bought {instantDayLabel(list.bought.at)}: the pantry is up to date.</p>
        ) : list.itemCount === 0 ? (
          <p>Nothing to buy yet.</p>
        ) : (
          <Progress value={list.checkedCount} max={list.itemCount} label="In the trolley" />
        )
      }
    </QueryView>
  );
}

/**
 * The kitchen's week (the one of the next prep day, whichever board it is on): that prep day, how far its shopping
 * is, and the week's bake run and labels.
 */
export function KitchenGlance() {
  const today = kitchenToday();
  const q = useQuery(currentWeekQuery(today));
  return (
    <QueryView
      query={q}
      loading={<Skeleton className="h-28 w-full" label="Loading this week" />}
      isEmpty={(w) => w === null}
      empty={<EmptyState title="No prep week yet">The shopping list, bake run and labels appear here once the coach plans a week.</EmptyState>}
    >
      {(w) => {
        const week = w!;
        // The prep days still to come (today included).
        const ahead = prepDatesOf(week).filter((d) => compareIsoDates(d, today) >= 0);
        // A week with two prep days is shopped per prep day: the next one's list.
        const trip = nextTripOf(week, today);
        // The week is over: nothing is planned after it yet (else the kitchen's week would be the next one).
        const ended = compareIsoDates(week.endDate, today) < 0;
        return (
          <Card>
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 className="text-xl">In the kitchen</h2>
              <span className="text-ink-soft">{week.name}</span>
            </div>
            <div className="grid gap-3 sm:grid-cols-2">
              <Notice
                tone="cold"
                title={ahead.length ? nextPrepDayTitle(ahead[0], today) : ended ? 'No prep day planned' : 'No prep day ahead this week'}
              >
                {ahead.length > 1 && `Then ${dayLabel(ahead[1], true)}.`}
                {ahead.length === 0 &&
                  (ended
                    ? `${week.name} ended on ${dayLabel(week.endDate, true)}; the coach has not planned the next week yet.`
                    : 'The coach has not planned the next prep day yet.')}
              </Notice>
              <div className="flex flex-col gap-2 rounded-lg border border-line-strong bg-paper-card p-3">
                <Link to={paths.shopping(week.id, trip)} className="font-bold underline">
                  {trip ? `Shopping list for prep ${dayLabel(trip)}` : 'Shopping list'}
                </Link>
                <ShoppingProgress weekId={week.id} prepDate={trip} />
              </div>
            </div>
            {!week.publishedVersion && (
              <div className="mt-3">
                <Notice tone="warn" title="Not published yet">
                  The coach is still planning this week: the shopping list and bake run may change.
                </Notice>
              </div>
            )}
            <ul className="mt-3 flex flex-wrap gap-2">
              {[
                { to: paths.bakeRun(week.id), label: 'Bake run' },
                { to: paths.labels(week.id), label: 'Labels' },
              ].map((l) => (
                <li key={l.to}>
                  <TileLink to={l.to} label={l.label} className="inline-flex" />
                </li>
              ))}
            </ul>
          </Card>
        );
      }}
    </QueryView>
  );
}
