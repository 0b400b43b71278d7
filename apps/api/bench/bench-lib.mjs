import { spawn, fork } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createWriteStream, readFileSync } from 'node:fs';
import { once } from 'node:events';
import { createServer } from 'node:net';

/** Resident set size of a process in bytes, from /proc/<pid>/status (VmRSS, in kB). */
export function rssOf(pid) {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8')
    .split('\n')
    .find((l) => l.startsWith('VmRSS:'));
  return Number(line.replace(/\D+/g, '')) * 1024;
}

/** Samples a process's RSS every `ms` until stopped; returns the peak. */
export function sampleRss(pid, ms = 25) {
  let peak = rssOf(pid);
  const timer = setInterval(() => {
    try {
      peak = Math.max(peak, rssOf(pid));
    } catch {
      /* process gone */
    }
  }, ms);
  return { stop: () => (clearInterval(timer), peak) };
}

const CLIP = readFileSync(new URL('../test/media/clip-64x48.mp4', import.meta.url));

/**
 * Writes `bytes` to `path` as a real, parseable MP4: the committed 64×48 test clip, then
 * one `free` box of pseudo-random data (ISO/IEC 14496-12: readers skip free space),
 * streamed in 4 MB chunks so the generator stays small.
 */
export async function writeTestVideo(path, bytes) {
  const payload = bytes - CLIP.length - 16;
  const freeHead = Buffer.alloc(16);
  freeHead.writeUInt32BE(1, 0); // size 1: a 64-bit size follows the type
  freeHead.write('free', 4, 'latin1');
  freeHead.writeBigUInt64BE(BigInt(payload + 16), 8);
  const out = createWriteStream(path);
  out.write(Buffer.concat([CLIP, freeHead]));
  const chunk = randomBytes(4 * 1024 * 1024);
  for (let left = payload, i = 0; left > 0; i++) {
    chunk.writeUInt32BE(i, 0);
    const part = left >= chunk.length ? chunk : chunk.subarray(0, left);
    if (!out.write(part)) await once(out, 'drain');
    left -= part.length;
  }
  out.end();
  await once(out, 'finish');
}

export function freePort() {
  return new Promise((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}

export async function waitForHealth(base, child) {
  for (let i = 0; i < 600; i++) {
    if (child.exitCode !== null) throw new Error(`API exited with ${child.exitCode}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('API did not come up');
}

export function startBare(dir, script) {
  const child = fork(script, { env: { ...process.env, BARE_DIR: dir }, stdio: ['ignore', 'inherit', 'inherit', 'ipc'] });
  return once(child, 'message').then(([msg]) => ({ child, port: msg.port }));
}

/** The allocator settings `npm start` gives the server (apps/api/scripts/start.mjs). */
export const START_ENV = { MALLOC_ARENA_MAX: '2', MALLOC_TRIM_THRESHOLD_: '131072' };

export function startApi(entry, env) {
  return spawn(process.execPath, [entry], { env: { ...START_ENV, ...process.env, ...env }, stdio: ['ignore', 'ignore', 'inherit'] });
}

export const ENTRY_REL = 'dist/apps/api/apps/api/src/main.js';

/** The built API on a free port over a fresh database in `dir` (demo seed applied at boot). */
export async function startDemoApi(root, dir, env = {}) {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const child = startApi(`${root}/${ENTRY_REL}`, {
    PORT: String(port),
    DATABASE_PATH: `${dir}/bench.sqlite`,
    UPLOADS_DIR: `${dir}/uploads`,
    WEB_DIST: `${dir}/no-web`,
    MAIL_CATCHER: 'false',
    LOG_LEVEL: 'warn',
    LOGIN_THROTTLE_LIMIT: '1000',
    ...env,
  });
  await waitForHealth(base, child);
  return { base, child, stop: () => new Promise((ok) => (child.exitCode !== null ? ok() : (child.once('exit', ok), child.kill()))) };
}

/**
 * Waits until the API's background tasks (the demo seed's photo derivatives) have finished:
 * nothing running and the done count unchanged for a second, so a load test measures its
 * route rather than the route plus image work sharing the two cores.
 */
export async function waitForIdleTasks(base) {
  let last = -1;
  for (let i = 0; i < 240; i++) {
    const { checks } = await (await fetch(`${base}/api/health/ready`)).json();
    const { running, done } = checks.tasks.counts;
    if (running === 0 && done === last) return;
    last = done;
    await new Promise((r) => setTimeout(r, 1000));
  }
  throw new Error('background tasks did not settle');
}

/** Signs in a demo user; returns the session cookie header and the CSRF token. */
export async function signIn(base, email = 'desk@lantern-spoke.test') {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: 'bench-demo-2026' }),
  });
  if (!res.ok) throw new Error(`login ${res.status}`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { csrfToken } = await res.json();
  return { cookie, csrf: csrfToken };
}
