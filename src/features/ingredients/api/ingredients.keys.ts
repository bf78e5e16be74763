import type { IngredientListParams } from '@shared/schemas/ingredients.schema';

/** Query keys of the ingredient library (general → specific); the net-carb setting lives under `all` too. */
export const ingredientKeys = {
  all: ['ingredients'] as const,
  lists: () => [...ingredientKeys.all, 'list'] as const,
  list: (filters: IngredientListParams) => [...ingredientKeys.lists(), filters] as const,
  details: () => [...ingredientKeys.all, 'detail'] as const,
  detail: (id: number) => [...ingredientKeys.details(), id] as const,
  settings: () => [...ingredientKeys.all, 'workspace-settings'] as const,
};
