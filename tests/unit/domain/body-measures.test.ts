import { describe, expect, it } from 'vitest';
import Qty from 'js-quantities';
import { cmOf, feetInches, kgOf, perLb, poundsOf } from '@shared/domain/body-measures';

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
