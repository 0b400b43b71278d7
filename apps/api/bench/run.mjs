// `npm run bench`: every benchmark (building the app first when a fresh clone has no build), then one table of
// benchmark, baseline (measured in the same run), product, ratio, target and whether it is met.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { printTable } from './table.mjs';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '../../..');
if (!existsSync(join(root, 'dist/apps/api')) || !existsSync(join(root, 'dist/apps/web/index.html'))) {
  console.log('No build found: running `npm run build` first.');
  const built = spawnSync('npm', ['run', 'build'], { cwd: root, stdio: 'inherit' });
  if (built.status !== 0) process.exit(built.status ?? 1);
}
const BENCHES = [
  'ladder.bench.mjs',
  'jobs-list.bench.mjs',
  'memory.bench.mjs',
  'photo.bench.mjs',
  'media-serve.bench.mjs',
  'web-load.bench.mjs',
  'annotation-render.bench.mjs',
  'report.bench.mjs',
  'media-upload.bench.mjs',
  'export-memory.bench.mjs',
];
const only = process.argv.slice(2);
const rows = [];

for (const bench of BENCHES.filter((b) => only.length === 0 || only.some((o) => b.includes(o)))) {
  console.log(`\n▶ ${bench}`);
  const child = spawn(process.execPath, [join(here, bench)], { stdio: ['ignore', 'pipe', 'inherit'] });
  let rest = '';
  child.stdout.on('data', (chunk) => {
    const lines = (rest + chunk).split('\n');
    rest = lines.pop();
    for (const l of lines) {
      if (l.startsWith('BENCH_ROW ')) rows.push(JSON.parse(l.slice(10)));
      else console.log(l);
    }
  });
  const code = await new Promise((ok) => child.on('exit', ok));
  if (code !== 0) rows.push({ benchmark: bench, baseline: '—', product: `failed (exit ${code})`, ratio: '—', target: '—', met: false });
}

console.log('\n');
printTable(rows);
