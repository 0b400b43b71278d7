import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, inArray, isNull, lte, ne, or, sql } from 'drizzle-orm';
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
   * Takes the row for one attempt: a single conditional UPDATE, so of two workers only one
   * wins (SQLite runs writers one at a time). A 'sending' row whose lease ran out belonged to
   * a process that died mid-send and may be taken again.
   */
  claim(shopId: number, id: number, now: Date, staleBefore: Date): OutboxRow | undefined {
    return this.db
      .update(outboxMessages)
      .set({ status: 'sending', attempts: sql`${outboxMessages.attempts} + 1`, sendingSince: now, nextTryAt: null })
      .where(
        and(
          eq(outboxMessages.shopId, shopId),
          eq(outboxMessages.id, id),
          or(eq(outboxMessages.status, 'queued'), and(eq(outboxMessages.status, 'sending'), lte(outboxMessages.sendingSince, staleBefore))),
        ),
      )
      .returning()
      .all()[0];
  }

  /**
   * Records the send and, in the same UPDATE, swaps in the bodies without secrets (SET reads the
   * row as it was). A crash before this write leaves the full message for the retry; a second
   * call changes nothing more.
   */
  markSent(shopId: number, id: number, at: Date, response: string): void {
    const m = outboxMessages;
    this.db
      .update(m)
      .set({
        status: 'sent',
        sentAt: at,
        smtpResponse: response,
        lastError: null,
        sendingSince: null,
        textBody: sql`coalesce(${m.textAfterSend}, ${m.textBody})`,
        htmlBody: sql`coalesce(${m.htmlAfterSend}, ${m.htmlBody})`,
        textAfterSend: null,
        htmlAfterSend: null,
      })
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.id, id)))
      .run();
  }

  /** After a failed attempt: back to the queue with its next try, or failed for good. */
  markAttemptFailed(shopId: number, id: number, error: string, nextTryAt: Date | null): void {
    this.db
      .update(outboxMessages)
      .set({ status: nextTryAt ? 'queued' : 'failed', lastError: error.slice(0, 1000), nextTryAt, sendingSince: null })
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.id, id)))
      .run();
  }

  /** Desk's resend of a finally failed message: a new round of attempts. */
  requeue(shopId: number, id: number, tx: DbTx): OutboxRow | undefined {
    return tx
      .update(outboxMessages)
      .set({ status: 'queued', attempts: 0, round: sql`${outboxMessages.round} + 1`, nextTryAt: null })
      .where(and(eq(outboxMessages.shopId, shopId), eq(outboxMessages.id, id), eq(outboxMessages.status, 'failed')))
      .returning()
      .all()[0];
  }

  /**
   * Every shop's messages that are due: queued with their next try come, or stuck in 'sending'
   * past the lease. The one cross-shop query: the outbox relay works for all shops at once.
   */
  due(now: Date, staleBefore: Date): Pick<OutboxRow, 'id' | 'shopId' | 'round'>[] {
    return this.db
      .select({ id: outboxMessages.id, shopId: outboxMessages.shopId, round: outboxMessages.round })
      .from(outboxMessages)
      .where(
        or(
          and(eq(outboxMessages.status, 'queued'), or(isNull(outboxMessages.nextTryAt), lte(outboxMessages.nextTryAt, now))),
          and(inArray(outboxMessages.status, ['sending']), lte(outboxMessages.sendingSince, staleBefore)),
        ),
      )
      .limit(200)
      .all();
  }
}
