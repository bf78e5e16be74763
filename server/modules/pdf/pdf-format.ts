import Decimal from 'decimal.js';

/** Presentation helpers for PDFs: exact decimals rounded only here, at the edge. */
export function fixed(value: Decimal.Value | null | undefined, dp: number): string {
  if (value === null || value === undefined || value === '') return '';
  const d = new Decimal(value).toDecimalPlaces(dp, Decimal.ROUND_HALF_UP);
  const [int, frac] = d.abs().toFixed(dp).split('.');
  const grouped = int.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${d.isNegative() && !d.isZero() ? '−' : ''}${grouped}${frac ? `.${frac}` : ''}`;
}

export function signed(value: Decimal.Value, dp: number): string {
  const d = new Decimal(value);
  return d.isPositive() && !d.isZero() ? `+${fixed(d, dp)}` : fixed(d, dp);
}

const WEEKDAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/** "Monday 7 December 2026" from "2026-12-07" (calendar date, no time zone). */
export function longDate(iso: string): string {
  const [y, m, d] = iso.split('-').map(Number);
  const wd = new Date(Date.UTC(y, m - 1, d)).getUTCDay();
  return `${WEEKDAYS[wd]} ${d} ${MONTHS[m - 1]} ${y}`;
}

/** "Wed 9 Dec" from "2026-12-09". */
export function shortDate(iso: string): string {
  const [y, m, d] = iso.split('-').map(Number);
  const wd = new Date(Date.UTC(y, m - 1, d)).getUTCDay();
  return `${WEEKDAYS[wd].slice(0, 3)} ${d} ${MONTHS[m - 1].slice(0, 3)}`;
}

/** "HH:mm" from a local "YYYY-MM-DDTHH:mm". */
export function clock(localDateTime: string): string {
  return localDateTime.slice(11, 16);
}

export function capitalize(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
