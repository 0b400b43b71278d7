import { DEMO_PASSWORD } from '@benchproof/seeds';
import type { Response } from 'supertest';
import type { TestApp } from '../test-app';

/** The session JWT a response set in the `bp_session` cookie. */
export function sessionCookie(res: Response): string {
  const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('bp_session='))!;
  return cookie.split(';')[0].slice('bp_session='.length);
}

/** A session as a script keeps it: the raw JWT, sent as a Bearer token (no CSRF needed). */
export async function bearer(t: TestApp, email: string, password = DEMO_PASSWORD): Promise<string> {
  return sessionCookie(await t.http().post('/api/auth/login').send({ email, password }).expect(200));
}

/** The JWT's claims, read without checking the signature. */
export const claimsOf = (jwt: string) => JSON.parse(Buffer.from(jwt.split('.')[1], 'base64url').toString()) as Record<string, unknown>;

/** `GET /api/auth/session` with the token as Bearer. */
export const sessionOf = (t: TestApp, jwt: string) => t.http().get('/api/auth/session').set('Authorization', `Bearer ${jwt}`);

/** Changes the demo password of the token's user (200 expected); answers the fresh session of the device that asked. */
export async function changePassword(t: TestApp, jwt: string, newPassword: string): Promise<string> {
  const res = await t.http().post('/api/auth/password').set('Authorization', `Bearer ${jwt}`).send({ currentPassword: DEMO_PASSWORD, newPassword }).expect(200);
  return sessionCookie(res);
}
