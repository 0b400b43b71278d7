import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { customers } from './customers.table';
import { jobs } from './jobs.table';
import { shops } from './shops.table';

export type TextStatus = 'queued' | 'sending' | 'sent' | 'delivered' | 'undelivered' | 'failed' | 'opted_out';

/** One text message on its way: written with its cause, sent by the 'text.send' task (same outbox idea as e-mail). */
export const textMessages = sqliteTable(
  'text_messages',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id').references(() => jobs.id),
    customerId: integer('customer_id')
      .notNull()
      .references(() => customers.id),
    /** 'owner_link', 'estimate_decision', 'ready_to_collect' */
    kind: text('kind').notNull(),
    /** E.164 */
    toNumber: text('to_number').notNull(),
    /** As queued, the owner link is a placeholder here; the link itself is in `sealedSecrets`. */
    body: text('body').notNull(),
    /** The body with the link removed; replaces `body` once the provider has it. */
    bodyAfterSend: text('body_after_send'),
    /**
     * The owner link, AES-256-GCM sealed under the server secret (core/crypto/sealed-secrets.ts); opened
     * only to send, cleared once the provider has the text, so no row or database file holds it in clear.
     */
    sealedSecrets: text('sealed_secrets'),
    status: text('status').$type<TextStatus>().notNull(),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    providerSid: text('provider_sid'),
    sentAt: timestamp('sent_at'),
    statusAt: timestamp('status_at'),
    createdAt: timestamp('created_at').notNull(),
  },
  (t) => [index('text_messages_shop_job_idx').on(t.shopId, t.jobId), index('text_messages_sid_idx').on(t.providerSid)],
);
