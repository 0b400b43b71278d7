import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { API_ENTRY, type BuiltServer, startTwoProcesses } from './built-server';
import { describeRedis, until } from './redis-suite';

/** The API processes the primary forked (Linux: /proc/<pid>/task/<pid>/children). */
const childrenOf = (pid: number): number[] => readFileSync(`/proc/${pid}/task/${pid}/children`, 'utf8').trim().split(/\s+/).filter(Boolean).map(Number);

describe('WEB_CONCURRENCY without Redis', () => {
  it('refuses to start, saying why', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'benchproof-wc-'));
    const env: Record<string, string | undefined> = {
      ...process.env,
      WEB_CONCURRENCY: '2',
      DATABASE_PATH: join(dir, 'db.sqlite'),
      UPLOADS_DIR: join(dir, 'uploads'),
      PORT: '0',
    };
    delete env.REDIS_URL;
    const proc = spawn(process.execPath, [API_ENTRY], { env, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    proc.stdout.on('data', (d) => (out += String(d)));
    proc.stderr.on('data', (d) => (out += String(d)));
    const code = await new Promise((r) => proc.once('exit', r));
    rmSync(dir, { recursive: true, force: true });
    expect(code).toBe(1);
    expect(out).toContain('BenchProof cannot start: WEB_CONCURRENCY=2 needs REDIS_URL');
  });
});

describeRedis('WEB_CONCURRENCY=2 with Redis', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-wc-'));
  let server: BuiltServer;
  afterAll(async () => {
    await server?.stop();
    rmSync(dir, { recursive: true, force: true });
  });

  it('serves one port from two API processes and replaces one that dies', { timeout: 400_000 }, async () => {
    server = await startTwoProcesses(dir);
    const primary = server.proc.pid!;
    const first = childrenOf(primary);
    expect(first).toHaveLength(2);
    process.kill(first[0], 'SIGKILL');
    const now = await until('a replacement process', () => {
      const c = childrenOf(primary);
      return c.length === 2 && !c.includes(first[0]) ? c : undefined;
    });
    expect(now).toContain(first[1]);
    // Each process warns once at start that there is no built web app; the third warning is the replacement's.
    await until('the replacement to start', () => (server.output().split('No built web app').length - 1 >= 3 ? true : undefined), 180_000, 200);
    const ask = () => fetch(`${server.base}/api/health/ready`, { headers: { connection: 'close' }, signal: AbortSignal.timeout(15_000) }).then((r) => r.status);
    await until('the replacement to answer', () => ask().catch(() => undefined), 60_000, 200);
    // Fresh connections, handed round-robin to both processes by the primary, all answered.
    const answers: number[] = [];
    for (let i = 0; i < 10; i++) answers.push(await ask());
    expect(answers).toEqual(Array(10).fill(200));
  });
});
