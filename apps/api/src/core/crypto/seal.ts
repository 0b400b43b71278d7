import { createCipheriv, createDecipheriv, createHmac, randomBytes } from 'node:crypto';

/**
 * AES-256-GCM (NIST SP 800-38D) for small secrets the database must not hold in clear: a fresh 96-bit
 * IV per value, the 128-bit tag checked on opening. The key is derived from the server secret with
 * HMAC-SHA-256 and a purpose label, so each use (TOTP secrets, links in queued mail) has its own key
 * and a value sealed for one purpose does not open for another.
 * Format: `v1.<iv>.<tag>.<ciphertext>`, each base64url.
 */
export function sealText(serverSecret: string, purpose: string, plain: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv('aes-256-gcm', sealKey(serverSecret, purpose), iv);
  const body = Buffer.concat([cipher.update(plain, 'utf8'), cipher.final()]);
  return ['v1', iv.toString('base64url'), cipher.getAuthTag().toString('base64url'), body.toString('base64url')].join('.');
}

/** The plain text, or a throw when the value is malformed, was changed, or was sealed with another key or purpose. */
export function openText(serverSecret: string, purpose: string, sealed: string): string {
  const [v, iv, tag, body, extra] = sealed.split('.');
  if (v !== 'v1' || !iv || !tag || body === undefined || extra !== undefined) throw new Error('Unreadable sealed value');
  const decipher = createDecipheriv('aes-256-gcm', sealKey(serverSecret, purpose), Buffer.from(iv, 'base64url'));
  decipher.setAuthTag(Buffer.from(tag, 'base64url'));
  return Buffer.concat([decipher.update(Buffer.from(body, 'base64url')), decipher.final()]).toString('utf8');
}

const sealKey = (serverSecret: string, purpose: string): Buffer => createHmac('sha256', serverSecret).update(purpose).digest();
