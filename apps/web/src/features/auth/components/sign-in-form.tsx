import { LoginRequestSchema } from '@benchproof/contracts';
import { Alert, Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { IconAlertTriangle, IconLogin } from '@tabler/icons-react';
import { ApiError } from '../../../lib/api-client';
import { useLogin } from '../api/session';

export function SignInForm({ onSignedIn, notice }: { onSignedIn: () => void; notice?: string | null }) {
  const login = useLogin();
  const form = useForm({ initialValues: { email: '', password: '' }, validate: schemaResolver(LoginRequestSchema, { sync: true }) });
  const error = login.error instanceof ApiError ? login.error.message : login.error ? 'Sign-in failed.' : null;

  return (
    <form onSubmit={form.onSubmit((values) => login.mutate(values, { onSuccess: onSignedIn }))} noValidate>
      <Stack>
        {notice && !error && (
          <Alert color="brass" variant="light" icon={<IconAlertTriangle />}>
            {notice}
          </Alert>
        )}
        {error && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {error}
          </Alert>
        )}
        <TextInput label="E-mail" type="email" autoComplete="username" inputMode="email" size="lg" {...form.getInputProps('email')} />
        <PasswordInput label="Password" autoComplete="current-password" size="lg" {...form.getInputProps('password')} />
        <Button type="submit" size="lg" loading={login.isPending} leftSection={<IconLogin />}>
          Sign in
        </Button>
      </Stack>
    </form>
  );
}
