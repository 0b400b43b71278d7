import { ROLE_LABELS } from '@benchproof/contracts';
import { Alert, Anchor, Button, Loader, Text } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Link, useNavigate } from 'react-router';
import {
  ChoosePasswordForm,
  ForgotPasswordForm,
  invitationPreviewQuery,
  tokenFromHash,
  useAcceptInvitation,
  useConfirmSignup,
  useResetPassword,
} from '../../../features/auth';
import { PublicCard } from './public-card';

const BackToSignIn = () => (
  <Anchor component={Link} to="/sign-in" ta="center">
    Back to sign-in
  </Anchor>
);

/** /join#<token>: an invited person sees who invited them to what, and chooses their own password. */
export function JoinRoute() {
  const navigate = useNavigate();
  const [token] = useState(tokenFromHash);
  const preview = useQuery({ ...invitationPreviewQuery(token), enabled: token.length > 0 });
  const accept = useAcceptInvitation();
  if (preview.isPending && token) return <Loader m="xl" />;
  if (!preview.data)
    return (
      <PublicCard title="This invitation cannot be used">
        <Alert color="red">{preview.error?.message ?? 'The link is incomplete. Open it again from your e-mail.'}</Alert>
        <BackToSignIn />
      </PublicCard>
    );
  const p = preview.data;
  return (
    <PublicCard title={`Join ${p.shopName}`} intro={`${p.name}, you are invited as ${ROLE_LABELS[p.role].toLowerCase()}. You sign in with ${p.email}.`}>
      <ChoosePasswordForm token={token} mutation={accept} label="Save and sign in" onSignedIn={() => void navigate('/jobs', { replace: true })} />
    </PublicCard>
  );
}

/** /reset-password#<token>: a new password; every other device is signed out. */
export function ResetPasswordRoute() {
  const navigate = useNavigate();
  const [token] = useState(tokenFromHash);
  const reset = useResetPassword();
  return (
    <PublicCard title="Choose a new password" intro="Every other device signed in as you will be signed out.">
      <ChoosePasswordForm token={token} mutation={reset} label="Save and sign in" onSignedIn={() => void navigate('/jobs', { replace: true })} />
      <BackToSignIn />
    </PublicCard>
  );
}

export function ForgotPasswordRoute() {
  return (
    <PublicCard title="Forgot your password?" intro="We e-mail you a link to choose a new one. It works once, for 30 minutes.">
      <ForgotPasswordForm />
      <BackToSignIn />
    </PublicCard>
  );
}

/** /signup/confirm#<token>: the sign-up's e-mail is confirmed and the workshop opens. */
export function ConfirmSignupRoute() {
  const navigate = useNavigate();
  const confirm = useConfirmSignup();
  const { mutate } = confirm;
  useEffect(() => mutate({ token: tokenFromHash() }, { onSuccess: () => void navigate('/jobs', { replace: true }) }), [mutate, navigate]);
  return (
    <PublicCard title="Confirming your e-mail">
      {confirm.error ? <Alert color="red">{confirm.error.message}</Alert> : <Text>One moment…</Text>}
      {confirm.error && (
        <Button component={Link} to="/sign-in" size="lg">
          Go to sign-in
        </Button>
      )}
    </PublicCard>
  );
}
