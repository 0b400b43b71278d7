import type { SessionUser } from '@benchproof/contracts';
import type { DehydratedState, Query, QueryClient } from '@tanstack/react-query';
import { persistQueryClientRestore, persistQueryClientSave, type PersistedClient, type Persister } from '@tanstack/react-query-persist-client';
import { openDB, type IDBPDatabase } from 'idb';

/**
 * The last known answers of the API, kept in IndexedDB so the jobs list, a job page and the capture screen open
 * with no connection. One record per signed-in user and shop: a record is written only from a cache that holds
 * that user's session, and opened only when that user was the last one signed in on this phone. Sign-out deletes it.
 */

/** Older than this, a kept cache is dropped rather than shown (a week: the workshop's usual turnaround, from memory). */
const MAX_AGE_MS = 7 * 24 * 60 * 60_000;
/** Changed when the shape of cached answers changes, so an old record is dropped instead of misread. */
const BUSTER = 'benchproof-cache-1';
/** localStorage: which record opens on the next app start (the last signed-in user's). */
const OWNER_KEY = 'benchproof-cache-owner';
/** Writes wait this long after the last change, so a page's burst of answers is one write. */
const SAVE_DELAY_MS = 800;
/** Queries never kept: sign-in steps and security settings. */
const NEVER_KEPT = new Set(['setup-status', 'invitation-preview', 'two-factor']);

type CacheDb = IDBPDatabase<{ clients: { key: string; value: PersistedClient } }>;

export const cacheKeyOf = (user: Pick<SessionUser, 'id' | 'shopId'>): string => `user-${user.id}-shop-${user.shopId}`;

/** The signed-in user the dehydrated cache belongs to, if any. */
export function ownerOf(state: DehydratedState): SessionUser | null {
  const session = state.queries.find((q) => q.queryKey[0] === 'session');
  return (session?.state.data as SessionUser | null | undefined) ?? null;
}

export const keepQuery = (q: Query): boolean => q.state.status === 'success' && !NEVER_KEPT.has(String(q.queryKey[0]));

function readOwner(): string | null {
  try {
    return localStorage.getItem(OWNER_KEY);
  } catch {
    return null;
  }
}

function writeOwner(key: string | null): void {
  try {
    if (key) localStorage.setItem(OWNER_KEY, key);
    else localStorage.removeItem(OWNER_KEY);
  } catch {
    // Storage refused (a private window): the cache simply does not open offline.
  }
}

/** IndexedDB access in one chain, so a sign-out's delete never loses to a save that started before it. */
export class CacheStore implements Persister {
  private readonly db: Promise<CacheDb | null>;
  private chain: Promise<unknown> = Promise.resolve();

  constructor(name = 'benchproof-cache') {
    this.db = openDB(name, 1, { upgrade: (db) => void db.createObjectStore('clients') }).catch(() => null) as Promise<CacheDb | null>;
  }

  private run<T>(op: (db: CacheDb) => Promise<T>): Promise<T | undefined> {
    const next = this.chain.then(async () => {
      const db = await this.db;
      return db ? op(db).catch(() => undefined) : undefined;
    });
    this.chain = next;
    return next;
  }

  /** Kept under the key of the user whose session it holds; a cache with nobody signed in is not kept. */
  persistClient = async (client: PersistedClient): Promise<void> => {
    const owner = ownerOf(client.clientState);
    if (!owner) return;
    const key = cacheKeyOf(owner);
    await this.run(async (db) => {
      await db.put('clients', client, key);
      writeOwner(key);
    });
  };

  /** The last signed-in user's record, and only if it really holds that user's session. */
  restoreClient = async (): Promise<PersistedClient | undefined> => {
    const key = readOwner();
    if (!key) return undefined;
    const client = await this.run((db) => db.get('clients', key));
    const owner = client ? ownerOf(client.clientState) : null;
    return owner && cacheKeyOf(owner) === key ? client : undefined;
  };

  removeClient = async (): Promise<void> => {
    await this.run(async (db) => {
      const key = readOwner();
      writeOwner(null);
      if (key) await db.delete('clients', key);
    });
  };
}

let store: CacheStore | null = null;
const cacheStore = (): CacheStore => (store ??= new CacheStore());

/**
 * At app start: the last signed-in user's kept answers come back (before the first route loads). The session among
 * them is marked out of date, so with a connection the server confirms it before anything is shown.
 */
export async function restoreCache(queryClient: QueryClient): Promise<void> {
  await persistQueryClientRestore({ queryClient, persister: cacheStore(), maxAge: MAX_AGE_MS, buster: BUSTER }).catch(() => undefined);
  await queryClient.invalidateQueries({ queryKey: ['session'], refetchType: 'none' });
}

/** From then on every change is written (after a short pause), for whoever is signed in at the time of writing. */
export function keepCache(queryClient: QueryClient): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  const save = () => {
    timer = null;
    void persistQueryClientSave({ queryClient, persister: cacheStore(), buster: BUSTER, dehydrateOptions: { shouldDehydrateQuery: keepQuery } });
  };
  return queryClient.getQueryCache().subscribe((event) => {
    if (event.type !== 'added' && event.type !== 'removed' && event.type !== 'updated') return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(save, SAVE_DELAY_MS);
  });
}

/** Sign-out: the user's kept answers are deleted from the phone. */
export const forgetCache = (): Promise<void> => cacheStore().removeClient();
