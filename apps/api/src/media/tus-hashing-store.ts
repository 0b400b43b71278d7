import { FileStore } from '@tus/file-store';
import { ERROR_CODES } from '@benchproof/contracts';
import { ERRORS, type Upload } from '@tus/utils';
import { createHash, type Hash } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { readdir, readFile, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { Transform, type Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { isStorageFull } from '../core/http';

const UPLOAD_ID = /^[a-f0-9]{32}$/;
/** Bytes buffered towards the disk per upload: a few socket reads go out in one writev instead of one write each. */
const WRITE_BUFFER = 1024 * 1024;
/** What @tus/server answers for a full disk: its own `{ status_code, body }` error, with our JSON body. */
const STORAGE_FULL = {
  status_code: ERROR_CODES.STORAGE_FULL.status,
  body: JSON.stringify({ code: 'STORAGE_FULL', message: ERROR_CODES.STORAGE_FULL.message, details: null }),
};

/** Running hashes kept at most (abandoned uploads fall out first); a missing one only means hashing at the end. */
const MAX_RUNNING = 500;

interface Running {
  hash: Hash;
  /** Bytes hashed so far; equal to the file's length while the hash is usable. */
  bytes: number;
}

/**
 * The tus file store, hashing each upload (SHA-256, FIPS 180-4) while its bytes arrive, so a
 * finished 1 GB video is not read back from disk to hash it. A hash continues only when the
 * next PATCH starts exactly where the hashed bytes end (tus appends only); after a failed write
 * or a restart there is none, and `digestOf` answers null so the caller hashes the file instead.
 */
export class HashingFileStore extends FileStore {
  private readonly running = new Map<string, Running>();

  override async write(readable: Readable, id: string, offset: number): Promise<number> {
    if (!UPLOAD_ID.test(id)) return super.write(readable, id, offset);
    const previous = this.running.get(id);
    this.running.delete(id);
    const state = offset === 0 ? { hash: createHash('sha256'), bytes: 0 } : previous?.bytes === offset ? previous : null;
    let received = 0;
    const tap = new Transform({
      transform(chunk: Buffer, _enc, done) {
        state?.hash.update(chunk);
        received += chunk.length;
        done(null, chunk);
      },
    });
    try {
      await pipeline(readable, tap, createWriteStream(join(this.directory, id), { flags: 'r+', start: offset, highWaterMark: WRITE_BUFFER }));
    } catch (err) {
      // eslint-disable-next-line @typescript-eslint/only-throw-error -- @tus/server answers its own { status_code, body } errors, as FileStore does
      throw isStorageFull(err) ? STORAGE_FULL : ERRORS.FILE_WRITE_ERROR;
    }
    if (state) this.keep(id, { hash: state.hash, bytes: offset + received });
    return offset + received;
  }

  /**
   * A start that fails (a full disk while the empty file or its `.json` is written) leaves
   * nothing behind: neither the expiry nor the sweep could read a broken `.json` to remove it.
   */
  override async create(upload: Upload): Promise<Upload> {
    try {
      return await super.create(upload);
    } catch (err) {
      await Promise.all([rm(join(this.directory, upload.id), { force: true }), rm(join(this.directory, `${upload.id}.json`), { force: true })]);
      throw isStorageFull(err) ? STORAGE_FULL : err;
    }
  }

  /** The SHA-256 (hex) of the upload's bytes when all `size` of them went through the running hash; forgets it. */
  digestOf(id: string, size: number): string | null {
    const state = this.running.get(id);
    this.running.delete(id);
    return state && state.bytes === size ? state.hash.digest('hex') : null;
  }

  /**
   * Uploads whose metadata cannot be read (missing, empty or broken `.json`) and untouched since
   * `olderThan`: tus's own expiry cannot see them, so they would stay for ever. Returns how many went.
   */
  async removeUnreadable(olderThan: Date): Promise<number> {
    const names = await readdir(this.directory).catch(() => [] as string[]);
    const ids = new Set(names.map((n) => n.replace(/\.json$/, '')).filter((id) => UPLOAD_ID.test(id)));
    let removed = 0;
    for (const id of ids) {
      const data = join(this.directory, id);
      const meta = `${data}.json`;
      if (await readableMeta(meta)) continue;
      const times = await Promise.all(
        [data, meta].map((p) =>
          stat(p).then(
            (s) => s.mtime.getTime(),
            () => 0,
          ),
        ),
      );
      if (Math.max(...times) >= olderThan.getTime()) continue;
      await Promise.all([rm(data, { force: true }), rm(meta, { force: true })]);
      this.running.delete(id);
      removed += 1;
    }
    return removed;
  }

  override async remove(id: string): Promise<void> {
    this.running.delete(id);
    return super.remove(id);
  }

  private keep(id: string, state: Running): void {
    this.running.set(id, state);
    if (this.running.size > MAX_RUNNING) this.running.delete(this.running.keys().next().value as string);
  }
}

async function readableMeta(path: string): Promise<boolean> {
  try {
    const parsed: unknown = JSON.parse(await readFile(path, 'utf8'));
    return typeof parsed === 'object' && parsed !== null && 'id' in parsed;
  } catch {
    return false;
  }
}
