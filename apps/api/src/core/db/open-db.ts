import Database from 'better-sqlite3';
import { drizzle } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { REPO_ROOT } from '../../config';
import * as schema from '../../db/schema';
import type { Db } from './db.types';

export const MIGRATIONS_DIR = resolve(REPO_ROOT, 'apps/api/drizzle');

/** Opens the SQLite file with WAL and foreign keys on, then applies the committed migrations. */
export function openDb(path: string): { db: Db; sqlite: Database.Database } {
  if (path !== ':memory:') mkdirSync(dirname(path), { recursive: true });
  const sqlite = new Database(path);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  // Sorts and temporary b-trees in memory: the default temp file made every sorted list page
  // open and write a file (about 150 µs of a 200 µs page at 10,000 jobs).
  sqlite.pragma('temp_store = MEMORY');
  const db = drizzle(sqlite, { schema });
  migrate(db, { migrationsFolder: MIGRATIONS_DIR });
  // Gives the planner statistics (never gathered before), so lookups by id use the primary
  // key instead of scanning a shop's rows; cheap when nothing changed (SQLite's advice for
  // long-lived connections: optimize at open, then now and then — see DbModule).
  sqlite.pragma('optimize = 0x10002');
  return { db, sqlite };
}
