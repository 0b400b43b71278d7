import type { SignInStep } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import type { UseMutationResult } from '@tanstack/react-query';
import { IconAlertTriangle, IconKey } from '@tabler/icons-react';
import { lazy, Suspense, useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-client';
import { NewPasswordInput, weakPasswordMessage } from './new-password-input';

const SecondStep = lazy(() => import('./second-step').then((m) => ({ default: m.SecondStep })));

type StepMutation = UseMutationResult<SignInStep, Error, { token: string; password: string }>;

/** Invitation and reset links: the person chooses their password, then signs in (with the second step where needed). */
export function ChoosePasswordForm({ token, mutation, label, onSignedIn }: { token: string; mutation: StepMutation; label: string; onSignedIn: () => void }) {
  const [password, setPassword] = useState('');
  const [next, setNext] = useState<Extract<SignInStep, { step: 'code' | 'enrol' }> | null>(null);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    mutation.mutate({ token, password }, { onSuccess: (res) => (res.step === 'done' ? onSignedIn() : setNext(res)) });
  };
  if (next)
    return (
      <Suspense fallback={null}>
        <SecondStep challenge={next} onSignedIn={onSignedIn} />
      </Suspense>
    );
  const weak = weakPasswordMessage(mutation.error);
  const tooShort = mutation.error instanceof ApiError && mutation.error.code === 'VALIDATION_FAILED' ? 'At least 10 characters' : null;
  const failure = !weak && !tooShort && mutation.error ? mutation.error.message : null;
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {failure && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {failure}
          </Alert>
        )}
        <NewPasswordInput value={password} onChange={(e) => setPassword(e.currentTarget.value)} error={weak ?? tooShort} />
        <Button type="submit" size="lg" leftSection={<IconKey />} loading={mutation.isPending}>
          {label}
        </Button>
      </Stack>
    </form>
  );
}
