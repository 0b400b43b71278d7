import { integer } from 'drizzle-orm/sqlite-core';

/** Primary key shared by every table. */
export const id = () => integer('id').primaryKey({ autoIncrement: true });

/** A point in time stored as epoch milliseconds; set by the clock adapter, not by SQLite. */
export const timestamp = (name: string) => integer(name, { mode: 'timestamp_ms' });
