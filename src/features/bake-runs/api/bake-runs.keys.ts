/** Query keys of the bake-run feature (bake rules, ovens, a week's bake run and its cooling record, weeks to pick from). */
export const bakeRunsKeys = {
  all: ['bake-runs'] as const,
  rules: () => [...bakeRunsKeys.all, 'rules'] as const,
  ovens: () => [...bakeRunsKeys.all, 'ovens'] as const,
  weeks: () => [...bakeRunsKeys.all, 'weeks'] as const,
  weekRuns: () => [...bakeRunsKeys.all, 'week-run'] as const,
  weekRun: (weekId: number, prepDate?: string) => [...bakeRunsKeys.weekRuns(), weekId, prepDate ?? null] as const,
  coolings: () => [...bakeRunsKeys.all, 'cooling'] as const,
  cooling: (weekId: number, prepDate: string) => [...bakeRunsKeys.coolings(), weekId, prepDate] as const,
  coolingLog: (from: string, to: string) => [...bakeRunsKeys.coolings(), 'log', from, to] as const,
};
