import { useEffect, useRef, type ReactNode } from 'react';
import { Button } from './button';
import { Notice } from './states';

/**
 * Someone else saved the record while this person was editing it (a 409 on a stale version): their changes stay in
 * the form, and they choose: load the other version, or save theirs over it (knowingly, never silently).
 */
/**
 * An alert about an action pressed far from where the alert shows (a Save at the foot of a long form, a card low on a
 * long page): brought into view when it appears, with the keyboard on it.
 */
export function RevealedAlert({ children }: { children: ReactNode }) {
  const ref = useRef<HTMLDivElement>(null);
  useEffect(() => {
    ref.current?.scrollIntoView?.({ block: 'center' });
    ref.current?.focus({ preventScroll: true });
  }, []);
  return (
    <div role="alert" ref={ref} tabIndex={-1} className="scroll-mt-20 outline-none">
      {children}
    </div>
  );
}

export function StaleEditNotice({ what, version, busy, onReload, onKeep }: { what: string; version: number; busy?: boolean; onReload: () => void; onKeep: () => void }) {
  return (
    <RevealedAlert>
      <Notice tone="warn" title={`Someone else saved this ${what} while you were editing`}>
        <p>Their version ({version}) is saved. Your changes are still here in the form: nothing is lost.</p>
        <div className="mt-2 flex flex-wrap gap-2">
          <Button type="button" variant="secondary" size="sm" onClick={onReload}>
            Reload their version
          </Button>
          <Button type="button" size="sm" busy={busy} onClick={onKeep}>
            Keep mine and save again
          </Button>
        </div>
      </Notice>
    </RevealedAlert>
  );
}

/** Someone else saved the record while this person's typing waits in the form (found before they press Save). */
export function NewerVersionNotice({ what, version, onReload }: { what: string; version: number; onReload: () => void }) {
  return (
    <div role="status">
      <Notice tone="info" title={`Someone else saved this ${what} (version ${version}) since you started typing`}>
        <p>Your typing stays in the form. Saving it will ask whether to keep yours or theirs.</p>
        <div className="mt-2">
          <Button type="button" variant="secondary" size="sm" onClick={onReload}>
            Drop my typing and load theirs
          </Button>
        </div>
      </Notice>
    </div>
  );
}
