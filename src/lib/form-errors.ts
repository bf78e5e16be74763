import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError, markShown } from './problem';

/**
 * A refusal's field errors ("body." dropped from their names), split by `shown(name)`: those a field of the form
 * shows, and the reasons of the others, for the form to say as a whole (never dropped).
 */
export function splitFieldErrors(err: ApiError, shown: (name: string) => boolean): { onFields: Record<string, string[]>; unseen: string[] } {
  const onFields: Record<string, string[]> = {};
  const unseen: string[] = [];
  for (const [path, messages] of Object.entries(err.fieldErrors)) {
    const name = path.replace(/^body\./, '');
    if (shown(name)) onFields[name] = messages;
    else unseen.push(messages[0]);
  }
  return { onFields, unseen };
}

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
  const { onFields, unseen } = splitFieldErrors(err, (name) => !values || name.split('.')[0] in values);
  for (const [name, messages] of Object.entries(onFields)) setError(name as Path<T>, { type: 'server', message: messages[0] });
  if (unseen.length > 0) return unseen.join(' ');
  return Object.keys(onFields).length > 0 ? null : err.message;
}
