import { openBrowser, PHONE, shot, signIn, type Browser } from './support/browser';

describe('changing your own password', () => {
  let b: Browser;
  afterEach(() => b?.close());

  it('lets the front desk reach the form from the header and shows a wrong current password under its box', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, 'desk@lantern-spoke.test');
    await b.page.getByRole('link', { name: 'Change password' }).click();
    await b.page.waitForURL(/\/account\/password$/);
    await b.page.getByLabel('Current password', { exact: true }).fill('not-the-password');
    await b.page.getByLabel('New password', { exact: true }).fill('a-long-new-password');
    await b.page.getByRole('button', { name: 'Change password' }).click();
    await b.page
      .getByText('The current password is not right.')
      .waitFor({ timeout: 10_000 })
      .finally(() => shot(b.page, 'password-wrong-current-phone'));
    // Still signed in: a wrong current password is a field problem, not a lost session.
    expect(new URL(b.page.url()).pathname).toBe('/account/password');
  });
});
