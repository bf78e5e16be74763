import { queryOptions } from '@tanstack/react-query';
import type { GlanceDto, MyWeekDto, WeekPublicationDto, WeekPublishedAllergensDto, WeekSummaryDto } from '@shared/schemas/weeks.schema';
import { expandBoard, type BoardAnswer } from '@shared/schemas/board-answer';
import { api, qs } from '@/lib/api-client';
import { weekKeys } from './weeks.keys';

export const weeksQuery = () => queryOptions({ queryKey: weekKeys.list(), queryFn: () => api.get<WeekSummaryDto[]>('/weeks') });

export const boardQuery = (id: number) =>
  queryOptions({ queryKey: weekKeys.detail(id), queryFn: () => api.get<BoardAnswer>(`/weeks/${id}`).then(expandBoard) });

export const glanceQuery = (today: string) =>
  queryOptions({ queryKey: weekKeys.glance(today), queryFn: () => api.get<GlanceDto>(`/weeks/glance${qs({ today })}`) });

export const myWeekQuery = (today: string) =>
  queryOptions({ queryKey: weekKeys.mine(today), queryFn: () => api.get<MyWeekDto | null>(`/weeks/mine${qs({ today })}`) });

export const publicationsQuery = (id: number, current: number | null) =>
  queryOptions({ queryKey: weekKeys.publications(id, current), queryFn: () => api.get<WeekPublicationDto[]>(`/weeks/${id}/publications`) });

/**
 * The week's published version against its clients' allergen lists as they stand (from `today` on). Read again each
 * time the week's page opens: a client's list is edited on another page.
 */
export const weekPublishedAllergensQuery = (id: number, current: number | null, today: string) =>
  queryOptions({
    queryKey: weekKeys.publishedAllergens(id, current, today),
    queryFn: () => api.get<WeekPublishedAllergensDto>(`/weeks/${id}/published-allergens${qs({ today })}`),
    staleTime: 0,
  });
