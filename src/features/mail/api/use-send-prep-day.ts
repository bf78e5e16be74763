import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PrepDayMailResultDto, SendPrepDayInput } from '@shared/schemas/prep-day-mail.schema';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail.keys';

/** Queues a prep day's shopping list and bake run to the kitchen assistants; the outbox then refreshes. */
export function useSendPrepDay(weekId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SendPrepDayInput) => api.post<PrepDayMailResultDto>(`/weeks/${weekId}/prep-day-mail`, input),
    meta: { silent: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: mailKeys.lists() }),
  });
}
