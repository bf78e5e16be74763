import { DEFAULT_BAKE_RULES } from '@shared/domain/bake-rules-defaults';
import { STORAGE_DEFAULTS } from '@shared/domain/eat-by';
import type { TrayDto, TrayInput } from '@shared/schemas/trays.schema';

/** Form values of a new tray: a half sheet cut 4 × 5, the egg-slab bake rule and egg-dish storage. */
export function emptyTrayValues(): TrayInput {
  const egg = DEFAULT_BAKE_RULES.find((r) => r.category === 'egg-slab')!;
  return {
    name: '',
    description: '',
    lines: [],
    pan: { code: 'half-sheet', unit: 'in' },
    panLining: 'parchment',
    bake: { category: egg.category, tempF: egg.tempF, minMinutes: egg.minMinutes, maxMinutes: egg.maxMinutes },
    yieldFactor: 0.9,
    cutPlan: { kind: 'grid', rows: 4, columns: 5 },
    storage: { fridgeDays: STORAGE_DEFAULTS['egg-dish'].fridgeDays, freezerWeeks: STORAGE_DEFAULTS['egg-dish'].freezerWeeks },
    reheatSteps: [],
    tags: [],
  };
}

/** Form values from a stored tray (also used to reload "their version" after a stale save). */
export function trayToValues(t: TrayDto): TrayInput {
  return {
    name: t.name,
    description: t.description,
    lines: t.lines.map((l) => ({ ingredientId: l.ingredientId, amountText: l.amountText, unit: l.unit, note: l.note })),
    pan: t.pan.code === 'custom' ? { code: 'custom', length: t.pan.length, width: t.pan.width, unit: t.pan.unit } : { code: t.pan.code, unit: 'in' },
    panLining: t.panLining,
    bake: { category: t.bake.category, tempF: t.bake.tempF, minMinutes: t.bake.minMinutes, maxMinutes: t.bake.maxMinutes },
    yieldFactor: t.yieldFactor,
    cutPlan: t.cutPlan,
    storage: t.storage,
    reheatSteps: t.reheatSteps,
    tags: t.tags,
  };
}
