import { useEffect } from 'react';

/** The app's name: the whole title of a page that has not said its own yet (loading, or between pages). */
export const APP_TITLE = 'Trayline';

/**
 * The browser tab's title (also its history entry, what a screen reader announces on a new page, and the file name a
 * printed page is saved under): "Week of Dec 7 · Trayline". Put back to the app's name when the page goes, so a page
 * still loading never wears the last one's.
 */
export function useDocumentTitle(title: string) {
  useEffect(() => {
    document.title = title ? `${title} · ${APP_TITLE}` : APP_TITLE;
    return () => {
      document.title = APP_TITLE;
    };
  }, [title]);
}
