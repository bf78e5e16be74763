import { describe, expect, it } from 'vitest';
import { computePlannedTargets, plannedTargets } from '../../../server/modules/clients/client.presenter';
import type { ClientFacts } from '../../../server/modules/clients/client.entity';

// The memo must never answer a stale value: each input the targets read changes the answer, and the memoized answer
// always equals a fresh computation. (Mifflin–St Jeor itself is checked against the 1990 paper in targets.test.ts.)
const base = {
  id: 1,
  name: 'Memo check',
  email: null,
  householdMultiplier: '1',
  sex: 'female',
  ageYears: 40,
  heightCm: '165',
  weightKg: '70',
  activity: 'light',
  goal: 'lose',
  goalAdjustment: null,
  netCarbCapG: '25',
  proteinGPerKg: '1.6',
  targetMode: 'computed',
  manualTargets: null,
  slotShares: {},
  allergens: [],
  dislikes: [],
  version: 1,
} as unknown as ClientFacts;

const changes: [string, Partial<Record<keyof ClientFacts, unknown>>, string[]?][] = [
  ['sex', { sex: 'male' }],
  ['age', { ageYears: 55 }],
  ['height', { heightCm: '180' }],
  ['weight', { weightKg: '82.5' }],
  ['activity', { activity: 'active' }],
  ['goal', { goal: 'maintain' }],
  ['goal adjustment', { goalAdjustment: '-0.25' }],
  ['net-carb cap', { netCarbCapG: '20' }],
  ['protein per kg', { proteinGPerKg: '2' }],
  ['typed targets', { targetMode: 'manual', manualTargets: { targetKcal: 1500, netCarbCapG: 20, proteinG: 100, fatG: 110 } }],
  ['slot shares', { slotShares: { breakfast: 0.4 } }],
  ['meal slots', {}, ['breakfast', 'lunch']],
];

describe('plannedTargets (memoized)', () => {
  it.each(changes)('a changed %s gives the fresh answer, not the memoized one', (_what, change, slots = ['breakfast']) => {
    const before = plannedTargets(base, ['breakfast']);
    const changed = { ...base, ...change } as ClientFacts;
    const after = plannedTargets(changed, slots);
    expect(after).toEqual(computePlannedTargets(changed, slots));
    expect(after).not.toEqual(before);
  });

  it('answers the same frozen value for the same inputs (callers share it)', () => {
    const a = plannedTargets({ ...base }, ['breakfast']);
    const b = plannedTargets({ ...base, id: 2, name: 'Other', version: 7 }, ['breakfast']);
    expect(b).toBe(a);
    expect(Object.isFrozen(a)).toBe(true);
    expect(a).toEqual(computePlannedTargets(base, ['breakfast']));
  });
});
