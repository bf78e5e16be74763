import type { Problem } from '@shared/problem';

/** Any non-2xx answer of the API, carrying its RFC 9457 problem. */
export class ApiError extends Error {
  constructor(public readonly problem: Problem) {
    super(problem.detail ?? problem.title);
  }
  get status() {
    return this.problem.status;
  }
  get fieldErrors(): Record<string, string[]> {
    return this.problem.errors ?? {};
  }
}

export function isApiError(e: unknown, status?: number): e is ApiError {
  return e instanceof ApiError && (status === undefined || e.status === status);
}

/** Errors a page shows itself, beside the form or action that failed: the app-wide toast leaves them out. */
const shownInline = new WeakSet<object>();

/** Says this error is shown on the page (errorMessage and applyServerErrors say so themselves). */
export function markShown(e: unknown): void {
  if (e !== null && typeof e === 'object') shownInline.add(e);
}

export function wasShown(e: unknown): boolean {
  return e !== null && typeof e === 'object' && shownInline.has(e);
}

/** The error's message, for the page to show (which marks it shown: no toast repeats it). */
export function errorMessage(e: unknown): string {
  markShown(e);
  if (e instanceof ApiError) return e.message;
  if (e instanceof Error) return e.message;
  return 'Something went wrong';
}

/**
 * What a refusal says where no field shows it: the first field's reason when the answer names fields (a 400 says
 * "Invalid input" as a whole), else the message. Marks it shown.
 */
export function reasonOf(e: unknown): string {
  markShown(e);
  return (e instanceof ApiError ? Object.values(e.fieldErrors)[0]?.[0] : undefined) ?? errorMessage(e);
}
