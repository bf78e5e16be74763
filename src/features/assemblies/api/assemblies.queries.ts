import { queryOptions } from '@tanstack/react-query';
import type { AssemblyDto } from '@shared/schemas/assemblies.schema';
import { api, qs } from '@/lib/api-client';
import { assemblyKeys } from './assemblies.keys';

export const assembliesQuery = () =>
  queryOptions({ queryKey: assemblyKeys.list(), queryFn: () => api.get<AssemblyDto[]>('/assemblies') });

export const assemblyQuery = (id: number) =>
  queryOptions({ queryKey: assemblyKeys.detail(id), queryFn: () => api.get<AssemblyDto>(`/assemblies/${id}`) });

export interface TrayOption {
  id: number;
  name: string;
}

/** Base trays to pick from (the library, not archived). */
export const trayOptionsQuery = () =>
  queryOptions({
    queryKey: assemblyKeys.trayOptions(),
    queryFn: async () => (await api.get<TrayOption[]>(`/trays${qs({ archived: 'false' })}`)).map((t) => ({ id: t.id, name: t.name })),
    staleTime: 60_000,
  });
