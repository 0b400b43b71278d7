import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { DB, type Db, type DbTx } from '../core/db';
import { textMessages, type TextStatus } from '../db/schema';

export type TextRow = typeof textMessages.$inferSelect;
export type NewTextRow = typeof textMessages.$inferInsert;

/** How far a text has got; a status callback never moves a text back (they can arrive out of order). */
const RANK: Record<TextStatus, number> = { queued: 0, sending: 1, sent: 2, failed: 3, undelivered: 3, delivered: 3, opted_out: 3 };

/** Text messages; every query is scoped by shop except the one lookup a STOP reply needs (see `shopsTexting`). */
@Injectable()
export class TextsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(row: NewTextRow, tx?: DbTx): TextRow {
    return (tx ?? this.db).insert(textMessages).values(row).returning().all()[0];
  }

  find(shopId: number, id: number): TextRow | undefined {
    return this.db
      .select()
      .from(textMessages)
      .where(and(eq(textMessages.shopId, shopId), eq(textMessages.id, id)))
      .get();
  }

  list(shopId: number, by: { jobId: number } | { customerId: number }): TextRow[] {
    const where = 'jobId' in by ? eq(textMessages.jobId, by.jobId) : eq(textMessages.customerId, by.customerId);
    return this.db
      .select()
      .from(textMessages)
      .where(and(eq(textMessages.shopId, shopId), where))
      .orderBy(desc(textMessages.id))
      .all();
  }

  /** One conditional UPDATE takes the row for an attempt; 'sending' means a process died mid-send (the runner's lease). */
  claim(shopId: number, id: number): TextRow | undefined {
    return this.db
      .update(textMessages)
      .set({ status: 'sending' })
      .where(and(eq(textMessages.shopId, shopId), eq(textMessages.id, id), inArray(textMessages.status, ['queued', 'sending'])))
      .returning()
      .all()[0];
  }

  /** The provider has it: records its id and, in the same UPDATE, drops the (sealed) link from the stored row. */
  markSent(shopId: number, id: number, attempts: number, sid: string, at: Date): void {
    const t = textMessages;
    this.db
      .update(t)
      .set({
        status: 'sent',
        attempts,
        providerSid: sid,
        sentAt: at,
        statusAt: at,
        lastError: null,
        body: sql`coalesce(${t.bodyAfterSend}, ${t.body})`,
        bodyAfterSend: null,
        sealedSecrets: null,
      })
      .where(and(eq(t.shopId, shopId), eq(t.id, id)))
      .run();
  }

  /** After a failed attempt: queued again (the runner retries the task), or failed when it was the last. */
  markAttemptFailed(shopId: number, id: number, attempts: number, error: string, final: boolean): void {
    this.db
      .update(textMessages)
      .set({ status: final ? 'failed' : 'queued', attempts, lastError: error.slice(0, 500) })
      .where(and(eq(textMessages.shopId, shopId), eq(textMessages.id, id)))
      .run();
  }

  /** Not sent because the owner replied STOP after it was queued. */
  markOptedOut(shopId: number, id: number, at: Date): void {
    this.db
      .update(textMessages)
      .set({
        status: 'opted_out',
        statusAt: at,
        body: sql`coalesce(${textMessages.bodyAfterSend}, ${textMessages.body})`,
        bodyAfterSend: null,
        sealedSecrets: null,
      })
      .where(and(eq(textMessages.shopId, shopId), eq(textMessages.id, id)))
      .run();
  }

  /** The provider's delivery report for the text it knows by `sid`; true when it moved the text forward. */
  recordStatus(shopId: number, id: number, sid: string, status: TextStatus, error: string | null, at: Date): boolean {
    const row = this.find(shopId, id);
    if (!row || row.providerSid !== sid || RANK[status] <= RANK[row.status]) return false;
    this.db
      .update(textMessages)
      .set({ status, statusAt: at, lastError: error ?? row.lastError })
      .where(and(eq(textMessages.shopId, shopId), eq(textMessages.id, id)))
      .run();
    return true;
  }

  /**
   * Which shops' customers we have texted at this number. A reply reaches the one sender number all
   * shops share and names no shop, so this lookup alone is by number; every change after it is per shop.
   */
  shopsTexting(toNumber: string): Array<{ shopId: number; customerId: number }> {
    return this.db
      .selectDistinct({ shopId: textMessages.shopId, customerId: textMessages.customerId })
      .from(textMessages)
      .where(eq(textMessages.toNumber, toNumber))
      .all();
  }
}
