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

/** A measurement as a spreadsheet cell gives it: the stored value, or why it cannot be read. */
export type MeasureRead = { ok: true; value: string } | { ok: false; reason: string };

/** The units a bare number is read in: the reader's own. */
export type BodyUnits = 'us' | 'metric';

const NUM = String.raw`(\d+(?:[.,]\d+)?)`;
const INCH_MARK = String.raw`(?:in|inch|inches|"|″|'')`;
const FOOT_MARK = String.raw`(?:ft|feet|foot|'|′)`;

/**
 * A height as people write it, to centimetres to 0.01: "168 cm", "1.68 m", "1,68 m", "5 ft 6 in", "5'6\"", "5' 6",
 * "5 ft", "66 in", "66\"". A number alone is read in the reader's units (centimetres, or inches in US measures); a
 * small one that reads as feet or metres is refused with the way to write it, not taken as inches or centimetres.
 */
export function heightCmFromText(text: string, units: BodyUnits): MeasureRead {
  const t = text.trim().toLowerCase().replace(/\s+/g, ' ');
  if (!t) return { ok: false, reason: 'Give the height' };
  const say = `Could not read "${text.trim()}" as a height: write 168 cm, 1.68 m, 5 ft 6 in, 5'6" or 66 in`;
  let m: RegExpExecArray | null;
  const cm = (d: Decimal | null): MeasureRead => (d ? { ok: true, value: places(d, 2) } : { ok: false, reason: say });
  if ((m = new RegExp(`^${NUM} ?(?:cm|centimet(?:re|er)s?)$`).exec(t))) return cm(typed(m[1]));
  if ((m = new RegExp(`^${NUM} ?(?:m|met(?:re|er)s?)$`).exec(t))) return cm(typed(m[1])?.times(100) ?? null);
  if ((m = new RegExp(`^${NUM} ?${INCH_MARK}$`).exec(t))) return cm(typed(m[1])?.times(CM_PER_INCH) ?? null);
  if ((m = new RegExp(`^(\\d+) ?${FOOT_MARK}(?: ?${NUM} ?${INCH_MARK}?)?$`).exec(t))) {
    const inches = m[2] === undefined ? new Decimal(0) : typed(m[2]);
    if (!inches) return { ok: false, reason: say };
    if (inches.gte(12)) return { ok: false, reason: `"${text.trim()}": the inches after the feet must be less than 12` };
    return cm(new Decimal(m[1]).times(12).plus(inches).times(CM_PER_INCH));
  }
  if ((m = new RegExp(`^${NUM}$`).exec(t))) {
    const n = typed(m[1]);
    if (!n) return { ok: false, reason: say };
    if (units === 'us') {
      if (n.lt(10)) return { ok: false, reason: `"${text.trim()}" would be ${n.toString()} inches: write 5 ft 7 in, 5'7" or 67 in` };
      return cm(n.times(CM_PER_INCH));
    }
    if (n.lt(3)) return { ok: false, reason: `"${text.trim()}" would be ${n.toString()} cm: write ${n.toString()} m or ${places(n.times(100), 0)} cm` };
    return cm(n);
  }
  return { ok: false, reason: say };
}

/**
 * A body weight as people write it, to kilograms to 0.01: "74 kg", "74,5 kg", "163 lb", "163 lbs", "163 pounds". A
 * number alone is read in the reader's units (kilograms, or pounds in US measures).
 */
export function weightKgFromText(text: string, units: BodyUnits): MeasureRead {
  const t = text.trim().toLowerCase().replace(/\s+/g, ' ');
  if (!t) return { ok: false, reason: 'Give the weight' };
  const say = `Could not read "${text.trim()}" as a weight: write 74 kg or 163 lb`;
  const kg = (d: Decimal | null): MeasureRead => (d ? { ok: true, value: places(d, 2) } : { ok: false, reason: say });
  let m: RegExpExecArray | null;
  if ((m = new RegExp(`^${NUM} ?(?:kg|kgs|kilos?|kilograms?|kilogrammes?)$`).exec(t))) return kg(typed(m[1]));
  if ((m = new RegExp(`^${NUM} ?(?:lb|lbs|pounds?)$`).exec(t))) return kg(typed(m[1])?.times(KG_PER_LB) ?? null);
  if ((m = new RegExp(`^${NUM}$`).exec(t))) {
    const n = typed(m[1]);
    return kg(n && units === 'us' ? n.times(KG_PER_LB) : n);
  }
  return { ok: false, reason: say };
}

/** Protein per lb of body weight as per kg, to 0.01 (the profile keeps per kg); '' when not a number. */
export const perKgOfPerLb = (gPerLb: unknown) => {
  const g = typed(gPerLb);
  return g ? places(g.div(KG_PER_LB), 2) : '';
};
