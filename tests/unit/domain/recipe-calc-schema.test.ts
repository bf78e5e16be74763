import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { recipeCalcSchema } from '@shared/schemas/ingredients.schema';
import { parseAmount } from '@shared/domain/units';

const amountOf = (amount: string | number) =>
  recipeCalcSchema.safeParse({ items: [{ ingredientId: 1, amount, unit: 'g' }], portions: 1 });

describe('recipe calculation input: amounts', () => {
  it('property: an amount already written as decimal.js writes it comes back as it is, as parseAmount reads it (fast-check)', () => {
    // Positive decimals up to 6 places and up to the largest amount (1,000,000): their canonical text
    // (Decimal#toFixed) takes the short path.
    const positive = fc
      .integer({ min: 0, max: 6 })
      .chain((places) =>
        fc.bigInt({ min: 1n, max: 10n ** BigInt(6 + places) }).map((units) => new Decimal(units.toString()).div(new Decimal(10).pow(places)).toFixed()),
      );
    fc.assert(
      fc.property(positive, (text) => {
        const r = amountOf(text);
        expect(r.success).toBe(true);
        expect(r.success && r.data.items[0].amount).toBe(text);
        expect(parseAmount(text).value.toFixed()).toBe(text);
      }),
    );
  });

  it('property: an amount past 1,000,000, canonical or typed, is refused naming the amount (fast-check)', () => {
    const past = fc.bigInt({ min: 1n, max: 10n ** 30n }).map((extra) => new Decimal(10).pow(6).plus(new Decimal(extra.toString()).div(1000)).toFixed());
    fc.assert(
      fc.property(past, fc.boolean(), (text, typed) => {
        const r = amountOf(typed ? ` ${text} ` : text);
        expect(r.success).toBe(false);
        expect(!r.success && r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`)).toEqual(['items.0.amount: The amount must be at most 1,000,000']);
      }),
    );
  });

  it.each([
    ['010', '10'],
    ['10.50', '10.5'],
    ['.5', '0.5'],
    ['1 1/2', '1.5'],
    ['¾', '0.75'],
    ['1-2', '1.5'],
    [' 12 ', '12'],
  ])('%j, not canonical, is read the long way: %s', (typed, value) => {
    const r = amountOf(typed);
    expect(r.success && r.data.items[0].amount).toBe(value);
  });

  it.each(['0', '0.0', '-1', 'a pinch', ''])('%j is refused on items.0.amount', (typed) => {
    const r = amountOf(typed);
    expect(r.success).toBe(false);
    expect(r.error?.issues[0].path).toEqual(['items', 0, 'amount']);
  });
});
