import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';

/** Binds the signature to this one purpose, so no other signed value of the app can pass as an owner link. */
const PURPOSE = 'benchproof:owner-link:v1';
const SECRET_BYTES = 32; // 256 bits of randomness in every link
const SIG_BYTES = 16;

const sign = (key: string, secret: string): Buffer => createHmac('sha256', key).update(`${PURPOSE}:${secret}`).digest().subarray(0, SIG_BYTES);

/**
 * A new owner-link token `<secret>.<signature>`, both base64url. The random
 * secret makes it unguessable; the HMAC lets a tampered token be refused
 * before any database lookup.
 */
export function newOwnerToken(key: string): string {
  const secret = randomBytes(SECRET_BYTES).toString('base64url');
  return `${secret}.${sign(key, secret).toString('base64url')}`;
}

/** True when the token has the right shape and an intact signature. */
export function ownerTokenSignatureOk(key: string, token: string): boolean {
  const [secret, sig, extra] = token.split('.');
  if (!secret || !sig || extra !== undefined || !/^[A-Za-z0-9_-]{43}$/.test(secret)) return false;
  const given = Buffer.from(sig, 'base64url');
  const expected = sign(key, secret);
  return given.length === expected.length && timingSafeEqual(given, expected);
}

/** What the database keeps instead of the token (hex SHA-256). */
export const hashOwnerToken = (token: string): string => createHash('sha256').update(token).digest('hex');
