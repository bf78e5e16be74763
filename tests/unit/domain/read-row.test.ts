import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { readRow, type CrossIssues } from '@shared/schemas/csv-import';

// A two-field shape with one check between them, to pin readRow's contract (no outside reference: this is the
// project's own rule for reporting a CSV row in one pass).
const fields = z.object({ whole: z.coerce.number().min(0), part: z.coerce.number().min(0), label: z.string().min(1) });
function cross(v: Partial<z.output<typeof fields>>, ctx: CrossIssues) {
  if (v.whole !== undefined && v.part !== undefined && v.part > v.whole) ctx.addIssue({ code: 'custom', path: ['part'], message: 'part over whole' });
}
const whole = fields.superRefine(cross);

describe('readRow: field problems and the checks between fields in one pass', () => {
  it('passes a good row through the whole schema', () => {
    expect(readRow(fields, whole, cross, { whole: '5', part: '2', label: 'x' })).toEqual({ success: true, data: { whole: 5, part: 2, label: 'x' } });
  });

  it('reports a check between fields once when every field reads (zod ran it already)', () => {
    const r = readRow(fields, whole, cross, { whole: '1', part: '2', label: 'x' });
    expect(r).toEqual({ success: false, issues: [{ path: ['part'], message: 'part over whole' }] });
  });

  it('runs the check between the fields that read beside another field’s problem', () => {
    const r = readRow(fields, whole, cross, { whole: '1', part: '2', label: '' });
    expect(r.success).toBe(false);
    if (!r.success) expect(r.issues.map((i) => i.path[0])).toEqual(['label', 'part']);
  });

  it('skips a check whose field did not read', () => {
    const r = readRow(fields, whole, cross, { whole: 'lots', part: '2', label: 'x' });
    expect(r.success).toBe(false);
    if (!r.success) expect(r.issues.map((i) => i.path[0])).toEqual(['whole']);
  });
});
