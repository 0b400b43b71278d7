import type { AuthUser } from './auth-user';

/** How long a session lookup is trusted without asking the database again (ends and changes forget it at once). */
export const SESSION_CACHE_MS = 5_000;
/** Entries kept at most; past it the oldest go first (a Map iterates in insertion order). */
const MAX_ENTRIES = 10_000;

interface Entry {
  user: AuthUser | null;
  expiresAt: number;
  until: number;
}

/**
 * The answer of the last session lookup per session id, for a few seconds. This is the
 * one place a cached session is forgotten: `forgetSession` and `forgetUser` are what a
 * cross-process broadcast (e.g. Redis pub/sub, once several API processes run) would call
 * on every process when one of them ends a session.
 */
export class SessionCache {
  private readonly entries = new Map<string, Entry>();

  constructor(
    private readonly now: () => number,
    private readonly ttlMs = SESSION_CACHE_MS,
  ) {}

  get(sid: string): Entry | undefined {
    const hit = this.entries.get(sid);
    if (hit && hit.until > this.now()) return hit;
    if (hit) this.entries.delete(sid);
    return undefined;
  }

  put(sid: string, found: { user: AuthUser | null; expiresAt: number }): Entry {
    if (this.entries.size >= MAX_ENTRIES) this.entries.delete(this.entries.keys().next().value as string);
    const entry = { ...found, until: this.now() + this.ttlMs };
    this.entries.set(sid, entry);
    return entry;
  }

  forgetSession(sid: string): void {
    this.entries.delete(sid);
  }

  forgetUser(userId: number): void {
    for (const [sid, e] of this.entries) if (e.user?.id === userId) this.entries.delete(sid);
  }
}
