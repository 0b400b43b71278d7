import { LoginRequestSchema, type LoginRequest } from '@benchproof/contracts';
import { schemaResolver } from '@mantine/form';

/**
 * The contract's LoginRequestSchema as a Mantine form check. Its own chunk: zod is the
 * largest library on the sign-in page, so it is fetched while the user types, not before
 * the form can be used.
 */
export const checkLogin: (values: LoginRequest) => Record<string, string> = (values) => {
  const errors: Record<string, string> = {};
  for (const [path, message] of Object.entries(schemaResolver(LoginRequestSchema, { sync: true })(values))) {
    errors[path] = typeof message === 'string' ? message : 'Check this field';
  }
  return errors;
};
