// Annotated print render through the built API (a new annotation version, first request
// renders: blur pixelation + SVG composite + encode) against a bare sharp composite of the
// same SVG over the same print derivative, in the same run.
import { mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';
import { signIn, startDemoApi } from './bench-lib.mjs';
import { atMost, emitRow, median } from './table.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const require = createRequire(join(root, 'apps/api/package.json'));
const { renderSvg, PALETTE } = require(join(root, 'dist/apps/api/libs/annotation/src/index.js'));
const [INK_A, INK_B] = Object.keys(PALETTE);

const doc = (w, h, n) => ({
  schemaVersion: 2,
  image: { width: w, height: h },
  shapes: [
    { id: `r${n}`, colour: INK_A, width: 'medium', kind: 'ring', centre: { x: 0.4, y: 0.5 }, rx: 0.1, ry: 0.12 },
    { id: `a${n}`, colour: INK_B, width: 'bold', kind: 'arrow', from: { x: 0.1, y: 0.1 }, to: { x: 0.35, y: 0.4 } },
    { id: `l${n}`, colour: INK_A, width: 'medium', kind: 'label', at: { x: 0.55, y: 0.2 }, text: `Groove ${n}` },
    { id: `b${n}`, colour: INK_A, width: 'thin', kind: 'blur', topLeft: { x: 0.7, y: 0.7 }, bottomRight: { x: 0.9, y: 0.85 } },
  ],
});

async function main() {
  sharp.cache(false);
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-annot-'));
  const api = await startDemoApi(root, dir);
  try {
    const s = await signIn(api.base, 'tobin@lantern-spoke.test');
    const headers = { cookie: s.cookie, 'x-csrf-token': s.csrf, 'content-type': 'application/json' };
    const jobs = await (await fetch(`${api.base}/api/jobs?pageSize=50`, { headers })).json();
    let asset;
    for (const job of jobs.items) {
      const media = await (await fetch(`${api.base}/api/jobs/${job.id}/media`, { headers })).json();
      asset = (media.items ?? media).find((m) => m.kind === 'photo' && m.status === 'ready');
      if (asset) break;
    }
    const print = Buffer.from(await (await fetch(`${api.base}${asset.urls.print}`, { headers })).arrayBuffer());
    const { width, height } = await sharp(print).metadata();
    const bare = [];
    const product = [];
    let version = (await (await fetch(`${api.base}/api/annotations/${asset.id}`, { headers })).json()).version;
    for (let i = 0; i < 3; i++) {
      const d = doc(width, height, i);
      const t0 = performance.now();
      await sharp(print)
        .composite([{ input: Buffer.from(renderSvg(d, { width, height })) }])
        .jpeg({ quality: 85 })
        .toBuffer();
      bare.push(performance.now() - t0);
      const saved = await fetch(`${api.base}/api/annotations/${asset.id}`, {
        method: 'PUT',
        headers,
        body: JSON.stringify({ baseVersion: version, document: d }),
      });
      if (!saved.ok) throw new Error(`save ${saved.status} ${await saved.text()}`);
      version = (await saved.json()).version;
      const t1 = performance.now();
      const res = await fetch(`${api.base}/api/media/${asset.id}/annotated/print`, { headers });
      await res.arrayBuffer();
      product.push(performance.now() - t1);
    }
    emitRow(atMost(`annotated print render (${width}×${height}, 4 shapes incl. blur) vs bare sharp composite`, median(bare), median(product), 'ms', 3));
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
