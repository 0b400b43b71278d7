import { createHash, randomBytes } from 'node:crypto';
import { openText, sealText } from '../core/crypto';

type Otp = typeof import('otplib');
let otp: Otp | undefined;
/** Loaded with the first two-step sign-in or set-up, not at boot: about 8 MB of resident memory (issue 22). */
// eslint-disable-next-line @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above
const otplib = (): Otp => (otp ??= require('otplib') as Otp);

/**
 * TOTP as RFC 6238 describes it with the values authenticator apps expect: HMAC-SHA-1, 6 digits,
 * 30-second steps from the Unix epoch (RFC 6238 §4 defaults). otplib does the arithmetic; the RFC's
 * Appendix B vectors check it in totp.spec.ts.
 */
export const TOTP_DIGITS = 6;
export const TOTP_PERIOD_SECONDS = 30;
/** One step either side: a phone clock a little off still works (RFC 6238 §5.2 recommends at most one step back). */
export const TOTP_TOLERANCE_SECONDS = 30;

export const newTotpSecret = (): string => otplib().generateSecret();

export const totpUri = (secret: string, account: string, issuer: string): string => otplib().generateURI({ secret, label: account, issuer });

/** The code for a moment (tests and the enrolment screen's check). */
export const totpAt = (secret: string, epochSeconds: number): string => otplib().generateSync({ secret, epoch: epochSeconds });

/** The time step a code belongs to when it is valid now (±1 step), else null. */
export function totpStep(secret: string, code: string, epochSeconds: number): number | null {
  if (!/^\d{6}$/.test(code)) return null;
  const res = otplib().verifySync({ secret, token: code, epoch: epochSeconds, epochTolerance: TOTP_TOLERANCE_SECONDS });
  return res.valid ? (res as { timeStep: number }).timeStep : null;
}

/** AES-256-GCM with a key derived (HMAC) from the server secret, so a copied database holds no usable TOTP secrets. */
const TOTP_SEAL = 'benchproof:totp-seal:v1';
export const sealSecret = (serverSecret: string, plain: string): string => sealText(serverSecret, TOTP_SEAL, plain);
export const openSecret = (serverSecret: string, sealed: string): string => openText(serverSecret, TOTP_SEAL, sealed);

/** Ten recovery codes, 10 characters each from an alphabet without look-alikes (0/O, 1/l), shown as xxxxx-xxxxx. */
export function newRecoveryCodes(count = 10): string[] {
  const alphabet = 'abcdefghjkmnpqrstuvwxyz23456789';
  return Array.from({ length: count }, () => {
    const bytes = randomBytes(10);
    const chars = [...bytes].map((b) => alphabet[b % alphabet.length]).join('');
    return `${chars.slice(0, 5)}-${chars.slice(5)}`;
  });
}

/** What the database keeps of a recovery code: the SHA-256 of its normalised form (no dash, lower case). */
export const hashRecoveryCode = (code: string): string => createHash('sha256').update(code.replace(/[\s-]/g, '').toLowerCase()).digest('hex');
