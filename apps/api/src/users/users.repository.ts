import { Inject, Injectable } from '@nestjs/common';
import { and, asc, eq } from 'drizzle-orm';
import { DB, type Db } from '../core/db';
import { users } from '../db/schema';

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

  setPasswordHash(shopId: number, id: number, passwordHash: string): void {
    this.db
      .update(users)
      .set({ passwordHash })
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .run();
  }
}
