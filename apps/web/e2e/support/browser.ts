import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { inject } from 'vitest';

export const SHOTS_DIR = resolve(import.meta.dirname, '../../../../.artifacts/screenshots');
export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1366, height: 900 };
export const DEMO_PASSWORD = 'bench-demo-2026';

/** Flags for Debian's Chromium on a closed network (see the machine notes), plus a fake camera. */
const ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--use-fake-device-for-media-stream',
  '--use-fake-ui-for-media-stream',
];

export interface Browser {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
}

/** `touch` makes a touch-screen context (tablet or phone with touch events). */
export async function openBrowser(viewport = DESKTOP, opts: { touch?: boolean } = {}): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), 'benchproof-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: ARGS,
    viewport,
    baseURL: inject('baseURL'),
    permissions: ['camera'],
    hasTouch: opts.touch ?? false,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signIn(page: Page, email: string): Promise<void> {
  // Already on sign-in (e.g. sent there with ?next=…): stay, so the way back is kept.
  if (!new URL(page.url()).pathname.startsWith('/sign-in')) await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

export async function shot(page: Page, name: string): Promise<string> {
  mkdirSync(SHOTS_DIR, { recursive: true });
  const path = join(SHOTS_DIR, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
