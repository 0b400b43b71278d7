import type { SignInStep } from '@benchproof/contracts';
import { Alert, Anchor } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, Navigate, useNavigate } from 'react-router';
import { SetupForm, setupStatusQuery } from '../../../features/auth';
import { PublicCard } from './public-card';

/** First run: the workshop and its first manager. Once a shop exists this page sends people to sign-in. */
export function SetupRoute() {
  const navigate = useNavigate();
  const status = useQuery(setupStatusQuery);
  // Opening the workshop clears the query cache, so the status is asked again and now says closed; without
  // this flag that answer would send the new manager to sign-in while the import page is still loading.
  const [opened, setOpened] = useState(false);
  if (!opened && status.data && !status.data.setupOpen) return <Navigate to="/sign-in" replace />;
  const onDone = (res: SignInStep | { message: string }) => {
    setOpened(true);
    // Only a finished sign-in has a session; any other answer leaves the manager to sign in themselves.
    const signedIn = 'step' in res && res.step === 'done';
    void navigate(signedIn ? '/customers/import?welcome=1' : '/sign-in', { replace: true });
  };
  return (
    <PublicCard wide title="Set up your workshop" intro="This server has no workshop yet. You will be its first manager; invite your staff afterwards.">
      <SetupForm mode="setup" onDone={onDone} />
    </PublicCard>
  );
}

/** Hosted servers (SIGNUP=open): a new workshop signs up and confirms its e-mail. */
export function SignupRoute() {
  const [sent, setSent] = useState<string | null>(null);
  return (
    <PublicCard wide title="Sign your workshop up" intro="You will be its first manager. We send a link to confirm your e-mail before the workshop opens.">
      {sent ? (
        <Alert color="teal" role="status">
          {sent}
        </Alert>
      ) : (
        <SetupForm mode="signup" onDone={(res) => setSent('message' in res ? res.message : '')} />
      )}
      <Anchor component={Link} to="/sign-in" ta="center">
        Already have an account? Sign in
      </Anchor>
    </PublicCard>
  );
}
