import { useEffect, useRef } from 'react';
import { useLocation } from 'react-router-dom';

/**
 * Brings the element the address's hash names into view once the page's data is there (`ready`): the browser looks
 * for it when the page opens, before a page that reads its data has drawn it. Once per hash, so the reader's own
 * scrolling afterwards is left alone. E-mails link to a section this way (the cooling watch: "#cooling-record-title").
 */
export function useScrollToHash(ready: boolean): void {
  const { hash } = useLocation();
  const done = useRef<string | null>(null);
  useEffect(() => {
    if (!ready || !hash || done.current === hash) return;
    const el = document.getElementById(decodeURIComponent(hash.slice(1)));
    if (!el) return;
    done.current = hash;
    el.scrollIntoView({ block: 'start' });
  }, [ready, hash]);
}
