import { createHash, randomBytes } from 'node:crypto';

/**
 * A single-use secret for an e-mailed link (invitation, password reset, sign-up confirmation):
 * 256 random bits, base64url. The database keeps only its SHA-256 (`hashLinkToken`).
 */
export const newLinkToken = (): string => randomBytes(32).toString('base64url');

/** What the database keeps instead of the token (hex SHA-256). */
export const hashLinkToken = (token: string): string => createHash('sha256').update(token, 'utf8').digest('hex');
