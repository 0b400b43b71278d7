import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { derivativesSettled, filesUnder } from '../media/media-fixtures';
import { DEMO, startTestApp } from '../test-app';

const sha = (path: string) => createHash('sha256').update(readFileSync(path)).digest('hex');

/** A tus upload as @tus/file-store keeps it: the bytes and a JSON sidecar with its creation date. */
function tusUpload(dir: string, id: string, created: Date, size: number, offset: number): void {
  writeFileSync(join(dir, id), Buffer.alloc(offset, 1));
  writeFileSync(join(dir, `${id}.json`), JSON.stringify({ id, size, offset, metadata: { shopId: '1' }, creation_date: created.toISOString() }));
}

describe('no leftovers after a crash (storage sweep at boot and on its interval)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'benchproof-sweep-'));
  const env = { DATABASE_PATH: join(dir, 'db.sqlite'), UPLOADS_DIR: join(dir, 'uploads') };
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('removes partial, temp and expired resumable files on restart and keeps every stored file byte-identical', async () => {
    const first = await startTestApp(env);
    await derivativesSettled(first);
    const uploads = env.UPLOADS_DIR;
    const stored = filesUnder(uploads).filter((f) => f.startsWith('/originals/') || f.startsWith('/derivatives/'));
    expect(stored.length).toBeGreaterThan(10);
    const before = new Map(stored.map((f) => [f, sha(join(uploads, f))]));
    await first.close();

    // What a SIGKILL leaves: a derivative cut off before its rename, multer temp files, a tus upload abandoned 2 days ago.
    mkdirSync(join(uploads, 'derivatives/1'), { recursive: true });
    writeFileSync(join(uploads, 'derivatives/1/999-screen.jpg.partial'), Buffer.alloc(5000, 7));
    writeFileSync(join(uploads, 'originals/1/0b7c.partial'), Buffer.alloc(300, 7));
    writeFileSync(join(uploads, 'tmp/3f2a9c1e-0000-4000-8000-000000000001'), Buffer.alloc(64 * 1024, 3));
    const tus = join(uploads, 'tus');
    tusUpload(tus, 'a'.repeat(32), new Date(Date.now() - 48 * 3600_000), 10_000, 4000);
    tusUpload(tus, 'b'.repeat(32), new Date(Date.now() - 3600_000), 10_000, 4000);

    const second = await startTestApp(env);
    await derivativesSettled(second);
    expect(existsSync(join(uploads, 'derivatives/1/999-screen.jpg.partial'))).toBe(false);
    expect(existsSync(join(uploads, 'originals/1/0b7c.partial'))).toBe(false);
    expect(filesUnder(join(uploads, 'tmp'))).toEqual([]);
    // 24 h default expiry: the 2-day-old upload is gone, the 1-hour-old one can still resume.
    expect(filesUnder(tus).sort()).toEqual([`/${'b'.repeat(32)}`, `/${'b'.repeat(32)}.json`]);
    const after = filesUnder(uploads).filter((f) => f.startsWith('/originals/') || f.startsWith('/derivatives/'));
    expect(after.sort()).toEqual([...before.keys()].sort());
    for (const [f, hash] of before) expect(sha(join(uploads, f))).toBe(hash);
    const { agent } = await second.signIn(DEMO.manager);
    expect((await agent.get('/api/health/ready').expect(200)).body).toMatchObject({ status: 'ready' });
    await second.close();
  });
});
