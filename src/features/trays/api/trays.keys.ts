import type { ListTraysQuery } from '@shared/schemas/trays.schema';

/** Query keys of the base-tray feature, from general to specific. */
export const traysKeys = {
  all: ['trays'] as const,
  lists: () => [...traysKeys.all, 'list'] as const,
  list: (filters: ListTraysQuery) => [...traysKeys.lists(), filters] as const,
  details: () => [...traysKeys.all, 'detail'] as const,
  detail: (id: number) => [...traysKeys.details(), id] as const,
  portionCard: (id: number) => [...traysKeys.detail(id), 'portion-card'] as const,
};
