import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ArchiveAssemblyInput, AssemblyDto, AssemblyInput, DeleteAssemblyDto, PlatePreviewDto, PlatePreviewInput } from '@shared/schemas/assemblies.schema';
import { api } from '@/lib/api-client';
import { assemblyKeys } from './assemblies.keys';

export function useSaveAssembly(id: number | null) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AssemblyInput & { version?: number }) =>
      id === null ? api.post<AssemblyDto>('/assemblies', input) : api.put<AssemblyDto>(`/assemblies/${id}`, input),
    meta: { form: true },
    // The saved plate shows in the list at once, read again behind it without holding up the save's own callbacks
    // (the editor closes as soon as the save is in: nothing typed is left to ask about).
    onSuccess: (a) => {
      qc.setQueryData(assemblyKeys.detail(a.id), a);
      qc.setQueriesData<AssemblyDto[]>({ queryKey: assemblyKeys.lists() }, (list) => (Array.isArray(list) ? list.map((p) => (p.id === a.id ? a : p)) : list));
      void qc.invalidateQueries({ queryKey: assemblyKeys.lists() });
    },
  });
}

/** Deletes a plate; one a week board plans is archived instead (the answer says where it is planned). */
export function useDeleteAssembly() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<DeleteAssemblyDto | undefined>(`/assemblies/${id}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: assemblyKeys.all }),
  });
}

/** Archives a plate or restores it (a stale version is a 409 with the current plate). */
export function useArchiveAssembly() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: ArchiveAssemblyInput & { id: number }) => api.put<AssemblyDto>(`/assemblies/${id}/archived`, body),
    onSettled: () => qc.invalidateQueries({ queryKey: assemblyKeys.all }),
  });
}

/** The plate editor's live numbers (POST /api/assemblies/preview); errors are shown beside them, not toasted. */
export function usePlatePreview() {
  return useMutation({
    mutationFn: (input: PlatePreviewInput) => api.post<PlatePreviewDto>('/assemblies/preview', input),
    meta: { silent: true, readOnly: true },
  });
}
