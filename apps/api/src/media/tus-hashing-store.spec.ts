import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { HashingFileStore } from './tus-hashing-store';

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const ID = 'a'.repeat(32);

describe('HashingFileStore', () => {
  let dir: string;
  let store: HashingFileStore;
  beforeEach(() => {
    dir = mkdtempSync(join(tmpdir(), 'tus-hash-'));
    store = new HashingFileStore({ directory: dir });
    writeFileSync(join(dir, ID), '');
  });
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('gives the SHA-256 of an upload sent in two PATCHes, equal to hashing the stored file', async () => {
    const body = Buffer.from('0123456789'.repeat(1000));
    expect(await store.write(Readable.from([body.subarray(0, 4000)]), ID, 0)).toBe(4000);
    expect(await store.write(Readable.from([body.subarray(4000)]), ID, 4000)).toBe(body.length);
    expect(readFileSync(join(dir, ID)).equals(body)).toBe(true);
    expect(store.digestOf(ID, body.length)).toBe(sha256(body));
  });

  it('has no digest when the hashed bytes do not cover the whole file (resumed after a restart)', async () => {
    writeFileSync(join(dir, ID), 'abc');
    await store.write(Readable.from([Buffer.from('def')]), ID, 3);
    expect(readFileSync(join(dir, ID), 'utf8')).toBe('abcdef');
    expect(store.digestOf(ID, 6)).toBeNull();
  });

  it('has no digest for a size other than the bytes it hashed', async () => {
    await store.write(Readable.from([Buffer.from('abc')]), ID, 0);
    expect(store.digestOf(ID, 4)).toBeNull();
  });
});
