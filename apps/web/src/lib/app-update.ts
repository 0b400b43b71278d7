/// <reference types="vite-plugin-pwa/client" />
import { useSyncExternalStore } from 'react';
import { registerSW } from 'virtual:pwa-register';

/**
 * The service worker (vite-plugin-pwa, Workbox): registered once at start. A new version waits until the
 * user taps "Update" (registerType 'prompt'); it never takes over by itself.
 */
let ready = false;
let apply: ((reload?: boolean) => Promise<void>) | null = null;
const listeners = new Set<() => void>();

export function startServiceWorker(): void {
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  apply = registerSW({
    onNeedRefresh() {
      ready = true;
      listeners.forEach((l) => l());
    },
  });
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
