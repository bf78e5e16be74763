import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MarkBoughtDto, ShoppingCheckDto, ShoppingListDto } from '@shared/schemas/shopping.schema';
import { api } from '@/lib/api-client';
import { pantryKeys, shoppingKeys } from './shopping.keys';

type CheckVars = { ingredientId: number; checked: boolean };

function withCheck(list: ShoppingListDto, ingredientId: number, check: ShoppingCheckDto): ShoppingListDto {
  const aisles = list.aisles.map((a) => ({
    ...a,
    items: a.items.map((i) => (i.ingredientId === ingredientId ? { ...i, check } : i)),
  }));
  return { ...list, aisles, checkedCount: aisles.flatMap((a) => a.items).filter((i) => i.check.checked).length };
}

/**
 * One tap = one idempotent PUT of that item's mark. Optimistic: the mark shows at once and rolls back if the
 * server refuses; the list is re-read only when the last pending tap has settled (so a slow answer never undoes a
 * newer tap).
 */
export function useSetCheck(weekId: number, prepDate: string | null = null) {
  const qc = useQueryClient();
  const key = shoppingKeys.list(weekId, prepDate);
  return useMutation({
    mutationKey: shoppingKeys.checks(weekId, prepDate),
    mutationFn: (v: CheckVars) =>
      api.put<ShoppingCheckDto & { ingredientId: number }>(`/weeks/${weekId}/shopping/checks/${v.ingredientId}`, {
        checked: v.checked,
        ...(prepDate ? { prepDate } : {}),
      }),
    onMutate: async (v) => {
      await qc.cancelQueries({ queryKey: key });
      const previous = qc.getQueryData<ShoppingListDto>(key);
      if (previous) {
        qc.setQueryData<ShoppingListDto>(key, withCheck(previous, v.ingredientId, { checked: v.checked, checkedBy: 'you', checkedAt: new Date().toISOString() }));
      }
      return { previous };
    },
    onError: (_e, v, ctx) => {
      const now = qc.getQueryData<ShoppingListDto>(key);
      const before = ctx?.previous?.aisles.flatMap((a) => a.items).find((i) => i.ingredientId === v.ingredientId);
      if (now && before) qc.setQueryData<ShoppingListDto>(key, withCheck(now, v.ingredientId, before.check));
    },
    onSuccess: (saved) => {
      const now = qc.getQueryData<ShoppingListDto>(key);
      if (now) qc.setQueryData<ShoppingListDto>(key, withCheck(now, saved.ingredientId, saved));
    },
    onSettled: () => {
      if (qc.isMutating({ mutationKey: shoppingKeys.checks(weekId, prepDate) }) === 1) return qc.invalidateQueries({ queryKey: key });
    },
  });
}

/** Marks a list bought (once per list): updates the pantry, which every list of the week reads. */
export function useMarkBought(weekId: number, prepDate: string | null = null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<MarkBoughtDto>(`/weeks/${weekId}/shopping/bought`, prepDate ? { prepDate } : {}),
    meta: { silent: true },
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: shoppingKeys.weekLists(weekId) }),
        qc.invalidateQueries({ queryKey: pantryKeys.lists() }),
      ]),
  });
}
