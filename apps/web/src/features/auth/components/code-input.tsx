import { TextInput } from '@mantine/core';

/** The six digits from the authenticator app (or a recovery code): big, numeric keyboard, filled by the phone's one-time-code autofill. */
export function CodeInput({
  value,
  onChange,
  error,
  label = 'Code from your authenticator app',
}: {
  value: string;
  onChange: (v: string) => void;
  error?: string | null;
  label?: string;
}) {
  return (
    <TextInput
      label={label}
      description="Six digits; or one of your recovery codes"
      autoComplete="one-time-code"
      inputMode="numeric"
      size="lg"
      autoFocus
      value={value}
      error={error}
      onChange={(e) => onChange(e.currentTarget.value)}
    />
  );
}
