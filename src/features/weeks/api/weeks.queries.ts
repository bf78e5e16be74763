import { queryOptions } from '@tanstack/react-query';
import type { GlanceDto, MyWeekDto, WeekPublicationDto, WeekSummaryDto } from '@shared/schemas/weeks.schema';
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
