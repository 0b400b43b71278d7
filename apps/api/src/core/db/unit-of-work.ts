import { Inject, Injectable, Logger } from '@nestjs/common';
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
  /** Work to do once the outermost open transaction has committed; null when none is open. */
  private afterOuter: { fn: () => void; key?: string }[] | null = null;
  private readonly logger = new Logger('UnitOfWork');

  constructor(@Inject(DB) private readonly db: Db) {}

  run<T>(work: (tx: DbTx) => T): T {
    if (this.afterOuter) return this.nested(work);
    this.afterOuter = [];
    try {
      const result = this.db.transaction((tx) => work(tx));
      const after = this.afterOuter;
      this.afterOuter = null;
      for (const { fn } of after) this.quietly(fn);
      return result;
    } finally {
      this.afterOuter = null;
    }
  }

  /**
   * Runs `fn` after the open transaction commits (right away when none is open); nothing if it rolls
   * back. For what must not be seen before the data is (live updates to other screens). Being
   * synchronous, a transaction never yields, so one list per process is enough. With a `key`, only the
   * first of the transaction's calls with that key is kept (e.g. one live message per job for many rows).
   */
  afterCommit(fn: () => void, key?: string): void {
    if (!this.afterOuter) return this.quietly(fn);
    if (key !== undefined && this.afterOuter.some((a) => a.key === key)) return;
    this.afterOuter.push({ fn, key });
  }

  /** The change is committed: a failure here is logged, never turned into an error answer. */
  private quietly(fn: () => void): void {
    try {
      fn();
    } catch (err) {
      this.logger.warn(`After commit: ${err instanceof Error ? err.message : String(err)}`);
    }
  }

  /** A savepoint: what it asked to run after commit is dropped if it rolls back. */
  private nested<T>(work: (tx: DbTx) => T): T {
    const list = this.afterOuter!;
    const mark = list.length;
    try {
      return this.db.transaction((tx) => work(tx));
    } catch (err) {
      list.length = mark;
      throw err;
    }
  }
}
