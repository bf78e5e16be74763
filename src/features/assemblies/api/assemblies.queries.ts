import { keepPreviousData, queryOptions } from '@tanstack/react-query';
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

export interface IngredientOption {
  id: number;
  name: string;
}

/** Add-on search in the ingredient library (first matches). */
export const ingredientOptionsQuery = (q: string) =>
  queryOptions({
    queryKey: assemblyKeys.ingredientOptions(q),
    queryFn: async () => {
      const res = await api.get<{ items: IngredientOption[] }>(`/ingredients${qs({ q, pageSize: 10 })}`);
      return res.items.map((i) => ({ id: i.id, name: i.name }));
    },
    enabled: q.trim().length > 0,
    placeholderData: keepPreviousData,
  });
