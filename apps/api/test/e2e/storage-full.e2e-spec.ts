import { sql } from 'drizzle-orm';
import { execFileSync } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, mkdtempSync, openSync, readdirSync, rmSync, utimesSync, writeFileSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DB, type Db } from '../../src/core/db';
import { MediaSweepService } from '../../src/media/media-sweep.service';
import { bookJob, derivativesSettled, filesUnder, solidJpeg } from '../media/media-fixtures';
import { DEMO, startTestApp, type TestApp } from '../test-app';

/** A small tmpfs of its own, so "disk full" is a real ENOSPC / SQLITE_FULL; null (with the reason) where mounting is not allowed. */
function smallDisk(mb: number): { dir: string; reason: null } | { dir: null; reason: string } {
  if (process.platform !== 'linux' || process.getuid?.() !== 0) return { dir: null, reason: 'needs Linux and root to mount a tmpfs' };
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-full-'));
  try {
    execFileSync('mount', ['-t', 'tmpfs', '-o', `size=${mb}m`, 'tmpfs', dir]);
    return { dir, reason: null };
  } catch (err) {
    rmSync(dir, { recursive: true, force: true });
    return { dir: null, reason: `mount -t tmpfs failed: ${(err as Error).message.split('\n')[0]}` };
  }
}

function unmount(dir: string): void {
  execFileSync('umount', [dir]);
  rmSync(dir, { recursive: true, force: true });
}

/** Writes a filler file until the filesystem refuses another byte. */
function fill(dir: string): string {
  const path = join(dir, 'filler');
  const fd = openSync(path, 'w');
  for (const size of [1024 * 1024, 4096, 1]) {
    const chunk = Buffer.alloc(size, 1);
    try {
      for (;;) writeSync(fd, chunk);
    } catch {
      // ENOSPC at this chunk size: go on with a smaller one to take the last bytes too.
    }
  }
  closeSync(fd);
  return path;
}

const disks = { db: smallDisk(64), uploads: smallDisk(96) };
const skipped = Object.entries(disks).filter(([, d]) => d.dir === null);
for (const [name, d] of skipped) console.warn(`storage-full e2e: skipping the full ${name} disk tests: ${d.reason}`);

const upload = async (t: TestApp, jobId: number, colour: string) => {
  const { agent } = await t.signIn(DEMO.mechanic);
  return agent
    .post(`/api/jobs/${jobId}/media`)
    .field('phase', 'before')
    .field('area', 'drivetrain')
    .attach('files', await solidJpeg(640, 480, colour), 'shot.jpg');
};
const originals = (uploads: string) => filesUnder(uploads).filter((f) => f.startsWith('/originals/'));

describe.skipIf(disks.db.dir === null)('a full database disk', () => {
  const dbDir = disks.db.dir!;
  let t: TestApp;
  let uploads: string;
  let jobId: number;
  beforeAll(async () => {
    uploads = mkdtempSync(join(tmpdir(), 'benchproof-up-'));
    t = await startTestApp({ DATABASE_PATH: join(dbDir, 'test.sqlite'), UPLOADS_DIR: uploads });
    jobId = await bookJob(t);
    await derivativesSettled(t);
  });
  afterAll(async () => {
    await t.close();
    unmount(dbDir);
    rmSync(uploads, { recursive: true, force: true });
  });

  it('answers a photo upload 507 STORAGE_FULL, keeps no original without a row, and takes it once space is back', async () => {
    const mech = await t.signIn(DEMO.mechanic);
    const before = originals(uploads);
    // The write-ahead log keeps its size after a checkpoint; truncate it so the next write must grow the file.
    t.app.get<Db>(DB).all(sql`PRAGMA wal_checkpoint(TRUNCATE)`);
    const filler = fill(dbDir);
    const res = await mech.agent
      .post(`/api/jobs/${jobId}/media`)
      .field('phase', 'before')
      .field('area', 'drivetrain')
      .attach('files', await solidJpeg(640, 480, '#884422'), 'shot.jpg');
    expect(res.status).toBe(507);
    expect(res.body).toMatchObject({ code: 'STORAGE_FULL', message: expect.stringMatching(/disk is full.*manager/i) });
    expect(originals(uploads)).toEqual(before);
    // Reads keep working on a full disk.
    await mech.agent.get(`/api/jobs/${jobId}/media`).expect(200);
    rmSync(filler);
    expect((await upload(t, jobId, '#224488')).status).toBe(201);
    expect(originals(uploads).length).toBe(before.length + 1);
  });
});

describe.skipIf(disks.uploads.dir === null)('a full uploads disk', () => {
  const uploads = disks.uploads.dir!;
  let t: TestApp;
  let jobId: number;
  beforeAll(async () => {
    t = await startTestApp({ UPLOADS_DIR: uploads, SEED_DEMO: 'true' });
    jobId = await bookJob(t);
    await derivativesSettled(t);
  });
  afterAll(async () => {
    await t.close();
    unmount(uploads);
  });

  it('answers photo uploads and resumable starts 507 STORAGE_FULL and leaves no file behind', async () => {
    const before = filesUnder(uploads).sort();
    const filler = fill(uploads);
    const res = await upload(t, jobId, '#448822');
    expect(res.status).toBe(507);
    expect(res.body.code).toBe('STORAGE_FULL');
    const { agent } = await t.signIn(DEMO.mechanic);
    const meta = [
      `jobId ${Buffer.from(String(jobId)).toString('base64')}`,
      `phase ${Buffer.from('before').toString('base64')}`,
      `area ${Buffer.from('drivetrain').toString('base64')}`,
    ];
    // A metadata value large enough that its .json cannot fit in what is left.
    meta.push(`caption ${Buffer.from('x'.repeat(500)).toString('base64')}`);
    const tus = await agent.post('/api/media/tus').set('Tus-Resumable', '1.0.0').set('Upload-Length', '100000').set('Upload-Metadata', meta.join(','));
    expect(tus.status).toBe(507);
    expect(JSON.parse(tus.text)).toMatchObject({ code: 'STORAGE_FULL' });
    expect(
      filesUnder(uploads)
        .filter((f) => f !== '/filler')
        .sort(),
    ).toEqual(before);
    rmSync(filler);
    expect((await upload(t, jobId, '#228844')).status).toBe(201);
  });
});

describe('the storage sweep', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
    await derivativesSettled(t);
  });
  afterAll(() => t.close());

  it('removes originals no row names once past the grace period, never one with a row, and uploads with unreadable metadata', async () => {
    const uploads = t.cfg.UPLOADS_DIR;
    const old = new Date(Date.now() - 3 * 3600_000);
    const named = originals(uploads);
    expect(named.length).toBeGreaterThan(0);
    for (const f of named) utimesSync(join(uploads, f), old, old);
    mkdirSync(join(uploads, 'originals/1'), { recursive: true });
    const orphan = join(uploads, 'originals/1/0f0e0d0c-0000-4000-8000-000000000001');
    const fresh = join(uploads, 'originals/1/0f0e0d0c-0000-4000-8000-000000000002');
    writeFileSync(orphan, Buffer.alloc(2000, 5));
    writeFileSync(fresh, Buffer.alloc(2000, 5));
    utimesSync(orphan, old, old);
    const tusDir = join(uploads, 'tus');
    mkdirSync(tusDir, { recursive: true });
    const broken = 'c'.repeat(32);
    writeFileSync(join(tusDir, broken), '');
    writeFileSync(join(tusDir, `${broken}.json`), '');
    for (const f of [broken, `${broken}.json`]) utimesSync(join(tusDir, f), old, old);

    await t.app.get(MediaSweepService).sweep();

    expect(existsSync(orphan)).toBe(false);
    // Too young to judge: its row may still be committing.
    expect(existsSync(fresh)).toBe(true);
    expect(
      originals(uploads)
        .filter((f) => !f.endsWith('000000000002'))
        .sort(),
    ).toEqual([...named].sort());
    expect(readdirSync(tusDir).filter((f) => f.startsWith(broken))).toEqual([]);
  });
});
