import { Navigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { EmptyState, ErrorState, PageSkeleton } from '@/components/ui/states';
import type { WeekSummaryDto } from '@shared/schemas/weeks.schema';
import { currentWeekQuery } from '../api/shopping.queries';

/** Sends the person to this week's page (the week covering today, else the next, else the latest). */
export function CurrentWeekRedirect({ to, what }: { to: (week: WeekSummaryDto) => string; what: string }) {
  const q = useQuery(currentWeekQuery());
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
