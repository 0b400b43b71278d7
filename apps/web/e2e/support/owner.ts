import { request } from 'playwright-core';
import sharp from 'sharp';
import { inject } from 'vitest';
import { DEMO_PASSWORD } from './browser';
import { bookInByApi, MANAGER } from './records';

/** An invented close-up: a row of chain rollers drawn as circles, as a JPEG. */
const chainPhoto = (): Promise<Buffer> => {
  const rollers = Array.from({ length: 9 }, (_, i) => `<circle cx="${60 + i * 95}" cy="300" r="34" fill="#6b6f75" stroke="#2b2d30" stroke-width="10"/>`).join(
    '',
  );
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="960" height="600"><rect width="960" height="600" fill="#c9c2b4"/><rect x="20" y="262" width="920" height="76" rx="38" fill="#3c3f44"/>${rollers}</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer();
};

export interface OwnerJob {
  id: number;
  number: string;
  chainGrossMinor: number;
  padsGrossMinor: number;
}

/**
 * A job waiting on the owner, set up through the API as the manager would:
 * a worn chain (with a photo) and unsafe rear pads, both priced. The demo
 * shop charges £60.00/h and 20 % tax, so the chain (part £35.00 + 0.25 h)
 * is £50.00 net → £60.00 gross, and the pads (part £22.00 + 0.30 h) are
 * £40.00 net → £48.00 gross.
 */
export async function ownerJobByApi(): Promise<OwnerJob> {
  const job = await bookInByApi('Squeal from the back brake and the chain jumps on hills.');
  const req = await request.newContext({ baseURL: inject('baseURL') });
  const { csrfToken } = (await (await req.post('/api/auth/login', { data: { email: MANAGER, password: DEMO_PASSWORD } })).json()) as { csrfToken: string };
  const headers = { 'x-csrf-token': csrfToken };
  const call = async <T>(method: 'post' | 'put', path: string, data: unknown): Promise<T> => {
    const res = await req[method](`/api/jobs/${job.id}${path}`, { headers, data });
    if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`);
    return (await res.json()) as T;
  };
  await call('post', '/transitions', { to: 'on_stand' });
  const chain = await call<{ id: number }>('post', '/findings', {
    area: 'drivetrain',
    condition: 'worn',
    description: 'The chain has stretched past its limit; it is starting to wear the cogs.',
  });
  const pads = await call<{ id: number }>('post', '/findings', {
    area: 'brakes',
    condition: 'unsafe',
    description: 'The rear brake pads are worn down to the metal backing.',
  });
  await call('post', `/findings/${chain.id}/recommendation`, {
    summary: 'Fit a new chain',
    parts: [{ description: 'Chain', qty: 1, unitPriceMinor: 3500 }],
    labourHundredths: 25,
  });
  await call('post', `/findings/${pads.id}/recommendation`, {
    summary: 'Fit new rear brake pads',
    parts: [{ description: 'Brake pads', qty: 1, unitPriceMinor: 2200 }],
    labourHundredths: 30,
  });
  const upload = await req.post(`/api/jobs/${job.id}/media`, {
    headers,
    multipart: { phase: 'before', area: 'drivetrain', files: { name: 'chain.jpg', mimeType: 'image/jpeg', buffer: await chainPhoto() } },
  });
  const asset = ((await upload.json()) as { assets: { id: number }[] }).assets[0];
  for (let i = 0; i < 50; i++) {
    const a = (await (await req.get(`/api/jobs/${job.id}/media/${asset.id}`)).json()) as { derivativeStatus: string };
    if (a.derivativeStatus !== 'pending') break;
    await new Promise((r) => setTimeout(r, 200));
  }
  await call('put', `/findings/${chain.id}/media`, { assetIds: [asset.id] });
  await call('post', '/transitions', { to: 'waiting_owner' });
  await req.dispose();
  return { ...job, chainGrossMinor: 6000, padsGrossMinor: 4800 };
}
