/** Query keys of prep weeks, the week board, the home glance and the client's published week. */
export const weekKeys = {
  all: ['weeks'] as const,
  lists: () => [...weekKeys.all, 'list'] as const,
  list: () => [...weekKeys.lists()] as const,
  details: () => [...weekKeys.all, 'detail'] as const,
  detail: (id: number) => [...weekKeys.details(), id] as const,
  /** A week's published versions; the key holds the current version, so a new publication reads them again. */
  publications: (id: number, current: number | null) => [...weekKeys.all, 'publications', id, current] as const,
  /** The published version's plates holding an allergen put on a client's list since; read again for a new version. */
  publishedAllergens: (id: number, current: number | null, today: string) => [...weekKeys.all, 'published-allergens', id, current, today] as const,
  glance: (today: string) => [...weekKeys.all, 'glance', today] as const,
  mine: (today: string) => [...weekKeys.all, 'mine', today] as const,
};
