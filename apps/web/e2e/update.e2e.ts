import { spawn, type ChildProcess } from 'node:child_process';
import { appendFileSync, cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import type { Page } from 'playwright-core';
import { inject } from 'vitest';
import { openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';
import { bookInJob } from './support/media';
import { freePort, waitForHealth } from './support/server';

const root = resolve(import.meta.dirname, '../../..');
const MECHANIC = 'tobin@lantern-spoke.test';

/**
 * The built app served from a copy of its web files by a second API process on the suite's database, so the test can
 * change the service worker as a new release would.
 */
async function releaseServer(): Promise<{ url: string; web: string; stop: () => void }> {
  const web = mkdtempSync(join(tmpdir(), 'benchproof-release-'));
  cpSync(join(root, 'dist/apps/web'), web, { recursive: true });
  const data = dirname(inject('sessionSecretFile'));
  const port = await freePort();
  const server: ChildProcess = spawn(process.execPath, [join(root, 'dist/apps/api/apps/api/src/main.js')], {
    cwd: root,
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: join(data, 'e2e.sqlite'),
      UPLOADS_DIR: join(data, 'uploads'),
      WEB_DIST: web,
      MAIL_CATCHER: 'false',
      LOGIN_THROTTLE_LIMIT: '1000',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  const stop = () => {
    server.kill('SIGTERM');
    rmSync(web, { recursive: true, force: true });
  };
  await waitForHealth(url).catch((e: unknown) => {
    stop();
    throw e;
  });
  return { url, web, stop };
}

/** The next release's worker: the same precache, plus an answer to "which version?" so the test can tell it apart. */
const NEXT_RELEASE = `\n;self.addEventListener('message', (e) => { if (e.data === 'which-release') e.ports[0].postMessage('next'); });\n`;

/** Asks the worker in charge of the page which release it is ('next', or nothing from the first one). */
const controllerRelease = (page: Page) =>
  page.evaluate(
    () =>
      new Promise<string>((ok) => {
        const channel = new MessageChannel();
        channel.port1.onmessage = (e) => ok(String(e.data));
        navigator.serviceWorker.controller?.postMessage('which-release', [channel.port2]);
        setTimeout(() => ok('first'), 2000);
      }),
  );

const hasWaitingWorker = (page: Page) => page.evaluate(async () => Boolean((await navigator.serviceWorker.getRegistration())?.waiting));

describe('a new release of the app (phone)', () => {
  let b: Browser;
  let release: Awaited<ReturnType<typeof releaseServer>>;
  afterEach(async () => {
    await b?.close();
    release?.stop();
  });

  it('announces itself off the capture screens and updates only on the user’s tap', async () => {
    release = await releaseServer();
    b = await openBrowser(PHONE);
    const { page } = b;
    await page.goto(`${release.url}/sign-in`);
    await signIn(page, MECHANIC);
    const jobId = await bookInJob();
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
    expect(await controllerRelease(page)).toBe('first');

    // The next release is published while the mechanic is capturing: it downloads and waits, without a word there.
    appendFileSync(join(release.web, 'sw.js'), NEXT_RELEASE);
    await page.goto(`${release.url}/jobs/${jobId}/capture`);
    await page.getByRole('button', { name: 'Take shots' }).waitFor();
    await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
    await expect.poll(() => hasWaitingWorker(page), { timeout: 30_000 }).toBe(true);
    await page.waitForTimeout(1000);
    expect(await page.getByTestId('update-prompt').count()).toBe(0);
    expect(await controllerRelease(page)).toBe('first');

    // Off the capture screen it says so; nothing changes until the tap.
    await page.goto(`${release.url}/jobs`);
    const prompt = page.getByTestId('update-prompt');
    await prompt.waitFor({ timeout: 30_000 });
    await shot(page, 'update-prompt-phone');
    await page.waitForTimeout(1000);
    expect(await controllerRelease(page)).toBe('first');
    await Promise.all([page.waitForEvent('load', { timeout: 30_000 }), prompt.getByRole('button', { name: 'Update' }).click()]);
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
    expect(await controllerRelease(page)).toBe('next');
    expect(await hasWaitingWorker(page)).toBe(false);
    await page.getByRole('heading').first().waitFor();
    expect(await page.getByTestId('update-prompt').count()).toBe(0);
  }, 180_000); // a second server and three service-worker installs on a shared, loaded machine
});
