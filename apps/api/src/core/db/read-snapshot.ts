import Database from 'better-sqlite3';

/**
 * A second, read-only connection holding one read transaction: in WAL mode it sees the database as
 * it was when opened, while the app's own connection keeps writing. Long streamed reads (exports)
 * use it so they never hold the shared connection busy with an open iterator.
 */
export function openReadSnapshot(path: string): { db: Database.Database; close: () => void } {
  const db = new Database(path, { readonly: true, fileMustExist: true });
  db.pragma('busy_timeout = 5000');
  db.exec('BEGIN');
  db.prepare('SELECT 1 FROM sqlite_master LIMIT 1').get(); // the snapshot starts at the first read
  let closed = false;
  return {
    db,
    close: () => {
      if (closed) return;
      closed = true;
      db.exec('COMMIT');
      db.close();
    },
  };
}
