import { useEffect, useLayoutEffect, useRef, type ReactNode } from 'react';
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
export function RevealedAlert({ children, handOn = false }: { children: ReactNode; handOn?: boolean }) {
  const ref = useRef<HTMLDivElement>(null);
  // Whether the keyboard is in the alert (a focused button turned busy loses focus to the page without leaving it).
  const holdsKeyboard = useRef(false);
  useEffect(() => {
    ref.current?.scrollIntoView?.({ block: 'center' });
    ref.current?.focus({ preventScroll: true });
  }, []);
  // `handOn`: answered (its own buttons make it go), the keyboard goes on to what follows it (the form it was about)
  // rather than to the top of the page. A layout effect's cleanup runs while the alert is still in the document.
  useLayoutEffect(() => {
    const node = ref.current;
    return () => {
      if (!handOn || !node || !holdsKeyboard.current) return;
      const active = document.activeElement;
      if (active && active !== document.body && !node.contains(active)) return;
      const place = { parent: node.parentElement, next: node.nextElementSibling };
      setTimeout(() => focusFollowing(place));
    };
  }, [handOn]);
  return (
    <div
      role="alert"
      ref={ref}
      tabIndex={-1}
      className="scroll-mt-20 outline-none"
      onFocus={() => (holdsKeyboard.current = true)}
      onBlur={(e) => {
        if (e.relatedTarget && !e.currentTarget.contains(e.relatedTarget as Node)) holdsKeyboard.current = false;
      }}
    >
      {children}
    </div>
  );
}

const FOCUSABLE = 'input:not([type="hidden"]):not([disabled]), select:not([disabled]), textarea:not([disabled]), button:not([disabled]), a[href]';

/** Puts the keyboard on the first field or button after where an alert was, unless something else took it meanwhile. */
function focusFollowing({ parent, next }: { parent: Element | null; next: Element | null }) {
  const active = document.activeElement;
  if (active && active !== document.body) return;
  // Nothing after it, or what followed it went too: the keyboard stays where the browser put it.
  if (!parent?.isConnected || !next || next.parentElement !== parent) return;
  const siblings = Array.from(parent.children);
  for (const el of siblings.slice(siblings.indexOf(next))) {
    const target = el.matches(FOCUSABLE) ? el : el.querySelector(FOCUSABLE);
    if (target instanceof HTMLElement) {
      target.focus({ preventScroll: true });
      target.scrollIntoView?.({ block: 'nearest' });
      return;
    }
  }
}

export function StaleEditNotice({ what, version, busy, onReload, onKeep }: { what: string; version: number; busy?: boolean; onReload: () => void; onKeep: () => void }) {
  return (
    <RevealedAlert handOn>
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
