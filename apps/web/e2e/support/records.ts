import { request, type Locator, type Page } from 'playwright-core';
import { inject } from 'vitest';
import { DEMO_PASSWORD, shot } from './browser';

export const DESK = 'desk@lantern-spoke.test';
export const TOBIN = 'tobin@lantern-spoke.test';
export const MANAGER = 'mara@lantern-spoke.test';

/** A day `days` from today as the calendar names it, plus its ISO form. */
export function dayFromToday(days: number): { date: Date; iso: string; ariaLabel: string } {
  const date = new Date();
  date.setHours(12, 0, 0, 0);
  date.setDate(date.getDate() + days);
  const iso = `${date.getFullYear()}-${String(date.getMonth() + 1).padStart(2, '0')}-${String(date.getDate()).padStart(2, '0')}`;
  const ariaLabel = `${date.getDate()} ${date.toLocaleString('en-GB', { month: 'long' })} ${date.getFullYear()}`;
  return { date, iso, ariaLabel };
}

/** Opens a date picker by its label and taps the day, paging to the next month when needed. */
export async function pickDay(page: Page, fieldLabel: RegExp, ariaLabel: string): Promise<void> {
  await page.getByRole('button', { name: fieldLabel }).click();
  const day = page.getByRole('button', { name: ariaLabel, exact: true });
  for (let i = 0; i < 2 && (await day.count()) === 0; i++) {
    await page.locator('[data-direction="next"]').first().click();
  }
  await day.first().click();
}

/** The job page's header card (job number, status badge, owner, moves). */
export function jobHeader(page: Page): Locator {
  return page
    .locator('.mantine-Paper-root')
    .filter({ has: page.getByText(/^Job J-\d{4}-\d{4}$/) })
    .first();
}

/** Waits until the header's status badge reads `label`. */
export async function headerStatus(page: Page, label: string): Promise<void> {
  await jobHeader(page).locator('.mantine-Badge-root').getByText(label, { exact: true }).waitFor();
}

/**
 * An estimate the way the issue and DESIGN.md define it, computed here from the inputs
 * so the test does not copy the app's figures: each line rounded once to whole pence,
 * tax added once on the net, half a penny rounds up (libs/domain roundMinor).
 */
export function expectedEstimate(partPriceMinor: number, hours: number, labourRateMinor: number, taxRateBp: number) {
  const labourMinor = Math.round((Math.round(hours * 100) * labourRateMinor) / 100);
  const netMinor = partPriceMinor + labourMinor;
  const taxMinor = Math.floor((netMinor * taxRateBp + 5_000) / 10_000);
  return { labourMinor, netMinor, taxMinor, grossMinor: netMinor + taxMinor };
}

export const gbp = (minor: number) => `£${(minor / 100).toFixed(2)}`;

/** Books a job in as the desk through the API, for specs whose subject is not booking-in. */
export async function bookInByApi(symptoms: string): Promise<{ id: number; number: string }> {
  const req = await request.newContext({ baseURL: inject('baseURL') });
  const login = await req.post('/api/auth/login', { data: { email: DESK, password: DEMO_PASSWORD } });
  if (!login.ok()) throw new Error(`Sign-in of the desk failed: ${login.status()}`);
  const { csrfToken } = (await login.json()) as { csrfToken: string };
  const res = await req.post('/api/jobs', {
    headers: { 'x-csrf-token': csrfToken },
    data: {
      newCustomer: { name: 'Wren Halloway', email: 'wren.halloway@example.test', phone: null, preferredChannel: 'email', notes: null },
      newBike: {
        maker: 'Pellbrook',
        model: 'Drift 10',
        year: 2019,
        frameMaterial: 'steel',
        size: null,
        colour: null,
        serialNumber: null,
        drivetrainSpeeds: 10,
        brakeType: 'rim',
        cableRouting: 'external',
        dropoutType: 'horizontal',
        tyreSize: null,
      },
      reportedSymptoms: symptoms,
      promisedOn: dayFromToday(5).iso,
    },
  });
  if (!res.ok()) throw new Error(`Booking in failed: ${res.status()} ${await res.text()}`);
  const job = (await res.json()) as { id: number; number: string };
  await req.dispose();
  return job;
}

/**
 * A full-page screenshot from the top: the app bar is fixed, so a page left scrolled
 * would show the bar painted across the middle of the capture.
 */
export async function snap(page: Page, name: string): Promise<string> {
  await page.evaluate(() => window.scrollTo(0, 0));
  return shot(page, name);
}
