import type { CookieOptions, Request } from 'express';

export const SESSION_COOKIE = 'bp_session';
export const CSRF_COOKIE = 'bp_csrf';
export const CSRF_HEADER = 'x-csrf-token';

export const sessionCookieOptions = (secure: boolean, maxAgeMs: number): CookieOptions => ({
  httpOnly: true,
  sameSite: 'lax',
  secure,
  path: '/',
  maxAge: maxAgeMs,
});

export const sessionFromCookie = (req: Request): string | null => (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE] ?? null;
