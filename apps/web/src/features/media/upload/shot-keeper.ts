import { isRefused, queueReducer, type QueueAction, type QueueItem } from './queue';
import { forgetShot, forgetUser, markRefused, openShotDb, retagShot, saveShot, shotsOf, type ShotDb } from './shot-db';

/** Order of taking across reloads: a clock reading that never repeats or goes back within this page. */
let lastSeq = 0;
const nextSeq = (): number => (lastSeq = Math.max(lastSeq + 1, Date.now()));

/**
 * One signed-in user's waiting shots in IndexedDB: written before the first upload attempt, kept in step with
 * re-tags, forgotten once the server has them or the user deletes them. Without IndexedDB (a private window
 * that refuses it) the queue still uploads; only a reload would lose what waits.
 */
export class ShotKeeper {
  private readonly db: Promise<ShotDb | null>;
  /** Every write goes through this chain, so a re-tag never lands before the shot's own first write. */
  private chain: Promise<void> = Promise.resolve();

  constructor(
    readonly userId: number,
    dbName?: string,
  ) {
    this.db = openShotDb(dbName).catch(() => null);
  }

  async load(): Promise<QueueItem[]> {
    const db = await this.db;
    return db ? shotsOf(db, this.userId).catch(() => []) : [];
  }

  /** One after another, so the stored order is the order taken. */
  save(items: QueueItem[]): Promise<void> {
    return this.run(async (db) => {
      for (const item of items) await saveShot(db, this.userId, item, nextSeq()).catch(() => undefined);
    });
  }

  /** Mirrors what a queue action means for the kept copies (called before the reducer runs it); resolves once written. */
  follow(action: QueueAction, items: QueueItem[]): Promise<void> {
    if (action.type === 'stored' || action.type === 'remove') return this.run((db) => forgetShot(db, action.id));
    if (action.type === 'failed') {
      const after = queueReducer(items, action).find((i) => i.id === action.id);
      if (after && isRefused(after)) return this.run((db) => markRefused(db, after.id, { message: after.error ?? '', code: after.errorCode }));
    }
    if (action.type === 'retryNow' && action.id !== undefined) return this.run((db) => markRefused(db, action.id!, null));
    if (action.type === 'tag') {
      for (const item of items.filter((i) => action.ids.includes(i.id) && i.status !== 'done')) {
        const tags = { ...item.tags, ...action.patch };
        void this.run((db) => retagShot(db, item.id, tags));
      }
    }
    return this.chain;
  }

  forgetAll(): Promise<void> {
    return this.run((db) => forgetUser(db, this.userId));
  }

  private run(op: (db: ShotDb) => Promise<void>): Promise<void> {
    this.chain = this.chain.then(async () => {
      const db = await this.db;
      if (db) await op(db).catch(() => undefined);
    });
    return this.chain;
  }
}
