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

export function capitalize(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
