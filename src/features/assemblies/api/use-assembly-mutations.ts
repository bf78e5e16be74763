import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AssemblyDto, AssemblyInput, PlatePreviewDto, PlatePreviewInput } from '@shared/schemas/assemblies.schema';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './assemblies.keys';

export function useSaveAssembly(id: number | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AssemblyInput & { version?: number }) =>
      id === null ? api.post<AssemblyDto>('/assemblies', input) : api.put<AssemblyDto>(`/assemblies/${id}`, input),
    meta: { form: true },
    onSuccess: (a) => {
      qc.setQueryData(assemblyKeys.detail(a.id), a);
      return qc.invalidateQueries({ queryKey: assemblyKeys.lists() });
    },
  });
}

export function useDeleteAssembly() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/assemblies/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: assemblyKeys.all }),
  });
}

/** The plate editor's live numbers (POST /api/assemblies/preview); errors are shown beside them, not toasted. */
export function usePlatePreview() {
  return useMutation({
    mutationFn: (input: PlatePreviewInput) => api.post<PlatePreviewDto>('/assemblies/preview', input),
    meta: { silent: true },
  });
}
