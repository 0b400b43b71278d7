/// <reference types="vite-plugin-pwa/client" />
import { useSyncExternalStore } from 'react';
import { AFTER_FIRST_SCREEN_MS } from './after-first-screen';

/**
 * The service worker (vite-plugin-pwa, Workbox): registered once, a moment after the page has loaded, so its code
 * (the register helper and workbox-window) never competes with a cold visit's first screen. A new version waits
 * until the user taps "Update" (registerType 'prompt'); it never takes over by itself.
 */
let ready = false;
let apply: ((reload?: boolean) => Promise<void>) | null = null;
const listeners = new Set<() => void>();

export function startServiceWorker(): void {
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  // An owner opening their link is a one-off visitor: the staff app is not installed on their phone.
  if (window.location.pathname.startsWith('/o/')) return;
  const register = async () => {
    const { registerSW } = await import('virtual:pwa-register');
    apply = registerSW({
      immediate: true,
      onNeedRefresh() {
        ready = true;
        listeners.forEach((l) => l());
      },
    });
  };
  const later = () => window.setTimeout(() => void register(), AFTER_FIRST_SCREEN_MS);
  if (document.readyState === 'complete') later();
  else window.addEventListener('load', later, { once: true });
}

/** True once a new version has been downloaded and waits for the user's tap. */
export const useUpdateReady = (): boolean =>
  useSyncExternalStore(
    (fn) => {
      listeners.add(fn);
      return () => void listeners.delete(fn);
    },
    () => ready,
  );

/** Activates the waiting version and reloads the page with it. */
export const applyUpdate = (): Promise<void> => apply?.(true) ?? Promise.resolve();
