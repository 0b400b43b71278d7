import type { BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import type * as schema from '../../db/schema';

export type Db = BetterSQLite3Database<typeof schema>;

/** A Drizzle transaction (better-sqlite3: synchronous). Writes, task enqueues and audit records inside it commit together. */
export type DbTx = Parameters<Parameters<Db['transaction']>[0]>[0];

export const DB = Symbol('DB');

/** The better-sqlite3 connection itself, for what Drizzle does not wrap (the online backup API). */
export const SQLITE = Symbol('SQLITE');
