// The web app as a phone on a slow 4G link sees it: a cold jobs page in Chromium with CDP
// throttling (1.6 Mbps down, 150 ms RTT), and the JavaScript bytes sent for a first visit.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';
import { signIn, startDemoApi } from './bench-lib.mjs';
import { emitRow, median } from './table.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const SLOW_4G = { offline: false, latency: 150, downloadThroughput: (1.6 * 1e6) / 8, uploadThroughput: (0.75 * 1e6) / 8 };
const FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Loads `path` in a fresh browser profile; returns ms until `selector` shows and the JS bytes on the wire. */
async function coldLoad(base, path, selector, cookie) {
  const profile = mkdtempSync(join(tmpdir(), 'benchproof-chrome-'));
  const ctx = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: FLAGS,
    viewport: { width: 1366, height: 900 },
  });
  try {
    if (cookie) await ctx.addCookies(cookie.split('; ').map((c) => ({ name: c.split('=')[0], value: c.slice(c.indexOf('=') + 1), url: base })));
    const page = await ctx.newPage();
    const cdp = await ctx.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', SLOW_4G);
    const js = new Map();
    cdp.on('Network.responseReceived', (e) => e.type === 'Script' && js.set(e.requestId, 0));
    cdp.on('Network.loadingFinished', (e) => js.has(e.requestId) && js.set(e.requestId, e.encodedDataLength));
    const t0 = performance.now();
    await page.goto(`${base}${path}`);
    await page.locator(selector).first().waitFor({ state: 'visible', timeout: 60_000 });
    const ms = performance.now() - t0;
    await page.waitForLoadState('networkidle');
    return { ms, jsBytes: [...js.values()].reduce((a, b) => a + b, 0) };
  } finally {
    await ctx.close();
    rmSync(profile, { recursive: true, force: true });
  }
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-web-'));
  const api = await startDemoApi(root, dir, { WEB_DIST: join(root, 'dist/apps/web') });
  try {
    const signInPage = await coldLoad(api.base, '/sign-in', 'input[type=password]');
    const { cookie } = await signIn(api.base);
    const runs = [];
    for (let i = 0; i < 3; i++) runs.push(await coldLoad(api.base, '/jobs', 'table tbody tr', cookie));
    const ms = median(runs.map((r) => r.ms));
    const kb = (b) => b / 1024;
    emitRow({
      benchmark: 'cold jobs page, slow 4G (1.6 Mbps, 150 ms RTT): table visible',
      baseline: '—',
      product: `${ms.toFixed(0)} ms`,
      ratio: '—',
      target: '≤ 2500 ms',
      met: ms <= 2500,
    });
    emitRow({
      benchmark: 'first-load JS on the wire, sign-in page',
      baseline: '—',
      product: `${kb(signInPage.jsBytes).toFixed(0)} KB`,
      ratio: '—',
      target: '≤ 150 KB',
      met: kb(signInPage.jsBytes) <= 150,
    });
    emitRow({
      benchmark: 'first-load JS on the wire, cold jobs page',
      baseline: '—',
      product: `${kb(runs[0].jsBytes).toFixed(0)} KB`,
      ratio: '—',
      target: '≤ 150 KB',
      met: kb(runs[0].jsBytes) <= 150,
    });
  } finally {
    await api.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
