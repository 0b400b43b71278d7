import { openText, sealText } from './seal';

/** Purpose label of the key that seals links in queued messages, mail and texts (a value sealed for TOTP does not open here). */
const MESSAGE_SEAL = 'benchproof:outbox-seal:v1';

/** How a secret is spelt in one body (HTML escaping for mail, none for texts). */
export type Spelling = (secret: string) => string;
const plain: Spelling = (s) => s;

/** What a stored body holds where secret number i stood; only ASCII that HTML escaping leaves alone. */
const placeholder = (i: number): string => `[[bp-secret-${i}]]`;

/** The body as stored: each secret (plain, and in each extra spelling) replaced by its placeholder. */
export function withPlaceholders(body: string, secrets: readonly string[], spellings: readonly Spelling[] = []): string {
  const all = [plain, ...spellings];
  return secrets.reduce((b, s, i) => (s ? all.reduce((acc, spell) => acc.split(spell(s)).join(placeholder(i)), b) : b), body);
}

/** The body as sent: each placeholder filled with its secret, spelt for the body it goes into. */
export function fillSecrets(body: string, secrets: readonly string[], spell: Spelling = plain): string {
  return secrets.reduce((b, s, i) => b.split(placeholder(i)).join(spell(s)), body);
}

/** The secrets of one message, sealed under the server secret for its row's sealed_secrets column. */
export const sealSecrets = (serverSecret: string, secrets: readonly string[]): string => sealText(serverSecret, MESSAGE_SEAL, JSON.stringify(secrets));

/** The secrets back, or a throw when the key changed since the message was queued. */
export function openSecrets(serverSecret: string, sealed: string): string[] {
  const parsed: unknown = JSON.parse(openText(serverSecret, MESSAGE_SEAL, sealed));
  if (!Array.isArray(parsed) || !parsed.every((s) => typeof s === 'string')) throw new Error('Unreadable sealed secrets');
  return parsed;
}
