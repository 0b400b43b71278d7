import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, inArray, ne, sql } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { outboxMessages } from '../db/schema';
import type { DbTx } from '../core/db';

export type OutboxRow = typeof outboxMessages.$inferSelect;
export type NewOutboxRow = typeof outboxMessages.$inferInsert;

/** Outbox rows; every query a desk makes is scoped by shop. */
@Injectable()
export class MailRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(row: NewOutboxRow, tx?: DbTx): OutboxRow {
    return (tx ?? this.db).insert(outboxMessages).values(row).returning().all()[0];
  }

  find(shopId: number, id: number): OutboxRow | undefined {
    return this.db
      .select()
      .from(outboxMessages)
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.id, id)))
      .get();
  }

  listByJob(shopId: number, jobId: number): OutboxRow[] {
    return this.db
      .select()
      .from(outboxMessages)
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.jobId, jobId)))
      .orderBy(desc(outboxMessages.id))
      .all();
  }

  /** A report message that is sent or on its way (a finally failed one does not count). */
  hasReportMessage(shopId: number, jobId: number): boolean {
    const row = this.db
      .select({ id: outboxMessages.id })
      .from(outboxMessages)
      .where(
        and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.jobId, jobId), eq(outboxMessages.kind, 'report_ready'), ne(outboxMessages.status, 'failed')),
      )
      .get();
    return !!row;
  }

  /**
   * Takes the row for one attempt of task `taskKey`: a single conditional UPDATE. The runner's
   * lease makes the task run in one process at a time, so a 'sending' row is one whose process
   * died mid-send; a row whose task key changed (desk resent it) belongs to the newer task.
   */
  claim(shopId: number, id: number, taskKey: string): OutboxRow | undefined {
    return this.db
      .update(outboxMessages)
      .set({ status: 'sending' })
      .where(
        and(
          eq(outboxMessages.shopId, shopId),
          eq(outboxMessages.id, id),
          eq(outboxMessages.taskKey, taskKey),
          inArray(outboxMessages.status, ['queued', 'sending', 'failed']),
        ),
      )
      .returning()
      .all()[0];
  }

  /**
   * Records the send and, in the same UPDATE, swaps in the bodies without secrets (SET reads the
   * row as it was) and drops the sealed secrets. A crash before this write leaves the full message for the retry; a second
   * call changes nothing more.
   */
  markSent(shopId: number, id: number, attempts: number, at: Date, response: string): void {
    const m = outboxMessages;
    this.db
      .update(m)
      .set({
        status: 'sent',
        attempts,
        sentAt: at,
        smtpResponse: response,
        lastError: null,
        textBody: sql`coalesce(${m.textAfterSend}, ${m.textBody})`,
        htmlBody: sql`coalesce(${m.htmlAfterSend}, ${m.htmlBody})`,
        textAfterSend: null,
        htmlAfterSend: null,
        sealedSecrets: null,
      })
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.id, id)))
      .run();
  }

  /** After a failed attempt: queued again (the runner retries the task), or failed when it was the last. */
  markAttemptFailed(shopId: number, id: number, attempts: number, error: string, final: boolean): void {
    this.db
      .update(outboxMessages)
      .set({ status: final ? 'failed' : 'queued', attempts, lastError: error.slice(0, 1000) })
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.id, id)))
      .run();
  }

  /** Desk's resend of a finally failed message: queued under a new task key. */
  requeue(shopId: number, id: number, taskKey: string, tx: DbTx): OutboxRow | undefined {
    return tx
      .update(outboxMessages)
      .set({ status: 'queued', attempts: 0, taskKey })
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.id, id), eq(outboxMessages.status, 'failed')))
      .returning()
      .all()[0];
  }
}
