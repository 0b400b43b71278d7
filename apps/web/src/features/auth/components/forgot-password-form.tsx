import { Alert, Button, Stack, TextInput } from '@mantine/core';
import { IconAlertTriangle, IconMailForward } from '@tabler/icons-react';
import { useState, type FormEvent } from 'react';
import { useForgotPassword } from '../api/accounts';

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export function ForgotPasswordForm() {
  const [email, setEmail] = useState('');
  const ask = useForgotPassword();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (email.trim()) ask.mutate(email.trim());
  };
  if (ask.isSuccess)
    return (
      <Alert color="teal" variant="light" icon={<IconMailForward />} role="status">
        {ask.data.message}
      </Alert>
    );
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {ask.error && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {ask.error.message}
          </Alert>
        )}
        <TextInput
          label="Your e-mail"
          type="email"
          inputMode="email"
          autoComplete="username"
          size="lg"
          value={email}
          onChange={(e) => setEmail(e.currentTarget.value)}
        />
        <Button type="submit" size="lg" leftSection={<IconMailForward />} loading={ask.isPending}>
          Send me a link
        </Button>
      </Stack>
    </form>
  );
}
