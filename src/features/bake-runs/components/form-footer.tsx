import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { StaleEditNotice } from '@/components/ui/stale-edit-notice';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { applyServerErrors } from '@/lib/form-errors';
import { isApiError } from '@/lib/problem';

/**
 * The oven or bake rule a form started from, pinned (a refreshed list under the open form changes nothing in it), and
 * the version someone else saved meanwhile when a save is refused (409): the typing stays until the coach reloads
 * theirs (`reset` puts it in the form) or saves the form over it.
 */
export function usePinnedRecord<T extends { version: number }>(record: T | null, reset: (theirs: T) => void) {
  const [base, setBase] = useState(record);
  const [theirs, setTheirs] = useState<T | null>(null);
  return {
    base,
    theirs,
    /** A save's error: someone else's version kept from a refused save, any other on its fields or the whole form. */
    failed: <F extends FieldValues>(e: unknown, setError: UseFormSetError<F>) => {
      if (isApiError(e, 409) && e.problem.code === 'stale_version' && e.problem.current) {
        setTheirs(e.problem.current as T);
        return;
      }
      const rest = applyServerErrors(e, setError);
      if (rest) setError('root' as Path<F>, { message: rest });
    },
    reload: () => {
      if (!theirs) return;
      setBase(theirs);
      setTheirs(null);
      reset(theirs);
    },
  };
}

/** The end of the bake-rule and oven forms: a refused stale save, the form's own error, save and cancel. */
export function FormFooter(props: {
  saveLabel: string;
  what: string;
  pinned: { theirs: { version: number } | null; reload: () => void };
  /** Saves the form again on `version` (theirs, knowingly). */
  saveOn: (version: number) => void;
  rootError?: string;
  busy: boolean;
  onCancel: () => void;
}) {
  const theirs = props.pinned.theirs;
  return (
    <>
      {theirs && <StaleEditNotice what={props.what} version={theirs.version} busy={props.busy} onReload={props.pinned.reload} onKeep={() => props.saveOn(theirs.version)} />}
      {props.rootError && <Notice tone="block">{props.rootError}</Notice>}
      <div className="flex gap-2">
        <Button type="submit" busy={props.busy}>
          {props.saveLabel}
        </Button>
        <Button type="button" variant="ghost" onClick={props.onCancel}>
          Cancel
        </Button>
      </div>
    </>
  );
}
