import { ResetPasswordRequestSchema, type SignInStep } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import type { UseMutationResult } from '@tanstack/react-query';
import { IconAlertTriangle, IconKey } from '@tabler/icons-react';
import { lazy, Suspense, useState } from 'react';
import { contractResolver, formFailure, showServerFieldErrors } from '../../../lib/form';
import { NewPasswordInput, weakPasswordMessage } from './new-password-input';

const SecondStep = lazy(() => import('./second-step').then((m) => ({ default: m.SecondStep })));

// Invitation and reset requests carry the same password rule; the token comes from the link, not from a box.
const PasswordBox = ResetPasswordRequestSchema.pick({ password: true });

type StepMutation = UseMutationResult<SignInStep, Error, { token: string; password: string }>;

/** Invitation and reset links: the person chooses their password, then signs in (with the second step where needed). */
export function ChoosePasswordForm({ token, mutation, label, onSignedIn }: { token: string; mutation: StepMutation; label: string; onSignedIn: () => void }) {
  const form = useForm({ initialValues: { password: '' }, validate: contractResolver(PasswordBox, (v: { password: string }) => v) });
  const [next, setNext] = useState<Extract<SignInStep, { step: 'code' | 'enrol' }> | null>(null);
  const submit = form.onSubmit(({ password }) =>
    mutation.mutate(
      { token, password },
      { onSuccess: (res) => (res.step === 'done' ? onSignedIn() : setNext(res)), onError: (e) => showServerFieldErrors(form, e) },
    ),
  );
  if (next)
    return (
      <Suspense fallback={null}>
        <SecondStep challenge={next} onSignedIn={onSignedIn} />
      </Suspense>
    );
  const weak = weakPasswordMessage(mutation.error);
  const failure = weak ? null : formFailure(mutation.error);
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {failure}
          </Alert>
        )}
        <NewPasswordInput {...form.getInputProps('password')} error={form.errors.password ?? weak} />
        <Button type="submit" size="lg" leftSection={<IconKey />} loading={mutation.isPending}>
          {label}
        </Button>
      </Stack>
    </form>
  );
}
