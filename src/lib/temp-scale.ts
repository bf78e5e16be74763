import { useSyncExternalStore } from 'react';
import type { TempScale } from '@shared/domain/temperature';

/**
 * The scale the signed-in person reads temperatures in first (their °F / °C preference), kept like the date words in
 * dates.ts: `followDateOrder` (auth.queries.ts) sets it whenever the person is read or replaced. °F when no one is
 * signed in. Pages with their own °F / °C switch (the bake run, bake rules) pass theirs instead.
 */
let scale: TempScale = 'F';
const listeners = new Set<() => void>();

export function setTempScale(next: TempScale): void {
  if (next === scale) return;
  scale = next;
  for (const l of listeners) l();
}

export function currentTempScale(): TempScale {
  return scale;
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** `currentTempScale`, re-rendering the component when the person changes their preference. */
export function useTempScale(): TempScale {
  return useSyncExternalStore(subscribe, currentTempScale, currentTempScale);
}
