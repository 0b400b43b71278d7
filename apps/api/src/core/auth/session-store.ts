import { Inject, Injectable } from '@nestjs/common';
import { and, eq, lt, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { sessions, users } from '../../db/schema';
import { CLOCK, type Clock } from '../clock';
import { DB, type Db } from '../db';
import type { AuthUser } from './auth-user';

/**
 * Server-side sessions: a token is only good while its row exists. The lookup on
 * every request is one prepared, primary-key query joined to the user, so a
 * deactivated user or an ended session is refused at the next request.
 */
@Injectable()
export class SessionStore {
  private readonly lookup;

  constructor(
    @Inject(DB) private readonly db: Db,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {
    this.lookup = db
      .select({
        id: users.id,
        shopId: users.shopId,
        role: users.role,
        email: users.email,
        name: users.name,
        active: users.active,
        expiresAt: sessions.expiresAt,
      })
      .from(sessions)
      .innerJoin(users, eq(users.id, sessions.userId))
      .where(eq(sessions.id, sql.placeholder('sid')))
      .prepare();
  }

  /** Opens a session for a user; expired rows of anyone are swept on the way. */
  open(user: { id: number; shopId: number }, ttlSeconds: number): { sid: string; expiresAt: Date } {
    const now = this.clock.now();
    const expiresAt = new Date(now.getTime() + ttlSeconds * 1000);
    const sid = randomUUID();
    this.db.delete(sessions).where(lt(sessions.expiresAt, now)).run();
    this.db.insert(sessions).values({ id: sid, shopId: user.shopId, userId: user.id, createdAt: now, expiresAt }).run();
    return { sid, expiresAt };
  }

  /** The user behind a live session, or null when it ended, expired or the user was deactivated. */
  resolve(sid: string, userId: number, shopId: number): AuthUser | null {
    const row = this.lookup.get({ sid });
    if (!row || row.id !== userId || row.shopId !== shopId || !row.active) return null;
    if (row.expiresAt.getTime() <= this.clock.now().getTime()) return null;
    return { id: row.id, shopId: row.shopId, role: row.role, email: row.email, name: row.name };
  }

  end(sid: string): void {
    this.db.delete(sessions).where(eq(sessions.id, sid)).run();
  }

  /** Ends every session of a user (deactivation, password change); scoped by shop like every write. */
  endAllOf(shopId: number, userId: number): void {
    this.db
      .delete(sessions)
      .where(and(eq(sessions.shopId, shopId), eq(sessions.userId, userId)))
      .run();
  }
}
