import type { Role } from '@benchproof/contracts';

export type { Role };

/** Who is calling: every service call is scoped by `shopId`. */
export interface AuthUser {
  id: number;
  shopId: number;
  role: Role;
  email: string;
  name: string;
}

export interface SessionClaims {
  sub: number;
  shop: number;
  role: Role;
  /** The server-side session (sessions table) this token belongs to. */
  sid: string;
}
