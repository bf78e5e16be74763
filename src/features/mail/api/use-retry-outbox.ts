import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OutboxItemDto } from '@shared/schemas/mail.schema';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail.keys';

export function useRetryOutbox() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<OutboxItemDto>(`/outbox/${id}/retry`),
    onSuccess: () => qc.invalidateQueries({ queryKey: mailKeys.lists() }),
  });
}
