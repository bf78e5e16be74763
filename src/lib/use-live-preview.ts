import { useEffect, useMemo, useRef, useState } from 'react';
import type { UseMutationResult } from '@tanstack/react-query';
import { onSessionResumed } from './api-client';
import { isApiError } from './problem';

/**
 * Sends a form's current input to a preview mutation once the typing stops (`delayMs` after the last change), and
 * only when it differs from the input last sent. `null` sends nothing (the form has nothing to work out yet).
 */
export function useLivePreview<I, O>(input: I | null, preview: UseMutationResult<O, unknown, I>, delayMs = 500): void {
  const [sent, setSent] = useState<string | null>(null);
  const key = useMemo(() => (input ? JSON.stringify(input) : null), [input]);
  useEffect(() => {
    if (!key || key === sent) return;
    const t = setTimeout(() => {
      setSent(key);
      preview.mutate(JSON.parse(key) as I);
    }, delayMs);
    return () => clearTimeout(t);
    // The mutation object changes identity on every state change; the key alone decides.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);
  // Refused because the session ended: sent again once the person signs in again in place (the input is unchanged,
  // so nothing else would send it, and the refusal would stay on screen).
  const last = useRef({ preview, sent });
  useEffect(() => {
    last.current = { preview, sent };
  });
  useEffect(
    () =>
      onSessionResumed(() => {
        const { preview: p, sent: s } = last.current;
        if (s && isApiError(p.error, 401)) p.mutate(JSON.parse(s) as I);
      }),
    [],
  );
}
