import { Inject, Injectable } from '@nestjs/common';
import { and, count, eq, isNull } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { recoveryCodes } from '../db/schema';

@Injectable()
export class RecoveryCodesRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** Replaces a user's codes with a new set (a new enrolment makes the old codes worthless). */
  replace(shopId: number, userId: number, hashes: string[], now: Date): void {
    this.clear(shopId, userId);
    if (hashes.length)
      this.db
        .insert(recoveryCodes)
        .values(hashes.map((codeHash) => ({ shopId, userId, codeHash, createdAt: now })))
        .run();
  }

  clear(shopId: number, userId: number): void {
    this.db
      .delete(recoveryCodes)
      .where(and(eq(recoveryCodes.shopId, shopId), eq(recoveryCodes.userId, userId)))
      .run();
  }

  /** Marks an unused code used, in one conditional UPDATE: of two requests with the same code only one wins. */
  use(shopId: number, userId: number, codeHash: string, now: Date): boolean {
    const res = this.db
      .update(recoveryCodes)
      .set({ usedAt: now })
      .where(and(eq(recoveryCodes.shopId, shopId), eq(recoveryCodes.userId, userId), eq(recoveryCodes.codeHash, codeHash), isNull(recoveryCodes.usedAt)))
      .run();
    return res.changes > 0;
  }

  unusedCount(shopId: number, userId: number): number {
    return (
      this.db
        .select({ n: count() })
        .from(recoveryCodes)
        .where(and(eq(recoveryCodes.shopId, shopId), eq(recoveryCodes.userId, userId), isNull(recoveryCodes.usedAt)))
        .get()?.n ?? 0
    );
  }
}
