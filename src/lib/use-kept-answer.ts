import { useEffect, useMemo, useSyncExternalStore } from 'react';
import { hashKey, useQueryClient, type QueryClient, type QueryKey, type UseQueryResult } from '@tanstack/react-query';
import type { MeDto } from '@shared/schemas/auth.schema';
import { keepAnswer, keptAnswer } from './device-copy';

/** Per query client: the reads whose data on screen came from the device, with when it was saved. */
const stores = new WeakMap<QueryClient, { shown: Map<string, number>; listeners: Set<() => void> }>();
function storeOf(qc: QueryClient) {
  let s = stores.get(qc);
  if (!s) stores.set(qc, (s = { shown: new Map(), listeners: new Set() }));
  return s;
}
function setShown(qc: QueryClient, key: string, savedAt: number | null) {
  const s = storeOf(qc);
  if (savedAt === null ? !s.shown.delete(key) : s.shown.get(key) === savedAt) return;
  if (savedAt !== null) s.shown.set(key, savedAt);
  for (const l of s.listeners) l();
}

/** What the page shows from the device: when it was saved (null: the server's answer), and whether one is on its way in. */
export interface KeptState {
  fromDevice: number | null;
  /** No answer yet, and a kept one is being put in its place: show the page loading, not an error or "offline". */
  seeding: boolean;
}

/**
 * A read that opens without a network: each of its answers is kept on the device (./device-copy.ts, as `name`, for
 * `me`); when no answer can be had (offline, or the server out of reach) and one is kept, it is put in the query's
 * place, so the page works on it as on the server's (a shopping tick changes it and is kept too). `fromDevice` says
 * when that kept answer was saved while it is what the page shows, null once the server has answered.
 */
export function useKeptAnswer<T>(q: UseQueryResult<T>, queryKey: QueryKey, name: string, me: MeDto): KeptState {
  const qc = useQueryClient();
  const key = hashKey(queryKey);
  const store = storeOf(qc);
  const fromDevice = useSyncExternalStore(
    (fn) => {
      store.listeners.add(fn);
      return () => store.listeners.delete(fn);
    },
    () => store.shown.get(key) ?? null,
  );
  useEffect(() => {
    if (q.isSuccess) keepAnswer(name, me, q.data, q.dataUpdatedAt);
  }, [name, me, q.isSuccess, q.data, q.dataUpdatedAt]);
  const noAnswer = q.data === undefined && (q.isError || q.fetchStatus === 'paused');
  // Read from storage once each time the read goes without an answer, not on every render.
  const kept = useMemo(() => (noAnswer ? keptAnswer<T>(name, me) : null), [noAnswer, name, me]);
  useEffect(() => {
    if (!kept) return;
    setShown(qc, key, kept.savedAt);
    qc.setQueryData(queryKey, kept.data, { updatedAt: kept.savedAt });
    // queryKey is named by `key` (its hash).
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [kept, qc, key]);
  // The server's own answer (not data set on this device) ends it.
  useEffect(
    () =>
      qc.getQueryCache().subscribe((e) => {
        if (e.type === 'updated' && e.action.type === 'success' && !e.action.manual && e.query.queryHash === key) setShown(qc, key, null);
      }),
    [qc, key],
  );
  return { fromDevice, seeding: kept !== null && q.data === undefined };
}
