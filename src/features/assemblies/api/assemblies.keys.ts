/** Query keys of plates (assemblies), and of the pickers the plate form uses. */
export const assemblyKeys = {
  all: ['assemblies'] as const,
  lists: () => [...assemblyKeys.all, 'list'] as const,
  list: () => [...assemblyKeys.lists()] as const,
  details: () => [...assemblyKeys.all, 'detail'] as const,
  detail: (id: number) => [...assemblyKeys.details(), id] as const,
  trayOptions: () => [...assemblyKeys.all, 'tray-options'] as const,
  ingredientOptions: (q: string) => [...assemblyKeys.all, 'ingredient-options', q] as const,
};
