import Decimal from 'decimal.js';
import { celsiusDeltaToFahrenheit, celsiusToFahrenheit, fahrenheitDeltaToCelsius, fahrenheitToCelsius } from '@shared/domain/temperature';
import type { TempUnit } from './temperature';

/** A temperature ('temp') or a difference or rate ('delta', no 32° offset), stored in °F. */
export type ScaleKind = 'temp' | 'delta';

/** A stored °F value as a form field shows it in `unit`: °C to one decimal (165 °F → 73.9, 25 °F lower → 13.9). */
export function shownIn(f: number | null | undefined, kind: ScaleKind, unit: TempUnit): string {
  if (f == null) return '';
  if (unit === 'F') return String(f);
  const c = kind === 'temp' ? fahrenheitToCelsius(f) : fahrenheitDeltaToCelsius(f);
  return c.toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toString();
}

/**
 * A field's text back in °F for the request. A field left as it was sends the stored °F unchanged (showing 10 °F as
 * 5.6 °C and back would save 10.08 °F); a typed °C value is converted (NIST SP 811) to four decimals, as stored. Blank
 * is null; text that is not a number is sent as it is, for the server to refuse naming the field.
 */
export function sentAsF(text: string, stored: number | null | undefined, touched: boolean, kind: ScaleKind, unit: TempUnit): number | string | null {
  if (!touched && stored != null) return stored;
  if (text.trim() === '') return null;
  const n = Number(text);
  if (!Number.isFinite(n)) return text;
  if (unit === 'F') return n;
  const f = kind === 'temp' ? celsiusToFahrenheit(n) : celsiusDeltaToFahrenheit(n);
  return f.toDecimalPlaces(4, Decimal.ROUND_HALF_UP).toNumber();
}
