import { FileStore } from '@tus/file-store';
import { ERRORS } from '@tus/utils';
import { createHash, type Hash } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { join } from 'node:path';
import { Transform, type Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';

const UPLOAD_ID = /^[a-f0-9]{32}$/;
/** Bytes buffered towards the disk per upload: a few socket reads go out in one writev instead of one write each. */
const WRITE_BUFFER = 1024 * 1024;
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
    } catch {
      // eslint-disable-next-line @typescript-eslint/only-throw-error -- @tus/server answers its own { status_code, body } errors, as FileStore does
      throw ERRORS.FILE_WRITE_ERROR;
    }
    if (state) this.keep(id, { hash: state.hash, bytes: offset + received });
    return offset + received;
  }

  /** The SHA-256 (hex) of the upload's bytes when all `size` of them went through the running hash; forgets it. */
  digestOf(id: string, size: number): string | null {
    const state = this.running.get(id);
    this.running.delete(id);
    return state && state.bytes === size ? state.hash.digest('hex') : null;
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
