import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SendWeekInput, SendWeekResultDto } from '@shared/schemas/week-mail.schema';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail.keys';
import { weekMailKeys } from './week-mail.keys';

/** Queues the week's published plan to clients; the outbox and delivery logs then refresh. */
export function useSendWeek(weekId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SendWeekInput) => api.post<SendWeekResultDto>(`/weeks/${weekId}/send`, input),
    meta: { silent: true },
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: mailKeys.lists() }), qc.invalidateQueries({ queryKey: weekMailKeys.deliveries() })]),
  });
}
