import { Link, Navigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { compareIsoDates } from '@shared/domain/iso-date';
import { prepDatesOf } from '@shared/domain/week-board';
import { EmptyState, ErrorState, PageHeader, PageSkeleton } from '@/components/ui/states';
import type { WeekSummaryDto } from '@shared/schemas/weeks.schema';
import { currentWeekQuery } from '../api/shopping.queries';
import { dayLabel, localToday, momentLabel } from '@/lib/dates';
import { andList } from '@shared/domain/words';

/**
 * Sends the person to the kitchen's week's page (the week of the next prep day; see kitchenWeek). With `sayWhenPassed`
 * (the shopping list), when no prep day is ahead (the coach has not planned the next one yet) it says so instead of
 * opening a list whose prep days have passed as if it were this week's (an assistant could shop for it again), with
 * the way to that week's page. Labels open as they are: printing one again after prep day is common.
 */
export function CurrentWeekRedirect({
  to,
  what,
  title,
  sayWhenPassed = false,
  kept,
}: {
  to: (week: WeekSummaryDto) => string;
  what: string;
  title: string;
  sayWhenPassed?: boolean;
  /** Where the copy kept on this device is (the shopping list), for the way to it while the server cannot say. */
  kept?: () => { path: string; savedAt: number } | null;
}) {
  const today = localToday();
  const q = useQuery(currentWeekQuery(today));
  const copy = q.data === undefined && (q.isError || q.fetchStatus === 'paused') ? kept?.() : null;
  if (copy) {
    return (
      <div className="flex flex-col gap-5">
        <PageHeader title={title} />
        <EmptyState title={q.isError ? 'Trayline cannot be reached' : 'You are offline'}>
          <p>This week’s {what} shows once Trayline can be asked. The one saved on this device opens now.</p>
          <Link to={copy.path} className="inline-flex min-h-11 items-center font-bold underline">
            Open the {what} saved {momentLabel(new Date(copy.savedAt).toISOString())}
          </Link>
        </EmptyState>
      </div>
    );
  }
  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  if (!q.data) {
    return (
      <EmptyState title={`No prep week yet`}>
        The {what} appears here once the coach has planned a prep week.
      </EmptyState>
    );
  }
  const week = q.data;
  const prepDays = prepDatesOf(week);
  if (!sayWhenPassed || prepDays.some((d) => compareIsoDates(d, today) >= 0)) return <Navigate to={to(week)} replace />;
  return (
    <div className="flex flex-col gap-5">
      <PageHeader title={title} />
      <EmptyState title="No prep day ahead">
        <p>
          {week.name}’s prep {prepDays.length === 1 ? 'day' : 'days'} ({andList(prepDays.map((d) => dayLabel(d, true)))}){' '}
          {prepDays.length === 1 ? 'has' : 'have'} passed, and no later prep day is planned yet.
        </p>
        <Link to={to(week)} className="inline-flex min-h-11 items-center font-bold underline">
          Open {week.name}’s {what}
        </Link>
      </EmptyState>
    </div>
  );
}
