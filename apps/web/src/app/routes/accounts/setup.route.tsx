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
  if (status.data && !status.data.setupOpen) return <Navigate to="/sign-in" replace />;
  return (
    <PublicCard wide title="Set up your workshop" intro="This server has no workshop yet. You will be its first manager; invite your staff afterwards.">
      <SetupForm mode="setup" onDone={() => void navigate('/customers/import?welcome=1', { replace: true })} />
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
