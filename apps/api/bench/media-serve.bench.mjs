// Serving a screen-size derivative to 20 connections: the built API (session check, shop
// scope, ETag, Range) against a bare Node file server sending the same file, same run.
import autocannon from 'autocannon';
import { createReadStream, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { signIn, startDemoApi } from './bench-lib.mjs';
import { atLeast, emitRow, medianOf3 } from './table.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const load = (url, headers) =>
  new Promise((ok, fail) => autocannon({ url, connections: 20, duration: 5, headers }, (err, r) => (err ? fail(err) : ok({ rps: r.requests.average }))));

function bareFileServer(file) {
  const size = statSync(file).size;
  const server = createServer((_req, res) => {
    res.writeHead(200, { 'content-type': 'image/jpeg', 'content-length': size });
    createReadStream(file).pipe(res);
  });
  return new Promise((ok) => server.listen(0, '127.0.0.1', () => ok({ url: `http://127.0.0.1:${server.address().port}/`, close: () => server.close() })));
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-serve-'));
  const api = await startDemoApi(root, dir);
  try {
    const s = await signIn(api.base, 'tobin@lantern-spoke.test');
    const jobs = await (await fetch(`${api.base}/api/jobs?pageSize=50`, { headers: { cookie: s.cookie } })).json();
    let asset;
    for (const job of jobs.items) {
      const media = await (await fetch(`${api.base}/api/jobs/${job.id}/media`, { headers: { cookie: s.cookie } })).json();
      asset = (media.items ?? media).find((m) => m.kind === 'photo' && m.status === 'ready');
      if (asset) break;
    }
    if (!asset) throw new Error('no ready demo photo');
    const url = `${api.base}${asset.urls.screen}`;
    const bytes = Buffer.from(await (await fetch(url, { headers: { cookie: s.cookie } })).arrayBuffer());
    const file = join(dir, 'screen.jpg');
    writeFileSync(file, bytes);
    const bare = await bareFileServer(file);
    const b = await medianOf3(() => load(bare.url, {}), 'rps');
    bare.close();
    const p = await medianOf3(() => load(url, { cookie: s.cookie }), 'rps');
    emitRow(atLeast(`screen derivative (${(bytes.length / 1024).toFixed(0)} KB), 20 conns`, b.rps, p.rps, 'req/s', 0.5));
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
