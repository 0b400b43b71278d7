import type { LoginResponse, SignInStep, TotpEnrolment } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { IconAlertTriangle, IconShieldLock } from '@tabler/icons-react';
import { useEffect, useState, type FormEvent } from 'react';
import { api, ApiError, setCsrfToken } from '../../../lib/api-client';
import { sessionKey } from '../api/session';
import { CodeInput } from './code-input';
import { RecoveryCodesCard } from './recovery-codes';
import { TotpSetup } from './totp-setup';

type Challenge = Extract<SignInStep, { step: 'code' | 'enrol' }>;

/**
 * After the password: the code from the app, or (the shop requires it, not set up yet) setting the app up
 * with its first code. No session exists until this step succeeds.
 */
/** Sends the code for the challenge; a set-up answer also carries the recovery codes to show once. */
function useSecondStep(challenge: Challenge, onSignedIn: () => void) {
  const qc = useQueryClient();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [recovery, setRecovery] = useState<string[] | null>(null);
  const send = async (code: string) => {
    setBusy(true);
    try {
      const path = challenge.step === 'code' ? '/auth/login/code' : '/auth/login/enrol/confirm';
      const res = await api<LoginResponse & { recoveryCodes?: string[] }>(path, {
        method: 'POST',
        body: { challenge: challenge.challenge, code },
        quietAuth: true,
      });
      setCsrfToken(res.csrfToken);
      qc.clear();
      qc.setQueryData(sessionKey, res.user);
      if (res.recoveryCodes) setRecovery(res.recoveryCodes);
      else onSignedIn();
    } catch (err) {
      setError(messageOf(err));
    } finally {
      setBusy(false);
    }
  };
  return { send, error, setError, busy, recovery };
}

export function SecondStep({ challenge, onSignedIn }: { challenge: Challenge; onSignedIn: () => void }) {
  const [code, setCode] = useState('');
  const [enrolment, setEnrolment] = useState<TotpEnrolment | null>(null);
  const { send, error, setError, busy, recovery } = useSecondStep(challenge, onSignedIn);
  useEffect(() => {
    if (challenge.step !== 'enrol') return;
    void api<TotpEnrolment>('/auth/login/enrol', { method: 'POST', body: { challenge: challenge.challenge }, quietAuth: true }).then(
      setEnrolment,
      (e: unknown) => setError(messageOf(e)),
    );
  }, [challenge, setError]);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    void send(code);
  };

  if (recovery) return <RecoveryCodesCard codes={recovery} onDone={onSignedIn} />;
  return (
    <form onSubmit={submit} noValidate>
      <Stack>
        {challenge.step === 'enrol' && (
          <Alert color="brass" variant="light" icon={<IconShieldLock />}>
            Your workshop asks everyone to sign in in two steps. Set it up once now.
          </Alert>
        )}
        {enrolment && <TotpSetup enrolment={enrolment} />}
        {error && (
          <Alert color="red" variant="light" icon={<IconAlertTriangle />} role="alert">
            {error}
          </Alert>
        )}
        <CodeInput value={code} onChange={setCode} />
        <Button type="submit" size="lg" loading={busy} leftSection={<IconShieldLock />}>
          {challenge.step === 'code' ? 'Sign in' : 'Turn on and sign in'}
        </Button>
      </Stack>
    </form>
  );
}

const messageOf = (e: unknown): string => (e instanceof ApiError ? e.message : 'Sign-in failed.');
