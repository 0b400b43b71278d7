import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DESKTOP, openBrowser, PHONE, shot, type Browser } from './support/browser';

const root = resolve(import.meta.dirname, '../../..');
const SAMPLE = join(root, 'apps/web/public/customers-import-sample.csv');
const CODE = 'TEST-SETU-PCOD-E234';
const MANAGER = { name: 'Juno Abara', email: 'juno@northgate.test', password: 'quiet-gravel-otter-52' };

const freePort = () =>
  new Promise<number>((ok, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => ok(port));
    });
  });

/** The built app on an empty database without the demo (the suite's shared server has the demo seeded). */
async function emptyServer(): Promise<{ url: string; stop: () => void }> {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-first-run-'));
  const port = await freePort();
  const server: ChildProcess = spawn(process.execPath, [join(root, 'dist/apps/api/apps/api/src/main.js')], {
    cwd: root,
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: join(dir, 'e2e.sqlite'),
      UPLOADS_DIR: join(dir, 'uploads'),
      MAIL_CATCHER: 'false',
      SEED_DEMO: 'false',
      SETUP_CODE: CODE,
      LOG_LEVEL: 'warn',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 150; i++) {
    if (
      await fetch(`${url}/api/health`).then(
        (r) => r.ok,
        () => false,
      )
    )
      break;
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    stop: () => {
      server.kill('SIGTERM');
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

describe('a new workshop: setup, import, first job', () => {
  let server: Awaited<ReturnType<typeof emptyServer>>;
  let b: Browser | undefined;
  beforeAll(async () => {
    server = await emptyServer();
  });
  afterAll(() => server?.stop());
  afterEach(() => b?.close());

  it('sets up on a phone, imports the sample customers and books in a bike of an imported customer', async () => {
    b = await openBrowser(PHONE);
    const { page } = b;
    await page.goto(`${server.url}/jobs`);
    // No workshop yet: the sign-in page hands over to setup.
    await page.waitForURL(/\/setup$/);
    await page.getByLabel('Setup code').fill('WRONG-CODE-0000');
    await page.getByLabel('Workshop name').fill('Northgate Cycle Works');
    await page.getByLabel('Address').fill('4 Mill Lane, Easterby');
    await page.getByLabel('Your name').fill(MANAGER.name);
    await page.getByLabel('Your e-mail (you sign in with it)').fill(MANAGER.email);
    await page.getByLabel('Choose a password').fill('Northgate2026');
    await page.getByRole('button', { name: 'Open my workshop' }).click();
    await page.getByText('That setup code is not right').waitFor({ timeout: 10_000 });
    await page.getByLabel('Setup code').fill(CODE);
    await page.getByRole('button', { name: 'Open my workshop' }).click();
    await page.getByText('Choose a password that is harder to guess').waitFor({ timeout: 10_000 });
    await shot(page, 'first-run-setup-phone');
    await page.getByLabel('Choose a password').fill(MANAGER.password);
    await page.getByRole('button', { name: 'Open my workshop' }).click();

    await page.waitForURL(/\/customers\/import/, { timeout: 15_000 });
    await page.getByText('Your workshop is open').waitFor();
    await page.locator('input[type=file]').setInputFiles(SAMPLE);
    await page.getByRole('button', { name: 'Import 4 rows' }).waitFor({ timeout: 10_000 });
    expect(await page.getByTestId('import-row').count()).toBe(4);
    expect(await page.getByText('Matches Ada Quinlan').count()).toBe(1);
    await shot(page, 'first-run-import-preview-phone');
    await page.getByRole('button', { name: 'Import 4 rows' }).click();
    await page.getByText('3 new customers, 1 rows added to customers already on file, 4 bikes.').waitFor({ timeout: 10_000 });
    await shot(page, 'first-run-import-done-phone');

    await page.goto(`${server.url}/jobs/new`);
    await page.getByLabel('Find the owner').fill('Quinl');
    await page.getByText('Ada Quinlan', { exact: true }).click();
    await page.getByText('Ridgeline Gravel One').click();
    await page.getByLabel("Reported symptoms, in the owner's words").fill('Rear brake feels soft; gears skip under load.');
    await page.getByRole('button', { name: 'Book in' }).click();
    await page.waitForURL(/\/jobs\/\d+$/, { timeout: 15_000 });
    await page.getByText(/^Booked in as J-\d{4}-0001$/).waitFor({ timeout: 10_000 });
    await shot(page, 'first-run-first-job-phone');
  });

  it('shows the same screens at desktop size once the workshop exists', async () => {
    b = await openBrowser(DESKTOP);
    const { page } = b;
    await page.goto(`${server.url}/setup`);
    // Setup is gone: the page sends people to sign-in.
    await page.waitForURL(/\/sign-in$/);
    await page.getByLabel('E-mail').fill(MANAGER.email);
    await page.getByLabel('Password', { exact: true }).fill(MANAGER.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/jobs$/);
    await page.goto(`${server.url}/customers/import`);
    await page.locator('input[type=file]').setInputFiles(SAMPLE);
    await page.getByRole('button', { name: 'Import 4 rows' }).waitFor({ timeout: 10_000 });
    // Everyone is on file now: every row matches.
    expect(await page.getByText(/^Matches /).count()).toBe(4);
    await shot(page, 'first-run-import-preview-desktop');
    await page.goto(`${server.url}/settings/users`);
    await page.getByRole('button', { name: 'Invite someone' }).click();
    await page.getByLabel('Full name').fill('Sol Brennan');
    await page.getByLabel('E-mail').fill('sol@northgate.test');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByTestId('invitation').waitFor({ timeout: 10_000 });
    await shot(page, 'first-run-users-desktop');
    await page.goto(`${server.url}/jobs`);
    await page.getByText('Ada Quinlan').first().waitFor({ timeout: 10_000 });
    await shot(page, 'first-run-jobs-desktop');
  });
});
