import { describe, expect, it } from 'vitest';
import { targetsCover } from '@server/modules/weeks/week-mail.js';

// The default shares of the day (breakfast 30 %, lunch 35 %, dinner 35 %) are common practice, no source; a
// client's own shares replace them (shared/domain/targets.ts DEFAULT_SLOT_SHARES).
describe("what a plan's targets cover", () => {
  it('names the planned meals and their share of the day when they are not the whole day', () => {
    expect(targetsCover({ slotShares: {} }, ['breakfast'])).toBe('breakfast, 30 % of your day');
    expect(targetsCover({ slotShares: {} }, ['breakfast', 'lunch'])).toBe('breakfast and lunch, 65 % of your day');
    expect(targetsCover({ slotShares: { Breakfast: 0.25, Lunch: 0.25 } }, ['Breakfast', 'Lunch'])).toBe('breakfast and lunch, 50 % of your day');
  });

  it('says nothing when the planned meals make the whole day', () => {
    expect(targetsCover({ slotShares: {} }, ['breakfast', 'lunch', 'dinner'])).toBeNull();
    expect(targetsCover({ slotShares: {} }, [])).toBeNull();
  });
});
