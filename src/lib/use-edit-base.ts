import { useEffect, useState } from 'react';

/** A record an edit form works on: the server's optimistic-locking version comes with it. */
interface Versioned {
  version: number;
}

export interface EditBase<T extends Versioned, V> {
  /** The record the form shows: key the form by `base.version`, so it remounts only when this changes. */
  base: T;
  /** The version the form's Save sends: the one its values started from (so a save over someone else's is refused). */
  sendVersion: number;
  /** A Save refused on a stale version: what was typed, and the version saved meanwhile. */
  held: { values: V; current: T } | null;
  /** Someone else saved a newer version while the form holds unsaved typing (nothing refused yet). */
  newerElsewhere: T | null;
  /** The form reports whether it holds unsaved typing. */
  onDirtyChange: (dirty: boolean) => void;
  /** The form's values were saved: it shows the saved record. */
  saved: (record: T) => void;
  /** A Save was refused because `current` was saved meanwhile: the form keeps `values`. */
  refused: (values: V, current: T) => void;
  /** Drop what was typed and show the newest version. */
  reload: () => void;
  /**
   * This person is changing the record outside the form (archiving it…) from version `before`: until `carried`, the
   * newer version it makes is theirs, not someone else's (no notice while the page refreshes after it).
   */
  carrying: (before: number) => void;
  /** That change is done (`after`: the record it saved; null when it failed): typing that started on `before` carries over. */
  carried: (before: number, after: T | null) => void;
}

/**
 * The version an edit form's typed values started from. Records refresh under a form (a refetch when the window gets
 * focus, another tab's save): a form holding no typing follows the newest version; a form holding typing stays on the
 * version it started from, so its Save is refused (409) rather than silently saving over someone else's change, and
 * nothing typed is lost by a remount.
 */
export function useEditBase<T extends Versioned, V>(current: T): EditBase<T, V> {
  const [base, setBase] = useState(current);
  const [sendVersion, setSendVersion] = useState(current.version);
  const [dirty, setDirty] = useState(false);
  const [held, setHeld] = useState<{ values: V; current: T } | null>(null);
  const [own, setOwn] = useState<number | null>(null);
  // A form with nothing typed shows the newest version (adjusted while rendering: no flash of the old one); never an
  // older one (a refetch still under way after "Reload their version").
  if (!dirty && !held && current.version > base.version) {
    setBase(current);
    setSendVersion(current.version);
  }
  const show = (record: T) => {
    setBase(record);
    setSendVersion(record.version);
    setHeld(null);
    setDirty(false);
  };
  return {
    base,
    sendVersion,
    held,
    newerElsewhere: dirty && !held && own !== sendVersion && current.version > sendVersion ? current : null,
    onDirtyChange: setDirty,
    saved: show,
    refused: (values, theirs) => setHeld({ values, current: theirs }),
    reload: () => show(held && held.current.version > current.version ? held.current : current),
    carrying: setOwn,
    carried: (before, after) => {
      if (after && sendVersion === before) setSendVersion(after.version);
      setOwn(null);
    },
  };
}

/** Tells the page whether a react-hook-form form holds unsaved typing (pass it `formState.isDirty`). */
export function useReportDirty(dirty: boolean, report: ((dirty: boolean) => void) | undefined): void {
  useEffect(() => {
    report?.(dirty);
  }, [dirty, report]);
}
