import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RecipeCalcDto, RecipeCalcInput } from '@shared/schemas/ingredients.schema';
import type {
  CreateTrayInput,
  ScaleResultDto,
  ScaleTrayInput,
  TrayDto,
  TrayPhotoDto,
  UpdateTrayInput,
} from '@shared/schemas/trays.schema';
import { api } from '@/lib/api-client';
import { isApiError } from '@/lib/problem';
import { traysKeys } from './trays.keys';

export function useCreateTray() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateTrayInput) => api.post<TrayDto>('/trays', input),
    meta: { form: true },
    onSuccess: (tray) => {
      qc.setQueryData(traysKeys.detail(tray.id), tray);
      return qc.invalidateQueries({ queryKey: traysKeys.lists() });
    },
  });
}

/** A stale save (409) is handled by the editor (reload theirs / keep mine), so it is not toasted here. */
export function useUpdateTray(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateTrayInput) => api.put<TrayDto>(`/trays/${id}`, input),
    meta: { form: true, silent: true },
    onSuccess: (tray) => {
      qc.setQueryData(traysKeys.detail(id), tray);
      qc.invalidateQueries({ queryKey: traysKeys.portionCard(id) });
      return qc.invalidateQueries({ queryKey: traysKeys.lists() });
    },
    // Refused on a stale version: the page shows the version saved meanwhile (the editor keeps the typing).
    onError: (e) => {
      if (isApiError(e, 409) && e.problem.code === 'stale_version' && e.problem.current) qc.setQueryData(traysKeys.detail(id), e.problem.current as TrayDto);
    },
  });
}

export function useDeleteTray() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<{ archived: boolean } | undefined>(`/trays/${id}`),
    onSuccess: (_res, id) => {
      qc.removeQueries({ queryKey: traysKeys.detail(id) });
      return qc.invalidateQueries({ queryKey: traysKeys.lists() });
    },
  });
}

export function useDuplicateTray() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<TrayDto>(`/trays/${id}/duplicate`),
    onSuccess: (tray) => {
      qc.setQueryData(traysKeys.detail(tray.id), tray);
      return qc.invalidateQueries({ queryKey: traysKeys.lists() });
    },
  });
}

export function useUploadTrayPhoto(id: number) {
  const qc = useQueryClient();
  return useMutation({
    meta: { silent: true },
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('photo', file);
      return api.post<TrayPhotoDto>(`/trays/${id}/photo`, form);
    },
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: traysKeys.detail(id) }),
        qc.invalidateQueries({ queryKey: traysKeys.lists() }),
      ]),
  });
}

/** Stateless: the answer is shown, nothing is stored. */
export function useScaleTray(id: number) {
  return useMutation({
    mutationFn: (input: ScaleTrayInput) => api.post<ScaleResultDto>(`/trays/${id}/scale`, input),
    meta: { form: true, readOnly: true },
  });
}

/** The editor's live preview (POST /api/calc/recipe); errors are shown beside the preview, not toasted. */
export function useRecipePreview() {
  return useMutation({
    mutationFn: (input: RecipeCalcInput) => api.post<RecipeCalcDto>('/calc/recipe', input),
    meta: { silent: true, readOnly: true },
  });
}
