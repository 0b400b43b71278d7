import type { LoginRequest, SignInStep } from '@benchproof/contracts';
import { Alert, Anchor, Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertTriangle, IconLogin } from '@tabler/icons-react';
import { lazy, Suspense, useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { ApiError } from '../../../lib/api-client';
import { useLogin } from '../api/session';

/** The second step loads only for accounts that need it, keeping the sign-in screen's first load small. */
const SecondStep = lazy(() => import('./second-step').then((m) => ({ default: m.SecondStep })));

let check: Promise<((values: LoginRequest) => Record<string, string>) | null> | null = null;
/** Starts fetching the contract check once; resolves to null offline (the api validates with the same schema). */
const loadCheck = () =>
  (check ??= import('../api/login-check').then(
    (m) => m.checkLogin,
    () => ((check = null), null),
  ));

export function SignInForm({ onSignedIn, notice }: { onSignedIn: () => void; notice?: string | null }) {
  const login = useLogin();
  const [challenge, setChallenge] = useState<Extract<SignInStep, { step: 'code' | 'enrol' }> | null>(null);
  const form = useForm<LoginRequest>({ initialValues: { email: '', password: '' } });
  const error = login.error instanceof ApiError ? login.error.message : login.error ? 'Sign-in failed.' : null;
  const submit = async (e: FormEvent) => {
    e.preventDefault();
    const values = form.getValues();
    const errors = (await loadCheck())?.(values) ?? {};
    form.setErrors(errors);
    if (Object.keys(errors).length === 0) login.mutate(values, { onSuccess: (res) => (res.step === 'done' ? onSignedIn() : setChallenge(res)) });
  };

  if (challenge)
    return (
      <Suspense fallback={null}>
        <SecondStep challenge={challenge} onSignedIn={onSignedIn} />
      </Suspense>
    );

  return (
    <form onSubmit={(e) => void submit(e)} onFocus={() => void loadCheck()} noValidate>
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
        <Anchor component={Link} to="/forgot-password" ta="center" py="xs">
          Forgot your password?
        </Anchor>
      </Stack>
    </form>
  );
}
