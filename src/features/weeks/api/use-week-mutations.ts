import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type {
  BoardDto,
  CellInput,
  CopyDayInput,
  CopyWeekInput,
  CreateWeekInput,
  PutTraysInput,
  UpdateWeekInput,
  WeekSummaryDto,
} from '@shared/schemas/weeks.schema';
import { expandBoard, type BoardAnswer, type CopyWeekAnswer, type WeekCopied } from '@shared/schemas/board-answer';
import { api } from '@/lib/api-client';
import { weekKeys } from './weeks.keys';

/**
 * After a week changes, everything that sums weeks up is read again: the lists, the coach's glance (its warnings, the
 * week after), the client's week and the kitchen's week (the shopping feature keeps that under the weeks' prefix).
 * Boards are not: each write puts its own answer in the cache.
 */
function refreshSummaries(qc: QueryClient) {
  return qc.invalidateQueries({ queryKey: weekKeys.all, predicate: (q) => q.queryKey[1] !== 'detail' });
}

/** Every board write answers the new board: put it in the cache. A 409 is handled by the board (merge prompt). */
function useBoardWrite<T>(id: number, send: (input: T) => Promise<BoardDto>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: send,
    meta: { silent: true },
    onSuccess: (board) => {
      qc.setQueryData(weekKeys.detail(id), board);
      return refreshSummaries(qc);
    },
  });
}

export const usePutCells = (id: number) =>
  useBoardWrite(id, (input: { version: number; cells: CellInput[] }) => api.put<BoardAnswer>(`/weeks/${id}/cells`, input).then(expandBoard));

export const usePutTrays = (id: number) => useBoardWrite(id, (input: PutTraysInput) => api.put<BoardAnswer>(`/weeks/${id}/trays`, input).then(expandBoard));

export const useCoverTrays = (id: number) =>
  useBoardWrite(id, (input: { version: number }) => api.post<BoardAnswer>(`/weeks/${id}/trays/cover`, input).then(expandBoard));

export const useCopyDay = (id: number) => useBoardWrite(id, (input: CopyDayInput) => api.post<BoardAnswer>(`/weeks/${id}/copy-day`, input).then(expandBoard));

export const useUpdateWeek = (id: number) => useBoardWrite(id, (input: UpdateWeekInput) => api.patch<BoardAnswer>(`/weeks/${id}`, input).then(expandBoard));

export const usePublishWeek = (id: number) =>
  useBoardWrite(id, (input: { version: number }) => api.post<BoardAnswer>(`/weeks/${id}/publish`, input).then(expandBoard));

export function useCreateWeek() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateWeekInput) => api.post<BoardAnswer>('/weeks', input).then(expandBoard),
    meta: { form: true },
    onSuccess: (board) => {
      qc.setQueryData(weekKeys.detail(board.week.id), board);
      return refreshSummaries(qc);
    },
  });
}

/** A new week from another one's board and tray counts (POST /api/weeks/:id/copy). */
/** What a week's page is opened with: a week just copied says what came over (router state, not the address). */
export interface WeekPageState {
  copied?: WeekCopied & { from: string };
}

export function useCopyWeek() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ fromId, ...input }: CopyWeekInput & { fromId: number }) =>
      api.post<CopyWeekAnswer>(`/weeks/${fromId}/copy`, input).then(({ copied, ...answer }) => ({ board: expandBoard(answer), copied })),
    meta: { form: true },
    onSuccess: ({ board }) => {
      qc.setQueryData(weekKeys.detail(board.week.id), board);
      return refreshSummaries(qc);
    },
  });
}

export function useDeleteWeek() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/weeks/${id}`),
    // The board is gone: drop it rather than read it again (a 404 on the page being left); lists and glances refresh.
    onSuccess: (_done, id) => {
      qc.removeQueries({ queryKey: weekKeys.detail(id), exact: true });
      // The list the page goes back to leaves the week out at once, not after its refetch.
      qc.setQueryData<WeekSummaryDto[]>(weekKeys.list(), (weeks) => weeks?.filter((w) => w.id !== id));
      return refreshSummaries(qc);
    },
  });
}
