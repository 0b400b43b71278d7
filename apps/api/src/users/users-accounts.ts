import type { AuthUser } from '../core/auth';
import type { UserRow } from './users.repository';

/** The session identity of a row: what other features get instead of the row. */
export const identityOf = (u: UserRow): AuthUser => ({ id: u.id, shopId: u.shopId, role: u.role, email: u.email, name: u.name });

/** A user's second factor as the two-factor feature sees it; the secret is still sealed. */
export interface TotpState {
  sealedSecret: string | null;
  enabled: boolean;
  lastStep: number | null;
}

export const totpStateOf = (u: UserRow): TotpState => ({ sealedSecret: u.totpSecret, enabled: u.totpEnabledAt !== null, lastStep: u.totpLastStep });

/** A new account whose owner chose the password (already checked and hashed). */
export interface NewAccount {
  shopId: number;
  email: string;
  name: string;
  role: AuthUser['role'];
  passwordHash: string;
  active: boolean;
}
