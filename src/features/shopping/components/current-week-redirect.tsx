import { Navigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { EmptyState, ErrorState, PageSkeleton } from '@/components/ui/states';
import type { WeekSummaryDto } from '@shared/schemas/weeks.schema';
import { currentWeekQuery } from '../api/shopping.queries';
import { localToday } from '@/lib/dates';

/** Sends the person to the kitchen's week's page (the week of the next prep day; see kitchenWeek). */
export function CurrentWeekRedirect({ to, what }: { to: (week: WeekSummaryDto) => string; what: string }) {
  const q = useQuery(currentWeekQuery(localToday()));
  if (q.isPending) return <PageSkeleton />;
  if (q.isError) return <ErrorState error={q.error} retry={() => q.refetch()} />;
  if (!q.data) {
    return (
      <EmptyState title={`No prep week yet`}>
        The {what} appears here once the coach has planned a prep week.
      </EmptyState>
    );
  }
  return <Navigate to={to(q.data)} replace />;
}
