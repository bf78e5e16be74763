import { useState } from 'react';

/**
 * A text box's own state that starts from `source` and follows it when it changes (a refetch, someone else's save,
 * the page's own save) while the box still shows the previous source; what was typed stays as typed.
 *
 * The third value says whether the source changed while the box held typing (someone else's change that a save of
 * the typing would replace): the page asks before it does. It clears once the source agrees with the box again.
 *
 * The state is adjusted while rendering (React's "storing information from previous renders"), so the new text
 * shows in the same render as the new source.
 */
export function useFollowedText(source: string): [string, (text: string) => void, { changedUnderTyping: boolean }] {
  const [text, setText] = useState(source);
  const [seen, setSeen] = useState(source);
  // The source the box's text was typed over.
  const [from, setFrom] = useState(source);
  if (source !== seen) {
    setSeen(source);
    if (text === seen || text === source) {
      setText(source);
      setFrom(source);
    }
  }
  return [text, setText, { changedUnderTyping: from !== source && text !== source }];
}
