import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError, markShown } from './problem';

/**
 * Copies a 400's field errors onto react-hook-form fields; returns the message left for the form as a whole.
 * `values` (the form's values, as sent) tells which fields the form has: an error for a field it does not show (a
 * reset link's token, say) is returned for the form to show, never set on a field nobody sees.
 */
export function applyServerErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, values?: object): string | null {
  markShown(err); // on the form: no toast repeats it
  if (!(err instanceof ApiError)) return err instanceof Error ? err.message : 'Something went wrong';
  // The session ended under the form: the "Signed out" dialog says so, and the form keeps no stale error after it.
  if (err.status === 401 && err.problem.code === 'unauthorized') return null;
  const fields = err.problem.errors ?? {};
  let placed = false;
  const unseen: string[] = [];
  for (const [path, messages] of Object.entries(fields)) {
    const name = path.replace(/^body\./, '') as Path<T>;
    if (values && !(name.split('.')[0] in values)) {
      unseen.push(messages[0]);
      continue;
    }
    setError(name, { type: 'server', message: messages[0] });
    placed = true;
  }
  if (unseen.length > 0) return unseen.join(' ');
  return placed ? null : err.message;
}
