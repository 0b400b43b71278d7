import jwt from 'jsonwebtoken';
import { readFileSync } from 'node:fs';
import { inject } from 'vitest';
import { DESKTOP, openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';

describe('signing in and out', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('sends a visitor without a session to sign-in and back where they were going', async () => {
    b = await openBrowser(DESKTOP);
    await b.page.goto('/settings/users');
    await b.page.waitForURL(/\/sign-in\?next=%2Fsettings%2Fusers/);
    await signIn(b.page, 'mara@lantern-spoke.test');
    await b.page.waitForURL(/\/settings\/users$/);
    await b.page.getByRole('cell', { name: /Tobin Ashgrove/ }).waitFor();
    await shot(b.page, 'users-desktop');
  });

  it('shows a clear error for a wrong password and keeps the e-mail typed', async () => {
    b = await openBrowser(PHONE);
    await b.page.goto('/sign-in');
    await b.page.getByLabel('E-mail').fill('desk@lantern-spoke.test');
    await b.page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await b.page.getByRole('button', { name: 'Sign in' }).click();
    await b.page.getByRole('alert').getByText('E-mail or password is not right.').waitFor();
    expect(await b.page.getByLabel('E-mail').inputValue()).toBe('desk@lantern-spoke.test');
    await shot(b.page, 'sign-in-error-phone');
  });

  it('signs the demo manager in, reaches the jobs page on a phone, and signs out', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, 'mara@lantern-spoke.test');
    await b.page.waitForURL(/\/jobs/);
    await b.page.getByRole('heading', { name: 'Jobs' }).first().waitFor();
    await shot(b.page, 'jobs-phone');
    await b.page.getByRole('button', { name: 'Sign out' }).click();
    await b.page.waitForURL(/\/sign-in/);
    await b.page.goto('/jobs');
    await b.page.waitForURL(/\/sign-in/);
  });

  it('sends a user whose session has expired to sign-in with a clear message', async () => {
    b = await openBrowser(DESKTOP);
    await signIn(b.page, 'mara@lantern-spoke.test');
    const secret = readFileSync(inject('sessionSecretFile'), 'utf8').trim();
    const expired = jwt.sign({ sub: 1, shop: 1, role: 'manager' }, secret, { algorithm: 'HS256', expiresIn: -60 });
    await b.context.addCookies([{ name: 'bp_session', value: expired, url: b.page.url() }]);
    await b.page.goto('/settings/users');
    await b.page.waitForURL(/\/sign-in\?.*reason=expired/);
    await b.page.getByText('Your session has expired').waitFor();
    await shot(b.page, 'session-expired-desktop');
  });

  it('hides manager pages from a mechanic, and says why when one is opened by its address', async () => {
    b = await openBrowser(DESKTOP);
    await signIn(b.page, 'tobin@lantern-spoke.test');
    expect(await b.page.getByRole('link', { name: 'Users & roles' }).count()).toBe(0);
    await b.page.goto('/settings/users');
    await b.page.waitForURL(/\/jobs\?denied=users\.manage$/);
    const notice = b.page.getByRole('alert').filter({ hasText: 'That page is not open to your role' });
    await notice.getByText(/Only manager accounts can open it, so you are on the jobs list instead\./).waitFor();
    // The tab says which page is open (the route table's title).
    expect(await b.page.title()).toBe('Jobs · BenchProof');
    await shot(b.page, 'denied-notice-desktop');
    await notice.getByRole('button', { name: 'Dismiss' }).click();
    await b.page.waitForURL(/\/jobs$/);
    // The router changes the address before React commits the render: wait for the notice to go.
    await notice.waitFor({ state: 'detached', timeout: 5000 });
    expect(await notice.count()).toBe(0);
  });
});
