import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BakeRunResult } from '@shared/domain/bake-run-types';
import type { BakeRunRequestBody } from '@shared/schemas/bake-run.schema';
import type {
  BakeRuleCreateInput,
  BakeRuleDto,
  BakeRunKitchenInput,
  BakeRunSettingsInput,
  BakeRunStartInput,
  OvenCreateInput,
  OvenDto,
  WeekBakeRunDto,
} from '@shared/schemas/bake-setup.schema';
import { api } from '@/lib/api-client';
import { isApiError } from '@/lib/problem';
import { bakeRunsKeys } from './bake-runs.keys';

/** A tray of the ad-hoc planner may name a bake rule instead of its temperature and minutes. */
export type CalcTray = Partial<BakeRunRequestBody['trays'][number]> & { id: string; ruleId?: number };
export type CalcBakeRunBody = Omit<BakeRunRequestBody, 'trays'> & { trays: CalcTray[] };

export function useCalcBakeRun() {
  return useMutation({
    mutationFn: (body: CalcBakeRunBody) => api.post<BakeRunResult>('/calc/bake-run', body),
    meta: { form: true, silent: true, readOnly: true },
  });
}

/** A saved change to a week's run (its settings, or its start): PUT `path`, then the answer is the run to show. */
function useRunChange<B>(weekId: number, path: 'settings' | 'start' | 'kitchen') {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: B) => api.put<WeekBakeRunDto>(`/weeks/${weekId}/bake-run/${path}`, body),
    meta: { form: true, silent: true },
    onSuccess: (dto) => {
      qc.setQueryData(bakeRunsKeys.weekRun(weekId, dto.prepDate), dto);
      return qc.invalidateQueries({ queryKey: bakeRunsKeys.weekRuns() });
    },
  });
}

export const useSaveBakeRunSettings = (weekId: number) => useRunChange<BakeRunSettingsInput>(weekId, 'settings');

/** Moves a week's run to the time the kitchen really started (coach or assistant, on prep day). */
export const useMoveBakeRunStart = (weekId: number) => useRunChange<BakeRunStartInput>(weekId, 'start');

/** The kitchen as it is on prep day: the ovens that work and the cooks who came (coach or assistant). */
export const useSetBakeRunKitchen = (weekId: number) => useRunChange<BakeRunKitchenInput>(weekId, 'kitchen');

type RuleBody = Omit<BakeRuleCreateInput, 'category'> & { category?: string; version?: number };

export function useSaveBakeRule() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: RuleBody & { id?: number }) =>
      id ? api.put<BakeRuleDto>(`/bake-rules/${id}`, body) : api.post<BakeRuleDto>('/bake-rules', body),
    meta: { form: true, silent: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: bakeRunsKeys.all }),
    // Refused because someone else saved meanwhile: the page behind the open form shows theirs (not awaited: the
    // form's notice comes at once).
    onError: (e) => {
      if (isApiError(e, 409)) void qc.invalidateQueries({ queryKey: bakeRunsKeys.all });
    },
  });
}

export function useDeleteBakeRule() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/bake-rules/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: bakeRunsKeys.all }),
  });
}

export function useSaveOven() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: OvenCreateInput & { id?: number; version?: number }) =>
      id ? api.put<OvenDto>(`/ovens/${id}`, body) : api.post<OvenDto>('/ovens', body),
    meta: { form: true, silent: true },
    onSuccess: () => qc.invalidateQueries({ queryKey: bakeRunsKeys.all }),
    // Refused because someone else saved meanwhile: the page behind the open form shows theirs (not awaited: the
    // form's notice comes at once).
    onError: (e) => {
      if (isApiError(e, 409)) void qc.invalidateQueries({ queryKey: bakeRunsKeys.all });
    },
  });
}

export function useDeleteOven() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/ovens/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: bakeRunsKeys.all }),
  });
}
