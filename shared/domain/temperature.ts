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
