import type { LabelSheetCode } from '@shared/domain/label-sheets';

/** Query keys of the shopping list, the pantry and container labels (general → specific). */
export const shoppingKeys = {
  all: ['shopping'] as const,
  lists: () => [...shoppingKeys.all, 'list'] as const,
  list: (weekId: number) => [...shoppingKeys.lists(), weekId] as const,
  /** Mutation key of the check marks of one week (to know when the last tap has settled). */
  checks: (weekId: number) => [...shoppingKeys.all, 'checks', weekId] as const,
  /** A list for trays × counts given directly (POST /api/shopping/preview). */
  preview: (trays: readonly { trayId: number; count: number }[]) => [...shoppingKeys.all, 'preview', trays] as const,
  currentWeek: () => [...shoppingKeys.all, 'current-week'] as const,
  labels: () => [...shoppingKeys.all, 'labels'] as const,
  labelSheet: (weekId: number, layout: LabelSheetCode, prepDate: string | null) =>
    [...shoppingKeys.labels(), weekId, layout, prepDate ?? ''] as const,
};

export const pantryKeys = {
  all: ['pantry'] as const,
  lists: () => [...pantryKeys.all, 'list'] as const,
  list: () => [...pantryKeys.lists(), 'workspace'] as const,
  ingredientSearch: (q: string) => [...pantryKeys.all, 'ingredient-search', q] as const,
};
