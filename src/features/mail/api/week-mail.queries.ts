import { queryOptions } from '@tanstack/react-query';
import type { DeliveryLogDto } from '@shared/schemas/week-mail.schema';
import { api } from '@/lib/api-client';
import { weekMailKeys } from './week-mail.keys';

/** True while an e-mail of the log still waits: the log then refreshes itself. */
const waiting = (log: DeliveryLogDto | undefined) => !!log?.items.some((i) => i.status === 'queued' || i.status === 'sending' || i.status === 'retrying');

export const deliveriesQuery = (clientId: number) =>
  queryOptions({
    queryKey: weekMailKeys.delivery(clientId),
    queryFn: () => api.get<DeliveryLogDto>(`/clients/${clientId}/deliveries`),
    refetchInterval: (q) => (waiting(q.state.data) ? 3000 : false),
  });

/** The coach's download of one client's published plan. */
export const clientPlanPdfUrl = (weekId: number, clientId: number) => `/api/weeks/${weekId}/clients/${clientId}/plan.pdf`;

/** The signed-in client's own current published week. */
export const myPlanPdfUrl = '/api/weeks/mine/plan.pdf';

/** The signed-in client's thaw reminders (an iCalendar file for the phone's calendar). */
export const myThawRemindersUrl = '/api/weeks/mine/thaw-reminders.ics';
