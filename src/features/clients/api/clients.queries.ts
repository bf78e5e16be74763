import { queryOptions } from '@tanstack/react-query';
import type { ClientDto, ClientListItemDto, ClientSelfDto } from '@shared/schemas/clients.schema';
import type { PublishedAllergenWeekDto } from '@shared/schemas/weeks.schema';
import { api } from '@/lib/api-client';
import { clientKeys } from './clients.keys';

/** Coach: full profiles; assistant: names and portions per plate. */
export const clientsQuery = () =>
  queryOptions({ queryKey: clientKeys.list(), queryFn: () => api.get<ClientListItemDto[]>('/clients') });

/** Coach: the full profile; a client: their own (no health notes). */
export const clientQuery = (id: number) =>
  queryOptions({ queryKey: clientKeys.detail(id), queryFn: () => api.get<ClientDto | ClientSelfDto>(`/clients/${id}`) });

/** Coach: published plates, from `today` on, holding an allergen put on the client's list after publishing. */
export const publishedAllergensQuery = (id: number, today: string) =>
  queryOptions({
    queryKey: [...clientKeys.publishedAllergens(id), today],
    queryFn: () => api.get<PublishedAllergenWeekDto[]>(`/clients/${id}/published-allergens?today=${today}`),
  });
