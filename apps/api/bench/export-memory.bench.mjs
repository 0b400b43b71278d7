// Export memory (issue 23): a manager's shop export (GET /api/shop/export, a streamed zip of JSON, originals and
// reports) of a shop grown to BENCH_EXPORT_MB of photos (default 2048: 2 GB), read to a SHA-256 at full speed.
// Baseline: the same API process idle just before, in the same run. The export streams one stored file at a
// time, so its peak RSS must stay near idle whatever the shop's size (target ≤ 1.5× idle).
import Database from 'better-sqlite3';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { once } from 'node:events';
import { createWriteStream, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { rssOf, sampleRss, signIn, startDemoApi, waitForIdleTasks } from './bench-lib.mjs';
import { emitRow, fmt } from './table.mjs';
import { ROOT } from './load-lib.mjs';

const MB = 1024 * 1024;
const TOTAL_MB = Number(process.env.BENCH_EXPORT_MB ?? 2048);

/** Random bytes of a 12–24 MP phone photo's JPEG size (3–7 MB), written in 1 MB chunks. */
async function writePhoto(path, bytes) {
  const out = createWriteStream(path);
  for (let left = bytes; left > 0; left -= MB) if (!out.write(randomBytes(Math.min(MB, left)))) await once(out, 'drain');
  out.end();
  await once(out, 'finish');
}

/** Adds photos to the demo shop's first job until the originals reach TOTAL_MB: files in storage, rows beside them. */
async function growShop(dir) {
  const db = new Database(join(dir, 'bench.sqlite'));
  const model = db.prepare("SELECT * FROM media_assets WHERE original_key IS NOT NULL AND kind = 'photo' ORDER BY id LIMIT 1").get();
  const cols = Object.keys(model).filter((c) => c !== 'id');
  const insert = db.prepare(`INSERT INTO media_assets (${cols.join(', ')}) VALUES (${cols.map((c) => `@${c}`).join(', ')})`);
  mkdirSync(join(dir, 'uploads', 'originals', String(model.shop_id)), { recursive: true });
  let total = 0;
  let photos = 0;
  while (total < TOTAL_MB * MB) {
    const bytes = Math.min(TOTAL_MB * MB - total, (3 + Math.random() * 4) * MB) | 0;
    const key = `originals/${model.shop_id}/${randomUUID()}`;
    await writePhoto(join(dir, 'uploads', ...key.split('/')), bytes);
    insert.run({ ...model, original_key: key, byte_size: bytes, sha256: randomBytes(32).toString('hex'), client_id: null, phash: null });
    total += bytes;
    photos++;
  }
  db.close();
  return { total, photos };
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-export-'));
  const api = await startDemoApi(ROOT, dir);
  try {
    await waitForIdleTasks(api.base);
    const grown = await growShop(dir);
    const { cookie } = await signIn(api.base, 'mara@lantern-spoke.test');
    await new Promise((r) => setTimeout(r, 2000));
    const idle = rssOf(api.child.pid);
    const sampler = sampleRss(api.child.pid, 50);
    const t0 = Date.now();
    const res = await fetch(`${api.base}/api/shop/export`, { headers: { cookie } });
    if (res.status !== 200) throw new Error(`export ${res.status}`);
    const hash = createHash('sha256');
    let bytes = 0;
    for await (const chunk of res.body) {
      hash.update(chunk);
      bytes += chunk.length;
    }
    const seconds = (Date.now() - t0) / 1000;
    const peak = sampler.stop();
    emitRow({
      benchmark: `shop export, ${grown.photos} generated photos (${fmt(grown.total / MB)} MB) + demo shop, zip read to a hash`,
      baseline: `idle API ${fmt(idle / MB)} MB RSS`,
      product: `peak ${fmt(peak / MB)} MB RSS during the export (+${fmt((peak - idle) / MB)} MB); ${fmt(bytes / MB)} MB in ${fmt(seconds)} s`,
      ratio: (peak / idle).toFixed(2),
      target: '≤ 1.5×',
      met: peak <= 1.5 * idle,
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
