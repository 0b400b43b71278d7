import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { request, type APIRequestContext, type Page } from 'playwright-core';
import sharp from 'sharp';
import { inject } from 'vitest';
import { DEMO_PASSWORD } from './browser';

const COLOURS = ['#2f6f8f', '#8f5a2f', '#4f8f2f', '#7a2f8f'];

/**
 * Test shots drawn from SVG by sharp: a coloured panel with a big number and an arrow
 * pointing up, so a thumbnail shows at a glance whether it is upright. With `rotated`,
 * the pixels are stored turned a quarter and EXIF orientation 6 says how to turn them back.
 */
export async function makeShots(dir: string, count: number, rotated = false): Promise<string[]> {
  mkdirSync(dir, { recursive: true });
  const paths: string[] = [];
  for (let i = 0; i < count; i++) {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="800" height="600">
      <rect width="800" height="600" fill="${COLOURS[i % COLOURS.length]}"/>
      <polygon points="400,60 520,220 280,220" fill="#fff"/>
      <rect x="370" y="220" width="60" height="120" fill="#fff"/>
      <text x="400" y="520" font-size="150" font-family="sans-serif" fill="#fff" text-anchor="middle">${i + 1}</text>
    </svg>`;
    let img = sharp(Buffer.from(svg));
    if (rotated && i === 0) img = sharp(await img.rotate(-90).jpeg().toBuffer()).withMetadata({ orientation: 6 });
    const path = join(dir, `shot-${i + 1}.jpg`);
    writeFileSync(path, await img.jpeg({ quality: 85 }).toBuffer());
    paths.push(path);
  }
  return paths;
}

/** A file that claims to be a photo but is text, so the server refuses it by its bytes. */
export function makeImpostor(dir: string): string {
  const path = join(dir, 'not-a-photo.jpg');
  writeFileSync(path, 'this is plain text, not a JPEG\n');
  return path;
}

async function signedInRequest(email: string): Promise<{ req: APIRequestContext; csrf: string }> {
  const req = await request.newContext({ baseURL: inject('baseURL') });
  const login = await req.post('/api/auth/login', { data: { email, password: DEMO_PASSWORD } });
  if (!login.ok()) throw new Error(`Sign-in of ${email} failed: ${login.status()}`);
  const { csrfToken } = (await login.json()) as { csrfToken: string };
  return { req, csrf: csrfToken };
}

/** Books a bike in as the front desk, for a seed without jobs. */
export async function bookInJob(): Promise<number> {
  const { req, csrf } = await signedInRequest('desk@lantern-spoke.test');
  const res = await req.post('/api/jobs', {
    headers: { 'x-csrf-token': csrf },
    data: {
      newCustomer: { name: 'Media Test Rider', email: 'media-test@example.test', phone: null, preferredChannel: 'email', notes: null },
      newBike: {
        maker: 'Testframe',
        model: 'Scope One',
        year: 2022,
        frameMaterial: 'steel',
        size: null,
        colour: null,
        serialNumber: null,
        drivetrainSpeeds: 11,
        brakeType: 'rim',
        cableRouting: 'internal',
        dropoutType: 'vertical',
        tyreSize: null,
      },
      reportedSymptoms: 'Rattle inside the down tube.',
      promisedOn: new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10),
    },
  });
  if (!res.ok()) throw new Error(`Booking in a test job failed: ${res.status()} ${await res.text()}`);
  const job = (await res.json()) as { id: number };
  await req.dispose();
  return job.id;
}

/** A job the signed-in user can see: the newest demo job, or a freshly booked one. */
export async function demoJobId(page: Page): Promise<number> {
  const res = await page.request.get('/api/jobs?pageSize=5&sort=createdAt&order=desc');
  const body = res.ok() ? ((await res.json()) as { items: { id: number }[] }) : { items: [] };
  return body.items[0]?.id ?? bookInJob();
}

/** Waits until a stored thumbnail has loaded and reports its natural size. */
export async function imageSize(page: Page, selector: string): Promise<{ w: number; h: number }> {
  const el = page.locator(selector).first();
  await el.waitFor();
  await page.waitForFunction((e) => (e as HTMLImageElement).complete && (e as HTMLImageElement).naturalWidth > 0, await el.elementHandle());
  return el.evaluate((e) => ({ w: (e as HTMLImageElement).naturalWidth, h: (e as HTMLImageElement).naturalHeight }));
}
