/**
 * °F ↔ °C against the definition (NIST SP 811: °C = (°F − 32) × 5/9) and two general-purpose reference libraries
 * (convert-units, js-quantities).
 */
import fc from 'fast-check';
import convert from 'convert-units';
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';

import {
  celsiusDeltaToFahrenheit,
  celsiusToFahrenheit,
  fahrenheitDeltaToCelsius,
  fahrenheitToCelsius,
  toCelsiusRounded,
  toFahrenheitRounded,
  bothScales,
  deltaIn,
  inReadersScale,
} from '@shared/domain/temperature';
import { CAUTIONS } from '@shared/domain/eat-by';

describe('temperature scales', () => {
  it.each([
    // Fixed points of the definition (NIST SP 811): water freezes at 32 °F = 0 °C, boils at 212 °F = 100 °C;
    // the scales cross at −40.
    [32, 0],
    [212, 100],
    [-40, -40],
    // FDA Food Code §3-501.14 pairs its °F limits with °C: 135 °F (57 °C), 70 °F (21 °C), 41 °F (5 °C).
    [135, 57],
    [70, 21],
    [41, 5],
    // USDA FSIS pairs 160 °F with 71.1 °C and 165 °F with 73.9 °C (one decimal).
    [160, 71],
    [165, 74],
  ])('%d °F ≈ %d °C', (f, c) => {
    expect(toCelsiusRounded(f)).toBe(c);
  });

  it.each([
    [160, 71.1],
    [165, 73.9],
    [145, 62.8],
  ])('USDA FSIS chart: %d °F = %d °C to one decimal', (f, c) => {
    // USDA FSIS Safe Minimum Internal Temperatures chart gives these °C values beside the °F ones.
    expect(toCelsiusRounded(f, 1)).toBe(c);
  });

  it.each([325, 350, 375, 400, 425, 450, 500])('oven %d °F agrees with convert-units and js-quantities', (f) => {
    const exact = fahrenheitToCelsius(f).toNumber();
    expect(exact).toBeCloseTo(convert(f).from('F').to('C'), 9);
    expect(exact).toBeCloseTo(Qty(f, 'tempF').to('tempC').scalar, 9);
  });

  it.each([150, 180, 200, 220, 230])('oven %d °C agrees with convert-units (exact: × 9/5 + 32)', (c) => {
    expect(celsiusToFahrenheit(c).toNumber()).toBeCloseTo(convert(c).from('C').to('F'), 9);
    // × 1.8 + 32 is an exact decimal: 200 °C = 392 °F exactly.
    expect(celsiusToFahrenheit(c).equals(c * 1.8 + 32)).toBe(true);
  });

  it('rounded helpers round half up at the presentation edge', () => {
    // 350 °F = 176.666… °C → 177; 180 °C = 356 °F.
    expect(toCelsiusRounded(350)).toBe(177);
    expect(toFahrenheitRounded(180)).toBe(356);
  });

  it('differences scale by 5/9 without the 32 offset (a 25 °F convection offset ≈ 13.9 °C)', () => {
    // Reference §8: "lower the set temperature by about 25 °F (≈ 14 °C)".
    expect(fahrenheitDeltaToCelsius(25).toDecimalPlaces(1).toNumber()).toBe(13.9);
    expect(celsiusDeltaToFahrenheit(20).toNumber()).toBe(36);
  });

  it('°F → °C → °F round-trips', () => {
    fc.assert(
      fc.property(fc.integer({ min: -100, max: 1000 }), (f) => {
        expect(celsiusToFahrenheit(fahrenheitToCelsius(f)).toDecimalPlaces(10).toNumber()).toBe(f);
      }),
    );
  });
});

describe('temperatures written for a reader who reads °F or °C first', () => {
  it.each([
    // FDA Food Code §3-403.11 writes the reheating limit "74°C (165°F)"; §3-501.14 "57°C (135°F)", "21°C (70°F)",
    // "5°C (41°F)". USDA FSIS Cold Food Storage chart: freezer "0 °F (−18 °C)"; "Danger Zone": above 90 °F (32.2 °C).
    [165, '165 °F (74 °C)', '74 °C (165 °F)'],
    [135, '135 °F (57 °C)', '57 °C (135 °F)'],
    [70, '70 °F (21 °C)', '21 °C (70 °F)'],
    [41, '41 °F (5 °C)', '5 °C (41 °F)'],
    [0, '0 °F (−18 °C)', '−18 °C (0 °F)'],
    [90, '90 °F (32 °C)', '32 °C (90 °F)'],
  ])('%s °F: "%s", or "%s"', (f, fFirst, cFirst) => {
    expect(bothScales(f, 'F')).toBe(fFirst);
    expect(bothScales(f, 'C')).toBe(cFirst);
    // The °C written is convert-units' conversion rounded to whole degrees (a second reference).
    expect(cFirst.startsWith(`${Math.round(convert(f).from('F').to('C'))}`.replace('-', '−'))).toBe(true);
  });

  it('a difference or rate converts without the 32° offset (NIST SP 811: 1 °F difference = 5/9 °C)', () => {
    // 25 °F lower for convection (common practice, no source) is 13.9 °C; 15 °F/min, 8.3 °C/min; 18 °F, 10 °C.
    expect(deltaIn(25, 'C')).toBe('13.9 °C');
    expect(deltaIn(15, 'C')).toBe('8.3 °C');
    expect(deltaIn(18, 'C')).toBe('10 °C');
    expect(deltaIn(25, 'F')).toBe('25 °F');
    // js-quantities' temperature differences (degF → degC) as the second reference.
    expect(Math.round(Qty(25, 'degF').to('degC').scalar * 10) / 10).toBe(13.9);
  });

  it('turns every "N °F (M °C)" of a text round for a reader of °C, and leaves the rest', () => {
    const text = 'Cool from 135 °F (57 °C) to 70 °F (21 °C); reheat to 165 °F. Freezer 0 °F (−18 °C).';
    expect(inReadersScale(text, 'C')).toBe('Cool from 57 °C (135 °F) to 21 °C (70 °F); reheat to 165 °F. Freezer −18 °C (0 °F).');
    expect(inReadersScale(text, 'F')).toBe(text);
    // Every safety note keeps its words and numbers, only their order changes.
    for (const c of CAUTIONS) {
      const turned = inReadersScale(c.text, 'C');
      const numbers = (t: string) => (t.match(/[−-]?\d+(\.\d+)?/g) ?? []).sort();
      expect(numbers(turned)).toEqual(numbers(c.text));
      expect(turned.length).toBe(c.text.length);
      expect(turned).not.toMatch(/\d °F \(/);
    }
  });
});
