export interface OutboxFilters {
  page?: number;
  status?: string;
  clientId?: number;
  batchId?: string;
}

export const mailKeys = {
  all: ['mail'] as const,
  lists: () => [...mailKeys.all, 'outbox'] as const,
  list: (filters: OutboxFilters) => [...mailKeys.lists(), filters] as const,
  caught: () => [...mailKeys.all, 'caught'] as const,
  caughtList: (page: number) => [...mailKeys.caught(), 'list', page] as const,
  caughtDetail: (id: number) => [...mailKeys.caught(), 'detail', id] as const,
};
