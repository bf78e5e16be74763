import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError, markShown } from './problem';

/** Copies a 400's field errors onto react-hook-form fields; returns the message left for the form as a whole. */
export function applyServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>): string | null {
  markShown(err); // on the form: no toast repeats it
  if (!(err instanceof ApiError)) return err instanceof Error ? err.message : 'Something went wrong';
  // The session ended under the form: the "Signed out" dialog says so, and the form keeps no stale error after it.
  if (err.status === 401 && err.problem.code === 'unauthorized') return null;
  const fields = err.problem.errors ?? {};
  let placed = false;
  for (const [path, messages] of Object.entries(fields)) {
    const name = path.replace(/^body\./, '') as Path<T>;
    setError(name, { type: 'server', message: messages[0] });
    placed = true;
  }
  return placed ? null : err.message;
}
