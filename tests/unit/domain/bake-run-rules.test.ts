/**
 * Default bake rules: the minimum internal temperatures against the USDA FSIS Safe Minimum Internal Temperatures
 * chart; temperatures and times are common practice (no source), so only their consistency is checked.
 */
import { describe, expect, it } from 'vitest';

import { planBakeRun } from '@shared/domain/bake-run';
import { DEFAULT_BAKE_RULES, FSIS_SAFE_MINIMUM_SOURCE, findBakeRule } from '@shared/domain/bake-rules-defaults';
import { bakeRunInputSchema } from '@shared/schemas/bake-run.schema';

import { HOME_OVEN, trayFromRule } from './bake-run-fixtures';

describe('default bake rules', () => {
  it.each([
    // USDA FSIS Safe Minimum Internal Temperatures chart (FoodSafety.gov):
    ['egg-slab', 160, 0], // "Egg dishes (such as frittata, quiche) 160 °F"
    ['ground-meat-patties', 160, 0], // "Ground meats (beef, pork, veal, lamb) 160 °F"
    ['ground-poultry-patties', 165, 0], // "All poultry, incl. ground poultry 165 °F"
    ['poultry-pieces', 165, 0], // same
    ['pork-chops', 145, 3], // "Fresh pork … 145 °F, rest time 3 minutes"
  ] as const)('%s: %i °F, rest %i min (USDA FSIS)', (category, tempF, rest) => {
    const rule = findBakeRule(category)!;
    expect(rule.minInternalF).toBe(tempF);
    expect(rule.restMinutes).toBe(rest);
    expect(rule.minInternalSource).toBe(FSIS_SAFE_MINIMUM_SOURCE);
  });

  it('foods without a chart number carry none, and say so', () => {
    for (const category of ['roasted-vegetables', 'cheese-crisps', 'fat-head-dough', 'bacon'] as const) {
      const rule = findBakeRule(category)!;
      expect(rule.minInternalF).toBeNull();
      expect(rule.minInternalSource).toBeNull();
    }
  });

  it('covers the categories a low-carb prep day needs, once each', () => {
    const categories = DEFAULT_BAKE_RULES.map((r) => r.category);
    expect(new Set(categories).size).toBe(categories.length);
    for (const c of ['egg-slab', 'batter-slab', 'roasted-vegetables', 'bacon', 'ground-meat-patties', 'cheese-crisps', 'fat-head-dough'])
      expect(categories).toContain(c);
  });

  it.each(DEFAULT_BAKE_RULES.map((r) => [r.category, r] as const))('%s is a valid tray and bakes alone in its range', (_, rule) => {
    expect(rule.bakeSource).toBe('common practice, no source');
    expect(rule.minMinutes).toBeLessThan(rule.maxMinutes);
    expect(rule.donenessCue.length).toBeGreaterThan(10);
    const body = {
      start: '2026-12-06T08:00',
      cooks: 1,
      ambientF: 70,
      ovens: [HOME_OVEN],
      trays: [trayFromRule('t1', rule.category)],
    };
    const parsed = bakeRunInputSchema.parse(body);
    const r = planBakeRun(parsed);
    // Alone in an uncrowded conventional oven the tray comes out exactly at its minimum time.
    expect(r.trays[0].bakeMinutes).toBe(rule.minMinutes);
    expect(r.trays[0].tempF).toBe(rule.tempF);
  });
});
