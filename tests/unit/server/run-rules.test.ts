import { describe, expect, it } from 'vitest';
import { inReadersScale } from '@shared/domain/temperature';
import type { IBakeRule } from '@server/modules/bake-runs/bake-run.entity.js';
import { runRulesFrom } from '@server/modules/bake-runs/bake-run.service.js';

// Invented rules (only the two run-level values matter here); 25 °F lower for convection is common practice, no
// source; a 25 °F difference is 13.9 °C (NIST SP 811: differences × 5/9).
const rule = (crowdingPct: string, convectionDeltaF: string) => ({ crowdingPct, convectionDeltaF }) as unknown as IBakeRule;

describe('one run, several bake rules', () => {
  it('uses the largest crowding and the convection step most rules give, and says so in both scales', () => {
    const { rules, cautions } = runRulesFrom([rule('10', '25'), rule('15', '25'), rule('10', '20')]);
    expect(rules.crowdingPerExtraTray).toBe(0.15);
    expect(cautions).toEqual([
      'The bake rules in this run give different crowding rules; the plan uses the largest, +15% per extra tray.',
      'The bake rules in this run give different convection adjustments; the plan sets convection ovens 25 °F (13.9 °C) lower for every tray.',
    ]);
    // A reader of °C reads it °C first on the bake-run page.
    expect(inReadersScale(cautions[1], 'C')).toContain('convection ovens 13.9 °C (25 °F) lower');
  });

  it('says nothing when the rules agree', () => {
    expect(runRulesFrom([rule('10', '25'), rule('10', '25')]).cautions).toEqual([]);
  });
});
