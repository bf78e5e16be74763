import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ListTraysQuery, PortionCardDto, TrayDto, TraySummaryDto } from '@shared/schemas/trays.schema';
import { api, qs } from '@/lib/api-client';
import { traysKeys } from './trays.keys';

export const traysQuery = (filters: ListTraysQuery) =>
  queryOptions({
    queryKey: traysKeys.list(filters),
    queryFn: () =>
      api.get<TraySummaryDto[]>(
        `/trays${qs({
          q: filters.q,
          archived: filters.archived,
          tag: filters.tag,
          maxNetCarbs: filters.maxNetCarbs as number | undefined,
          freeOf: Array.isArray(filters.freeOf) ? filters.freeOf.join(',') : filters.freeOf,
        })}`,
      ),
    placeholderData: keepPreviousData,
  });

export const trayQuery = (id: number) =>
  queryOptions({ queryKey: traysKeys.detail(id), queryFn: () => api.get<TrayDto>(`/trays/${id}`) });

export const portionCardQuery = (id: number) =>
  queryOptions({ queryKey: traysKeys.portionCard(id), queryFn: () => api.get<PortionCardDto>(`/trays/${id}/portion-card`) });

