import { z } from 'zod';
import { ambiguousCommaMessage, decimalCommaToPoint } from '../domain/units';

/**
 * A number field as people type it, before its own checks: text is trimmed and a decimal comma read as a point
 * ("0,9" → "0.9", "72,5" → "72.5"); a comma before groups of three digits ("1,500") is refused as ambiguous, naming
 * the field, never guessed. Numbers and everything else pass through to `inner` unchanged.
 */
export function typedNumber<T extends z.ZodType>(label: string, inner: T) {
  return z.preprocess((v, ctx) => {
    if (typeof v !== 'string') return v;
    const typed = v.trim();
    const s = decimalCommaToPoint(typed);
    if (s === null) {
      ctx.addIssue({ code: 'custom', message: `${label}: ${ambiguousCommaMessage(typed)}` });
      return z.NEVER;
    }
    return s;
  }, inner);
}
