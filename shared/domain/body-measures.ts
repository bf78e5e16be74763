/**
 * Body height and weight in US measures for a coach who works in them; the profile keeps centimetres and
 * kilograms (what the Mifflin–St Jeor equation takes). The inch and the pound are the exact ones the kitchen units
 * already use (CM_PER_INCH; GRAMS_PER_UNIT.lb, NIST Handbook 44 Appendix C).
 */
import Decimal from 'decimal.js';
import { CM_PER_INCH } from './scaling';
import { decimalCommaToPoint, GRAMS_PER_UNIT } from './units';

const KG_PER_LB = GRAMS_PER_UNIT.lb.div(1000);

/** A typed number (a decimal comma read as a point), or null for blank, ambiguous or non-numeric text. */
function typed(text: unknown): Decimal | null {
  const t = decimalCommaToPoint(String(text ?? '').trim());
  if (!t) return null;
  try {
    const d = new Decimal(t);
    return d.isFinite() ? d : null;
  } catch {
    return null;
  }
}

const places = (d: Decimal, dp: number) => d.toDecimalPlaces(dp, Decimal.ROUND_HALF_UP).toString();

/** Stored centimetres as feet and inches (inches to 0.5), for a US reader; blank when not a number. */
export function feetInches(cm: string): { ft: string; in: string } {
  const c = typed(cm);
  if (!c) return { ft: '', in: '' };
  const halfInches = c.div(CM_PER_INCH).toNearest(0.5, Decimal.ROUND_HALF_UP);
  const ft = halfInches.div(12).floor();
  return { ft: ft.toString(), in: halfInches.minus(ft.times(12)).toString() };
}

/** Feet and inches as typed → centimetres to 0.01 (what the profile stores); '' when neither is a number. */
export function cmOf(ft: string, inches: string): string {
  const f = typed(ft);
  const i = typed(inches);
  if ((!f && !i) || (ft.trim() && !f) || (inches.trim() && !i)) return '';
  return places((f ?? new Decimal(0)).times(12).plus(i ?? 0).times(CM_PER_INCH), 2);
}

/** Stored kilograms as pounds to 0.1; '' when not a number. */
export const poundsOf = (kg: string) => {
  const k = typed(kg);
  return k ? places(k.div(KG_PER_LB), 1) : '';
};

/** Pounds as typed → kilograms to 0.01; '' when not a number. */
export const kgOf = (lb: string) => {
  const l = typed(lb);
  return l ? places(l.times(KG_PER_LB), 2) : '';
};

/** Protein per kg of body weight as per lb, to 0.01; '' when not a positive number. */
export const perLb = (gPerKg: unknown) => {
  const g = typed(gPerKg);
  return g && g.gt(0) ? places(g.times(KG_PER_LB), 2) : '';
};
