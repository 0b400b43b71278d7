import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { connect, createServer, type AddressInfo, type Socket } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DEMO } from '../test-app';
import { solidJpeg } from '../media/media-fixtures';

const root = resolve(__dirname, '../../../..');
const MAIN = join(root, 'dist/apps/api/apps/api/src/main.js');
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

const freePort = () =>
  new Promise<number>((ok) => {
    const srv = createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as AddressInfo;
      srv.close(() => ok(port));
    });
  });

async function until<T>(what: string, probe: () => Promise<T | null | undefined | false>, ms = 20_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await probe().catch(() => null);
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await sleep(100);
  }
}

/** An SMTP hop the test controls: 'stall' holds every connection silent (a relay that never greets), 'pass' forwards to the catcher. */
function smtpHop(target: number) {
  const state = { mode: 'stall' as 'stall' | 'pass', connections: 0 };
  const held: Socket[] = [];
  const server = createServer((client) => {
    state.connections++;
    client.on('error', () => undefined);
    if (state.mode === 'stall') return void held.push(client);
    const up = connect(target, '127.0.0.1');
    up.on('error', () => client.destroy());
    client.pipe(up).pipe(client);
  });
  return { state, server, close: () => (held.forEach((s) => s.destroy()), new Promise((ok) => server.close(ok))) };
}

/**
 * Issue 23 item 4 on a real server process (npm run build first): SIGTERM arrives while a photo is being uploaded
 * and while an e-mail task is running (its relay never answers). The upload finishes within the grace; a new
 * connection is refused; the task's lease is released at the end of the grace, so after a restart the e-mail goes
 * out at once (not after the 60 s lease) and exactly once.
 */
describe('SIGTERM drains the server', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-drain-'));
  const procs: ChildProcess[] = [];
  let hop: ReturnType<typeof smtpHop> | null = null;
  afterAll(async () => {
    procs.forEach((p) => p.exitCode === null && p.kill('SIGKILL'));
    await hop?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('finishes the upload in flight, refuses new connections, and the task runs once after restart', async () => {
    const [port, smtpPort, inboxPort, hopPort] = [await freePort(), await freePort(), await freePort(), await freePort()];
    const catcher = spawn(process.execPath, [join(root, 'apps/api/scripts/mail-catcher.mjs')], {
      env: { ...process.env, MAIL_SMTP_PORT: String(smtpPort), MAIL_HTTP_PORT: String(inboxPort) },
      stdio: 'ignore',
    });
    procs.push(catcher);
    hop = smtpHop(smtpPort);
    await new Promise<void>((ok) => hop!.server.listen(hopPort, '127.0.0.1', ok));
    const base = `http://127.0.0.1:${port}`;
    const env = {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: join(dir, 'db.sqlite'),
      UPLOADS_DIR: join(dir, 'uploads'),
      SMTP_URL: `smtp://127.0.0.1:${hopPort}`,
      MAIL_CATCHER: 'false',
      LOGIN_THROTTLE_LIMIT: '1000',
      LOG_LEVEL: process.env.DRAIN_LOG ? 'info' : 'warn',
      SHUTDOWN_GRACE_MS: '3000',
      TASK_LEASE_MS: '60000',
      BACKUP_EVERY_HOURS: '0',
    };
    const startServer = async () => {
      const p = spawn(process.execPath, [MAIN], { cwd: root, env, stdio: ['ignore', process.env.DRAIN_LOG ? 'inherit' : 'ignore', 'inherit'] });
      procs.push(p);
      await until('the server', async () => (await fetch(`${base}/api/health`)).ok, 120_000);
      return p;
    };
    const signIn = async () => {
      const res = await fetch(`${base}/api/auth/login`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: DEMO.desk, password: 'bench-demo-2026' }),
      });
      const cookie = res.headers
        .getSetCookie()
        .map((c) => c.split(';')[0])
        .join('; ');
      return { cookie, csrf: ((await res.json()) as { csrfToken: string }).csrfToken };
    };

    let server = await startServer();
    const s = await signIn();
    const get = async <T>(path: string) => (await (await fetch(`${base}${path}`, { headers: { cookie: s.cookie } })).json()) as T;
    const jobs = await get<{ items: { id: number; status: string; customer: { id: number } }[] }>('/api/jobs?pageSize=50');
    // An open job whose owner prefers e-mail (an owner who prefers texts gets the link by text instead).
    let job: { id: number } | undefined;
    for (const j of jobs.items.filter((i) => !['collected', 'cancelled'].includes(i.status)))
      if ((await get<{ preferredChannel: string }>(`/api/customers/${j.customer.id}`)).preferredChannel === 'email') {
        job = j;
        break;
      }
    if (!job) throw new Error('the demo has no open job of an owner who prefers e-mail');
    const link = await fetch(`${base}/api/jobs/${job.id}/owner-links`, {
      method: 'POST',
      headers: { cookie: s.cookie, 'x-csrf-token': s.csrf, 'content-type': 'application/json' },
      body: JSON.stringify({ send: true }),
    });
    expect(link.status).toBe(201);
    await until('the e-mail task to reach the relay', () => Promise.resolve(hop!.state.connections >= 1));

    // An upload whose body is half sent when SIGTERM arrives.
    const boundary = 'drain-boundary';
    const head = Buffer.from(
      [
        ['phase', 'before'],
        ['area', 'frame_fork'],
      ]
        .map(([k, v]) => `--${boundary}\r\nContent-Disposition: form-data; name="${k}"\r\n\r\n${v}\r\n`)
        .join('') + `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="drain.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`,
    );
    const body = Buffer.concat([head, await solidJpeg(800, 600), Buffer.from(`\r\n--${boundary}--\r\n`)]);
    const answer = new Promise<{ status: number; body: string }>((ok, fail) => {
      const req = httpRequest(
        `${base}/api/jobs/${job.id}/media`,
        {
          method: 'POST',
          headers: { cookie: s.cookie, 'x-csrf-token': s.csrf, 'content-type': `multipart/form-data; boundary=${boundary}`, 'content-length': body.length },
        },
        (res) => {
          let text = '';
          res.on('data', (d: Buffer) => (text += d.toString()));
          res.on('end', () => ok({ status: res.statusCode ?? 0, body: text }));
        },
      );
      req.on('error', fail);
      req.write(body.subarray(0, body.length >> 1));
      setTimeout(() => {
        server.kill('SIGTERM');
        setTimeout(() => req.end(body.subarray(body.length >> 1)), 800);
      }, 300);
    });
    const exited = new Promise<number | null>((ok) => server.once('exit', (code) => ok(code)));
    await sleep(600);
    // Draining: the listener is closed, so a new connection is refused rather than accepted and dropped.
    await expect(fetch(`${base}/api/health`)).rejects.toThrow();
    const uploaded = await answer;
    expect(uploaded.status).toBe(201);
    const assetId = (JSON.parse(uploaded.body) as { assets: { id: number }[] }).assets[0].id;
    const t0 = Date.now();
    expect(await exited).toBe(0);
    expect(Date.now() - t0).toBeLessThan(10_000);
    expect(hop.state.connections).toBe(1);

    hop.state.mode = 'pass';
    server = await startServer();
    // The released task is taken at once: well inside the 60 s lease it would otherwise wait out.
    const messages = await until(
      'the e-mail in the inbox',
      async () => {
        const list = (await (await fetch(`http://127.0.0.1:${inboxPort}/api/messages`)).json()) as { subject: string }[];
        return list.length > 0 && list;
      },
      20_000,
    );
    await sleep(1500);
    expect(((await (await fetch(`http://127.0.0.1:${inboxPort}/api/messages`)).json()) as unknown[]).length).toBe(1);
    expect(messages).toHaveLength(1);
    const again = await signIn();
    const media = (await (await fetch(`${base}/api/jobs/${job.id}/media`, { headers: { cookie: again.cookie } })).json()) as
      { items?: { id: number }[] } | { id: number }[];
    const ids = (Array.isArray(media) ? media : (media.items ?? [])).map((m) => m.id);
    expect(ids).toContain(assetId);
    const outbox = (await (await fetch(`${base}/api/jobs/${job.id}/messages`, { headers: { cookie: again.cookie } })).json()) as { status: string }[];
    expect(outbox.map((m) => m.status)).toEqual(['sent']);
    server.kill('SIGTERM');
    expect(await new Promise((ok) => server.once('exit', ok))).toBe(0);
  }, 300_000);
});
