import type { SessionUser } from '@benchproof/contracts';
import { onlineManager, type DehydratedState, type Query, type QueryClient } from '@tanstack/react-query';
import { persistQueryClientRestore, persistQueryClientSave, type PersistedClient, type Persister } from '@tanstack/react-query-persist-client';
import { openDB, type IDBPDatabase } from 'idb';

/**
 * The last known answers of the API, kept in IndexedDB so the jobs list, a job page and the capture screen open
 * with no connection. Only the signed-in user's shop data is kept (the session, the shop's settings and the jobs
 * queries), in one record named by user and shop, written only from a cache that holds that user's session; the
 * record of anyone else is deleted at the same time, and sign-out deletes it too.
 *
 * Kept answers are shown only while the phone is offline: they are put into the query cache when the app starts
 * with no connection or when the connection drops, never while online, where the server's answer always wins (a
 * kept answer older than the last change, e.g. an annotation saved just before a reload, must not come back).
 */

/** Older than this, a kept cache is dropped rather than shown (a week: the workshop's usual turnaround, from memory). */
const MAX_AGE_MS = 7 * 24 * 60 * 60_000;
/** Changed when the shape of kept answers changes, so an old record is dropped instead of misread. */
const BUSTER = 'benchproof-cache-2';
/** localStorage: which record opens offline (the last signed-in user's). */
const OWNER_KEY = 'benchproof-cache-owner';
/** Writes wait this long after the last change, so a page's burst of answers is one write. */
const SAVE_DELAY_MS = 800;
/** The queries kept, by the first part of their key: who is signed in, the shop, and the jobs (list, page, media). */
const KEPT = new Set(['session', 'shop', 'jobs']);

type CacheDb = IDBPDatabase<{ clients: { key: string; value: PersistedClient } }>;

export const cacheKeyOf = (user: Pick<SessionUser, 'id' | 'shopId'>): string => `user-${user.id}-shop-${user.shopId}`;

/** The signed-in user the dehydrated cache belongs to, if any. */
export function ownerOf(state: DehydratedState): SessionUser | null {
  const session = state.queries.find((q) => q.queryKey[0] === 'session');
  return (session?.state.data as SessionUser | null | undefined) ?? null;
}

/** Shop data with an answer: never an owner page, an annotation, a sign-in step or anything still loading. */
export const keepQuery = (q: Pick<Query, 'queryKey' | 'state'>): boolean =>
  q.state.status === 'success' && q.state.data !== undefined && KEPT.has(String(q.queryKey[0]));

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

  /** Kept under the key of the user whose session it holds, as the only record; nobody signed in: nothing kept. */
  persistClient = async (client: PersistedClient): Promise<void> => {
    const owner = ownerOf(client.clientState);
    if (!owner) return;
    const key = cacheKeyOf(owner);
    await this.run(async (db) => {
      const tx = db.transaction('clients', 'readwrite');
      await tx.store.clear();
      await tx.store.put(client, key);
      await tx.done;
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
      writeOwner(null);
      await db.clear('clients');
    });
  };
}

let store: CacheStore | null = null;
const cacheStore = (): CacheStore => (store ??= new CacheStore());

/**
 * Offline: the kept answers go into the cache where it has none of its own (a newer answer in memory stays), unless
 * someone else, or nobody, is signed in on this page. What came from the record is marked out of date, so the first
 * chance online refetches it (the session included: the server confirms it before anything is changed).
 */
export async function restoreCache(queryClient: QueryClient): Promise<void> {
  const current = queryClient.getQueryData<SessionUser | null>(['session']);
  if (current === null) return;
  const kept = await cacheStore().restoreClient();
  const owner = kept ? ownerOf(kept.clientState) : null;
  if (!owner || (current && current.id !== owner.id)) return;
  const before = new Set(
    queryClient
      .getQueryCache()
      .getAll()
      .map((q) => q.queryHash),
  );
  await persistQueryClientRestore({ queryClient, persister: cacheStore(), maxAge: MAX_AGE_MS, buster: BUSTER }).catch(() => undefined);
  await queryClient.invalidateQueries({ predicate: (q) => !before.has(q.queryHash), refetchType: 'none' });
}

/** Every change of a kept query is written (after a short pause), for whoever is signed in at the time of writing. */
function keepCache(queryClient: QueryClient): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  const save = () => {
    timer = null;
    void persistQueryClientSave({
      queryClient,
      persister: cacheStore(),
      buster: BUSTER,
      dehydrateOptions: { shouldDehydrateQuery: keepQuery, shouldDehydrateMutation: () => false },
    });
  };
  // Closed, reloaded or put away (a phone switching apps) before the pause is over: written at once.
  const flush = () => {
    if (!timer) return;
    clearTimeout(timer);
    save();
  };
  window.addEventListener('pagehide', flush);
  document.addEventListener('visibilitychange', () => document.visibilityState === 'hidden' && flush());
  return queryClient.getQueryCache().subscribe((event) => {
    if (event.type !== 'added' && event.type !== 'removed' && event.type !== 'updated') return;
    const key = event.query.queryKey as readonly unknown[];
    if (!KEPT.has(String(key[0]))) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(save, SAVE_DELAY_MS);
  });
}

/**
 * At app start: follows the browser's connection state, keeps the cache from now on, and puts the kept answers in
 * when offline (awaited before the first route loads when the app opens with no connection).
 */
export async function startOfflineCache(queryClient: QueryClient): Promise<void> {
  onlineManager.setOnline(navigator.onLine);
  keepCache(queryClient);
  onlineManager.subscribe((online) => {
    if (!online) void restoreCache(queryClient);
  });
  if (!onlineManager.isOnline()) await restoreCache(queryClient);
}

/** Sign-out: the user's kept answers are deleted from the phone. */
export const forgetCache = (): Promise<void> => cacheStore().removeClient();
