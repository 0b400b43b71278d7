import { createReadStream, createWriteStream } from 'node:fs';
import { chmod, mkdir, readdir, rename, rm, stat, unlink } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { hashFile, hashing } from './hashing';
import { assertSafeKey, type AdoptOptions, type ByteRange, type ListedObject, type PutOptions, type Storage, type StoredObject } from './storage';

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

  async list(prefix: string): Promise<ListedObject[]> {
    const out: ListedObject[] = [];
    const walk = async (dir: string, rel: string): Promise<void> => {
      for (const e of await readdir(dir, { withFileTypes: true }).catch(() => [])) {
        const key = rel ? `${rel}/${e.name}` : e.name;
        if (e.isDirectory()) await walk(join(dir, e.name), key);
        else if (key.startsWith(prefix) && !e.name.endsWith('.partial')) {
          const st = await stat(join(dir, e.name)).catch(() => null);
          if (st) out.push({ key, bytes: st.size, modifiedAt: st.mtime });
        }
      }
    };
    // Only the folder the prefix names is walked (tmp/ and tus/ hold no stored objects).
    const folder = prefix.includes('/') ? prefix.slice(0, prefix.lastIndexOf('/')) : '';
    await walk(join(this.root, ...folder.split('/').filter(Boolean)), folder);
    return out.sort((a, b) => a.key.localeCompare(b.key));
  }
}
