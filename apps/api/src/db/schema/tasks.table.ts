// Type-only (erased when drizzle-kit loads this file): the payload's type is the task kinds' one map.
import type { TaskPayload } from '../../infra/tasks/task-kinds';
import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { shops } from './shops.table';

/**
 * The durable task runner's outbox (infra/tasks). A row is inserted in the same transaction
 * as the change that causes it; (kind, key) makes it idempotent. `leasedUntil` + `leaseOwner`
 * say which process holds a running task; an expired lease means its process died, so any
 * runner may take the task again.
 */
export const tasks = sqliteTable(
  'tasks',
  {
    id: id(),
    /** Null for shop-less housekeeping (none today; the column stays for server-wide work). */
    shopId: integer('shop_id').references(() => shops.id),
    kind: text('kind').notNull(),
    key: text('key').notNull(),
    payload: text('payload', { mode: 'json' }).$type<TaskPayload>().notNull(),
    status: text('status', { enum: ['queued', 'running', 'done', 'failed'] })
      .notNull()
      .default('queued'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    progress: real('progress').notNull().default(0),
    /** A queued task's next try; for a failed task whose error was transient, its long retry (see retryLater). */
    nextRunAt: timestamp('next_run_at').notNull(),
    /** Failed on a transient error (full disk, lost connection, timeout): taken again at nextRunAt, on a long backoff. */
    retryLater: integer('retry_later', { mode: 'boolean' }).notNull().default(false),
    leasedUntil: timestamp('leased_until'),
    leaseOwner: text('lease_owner'),
    createdAt: timestamp('created_at').notNull(),
    updatedAt: timestamp('updated_at').notNull(),
  },
  (t) => [uniqueIndex('tasks_kind_key_unique').on(t.kind, t.key), index('tasks_due_idx').on(t.status, t.kind, t.nextRunAt)],
);
