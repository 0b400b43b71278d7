import type { CDPSession, Page } from 'playwright-core';
import { openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';
import { bookInJob } from './support/media';

const MECHANIC = 'tobin@lantern-spoke.test';
const OTHER_MECHANIC = 'ines@lantern-spoke.test';
const SYMPTOMS = 'Rattle inside the down tube.';

/** Chromium's own network emulation through the DevTools protocol (navigator.onLine follows it). */
const network = (cdp: CDPSession, offline: boolean) =>
  cdp.send('Network.emulateNetworkConditions', { offline, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

interface KeptRecord {
  key: string;
  /** Whether the record's text contains the needle. */
  has: boolean;
  /** The kept queries' hashes, e.g. '["jobs","detail",7]'. */
  queries: string[];
}

/** The kept cache as the page's IndexedDB holds it. */
const keptRecords = (page: Page, needle: string) =>
  page.evaluate(
    (text) =>
      new Promise<KeptRecord[]>((resolve, reject) => {
        const open = indexedDB.open('benchproof-cache');
        open.onerror = () => reject(new Error('cannot open the cache database'));
        open.onsuccess = () => {
          const db = open.result;
          if (!db.objectStoreNames.contains('clients')) return resolve([]);
          const store = db.transaction('clients').objectStore('clients');
          const keys = store.getAllKeys();
          const values = store.getAll();
          values.onsuccess = () =>
            resolve(
              keys.result.map((k, i) => {
                const value = values.result[i] as { clientState: { queries: { queryHash: string }[] } };
                return { key: k as string, has: JSON.stringify(value).includes(text), queries: value.clientState.queries.map((q) => q.queryHash) };
              }),
            );
        };
      }),
    needle,
  );

/** True once the kept record holds the job page's own answer (not just the list's row). */
const jobPageKept = async (page: Page, jobId: number) =>
  (await keptRecords(page, SYMPTOMS)).some((r) => r.has && r.queries.includes(JSON.stringify(['jobs', 'detail', jobId])));

/** Waits until the service worker controls the page, so a reload with no connection still gets the app's shell. */
async function underServiceWorker(page: Page) {
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
}

describe('last known data with no connection (phone)', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('opens a job page offline from the kept cache, marked offline with its age; another user after sign-out sees none of it', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    const jobId = await bookInJob();
    const jobCard = b.page.locator(`a[href="/jobs/${jobId}"]:visible`);
    await b.page.goto('/jobs');
    await underServiceWorker(b.page);
    await jobCard.waitFor();
    await jobCard.click();
    await b.page.getByText(SYMPTOMS).first().waitFor();
    await expect.poll(() => jobPageKept(b.page, jobId), { timeout: 10_000 }).toBe(true);
    const kept = await keptRecords(b.page, '');
    expect(kept.length).toBe(1);
    const firstKey = kept[0].key;
    expect(await b.page.getByTestId('offline-age').count()).toBe(0);

    // No connection: the reloaded job page shows its last known data and says it is offline, and how old it is.
    const cdp = await b.context.newCDPSession(b.page);
    await network(cdp, true);
    await b.page.reload();
    await b.page.getByText(SYMPTOMS).first().waitFor();
    await expect.poll(() => b.page.getByTestId('offline-age').textContent()).toMatch(/^Offline, last updated (just now|1 min ago)\./);
    await shot(b.page, 'job-offline-cached-phone');
    // The capture screen and the jobs list open too, with the same marker.
    await b.page.goto(`/jobs/${jobId}/capture`);
    await b.page.getByRole('button', { name: 'Take shots' }).waitFor();
    await b.page.getByTestId('offline-age').waitFor();
    await b.page.goto('/jobs');
    await jobCard.waitFor();
    await b.page.getByTestId('offline-age').waitFor();
    await shot(b.page, 'jobs-offline-cached-phone');

    // Back online, sign out: the kept cache leaves the phone.
    await network(cdp, false);
    await b.page.goto(`/jobs/${jobId}`);
    await b.page.getByText(SYMPTOMS).first().waitFor();
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL((u) => u.pathname.startsWith('/sign-in'));
    await expect.poll(() => keptRecords(b.page, SYMPTOMS)).toEqual([]);

    // Another mechanic of the same shop signs in on this phone; offline, the job page has nothing of the first one's.
    // (From the plain sign-in page: sent back to the job page, this user would load it online, as their own data.)
    await b.page.goto('/sign-in');
    await signIn(b.page, OTHER_MECHANIC);
    await expect.poll(async () => (await keptRecords(b.page, '')).length, { timeout: 10_000 }).toBe(1);
    const [theirs] = await keptRecords(b.page, '');
    expect(theirs.key).not.toBe(firstKey);
    expect(theirs.queries).not.toContain(JSON.stringify(['jobs', 'detail', jobId]));
    await network(cdp, true);
    await b.page.goto(`/jobs/${jobId}`);
    await b.page.getByTestId('offline-age').waitFor();
    await b.page.waitForTimeout(1000); // the page settles on what this user's own cache holds
    expect(await b.page.getByText(SYMPTOMS).count()).toBe(0);
    expect(await b.page.getByText('Tobin').count()).toBe(0);
    await shot(b.page, 'job-offline-other-user-phone');
  }, 120_000); // two sign-ins and four page loads on a shared, loaded machine
});
