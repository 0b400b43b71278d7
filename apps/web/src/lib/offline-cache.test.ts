import 'fake-indexeddb/auto';
import { onlineManager, QueryClient } from '@tanstack/react-query';
import { cacheKeyOf, forgetCache, restoreCache, startOfflineCache } from './offline-cache';

const TOBIN = { id: 11, shopId: 1, name: 'Tobin', role: 'mechanic' };
const INES = { id: 12, shopId: 1, name: 'Ines', role: 'mechanic' };

/** A page's query client with a signed-in user and some answers, as the app holds them. */
function pageWith(user: typeof TOBIN | null) {
  const qc = new QueryClient();
  qc.setQueryData(['session'], user);
  return qc;
}

/** What IndexedDB holds: each record's key and the first parts of its query keys. */
async function kept(): Promise<{ key: string; queries: string[] }[]> {
  const db = await new Promise<IDBDatabase>((ok) => {
    const open = indexedDB.open('benchproof-cache');
    open.onsuccess = () => ok(open.result);
  });
  const tx = db.transaction('clients');
  const [keys, values] = await Promise.all(
    [tx.objectStore('clients').getAllKeys(), tx.objectStore('clients').getAll()].map(
      (r) => new Promise<unknown[]>((ok) => (r.onsuccess = () => ok(r.result as unknown[]))),
    ),
  );
  db.close();
  return (values as { clientState: { queries: { queryKey: unknown[] }[] } }[]).map((v, i) => ({
    key: String(keys[i]),
    queries: v.clientState.queries.map((q) => q.queryKey.join('/')).sort(),
  }));
}

const settle = () => new Promise((r) => setTimeout(r, 1200)); // past the 800 ms write delay

describe('the kept query cache (fake-indexeddb stands in for the browser)', () => {
  beforeEach(async () => {
    vi.stubGlobal('navigator', { onLine: true });
    await forgetCache();
  });
  afterEach(() => onlineManager.setOnline(true));

  it('keeps only the signed-in user’s shop data, one record named by user and shop, none of another user', async () => {
    const a = pageWith(TOBIN);
    await startOfflineCache(a);
    a.setQueryData(['jobs', 'detail', 7], { id: 7, symptoms: 'Rattle' });
    a.setQueryData(['jobs', 'list', {}], { items: [] });
    a.setQueryData(['owner-page', 'tok'], { job: 7 });
    a.setQueryData(['annotations', 3], { version: 2 });
    await settle();
    expect(await kept()).toEqual([{ key: cacheKeyOf(TOBIN), queries: ['jobs/detail/7', 'jobs/list/[object Object]', 'session'] }]);

    // The next user signs in on this page: the first one's record goes.
    a.clear();
    a.setQueryData(['session'], INES);
    await settle();
    expect(await kept()).toEqual([{ key: cacheKeyOf(INES), queries: ['session'] }]);
    await forgetCache();
    expect(await kept()).toEqual([]);
  });

  it('puts kept answers back only offline, marked out of date, never over a newer one, never for someone else', async () => {
    const a = pageWith(TOBIN);
    await startOfflineCache(a);
    a.setQueryData(['jobs', 'detail', 7], { id: 7, symptoms: 'Rattle' });
    a.setQueryData(['jobs', 'detail', 8], { id: 8, symptoms: 'Creak' });
    await settle();

    // Online, a new page shows what the server says, not the kept answers.
    const online = new QueryClient();
    await startOfflineCache(online);
    expect(online.getQueryData(['jobs', 'detail', 7])).toBeUndefined();

    // The connection drops: the kept answers come in, a newer one in memory stays.
    online.setQueryData(['jobs', 'detail', 8], { id: 8, symptoms: 'Fixed creak' });
    onlineManager.setOnline(false);
    await vi.waitFor(() => expect(online.getQueryData(['jobs', 'detail', 7])).toEqual({ id: 7, symptoms: 'Rattle' }));
    expect(online.getQueryData(['jobs', 'detail', 8])).toEqual({ id: 8, symptoms: 'Fixed creak' });
    expect(online.getQueryState(['jobs', 'detail', 7])?.isInvalidated).toBe(true);
    expect(online.getQueryState(['jobs', 'detail', 8])?.isInvalidated).toBe(false);

    // Another user signed in on this page, or nobody: nothing of the record comes in.
    for (const user of [INES, null]) {
      const other = pageWith(user);
      await restoreCache(other);
      expect(other.getQueryData(['jobs', 'detail', 7])).toBeUndefined();
    }
  });
});
