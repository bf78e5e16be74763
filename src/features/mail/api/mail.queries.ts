import { queryOptions } from '@tanstack/react-query';
import type { CaughtMailDto, CaughtMailPageDto, OutboxPageDto } from '@shared/schemas/mail.schema';
import { api, qs } from '@/lib/api-client';
import { mailKeys, type OutboxFilters } from './mail.keys';

/** True while some message still waits (queued, sending, retrying): the outbox page then refreshes itself. */
export function outboxBusy(page: OutboxPageDto | undefined): boolean {
  if (!page) return false;
  return page.counts.queued + page.counts.sending + page.counts.retrying > 0;
}

export const outboxQuery = (filters: OutboxFilters) =>
  queryOptions({
    queryKey: mailKeys.list(filters),
    queryFn: () => api.get<OutboxPageDto>(`/outbox${qs({ ...filters })}`),
    refetchInterval: (q) => (outboxBusy(q.state.data) ? 2000 : false),
  });

export const caughtMailListQuery = (page: number) =>
  queryOptions({
    queryKey: mailKeys.caughtList(page),
    queryFn: () => api.get<CaughtMailPageDto>(`/dev/mail${qs({ page })}`),
    retry: false,
  });

export const caughtMailQuery = (id: number) =>
  queryOptions({
    queryKey: mailKeys.caughtDetail(id),
    queryFn: () => api.get<CaughtMailDto>(`/dev/mail/${id}`),
  });

export const caughtAttachmentUrl = (id: number, index: number) => `/api/dev/mail/${id}/attachments/${index}`;
