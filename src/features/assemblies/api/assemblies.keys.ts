/** Query keys of plates (assemblies), and of the tray picker the plate form uses. */
export const assemblyKeys = {
  all: ['assemblies'] as const,
  lists: () => [...assemblyKeys.all, 'list'] as const,
  list: () => [...assemblyKeys.lists()] as const,
  details: () => [...assemblyKeys.all, 'detail'] as const,
  detail: (id: number) => [...assemblyKeys.details(), id] as const,
  trayOptions: () => [...assemblyKeys.all, 'tray-options'] as const,
};
