import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type {
  ImportResultDto,
  IngredientDto,
  IngredientValues,
  WorkspaceSettingsDto,
  WorkspaceSettingsUpdateInput,
} from '@shared/schemas/ingredients.schema';
import { api } from '@/lib/api-client';
import { ingredientKeys } from './ingredients.keys';

export function useCreateIngredient() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (values: IngredientValues) => api.post<IngredientDto>('/ingredients', values),
    meta: { form: true },
    onSuccess: (dto) => {
      qc.setQueryData(ingredientKeys.detail(dto.id), dto);
      return qc.invalidateQueries({ queryKey: ingredientKeys.lists() });
    },
  });
}

export function useUpdateIngredient(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (values: IngredientValues & { version: number }) => api.patch<IngredientDto>(`/ingredients/${id}`, values),
    meta: { form: true },
    onSuccess: (dto) => {
      qc.setQueryData(ingredientKeys.detail(dto.id), dto);
      return qc.invalidateQueries({ queryKey: ingredientKeys.lists() });
    },
  });
}

export function useDeleteIngredient() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/ingredients/${id}`),
    onSuccess: (_v, id) => {
      qc.removeQueries({ queryKey: ingredientKeys.detail(id) });
      return qc.invalidateQueries({ queryKey: ingredientKeys.lists() });
    },
  });
}

export function useCopyIngredient() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<IngredientDto>(`/ingredients/${id}/copy`),
    onSuccess: (dto) => {
      qc.setQueryData(ingredientKeys.detail(dto.id), dto);
      return qc.invalidateQueries({ queryKey: ingredientKeys.lists() });
    },
  });
}

/** Every ingredient query but the workspace settings: lists and pages, whose numbers an import or the net-carb rule changed. */
const refreshIngredientNumbers = (qc: QueryClient) =>
  qc.invalidateQueries({ queryKey: ingredientKeys.all, predicate: (q) => q.queryKey[1] !== 'workspace-settings' });

/** CSV upload; a 400 carries the row report (`problem.report`), shown by the caller. */
export function useImportIngredients() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ file, updateExisting }: { file: File; updateExisting: boolean }) => {
      const form = new FormData();
      form.append('existing', updateExisting ? 'update' : 'refuse');
      form.append('file', file);
      return api.post<ImportResultDto>('/ingredients/import', form);
    },
    // Every failure (the row report, 413, 415) is shown beside the upload, not as a toast.
    meta: { silent: true },
    // Updated rows change their own pages too, not only the lists.
    onSuccess: () => refreshIngredientNumbers(qc),
  });
}

/** Changing the net-carb rule changes every net-carb number: refresh the whole library. */
export function useUpdateWorkspaceSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: WorkspaceSettingsUpdateInput) => api.patch<WorkspaceSettingsDto>('/workspace/settings', input),
    onSuccess: (dto) => {
      qc.setQueryData(ingredientKeys.settings(), dto);
      return refreshIngredientNumbers(qc);
    },
  });
}
