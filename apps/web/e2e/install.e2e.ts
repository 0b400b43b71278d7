import { openBrowser, PHONE, signIn, type Browser } from './support/browser';

const MECHANIC = 'tobin@lantern-spoke.test';

interface Manifest {
  name: string;
  display: string;
  start_url: string;
  icons: { src: string; sizes: string; purpose?: string }[];
}

describe('installable app (phone)', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('passes Chromium’s installability check, precaches the shell, opens it offline, and never caches the API or owner pages', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, MECHANIC);
    await b.page.goto('/jobs');
    // The service worker is installed and controls the page (a reload puts it in charge of this document).
    await b.page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await b.page.reload();
    await b.page.waitForFunction(() => navigator.serviceWorker.controller !== null);

    const cdp = await b.context.newCDPSession(b.page);
    const { installabilityErrors } = (await cdp.send('Page.getInstallabilityErrors')) as { installabilityErrors: { errorId: string }[] };
    expect(installabilityErrors).toEqual([]);
    const manifest = (await (await b.page.request.get('/manifest.webmanifest')).json()) as Manifest;
    expect(manifest).toMatchObject({ name: 'BenchProof', display: 'standalone' });
    expect(manifest.icons.map((i) => [i.sizes, i.purpose ?? 'any'])).toEqual([
      ['192x192', 'any'],
      ['512x512', 'any'],
      ['512x512', 'maskable'],
    ]);
    const icon = await b.page.request.get(manifest.icons[1].src);
    expect(icon.headers()['content-type']).toBe('image/png');

    // What the service worker keeps: the shell and its fonts, nothing from /api (owner pages' images included).
    const cached = await b.page.evaluate(async () => {
      const urls: string[] = [];
      for (const name of await caches.keys()) for (const req of await (await caches.open(name)).keys()) urls.push(new URL(req.url).pathname);
      return urls;
    });
    expect(cached).toContain('/index.html');
    expect(cached.some((u) => u.endsWith('.woff2'))).toBe(true);
    expect(cached.filter((u) => u.startsWith('/api/') || u.startsWith('/o/'))).toEqual([]);

    // Offline: the app's shell still opens from the cache; an owner page does not get it (it is never served by the worker).
    await cdp.send('Network.emulateNetworkConditions', { offline: true, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    await b.page.goto('/jobs');
    expect(await b.page.title()).toMatch(/BenchProof$/); // our shell (the page titles itself), not the browser's offline page
    expect(await b.page.locator('#root > *').count()).toBeGreaterThan(0);
    await b.page.goto('/o/any-link-token').catch(() => undefined);
    expect(await b.page.locator('#root').count()).toBe(0);
  });
});
