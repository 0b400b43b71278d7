// Photos until their three derivatives are ready, through the built API, against bare sharp
// in the same run: one 12 MP photo (time), 20 photos 4 at a time (throughput), and the API's
// idle memory before and after the burst.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';
import { rssOf, signIn, startDemoApi } from './bench-lib.mjs';
import { bareThreeSizes, phonePhoto } from './photo-lib.mjs';
import { atLeast, atMost, emitRow, median, medianOf3 } from './table.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

async function uploadAndWait(api, s, jobId, buf, name) {
  const form = new FormData();
  form.append('phase', 'before');
  form.append('area', 'drivetrain');
  form.append('source', 'camera');
  form.append('files', new Blob([buf], { type: 'image/jpeg' }), name);
  const res = await fetch(`${api.base}/api/jobs/${jobId}/media`, { method: 'POST', headers: { cookie: s.cookie, 'x-csrf-token': s.csrf }, body: form });
  if (!res.ok) throw new Error(`upload ${res.status} ${await res.text()}`);
  const body = await res.json();
  const id = body.assets[0].id;
  for (;;) {
    const a = await (await fetch(`${api.base}/api/jobs/${jobId}/media/${id}`, { headers: { cookie: s.cookie } })).json();
    if (a.status === 'ready') return;
    if (a.status === 'failed') throw new Error(`derivatives failed for ${id}`);
    await sleep(10);
  }
}

async function pool(items, n, fn) {
  const queue = [...items];
  await Promise.all(
    Array.from({ length: n }, async () => {
      while (queue.length) await fn(queue.shift());
    }),
  );
}

async function main() {
  sharp.cache(false);
  const photo = await phonePhoto();
  const photos = await Promise.all(Array.from({ length: 20 }, (_, i) => phonePhoto(i + 1)));
  const bareOne = [];
  for (let i = 0; i < 3; i++) {
    const t0 = performance.now();
    await sharp(photo).rotate().resize(1600, 1600, { fit: 'inside' }).jpeg({ quality: 82 }).toBuffer();
    bareOne.push(performance.now() - t0);
  }
  const bareBurst = await medianOf3(async () => {
    const t0 = performance.now();
    await pool(photos, 4, bareThreeSizes);
    return { rate: 20 / ((performance.now() - t0) / 1000) };
  }, 'rate');

  const dir = mkdtempSync(join(tmpdir(), 'benchproof-photo-'));
  const api = await startDemoApi(root, dir);
  try {
    const s = await signIn(api.base, 'tobin@lantern-spoke.test');
    const jobs = await (await fetch(`${api.base}/api/jobs?open=true&pageSize=1`, { headers: { cookie: s.cookie } })).json();
    const jobId = jobs.items[0].id;
    await sleep(2000);
    const one = [];
    for (let i = 0; i < 3; i++) {
      const t0 = performance.now();
      await uploadAndWait(api, s, jobId, photo, `one-${i}.jpg`);
      one.push(performance.now() - t0);
    }
    await sleep(3000);
    const idleBefore = rssOf(api.child.pid);
    const burst = await medianOf3(async (run) => {
      const t0 = performance.now();
      await pool(
        photos.map((p, i) => [p, i]),
        4,
        ([p, i]) => uploadAndWait(api, s, jobId, p, `burst-${run}-${i}.jpg`),
      );
      return { rate: 20 / ((performance.now() - t0) / 1000) };
    }, 'rate');
    await sleep(5000);
    const idleAfter = rssOf(api.child.pid);
    emitRow(atMost('12 MP photo → 3 derivatives ready (API) vs one bare resize(1600)', median(bareOne), median(one), 'ms', 2));
    emitRow(atLeast('20 photos, 4 at a time (API) vs bare sharp, same sizes', bareBurst.rate, burst.rate, 'photos/s', 0.9));
    emitRow(atMost('API idle RSS after the 20-photo bursts vs before', idleBefore / 2 ** 20, idleAfter / 2 ** 20, 'MB', 1.2));
  } finally {
    await api.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

// exit at once: a failed run can leave a server or stream open that would hold the table forever
main().catch((err) => {
  console.error(err);
  process.exit(1);
});
