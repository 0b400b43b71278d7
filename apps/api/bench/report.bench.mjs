// A 40-photo bench report, rendered by the built API, against a bare react-pdf document holding
// the same 40 JPEGs measured in the same run. Prints time, size and ratios; asserts nothing.
// Needs `npm run build` first; run alone with `node apps/api/bench/report.bench.mjs`.
import { atMost, emitRow } from './table.mjs';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { spawn } from 'node:child_process';
import { openSync } from 'node:fs';
import { freePort, waitForHealth } from './bench-lib.mjs';

const here = dirname(fileURLToPath(import.meta.url));
const ROOT = resolve(here, '../../..');
const ENTRY = join(ROOT, 'dist/apps/api/apps/api/src/main.js');
const require = createRequire(join(ROOT, 'apps/api/package.json'));
const sharp = require('sharp');
const { Document, Page, Image, View, renderToBuffer } = require('@react-pdf/renderer');
const { createElement: h } = require('react');
const PHOTOS = 40;

/** A phone-sized photo with texture (flat colours would make unrealistically small JPEGs). */
function photo(seed) {
  const w = 3000,
    hgt = 2250;
  const dots = Array.from(
    { length: 120 },
    (_, i) =>
      `<circle cx="${(i * 137 + seed * 31) % w}" cy="${(i * 89 + seed * 17) % hgt}" r="${15 + ((i * seed) % 90)}" fill="hsl(${(i * 29 + seed * 7) % 360},55%,50%)" fill-opacity="0.55"/>`,
  ).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${hgt}"><defs><linearGradient id="g" x2="1" y2="1"><stop offset="0" stop-color="hsl(${seed * 9},40%,30%)"/><stop offset="1" stop-color="hsl(${seed * 9 + 140},40%,75%)"/></linearGradient></defs><rect width="100%" height="100%" fill="url(#g)"/>${dots}</svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 88 }).toBuffer();
}

async function session(base) {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'mara@lantern-spoke.test', password: 'bench-demo-2026' }),
  });
  if (!res.ok) throw new Error(`login ${res.status}`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { csrfToken } = await res.json();
  return async function call(path, opts = {}, retried = false) {
    const isForm = opts.body instanceof FormData;
    // One retry when a kept-alive socket was closed under us (ECONNRESET); a second draft is harmless.
    const r = await fetch(`${base}/api${path}`, {
      method: opts.method ?? 'GET',
      headers: { cookie, 'x-csrf-token': csrfToken, ...(opts.body && !isForm ? { 'content-type': 'application/json' } : {}) },
      body: opts.body ? (isForm ? opts.body : JSON.stringify(opts.body)) : undefined,
    }).catch((err) => {
      if (retried) throw err;
      return null;
    });
    if (r === null) return call(path, opts, true);
    if (r.status >= 300) throw new Error(`${path}: ${r.status} ${await r.text()}`);
    return opts.raw ? Buffer.from(await r.arrayBuffer()) : r.json();
  };
}

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

async function buildJob(call) {
  const job = await call('/jobs', {
    method: 'POST',
    body: {
      newCustomer: { name: 'Bench Owner', email: 'bench@example.test', phone: null, preferredChannel: 'email', notes: null },
      newBike: {
        maker: 'Benchmark',
        model: 'Forty',
        year: 2024,
        frameMaterial: 'aluminium',
        size: null,
        colour: null,
        serialNumber: null,
        drivetrainSpeeds: 11,
        brakeType: 'hydraulic_disc',
        cableRouting: 'internal',
        dropoutType: 'vertical',
        tyreSize: null,
      },
      reportedSymptoms: 'Benchmark job',
      promisedOn: '2030-01-01',
    },
  });
  const ids = [];
  for (let i = 0; i < PHOTOS; i += 5) {
    const form = new FormData();
    for (let k = i; k < i + 5; k++) form.append('files', new Blob([await photo(k + 1)], { type: 'image/jpeg' }), `p${k}.jpg`);
    form.append('phase', 'before');
    form.append('area', 'drivetrain');
    ids.push(...(await call(`/jobs/${job.id}/media`, { method: 'POST', body: form })).results.map((r) => r.asset.id));
  }
  while ((await call(`/jobs/${job.id}/media`)).some((a) => a.status === 'pending')) await sleep(200);
  for (let f = 0; f < 10; f++) {
    const finding = await call(`/jobs/${job.id}/findings`, {
      method: 'POST',
      body: { area: 'drivetrain', condition: 'worn', description: `Benchmark finding ${f + 1}` },
    });
    await call(`/jobs/${job.id}/findings/${finding.id}/media`, { method: 'PUT', body: { assetIds: ids.slice(f * 4, f * 4 + 4) } });
  }
  return { jobId: job.id, ids };
}

async function reportRun(call, jobId) {
  const t0 = performance.now();
  const draft = await call(`/jobs/${jobId}/reports/drafts`, { method: 'POST' });
  let row = draft;
  while (row.state === 'rendering') {
    await sleep(50);
    row = await call(`/jobs/${jobId}/reports/${draft.id}`);
  }
  if (row.state !== 'ready') throw new Error(`render ${row.state}: ${row.error}`);
  return { secs: (performance.now() - t0) / 1000, bytes: row.byteSize, pages: row.pageCount };
}

/** Baseline: the same JPEG bytes, two per page, in a react-pdf document with nothing else. */
async function bareRun(images) {
  const t0 = performance.now();
  const pages = [];
  for (let i = 0; i < images.length; i += 2) {
    pages.push(
      h(
        Page,
        { key: i, size: 'A4', style: { padding: 40 } },
        ...images
          .slice(i, i + 2)
          .map((data, k) => h(View, { key: k, style: { marginBottom: 12 } }, h(Image, { src: { data, format: 'jpg' }, style: { width: 256, height: 192 } }))),
      ),
    );
  }
  const pdf = await renderToBuffer(h(Document, null, ...pages));
  return { secs: (performance.now() - t0) / 1000, bytes: pdf.length };
}

/** Starts the built API on its own temp database; its log goes to a file in the temp folder (printed if the run fails). */
function startApi(dir, port) {
  const log = join(dir, 'api.log');
  const out = openSync(log, 'w');
  const child = spawn(process.execPath, [ENTRY], {
    stdio: ['ignore', out, out],
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: join(dir, 'b.sqlite'),
      UPLOADS_DIR: join(dir, 'uploads'),
      WEB_DIST: join(dir, 'no-web'),
      MAIL_CATCHER: 'false',
    },
  });
  return { child, log };
}

async function measure(call) {
  const { jobId, ids } = await buildJob(call);
  const prints = await Promise.all(ids.map((id) => call(`/media/${id}/print`, { raw: true })));
  const imageBytes = prints.reduce((s, b) => s + b.length, 0);
  await reportRun(call, jobId); // warm-up: fonts load and code paths compile once
  const report = await reportRun(call, jobId);
  const bare = await bareRun(prints);
  const mb = (b) => `${(b / 1024 / 1024).toFixed(2)} MB`;
  console.log(`${PHOTOS}-photo report: ${report.secs.toFixed(2)} s (request to ready, background render), ${mb(report.bytes)}, ${report.pages} pages`);
  console.log(`bare react-pdf, same ${PHOTOS} JPEGs: ${bare.secs.toFixed(2)} s, ${mb(bare.bytes)}`);
  console.log(`embedded images (print derivatives): ${mb(imageBytes)}`);
  emitRow(
    atMost(
      `${PHOTOS}-photo report: request to ready vs bare react-pdf with the same JPEGs`,
      bare.secs,
      report.secs,
      's',
      3,
      `, ${mb(report.bytes)}, ${report.pages} pages`,
    ),
  );
  emitRow(atMost(`${PHOTOS}-photo report: PDF bytes vs the sum of its embedded JPEGs`, imageBytes / 2 ** 20, report.bytes / 2 ** 20, 'MB', 1.1));
  console.log(
    `ratios — time report/bare: ${(report.secs / bare.secs).toFixed(2)} · PDF bytes / image bytes: report ${(report.bytes / imageBytes).toFixed(3)}, bare ${(bare.bytes / imageBytes).toFixed(3)}`,
  );
}

function printFailure(child, log) {
  console.error('API alive after failure:', child.exitCode === null, 'exit', child.exitCode, child.signalCode);
  console.error(
    readFileSync(log, 'utf8')
      .split('\n')
      .filter((l) => !l.includes('LOG'))
      .slice(-30)
      .join('\n'),
  );
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-report-bench-'));
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const { child, log } = startApi(dir, port);
  try {
    await waitForHealth(base, child);
    await measure(await session(base));
  } catch (err) {
    printFailure(child, log);
    throw err;
  } finally {
    child.kill('SIGTERM');
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
