import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MarkBoughtDto, ShoppingCheckDto, ShoppingListDto } from '@shared/schemas/shopping.schema';
import { api } from '@/lib/api-client';
import { forgetAnswer, keepForKeptPerson, keptAnswer, keptNames, keptPerson } from '@/lib/device-copy';
import { pantryKeys, shoppingKeys } from './shopping.keys';

type CheckVars = { ingredientId: number; checked: boolean };

function withCheck(list: ShoppingListDto, ingredientId: number, check: ShoppingCheckDto): ShoppingListDto {
  const aisles = list.aisles.map((a) => ({
    ...a,
    items: a.items.map((i) => (i.ingredientId === ingredientId ? { ...i, check } : i)),
  }));
  return { ...list, aisles, checkedCount: aisles.flatMap((a) => a.items).filter((i) => i.check.checked).length };
}

/** The kept answers of a list (src/lib/device-copy.ts): the list itself, and the ticks the server has not had yet. */
export const keptListName = (weekId: number, prepDate: string | null) => `shopping:${weekId}:${prepDate ?? 'week'}`;
const pendingName = (weekId: number, prepDate: string | null) => `shopping-ticks:${weekId}:${prepDate ?? 'week'}`;

/** The list kept on this device most lately (its week and trip), for a way to it without a network; null if none. */
export function lastKeptList(): { weekId: number; prepDate: string | null; savedAt: number } | null {
  const me = keptPerson();
  if (!me) return null;
  let best: { weekId: number; prepDate: string | null; savedAt: number } | null = null;
  for (const name of keptNames('shopping:')) {
    const kept = keptAnswer<unknown>(name, me);
    const [, week, trip] = name.split(':');
    if (kept && (!best || kept.savedAt > best.savedAt)) best = { weekId: Number(week), prepDate: trip === 'week' ? null : trip, savedAt: kept.savedAt };
  }
  return best;
}

/** The ticks made on this device that the server has not had yet (a store with no signal), by ingredient. */
export function pendingTicks(weekId: number, prepDate: string | null): CheckVars[] {
  const me = keptPerson();
  const kept = me && keptAnswer<Record<string, boolean>>(pendingName(weekId, prepDate), me);
  return Object.entries(kept?.data ?? {}).map(([id, checked]) => ({ ingredientId: Number(id), checked }));
}

function setPending(weekId: number, prepDate: string | null, v: CheckVars, pending: boolean) {
  const now = Object.fromEntries(pendingTicks(weekId, prepDate).map((t) => [t.ingredientId, t.checked]));
  if (pending) now[v.ingredientId] = v.checked;
  else if (now[v.ingredientId] === v.checked) delete now[v.ingredientId];
  else return;
  if (Object.keys(now).length) keepForKeptPerson(pendingName(weekId, prepDate), now);
  else forgetAnswer(pendingName(weekId, prepDate));
}

/**
 * One tap = one idempotent PUT of that item's mark. Optimistic: the mark shows at once and rolls back if the
 * server refuses; the list is re-read only when the last pending tap has settled (so a slow answer never undoes a
 * newer tap). Without a network a tap waits (TanStack Query sends it once the network is back) and is kept on the
 * device meanwhile (pendingTicks), so that closing the page does not lose it.
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
      // Kept on the device until the server has it: a page closed while offline sends it when opened again.
      setPending(weekId, prepDate, v, true);
      await qc.cancelQueries({ queryKey: key });
      const previous = qc.getQueryData<ShoppingListDto>(key);
      if (previous) {
        qc.setQueryData<ShoppingListDto>(key, withCheck(previous, v.ingredientId, { checked: v.checked, checkedBy: 'you', checkedAt: new Date().toISOString() }));
      }
      return { previous };
    },
    onError: (_e, v, ctx) => {
      // Refused, or failed on the way (the page rolls it back and says so): nothing left to send. Only a tap that is
      // waiting (offline) or on its way stays kept.
      setPending(weekId, prepDate, v, false);
      const now = qc.getQueryData<ShoppingListDto>(key);
      const before = ctx?.previous?.aisles.flatMap((a) => a.items).find((i) => i.ingredientId === v.ingredientId);
      if (now && before) qc.setQueryData<ShoppingListDto>(key, withCheck(now, v.ingredientId, before.check));
    },
    onSuccess: (saved, v) => {
      setPending(weekId, prepDate, v, false);
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
