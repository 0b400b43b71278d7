import Database from 'better-sqlite3';
import { type ChildProcess, spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import { REPO_ROOT } from '../../src/config';
import { filesUnder } from '../media/media-fixtures';
import { DEMO } from '../test-app';
import { bookIn } from './records-helpers';

const ENTRY = resolve(REPO_ROOT, 'dist/apps/api/apps/api/src/main.js');
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function freePort(): Promise<number> {
  return new Promise((done) => {
    const srv = createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => done(port));
    });
  });
}

/** Polls until `check` returns a value (not undefined), or fails with `what` after `ms`. */
async function until<T>(what: string, check: () => T | undefined | Promise<T | undefined>, ms = 90_000, every = 50): Promise<T> {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    const v = await check();
    if (v !== undefined) return v;
    await sleep(every);
  }
  throw new Error(`Timed out waiting for ${what}`);
}

describe('a server killed with SIGKILL during a derivative task', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-kill-'));
  const uploads = join(dir, 'uploads');
  let child: ChildProcess | null = null;
  let output = '';
  let port = 0;
  const base = () => `http://127.0.0.1:${port}`;

  /** The built API (npm run build) as its own process, with a short lease so the restart takes the task back quickly. */
  async function boot(): Promise<ChildProcess> {
    const env = {
      ...process.env,
      PORT: String(port),
      DATABASE_PATH: join(dir, 'db.sqlite'),
      UPLOADS_DIR: uploads,
      WEB_DIST: join(dir, 'no-web'),
      LOGIN_THROTTLE_LIMIT: '1000',
      MAIL_CATCHER: 'false',
      LOG_LEVEL: 'warn',
      TASK_LEASE_MS: '1500',
      TASK_POLL_MS: '200',
    };
    const proc = spawn(process.execPath, [ENTRY], { env, stdio: ['ignore', 'pipe', 'pipe'] });
    proc.stdout?.on('data', (d) => (output += String(d)));
    proc.stderr?.on('data', (d) => (output += String(d)));
    await until('readiness', async () => ((await fetch(`${base()}/api/health/ready`).catch(() => null))?.ok ? true : undefined), 120_000, 200);
    return proc;
  }

  const db = () => new Database(join(dir, 'db.sqlite'), { readonly: true, fileMustExist: true });
  const query = <T>(sql: string, ...args: unknown[]): T[] => {
    const c = db();
    try {
      return c.prepare(sql).all(...args) as T[];
    } finally {
      c.close();
    }
  };

  afterAll(async () => {
    child?.kill('SIGTERM');
    await sleep(500);
    rmSync(dir, { recursive: true, force: true });
  });

  it('runs the task again after restart: the asset is ready, with one file per variant and no partial files', async () => {
    try {
      await killAndRestart();
    } catch (err) {
      (err as Error).message += `\n--- server output ---\n${output.slice(-3000)}`;
      throw err;
    }
  }, 300_000);

  async function killAndRestart(): Promise<void> {
    expect(existsSync(ENTRY), `${ENTRY} missing: npm run build first`).toBe(true);
    port = await freePort();
    child = await boot();
    // Let the demo seed's own derivative tasks finish first.
    await until('seed derivatives', () =>
      query<{ n: number }>("select count(*) n from tasks where kind = 'media.derivatives' and status in ('queued','running')")[0].n === 0 ? true : undefined,
    );

    const agent = request.agent(base());
    const login = await agent.post('/api/auth/login').send({ email: DEMO.mechanic, password: 'bench-demo-2026' }).expect(200);
    agent.set('x-csrf-token', login.body.csrfToken as string);
    const desk = request.agent(base());
    const deskLogin = await desk.post('/api/auth/login').send({ email: DEMO.desk, password: 'bench-demo-2026' }).expect(200);
    desk.set('x-csrf-token', deskLogin.body.csrfToken as string);
    const job = await bookIn({ agent: desk, csrf: deskLogin.body.csrfToken as string, user: deskLogin.body.user });
    // A 35-megapixel noisy photo: slow enough to resize that the task is caught running.
    const photo = await sharp({ create: { width: 7000, height: 5000, channels: 3, background: '#808080', noise: { type: 'gaussian', mean: 128, sigma: 40 } } })
      .jpeg({ quality: 70 })
      .toBuffer();
    const asset = (
      await agent.post(`/api/jobs/${job.id}/media`).field('phase', 'before').field('area', 'frame_fork').attach('files', photo, 'big.jpg').expect(201)
    ).body.assets[0] as { id: number };

    const key = String(asset.id);
    await until(
      'the task to run',
      () =>
        query<{ status: string }>("select status from tasks where kind = 'media.derivatives' and key = ?", key)[0]?.status === 'running' ? true : undefined,
      60_000,
      5,
    );
    child.kill('SIGKILL');
    await new Promise((r) => child?.once('exit', r));
    const [killed] = query<{ status: string; attempts: number }>("select status, attempts from tasks where kind = 'media.derivatives' and key = ?", key);
    expect(killed).toEqual({ status: 'running', attempts: 1 });
    expect(query<{ s: string }>('select derivative_status s from media_assets where id = ?', asset.id)[0].s).toBe('pending');

    child = await boot();
    await until('the asset to be ready', () =>
      query<{ s: string }>('select derivative_status s from media_assets where id = ?', asset.id)[0].s === 'ready' ? true : undefined,
    );
    const [task] = query<{ status: string; attempts: number }>("select status, attempts from tasks where kind = 'media.derivatives' and key = ?", key);
    expect(task).toEqual({ status: 'done', attempts: 2 });

    const rows = query<{ variant: string; key: string; sha256: string }>(
      'select variant, key, sha256 from media_derivatives where asset_id = ? order by variant',
      asset.id,
    );
    expect(rows.map((r) => r.variant)).toEqual(['print', 'screen', 'thumb']);
    const shopDir = join(uploads, 'derivatives', rows[0].key.split('/')[1]);
    expect(
      readdirSync(shopDir)
        .filter((f) => f.startsWith(`${asset.id}-`))
        .sort(),
    ).toEqual([`${asset.id}-print.jpg`, `${asset.id}-screen.jpg`, `${asset.id}-thumb.jpg`]);
    expect(filesUnder(uploads).filter((f) => f.endsWith('.partial'))).toEqual([]);
    for (const r of rows)
      expect(
        createHash('sha256')
          .update(readFileSync(join(uploads, r.key)))
          .digest('hex'),
      ).toBe(r.sha256);
    const screen = await agent.get(`/api/media/${asset.id}/screen`).expect(200);
    expect(screen.headers['content-type']).toBe('image/jpeg');
  }
});
