import { useSyncExternalStore } from 'react';
import { onlineManager } from '@tanstack/react-query';

/**
 * Whether this device has a network, as TanStack Query sees it (reads wait while it has none, and go on when it
 * comes back; so do saves). Query starts out assuming one and then follows the browser's online/offline events:
 * a page opened without a network must start from what the browser knows.
 */
export function followNetwork(): void {
  if (typeof navigator !== 'undefined') onlineManager.setOnline(navigator.onLine);
}

export function isOnline(): boolean {
  return onlineManager.isOnline();
}

const subscribe = (listener: () => void) => onlineManager.subscribe(listener);

/** The device's network state, for words such as "You are offline". */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribe, isOnline, () => true);
}

/**
 * Registers the service worker (src/public/sw.js), which keeps the page and the build's files so that Trayline opens
 * without a network. Built client only: the development server's files change with every edit.
 */
export function keepAppForOffline(): void {
  if (!import.meta.env.PROD || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  const register = () => void navigator.serviceWorker.register('/sw.js').catch(() => undefined);
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}
