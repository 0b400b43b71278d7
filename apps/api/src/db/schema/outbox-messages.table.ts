import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { id, timestamp } from './columns';
import { jobs } from './jobs.table';
import { shops } from './shops.table';

/** Where an attachment's bytes are read at send time; the outbox never keeps a second copy. */
export type OutboxAttachmentRef = {
  filename: string;
  contentType: string;
  /** Size and SHA-256 when queued; a send that finds other bytes fails rather than mail the wrong file. */
  size: number | null;
  sha256: string | null;
  /** A stored file by its key (an issued report PDF is one: the reports feature names its key and SHA-256). */
  source: { kind: 'storage'; key: string };
};

export type OutboxStatus = 'queued' | 'sending' | 'sent' | 'failed';

/** One e-mail on its way: written in the same transaction as its cause with its 'mail.send' task. */
export const outboxMessages = sqliteTable(
  'outbox_messages',
  {
    id: id(),
    shopId: integer('shop_id')
      .notNull()
      .references(() => shops.id),
    jobId: integer('job_id').references(() => jobs.id),
    /** What the message is about, e.g. 'report_ready', 'estimate_decision'. */
    kind: text('kind').notNull(),
    /** The report it carries, when it carries one (send history per report). */
    reportId: integer('report_id'),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body').notNull(),
    /**
     * The bodies with their secrets (an owner link) replaced, or null when they carry none. They take
     * the bodies' place in the same write that records the send, so a sent row keeps no secret while
     * a row not yet sent (a retry after a crash, a resend) still holds the message it must deliver.
     */
    textAfterSend: text('text_after_send'),
    htmlAfterSend: text('html_after_send'),
    /**
     * The secrets the bodies stand in for (an owner link), AES-256-GCM sealed with a key derived from the
     * server secret (mail/outbox-secrets.ts); the bodies hold a placeholder in their place, so no row,
     * write-ahead page or freed page ever holds the link in clear. Opened only at send time; cleared
     * by the write that records the send.
     */
    sealedSecrets: text('sealed_secrets'),
    attachments: text('attachments', { mode: 'json' }).$type<OutboxAttachmentRef[]>().notNull(),
    status: text('status').$type<OutboxStatus>().notNull(),
    /**
     * The 'mail.send' task that delivers it (the task runner schedules, retries and leases it; the row
     * is the record). Desk's resend starts a new task under a new key; a task whose key is no longer
     * this one does nothing.
     */
    taskKey: text('task_key').notNull().default(''),
    /** Attempts of the current task and the last failure, as recorded by the delivery (shown to desk). */
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    sentAt: timestamp('sent_at'),
    /** Fixed when queued and reused on every attempt. */
    messageId: text('message_id').notNull(),
    smtpResponse: text('smtp_response'),
    createdBy: integer('created_by'),
    createdAt: timestamp('created_at').notNull(),
  },
  (t) => [index('outbox_shop_job_idx').on(t.shopId, t.jobId)],
);
