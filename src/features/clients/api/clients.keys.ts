/** Query keys of client profiles (general → specific). */
export const clientKeys = {
  all: ['clients'] as const,
  lists: () => [...clientKeys.all, 'list'] as const,
  list: () => [...clientKeys.lists()] as const,
  details: () => [...clientKeys.all, 'detail'] as const,
  detail: (id: number) => [...clientKeys.details(), id] as const,
  /** Published plates holding an allergen on the client's list as it stands (under the detail: a change refetches it). */
  publishedAllergens: (id: number) => [...clientKeys.detail(id), 'published-allergens'] as const,
};
