import { queryOptions } from '@tanstack/react-query';
import type { BakeRuleDto, OvenDto, WeekBakeRunDto } from '@shared/schemas/bake-setup.schema';
import { api, qs } from '@/lib/api-client';
import { bakeRunsKeys } from './bake-runs.keys';

export const bakeRulesQuery = () => queryOptions({ queryKey: bakeRunsKeys.rules(), queryFn: () => api.get<BakeRuleDto[]>('/bake-rules') });

export const ovensQuery = () => queryOptions({ queryKey: bakeRunsKeys.ovens(), queryFn: () => api.get<OvenDto[]>('/ovens') });

export const weekBakeRunQuery = (weekId: number, prepDate?: string) =>
  queryOptions({
    queryKey: bakeRunsKeys.weekRun(weekId, prepDate),
    queryFn: () => api.get<WeekBakeRunDto>(`/weeks/${weekId}/bake-run${qs({ prepDate })}`),
  });

/** The prep weeks to open a bake run for (GET /api/weeks, read here without the weeks feature). */
export interface WeekPick {
  id: number;
  name: string;
  prepDate: string;
  secondPrepDate: string | null;
  startDate: string;
}
export const weekPicksQuery = () => queryOptions({ queryKey: bakeRunsKeys.weeks(), queryFn: () => api.get<WeekPick[]>('/weeks') });

/** Links to the files of a week's run (plain downloads, same origin, cookie session). */
export const bakeRunFiles = (weekId: number, prepDate: string) => ({
  pdf: `/api/weeks/${weekId}/bake-run.pdf${qs({ prepDate })}`,
  ics: `/api/weeks/${weekId}/bake-run.ics${qs({ prepDate })}`,
});
