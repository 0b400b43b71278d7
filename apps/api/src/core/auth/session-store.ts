import { Inject, Injectable } from '@nestjs/common';
import { and, eq, lt, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { sessions, users } from '../../db/schema';
import { CLOCK, type Clock } from '../clock';
import { DB, type Db } from '../db';
import { LIVE_UPDATES, type LiveUpdates } from '../events';
import type { AuthUser } from './auth-user';
import { SessionCache } from './session-cache';

/**
 * Server-side sessions: a token is only good while its row exists. The lookup is one
 * prepared, primary-key query joined to the user, remembered for a few seconds per
 * session id (`SessionCache`); every way a session ends — sign-out, deactivation, a
 * password change, a role change — goes through `end`/`endAllOf`/`userChanged` here,
 * which forget the cached answer at once, so the next request is refused. They also tell every
 * other API process (the live-updates port: Redis pub/sub with several processes), which forgets too.
 */
/** What one process tells the others to forget from their session caches. */
type Forget = { sid?: string; userId?: number };
const FORGET_TOPIC = 'sessions:forget';

@Injectable()
export class SessionStore {
  private readonly lookup;
  private readonly cache: SessionCache;

  constructor(
    @Inject(DB) private readonly db: Db,
    @Inject(CLOCK) private readonly clock: Clock,
    @Inject(LIVE_UPDATES) private readonly live: LiveUpdates,
  ) {
    this.cache = new SessionCache(() => this.clock.now().getTime());
    live.subscribe<Forget>(FORGET_TOPIC).subscribe((m) => this.forget(m));
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
    const found = this.cache.get(sid) ?? this.cache.put(sid, this.read(sid));
    const user = found.user;
    if (!user || user.id !== userId || user.shopId !== shopId) return null;
    return found.expiresAt <= this.clock.now().getTime() ? null : user;
  }

  end(sid: string): void {
    this.db.delete(sessions).where(eq(sessions.id, sid)).run();
    this.cache.forgetSession(sid);
    this.live.publish(FORGET_TOPIC, { sid } satisfies Forget);
  }

  /** Ends every session of a user (deactivation, password change); scoped by shop like every write. */
  endAllOf(shopId: number, userId: number): void {
    this.db
      .delete(sessions)
      .where(and(eq(sessions.shopId, shopId), eq(sessions.userId, userId)))
      .run();
    this.userChanged(userId);
  }

  /** A user's role, name or e-mail changed: their live sessions answer with the new values from the next request. */
  userChanged(userId: number): void {
    this.cache.forgetUser(userId);
    this.live.publish(FORGET_TOPIC, { userId } satisfies Forget);
  }

  /** Another process (or this one, echoed by Redis) ended a session or changed a user. */
  private forget(m: Forget): void {
    if (m.sid) this.cache.forgetSession(m.sid);
    if (m.userId) this.cache.forgetUser(m.userId);
  }

  private read(sid: string): { user: AuthUser | null; expiresAt: number } {
    const row = this.lookup.get({ sid });
    if (!row || !row.active) return { user: null, expiresAt: 0 };
    return { user: { id: row.id, shopId: row.shopId, role: row.role, email: row.email, name: row.name }, expiresAt: row.expiresAt.getTime() };
  }
}
