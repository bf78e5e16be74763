/** Query keys of prep weeks, the week board, the home glance and the client's published week. */
export const weekKeys = {
  all: ['weeks'] as const,
  lists: () => [...weekKeys.all, 'list'] as const,
  list: () => [...weekKeys.lists()] as const,
  details: () => [...weekKeys.all, 'detail'] as const,
  detail: (id: number) => [...weekKeys.details(), id] as const,
  glance: (today: string) => [...weekKeys.all, 'glance', today] as const,
  mine: (today: string) => [...weekKeys.all, 'mine', today] as const,
};
