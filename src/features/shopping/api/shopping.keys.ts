import type { LabelSheetCode } from '@shared/domain/label-sheets';

/** Query keys of the shopping list, the pantry and container labels (general → specific). */
export const shoppingKeys = {
  all: ['shopping'] as const,
  lists: () => [...shoppingKeys.all, 'list'] as const,
  /** Every list of one week (the whole week and its trips). */
  weekLists: (weekId: number) => [...shoppingKeys.lists(), weekId] as const,
  /** One list: the whole week (no prep date) or the trip before that prep day. */
  list: (weekId: number, prepDate: string | null = null) => [...shoppingKeys.weekLists(weekId), prepDate ?? 'week'] as const,
  /** Mutation key of the check marks of one list (to know when the last tap has settled). */
  checks: (weekId: number, prepDate: string | null = null) => [...shoppingKeys.all, 'checks', weekId, prepDate ?? 'week'] as const,
  /** A list for trays × counts given directly (POST /api/shopping/preview). */
  preview: (trays: readonly { trayId: number; count: number }[]) => [...shoppingKeys.all, 'preview', trays] as const,
  /** Under the weeks' prefix, not the shopping one: a change to any week reads the kitchen's week again. */
  currentWeek: (today: string) => ['weeks', 'kitchen', today] as const,
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
