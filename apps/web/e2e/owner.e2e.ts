import { DESKTOP, openBrowser, PHONE, signIn, type Browser } from './support/browser';
import { ownerJobByApi } from './support/owner';
import { DESK, gbp, headerStatus, snap } from './support/records';

describe('the owner page: desk sends the link, the owner decides and consents, desk sees it live', () => {
  const open: Browser[] = [];
  afterAll(async () => {
    for (const b of open) await b.close();
  });

  it('approve one item, decline the safety item with its second confirmation, grant consent; desk sees both decisions without reloading', async () => {
    const job = await ownerJobByApi();

    // ── Desk opens the job's owner-link section and creates the link ──────────────────
    const desk = await openBrowser(DESKTOP);
    open.push(desk);
    await signIn(desk.page, DESK);
    await desk.page.goto(`/jobs/${job.id}?section=owner`);
    await headerStatus(desk.page, 'Waiting on owner');
    await desk.page.getByRole('button', { name: 'Create and send link' }).click();
    const urlBox = desk.page.getByRole('textbox', { name: 'Owner link' });
    await urlBox.waitFor();
    const url = await urlBox.inputValue();
    expect(url).toMatch(/\/o\/[A-Za-z0-9_-]{43}\.[A-Za-z0-9_-]{22}$/);
    await desk.page.getByText(/^Created .* · expires /).waitFor();
    await snap(desk.page, 'owner-desk-link-created');
    const navigations: string[] = [];
    desk.page.on('framenavigated', (f) => {
      if (f === desk.page.mainFrame()) navigations.push(f.url());
    });

    // ── The owner opens it on a phone, without signing in ─────────────────────────────
    const owner = await openBrowser(PHONE);
    open.push(owner);
    await owner.page.goto(new URL(url).pathname);
    await owner.page.getByRole('heading', { name: /Pellbrook Drift 10/ }).waitFor();
    await owner.page.getByText('DO NOT RIDE', { exact: true }).waitFor();
    await owner.page.getByText('Squeal from the back brake and the chain jumps on hills.').waitFor();
    expect(await owner.page.getByRole('link', { name: 'Call' }).getAttribute('href')).toMatch(/^tel:\+?\d+$/);
    await snap(owner.page, 'owner-page-phone');

    // A shot opens full screen, sized for the screen (never the original).
    const thumb = owner.page.getByRole('button', { name: /Open photo 1 of Drivetrain/ });
    expect(await thumb.locator('img').getAttribute('src')).toMatch(/\/api\/owner\/.+\/media\/\d+\/thumb$/);
    await thumb.click();
    const big = owner.page.getByRole('dialog').locator('img');
    await big.waitFor();
    expect(await big.getAttribute('src')).toMatch(/\/media\/\d+\/screen$/);
    await owner.page.waitForFunction(() => [...document.querySelectorAll('[role=dialog] img')].some((i) => (i as HTMLImageElement).naturalWidth > 0));
    await snap(owner.page, 'owner-shot-fullscreen');
    await owner.page.getByRole('button', { name: 'Close photo' }).click();

    // Approve the chain, decline the pads: the running total counts only the approval.
    const chainCard = owner.page.getByTestId(/owner-finding-/).filter({ hasText: 'Fit a new chain' });
    const padsCard = owner.page.getByTestId(/owner-finding-/).filter({ hasText: 'Fit new rear brake pads' });
    await chainCard.getByRole('button', { name: 'Approve' }).click();
    await padsCard.getByRole('button', { name: 'Decline' }).click();
    expect(await owner.page.getByTestId('running-total').textContent()).toBe(`Approved: ${gbp(job.chainGrossMinor)}`);
    await owner.page.getByText('2 of 2 answered').waitFor();
    await snap(owner.page, 'owner-choices-phone');
    await owner.page.getByRole('button', { name: 'Confirm' }).click();

    // Declining the unsafe pads asks for a second confirmation and shows the caution.
    const dialog = owner.page.getByRole('dialog');
    await dialog.getByText(/You are declining a safety item/).waitFor();
    await dialog.getByText(/We advise you not to ride the bike until it is fixed/).waitFor();
    const send = dialog.getByRole('button', { name: 'Send answers' });
    expect(await send.isDisabled()).toBe(true);
    await snap(owner.page, 'owner-confirm-phone');
    await dialog.getByLabel('I understand, and I still decline this work').check();
    await send.click();
    await owner.page.getByRole('status').getByText('Thank you — the shop has your answers.').waitFor();
    await chainCard.getByText('You approved this').waitFor();
    await padsCard.getByText('You declined this').waitFor();

    // Consent with the full wording on the page.
    await owner.page.getByText(/Only photos of the bike and its parts are used/).waitFor();
    await owner.page.getByLabel('The make and model of my bike may be named').check();
    // The switch follows the server: it flips when the shop has stored the answer.
    await owner.page.getByRole('switch', { name: 'Marketing consent' }).click();
    await owner.page.getByText(/^Given on /).waitFor();
    await snap(owner.page, 'owner-after-answers-phone');

    // ── Desk, without reloading: status moved on, both decisions and the consent show ──
    await headerStatus(desk.page, 'In work');
    const activity = desk.page.getByTestId('owner-activity-item');
    await activity.filter({ hasText: /approved (?!item #)\S.* \(owner link\)/ }).waitFor();
    await activity.filter({ hasText: /declined (?!item #)\S.* \(owner link\)/ }).waitFor();
    await activity.filter({ hasText: 'Consent granted (owner link)' }).waitFor({ timeout: 10_000 });
    await desk.page.getByTestId('consent-state').getByText('Granted').waitFor();
    expect(navigations).toEqual([]);
    await snap(desk.page, 'owner-desk-sees-decisions');

    // The findings section shows the same decisions with their channel.
    await desk.page.getByRole('tab', { name: 'Findings & estimate' }).click();
    await desk.page
      .getByText(/Approved/)
      .first()
      .waitFor();
    await snap(desk.page, 'owner-desk-findings');
  }, 180_000);

  it('a dead link shows how to ask for a new one and nothing else', async () => {
    const b = await openBrowser(PHONE);
    open.push(b);
    await b.page.goto('/o/not-a-real-link');
    await b.page.getByRole('heading', { name: 'This link does not work' }).waitFor();
    await b.page.getByText(/ask them to send you a new link/).waitFor();
    await snap(b.page, 'owner-dead-link-phone');
  });
});
