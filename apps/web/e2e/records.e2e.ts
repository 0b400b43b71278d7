import { DESKTOP, openBrowser, PHONE, signIn, type Browser } from './support/browser';
import { dayFromToday, DESK, expectedEstimate, gbp, headerStatus, jobHeader, MANAGER, pickDay, snap, TOBIN } from './support/records';

// The demo shop (seeds/src/staff.ts, Lantern & Spoke) works in GBP at £60.00/h labour and 20 % tax.
const LABOUR_RATE_MINOR = 6000;
const TAX_RATE_BP = 2000;

// What we type into the recommendation, and the estimate those inputs must give.
const PART_PRICE = '27.49';
const PART_PRICE_MINOR = 2749;
const LABOUR_HOURS = '0.75';
// 0.75 h × £60.00 = £45.00 labour; net £27.49 + £45.00 = £72.49; tax 20 % = £14.498 → £14.50
// (half a penny up); total £86.99. Computed from the inputs, not copied from the screen:
const EXPECTED = expectedEstimate(PART_PRICE_MINOR, Number(LABOUR_HOURS), LABOUR_RATE_MINOR, TAX_RATE_BP);

// Chain reading: a ruler over 24 pitches. Nominal pitch 12.7 mm (1/2 in; ISO 606, inch = 25.4 mm
// exactly per NIST SP 811), so 24 pitches = 304.8 mm and 0.8 % elongation reads
// 304.8 × 1.008 = 307.2384 mm (CHECKS.md B.1 arithmetic, pitch 12.7 mm per ISO 606/NIST SP 811).
// On an 11-speed drivetrain the replace-at limit is 0.5 % and the cassette limit 1.0 %,
// so 0.8 % must read "Replace the chain" (chain only).
const RULER_MM = '307.2384';

const OWNER = 'Perpetua Lindqvale';
const MAKER = 'Corvane';
const MODEL = 'Tallow Road 11';
const SYMPTOMS = 'It clunks when I pedal hard uphill and the chain sometimes skips on the smaller cogs. Feels like the bike is fighting me.';

describe('the workshop records: booking-in to In work', () => {
  const open: Browser[] = [];
  const browser = async (viewport: typeof PHONE) => {
    const b = await openBrowser(viewport);
    open.push(b);
    return b;
  };
  afterAll(async () => {
    for (const b of open) await b.close();
  });

  it('desk books in, Tobin measures a 0.8 % chain on a phone and prices it, desk records the approval, the job goes In work', async () => {
    // ── Desk books the bike in on a phone ─────────────────────────────────────────────
    const desk = await browser(PHONE);
    await signIn(desk.page, DESK);
    await desk.page.goto('/jobs');
    await desk.page.getByRole('link', { name: 'Book a bike in' }).click();
    await desk.page.waitForURL(/\/jobs\/new$/);

    const form = desk.page;
    await form.getByText('New customer', { exact: true }).click();
    await form.getByRole('textbox', { name: /^Name/ }).fill(OWNER);
    await form.getByText('Phone call', { exact: true }).click();
    await form.getByRole('textbox', { name: 'Phone' }).fill('020 7946 0418'); // London's drama range (Ofcom; from memory), which libphonenumber-js accepts
    await form.getByRole('textbox', { name: 'E-mail' }).fill('perpetua.lindqvale@example.test');
    await form.getByRole('textbox', { name: /^Maker/ }).fill(MAKER);
    await form.getByRole('textbox', { name: /^Model/ }).fill(MODEL);
    await form.getByRole('textbox', { name: /^Year/ }).fill('2023');
    await form.getByRole('textbox', { name: /^Drivetrain speeds/ }).fill('11');
    await form.getByRole('textbox', { name: /^Colour/ }).fill('Moss green');
    await form.getByLabel("Reported symptoms, in the owner's words").fill(SYMPTOMS);
    const promised = dayFromToday(3);
    await pickDay(form, /^Promised for/, promised.ariaLabel);
    await form.getByRole('combobox', { name: 'Mechanic' }).click();
    await form.getByRole('option', { name: 'Tobin Ashgrove' }).click();
    await snap(form, 'records-book-in-phone');
    await form.getByRole('button', { name: 'Book in' }).click();

    await desk.page.waitForURL(/\/jobs\/\d+$/);
    const jobPath = new URL(desk.page.url()).pathname;
    const numberText = await jobHeader(desk.page)
      .getByText(/^Job J-\d{4}-\d{4}$/)
      .textContent();
    const jobNumber = numberText!.replace(/^Job /, '');
    expect(jobNumber).toMatch(new RegExp(`^J-${new Date().getFullYear()}-\\d{4}$`));
    await desk.page.getByText(`Booked in as ${jobNumber}`).waitFor();
    await headerStatus(desk.page, 'Booked in');
    const header = jobHeader(desk.page);
    expect(await header.getByRole('heading').textContent()).toContain(`${MAKER} ${MODEL}`);
    expect(await header.getByRole('link', { name: OWNER }).isVisible()).toBe(true);
    expect(await header.getByRole('combobox', { name: 'Mechanic' }).inputValue()).toBe('Tobin Ashgrove');
    await desk.page.getByText(SYMPTOMS).waitFor();

    // ── Tobin, on his phone, finds the job in the list and puts it on the stand ───────
    const tobin = await browser(PHONE);
    await signIn(tobin.page, TOBIN);
    await tobin.page.goto('/jobs');
    await tobin.page.getByRole('textbox', { name: 'Search jobs' }).fill(jobNumber);
    const card = tobin.page.getByRole('link', { name: new RegExp(`^${jobNumber} `) });
    await card.waitFor();
    expect(await card.textContent()).toContain('Booked in');
    await tobin.page.getByRole('textbox', { name: 'Search jobs' }).fill('');
    await tobin.page.getByText(/^\d+ jobs?$/).waitFor();
    await snap(tobin.page, 'records-jobs-phone');
    await tobin.page.getByRole('textbox', { name: 'Search jobs' }).fill(jobNumber);
    await card.click();
    await tobin.page.waitForURL((u) => u.pathname === jobPath);
    await headerStatus(tobin.page, 'Booked in');
    await jobHeader(tobin.page).getByRole('button', { name: 'Put on the stand' }).click();
    await headerStatus(tobin.page, 'On the stand');
    expect(await jobHeader(tobin.page).getByRole('button', { name: 'Ask the owner' }).isVisible()).toBe(true);
    await snap(tobin.page, 'records-job-phone');

    // ── Inspection: the chain over 24 pitches, verdict live as he types, then saved ─────
    await tobin.page.getByRole('tab', { name: 'Inspection' }).click();
    await tobin.page.getByText(/11-speed chain limits/).waitFor();
    await tobin.page.getByRole('button', { name: /^Drivetrain/ }).click();
    const chainCard = tobin.page.locator('.mantine-Card-root').filter({ has: tobin.page.getByText('Chain wear', { exact: true }) });
    await chainCard.getByText('The verdict shows here as you type.').waitFor();
    expect(await chainCard.getByRole('textbox', { name: /^Pitches measured/ }).inputValue()).toBe('24');
    await chainCard.getByRole('textbox', { name: /^Length over those pitches/ }).fill(RULER_MM);
    const live = chainCard.getByRole('status');
    await live.getByText('0.80 % elongation').waitFor();
    expect(await live.textContent()).toContain('Replace the chain.');
    expect(await live.textContent()).not.toContain('cassette');
    expect(await live.getByText('Worn', { exact: true }).isVisible()).toBe(true);
    await chainCard.getByRole('button', { name: 'Save reading' }).click();
    const saved = chainCard.getByText(/^Chain elongation 0\.80 % \(ruler over 24 pitches; replace at 0\.5 % for 11-speed.*Replace the chain\./);
    await saved.waitFor();
    await snap(tobin.page, 'records-inspection-phone');
    // Still there after a reload: the server stored the reading and its verdict.
    await tobin.page.reload();
    await tobin.page.getByRole('button', { name: /^Drivetrain/ }).click();
    await saved.waitFor();

    // ── A finding with a priced recommendation: one part plus labour ───────────────────
    await tobin.page.getByRole('tab', { name: 'Findings & estimate' }).click();
    await tobin.page.getByRole('button', { name: 'Add finding' }).click();
    const addDialog = tobin.page.getByRole('dialog', { name: 'Add a finding' });
    await addDialog.getByLabel('What is wrong').fill('Chain stretched to 0.8 % — past the 0.5 % limit for 11-speed. It skips under load.');
    await addDialog.getByRole('button', { name: 'Add finding' }).click();
    await addDialog.waitFor({ state: 'hidden' });
    const finding = tobin.page.locator('.mantine-Card-root').filter({ hasText: 'Chain stretched to 0.8 %' });
    await finding.getByText('No recommendation priced yet.').waitFor();
    expect(await finding.getByRole('button', { name: 'Record owner’s answer' }).count()).toBe(0);
    await finding.getByRole('button', { name: 'Price it' }).click();
    const priceDialog = tobin.page.getByRole('dialog', { name: 'Recommendation and price' });
    await priceDialog.getByRole('textbox', { name: /^What we recommend/ }).fill('Replace the chain');
    await priceDialog.getByRole('button', { name: 'Add a part' }).click();
    await priceDialog.getByRole('textbox', { name: 'Part' }).fill('11-speed chain');
    await priceDialog.getByRole('textbox', { name: 'Qty' }).fill('1');
    await priceDialog.getByRole('textbox', { name: 'Unit price (GBP)' }).fill(PART_PRICE);
    await priceDialog.getByRole('textbox', { name: /^Labour hours/ }).fill(LABOUR_HOURS);
    await priceDialog.getByText(`Labour at ${gbp(LABOUR_RATE_MINOR)}/h`).waitFor();
    const previewRow = (label: string) => priceDialog.locator('.mantine-Group-root').filter({ has: tobin.page.getByText(label, { exact: true }) });
    await previewRow('Total').getByText(gbp(EXPECTED.grossMinor), { exact: true }).waitFor();
    expect(await previewRow('Net').textContent()).toContain(gbp(EXPECTED.netMinor));
    expect(await previewRow('Tax 20 %').textContent()).toContain(gbp(EXPECTED.taxMinor));
    await priceDialog.getByRole('button', { name: 'Save recommendation' }).click();
    await priceDialog.waitFor({ state: 'hidden' });
    await finding.getByText(`1 × 11-speed chain — ${gbp(PART_PRICE_MINOR)}`).waitFor();
    expect(await finding.getByText(`Labour 0.75 h — ${gbp(EXPECTED.labourMinor)}`).isVisible()).toBe(true);
    expect(await finding.getByText(/^Total /).textContent()).toBe(`Total ${gbp(EXPECTED.grossMinor)} incl. tax ${gbp(EXPECTED.taxMinor)}`);
    expect(await finding.getByText('Pending', { exact: true }).isVisible()).toBe(true);

    // ── Tobin sends it to the owner ────────────────────────────────────────────────────
    await jobHeader(tobin.page).getByRole('button', { name: 'Ask the owner' }).click();
    await headerStatus(tobin.page, 'Waiting on owner');

    // ── Desk, now at the desktop, takes the owner's approval by phone ──────────────────
    const deskPc = await browser(DESKTOP);
    await signIn(deskPc.page, DESK);
    await deskPc.page.goto('/jobs');
    await deskPc.page.getByRole('textbox', { name: 'Search jobs' }).fill(OWNER);
    const row = deskPc.page.getByRole('row').filter({ hasText: jobNumber });
    await row.waitFor();
    expect(await row.textContent()).toContain('Waiting on owner');
    await deskPc.page.getByRole('textbox', { name: 'Search jobs' }).fill('');
    await deskPc.page.getByText(/^\d+ jobs?$/).waitFor();
    await deskPc.page.getByRole('row').filter({ hasText: jobNumber }).waitFor();
    await snap(deskPc.page, 'records-jobs-desktop');
    await deskPc.page.getByRole('link', { name: jobNumber, exact: true }).click();
    await deskPc.page.waitForURL((u) => u.pathname === jobPath);
    await headerStatus(deskPc.page, 'Waiting on owner');
    await deskPc.page.getByRole('tab', { name: 'Findings & estimate' }).click();
    const deskFinding = deskPc.page.locator('.mantine-Card-root').filter({ hasText: 'Chain stretched to 0.8 %' });
    await deskFinding.getByRole('button', { name: 'Record owner’s answer' }).click();
    const decision = deskPc.page.getByRole('dialog', { name: 'Owner’s decision' });
    await decision.getByText('Approved', { exact: true }).click();
    await decision.getByText('Phone', { exact: true }).click();
    const who = decision.getByRole('textbox', { name: /^Who decided/ });
    expect(await who.inputValue()).toBe(OWNER);
    await decision.getByLabel('Note').fill('Rang at lunchtime; go ahead with the chain.');
    await decision.getByText('Recorded by Dev Okonjo-Hale.').waitFor();
    await decision.getByRole('button', { name: 'Record decision' }).click();
    await decision.waitFor({ state: 'hidden' });
    await deskFinding.getByText(`${OWNER} by phone`).waitFor();
    await deskFinding.getByText(/recorded by Dev Okonjo-Hale/).waitFor();
    const badge = deskFinding.locator('.mantine-Badge-root').filter({ hasText: /^Approved$/ });
    await badge.first().waitFor();
    const totalCard = (label: string) =>
      deskPc.page
        .locator('.mantine-Paper-root:not(.mantine-Card-root)')
        .filter({ has: deskPc.page.getByText(label, { exact: true }) })
        .filter({ hasText: /item\(s\)|tax/ });
    await totalCard('Approved').getByText(gbp(EXPECTED.grossMinor), { exact: true }).waitFor();
    expect(await totalCard('Approved').textContent()).toContain('1 item(s)');
    expect(await totalCard('Waiting').textContent()).toContain('£0.00');
    await snap(deskPc.page, 'records-estimate-desktop');

    // ── The job moves to In work ───────────────────────────────────────────────────────
    await jobHeader(deskPc.page).getByRole('button', { name: 'Start work' }).click();
    await headerStatus(deskPc.page, 'In work');
    expect(await jobHeader(deskPc.page).getByRole('button', { name: 'Send to final check' }).isVisible()).toBe(true);
    await deskPc.page.getByRole('tab', { name: 'Intake' }).click();
    await deskPc.page.getByText(SYMPTOMS).waitFor();
    await snap(deskPc.page, 'records-job-desktop');

    // Tobin's phone shows the same once he reopens the job.
    await tobin.page.reload();
    await headerStatus(tobin.page, 'In work');
  }, 120_000); // three browsers and a dozen screens: past 60 s on a loaded 2-core machine

  it('shows the demo Stratus 11 with three chain readings across visits on its bike page', async () => {
    const b = await browser(DESKTOP);
    await signIn(b.page, MANAGER);
    await b.page.goto('/customers');
    await b.page.getByRole('textbox', { name: 'Search customers' }).fill('Fernsby');
    await b.page.getByRole('link', { name: 'Ottilie Fernsby' }).click();
    await b.page.getByRole('link', { name: /Stratus 11/ }).click();
    await b.page.waitForURL(/\/bikes\/\d+$/);
    await b.page.getByRole('heading', { name: 'Wear across visits' }).waitFor();
    const chain = b.page
      .locator('.mantine-Paper-root')
      .filter({ has: b.page.getByRole('heading', { name: /Chain/ }) })
      .first();
    await chain.locator('svg .recharts-line').first().waitFor();
    const readings = (await chain.getByText(/J-\d{4}-\d{4}: /).textContent()) ?? '';
    expect(readings.match(/J-\d{4}-\d{4}: [\d.]+ %/g)).toHaveLength(3);
    await b.page
      .getByText(/Replace at 0\.5 %/)
      .first()
      .waitFor();
    expect(await b.page.getByRole('table').getByRole('row').count()).toBe(4); // header + three visits
    await snap(b.page, 'records-bike-history-desktop');
  });
});
