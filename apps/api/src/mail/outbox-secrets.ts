import { openText, sealText } from '../core/crypto';
import { esc } from './templates/layout';

/** Purpose label of the key that seals links in queued mail (a value sealed for TOTP does not open here). */
const OUTBOX_SEAL = 'benchproof:outbox-seal:v1';

/** What a stored body holds where secret number i stood; only ASCII the HTML escaping leaves alone. */
const placeholder = (i: number): string => `[[bp-secret-${i}]]`;

/** The bodies as stored: each secret (plain, and as escaped into HTML) replaced by its placeholder. */
export function withPlaceholders(body: string, secrets: readonly string[]): string {
  return secrets.reduce((b, s, i) => (s ? b.split(s).join(placeholder(i)).split(esc(s)).join(placeholder(i)) : b), body);
}

/** The body as sent: each placeholder filled with its secret (escaped for HTML). */
export function fillSecrets(body: string, secrets: readonly string[], html: boolean): string {
  return secrets.reduce((b, s, i) => b.split(placeholder(i)).join(html ? esc(s) : s), body);
}

/** The secrets of one message, sealed under the server secret for the outbox column. */
export const sealSecrets = (serverSecret: string, secrets: readonly string[]): string => sealText(serverSecret, OUTBOX_SEAL, JSON.stringify(secrets));

/** The secrets back, or a throw when the key changed since the message was queued. */
export function openSecrets(serverSecret: string, sealed: string): string[] {
  const parsed: unknown = JSON.parse(openText(serverSecret, OUTBOX_SEAL, sealed));
  if (!Array.isArray(parsed) || !parsed.every((s) => typeof s === 'string')) throw new Error('Unreadable sealed secrets');
  return parsed;
}
