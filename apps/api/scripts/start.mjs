#!/usr/bin/env node
// `npm start`: install if needed, build, then serve web + API on one port.
// The server applies migrations and seeds the demo shop itself when the database is new.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const run = (cmd, args) => {
  const r = spawnSync(cmd, args, { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) process.exit(r.status ?? 1);
};

if (!existsSync(resolve(root, 'node_modules/.package-lock.json'))) {
  console.log('[start] Installing dependencies (npm ci)…');
  run('npm', ['ci', '--no-audit', '--no-fund']);
}
console.log('[start] Building API and web…');
run('npm', ['run', 'build']);

const children = [];
const catcher = resolve(root, 'apps/api/scripts/mail-catcher.mjs');
// The local catcher starts only when mail is meant for it: SMTP_URL unset or the default local port.
const smtpUrl = process.env.SMTP_URL ?? 'smtp://127.0.0.1:1025';
const local = /^smtp:\/\/(127\.0\.0\.1|localhost):1025\/?$/.test(smtpUrl);
if (process.env.MAIL_CATCHER !== 'false' && local && existsSync(catcher)) {
  // The catcher prints its own addresses: "[mail] Catching SMTP on …; inbox at http://127.0.0.1:1080".
  children.push(spawn(process.execPath, [catcher], { cwd: root, stdio: 'inherit' }));
} else {
  console.log(`[start] Mail goes to ${smtpUrl.replace(/\/\/[^@/]*@/, '//***@')} (no local catcher)`);
}

// The local card-payment fake starts only when the SDK is meant to reach it (STRIPE_API_URL unset or the default).
const paymentFake = resolve(root, 'apps/api/scripts/payment-fake.mjs');
const stripeUrl = process.env.STRIPE_API_URL ?? 'http://127.0.0.1:12111';
if (process.env.PAYMENT_FAKE !== 'false' && /^http:\/\/(127\.0\.0\.1|localhost):12111\/?$/.test(stripeUrl) && existsSync(paymentFake)) {
  children.push(spawn(process.execPath, [paymentFake], { cwd: root, stdio: 'inherit' }));
} else {
  console.log(`[start] Card payments go to ${stripeUrl === 'provider' ? 'the provider' : stripeUrl} (no local fake)`);
}

// The local text-message fake starts only when the SDK is meant to reach it (TWILIO_API_URL unset or the default).
const textFake = resolve(root, 'apps/api/scripts/text-fake.mjs');
const twilioUrl = process.env.TWILIO_API_URL ?? 'http://127.0.0.1:12112';
if (process.env.TEXT_FAKE !== 'false' && /^http:\/\/(127\.0\.0\.1|localhost):12112\/?$/.test(twilioUrl) && existsSync(textFake)) {
  children.push(spawn(process.execPath, [textFake], { cwd: root, stdio: 'inherit' }));
} else {
  console.log(`[start] Texts go to ${twilioUrl === 'provider' ? 'the provider' : twilioUrl} (no local fake)`);
}

// Fewer glibc malloc arenas so memory freed after a burst of photo work goes back to the
// system (sharp's docs on glibc fragmentation); the bench measures idle RSS before and after.
// A 128 KB trim threshold hands the top of the heap back once freed: without it about 35 MB of
// the compiler's boot-time scratch memory stayed resident for good (DEVELOPERS.md, memory).
const env = { MALLOC_ARENA_MAX: '2', MALLOC_TRIM_THRESHOLD_: '131072', ...process.env };
// Opt-in jemalloc (Debian libjemalloc2) for hosts short of memory rather than CPU: idle RSS
// after photo bursts stays flat, but each photo costs more CPU (DEVELOPERS.md, Benchmarks).
const JEMALLOC = '/usr/lib/x86_64-linux-gnu/libjemalloc.so.2';
if (process.env.USE_JEMALLOC === '1') {
  if (existsSync(JEMALLOC)) Object.assign(env, { LD_PRELOAD: JEMALLOC, MALLOC_CONF: env.MALLOC_CONF ?? 'background_thread:true' });
  else console.log(`[start] USE_JEMALLOC=1 but ${JEMALLOC} is missing; using glibc malloc`);
}
const server = spawn(process.execPath, [resolve(root, 'dist/apps/api/apps/api/src/main.js')], { cwd: root, stdio: 'inherit', env });
children.push(server);
const stop = (signal) => children.forEach((c) => c.kill(signal));
process.on('SIGINT', () => stop('SIGINT'));
process.on('SIGTERM', () => stop('SIGTERM'));
server.on('exit', (code) => {
  stop('SIGTERM');
  process.exit(code ?? 0);
});
