import { z } from 'zod';
import { normalizeUnit, unitKind } from '../domain/units';

/**
 * A unit as people type it ("cups", "Tbsp", "g") or one of an ingredient's piece names (large, slice…),
 * normalised to a unit code; an unreadable unit is a 400 naming the field.
 */
export const unitTextSchema = z
  .string()
  .trim()
  .min(1, { message: 'Choose a unit' })
  .max(40)
  .transform((u, ctx) => {
    try {
      const code = normalizeUnit(u);
      unitKind(code);
      return code as string;
    } catch (e) {
      ctx.addIssue({ code: 'custom', message: e instanceof Error ? e.message : 'Not a unit' });
      return z.NEVER;
    }
  });
