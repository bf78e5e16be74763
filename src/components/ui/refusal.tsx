import { useState, type ReactNode } from 'react';
import { errorMessage } from '@/lib/problem';
import { Notice } from './states';

/**
 * Why an action on a list was refused, said under the list ("Access not removed: …"): `say(title)` is an `onError`
 * that keeps the refusal, `clear()` forgets it before the next try, `notice` shows it (null when there is none).
 */
export function useRefusal(): { say: (title: string) => (e: unknown) => void; clear: () => void; notice: ReactNode } {
  const [refusal, setRefusal] = useState<{ title: string; detail: string } | null>(null);
  return {
    say: (title) => (e) => setRefusal({ title, detail: errorMessage(e) }),
    clear: () => setRefusal(null),
    notice: refusal && (
      <Notice tone="block" title={refusal.title}>
        {refusal.detail}
      </Notice>
    ),
  };
}
