import type { z } from 'zod';

/** One problem of a CSV import: the file line (the header is line 1), the column and why. */
export interface ImportProblem {
  line: number;
  column: string;
  reason: string;
  /** `name_taken`: the name is already in the workspace (an ingredient import that updates would take the row). */
  code?: 'name_taken';
}

/** What a check between fields may report (the part of zod's refinement context it uses). */
export interface CrossIssues {
  addIssue(issue: { code: 'custom'; path: PropertyKey[]; message: string }): void;
}

/**
 * A row read field by field, then checked between fields, in one pass. zod runs an object's refinements past a
 * field's non-aborting problem (a minimum, say) but not past a problem of type (a number that is not one), so a row
 * with a bad number and a part bigger than its whole would take two rounds of fixing. Here, when a field does not
 * read, the checks between fields run on the fields that did (each check looks only at fields it has) and their
 * problems join the fields' own, each said once. A row whose fields all read is judged by `whole` alone.
 */
export function readRow<S extends z.ZodRawShape, O>(
  fields: z.ZodObject<S>,
  whole: z.ZodType<O>,
  cross: (partial: Partial<z.output<z.ZodObject<S>>>, ctx: CrossIssues) => void,
  input: Record<string, unknown>,
): { success: true; data: O } | { success: false; issues: { path: PropertyKey[]; message: string }[] } {
  const parsed = whole.safeParse(input);
  if (parsed.success) return { success: true, data: parsed.data };
  const issues = parsed.error.issues.map((i) => ({ path: i.path, message: i.message }));
  const partial: Record<string, unknown> = {};
  let allRead = true;
  for (const [key, schema] of Object.entries(fields.shape)) {
    const one = (schema as z.ZodType).safeParse(input[key]);
    if (one.success) partial[key] = one.data;
    else allRead = false;
  }
  // Every field read: the refinements already ran and their problems are in `issues`.
  if (allRead) return { success: false, issues };
  // zod runs the refinements past a field's non-aborting problem (a minimum, say) and not past a type's: a check's
  // problem may be in `issues` already.
  const known = new Set(issues.map((i) => `${i.path.join('.')}|${i.message}`));
  cross(partial as Partial<z.output<z.ZodObject<S>>>, {
    addIssue: (i) => {
      if (!known.has(`${i.path.join('.')}|${i.message}`)) issues.push({ path: i.path, message: i.message });
    },
  });
  return { success: false, issues };
}
