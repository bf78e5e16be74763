import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type {
  IngredientDto,
  IngredientListDto,
  IngredientListParams,
  WorkspaceSettingsDto,
} from '@shared/schemas/ingredients.schema';
import { api, qs } from '@/lib/api-client';
import { ingredientKeys } from './ingredients.keys';

export const ingredientListQuery = (filters: IngredientListParams) =>
  queryOptions({
    queryKey: ingredientKeys.list(filters),
    queryFn: () =>
      api.get<IngredientListDto>(
        `/ingredients${qs({
          q: filters.q,
          category: filters.category,
          scope: filters.scope,
          page: filters.page,
          pageSize: filters.pageSize,
          sort: filters.sort,
        })}`,
      ),
    placeholderData: keepPreviousData,
  });

export const ingredientQuery = (id: number) =>
  queryOptions({ queryKey: ingredientKeys.detail(id), queryFn: () => api.get<IngredientDto>(`/ingredients/${id}`) });

export const workspaceSettingsQuery = () =>
  queryOptions({ queryKey: ingredientKeys.settings(), queryFn: () => api.get<WorkspaceSettingsDto>('/workspace/settings') });
