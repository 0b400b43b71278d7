import type { Readable } from 'node:stream';

/** What a write returns; the SHA-256 (FIPS 180-4) is computed while the bytes stream through. */
export interface StoredObject {
  key: string;
  bytes: number;
  sha256: string;
}

/** An inclusive byte range, as in an HTTP `Range: bytes=start-end` (RFC 9110 §14.1.2). */
export interface ByteRange {
  start: number;
  end: number;
}

export interface ListedObject {
  key: string;
  bytes: number;
  modifiedAt: Date;
}

export interface PutOptions {
  /** Originals are written once and then made read-only. */
  immutable?: boolean;
}

export interface AdoptOptions extends PutOptions {
  /** The SHA-256 (hex) already computed while the file was written (a tus upload); the file is then not read again. */
  sha256?: string;
}

/**
 * Where media files live. Keys are opaque, built by the caller from ids only (never
 * from an uploaded file name). The local-disk implementation is the default; an
 * S3-compatible one (`STORAGE=s3`) implements the same calls. Reads are streams that
 * may start anywhere: `createReadStream(key, range)` is how HTTP Range answers are served.
 */
export interface Storage {
  put(key: string, source: Readable, opts?: PutOptions): Promise<StoredObject>;
  /**
   * Takes over a finished local temp file (multer or tus wrote it). Disk storage
   * moves it into place and hashes it; a remote store would upload it.
   */
  adoptLocalFile(key: string, path: string, opts?: AdoptOptions): Promise<StoredObject>;
  createReadStream(key: string, range?: ByteRange): Readable;
  stat(key: string): Promise<{ bytes: number } | null>;
  delete(key: string): Promise<void>;
  /** Stored objects whose key starts with `prefix`, by key, with size and last change (backups, their retention, the sweep of originals no row names). */
  list(prefix: string): Promise<ListedObject[]>;
}

export const STORAGE = Symbol('STORAGE');

const KEY_SEGMENT = /^[a-z0-9][a-z0-9_-]*(\.[a-z0-9]+)?$/;

/** Refuses anything but simple lower-case segments, so a key can never climb out of the root. */
export function assertSafeKey(key: string): void {
  const parts = key.split('/');
  if (parts.length < 2 || !parts.every((p) => KEY_SEGMENT.test(p))) throw new Error(`Unsafe storage key: ${key}`);
}
