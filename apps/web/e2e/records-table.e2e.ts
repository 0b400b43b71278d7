import { JOB_STATUS_LABELS, JOB_TRANSITIONS, nextAction, type JobStatus } from '@benchproof/domain';
import type { Page } from 'playwright-core';
import { DESKTOP, openBrowser, PHONE, signIn, type Browser } from './support/browser';
import { bookInByApi, DESK, headerStatus, jobHeader, MANAGER, snap, TOBIN } from './support/records';

/** The moves a job page should offer for a status, per libs/domain JOB_TRANSITIONS. */
function expectedMoves(status: JobStatus) {
  const primary = nextAction(status);
  const others = JOB_TRANSITIONS.filter((t) => t.from === status && t.to !== primary?.to).map((t) => t.label);
  return { primary: primary?.label ?? null, others };
}

async function menuItems(page: Page): Promise<string[]> {
  await jobHeader(page).getByRole('button', { name: 'More moves' }).click();
  const menu = page.getByRole('menu');
  await menu.waitFor();
  const items = (await menu.getByRole('menuitem').allTextContents()).map((t) => t.trim());
  await page.keyboard.press('Escape');
  await menu.waitFor({ state: 'hidden' });
  return items;
}

describe('the jobs table and the moves a job offers', () => {
  let b: Browser;
  let other: Browser | undefined;
  afterEach(async () => {
    await b?.close();
    await other?.close();
    other = undefined;
  });

  it('filters by status and marks overdue jobs with a clock, the word Overdue and a red edge', async () => {
    b = await openBrowser(DESKTOP);
    await signIn(b.page, DESK);
    await b.page.goto('/jobs');
    const rows = b.page.locator('tbody tr');
    // The seed's Filbert was promised two days after it came in three days ago: overdue.
    // An overdue row says so in words and carries a red edge; an on-time row has neither.
    const overdue = rows.filter({ hasText: /Overdue · / }).first();
    const onTime = rows.filter({ hasNotText: 'Overdue' }).first();
    await overdue.waitFor();
    await onTime.waitFor();
    expect(await overdue.evaluate((r) => getComputedStyle(r).boxShadow)).toMatch(/inset/);
    expect(await onTime.evaluate((r) => getComputedStyle(r).boxShadow)).toBe('none');
    expect(await overdue.evaluate((r) => getComputedStyle(r).backgroundColor)).not.toBe(await onTime.evaluate((r) => getComputedStyle(r).backgroundColor));

    const statusFilter = b.page.getByRole('group', { name: 'Filter by status' });
    await statusFilter.getByText('Booked in', { exact: true }).click();
    await b.page.waitForURL(/status=booked_in/);
    // Every row is Booked in once the filtered page has arrived.
    await b.page.waitForFunction(() => [...document.querySelectorAll('tbody tr')].every((r) => r.textContent?.includes('Booked in')));
    const statuses = await rows.locator('.mantine-Badge-root').allTextContents();
    expect(statuses.length).toBeGreaterThan(0);
    expect(new Set(statuses)).toEqual(new Set(['Booked in']));
    expect(await b.page.getByText(/^\d+ jobs?$/).textContent()).toBe(`${statuses.length} job${statuses.length === 1 ? '' : 's'}`);
    await rows
      .filter({ hasText: /Overdue · / })
      .first()
      .waitFor();
    await snap(b.page, 'records-jobs-filter-desktop');

    // A second status adds its jobs; clearing brings every status back.
    await statusFilter.getByText('Waiting on owner', { exact: true }).click();
    await b.page.waitForURL(/status=booked_in(%2C|,)waiting_owner/);
    await rows.filter({ hasText: 'Waiting on owner' }).first().waitFor();
    await b.page.getByRole('button', { name: 'Clear filters' }).click();
    await b.page.waitForURL((u) => !u.searchParams.has('status'));
    await rows.filter({ hasText: 'Ready' }).first().waitFor();
  });

  it('shows the overdue mark on the phone cards too', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, DESK);
    await b.page.goto('/jobs?status=booked_in');
    const overdueCard = b.page
      .getByRole('link', { name: /^J-\d{4}-\d{4} / })
      .filter({ hasText: /Overdue · / })
      .first();
    await overdueCard.waitFor();
    const edge = await overdueCard.locator('.mantine-Card-root').evaluate((c) => getComputedStyle(c).borderLeftWidth);
    expect(edge).toBe('6px');
    await snap(b.page, 'records-jobs-filter-phone');
  });

  it('puts the first job on a phone’s first screen and keeps the other filters one tap away', async () => {
    b = await openBrowser(PHONE);
    await signIn(b.page, DESK);
    await b.page.goto('/jobs');
    const firstCard = b.page.getByRole('link', { name: /^J-\d{4}-\d{4} / }).first();
    await firstCard.waitFor();
    const box = (await firstCard.boundingBox())!;
    expect(box.y + box.height).toBeLessThanOrEqual(PHONE.height);
    const mechanic = b.page.getByRole('combobox', { name: 'Mechanic' });
    expect(await mechanic.count()).toBe(0);

    await b.page.getByRole('button', { name: 'More filters' }).click();
    await mechanic.selectOption({ label: 'Tobin Ashgrove' });
    await b.page.waitForURL(/mechanicId=\d+/);
    await b.page.getByRole('button', { name: 'Fewer filters' }).click();
    // Hidden again, the button still says a filter is on.
    await b.page.getByRole('button', { name: 'More filters (1 on)' }).waitFor();
    expect(await mechanic.count()).toBe(0);
  });

  it('offers only the moves JOB_TRANSITIONS allows from each status', async () => {
    const job = await bookInByApi('Front brake rubs on every turn of the wheel.');
    b = await openBrowser(PHONE);
    await signIn(b.page, TOBIN);
    await b.page.goto(`/jobs/${job.id}`);
    for (const [status, next] of [
      ['booked_in', 'on_stand'],
      ['on_stand', 'waiting_owner'],
      ['waiting_owner', 'in_work'],
      ['in_work', null],
    ] as const) {
      await headerStatus(b.page, JOB_STATUS_LABELS[status]);
      const want = expectedMoves(status);
      expect(await jobHeader(b.page).getByRole('button', { name: want.primary!, exact: true }).isVisible()).toBe(true);
      expect(await menuItems(b.page)).toEqual(want.others);
      // A move that is not allowed from here is not on offer (e.g. straight to Ready).
      expect(want.others).not.toContain('Mark ready');
      if (next)
        await jobHeader(b.page)
          .getByRole('button', { name: nextAction(status)!.label, exact: true })
          .click();
    }
  });

  it('says clearly when a move no longer fits because someone else moved the job first', async () => {
    const job = await bookInByApi('Saddle creaks when seated.');
    b = await openBrowser(DESKTOP);
    await signIn(b.page, DESK);
    await b.page.goto(`/jobs/${job.id}`);
    await headerStatus(b.page, 'Booked in');

    // Meanwhile the manager cancels the job from another browser.
    other = await openBrowser(DESKTOP);
    await signIn(other.page, MANAGER);
    await other.page.goto(`/jobs/${job.id}`);
    await headerStatus(other.page, 'Booked in');
    expect(await menuItems(other.page)).toEqual(['Cancel job']);
    await jobHeader(other.page).getByRole('button', { name: 'More moves' }).click();
    await other.page.getByRole('menuitem', { name: 'Cancel job' }).click();
    const confirm = other.page.getByRole('dialog', { name: 'Cancel job' });
    await confirm.getByLabel('Note (optional)').fill('Owner collected it unrepaired.');
    await confirm.getByRole('button', { name: 'Cancel job' }).click();
    await headerStatus(other.page, 'Cancelled');

    // The desk's page still offers "Put on the stand"; the server refuses Cancelled → On the stand.
    await jobHeader(b.page).getByRole('button', { name: 'Put on the stand' }).click();
    const alert = jobHeader(b.page).getByRole('alert');
    await alert.getByText('The job cannot move to that status from where it is.').waitFor();
    await headerStatus(b.page, 'Cancelled');
    expect(await jobHeader(b.page).getByRole('button', { name: 'Put on the stand' }).count()).toBe(0);
    await snap(b.page, 'records-illegal-move-desktop');
  });
});
