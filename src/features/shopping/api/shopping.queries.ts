import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { LabelSheetCode } from '@shared/domain/label-sheets';
import type { IngredientListDto } from '@shared/schemas/ingredients.schema';
import type { LabelSheetDto, PantryListDto, ShoppingListDto } from '@shared/schemas/shopping.schema';
import type { WeekSummaryDto } from '@shared/schemas/weeks.schema';
import { api, qs } from '@/lib/api-client';
import { pantryKeys, shoppingKeys } from './shopping.keys';

/**
 * A list of the week (the whole week, or the trip before `prepDate`); refreshed every 15 s so two people shopping
 * see each other's marks.
 */
export const shoppingListQuery = (weekId: number, prepDate: string | null = null) =>
  queryOptions({
    queryKey: shoppingKeys.list(weekId, prepDate),
    queryFn: () => api.get<ShoppingListDto>(`/weeks/${weekId}/shopping${qs({ prepDate })}`),
    refetchInterval: 15_000,
  });

/** The kitchen's week for the device's day: the one of the next prep day (see kitchenWeek). */
export const currentWeekQuery = (today: string) =>
  queryOptions({ queryKey: shoppingKeys.currentWeek(today), queryFn: () => api.get<WeekSummaryDto | null>(`/weeks/current${qs({ today })}`) });

export const labelSheetQuery = (weekId: number, layout: LabelSheetCode, prepDate: string | null) =>
  queryOptions({
    queryKey: shoppingKeys.labelSheet(weekId, layout, prepDate),
    queryFn: () => api.get<LabelSheetDto>(`/weeks/${weekId}/labels${qs({ layout, prepDate })}`),
    placeholderData: keepPreviousData,
  });

export const pantryQuery = () =>
  queryOptions({ queryKey: pantryKeys.list(), queryFn: () => api.get<PantryListDto>('/pantry') });

export const pantryIngredientSearchQuery = (q: string) =>
  queryOptions({
    queryKey: pantryKeys.ingredientSearch(q),
    queryFn: () => api.get<IngredientListDto>(`/ingredients${qs({ q, pageSize: 20, sort: 'name' })}`),
    placeholderData: keepPreviousData,
  });

/** Export addresses (plain links: the browser downloads them with the session cookie). */
export const shoppingCsvUrl = (weekId: number, prepDate: string | null = null) => `/api/weeks/${weekId}/shopping.csv${qs({ prepDate })}`;
export const shoppingPdfUrl = (weekId: number, prepDate: string | null = null) => `/api/weeks/${weekId}/shopping.pdf${qs({ prepDate })}`;

/** What trays × counts ask the shop for, after the pantry (a read: nothing is written). */
export const shoppingPreviewQuery = (trays: { trayId: number; count: number }[]) =>
  queryOptions({
    queryKey: shoppingKeys.preview(trays),
    queryFn: () => api.post<ShoppingListDto>('/shopping/preview', { trays }),
    placeholderData: keepPreviousData,
  });
