// Benchmark (not a test): a 1 GB upload through the built API's resumable (tus) route
// versus a bare Node stream-to-disk handler, measured in the same run on the same file.
// Reports throughput and the server process's peak RSS growth (VmRSS from /proc).
import { createReadStream, existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { fileURLToPath } from 'node:url';
import { createRequire } from 'node:module';
import { atLeast, emitRow } from './table.mjs';
import { freePort, rssOf, sampleRss, startApi, startBare, waitForHealth, writeTestVideo } from './bench-lib.mjs';

const here = dirname(fileURLToPath(import.meta.url));
const root = resolve(here, '../../..');
const require = createRequire(join(root, 'apps/api/package.json'));
const { Upload } = require('tus-js-client');
const ENTRY = join(root, 'dist/apps/api/apps/api/src/main.js');
const SIZE = Number(process.env.BENCH_BYTES ?? 1024 ** 3);
const MB = 1024 * 1024;
const settle = () => new Promise((r) => setTimeout(r, 300));

async function bareRun(dir, file) {
  const { child, port } = await startBare(dir, join(here, 'bare-server.mjs'));
  await settle();
  const idle = rssOf(child.pid);
  const rss = sampleRss(child.pid);
  const t0 = process.hrtime.bigint();
  await new Promise((ok, fail) => {
    const req = request(
      { host: '127.0.0.1', port, method: 'POST', path: '/', headers: { 'Content-Length': SIZE } },
      (res) => (res.resume(), res.on('end', ok)),
    );
    req.on('error', fail);
    pipeline(createReadStream(file), req).catch(fail);
  });
  const secs = Number(process.hrtime.bigint() - t0) / 1e9;
  const peak = rss.stop();
  child.kill();
  return { name: 'bare Node stream → disk', secs, growth: peak - idle };
}

async function login(base) {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'tobin@lantern-spoke.test', password: 'bench-demo-2026' }),
  });
  if (!res.ok) throw new Error(`login ${res.status}`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { csrfToken } = await res.json();
  const jobs = await (await fetch(`${base}/api/jobs?open=true&pageSize=1`, { headers: { cookie } })).json();
  return { cookie, csrf: csrfToken, jobId: (jobs.items ?? jobs)[0].id };
}

async function apiRun(dir, file) {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const child = startApi(ENTRY, {
    PORT: String(port),
    DATABASE_PATH: join(dir, 'bench.sqlite'),
    UPLOADS_DIR: join(dir, 'uploads'),
    WEB_DIST: join(dir, 'no-web'),
    MAX_VIDEO_BYTES: String(4 * 1024 ** 3),
    MAIL_CATCHER: 'false',
  });
  try {
    await waitForHealth(base, child);
    const s = await login(base);
    await settle();
    const idle = rssOf(child.pid);
    const rss = sampleRss(child.pid);
    const t0 = process.hrtime.bigint();
    const assetId = await new Promise((ok, fail) => {
      new Upload(createReadStream(file), {
        endpoint: `${base}/api/media/tus`,
        uploadSize: SIZE,
        chunkSize: Infinity,
        retryDelays: [],
        headers: { Cookie: s.cookie, 'x-csrf-token': s.csrf },
        metadata: { jobId: String(s.jobId), phase: 'before', area: 'frame_interior', source: 'scope', filename: 'bench.mp4' },
        onError: fail,
        onSuccess: ({ lastResponse }) => ok(lastResponse.getHeader('BenchProof-Media-Id')),
      }).start();
    });
    const secs = Number(process.hrtime.bigint() - t0) / 1e9;
    const peak = rss.stop();
    return { name: `BenchProof tus route (asset ${assetId}, incl. sniff + SHA-256 + store)`, secs, growth: peak - idle };
  } finally {
    child.kill();
  }
}

async function main() {
  if (!existsSync(ENTRY)) throw new Error(`No built API at ${ENTRY}; run npm run build first`);
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-bench-'));
  try {
    const file = join(dir, 'upload.mp4');
    await writeTestVideo(file, SIZE);
    console.log(`Generated ${(statSync(file).size / MB).toFixed(0)} MB test video`);
    const bare = await bareRun(dir, file);
    rmSync(join(dir, 'upload-0'), { force: true });
    const api = await apiRun(dir, file);
    const rows = [bare, api].map((r) => ({
      run: r.name,
      'MB/s': (SIZE / MB / r.secs).toFixed(1),
      seconds: r.secs.toFixed(2),
      'peak RSS growth MB': (r.growth / MB).toFixed(1),
    }));
    console.table(rows);
    console.log(
      `throughput ratio (tus / bare): ${(bare.secs / api.secs).toFixed(2)}   RSS growth ratio: ${(api.growth / Math.max(bare.growth, 1)).toFixed(2)}`,
    );
    const mbps = (r) => SIZE / MB / r.secs;
    emitRow(
      atLeast(
        `${(SIZE / MB).toFixed(0)} MB upload (tus) vs bare stream to disk`,
        mbps(bare),
        mbps(api),
        'MB/s',
        0.5,
        `, RSS +${(api.growth / MB).toFixed(0)} MB`,
      ),
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

// exit at once: a failed run can leave a server or stream open that would hold the table forever
main().catch((err) => {
  console.error(err);
  process.exit(1);
});
