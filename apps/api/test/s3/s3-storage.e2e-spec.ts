import { createHash, randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { S3Storage } from '../../src/infra/storage';
import { startS3Fake, TEST_BUCKET, type S3Fake } from '../support/s3-fake';

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

/** The S3 store on its own against s3rver: what the media routes rely on, byte for byte. */
describe('S3 storage (against s3rver on loopback)', () => {
  let dir: string;
  let fake: S3Fake;
  let store: S3Storage;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'benchproof-s3-'));
    fake = await startS3Fake(join(dir, 's3'));
    // The smallest part S3 accepts (5 MiB), so an 11 MiB body goes up in three parts.
    store = new S3Storage({
      bucket: TEST_BUCKET,
      region: 'us-east-1',
      endpoint: fake.env.S3_ENDPOINT,
      forcePathStyle: true,
      credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
      partSize: 5 * 1024 * 1024,
    });
  });
  afterAll(async () => {
    await fake.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('stores a multipart body byte for byte and reports its size and SHA-256', async () => {
    const body = randomBytes(11 * 1024 * 1024 + 123);
    const stored = await store.put('originals/1/big', Readable.from([body.subarray(0, 3_000_000), body.subarray(3_000_000)]));
    expect(stored).toEqual({ key: 'originals/1/big', bytes: body.length, sha256: sha256(body) });
    expect(await store.stat('originals/1/big')).toEqual({ bytes: body.length });
    expect(sha256(await buffer(store.createReadStream('originals/1/big')))).toBe(sha256(body));
  });

  it('streams exactly the requested inclusive range (RFC 9110 §14.1.2)', async () => {
    const body = Buffer.from(Array.from({ length: 4096 }, (_, i) => i % 251));
    await store.put('derivatives/1/r-screen.jpg', Readable.from([body]));
    for (const [start, end] of [
      [0, 0],
      [100, 1099],
      [4000, 4095],
    ]) {
      expect(await buffer(store.createReadStream('derivatives/1/r-screen.jpg', { start, end }))).toEqual(body.subarray(start, end + 1));
    }
  });

  it('answers a missing key with null from stat and ENOENT from a read; deleting it twice is fine', async () => {
    expect(await store.stat('originals/1/none')).toBeNull();
    await expect(buffer(store.createReadStream('originals/1/none'))).rejects.toMatchObject({ code: 'ENOENT' });
    await store.put('originals/1/gone', Readable.from([Buffer.from('x')]));
    await store.delete('originals/1/gone');
    await store.delete('originals/1/gone');
    expect(await store.stat('originals/1/gone')).toBeNull();
  });

  it('never overwrites a stored original', async () => {
    await store.put('originals/2/once', Readable.from([Buffer.from('first')]), { immutable: true });
    await expect(store.put('originals/2/once', Readable.from([Buffer.from('second')]), { immutable: true })).rejects.toThrow(/never overwritten/);
    expect((await buffer(store.createReadStream('originals/2/once'))).toString()).toBe('first');
  });

  it('moves a finished local file in once, removing the local copy, and refuses one whose bytes changed', async () => {
    const path = join(dir, 'upload.bin');
    const bytes = randomBytes(70_000);
    writeFileSync(path, bytes);
    expect(await store.adoptLocalFile('originals/3/a', path, { immutable: true, sha256: sha256(bytes) })).toEqual({
      key: 'originals/3/a',
      bytes: bytes.length,
      sha256: sha256(bytes),
    });
    expect(existsSync(path)).toBe(false);
    writeFileSync(path, bytes);
    await expect(store.adoptLocalFile('originals/3/b', path, { sha256: sha256(Buffer.from('other')) })).rejects.toThrow(/changed/);
    expect(await store.stat('originals/3/b')).toBeNull();
  });

  it('lists the objects under a prefix with their sizes', async () => {
    await store.put('backups/2026-01-01t00-00-00z/manifest.json', Readable.from([Buffer.from('{}')]));
    await store.put('backups/2026-01-02t00-00-00z/manifest.json', Readable.from([Buffer.from('{ }')]));
    expect((await store.list('backups/')).map(({ key, bytes }) => ({ key, bytes }))).toEqual([
      { key: 'backups/2026-01-01t00-00-00z/manifest.json', bytes: 2 },
      { key: 'backups/2026-01-02t00-00-00z/manifest.json', bytes: 3 },
    ]);
  });
});
