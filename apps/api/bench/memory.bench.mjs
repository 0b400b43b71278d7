// Memory of the API (issue 22): idle RSS after boot (≤ 180 MB); what each part loaded on first use would cost
// at idle if it loaded at boot; RSS growth during the 50-connection open-jobs load against a bare Express route
// sending the same JSON (≤ 1.5×, same run, each in its own process); and RSS a minute after the load (within
// 10 % of idle). Every figure is the server's own process.memoryUsage() (rss, heapUsed, external,
// arrayBuffers), so the rows say which kind of memory grows.
import { execFileSync, fork } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { START_ENV } from './bench-lib.mjs';
import { emitRow, fmt } from './table.mjs';
import { load, prepareShop, probe, ROOT, startProbed } from './load-lib.mjs';

const MB = 1024 * 1024;
const LOAD_SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const SETTLE_MS = Number(process.env.BENCH_SETTLE_MS ?? 60_000);
const PATH = '/api/jobs?open=true';

/** What loading a package costs a bare Node process, in MB of RSS (median of three fresh processes). */
function idleCost(what, code) {
  const rss = (snippet) =>
    Number(
      execFileSync(
        process.execPath,
        ['--expose-gc', '-e', `(async()=>{${snippet};setTimeout(()=>{gc();gc();setTimeout(()=>console.log(process.memoryUsage().rss),100)},200)})()`],
        {
          cwd: join(ROOT, 'apps/api'),
          env: { ...process.env, ...START_ENV },
        },
      ),
    );
  const three = (snippet) => [0, 1, 2].map(() => rss(snippet)).sort((a, b) => a - b)[1];
  return { what, mb: (three(code) - three('')) / MB };
}

const LAZY = [
  ['PDF renderer (@react-pdf/renderer: yoga, pdfkit, fontkit) and the report fonts', "await import('@react-pdf/renderer')"],
  [
    'video parser (mediainfo.js and its wasm, instantiated)',
    "const m = await import('mediainfo.js'); await m.default({ format: 'object', locateFile: () => require.resolve('mediainfo.js/MediaInfoModule.wasm') })",
  ],
  ['e-mail transport (nodemailer)', "require('nodemailer')"],
  ['QR encoder for the report (qrcode)', "require('qrcode')"],
  ['archive writer (yazl)', "require('yazl')"],
  [
    'e-mail templates (react-dom/server and the react-email components)',
    "require('react-dom/server'); for (const c of ['html', 'head', 'preview', 'body', 'container', 'section', 'text', 'button', 'row', 'column']) require('@react-email/' + c)",
  ],
  ['text-message SDK (twilio)', "require('twilio')"],
  ['card-payment SDK (stripe)', "require('stripe')"],
  ['S3 SDK (@aws-sdk/client-s3, lib-storage), only with STORAGE=s3', "require('@aws-sdk/client-s3'); require('@aws-sdk/lib-storage')"],
  ['BullMQ and ioredis, only with REDIS_URL', "require('bullmq')"],
  [
    'password strength lists (zxcvbn-ts, English and common), built',
    "const { ZxcvbnFactory } = require('@zxcvbn-ts/core'); const c = require('@zxcvbn-ts/language-common'); new ZxcvbnFactory({ dictionary: { ...c.dictionary, ...require('@zxcvbn-ts/language-en').dictionary }, graphs: c.adjacencyGraphs }).check('x')",
  ],
  ['phone-number metadata (libphonenumber-js/max)', "require('libphonenumber-js/max').parsePhoneNumberFromString('+61491570156')"],
  ['two-step codes (otplib)', "require('otplib')"],
];

const mem = (m) => `rss ${fmt(m.rss / MB)}, heapUsed ${fmt(m.heapUsed / MB)}, external ${fmt(m.external / MB)}, arrayBuffers ${fmt(m.arrayBuffers / MB)} MB`;

/** Idle, peak during the load (sampled every 200 ms) and the load's own figures. */
async function underLoad(child, url, headers) {
  const idle = (await probe(child)).mem;
  let peak = idle;
  let sampling = true;
  const sampler = (async () => {
    while (sampling) {
      const m = (await probe(child)).mem;
      if (m.rss > peak.rss) peak = m;
      await new Promise((r) => setTimeout(r, 200));
    }
  })();
  const r = await load(url, headers, LOAD_SECONDS);
  sampling = false;
  await sampler;
  return { idle, peak, growth: peak.rss - idle.rss, r };
}

function startBare(payload) {
  const child = fork(join(ROOT, 'apps/api/bench/ladder-server.mjs'), {
    execArgv: ['-r', join(ROOT, 'apps/api/bench/probe.cjs')],
    env: { ...process.env, ...START_ENV, LADDER_ROOT: ROOT, LADDER_STEP: 'express', LADDER_PAYLOAD: JSON.stringify(payload), LADDER_PATH: PATH },
    stdio: ['ignore', 'ignore', 'inherit', 'ipc'],
  });
  return new Promise((ok) => child.once('message', (m) => ok({ child, url: `http://127.0.0.1:${m.port}${PATH}` })));
}

function lazyRows() {
  for (const [what, code] of LAZY) {
    const c = idleCost(what, code);
    emitRow({
      benchmark: `idle cost if loaded at boot: ${c.what}`,
      baseline: '—',
      product: `${fmt(c.mb)} MB RSS (loads on first use)`,
      ratio: '—',
      target: '—',
      met: null,
    });
  }
}

async function main() {
  lazyRows();
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-memory-'));
  const shop = await prepareShop(dir);
  const api = await startProbed(dir, shop.env);
  try {
    await new Promise((r) => setTimeout(r, 3000));
    const idle = (await probe(api.child)).mem;
    emitRow({
      benchmark: `API idle RSS after boot (${shop.jobs} jobs)`,
      baseline: '—',
      product: mem(idle),
      ratio: '—',
      target: '≤ 180 MB',
      met: idle.rss <= 180 * MB,
    });

    const { cookie } = shop.session(await shop.signIn(api.base));
    const payload = await (await fetch(`${api.base}${PATH}`, { headers: { cookie } })).json();
    const bare = await startBare(payload);
    const b = await underLoad(bare.child, bare.url, {});
    bare.child.kill();
    const p = await underLoad(api.child, `${api.base}${PATH}`, { cookie });
    const delta = (k) => `${k} +${fmt((p.peak[k] - p.idle[k]) / MB)}`;
    emitRow({
      benchmark: `RSS growth, open-jobs page at 50 conns for ${LOAD_SECONDS} s`,
      baseline: `bare route +${fmt(b.growth / MB)} MB (${fmt(b.idle.rss / MB)} → ${fmt(b.peak.rss / MB)})`,
      product: `+${fmt(p.growth / MB)} MB (${fmt(p.idle.rss / MB)} → ${fmt(p.peak.rss / MB)}; ${['heapUsed', 'external', 'arrayBuffers'].map(delta).join(', ')} MB)`,
      ratio: (p.growth / b.growth).toFixed(2),
      target: '≤ 1.5×',
      met: p.growth / b.growth <= 1.5,
    });
    await new Promise((r) => setTimeout(r, SETTLE_MS));
    const after = (await probe(api.child)).mem;
    emitRow({
      benchmark: `API RSS ${SETTLE_MS / 1000} s after the load`,
      baseline: `idle before ${fmt(p.idle.rss / MB)} MB`,
      product: mem(after),
      ratio: (after.rss / p.idle.rss).toFixed(2),
      target: '≤ 1.1×',
      met: after.rss <= 1.1 * p.idle.rss,
    });
  } finally {
    await api.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
