import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { CoolingListDto, CoolingLogDto, CoolingRecordDto, CoolingRecordInput } from '@shared/schemas/cooling.schema';
import { api, qs } from '@/lib/api-client';
import { bakeRunsKeys } from './bake-runs.keys';

/** The prep day's cooling record (coach or assistant). Read again every minute: two phones in one kitchen. */
export const coolingQuery = (weekId: number, prepDate: string) =>
  queryOptions({
    queryKey: bakeRunsKeys.cooling(weekId, prepDate),
    queryFn: () => api.get<CoolingListDto>(`/weeks/${weekId}/bake-run/cooling${qs({ prepDate })}`),
    refetchInterval: 60_000,
  });

/** The kitchen's cooling log: every tray's record of the prep days `from`–`to` (coach or assistant). */
export const coolingLogQuery = (from: string, to: string) =>
  queryOptions({
    queryKey: bakeRunsKeys.coolingLog(from, to),
    queryFn: () => api.get<CoolingLogDto>(`/cooling-log${qs({ from, to })}`),
  });

/** The same log as a CSV file to download. */
export const coolingLogCsvUrl = (from: string, to: string) => `/api/cooling-log.csv${qs({ from, to })}`;

/** Writes down one tray's cooling (the whole record; `version` once it exists). */
export function useSaveCooling(weekId: number, prepDate: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ runTrayId, ...body }: CoolingRecordInput & { runTrayId: string }) =>
      api.put<CoolingRecordDto>(`/weeks/${weekId}/bake-run/cooling/${encodeURIComponent(runTrayId)}`, { ...body, prepDate }),
    meta: { form: true, silent: true },
    onSuccess: (saved) => {
      qc.setQueryData<CoolingListDto>(bakeRunsKeys.cooling(weekId, prepDate), (list) =>
        list ? { ...list, records: [...list.records.filter((r) => r.runTrayId !== saved.runTrayId), saved] } : list,
      );
      // The saved record shows at once: the list is read again in the background, not awaited, so the tray's next
      // write (a reading straight after "Out now") is not held back by a busy button while it loads.
      void qc.invalidateQueries({ queryKey: bakeRunsKeys.cooling(weekId, prepDate) });
    },
    // Someone else wrote it meanwhile: show theirs (the person then adds their change again).
    onError: () => qc.invalidateQueries({ queryKey: bakeRunsKeys.cooling(weekId, prepDate) }),
  });
}

/** Clears a record written by mistake (the tray is not out yet). */
export function useClearCooling(weekId: number, prepDate: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ runTrayId, version }: { runTrayId: string; version: number }) =>
      api.delete<void>(`/weeks/${weekId}/bake-run/cooling/${encodeURIComponent(runTrayId)}${qs({ prepDate, version })}`),
    meta: { silent: true },
    onSettled: () => qc.invalidateQueries({ queryKey: bakeRunsKeys.cooling(weekId, prepDate) }),
  });
}
