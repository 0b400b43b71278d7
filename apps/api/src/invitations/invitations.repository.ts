import { Inject, Injectable } from '@nestjs/common';
import { and, desc, eq, isNull } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { invitations } from '../db/schema';

export type InvitationRow = typeof invitations.$inferSelect;
export type NewInvitationRow = typeof invitations.$inferInsert;

@Injectable()
export class InvitationsRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  /** Invitations neither accepted nor withdrawn (expired ones included: the manager can resend them). */
  pending(shopId: number): InvitationRow[] {
    return this.db
      .select()
      .from(invitations)
      .where(and(eq(invitations.shopId, shopId), isNull(invitations.acceptedAt), isNull(invitations.withdrawnAt)))
      .orderBy(desc(invitations.sentAt))
      .all();
  }

  pendingFor(shopId: number, email: string): InvitationRow | undefined {
    return this.pending(shopId).find((i) => i.email === email);
  }

  find(shopId: number, id: number): InvitationRow | undefined {
    return this.db
      .select()
      .from(invitations)
      .where(and(eq(invitations.shopId, shopId), eq(invitations.id, id)))
      .get();
  }

  /** Looked up by the link's hash before the shop is known: the hash is the scope. */
  byTokenHash(tokenHash: string): InvitationRow | undefined {
    return this.db.select().from(invitations).where(eq(invitations.tokenHash, tokenHash)).get();
  }

  insert(row: NewInvitationRow): InvitationRow {
    return this.db.insert(invitations).values(row).returning().all()[0];
  }

  update(shopId: number, id: number, patch: Partial<InvitationRow>): InvitationRow {
    return this.db
      .update(invitations)
      .set(patch)
      .where(and(eq(invitations.shopId, shopId), eq(invitations.id, id)))
      .returning()
      .all()[0];
  }

  /** Marks it accepted only if it is still open: of two uses of one link, one wins. */
  accept(id: number, userId: number, now: Date): boolean {
    const res = this.db
      .update(invitations)
      .set({ acceptedAt: now, acceptedUserId: userId })
      .where(and(eq(invitations.id, id), isNull(invitations.acceptedAt), isNull(invitations.withdrawnAt)))
      .run();
    return res.changes === 1;
  }
}
