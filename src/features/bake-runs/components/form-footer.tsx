import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/states';
import { StaleEditNotice } from '@/components/ui/stale-edit-notice';
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
    /** Keeps someone else's version from a refused save; false for any other error. */
    caught: (e: unknown): boolean => {
      if (!isApiError(e, 409) || e.problem.code !== 'stale_version' || !e.problem.current) return false;
      setTheirs(e.problem.current as T);
      return true;
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
  theirs: { version: number } | null;
  onReload: () => void;
  onKeep: () => void;
  rootError?: string;
  busy: boolean;
  onCancel: () => void;
}) {
  return (
    <>
      {props.theirs && <StaleEditNotice what={props.what} version={props.theirs.version} busy={props.busy} onReload={props.onReload} onKeep={props.onKeep} />}
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
