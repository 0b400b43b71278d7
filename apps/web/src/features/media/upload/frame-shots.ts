import { useSyncExternalStore } from 'react';
import { AFTER_FIRST_SCREEN_MS } from '../../../lib/after-first-screen';
import type { QueueItem } from './queue';

/** What the frame needs of the upload store (upload-store.ts). */
interface Store {
  subscribe(fn: () => void): () => void;
  snapshot(): QueueItem[];
  isOnline(): boolean;
  attach(userId: number): Promise<void>;
  detach(keep: boolean): Promise<void>;
}

/**
 * The signed-in frame's view of the upload store (header badge, sign-out, update prompt). The store's code
 * (IndexedDB, the queue, the transfers) is not part of a first screen: the frame asks for it a moment after the
 * page shows, or a page that takes shots brings it along; either way the user's kept shots are attached as soon as
 * it arrives (`storeArrived`, called by upload-store.ts), before a shot can be taken.
 */
let store: Store | null = null;
let user: number | null = null;
let fetchTimer: ReturnType<typeof setTimeout> | null = null;
const listeners = new Set<() => void>();
const notify = () => listeners.forEach((l) => l());

/** Called once by the upload store's module when it loads. */
export function storeArrived(arrived: Store): void {
  store = arrived;
  arrived.subscribe(notify);
  if (user !== null) void arrived.attach(user);
  notify();
}

const loadStore = () => import('./upload-store').then((m) => m.uploadStore as Store);

/** After sign-in (or on app open): the user's kept shots come back and carry on. */
export function attachShots(userId: number): Promise<void> {
  user = userId;
  if (store) return store.attach(userId);
  fetchTimer ??= setTimeout(() => void loadStore(), AFTER_FIRST_SCREEN_MS);
  return Promise.resolve();
}

/** At sign-out: `keep` leaves the user's waiting shots on the phone for their next sign-in; otherwise they are deleted. */
export async function detachShots(keep: boolean): Promise<void> {
  user = null;
  await (store ?? (await loadStore())).detach(keep);
}

const subscribe = (fn: () => void) => {
  listeners.add(fn);
  return () => void listeners.delete(fn);
};
const NONE: QueueItem[] = [];
const items = () => store?.snapshot() ?? NONE;

/** How many shots are not yet stored on the server (refused ones included: they wait for a person). */
export function useWaitingCount(): number {
  return useSyncExternalStore(subscribe, items).filter((i) => i.status !== 'done').length;
}

/** Whether the phone says it has a network (redrawn on the browser's online and offline events). */
export function useOnline(): boolean {
  useSyncExternalStore(subscribe, items);
  return store ? store.isOnline() : navigator.onLine;
}
