// Counted nouns follow CLDR's English plural rule (Unicode CLDR, plurals.xml: "one" is i = 1 and v = 0), as
// Intl.PluralRules implements it: 0 and fractions take the plural ("0 warnings", "1.5 portions").
import { describe, expect, it } from 'vitest';
import { agrees, counted } from '@/lib/words';

describe('counted nouns', () => {
  it('takes the singular for exactly one, the plural otherwise', () => {
    expect(counted(1, 'warning')).toBe('1 warning');
    expect(counted(0, 'warning')).toBe('0 warnings');
    expect(counted(2, 'warning')).toBe('2 warnings');
    expect(counted(1.5, 'portion')).toBe('1.5 portions');
  });

  it('takes an irregular plural and a verb that agrees', () => {
    expect(counted(3, 'sheet of labels', 'sheets of labels')).toBe('3 sheets of labels');
    expect(`${counted(1, 'problem')} ${agrees(1, 'blocks', 'block')} publishing`).toBe('1 problem blocks publishing');
    expect(`${counted(2, 'problem')} ${agrees(2, 'blocks', 'block')} publishing`).toBe('2 problems block publishing');
  });
});
