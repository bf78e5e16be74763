import { toCelsiusRounded, type TempScale } from '@shared/domain/temperature';

/** The °F / °C a page shows (its switch starts on the person's preference). */
export type TempUnit = TempScale;

/** A set point as the person reads it (°C rounded to whole degrees, as on oven dials). */
export function formatTemp(tempF: number | null | undefined, unit: TempUnit): string {
  if (tempF == null) return '';
  return unit === 'C' ? `${toCelsiusRounded(tempF)} °C` : `${Math.round(tempF * 10) / 10} °F`;
}

/** Temperature band 1–5 of the oven colour scale (tokens oven-1 … oven-5); the number is always written too. */
export function tempBand(tempF: number): 1 | 2 | 3 | 4 | 5 {
  if (tempF < 325) return 1;
  if (tempF < 375) return 2;
  if (tempF < 400) return 3;
  if (tempF < 425) return 4;
  return 5;
}

/** Background + readable text colour for a band (light bands take ink, dark bands take paper). */
export const BAND_CLASS: Record<1 | 2 | 3 | 4 | 5, string> = {
  1: 'bg-oven-1 text-ink',
  2: 'bg-oven-2 text-ink',
  3: 'bg-oven-3 text-ink',
  4: 'bg-oven-4 text-paper-card',
  5: 'bg-oven-5 text-paper-card',
};

/** The "HH:mm" of a local date-time, as a time input takes it (words for people: timeLabel in src/lib/dates.ts). */
export const clock = (local: string) => local.slice(11, 16);


