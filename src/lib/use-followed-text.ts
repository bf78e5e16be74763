import { useState } from 'react';

/**
 * A text box's own state that starts from `source` and follows it when it changes (a refetch, someone else's save,
 * the page's own save) while the box still shows the previous source; what was typed stays as typed.
 *
 * The state is adjusted while rendering (React's "storing information from previous renders"), so the new text
 * shows in the same render as the new source.
 */
export function useFollowedText(source: string): [string, (text: string) => void] {
  const [text, setText] = useState(source);
  const [seen, setSeen] = useState(source);
  if (source !== seen) {
    setSeen(source);
    if (text === seen) setText(source);
  }
  return [text, setText];
}
