import { describe, expect, it } from 'vitest';
import Qty from 'js-quantities';
import { cmOf, feetInches, heightCmFromText, kgOf, perKgOfPerLb, perLb, poundsOf, weightKgFromText } from '@shared/domain/body-measures';

describe('height and weight in US measures', () => {
  it('converts with the exact inch and pound (NIST Handbook 44 App. C), checked against js-quantities', () => {
    expect(cmOf('5', '6')).toBe(String(Math.round(Qty(66, 'in').to('cm').scalar * 100) / 100)); // 167.64
    expect(cmOf('5', '6')).toBe('167.64');
    expect(cmOf('', '70')).toBe('177.8');
    expect(cmOf('', '')).toBe('');
    expect(feetInches('167.64')).toEqual({ ft: '5', in: '6' });
    expect(feetInches('168')).toEqual({ ft: '5', in: '6' }); // 66.14 in, to the half inch
    expect(kgOf('163')).toBe(String(Math.round(Qty(163, 'lb').to('kg').scalar * 100) / 100)); // 73.94
    expect(poundsOf('73.94')).toBe('163'); // back to the pound typed
    expect(kgOf('x')).toBe('');
    // 1.5 g of protein per kg of body weight is 1.5 × 0.45359237 = 0.68 g per lb.
    expect(perLb('1.5')).toBe('0.68');
    expect(perLb('')).toBe('');
  });

});

describe('heights and weights as a spreadsheet cell writes them', () => {
  // Reference: js-quantities (npm) for every conversion, beside the exact inch (2.54 cm) and pound (0.45359237 kg) of
  // NIST Handbook 44 Appendix C; the results are rounded to 0.01 as the profile stores them.
  const cmRef = (v: number, unit: string) => (Math.round(Qty(v, unit).to('cm').scalar * 100) / 100).toString();
  const kgRef = (v: number, unit: string) => (Math.round(Qty(v, unit).to('kg').scalar * 100) / 100).toString();

  it('reads centimetres, metres, feet and inches, whatever the reader’s units', () => {
    for (const units of ['us', 'metric'] as const) {
      expect(heightCmFromText('168 cm', units)).toEqual({ ok: true, value: '168' });
      expect(heightCmFromText('1.68 m', units)).toEqual({ ok: true, value: cmRef(1.68, 'm') });
      expect(heightCmFromText('1,68 m', units)).toEqual({ ok: true, value: '168' });
      expect(heightCmFromText('5 ft 6 in', units)).toEqual({ ok: true, value: cmRef(66, 'in') }); // 167.64
      expect(heightCmFromText(`5'6"`, units)).toEqual({ ok: true, value: '167.64' });
      expect(heightCmFromText(`5' 6`, units)).toEqual({ ok: true, value: '167.64' });
      expect(heightCmFromText('5ft', units)).toEqual({ ok: true, value: cmRef(5, 'ft') }); // 152.4
      expect(heightCmFromText('66 in', units)).toEqual({ ok: true, value: '167.64' });
      expect(heightCmFromText('66"', units)).toEqual({ ok: true, value: '167.64' });
      expect(heightCmFromText('5 ft 6.5 in', units)).toEqual({ ok: true, value: cmRef(66.5, 'in') }); // 168.91
    }
  });

  it('reads a number alone in the reader’s units, and refuses one that reads as feet or metres', () => {
    expect(heightCmFromText('168', 'metric')).toEqual({ ok: true, value: '168' });
    expect(heightCmFromText('67', 'us')).toEqual({ ok: true, value: cmRef(67, 'in') }); // 170.18
    expect(heightCmFromText('5.7', 'us')).toEqual({ ok: false, reason: expect.stringMatching(/would be 5.7 inches: write 5 ft 7 in/) });
    expect(heightCmFromText('1.7', 'metric')).toEqual({ ok: false, reason: expect.stringMatching(/would be 1.7 cm: write 1.7 m or 170 cm/) });
  });

  it('refuses what it cannot read, and inches of 12 or more after feet', () => {
    expect(heightCmFromText('', 'us')).toEqual({ ok: false, reason: 'Give the height' });
    expect(heightCmFromText('tall', 'us')).toEqual({ ok: false, reason: expect.stringMatching(/as a height: write 168 cm/) });
    expect(heightCmFromText('5 ft 14 in', 'us')).toEqual({ ok: false, reason: expect.stringMatching(/less than 12/) });
    expect(heightCmFromText('1,717 cm', 'metric').ok).toBe(false); // ambiguous comma
  });

  it('reads kilograms and pounds, and a number alone in the reader’s units', () => {
    expect(weightKgFromText('74 kg', 'us')).toEqual({ ok: true, value: '74' });
    expect(weightKgFromText('74,5 kg', 'us')).toEqual({ ok: true, value: '74.5' });
    expect(weightKgFromText('163 lb', 'metric')).toEqual({ ok: true, value: kgRef(163, 'lb') }); // 73.94
    expect(weightKgFromText('163 lbs', 'metric')).toEqual({ ok: true, value: '73.94' });
    expect(weightKgFromText('163 pounds', 'metric')).toEqual({ ok: true, value: '73.94' });
    expect(weightKgFromText('163', 'us')).toEqual({ ok: true, value: '73.94' });
    expect(weightKgFromText('74', 'metric')).toEqual({ ok: true, value: '74' });
    expect(weightKgFromText('heavy', 'metric')).toEqual({ ok: false, reason: expect.stringMatching(/write 74 kg or 163 lb/) });
    expect(weightKgFromText(' ', 'metric')).toEqual({ ok: false, reason: 'Give the weight' });
  });

  it('turns protein per lb of body weight into per kg (÷ 0.45359237, NIST HB 44 App. C)', () => {
    // 0.7 g per lb = 0.7 / 0.45359237 = 1.5432… g per kg; js-quantities: 1 kg = 2.20462… lb.
    expect(perKgOfPerLb('0.7')).toBe((Math.round(0.7 * Qty(1, 'kg').to('lb').scalar * 100) / 100).toString());
    expect(perKgOfPerLb('0.7')).toBe('1.54');
    expect(perKgOfPerLb('x')).toBe('');
  });
});
