/** Query keys of prep weeks, the week board, the home glance and the client's published week. */
export const weekKeys = {
  all: ['weeks'] as const,
  lists: () => [...weekKeys.all, 'list'] as const,
  list: () => [...weekKeys.lists()] as const,
  details: () => [...weekKeys.all, 'detail'] as const,
  detail: (id: number) => [...weekKeys.details(), id] as const,
  /** A week's published versions; the key holds the current version, so a new publication reads them again. */
  publications: (id: number, current: number | null) => [...weekKeys.all, 'publications', id, current] as const,
  glance: (today: string) => [...weekKeys.all, 'glance', today] as const,
  mine: (today: string) => [...weekKeys.all, 'mine', today] as const,
};
