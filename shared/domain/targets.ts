/**
 * A client's daily targets: resting energy, total energy, goal energy, then a keto split.
 *
 * 1. Resting energy (REE) by the Mifflin–St Jeor equation: Mifflin MD, St Jeor ST, Hill LA, Scott BJ,
 *    Daugherty SA, Koh YO. "A new predictive equation for resting energy expenditure in healthy
 *    individuals." Am J Clin Nutr 1990;51(2):241–247.
 *      men:   REE = 10·W(kg) + 6.25·H(cm) − 5·A(y) + 5
 *      women: REE = 10·W(kg) + 6.25·H(cm) − 5·A(y) − 161
 *    The paper fits one sex term (male = 1, female = 0), so the equation has exactly these two forms;
 *    `sex` here means the form of the equation, nothing more. The study covered ages 19–78.
 * 2. Total energy (TDEE) = REE × activity factor. The factors are common practice, not part of the
 *    1990 paper (clinical reference summary of the Mifflin–St Jeor equation, published-values §7).
 * 3. Goal energy = TDEE × (1 + goal adjustment). The defaults are common practice, no source; the coach
 *    edits them per client.
 * 4. Keto split: net carbs at the cap (default 20 g/day), protein in g per kg of reference body weight
 *    (default 1.5, range 1.2–2.0), fat fills the rest of the energy. General Atwater factors 4 / 4 / 9
 *    kcal per g (USDA Agriculture Handbook 74; 21 CFR 101.9(c)(1)(i)(B)).
 *
 * Exact decimals throughout; numbers appear only in the returned result.
 */
import Decimal from 'decimal.js';

export type Sex = 'male' | 'female';
export type ActivityLevel = 'sedentary' | 'light' | 'moderate' | 'active' | 'very-active';
export type Goal = 'lose' | 'maintain' | 'gain';

/** Mifflin–St Jeor 1990: the constant term of each form. */
export const MIFFLIN_SEX_CONSTANT: Readonly<Record<Sex, number>> = { male: 5, female: -161 };

/** Ages of the people measured in the 1990 study (n = 498). Outside it the equation is extrapolated. */
export const MIFFLIN_STUDY_AGE_RANGE = { minYears: 19, maxYears: 78 } as const;

/** Activity factors: common practice (clinical reference summary, published-values §7), not from the paper. */
export const ACTIVITY_FACTORS: Readonly<Record<ActivityLevel, string>> = {
  sedentary: '1.2',
  light: '1.375',
  moderate: '1.55',
  active: '1.725',
  'very-active': '1.9',
};

/** Fraction added to total energy per goal. Common practice, no source; coach-editable per client. */
export const GOAL_ADJUSTMENTS: Readonly<Record<Goal, string>> = {
  lose: '-0.15',
  maintain: '0',
  gain: '0.10',
};

/**
 * Keto defaults (coach-editable per client).
 * - Net-carb cap 20 g/day: the strict end of the keto ranges; "initial goal of <20 g carbohydrate/day"
 *   (Yancy et al., Nutr Metab 2005;2:34); very-low-carb < 30 g/day (BJPsych Open 2023;9(3):e70, Table 1);
 *   VLCK ≤ 30 g/day (Hite et al., Front Nutr 2022;9:865489, Table 2).
 * - Protein 1.5 g/kg reference body weight, range 1.2–2.0 g/kg (S. D. Phinney, citing Phinney et al.,
 *   Metabolism 1983;32:757–768 and Davis & Phinney, Int J Obes 1990;14:779–787).
 */
export const KETO_DEFAULTS = {
  netCarbCapG: '20',
  proteinGPerKg: '1.5',
  proteinGPerKgMin: '1.2',
  proteinGPerKgMax: '2.0',
} as const;

/** General Atwater factors, kcal per gram (USDA AH-74; 21 CFR 101.9(c)(1)(i)(B)). */
export const KCAL_PER_G = { protein: 4, netCarbs: 4, fat: 9 } as const;

export interface BodyInput {
  sex: Sex;
  weightKg: Decimal.Value;
  heightCm: Decimal.Value;
  ageYears: Decimal.Value;
}

export interface TargetsInput extends BodyInput {
  activity: ActivityLevel;
  goal: Goal;
  /** Overrides GOAL_ADJUSTMENTS[goal], as a fraction (−0.2 = 20 % below total energy). */
  goalAdjustment?: Decimal.Value;
  /** Overrides KETO_DEFAULTS.netCarbCapG. */
  netCarbCapG?: Decimal.Value;
  /** Overrides KETO_DEFAULTS.proteinGPerKg. */
  proteinGPerKg?: Decimal.Value;
  /** The weight protein is counted on (Phinney uses a reference weight); defaults to weightKg. */
  proteinReferenceWeightKg?: Decimal.Value;
}

export type TargetNoteCode = 'fat-negative' | 'protein-outside-keto-range' | 'age-outside-study-range';

export interface TargetNote {
  code: TargetNoteCode;
  message: string;
}

/** Daily energy and macro targets (what the rest of Trayline compares against). */
export interface MacroTargets {
  targetKcal: number;
  netCarbCapG: number;
  proteinG: number;
  fatG: number;
}

export interface Targets extends MacroTargets {
  reeKcal: number;
  tdeeKcal: number;
  notes: TargetNote[];
}

function positive(value: Decimal.Value, name: string): Decimal {
  const d = new Decimal(value);
  if (!d.isFinite() || d.lte(0)) throw new RangeError(`${name} must be greater than 0: ${String(value)}`);
  return d;
}

function nonNegative(value: Decimal.Value, name: string): Decimal {
  const d = new Decimal(value);
  if (!d.isFinite() || d.lt(0)) throw new RangeError(`${name} must be 0 or more: ${String(value)}`);
  return d;
}

function kcal(d: Decimal): number {
  return d.toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber();
}

function grams(d: Decimal, places: number): number {
  return d.toDecimalPlaces(places, Decimal.ROUND_HALF_UP).toNumber();
}

/** Resting energy in kcal/day by Mifflin–St Jeor (1990), exact. */
export function restingEnergyKcal(body: BodyInput): Decimal {
  const w = positive(body.weightKg, 'Weight (kg)');
  const h = positive(body.heightCm, 'Height (cm)');
  const a = positive(body.ageYears, 'Age (years)');
  if (!Object.hasOwn(MIFFLIN_SEX_CONSTANT, body.sex)) throw new RangeError(`Sex must be 'male' or 'female': ${String(body.sex)}`);
  return w.times(10).plus(h.times('6.25')).minus(a.times(5)).plus(MIFFLIN_SEX_CONSTANT[body.sex]);
}

/** Total energy in kcal/day: resting energy × the activity factor, exact. */
export function totalEnergyKcal(reeKcal: Decimal.Value, activity: ActivityLevel): Decimal {
  if (!Object.hasOwn(ACTIVITY_FACTORS, activity)) throw new RangeError(`Unknown activity level: ${String(activity)}`);
  return new Decimal(reeKcal).times(ACTIVITY_FACTORS[activity]);
}

/** Goal energy in kcal/day: total energy × (1 + adjustment), exact. */
export function goalEnergyKcal(tdeeKcal: Decimal.Value, goal: Goal, adjustment?: Decimal.Value): Decimal {
  if (!Object.hasOwn(GOAL_ADJUSTMENTS, goal)) throw new RangeError(`Unknown goal: ${String(goal)}`);
  const raw = adjustment ?? GOAL_ADJUSTMENTS[goal];
  const fraction = new Decimal(raw);
  if (!fraction.isFinite() || fraction.lte(-1)) {
    throw new RangeError(`Goal adjustment must be above −1 (−100 %): ${String(raw)}`);
  }
  return new Decimal(tdeeKcal).times(fraction.plus(1));
}

/**
 * The whole calculation. kcal are rounded to whole kcal and grams to whole grams (half up), from the
 * exact values; so fat·9 + protein·4 + net carbs·4 can differ from targetKcal by a few kcal.
 * When protein and net carbs alone exceed the goal energy, fat is 0 and a 'fat-negative' note says so.
 */
export function computeTargets(input: TargetsInput): Targets {
  const notes: TargetNote[] = [];
  const ree = restingEnergyKcal(input);
  const tdee = totalEnergyKcal(ree, input.activity);
  const target = goalEnergyKcal(tdee, input.goal, input.goalAdjustment);

  const age = new Decimal(input.ageYears);
  if (age.lt(MIFFLIN_STUDY_AGE_RANGE.minYears) || age.gt(MIFFLIN_STUDY_AGE_RANGE.maxYears)) {
    notes.push({
      code: 'age-outside-study-range',
      message: `The resting-energy equation was developed on adults aged ${MIFFLIN_STUDY_AGE_RANGE.minYears}–${MIFFLIN_STUDY_AGE_RANGE.maxYears}; treat this estimate with care.`,
    });
  }

  const netCarbCap = nonNegative(input.netCarbCapG ?? KETO_DEFAULTS.netCarbCapG, 'Net-carb cap (g)');
  const perKg = positive(input.proteinGPerKg ?? KETO_DEFAULTS.proteinGPerKg, 'Protein (g/kg)');
  if (perKg.lt(KETO_DEFAULTS.proteinGPerKgMin) || perKg.gt(KETO_DEFAULTS.proteinGPerKgMax)) {
    notes.push({
      code: 'protein-outside-keto-range',
      message: `Protein of ${perKg.toString()} g/kg is outside the usual keto range of ${KETO_DEFAULTS.proteinGPerKgMin}–${KETO_DEFAULTS.proteinGPerKgMax} g/kg.`,
    });
  }
  const referenceWeight = positive(input.proteinReferenceWeightKg ?? input.weightKg, 'Reference weight (kg)');
  const protein = referenceWeight.times(perKg);

  const fatKcal = target.minus(protein.times(KCAL_PER_G.protein)).minus(netCarbCap.times(KCAL_PER_G.netCarbs));
  let fat = fatKcal.div(KCAL_PER_G.fat);
  if (fat.lt(0)) {
    notes.push({
      code: 'fat-negative',
      message: `Protein and net carbs alone exceed the energy target by ${kcal(fatKcal.neg())} kcal, so fat is set to 0 g. Lower protein or the goal deficit.`,
    });
    fat = new Decimal(0);
  }

  return {
    reeKcal: kcal(ree),
    tdeeKcal: kcal(tdee),
    targetKcal: kcal(target),
    netCarbCapG: grams(netCarbCap, 0),
    proteinG: grams(protein, 0),
    fatG: grams(fat, 0),
    notes,
  };
}

/** Default shares of the day per meal slot. Common practice, no source; coach-editable. */
export const DEFAULT_SLOT_SHARES: Readonly<Record<string, string>> = {
  breakfast: '0.3',
  lunch: '0.35',
  dinner: '0.35',
};

/**
 * Per-slot targets from a day's targets and each slot's share of the day (0.3 = 30 %).
 * Shares must be 0 or more and add up to at most 1 (less than 1 when some meals are not planned).
 * kcal rounded to whole kcal, grams to 0.1 g.
 */
export function slotTargets<S extends string>(
  day: MacroTargets,
  shares: Readonly<Record<S, Decimal.Value>>,
): Record<S, MacroTargets> {
  const entries = Object.entries(shares) as [S, Decimal.Value][];
  const parsed = entries.map(([slot, share]) => [slot, nonNegative(share, `Share of ${slot}`)] as const);
  const total = parsed.reduce((sum, [, share]) => sum.plus(share), new Decimal(0));
  if (total.gt(1)) throw new RangeError(`Slot shares add up to ${total.toString()}, more than the whole day (1)`);

  const result = {} as Record<S, MacroTargets>;
  for (const [slot, share] of parsed) {
    result[slot] = {
      targetKcal: kcal(share.times(day.targetKcal)),
      netCarbCapG: grams(share.times(day.netCarbCapG), 1),
      proteinG: grams(share.times(day.proteinG), 1),
      fatG: grams(share.times(day.fatG), 1),
    };
  }
  return result;
}
