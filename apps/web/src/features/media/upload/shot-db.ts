import { type DBSchema, type IDBPDatabase, openDB } from 'idb';
import { NOT_SENT, type QueueItem } from './queue';

/** What survives a reload for one waiting shot: the bytes, where they go, their tags and the id the server dedupes on. */
export interface StoredShot {
  id: string;
  clientId: string;
  /** The signed-in user who took it; another user of the same phone never sees it. */
  userId: number;
  jobId: number;
  /** The bytes as an ArrayBuffer, which every structured clone keeps (a whole video is read into memory once to store it). */
  bytes: ArrayBuffer;
  name: string;
  type: string;
  transport: QueueItem['transport'];
  source: QueueItem['source'];
  sourceAssetId?: number;
  timecodeMs?: number;
  tags: QueueItem['tags'];
  /** Order of taking: the queue uploads in this order after a reload. */
  seq: number;
  /** Why the server refused it: it comes back refused with this reason, never sent again by itself. */
  refused?: { message: string; code: string | null };
}

interface ShotSchema extends DBSchema {
  shots: { key: string; value: StoredShot; indexes: { byUser: number } };
}

export type ShotDb = IDBPDatabase<ShotSchema>;

export const openShotDb = (name = 'benchproof-shots'): Promise<ShotDb> =>
  openDB<ShotSchema>(name, 1, {
    upgrade(db) {
      db.createObjectStore('shots', { keyPath: 'id' }).createIndex('byUser', 'userId');
    },
  });

/** Written before the first upload attempt, so a closed tab loses nothing. */
export async function saveShot(db: ShotDb, userId: number, item: QueueItem, seq: number): Promise<void> {
  const { id, clientId, jobId, file, transport, source, sourceAssetId, timecodeMs, tags } = item;
  const bytes = await file.arrayBuffer();
  await db.put('shots', { id, clientId, userId, jobId, bytes, name: file.name, type: file.type, transport, source, sourceAssetId, timecodeMs, tags, seq });
}

/** Tags changed while the shot waits: the stored copy follows, so a reload sends the new ones. */
export async function retagShot(db: ShotDb, id: string, tags: QueueItem['tags']): Promise<void> {
  const tx = db.transaction('shots', 'readwrite');
  const row = await tx.store.get(id);
  if (row) await tx.store.put({ ...row, tags });
  await tx.done;
}

/** Refused (with its reason), or `null` when the user pressed Retry: a reload shows the same state. */
export async function markRefused(db: ShotDb, id: string, refused: StoredShot['refused'] | null): Promise<void> {
  const tx = db.transaction('shots', 'readwrite');
  const row = await tx.store.get(id);
  if (row) await tx.store.put({ ...row, refused: refused ?? undefined });
  await tx.done;
}

/** Stored on the server or deleted by the user: no longer kept on the phone. */
export const forgetShot = (db: ShotDb, id: string): Promise<void> => db.delete('shots', id);

/** A kept shot as a queue item: queued again, or refused with its reason, as it was before the reload. */
const toItem = (r: StoredShot): QueueItem => ({
  id: r.id,
  clientId: r.clientId,
  jobId: r.jobId,
  file: new File([r.bytes], r.name, { type: r.type }),
  transport: r.transport,
  source: r.source,
  sourceAssetId: r.sourceAssetId,
  timecodeMs: r.timecodeMs,
  tags: r.tags,
  ...NOT_SENT,
  ...(r.refused ? { status: 'failed' as const, error: r.refused.message, errorCode: r.refused.code } : {}),
});

/** One user's kept shots, oldest first. */
export async function shotsOf(db: ShotDb, userId: number): Promise<QueueItem[]> {
  const rows = await db.getAllFromIndex('shots', 'byUser', userId);
  return rows.sort((a, b) => a.seq - b.seq).map(toItem);
}

/** Sign-out chose "delete": every waiting shot of that user goes. */
export async function forgetUser(db: ShotDb, userId: number): Promise<void> {
  const tx = db.transaction('shots', 'readwrite');
  for (const key of await tx.store.index('byUser').getAllKeys(userId)) await tx.store.delete(key);
  await tx.done;
}
