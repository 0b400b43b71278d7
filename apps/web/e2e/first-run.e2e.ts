import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { generateSync } from 'otplib';
import type { Page } from 'playwright-core';
import { openBrowser, PHONE, type Browser } from './support/browser';
import { emptyServer, linkFromMail, shotBoth, type EmptyServer } from './support/first-run';
import { dayFromToday, pickDay } from './support/records';

const root = resolve(import.meta.dirname, '../../..');
const CODE = 'TEST-SETU-PCOD-E234';
const MANAGER = { name: 'Juno Abara', email: 'juno@northgate.test', password: 'quiet-gravel-otter-52' };
const MECHANIC = { name: 'Sol Brennan', email: 'sol@northgate.test', password: 'spoke-lantern-harbour-19', next: 'cassette-meadow-pylon-73' };

/** The sample file plus two rows with problems: a bad e-mail, and a frame material we do not know. */
function importFile(dir: string): string {
  const sample = readFileSync(join(root, 'apps/web/public/customers-import-sample.csv'), 'utf8').trimEnd();
  const bad = [
    'Dara Voss,dara-at-example,07700 900333,,Hillcrest,Trail 5,2020,steel,10,disc,M,red,,29x2.3',
    'Eli Marsh,eli@example.test,,,Vantail,Aero,2021,cardboard,11,rim,52,blue,,25-622',
  ];
  const path = join(dir, 'customers.csv');
  writeFileSync(path, `${sample}\n${bad.join('\n')}\n`);
  return path;
}

/** The six digits an authenticator app would show for `secret` now (+ offset seconds), RFC 6238 via otplib. */
const codeFor = (secret: string, offset = 0) => generateSync({ secret, epoch: Math.floor(Date.now() / 1000) + offset });

async function fillSetup(page: Page, code: string, password: string) {
  await page.getByLabel('Setup code').fill(code);
  await page.getByLabel('Workshop name').fill('Northgate Cycle Works');
  await page.getByLabel('Address').fill('4 Mill Lane, Easterby');
  // Month-first dates for a pound shop, not the currency's day-first default: the job below must show them.
  await page.getByRole('combobox', { name: 'Dates written as' }).click();
  await page.getByRole('option', { name: /^English \(United States\)/ }).click();
  await page.getByLabel('Your name').fill(MANAGER.name);
  await page.getByLabel('Your e-mail (you sign in with it)').fill(MANAGER.email);
  await page.getByLabel('Choose a password').fill(password);
  await page.getByRole('button', { name: 'Open my workshop' }).click();
}

async function signInAs(page: Page, url: string, email: string, password: string) {
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

describe('a new workshop: setup to its first booked-in job', () => {
  let server: EmptyServer;
  let manager: Browser;
  const others: Browser[] = [];
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-first-run-files-'));
  let mails = 0;
  let secret = '';
  beforeAll(async () => {
    server = await emptyServer(CODE, { SIGNUP: 'open' });
    manager = await openBrowser(PHONE);
  });
  afterAll(async () => {
    await Promise.all([manager?.close(), ...others.map((b) => b.close())]);
    server?.stop();
    rmSync(dir, { recursive: true, force: true });
  });
  const other = async () => {
    const b = await openBrowser(PHONE);
    others.push(b);
    return b.page;
  };

  it('opens on the setup screen, refuses a wrong code and a weak password, then opens the workshop on its import screen', async () => {
    const { page } = manager;
    await page.goto(`${server.url}/jobs`);
    await page.waitForURL(/\/setup$/, { timeout: 15_000 });
    await page.getByLabel('Tax rate (%)').waitFor();
    // The phone shows the whole form without sideways scrolling, and the number steppers are 44 px targets.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    const steppers = await page.locator('.mantine-NumberInput-control').evaluateAll((els) => els.map((e) => e.getBoundingClientRect()));
    expect(steppers).toHaveLength(4);
    for (const r of steppers) expect(Math.min(r.width, r.height)).toBeGreaterThanOrEqual(44);
    await shotBoth(page, 'first-run-setup');
    await fillSetup(page, 'WRONG-CODE-0000', MANAGER.password);
    await page.getByText('That setup code is not right').waitFor({ timeout: 10_000 });
    await shotBoth(page, 'first-run-setup-wrong-code');
    // Nothing typed is lost: only the code changes.
    expect(await page.getByLabel('Workshop name').inputValue()).toBe('Northgate Cycle Works');
    await page.getByLabel('Choose a password').fill('Northgate2026');
    await page.getByLabel('Setup code').fill(CODE);
    await page.getByRole('button', { name: 'Open my workshop' }).click();
    await page.getByText('Choose a password that is harder to guess').waitFor({ timeout: 10_000 });
    await fillSetup(page, CODE, MANAGER.password);
    // The regression: the new manager lands on the import screen, signed in, not on sign-in.
    await page.waitForURL(/\/customers\/import/, { timeout: 15_000 });
    await page.getByText('Your workshop is open').waitFor({ timeout: 10_000 });
    await page.waitForTimeout(1000);
    expect(new URL(page.url()).pathname).toBe('/customers/import');
    await shotBoth(page, 'first-run-import-welcome');
    // The setup route is gone once the workshop exists, even with the right code.
    const again = await fetch(`${server.url}/api/setup`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({
        code: CODE,
        shop: { name: 'Second Shop', currency: 'GBP', units: 'metric', taxRateBp: 0, labourRateMinor: 0 },
        manager: { name: 'Someone Else', email: 'else@northgate.test', password: 'harbour-quilt-sprocket-88' },
      }),
    });
    expect(again.status).toBe(404);
  });

  it('imports the customers and bikes after a preview that shows every row’s problems', async () => {
    const { page } = manager;
    await page.locator('input[type=file]').setInputFiles(importFile(dir));
    await page.getByTestId('import-row').nth(5).waitFor({ timeout: 15_000 });
    await shotBoth(page, 'first-run-import-preview');
    expect(await page.getByTestId('import-row').count()).toBe(6);
    expect(await page.locator('[data-testid=import-row]:not([data-problems="0"])').count()).toBe(2);
    expect(await page.getByText('Matches Ada Quinlan').count()).toBe(1);
    await page.getByRole('button', { name: 'Import 4 rows' }).click();
    await page.getByText(/3 new customers/).waitFor({ timeout: 10_000 });
    await shotBoth(page, 'first-run-import-done');
  });

  it('invites a mechanic, who accepts from the e-mail and chooses their own password', async () => {
    const { page } = manager;
    await page.goto(`${server.url}/settings/users`);
    await page.getByRole('button', { name: 'Invite someone' }).click();
    await page.getByLabel('Full name').fill(MECHANIC.name);
    await page.getByLabel('E-mail').fill(MECHANIC.email);
    await shotBoth(page, 'first-run-invite-form');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByTestId('invitation').waitFor({ timeout: 10_000 });
    await shotBoth(page, 'first-run-users-invited');
    const { link } = await linkFromMail(server.mail, MECHANIC.email, '/join', ++mails);

    const mech = await other();
    await mech.goto(link);
    await mech.getByText(`Join Northgate Cycle Works`).waitFor({ timeout: 10_000 });
    await shotBoth(mech, 'first-run-join');
    await mech.getByLabel('Choose a password').fill(MECHANIC.password);
    await mech.getByRole('button', { name: 'Save and sign in' }).click();
    await mech.waitForURL(/\/jobs$/, { timeout: 15_000 });
    const session = (await (await mech.request.get(`${server.url}/api/auth/session`)).json()) as { user: { name: string; role: string } };
    expect(session.user).toMatchObject({ name: MECHANIC.name, role: 'mechanic' });
    // The link worked once.
    const reused = await other();
    await reused.goto(link);
    await reused.getByText('This invitation cannot be used').waitFor({ timeout: 10_000 });
  });

  it('recovers a forgotten password by e-mail, which signs the mechanic’s other devices out', async () => {
    const signedIn = others[0].page;
    const page = await other();
    await page.goto(`${server.url}/sign-in`);
    await page.getByRole('link', { name: 'New workshop? Sign it up' }).waitFor();
    await shotBoth(page, 'first-run-sign-in');
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByLabel('Your e-mail').fill(MECHANIC.email);
    await page.getByRole('button', { name: /send/i }).click();
    await page.getByRole('status').waitFor({ timeout: 10_000 });
    await shotBoth(page, 'first-run-forgot-sent');
    const { link } = await linkFromMail(server.mail, MECHANIC.email, '/reset-password', ++mails);
    await page.goto(link);
    await shotBoth(page, 'first-run-reset');
    await page.getByLabel('Choose a password').fill(MECHANIC.next);
    await page.getByRole('button', { name: 'Save and sign in' }).click();
    await page.waitForURL(/\/jobs$/, { timeout: 15_000 });
    // The device signed in with the old password is signed out.
    await signedIn.reload();
    await signedIn.waitForURL(/\/sign-in/, { timeout: 15_000 });
    await signInAs(signedIn, server.url, MECHANIC.email, MECHANIC.password);
    await signedIn.getByRole('alert').waitFor({ timeout: 10_000 });
    await signInAs(signedIn, server.url, MECHANIC.email, MECHANIC.next);
    await signedIn.waitForURL(/\/jobs$/, { timeout: 15_000 });
  });

  it('turns on two-step sign-in for the manager, whose next sign-in asks for the code', async () => {
    const { page } = manager;
    await page.goto(`${server.url}/account/password`);
    await page.getByRole('button', { name: 'Set up two-step sign-in' }).click();
    secret = (await page.getByTestId('totp-secret').textContent({ timeout: 10_000 }))?.trim() ?? '';
    expect(secret).toMatch(/^[A-Z2-7]{16,}$/);
    await shotBoth(page, 'first-run-two-step-setup');
    await page.getByLabel('Code from your authenticator app').fill('000000');
    await page.getByRole('button', { name: 'Turn on' }).click();
    await page.getByText('That code is not right').waitFor({ timeout: 10_000 });
    await page.getByLabel('Code from your authenticator app').fill(codeFor(secret));
    await page.getByRole('button', { name: 'Turn on' }).click();
    await page.getByTestId('recovery-codes').waitFor({ timeout: 10_000 });
    expect(await page.getByTestId('recovery-codes').locator('> *').count()).toBe(10);
    await shotBoth(page, 'first-run-two-step-recovery');
    await page.getByRole('button', { name: 'I have kept them safe' }).click();
    // Signed out (the phone keeps the sign-out button in the menu): the next sign-in starts afresh.
    await manager.context.clearCookies();
    await signInAs(page, server.url, MANAGER.email, MANAGER.password);
    await page.getByLabel('Code from your authenticator app').waitFor({ timeout: 10_000 });
    await shotBoth(page, 'first-run-two-step-code');
    // The next 30-second step: the code used to turn it on is spent (RFC 6238 §5.2 allows one step of drift).
    await page.getByLabel('Code from your authenticator app').fill(codeFor(secret, 30));
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/jobs$/, { timeout: 15_000 });
  });

  it('books in the first job for an imported customer’s bike', async () => {
    const { page } = manager;
    await page.goto(`${server.url}/jobs`);
    await shotBoth(page, 'first-run-jobs-empty');
    await page.goto(`${server.url}/jobs/new`);
    await page.getByLabel('Find the owner').fill('Quinl');
    await page.getByText('Ada Quinlan', { exact: true }).click();
    await page.getByText('Ridgeline Gravel One').click();
    await page.getByLabel("Reported symptoms, in the owner's words").fill('Rear brake feels soft; gears skip under load.');
    const promised = dayFromToday(3);
    await pickDay(page, /^Promised for/, promised.ariaLabel);
    // The pound-sterling workshop chose US dates at setup: month first ("Dec 8, 2026"), not the en-GB "8 Dec 2026".
    const d = promised.date;
    const monthFirst = `${d.toLocaleString('en-US', { month: 'short' })} ${d.getDate()}, ${d.getFullYear()}`;
    expect(await page.getByRole('button', { name: /^Promised for/ }).textContent()).toContain(monthFirst);
    await shotBoth(page, 'first-run-book-in');
    await page.getByRole('button', { name: 'Book in' }).click();
    await page.waitForURL(/\/jobs\/\d+$/, { timeout: 15_000 });
    await page.getByText(/^Booked in as J-\d{4}-0001$/).waitFor({ timeout: 10_000 });
    await page.getByText(monthFirst).first().waitFor({ timeout: 10_000 });
    await shotBoth(page, 'first-run-first-job');
    await page.goto(`${server.url}/jobs`);
    await page.getByRole('link', { name: /J-\d{4}-0001/ }).waitFor({ timeout: 10_000 });
    await shotBoth(page, 'first-run-jobs');
  });
});
