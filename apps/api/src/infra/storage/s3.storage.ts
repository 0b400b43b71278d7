import type { S3Client, S3ClientConfig } from '@aws-sdk/client-s3';
import { createReadStream } from 'node:fs';
import { rm } from 'node:fs/promises';
import { Readable } from 'node:stream';
import { hashing } from './hashing';
import { assertSafeKey, type AdoptOptions, type ByteRange, type ListedObject, type PutOptions, type Storage, type StoredObject } from './storage';

type S3Sdk = typeof import('@aws-sdk/client-s3') & typeof import('@aws-sdk/lib-storage');
let sdk: S3Sdk | undefined;
/** The AWS SDK, loaded when a bucket is configured (STORAGE=s3), not at every boot: about 22 MB resident (issue 22). */
function s3(): S3Sdk {
  /* eslint-disable @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above */
  return (sdk ??= {
    ...(require('@aws-sdk/client-s3') as typeof import('@aws-sdk/client-s3')),
    ...(require('@aws-sdk/lib-storage') as typeof import('@aws-sdk/lib-storage')),
  });
  /* eslint-enable @typescript-eslint/no-require-imports */
}

export interface S3StorageOptions {
  bucket: string;
  region: string;
  /** An S3-compatible endpoint (MinIO, Ceph, a local fake); unset = AWS itself. */
  endpoint?: string;
  /** `bucket` in the path instead of the host name; most self-hosted S3-compatible stores need it. */
  forcePathStyle: boolean;
  /** Static keys; unset = the SDK's default chain (environment, shared files, instance role). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
  /** Multipart part size; 8 MiB × 10,000 parts covers 78 GiB, far above the largest video allowed. */
  partSize?: number;
}

/** Anything the SDK throws for a key that is not there, as a Node-style ENOENT so callers treat both stores alike. */
function notThere(err: unknown): boolean {
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e.name === 'NoSuchKey' || e.name === 'NotFound' || e.$metadata?.httpStatusCode === 404;
}

function enoent(key: string): NodeJS.ErrnoException {
  return Object.assign(new Error(`No stored object ${key}`), { code: 'ENOENT' });
}

/**
 * Media in an S3-compatible bucket. Writes go through lib-storage's `Upload` (one PUT for small
 * bodies, multipart above `partSize`, at most `queueSize` parts in memory); reads are streamed
 * GetObject calls, with the HTTP Range passed through for partial answers. Originals are written
 * once under a fresh key and a second write of an existing original is refused here; in the bucket
 * itself versioning or object lock (DEVELOPERS.md) is what really keeps them from being overwritten.
 */
export class S3Storage implements Storage {
  private readonly client: S3Client;

  constructor(private readonly opts: S3StorageOptions) {
    const config: S3ClientConfig = {
      region: opts.region,
      forcePathStyle: opts.forcePathStyle,
      // Checksums only where S3 requires them: several S3-compatible stores reject the newer default trailers.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    };
    if (opts.endpoint) config.endpoint = opts.endpoint;
    if (opts.credentials) config.credentials = opts.credentials;
    this.client = new (s3().S3Client)(config);
  }

  async put(key: string, source: Readable, opts: PutOptions = {}): Promise<StoredObject> {
    assertSafeKey(key);
    if (opts.immutable) await this.refuseExisting(key);
    const { tap, result } = hashing();
    source.on('error', (err) => tap.destroy(err));
    await this.upload(key, source.pipe(tap));
    return { key, ...result() };
  }

  async adoptLocalFile(key: string, path: string, opts: AdoptOptions = {}): Promise<StoredObject> {
    assertSafeKey(key);
    if (opts.immutable) await this.refuseExisting(key);
    const { tap, result } = hashing();
    const file = createReadStream(path);
    file.on('error', (err) => tap.destroy(err));
    await this.upload(key, file.pipe(tap));
    const stored = result();
    if (opts.sha256 && opts.sha256 !== stored.sha256) {
      // The bytes changed between the upload's own hash and this copy: keep nothing, let the caller refuse it.
      await this.delete(key);
      throw new Error(`Upload changed on its way into storage: ${key}`);
    }
    await rm(path, { force: true });
    return { key, ...stored };
  }

  createReadStream(key: string, range?: ByteRange): Readable {
    assertSafeKey(key);
    const abort = new AbortController();
    let body: Readable | null = null;
    let requested = false;
    const request = (out: Readable) => {
      requested = true;
      const input = { Bucket: this.opts.bucket, Key: key, Range: range ? `bytes=${range.start}-${range.end}` : undefined };
      this.client.send(new (s3().GetObjectCommand)(input), { abortSignal: abort.signal }).then(
        (res) => {
          if (range && !res.ContentRange?.startsWith(`bytes ${range.start}-`)) {
            out.destroy(new Error(`Storage ignored the range of ${key}: ${res.ContentRange ?? 'whole object'}`));
            return;
          }
          body = res.Body as Readable;
          // At most the bytes asked for: some S3-compatible servers answer `bytes=0-0` with more (s3rver sends all).
          let left = range ? range.end - range.start + 1 : Infinity;
          body.on('data', (chunk: Buffer) => {
            if (left <= 0) return;
            const part = chunk.length > left ? chunk.subarray(0, left) : chunk;
            left -= part.length;
            if (left <= 0) {
              out.push(part);
              out.push(null);
              body?.destroy();
            } else if (!out.push(part)) body?.pause();
          });
          body.once('end', () => {
            if (left > 0) out.push(null);
          });
          body.once('error', (err) => out.destroy(err));
        },
        (err: unknown) => out.destroy(notThere(err) ? enoent(key) : (err as Error)),
      );
    };
    // The request starts on the first read, so a stream made and never read costs nothing.
    return new Readable({
      read() {
        if (body) body.resume();
        else if (!requested) request(this);
      },
      destroy(err, done) {
        abort.abort();
        body?.destroy();
        done(err);
      },
    });
  }

  async stat(key: string): Promise<{ bytes: number } | null> {
    assertSafeKey(key);
    try {
      const head = await this.client.send(new (s3().HeadObjectCommand)({ Bucket: this.opts.bucket, Key: key }));
      return { bytes: head.ContentLength ?? 0 };
    } catch (err) {
      if (notThere(err)) return null;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    assertSafeKey(key);
    // DeleteObject of a missing key succeeds, like the disk store's ENOENT-tolerant unlink.
    await this.client.send(new (s3().DeleteObjectCommand)({ Bucket: this.opts.bucket, Key: key }));
  }

  async list(prefix: string): Promise<ListedObject[]> {
    const out: ListedObject[] = [];
    let token: string | undefined;
    do {
      const page = await this.client.send(new (s3().ListObjectsV2Command)({ Bucket: this.opts.bucket, Prefix: prefix, ContinuationToken: token }));
      for (const o of page.Contents ?? []) if (o.Key) out.push({ key: o.Key, bytes: o.Size ?? 0, modifiedAt: o.LastModified ?? new Date(0) });
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
    return out.sort((a, b) => a.key.localeCompare(b.key));
  }

  private async upload(key: string, body: Readable): Promise<void> {
    const partSize = this.opts.partSize ?? 8 * 1024 * 1024;
    await new (s3().Upload)({ client: this.client, params: { Bucket: this.opts.bucket, Key: key, Body: body }, partSize, queueSize: 2 }).done();
  }

  private async refuseExisting(key: string): Promise<void> {
    if (await this.stat(key)) throw new Error(`Stored originals are never overwritten: ${key}`);
  }
}
