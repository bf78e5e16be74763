import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  ACTIVITY_FACTORS,
  DEFAULT_SLOT_SHARES,
  KCAL_PER_G,
  KETO_DEFAULTS,
  computeTargets,
  goalEnergyKcal,
  restingEnergyKcal,
  slotTargets,
  totalEnergyKcal,
  type ActivityLevel,
  type Sex,
  type TargetsInput,
} from '@shared/domain/targets';

// Worked examples of the Mifflin–St Jeor equation (Mifflin et al., Am J Clin Nutr 1990;51:241–247),
// as tabulated in published-values §7: men 10W + 6.25H − 5A + 5, women 10W + 6.25H − 5A − 161.
const workedExamples: {
  case: string;
  sex: Sex;
  weightKg: number;
  heightCm: number;
  ageYears: number;
  ree: number;
  tdee: Record<ActivityLevel, number>;
}[] = [
  {
    case: 'man, 80 kg, 180 cm, 30 y',
    sex: 'male', weightKg: 80, heightCm: 180, ageYears: 30,
    ree: 1780,
    tdee: { sedentary: 2136.0, light: 2447.5, moderate: 2759.0, active: 3070.5, 'very-active': 3382.0 },
  },
  {
    case: 'woman, 65 kg, 165 cm, 40 y',
    sex: 'female', weightKg: 65, heightCm: 165, ageYears: 40,
    ree: 1320.25,
    tdee: { sedentary: 1584.3, light: 1815.34, moderate: 2046.39, active: 2277.43, 'very-active': 2508.47 },
  },
  {
    case: 'man, 70 kg, 175 cm, 25 y',
    sex: 'male', weightKg: 70, heightCm: 175, ageYears: 25,
    ree: 1673.75,
    tdee: { sedentary: 2008.5, light: 2301.41, moderate: 2594.31, active: 2887.22, 'very-active': 3180.12 },
  },
];

describe('restingEnergyKcal (Mifflin–St Jeor, Am J Clin Nutr 1990)', () => {
  it.each(workedExamples)('$case → REE $ree kcal/day (published-values §7 worked example)', (ex) => {
    expect(restingEnergyKcal(ex).toNumber()).toBe(ex.ree);
  });

  it('stays within 10 kcal of the unsimplified regression 9.99W + 6.25H − 4.92A + 166·sex − 161 (same paper)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 40, max: 200 }),
        fc.integer({ min: 140, max: 210 }),
        fc.integer({ min: 19, max: 78 }), // ages of the 1990 study sample
        fc.constantFrom<Sex>('male', 'female'),
        (weightKg, heightCm, ageYears, sex) => {
          const unsimplified = 9.99 * weightKg + 6.25 * heightCm - 4.92 * ageYears + (sex === 'male' ? 166 : 0) - 161;
          const simplified = restingEnergyKcal({ sex, weightKg, heightCm, ageYears }).toNumber();
          expect(Math.abs(simplified - unsimplified)).toBeLessThan(10);
        },
      ),
    );
  });

  it.each([
    { field: 'weightKg', value: 0 },
    { field: 'heightCm', value: -1 },
    { field: 'ageYears', value: 0 },
  ])('rejects $field = $value', ({ field, value }) => {
    const body = { sex: 'male' as const, weightKg: 80, heightCm: 180, ageYears: 30, [field]: value };
    expect(() => restingEnergyKcal(body)).toThrow(RangeError);
  });

  it('accepts only the two forms the 1990 paper gives', () => {
    expect(() => restingEnergyKcal({ sex: 'other' as Sex, weightKg: 80, heightCm: 180, ageYears: 30 })).toThrow(RangeError);
  });
});

describe('activity factors (common practice; clinical reference summary named in published-values §7)', () => {
  it('match the published table 1.2 / 1.375 / 1.55 / 1.725 / 1.9', () => {
    expect(Object.fromEntries(Object.entries(ACTIVITY_FACTORS).map(([k, v]) => [k, Number(v)]))).toEqual({
      sedentary: 1.2, light: 1.375, moderate: 1.55, active: 1.725, 'very-active': 1.9,
    });
  });

  const rows = workedExamples.flatMap((ex) =>
    (Object.keys(ex.tdee) as ActivityLevel[]).map((activity) => ({ case: ex.case, ree: ex.ree, activity, expected: ex.tdee[activity] })),
  );
  it.each(rows)('$case, $activity → $expected kcal/day (published-values §7 table, 2 decimals)', ({ ree, activity, expected }) => {
    expect(Math.abs(totalEnergyKcal(ree, activity).toNumber() - expected)).toBeLessThanOrEqual(0.01);
  });
});

describe('goal energy (adjustments are common practice, no source)', () => {
  it('maintain keeps total energy; lose is below it; gain is above it', () => {
    const tdee = 2759;
    expect(goalEnergyKcal(tdee, 'maintain').toNumber()).toBe(tdee);
    expect(goalEnergyKcal(tdee, 'lose').toNumber()).toBeLessThan(tdee);
    expect(goalEnergyKcal(tdee, 'gain').toNumber()).toBeGreaterThan(tdee);
  });

  it.each([
    { adjustment: '-0.2', expected: 2000 * 0.8 },
    { adjustment: '0.05', expected: 2000 * 1.05 },
  ])('a coach-set adjustment of $adjustment overrides the goal default', ({ adjustment, expected }) => {
    expect(goalEnergyKcal(2000, 'lose', adjustment).toNumber()).toBeCloseTo(expected, 9);
  });

  it('rejects an adjustment of −100 % or below', () => {
    expect(() => goalEnergyKcal(2000, 'lose', -1)).toThrow(RangeError);
  });
});

describe('computeTargets: keto split', () => {
  const base: TargetsInput = { sex: 'male', weightKg: 80, heightCm: 180, ageYears: 30, activity: 'moderate', goal: 'maintain' };

  it('uses the defaults: 20 g net carbs (Yancy et al. 2005 "<20 g"; BJPsych Open 2023 VLCD < 30 g) and 1.5 g protein/kg (Phinney mid-range)', () => {
    expect(Number(KETO_DEFAULTS.netCarbCapG)).toBe(20);
    expect(Number(KETO_DEFAULTS.proteinGPerKg)).toBe(1.5);
    // Phinney: "1.2 g/kg at the low end and 2.0 g/kg at the upper end".
    expect([Number(KETO_DEFAULTS.proteinGPerKgMin), Number(KETO_DEFAULTS.proteinGPerKgMax)]).toEqual([1.2, 2.0]);
    // General Atwater factors (USDA AH-74; 21 CFR 101.9(c)(1)(i)(B)).
    expect(KCAL_PER_G).toEqual({ protein: 4, netCarbs: 4, fat: 9 });
  });

  const cases: { case: string; input: TargetsInput; ree: number; tdee: number; goalFactor: number }[] = [
    { case: 'man 80 kg moderate, maintain', input: base, ree: 1780, tdee: 2759, goalFactor: 1 },
    {
      case: 'woman 65 kg light, maintain',
      input: { sex: 'female', weightKg: 65, heightCm: 165, ageYears: 40, activity: 'light', goal: 'maintain' },
      ree: 1320.25, tdee: 1815.34375, goalFactor: 1,
    },
    {
      case: 'man 70 kg sedentary, lose (−15 %, common practice)',
      input: { sex: 'male', weightKg: 70, heightCm: 175, ageYears: 25, activity: 'sedentary', goal: 'lose' },
      ree: 1673.75, tdee: 2008.5, goalFactor: 0.85,
    },
  ];

  it.each(cases)('$case: energy from §7, fat fills the rest at 9 kcal/g', ({ input, ree, tdee, goalFactor }) => {
    const t = computeTargets(input);
    const weight = Number(input.weightKg);
    const target = tdee * goalFactor;
    expect(t.reeKcal).toBe(Math.round(ree)); // Mifflin 1990 worked example, rounded to whole kcal
    expect(t.tdeeKcal).toBe(Math.round(tdee)); // × activity factor (§7 table)
    expect(t.targetKcal).toBe(Math.round(target));
    expect(t.netCarbCapG).toBe(20);
    expect(t.proteinG).toBe(Math.round(1.5 * weight));
    expect(t.fatG).toBe(Math.round((target - 4 * 1.5 * weight - 4 * 20) / 9));
    expect(t.notes).toEqual([]);
  });

  it.each(cases)('$case: fat gives 70–80 % of energy, the usual keto split (Harvard Nutrition Source keto review)', ({ input }) => {
    const t = computeTargets(input);
    const fatShare = (t.fatG * 9) / t.targetKcal;
    expect(fatShare).toBeGreaterThanOrEqual(0.7);
    expect(fatShare).toBeLessThanOrEqual(0.8);
  });

  it('macros add back up to the energy target within rounding (Atwater 4/4/9)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 45, max: 150 }),
        fc.integer({ min: 150, max: 200 }),
        fc.integer({ min: 19, max: 78 }),
        fc.constantFrom<Sex>('male', 'female'),
        fc.constantFrom<ActivityLevel>('sedentary', 'light', 'moderate', 'active', 'very-active'),
        (weightKg, heightCm, ageYears, sex, activity) => {
          const t = computeTargets({ sex, weightKg, heightCm, ageYears, activity, goal: 'maintain', proteinGPerKg: 1.2 });
          if (t.fatG === 0) return; // fat-negative case is covered below
          const back = 9 * t.fatG + 4 * t.proteinG + 4 * t.netCarbCapG;
          // each gram figure is rounded by at most 0.5 g: 9·0.5 + 4·0.5 + 4·0.5 = 8.5 kcal, plus 0.5 on the target
          expect(Math.abs(back - t.targetKcal)).toBeLessThanOrEqual(9);
        },
      ),
    );
  });

  it('counts protein on the reference weight when given (Phinney: reference body weight)', () => {
    const t = computeTargets({ ...base, weightKg: 110, proteinReferenceWeightKg: 75 });
    expect(t.proteinG).toBe(Math.round(75 * 1.5));
  });

  it.each([
    { proteinGPerKg: 1.1, noted: true },
    { proteinGPerKg: 1.2, noted: false },
    { proteinGPerKg: 2.0, noted: false },
    { proteinGPerKg: 2.1, noted: true },
  ])('protein $proteinGPerKg g/kg: outside Phinney’s 1.2–2.0 range noted = $noted', ({ proteinGPerKg, noted }) => {
    const codes = computeTargets({ ...base, proteinGPerKg }).notes.map((n) => n.code);
    expect(codes.includes('protein-outside-keto-range')).toBe(noted);
  });

  it.each([
    { ageYears: 18, noted: true },
    { ageYears: 19, noted: false },
    { ageYears: 78, noted: false },
    { ageYears: 79, noted: true },
  ])('age $ageYears: outside the 1990 study’s 19–78 y noted = $noted', ({ ageYears, noted }) => {
    const codes = computeTargets({ ...base, ageYears }).notes.map((n) => n.code);
    expect(codes.includes('age-outside-study-range')).toBe(noted);
  });

  it('sets fat to 0 with a note when protein and net carbs alone exceed the energy target', () => {
    const t = computeTargets({
      sex: 'female', weightKg: 50, heightCm: 150, ageYears: 70, activity: 'sedentary', goal: 'lose',
      goalAdjustment: '-0.6', proteinGPerKg: 2, netCarbCapG: 50,
    });
    // REE 500 + 937.5 − 350 − 161 = 926.5; × 1.2 × 0.4 = 444.72 kcal < 4·100 + 4·50 = 600 kcal
    expect(t.targetKcal).toBe(Math.round(926.5 * 1.2 * 0.4));
    expect(t.fatG).toBe(0);
    const note = t.notes.find((n) => n.code === 'fat-negative');
    expect(note?.message).toContain(`${Math.round(600 - 926.5 * 1.2 * 0.4)} kcal`);
  });

  it('rejects a negative net-carb cap', () => {
    expect(() => computeTargets({ ...base, netCarbCapG: -1 })).toThrow(RangeError);
  });
});

describe('slotTargets (shares are common practice, no source)', () => {
  const day = { targetKcal: 2759, netCarbCapG: 20, proteinG: 120, fatG: 244 };

  it('splits the day by each slot’s share', () => {
    const slots = slotTargets(day, { breakfast: '0.3', lunch: '0.3', dinner: '0.4' });
    expect(slots.breakfast).toEqual({
      targetKcal: Math.round(2759 * 0.3),
      netCarbCapG: 6,
      proteinG: 36,
      fatG: 73.2,
    });
    expect(slots.dinner.proteinG).toBe(48);
  });

  it('default shares cover the whole day and add back up to it within rounding', () => {
    const slots = Object.values(slotTargets(day, DEFAULT_SLOT_SHARES));
    const total = (pick: (s: (typeof slots)[number]) => number) => slots.reduce((sum, s) => sum + pick(s), 0);
    expect(Math.abs(total((s) => s.targetKcal) - day.targetKcal)).toBeLessThanOrEqual(1.5);
    expect(Math.abs(total((s) => s.fatG) - day.fatG)).toBeLessThanOrEqual(0.15);
  });

  it('allows shares below a whole day (meals the coach does not plan)', () => {
    expect(slotTargets(day, { lunch: '0.5' }).lunch.netCarbCapG).toBe(10);
  });

  it.each([{ shares: { a: '0.6', b: '0.5' } }, { shares: { a: '-0.1' } }])('rejects shares $shares', ({ shares }) => {
    expect(() => slotTargets(day, shares as Record<string, string>)).toThrow(RangeError);
  });
});
