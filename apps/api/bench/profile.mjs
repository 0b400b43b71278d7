// `node apps/api/bench/profile.mjs [path…]`: the built API over a shop of BENCH_JOBS jobs under `node --cpu-prof`,
// 50 connections on each path for BENCH_SECONDS, then each path's window of the profile summed by self time per
// function and per package (read it by hand, or open the .cpuprofile it keeps in Chrome DevTools). Not part of
// `npm run bench`.
import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { load, prepareShop, probe, startProbed } from './load-lib.mjs';

const paths = process.argv.slice(2).length ? process.argv.slice(2) : ['/api/auth/session', '/api/jobs?open=true'];
const dir = mkdtempSync(join(tmpdir(), 'benchproof-prof-'));
const shop = await prepareShop(dir);
const profDir = join(dir, 'prof');
const api = await startProbed(dir, shop.env, { execArgv: ['--cpu-prof', `--cpu-prof-dir=${profDir}`] });
const { cookie } = shop.session(await shop.signIn(api.base));
for (const p of paths) await load(`${api.base}${p}`, { cookie }, 1);
// Only the samples taken under each path's load count (the profile's clock is the monotonic clock hrtime reads).
const windows = [];
for (const p of paths) {
  const from = (await probe(api.child)).atUs;
  const r = await load(`${api.base}${p}`, { cookie }, Number(process.env.BENCH_SECONDS ?? 8));
  windows.push({ path: p, from, to: (await probe(api.child)).atUs, r });
}
await new Promise((ok) => (api.child.once('exit', ok), api.child.send('exit')));
const file = join(profDir, readdirSync(profDir)[0]);
const { nodes, samples, timeDeltas, startTime } = JSON.parse(readFileSync(file, 'utf8'));

const top = (m, total, k) =>
  [...m]
    .sort((a, b) => b[1] - a[1])
    .slice(0, k)
    .map(([name, us]) => `${((100 * us) / total).toFixed(1).padStart(5)} %  ${name}`)
    .join('\n');

for (const w of windows) {
  const self = new Map(nodes.map((n) => [n.id, 0]));
  let at = startTime;
  samples.forEach((id, i) => {
    at += timeDeltas[i] ?? 0;
    if (at >= w.from && at <= w.to) self.set(id, self.get(id) + (timeDeltas[i] ?? 0));
  });
  const total = [...self.values()].reduce((a, b) => a + b, 0);
  const byFn = new Map();
  const byPkg = new Map();
  for (const n of nodes) {
    const { functionName, url, lineNumber } = n.callFrame;
    const pkg =
      /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url)?.[1] ??
      (url.includes('/dist/') ? 'app' : url ? url.replace(/^.*\//, '') : n.callFrame.functionName || '(native)');
    const key = `${functionName || '(anonymous)'} ${url.replace(/^.*node_modules\//, '').replace(/^.*\/dist\//, 'dist/')}:${lineNumber + 1}`;
    byFn.set(key, (byFn.get(key) ?? 0) + self.get(n.id));
    byPkg.set(pkg, (byPkg.get(pkg) ?? 0) + self.get(n.id));
  }
  console.log(`\n=== ${w.path}: ${w.r.total} requests, ${w.r.rps.toFixed(0)} req/s (${(total / 1e6).toFixed(1)} s sampled)`);
  console.log(`self time by package:\n${top(byPkg, total, 25)}\n\nby function:\n${top(byFn, total, 40)}`);
}
console.log(`\nprofile: ${file}`);
