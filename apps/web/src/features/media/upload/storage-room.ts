/** What the browser says about this site's storage (`navigator.storage.estimate()`), in bytes. */
export interface StorageEstimateLike {
  usage?: number;
  quota?: number;
}

/**
 * Room left below which the capture screen warns: about forty 12 MP photos or a few minutes of phone video
 * (value from experience, no source). Browsers give a site a share of the free disk, so this is what the phone
 * really has left for waiting shots.
 */
export const LOW_ROOM_BYTES = 200 * 1024 * 1024;

/** Bytes still free for this site, or null when the browser does not say. */
export function roomLeft(e: StorageEstimateLike | null): number | null {
  if (!e || typeof e.quota !== 'number' || typeof e.usage !== 'number') return null;
  return Math.max(0, e.quota - e.usage);
}

/** True when the phone is close to refusing to keep more shots: under the floor, or under a tenth of the quota. */
export function roomIsLow(e: StorageEstimateLike | null): boolean {
  const left = roomLeft(e);
  if (left === null || !e?.quota) return false;
  return left < LOW_ROOM_BYTES || left < e.quota / 10;
}

/** "180 MB" for the warning. */
export const megabytes = (bytes: number): string => `${Math.floor(bytes / (1024 * 1024))} MB`;

/** The browser's estimate, or null where the Storage API is missing (plain http on some phones). */
export async function estimateStorage(): Promise<StorageEstimateLike | null> {
  if (typeof navigator === 'undefined' || !navigator.storage?.estimate) return null;
  return navigator.storage.estimate().catch(() => null);
}

/**
 * Asks once that the site's storage be kept when the phone runs short (otherwise the browser may clear waiting
 * shots under pressure). Chromium decides by itself (e.g. installed or often used); the answer is only a hint.
 */
export async function askPersistentStorage(): Promise<boolean> {
  if (typeof navigator === 'undefined' || !navigator.storage?.persist) return false;
  if (await navigator.storage.persisted().catch(() => false)) return true;
  return navigator.storage.persist().catch(() => false);
}
