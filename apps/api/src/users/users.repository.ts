import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq, isNull, lt, or } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { shops, users } from '../db/schema';

export type UserRow = typeof users.$inferSelect;
export type NewUserRow = typeof users.$inferInsert;

@Injectable()
export class UsersRepository {
  constructor(@Inject(DB) private readonly db: Db) {}

  listByShop(shopId: number): UserRow[] {
    return this.db.select().from(users).where(eq(users.shopId, shopId)).orderBy(asc(users.name)).all();
  }

  findInShop(shopId: number, id: number): UserRow | undefined {
    return this.db
      .select()
      .from(users)
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .get();
  }

  findByEmail(email: string): UserRow | undefined {
    return this.db.select().from(users).where(eq(users.email, email)).get();
  }

  insert(row: NewUserRow): UserRow {
    return this.db.insert(users).values(row).returning().all()[0];
  }

  update(shopId: number, id: number, patch: Partial<Pick<UserRow, 'role' | 'active' | 'name'>>): UserRow {
    return this.db
      .update(users)
      .set(patch)
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .returning()
      .all()[0];
  }

  /** Second-factor fields of one user (set, replace or clear). */
  setTotp(shopId: number, id: number, patch: Partial<Pick<UserRow, 'totpSecret' | 'totpEnabledAt' | 'totpLastStep'>>): void {
    this.db
      .update(users)
      .set(patch)
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .run();
  }

  /** Records a used TOTP time step only if it is later than the last one: the same code never works twice. */
  takeTotpStep(shopId: number, id: number, step: number): boolean {
    const res = this.db
      .update(users)
      .set({ totpLastStep: step })
      .where(and(eq(users.shopId, shopId), eq(users.id, id), or(isNull(users.totpLastStep), lt(users.totpLastStep, step))))
      .run();
    return res.changes === 1;
  }

  setPasswordHash(shopId: number, id: number, passwordHash: string): void {
    this.db
      .update(users)
      .set({ passwordHash })
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .run();
  }

  shopName(shopId: number): string {
    return this.db.select({ name: shops.name }).from(shops).where(eq(shops.id, shopId)).get()?.name ?? '';
  }
}
