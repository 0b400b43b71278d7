// The cost ladder (issue 22): one signed-in GET measured layer by layer in one run, 50 connections, over a
// shop of BENCH_JOBS jobs. Rungs: bare Express → bare Nest → + global guards → + passport-jwt → + session
// lookup → + request log → the real app's `/api/auth/session` (helmet, compression, cookies, CSRF token,
// every module) → the real open-jobs page. Each rung runs in its own process; every round measures every rung
// once (interleaved, so a burst of load on a shared machine hits all rungs alike) and each figure is the
// median of the rounds. CPU µs per request is the server's own process.cpuUsage() over the window.
import { fork } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fmt, emitRow, median } from './table.mjs';
import { load, prepareShop, probe, ROOT, startProbed } from './load-lib.mjs';

const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 4);

const RUNGS = [
  ['express', 'bare Express route'],
  ['nest', 'bare Nest on Express'],
  ['guards', '+ global guards (policy, CSRF)'],
  ['passport', '+ passport-jwt'],
  ['session', '+ session lookup'],
  ['logging', '+ request log (pino)'],
];

function startRung(step, shop, payload) {
  const child = fork(join(ROOT, 'apps/api/bench/ladder-server.mjs'), {
    execArgv: ['-r', join(ROOT, 'apps/api/bench/probe.cjs')],
    env: { ...process.env, ...shop.env, LADDER_ROOT: ROOT, LADDER_STEP: step, LADDER_PAYLOAD: JSON.stringify(payload), LOG_LEVEL: 'info' },
    stdio: ['ignore', 'ignore', 'inherit', 'ipc'],
  });
  return new Promise((ok, fail) => {
    child.once('exit', (code) => fail(new Error(`ladder rung ${step} exited with ${code}`)));
    child.once('message', (m) => ok({ child, base: `http://127.0.0.1:${m.port}` }));
  });
}

/** One timed window: req/s, p50/p99 and the server's CPU µs per request. */
async function window(rung) {
  const before = await probe(rung.child);
  const r = await load(rung.url, rung.headers, SECONDS);
  const after = await probe(rung.child);
  const cpuUs = after.cpu.user + after.cpu.system - before.cpu.user - before.cpu.system;
  return { ...r, cpuPerReq: cpuUs / Math.max(1, r.total) };
}

async function main() {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-ladder-'));
  const shop = await prepareShop(dir);
  const api = await startProbed(dir, shop.env);
  const servers = [];
  try {
    const { token, cookie } = shop.session(await shop.signIn(api.base));
    const payload = await (await fetch(`${api.base}/api/auth/session`, { headers: { cookie } })).json();
    const bearer = { authorization: `Bearer ${token}` };
    const rungs = [];
    for (const [step, label] of RUNGS) {
      const s = await startRung(step, shop, payload);
      servers.push(s.child);
      rungs.push({ label, child: s.child, url: `${s.base}/api/auth/session`, headers: step === 'express' || step === 'nest' ? {} : bearer });
    }
    rungs.push({ label: 'the real app: /api/auth/session', child: api.child, url: `${api.base}/api/auth/session`, headers: { cookie } });
    rungs.push({ label: `the real open-jobs page (${shop.jobs} jobs)`, child: api.child, url: `${api.base}/api/jobs?open=true`, headers: { cookie } });
    for (const r of rungs) await load(r.url, r.headers, 1); // JIT, page cache, prepared statements
    const runs = rungs.map(() => []);
    for (let round = 0; round < ROUNDS; round++) for (const [i, r] of rungs.entries()) runs[i].push(await window(r));
    const med = runs.map((rs) => ({
      rps: median(rs.map((x) => x.rps)),
      p50: median(rs.map((x) => x.p50)),
      p99: median(rs.map((x) => x.p99)),
      cpu: median(rs.map((x) => x.cpuPerReq)),
      errors: rs.reduce((n, x) => n + x.errors, 0),
    }));
    const bare = med[0];
    for (const [i, r] of rungs.entries()) {
      const m = med[i];
      const targets = { 6: [0.5, Infinity], 7: [0.35, 60] }[i];
      const ratio = m.rps / bare.rps;
      emitRow({
        benchmark: `ladder ${i}: ${r.label}`,
        baseline: `${fmt(bare.rps)} req/s, ${fmt(bare.cpu)} µs CPU`,
        product: `${fmt(m.rps)} req/s, p50 ${m.p50} / p99 ${m.p99} ms, ${fmt(m.cpu)} µs CPU/req${m.errors ? `, ${m.errors} errors` : ''}`,
        ratio: ratio.toFixed(2),
        target: targets ? `≥ ${targets[0]}×${targets[1] < Infinity ? `, p99 ≤ ${targets[1]} ms` : ''}, no errors` : '—',
        met: targets ? ratio >= targets[0] && m.p99 <= targets[1] && m.errors === 0 : null,
      });
    }
    console.log(`ladder: medians of ${ROUNDS} interleaved rounds of ${SECONDS} s; per-round figures:`);
    for (const [i, r] of rungs.entries()) console.log(`  ${r.label}: ${runs[i].map((x) => `${fmt(x.rps)} req/s ${fmt(x.cpuPerReq)} µs`).join(' | ')}`);
  } finally {
    for (const c of servers) c.kill();
    await api.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
