import type { LoginResponse, SignInStep, TotpEnrolment } from '@benchproof/contracts';
import { Alert, Button, Stack } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { IconAlertTriangle, IconShieldLock } from '@tabler/icons-react';
import { useEffect, useState, type FormEvent } from 'react';
import { api, ApiError, setCsrfToken } from '../../../lib/api-client';
import { CodeInput } from './code-input';
import { RecoveryCodesCard } from './recovery-codes';
import { TotpSetup } from './totp-setup';

type Challenge = Extract<SignInStep, { step: 'code' | 'enrol' }>;

/**
 * After the password: the code from the app, or (the shop requires it, not set up yet) setting the app up
 * with its first code. No session exists until this step succeeds.
 */
export function SecondStep({ challenge, onSignedIn }: { challenge: Challenge; onSignedIn: () => void }) {
  const qc = useQueryClient();
  const [code, setCode] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [enrolment, setEnrolment] = useState<TotpEnrolment | null>(null);
  const [recovery, setRecovery] = useState<string[] | null>(null);
  useEffect(() => {
    if (challenge.step === 'enrol') void api<TotpEnrolment>('/auth/login/enrol', { method: 'POST', body: { challenge: challenge.challenge }, quietAuth: true }).then(setEnrolment, (e: unknown) => setError(messageOf(e)));
  }, [challenge]);

  const submit = async (e: FormEvent) => {
    e.preventDefault();
    setBusy(true);
    try {
      const path = challenge.step === 'code' ? '/auth/login/code' : '/auth/login/enrol/confirm';
      const res = await api<LoginResponse & { recoveryCodes?: string[] }>(path, { method: 'POST', body: { challenge: challenge.challenge, code }, quietAuth: true });
      setCsrfToken(res.csrfToken);
      qc.clear();
      qc.setQueryData(['session'], res.user);
      if (res.recoveryCodes) setRecovery(res.recoveryCodes);
      else onSignedIn();
    } catch (err) {
      setError(messageOf(err));
    } finally {
      setBusy(false);
    }
  };

  if (recovery) return <RecoveryCodesCard codes={recovery} onDone={onSignedIn} />;
  return (
    <form onSubmit={(e) => void submit(e)} noValidate>
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
