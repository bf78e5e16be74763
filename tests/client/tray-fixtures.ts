import type { TrayDto } from '@shared/schemas/trays.schema';

/** An invented egg-slab tray (demo-like values), as GET /api/trays/:id answers it. */
export const eggSlabTray = (overrides: Partial<TrayDto> = {}): TrayDto => ({
  id: 12,
  name: 'Spinach egg slab',
  description: '',
  lines: [{ id: 1, position: 0, ingredientId: 30, ingredientName: 'Egg, whole, raw', amountText: '12', unit: 'each', note: '', grams: 600 }],
  pan: { code: 'half-sheet', label: 'Half sheet', length: 18, width: 13, unit: 'in' },
  panLining: 'parchment',
  bake: { category: 'egg-slab', categoryLabel: 'Egg slab', tempF: 350, minMinutes: 20, maxMinutes: 25 },
  yieldFactor: 1,
  cutPlan: { kind: 'grid', rows: 3, columns: 4 },
  portions: 12,
  storage: { fridgeDays: 4, freezerWeeks: 8 },
  reheatSteps: [],
  reheat: { minF: 165, minC: 74, source: 'FDA Food Code 3-403.11' },
  allergens: ['egg'],
  tags: [],
  photo: null,
  isDemo: false,
  archived: false,
  version: 3,
  createdAt: '2026-11-01T08:00:00.000Z',
  updatedAt: '2026-11-01T08:00:00.000Z',
  ...overrides,
});
