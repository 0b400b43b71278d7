import { LoginRequestSchema, type LoginRequest } from '@benchproof/contracts';
import { contractResolver } from '../../../lib/form';

/**
 * The contract's LoginRequestSchema as the form's check (the web's one way, lib/form). Its own chunk: zod is the
 * largest library on the sign-in page, so it is fetched while the user types, not before the form can be used.
 */
export const checkLogin: (values: LoginRequest) => Record<string, string> = contractResolver(LoginRequestSchema, (v: LoginRequest) => v);
