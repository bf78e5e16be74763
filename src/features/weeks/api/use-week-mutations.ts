import { useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  BoardDto,
  CellInput,
  CopyDayInput,
  CopyWeekInput,
  CreateWeekInput,
  PutTraysInput,
  UpdateWeekInput,
} from '@shared/schemas/weeks.schema';
import { api } from '@/lib/api-client';
import { weekKeys } from './weeks.keys';

/** Every board write answers the new board: put it in the cache. A 409 is handled by the board (merge prompt). */
function useBoardWrite<T>(id: number, send: (input: T) => Promise<BoardDto>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: send,
    meta: { silent: true },
    onSuccess: (board) => {
      qc.setQueryData(weekKeys.detail(id), board);
      return qc.invalidateQueries({ queryKey: weekKeys.lists() });
    },
  });
}

export const usePutCells = (id: number) =>
  useBoardWrite(id, (input: { version: number; cells: CellInput[] }) => api.put<BoardDto>(`/weeks/${id}/cells`, input));

export const usePutTrays = (id: number) => useBoardWrite(id, (input: PutTraysInput) => api.put<BoardDto>(`/weeks/${id}/trays`, input));

export const useCoverTrays = (id: number) =>
  useBoardWrite(id, (input: { version: number }) => api.post<BoardDto>(`/weeks/${id}/trays/cover`, input));

export const useCopyDay = (id: number) => useBoardWrite(id, (input: CopyDayInput) => api.post<BoardDto>(`/weeks/${id}/copy-day`, input));

export const useUpdateWeek = (id: number) => useBoardWrite(id, (input: UpdateWeekInput) => api.patch<BoardDto>(`/weeks/${id}`, input));

export const usePublishWeek = (id: number) =>
  useBoardWrite(id, (input: { version: number }) => api.post<BoardDto>(`/weeks/${id}/publish`, input));

export function useCreateWeek() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateWeekInput) => api.post<BoardDto>('/weeks', input),
    meta: { form: true },
    onSuccess: (board) => {
      qc.setQueryData(weekKeys.detail(board.week.id), board);
      return qc.invalidateQueries({ queryKey: weekKeys.lists() });
    },
  });
}

export function useCopyWeek(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CopyWeekInput) => api.post<BoardDto>(`/weeks/${id}/copy`, input),
    meta: { form: true },
    onSuccess: (board) => {
      qc.setQueryData(weekKeys.detail(board.week.id), board);
      return qc.invalidateQueries({ queryKey: weekKeys.lists() });
    },
  });
}

export function useDeleteWeek() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/weeks/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: weekKeys.all }),
  });
}
