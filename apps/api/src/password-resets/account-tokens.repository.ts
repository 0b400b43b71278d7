import { Inject, Injectable } from '@nestjs/common';
import { and, eq, isNull } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { accountTokens, type AccountTokenPurpose } from '../db/schema';

export type AccountTokenRow = typeof accountTokens.$inferSelect;

/** Single-use e-mailed links for existing accounts (password reset, sign-up confirmation), kept as hashes. */
@Injectable()
export class AccountTokensRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  insert(row: typeof accountTokens.$inferInsert): AccountTokenRow {
    return this.db.insert(accountTokens).values(row).returning().all()[0];
  }

  /** Looked up by hash before the shop is known: the hash is the scope. */
  byHash(purpose: AccountTokenPurpose, tokenHash: string): AccountTokenRow | undefined {
    return this.db
      .select()
      .from(accountTokens)
      .where(and(eq(accountTokens.purpose, purpose), eq(accountTokens.tokenHash, tokenHash)))
      .get();
  }

  /** Uses a link once: one conditional UPDATE, so of two requests with the same link only one wins. */
  use(id: number, now: Date): boolean {
    return (
      this.db
        .update(accountTokens)
        .set({ usedAt: now })
        .where(and(eq(accountTokens.id, id), isNull(accountTokens.usedAt)))
        .run().changes === 1
    );
  }

  /** A newer link makes the user's earlier unused ones of the same purpose worthless. */
  retireOpen(shopId: number, userId: number, purpose: AccountTokenPurpose, now: Date): void {
    this.db
      .update(accountTokens)
      .set({ usedAt: now })
      .where(and(eq(accountTokens.shopId, shopId), eq(accountTokens.userId, userId), eq(accountTokens.purpose, purpose), isNull(accountTokens.usedAt)))
      .run();
  }
}
