/**
 * Example bake runs shared by the bake-run tests (not a test file itself).
 * Tray values come from the default bake rules (common practice, no source).
 */
import type { BakeOven, BakeRunInput, BakeTray } from '@shared/domain/bake-run-types';
import type { BakeRuleCategory } from '@shared/domain/bake-rules-defaults';
import { findBakeRule } from '@shared/domain/bake-rules-defaults';

export function trayFromRule(id: string, category: BakeRuleCategory): BakeTray {
  const rule = findBakeRule(category)!;
  return {
    id,
    name: rule.label,
    tempF: rule.tempF,
    minMinutes: rule.minMinutes,
    maxMinutes: rule.maxMinutes,
    handsOnMinutes: rule.handsOnMinutes,
    toleranceF: rule.toleranceF,
    rackPreference: rule.rackPreference,
    ...(rule.minInternalF === null ? {} : { minInternalF: rule.minInternalF }),
  };
}

export const HOME_OVEN: BakeOven = {
  name: 'Left',
  racks: 2,
  traysPerRack: 1,
  convection: false,
  heatFPerMin: 25,
  coolFPerMin: 15,
  maxF: 500,
};

/** A 40-tray prep day: 3 ovens (one convection), 2 cooks. */
export function prepDay40(): BakeRunInput {
  const mix: [BakeRuleCategory, number][] = [
    ['egg-slab', 8],
    ['batter-slab', 6],
    ['roasted-vegetables', 8],
    ['bacon', 6],
    ['ground-meat-patties', 6],
    ['cheese-crisps', 4],
    ['fat-head-dough', 2],
  ];
  const trays: BakeTray[] = [];
  for (const [category, count] of mix)
    for (let k = 1; k <= count; k++) trays.push(trayFromRule(`${category}-${String(k).padStart(2, '0')}`, category));
  return {
    start: '2026-12-06T08:00',
    cooks: 2,
    ambientF: 70,
    ovens: [
      HOME_OVEN,
      { name: 'Right', racks: 3, traysPerRack: 1, convection: true, heatFPerMin: 30, coolFPerMin: 12, maxF: 500 },
      { name: 'Wall', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 20, coolFPerMin: 10, maxF: 550 },
    ],
    trays,
  };
}
