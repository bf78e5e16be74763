import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { typedNumber } from '@shared/schemas/typed-number';
import { dollarsText, ingredientFormSchema, ingredientInputSchema, priceDollarsText, recipeCalcSchema } from '@shared/schemas/ingredients.schema';
import { assemblyTrayItemSchema } from '@shared/schemas/assemblies.schema';
import { panInputSchema, trayInputSchema } from '@shared/schemas/trays.schema';
import { kgOf, cmOf } from '@shared/domain/body-measures';
import { createClientSchema } from '@shared/schemas/clients.schema';

// Number fields typed the way a European coach types them: a decimal comma reads as a point, and a comma before
// groups of three digits is refused as ambiguous (a thousands separator or a decimal comma, off by 1000 either way).
// The conversions themselves are checked against NIST Handbook 44 in body-measures.test.ts; these checks are of reading.

const messages = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  r.error?.issues.map((i) => `${i.path.join('.')}: ${i.message}`) ?? [];

describe('typedNumber', () => {
  const factor = typedNumber('The factor', z.coerce.number());

  it.each([
    ['0,9', 0.9],
    [' 0,35 ', 0.35],
    ['1.5', 1.5],
    [2, 2],
  ])('%j reads as %s', (typed, value) => {
    expect(factor.parse(typed)).toBe(value);
  });

  it('refuses "1,500" as ambiguous, naming the field', () => {
    const r = factor.safeParse('1,500');
    expect(messages(r)).toEqual([': The factor: "1,500" is ambiguous: write 1500 for a whole number or use a point for decimals.']);
  });
});

describe('number fields that take a decimal comma', () => {
  it('the recipe calculation reads the cooked-yield factor "0,9" as 0.9', () => {
    const r = recipeCalcSchema.safeParse({ items: [{ ingredientId: 1, amount: '100', unit: 'g' }], portions: 4, yieldFactor: '0,9' });
    expect(r.success && r.data.yieldFactor).toBe('0.9');
  });

  it('the recipe calculation still refuses a factor past 5 and an ambiguous one, on yieldFactor', () => {
    const past = recipeCalcSchema.safeParse({ items: [{ ingredientId: 1, amount: '100', unit: 'g' }], portions: 4, yieldFactor: '5,5' });
    expect(messages(past)).toEqual(['yieldFactor: The cooked-yield factor must be a number above 0 and at most 5']);
    const ambiguous = recipeCalcSchema.safeParse({ items: [{ ingredientId: 1, amount: '100', unit: 'g' }], portions: 4, yieldFactor: '1,000' });
    expect(messages(ambiguous)[0]).toMatch(/^yieldFactor: The cooked-yield factor: "1,000" is ambiguous/);
  });

  it('a base tray reads its cooked-yield factor "0,35" and a custom pan of "30,5" × "20" cm', () => {
    const yf = trayInputSchema.shape.yieldFactor.safeParse('0,35');
    expect(yf.success && yf.data).toBe(0.35);
    const pan = panInputSchema.safeParse({ code: 'custom', length: '30,5', width: '20', unit: 'cm' });
    expect(pan.success && [pan.data.length, pan.data.width]).toEqual([30.5, 20]);
  });

  it('a plate takes "0,5" portions of a tray', () => {
    const r = assemblyTrayItemSchema.safeParse({ trayId: 3, portions: '0,5' });
    expect(r.success && r.data.portions).toBe(0.5);
  });

  it('US body measures: "154,5" lb and "5,5" in read as 154.5 lb and 5.5 in (exact pound and inch)', () => {
    expect(kgOf('154,5')).toBe(kgOf('154.5'));
    expect(cmOf('5', '5,5')).toBe(cmOf('5', '5.5'));
    expect(kgOf('1,500')).toBe('');
  });
});

describe('client profile', () => {
  const client = {
    name: 'Demo reader',
    householdMultiplier: '1',
    sex: 'female',
    ageYears: 40,
    heightCm: '165',
    weightKg: '72,5',
    activity: 'light',
    goal: 'maintain',
    netCarbCapG: '20',
    proteinGPerKg: '1,6',
    targetMode: 'computed',
  };

  it('reads weight "72,5" kg and protein "1,6" g per kg', () => {
    const r = createClientSchema.safeParse(client);
    expect(r.success && [r.data.weightKg, r.data.proteinGPerKg]).toEqual(['72.5', '1.6']);
  });

  it('refuses a weight of "1,000" as ambiguous on weightKg', () => {
    const r = createClientSchema.safeParse({ ...client, weightKg: '1,000' });
    expect(messages(r)).toEqual(['weightKg: Weight (kg): "1,000" is ambiguous: write 1000 for a whole number or use a point for decimals.']);
  });
});

describe('a package price typed in dollars (the ingredient form)', () => {
  // Whole cents, exact: 0.1 + 0.2 style float error would be a wrong price (decimal.js does the ×100).
  it.each([
    ['3.99', 399],
    ['$3.99', 399],
    [' $ 12 ', 1200],
    ['3,99', 399],
    ['0.1', 10],
    ['.5', 50],
    ['4.', 400],
    ['1.10', 110],
    ['', null],
    [null, null],
  ])('%j is %s cents', (typed, cents) => {
    expect(priceDollarsText.parse(typed)).toBe(cents);
  });

  it.each([
    ['3.999', 'Give the price to the cent, e.g. 3.99'],
    ['-3', 'Enter the price in dollars, e.g. 3.99'],
    ['three', 'Enter the price in dollars, e.g. 3.99'],
    ['100000.01', 'At most $100,000'],
    ['1,500', 'Price: "1,500" is ambiguous: write 1500 for a whole number or use a point for decimals.'],
  ])('refuses %j: %s', (typed, message) => {
    expect(messages(priceDollarsText.safeParse(typed))).toEqual([`: ${message}`]);
  });

  it('shows cents as dollars, and the form gives the API its cents back', () => {
    expect([dollarsText(399), dollarsText(5), dollarsText(0), dollarsText(null)]).toEqual(['3.99', '0.05', '0.00', '']);
    const form = ingredientFormSchema.parse({
      name: 'Example cheese', category: 'dairy', kcal: '350', fatG: '30', proteinG: '20', carbsG: '2', source: 'package label', priceCents: dollarsText(1299),
    });
    expect(form.priceCents).toBe(1299);
    // The API's own field stays in cents (what the CSV import and other callers send).
    expect(ingredientInputSchema.parse({ name: 'Example cheese', category: 'dairy', kcal: '350', fatG: '30', proteinG: '20', carbsG: '2', source: 'x', priceCents: '1299' }).priceCents).toBe(1299);
  });
});
