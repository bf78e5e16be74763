/**
 * Temperature scales: degrees Fahrenheit ↔ degrees Celsius.
 *
 * Definition (NIST SP 811, "Guide for the Use of the International System of Units", conversion of
 * temperature scales): °C = (°F − 32) × 5/9 and °F = °C × 9/5 + 32.
 *
 * °C → °F is an exact decimal (× 1.8 + 32). °F → °C divides by 9 and is generally a repeating decimal, so the
 * Decimal result carries decimal.js's working precision (20 significant digits); round it only for display.
 * Temperature *differences* (changeover deltas, tolerances, convection offsets) scale by 5/9 without the 32 offset.
 */
import Decimal from 'decimal.js';

const NINE = new Decimal(9);
const FIVE = new Decimal(5);
const THIRTY_TWO = new Decimal(32);

/** °F → °C, exact arithmetic (no rounding). */
export function fahrenheitToCelsius(tempF: Decimal.Value): Decimal {
  return new Decimal(tempF).minus(THIRTY_TWO).times(FIVE).dividedBy(NINE);
}

/** °C → °F, exact arithmetic (no rounding). */
export function celsiusToFahrenheit(tempC: Decimal.Value): Decimal {
  return new Decimal(tempC).times(NINE).dividedBy(FIVE).plus(THIRTY_TWO);
}

/** A temperature difference in °F (e.g. a tolerance of ±10 °F) expressed in °C; no offset. */
export function fahrenheitDeltaToCelsius(deltaF: Decimal.Value): Decimal {
  return new Decimal(deltaF).times(FIVE).dividedBy(NINE);
}

/** A temperature difference in °C expressed in °F; no offset. */
export function celsiusDeltaToFahrenheit(deltaC: Decimal.Value): Decimal {
  return new Decimal(deltaC).times(NINE).dividedBy(FIVE);
}

/** Presentation edge: °F → °C as a number rounded half-up to `decimals` places (default 0, as on oven dials). */
export function toCelsiusRounded(tempF: Decimal.Value, decimals = 0): number {
  return fahrenheitToCelsius(tempF).toDecimalPlaces(decimals, Decimal.ROUND_HALF_UP).toNumber();
}

/** Presentation edge: °C → °F as a number rounded half-up to `decimals` places (default 0). */
export function toFahrenheitRounded(tempC: Decimal.Value, decimals = 0): number {
  return celsiusToFahrenheit(tempC).toDecimalPlaces(decimals, Decimal.ROUND_HALF_UP).toNumber();
}

/** Which scale a person reads first (their preference: `tempUnit` on the signed-in person). */
export type TempScale = 'F' | 'C';

/** A person's stored temperature setting as a scale: 'C' is °C, anything else °F (the default). */
export const toTempScale = (stored: string | null | undefined): TempScale => (stored === 'C' ? 'C' : 'F');

/**
 * A temperature given in °F, written in both scales with the reader's first: "165 °F (74 °C)" or "74 °C (165 °F)".
 * °C rounded to whole degrees (the published pairs: 165 °F / 74 °C, 41 °F / 5 °C, 0 °F / −18 °C).
 */
export function bothScales(tempF: number, first: TempScale = 'F'): string {
  const c = toCelsiusRounded(tempF);
  const cText = `${c < 0 ? '−' : ''}${Math.abs(c)} °C`;
  const fText = `${tempF < 0 ? '−' : ''}${Math.abs(tempF)} °F`;
  return first === 'C' ? `${cText} (${fText})` : `${fText} (${cText})`;
}

/**
 * A temperature difference or rate given in °F, in the reader's scale alone: "25 °F" → "13.9 °C" (to one decimal, as
 * the oven and bake-rule forms show it; "18 °F" → "10 °C").
 */
export function deltaIn(deltaF: number, scale: TempScale): string {
  if (scale === 'F') return `${deltaF} °F`;
  return `${fahrenheitDeltaToCelsius(deltaF).toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber()} °C`;
}

/**
 * A text that writes its temperatures "165 °F (74 °C)" (the safety notes, the cooling record's words) in the
 * reader's order: for °C first, each such pair becomes "74 °C (165 °F)". Other text is left as it is.
 */
export function inReadersScale(text: string, first: TempScale): string {
  if (first === 'F') return text;
  return text.replace(/([−-]?\d+(?:\.\d+)?) °F \(([−-]?\d+(?:\.\d+)?) °C\)/g, '$2 °C ($1 °F)');
}
