import { createHash } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { chmod, mkdir, readdir, rename, rm, stat, unlink } from 'node:fs/promises';
import { dirname, join, relative, sep } from 'node:path';
import { type Readable, Transform } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { assertSafeKey, type AdoptOptions, type ByteRange, type PutOptions, type Storage, type StoredObject } from './storage';

/** Streams the bytes through a SHA-256 and a counter on their way to `sink`. */
function hashing(): { tap: Transform; result: () => { bytes: number; sha256: string } } {
  const hash = createHash('sha256');
  let bytes = 0;
  const tap = new Transform({
    transform(chunk: Buffer, _enc, done) {
      hash.update(chunk);
      bytes += chunk.length;
      done(null, chunk);
    },
  });
  return { tap, result: () => ({ bytes, sha256: hash.digest('hex') }) };
}

async function hashFile(path: string): Promise<{ bytes: number; sha256: string }> {
  const hash = createHash('sha256');
  let bytes = 0;
  for await (const chunk of createReadStream(path) as AsyncIterable<Buffer>) {
    hash.update(chunk);
    bytes += chunk.length;
  }
  return { bytes, sha256: hash.digest('hex') };
}

/** Media files under one root folder (cfg.UPLOADS_DIR); nothing here is served statically. */
export class LocalDiskStorage implements Storage {
  constructor(private readonly root: string) {}

  private path(key: string): string {
    assertSafeKey(key);
    return join(this.root, ...key.split('/'));
  }

  async put(key: string, source: Readable, opts: PutOptions = {}): Promise<StoredObject> {
    const target = this.path(key);
    await mkdir(dirname(target), { recursive: true });
    const partial = `${target}.partial`;
    const { tap, result } = hashing();
    try {
      // 'w', not 'wx': a .partial left by a killed process must not block the re-run of the same key.
      await pipeline(source, tap, createWriteStream(partial, { flags: 'w' }));
      await rename(partial, target);
    } catch (err) {
      await rm(partial, { force: true });
      throw err;
    }
    if (opts.immutable) await chmod(target, 0o444);
    return { key, ...result() };
  }

  async adoptLocalFile(key: string, path: string, opts: AdoptOptions = {}): Promise<StoredObject> {
    const target = this.path(key);
    await mkdir(dirname(target), { recursive: true });
    const { bytes, sha256 } = opts.sha256 ? { bytes: (await stat(path)).size, sha256: opts.sha256 } : await hashFile(path);
    await rename(path, target);
    if (opts.immutable) await chmod(target, 0o444);
    return { key, bytes, sha256 };
  }

  createReadStream(key: string, range?: ByteRange): Readable {
    return createReadStream(this.path(key), range ? { start: range.start, end: range.end } : {});
  }

  async stat(key: string): Promise<{ bytes: number } | null> {
    try {
      return { bytes: (await stat(this.path(key))).size };
    } catch {
      return null;
    }
  }

  async delete(key: string): Promise<void> {
    const target = this.path(key);
    // Read-only originals can still be unlinked: deletion needs write access to the folder, not the file.
    await unlink(target).catch((err: NodeJS.ErrnoException) => {
      if (err.code !== 'ENOENT') throw err;
    });
  }

  async *listKeys(prefix: string): AsyncIterable<{ key: string; modifiedAt: Date }> {
    const entries = await readdir(join(this.root, ...prefix.split('/').filter(Boolean)), { recursive: true, withFileTypes: true }).catch(() => []);
    for (const e of entries) {
      if (!e.isFile() || e.name.endsWith('.partial')) continue;
      const path = join(e.parentPath, e.name);
      const modifiedAt = await stat(path).then(
        (st) => st.mtime,
        () => null,
      );
      if (modifiedAt) yield { key: relative(this.root, path).split(sep).join('/'), modifiedAt };
    }
  }
}
