import Database from 'better-sqlite3';
import { randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream, existsSync } from 'node:fs';
import { mkdir, rename, rm } from 'node:fs/promises';
import { dirname } from 'node:path';
import { Readable } from 'node:stream';
import { buffer } from 'node:stream/consumers';
import { pipeline } from 'node:stream/promises';
import { hashing, type Storage } from '../storage';
import { BACKUP_PREFIX, backupId, databaseKey, manifestKey, referencedFiles, type BackupFile, type BackupManifest } from './backup-manifest';

export interface BackupSummary {
  id: string;
  createdAt: string;
  databaseBytes: number;
  files: number;
  fileBytes: number;
}

/**
 * Copies the live database with SQLite's online backup API (better-sqlite3 `backup()`: pages are
 * copied in steps while other connections keep reading and writing; in WAL mode the copy is one
 * consistent snapshot), then stores the copy and a manifest of the files it refers to.
 * `scratchDir` is a local folder on the same disk as the database for the temporary copy.
 */
export async function writeBackup(live: Database.Database, storage: Storage, now: Date, scratchDir: string): Promise<BackupManifest> {
  const id = backupId(now);
  const tmp = `${scratchDir}/backup-${randomUUID()}.sqlite.partial`;
  await mkdir(scratchDir, { recursive: true });
  try {
    await live.backup(tmp);
    const copy = new Database(tmp, { readonly: true });
    let files: BackupFile[];
    try {
      files = referencedFiles(copy);
    } finally {
      copy.close();
    }
    const db = await storage.put(databaseKey(id), createReadStream(tmp));
    const manifest: BackupManifest = { format: 1, id, createdAt: now.toISOString(), database: db, files };
    // The manifest goes last: a backup without one was cut off and is neither listed nor restored.
    await storage.put(manifestKey(id), Readable.from([Buffer.from(JSON.stringify(manifest, null, 1))]));
    return manifest;
  } finally {
    await rm(tmp, { force: true });
  }
}

export async function readManifest(storage: Storage, id: string): Promise<BackupManifest | null> {
  if (!/^[0-9a-z-]+$/.test(id) || !(await storage.stat(manifestKey(id)))) return null;
  return JSON.parse((await buffer(storage.createReadStream(manifestKey(id)))).toString('utf8')) as BackupManifest;
}

/** Finished backups, newest first. */
export async function listBackups(storage: Storage): Promise<BackupSummary[]> {
  const ids = (await storage.list(BACKUP_PREFIX)).filter((o) => o.key.endsWith('/manifest.json')).map((o) => o.key.split('/')[1]);
  const out: BackupSummary[] = [];
  for (const id of ids.sort().reverse()) {
    const m = await readManifest(storage, id);
    if (!m) continue;
    const fileBytes = m.files.reduce((sum, f) => sum + (f.bytes ?? 0), 0);
    out.push({ id, createdAt: m.createdAt, databaseBytes: m.database.bytes, files: m.files.length, fileBytes });
  }
  return out;
}

/** Keeps the newest `keep` backups and deletes the rest (and any cut-off ones older than the oldest kept). */
export async function pruneBackups(storage: Storage, keep: number): Promise<string[]> {
  const objects = await storage.list(BACKUP_PREFIX);
  const ids = [...new Set(objects.map((o) => o.key.split('/')[1]))].sort().reverse();
  const finished = ids.filter((id) => objects.some((o) => o.key === manifestKey(id)));
  const oldestKept = finished[Math.min(keep, finished.length) - 1];
  const drop = ids.filter((id) => (finished.includes(id) ? finished.indexOf(id) >= keep : oldestKept !== undefined && id < oldestKept));
  for (const o of objects) if (drop.includes(o.key.split('/')[1])) await storage.delete(o.key);
  return drop;
}

export interface RestoreResult {
  manifest: BackupManifest;
  /** Referenced files not in storage, or whose SHA-256 differs (empty on a good restore). */
  missing: string[];
  mismatched: string[];
}

/**
 * Brings a database back from a backup onto `databasePath` (which must not exist, unless `force`),
 * after checking the copy's SHA-256 and, unless `quick`, the SHA-256 of every file it refers to.
 */
export async function restoreBackup(
  storage: Storage,
  id: string,
  databasePath: string,
  opts: { force?: boolean; quick?: boolean } = {},
): Promise<RestoreResult> {
  const manifest = await readManifest(storage, id);
  if (!manifest) throw new Error(`No finished backup ${id} in storage`);
  if ((existsSync(databasePath) || existsSync(`${databasePath}-wal`)) && !opts.force)
    throw new Error(`${databasePath} exists; restore onto a fresh folder or pass --force`);
  await mkdir(dirname(databasePath), { recursive: true });
  const tmp = `${databasePath}.restoring`;
  const { tap, result } = hashing();
  await pipeline(storage.createReadStream(manifest.database.key), tap, createWriteStream(tmp));
  if (result().sha256 !== manifest.database.sha256) {
    await rm(tmp, { force: true });
    throw new Error(`The database copy of backup ${id} does not match its manifest`);
  }
  const { missing, mismatched } = await checkFiles(storage, manifest.files, opts.quick ?? false);
  await Promise.all(['-wal', '-shm'].map((s) => rm(`${databasePath}${s}`, { force: true })));
  await rename(tmp, databasePath);
  return { manifest, missing, mismatched };
}

async function checkFiles(storage: Storage, files: BackupFile[], quick: boolean): Promise<{ missing: string[]; mismatched: string[] }> {
  const missing: string[] = [];
  const mismatched: string[] = [];
  for (const f of files) {
    const stat = await storage.stat(f.key);
    if (!stat) missing.push(f.key);
    else if (f.bytes !== null && stat.bytes !== f.bytes) mismatched.push(f.key);
    else if (!quick) {
      const { tap, result } = hashing();
      await pipeline(storage.createReadStream(f.key), tap, async (source: AsyncIterable<Buffer>) => {
        for await (const chunk of source) void chunk;
      });
      if (result().sha256 !== f.sha256) mismatched.push(f.key);
    }
  }
  return { missing, mismatched };
}
