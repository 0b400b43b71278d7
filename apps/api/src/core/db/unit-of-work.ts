import { Inject, Injectable } from '@nestjs/common';
import { DB, type Db, type DbTx } from './db.types';

/**
 * The one transaction boundary of the API. `run` is synchronous (better-sqlite3): everything
 * the callback writes — rows, audit records, enqueued tasks, domain-event listeners' rows —
 * commits together or not at all, and a failed COMMIT (e.g. a full disk) throws instead of
 * being lost. Repositories keep using their `Db`: on the one SQLite connection those writes
 * are inside the open transaction; pass `tx` to ports that take it (tasks, events). Nested
 * `run` calls become savepoints.
 */
@Injectable()
export class UnitOfWork {
  constructor(@Inject(DB) private readonly db: Db) {}

  run<T>(work: (tx: DbTx) => T): T {
    return this.db.transaction((tx) => work(tx));
  }
}
