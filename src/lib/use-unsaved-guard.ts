import { useCallback, useEffect, useRef, useState } from 'react';
import { useBlocker, type BlockerFunction } from 'react-router-dom';

/** What the browser's own question says when a page holding typing is left. */
export const LEAVE_QUESTION = 'Leave this page? What you typed here is not saved.';

export interface UnsavedGuard {
  /** The form reports whether it holds unsaved typing (pass it where a form takes `onDirtyChange`). */
  onDirtyChange: (dirty: boolean) => void;
  /** Whether the page holds unsaved typing now. */
  dirty: boolean;
  /** The page's own next navigation goes unasked (it follows a save, or a delete already confirmed). */
  allow: () => void;
  /**
   * An inline form is about to close or give way to another (not a navigation): true when nothing is typed or the
   * person agrees to `question` (the typing is then dropped), false to keep it.
   */
  drop: (question: string) => boolean;
}

/**
 * Asks before typing is lost: leaving the page by a link, the back button or a navigation of the app, and closing or
 * reloading the tab (the browser's own question). A move within the page (another tab of the same path) is not asked.
 */
export function useUnsavedGuard(): UnsavedGuard {
  const [dirty, setDirty] = useState(false);
  const dirtyNow = useRef(false);
  const allowed = useRef(false);
  useEffect(() => {
    dirtyNow.current = dirty;
  }, [dirty]);
  const shouldBlock = useCallback<BlockerFunction>(({ currentLocation, nextLocation }) => {
    if (allowed.current) {
      allowed.current = false;
      return false;
    }
    return dirtyNow.current && currentLocation.pathname !== nextLocation.pathname;
  }, []);
  const blocker = useBlocker(shouldBlock);
  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    if (window.confirm(LEAVE_QUESTION)) blocker.proceed();
    else blocker.reset();
  }, [blocker]);
  useEffect(() => {
    if (!dirty) return;
    const ask = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      // Older browsers ask only when a value is set; none of them shows it.
      e.returnValue = '';
    };
    window.addEventListener('beforeunload', ask);
    return () => window.removeEventListener('beforeunload', ask);
  }, [dirty]);
  const allow = useCallback(() => {
    allowed.current = true;
  }, []);
  const drop = (question: string) => {
    if (dirty && !window.confirm(question)) return false;
    setDirty(false);
    return true;
  };
  return { onDirtyChange: setDirty, dirty, allow, drop };
}

/** One `onDirtyChange` that tells two listeners (the edit base and the guard). */
export function useTellBoth(a: (dirty: boolean) => void, b: (dirty: boolean) => void): (dirty: boolean) => void {
  return useCallback(
    (dirty: boolean) => {
      a(dirty);
      b(dirty);
    },
    [a, b],
  );
}
