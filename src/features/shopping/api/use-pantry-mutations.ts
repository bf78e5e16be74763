import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PantryCreateValues, PantryItemDto, PantryUpdateValues } from '@shared/schemas/shopping.schema';
import { api } from '@/lib/api-client';
import { isApiError } from '@/lib/problem';
import { pantryKeys, shoppingKeys } from './shopping.keys';

function useRefresh() {
  const qc = useQueryClient();
  // The pantry changes every week's list.
  return () => Promise.all([qc.invalidateQueries({ queryKey: pantryKeys.lists() }), qc.invalidateQueries({ queryKey: shoppingKeys.lists() })]);
}

export function useCreatePantryItem() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: (v: PantryCreateValues) => api.post<PantryItemDto>('/pantry', v),
    meta: { form: true },
    onSuccess: refresh,
  });
}

export function useUpdatePantryItem() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: ({ id, ...v }: PantryUpdateValues & { id: number }) => api.patch<PantryItemDto>(`/pantry/${id}`, v),
    meta: { form: true },
    onSuccess: refresh,
    // Refused because someone else changed it meanwhile: the list shows theirs (the row keeps what was typed). Not
    // awaited: the row's own onError must run in this task, or the global toast repeats what the row says.
    onError: (e) => {
      if (isApiError(e, 409)) void refresh();
    },
  });
}

export function useDeletePantryItem() {
  const refresh = useRefresh();
  return useMutation({ mutationFn: (id: number) => api.delete<void>(`/pantry/${id}`), onSuccess: refresh });
}
