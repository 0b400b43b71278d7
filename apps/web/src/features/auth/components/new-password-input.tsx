import { MIN_PASSWORD_LENGTH } from '@benchproof/contracts';
import { PasswordInput, type PasswordInputProps } from '@mantine/core';

/** A password the person chooses: the rules in our own words (length, not common, not from names). */
export function NewPasswordInput(props: PasswordInputProps) {
  return (
    <PasswordInput
      label="Choose a password"
      description={`${MIN_PASSWORD_LENGTH} characters or more. Not a common one, and not made from your name or the workshop's — a few unrelated words work well.`}
      autoComplete="new-password"
      size="lg"
      {...props}
    />
  );
}

/** WEAK_PASSWORD from the API goes under the password box. */
export const weakPasswordMessage = (e: unknown): string | null =>
  e && typeof e === 'object' && 'code' in e && e.code === 'WEAK_PASSWORD' && 'message' in e ? String(e.message) : null;
