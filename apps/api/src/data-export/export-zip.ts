import type { ExportManifest } from '@benchproof/contracts';
import type Database from 'better-sqlite3';
import { Readable } from 'node:stream';
import { ZipFile } from 'yazl';
import { hashing, type Storage } from '../infra/storage';
import { exportQueries, type ExportScope } from './export-scope';

const EXT: Record<string, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'image/heic': 'heic',
  'video/mp4': 'mp4',
  'video/quicktime': 'mov',
  'video/webm': 'webm',
};

/** A table's rows as one JSON document, produced row by row (SQLite's iterate), so a large table is never held in memory. */
function* tableJson(db: Database.Database, q: ReturnType<typeof exportQueries>[number]): Generator<Buffer> {
  yield Buffer.from(`{"table":${JSON.stringify(q.table)},"columns":${JSON.stringify(q.columns)},"rows":[`);
  let first = true;
  let batch: string[] = [];
  for (const row of db.prepare(q.sql).iterate(...q.params) as Iterable<Record<string, unknown>>) {
    batch.push((first ? '\n' : ',\n') + JSON.stringify(row, (_k, v: unknown) => (Buffer.isBuffer(v) ? v.toString('base64') : v)));
    first = false;
    if (batch.length >= 200) {
      yield Buffer.from(batch.join(''));
      batch = [];
    }
  }
  yield Buffer.from(`${batch.join('')}\n]}\n`);
}

/** Opens the stored file only when the zip reaches it (one open file at a time, whatever the shop's size). */
async function* lazy(open: () => Readable): AsyncGenerator<Buffer> {
  yield* open() as AsyncIterable<Buffer>;
}

/**
 * Streams a zip of `data/<table>.json` for every record table in scope, each original photo and
 * video (`media/`), each issued report (`reports/`), and `manifest.json` last with the SHA-256 of
 * every entry, hashed as it goes into the zip. Entries are stored (no deflate: photos and PDFs do
 * not shrink) and pulled one at a time at the pace the client reads.
 */
export function exportZip(db: Database.Database, storage: Storage, scope: ExportScope, now: Date): Readable {
  const zip = new ZipFile();
  const files: ExportManifest['files'] = [];
  const add = (path: string, source: Iterable<Buffer> | AsyncIterable<Buffer>) => {
    const { tap, result } = hashing();
    const stream = Readable.from(source).pipe(tap);
    stream.once('end', () => files.push({ path, ...result() }));
    zip.addReadStream(stream, path, { compress: false, mtime: now });
  };
  const queries = exportQueries(db, scope);
  for (const q of queries) add(`data/${q.table}.json`, tableJson(db, q));
  const assets = queries.find((q) => q.table === 'media_assets');
  const reports = queries.find((q) => q.table === 'reports');
  if (assets) {
    const sql = `SELECT id, original_key AS key, mime FROM (${assets.sql.replace(/^SELECT .*? FROM/, 'SELECT * FROM')}) WHERE original_key IS NOT NULL`;
    for (const a of db.prepare(sql).iterate(...assets.params) as Iterable<{ id: number; key: string; mime: string }>)
      add(
        `media/${a.id}.${EXT[a.mime] ?? 'bin'}`,
        lazy(() => storage.createReadStream(a.key)),
      );
  }
  if (reports) {
    const sql = `SELECT id, job_id, version, storage_key AS key FROM (${reports.sql.replace(/^SELECT .*? FROM/, 'SELECT * FROM')}) WHERE kind = 'issued' AND storage_key IS NOT NULL`;
    for (const r of db.prepare(sql).iterate(...reports.params) as Iterable<{ id: number; job_id: number; version: number; key: string }>)
      add(
        `reports/job-${r.job_id}-v${r.version}-${r.id}.pdf`,
        lazy(() => storage.createReadStream(r.key)),
      );
  }
  const manifest = function* (): Generator<Buffer> {
    // yazl writes entries in order, so every file above has been hashed by the time this one is read.
    const m: ExportManifest = {
      format: 1,
      scope: scope.kind,
      shopId: scope.shopId,
      customerId: scope.kind === 'customer' ? scope.customerId : null,
      createdAt: now.toISOString(),
      files,
    };
    yield Buffer.from(JSON.stringify(m, null, 1));
  };
  zip.addReadStream(Readable.from(manifest()), 'manifest.json', { compress: false, mtime: now });
  zip.end();
  return zip.outputStream as Readable;
}
