#!/usr/bin/env node
// Database backups from the command line, with the same settings as the server (DATABASE_PATH, STORAGE, S3_*,
// BACKUP_KEEP). Run after `npm run build`.
//   npm run backup                      a backup now (the server may be running: SQLite's online backup API)
//   npm run backup -- list              the finished backups, newest first
//   npm run restore -- <id> [--force] [--quick]
//                                       bring DATABASE_PATH back from backup <id>; refuses an existing database unless
//                                       --force; checks the SHA-256 of every stored file it refers to unless --quick
import Database from 'better-sqlite3';
import { createRequire } from 'node:module';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../../..');
const require = createRequire(import.meta.url);
const dist = (p) => require(resolve(root, 'dist/apps/api/apps/api/src', p));
const { loadConfig } = dist('config/index.js');
const { createStorage } = dist('infra/storage/index.js');
const { writeBackup, listBackups, pruneBackups, restoreBackup } = dist('infra/backup/index.js');

const cfg = loadConfig();
const storage = createStorage(cfg);
const [command = 'run', ...rest] = process.argv.slice(2);

if (command === 'run') {
  const live = new Database(cfg.DATABASE_PATH, { fileMustExist: true });
  const m = await writeBackup(live, storage, new Date(), dirname(cfg.DATABASE_PATH));
  live.close();
  const dropped = await pruneBackups(storage, cfg.BACKUP_KEEP);
  console.log(
    `Backup ${m.id}: database ${m.database.bytes} bytes (SHA-256 ${m.database.sha256}), ${m.files.length} stored files listed; ${dropped.length} old backup(s) removed.`,
  );
} else if (command === 'list') {
  for (const b of await listBackups(storage)) console.log(`${b.id}  database ${b.databaseBytes} bytes  ${b.files} files (${b.fileBytes} bytes)`);
} else if (command === 'restore') {
  const id = rest.find((a) => !a.startsWith('--'));
  if (!id) throw new Error('Name the backup: npm run restore -- <id> (see npm run backup -- list)');
  const r = await restoreBackup(storage, id, cfg.DATABASE_PATH, { force: rest.includes('--force'), quick: rest.includes('--quick') });
  console.log(`Restored ${cfg.DATABASE_PATH} from backup ${id} (${r.manifest.createdAt}).`);
  if (r.missing.length + r.mismatched.length > 0) {
    console.error(`Stored files missing: ${r.missing.length}, changed: ${r.mismatched.length}`);
    for (const k of [...r.missing, ...r.mismatched]) console.error(`  ${k}`);
    process.exitCode = 2;
  } else console.log(`All ${r.manifest.files.length} stored files it refers to are present${rest.includes('--quick') ? '' : ' with matching SHA-256'}.`);
} else {
  console.error('Usage: npm run backup [-- list] | npm run restore -- <id> [--force] [--quick]');
  process.exitCode = 1;
}
