import { hash, verify } from '@node-rs/argon2';

/** argon2id with the library's defaults (m=19456 KiB, t=2, p=1: the OWASP minimum). */
export const hashPassword = (plain: string): Promise<string> => hash(plain);

export const verifyPassword = (stored: string, plain: string): Promise<boolean> => verify(stored, plain).catch(() => false);
