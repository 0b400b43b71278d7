// `npm run bench`: every API benchmark, one after another (needs `npm run build` first).
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
for (const bench of ['media-upload.bench.mjs']) {
  console.log(`\n▶ ${bench}`);
  const r = spawnSync(process.execPath, [join(here, bench)], { stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
}
