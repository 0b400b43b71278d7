import { fillSecrets as fill, withPlaceholders as replace } from '../core/crypto';
import { esc } from './templates/layout';

export { openSecrets, sealSecrets } from '../core/crypto';

/** The bodies as stored: each secret (plain, and as escaped into HTML) replaced by its placeholder. */
export const withPlaceholders = (body: string, secrets: readonly string[]): string => replace(body, secrets, [esc]);

/** The body as sent: each placeholder filled with its secret (escaped for HTML). */
export const fillSecrets = (body: string, secrets: readonly string[], html: boolean): string => fill(body, secrets, html ? esc : undefined);
