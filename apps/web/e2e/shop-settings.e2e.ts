import { join } from 'node:path';
import { openBrowser, PHONE, shot, SHOTS_DIR, signIn, type Browser } from './support/browser';

// The second demo shop's manager (seeds/src/staff.ts), so the first shop's receipts in other specs stay as seeded.
const MANAGER = 'priya@hollow-reed.test';

describe('shop settings on a phone: country and tax number for receipts', () => {
  let b: Browser;
  afterAll(() => b?.close());

  it('picks the country from the ISO list, takes the tax number, saves both and shows them after a reload', async () => {
    b = await openBrowser(PHONE);
    const { page } = b;
    await signIn(page, MANAGER);
    await page.goto('/settings/shop');
    const country = page.locator('input').and(page.getByLabel('Country', { exact: true }));
    await country.scrollIntoViewIfNeeded();
    await country.click();
    await country.fill('germ');
    await page.getByRole('option', { name: 'Germany (DE)' }).click();
    await page.getByLabel('Tax number').fill('DE 123 456 789');
    await page.getByRole('heading', { name: 'Receipts' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: join(SHOTS_DIR, 'settings-receipts-phone.png') }); // the 390 × 844 screen as seen
    await shot(page, 'settings-phone');
    const box = await country.boundingBox();
    expect(box?.height).toBeGreaterThanOrEqual(40); // size md: a big target at the workstand
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByText('Settings saved.').waitFor();
    await page.reload();
    await expect
      .poll(() =>
        page
          .locator('input')
          .and(page.getByLabel('Country', { exact: true }))
          .inputValue(),
      )
      .toBe('Germany (DE)');
    expect(await page.getByLabel('Tax number').inputValue()).toBe('DE 123 456 789');
  });
});
