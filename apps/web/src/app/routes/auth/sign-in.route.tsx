import { Anchor, Center, Paper, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { Logo } from '../../../components/logo';
import { setupStatusQuery, SignInForm } from '../../../features/auth';

const NOTICES: Record<string, string> = {
  expired: 'Your session has expired. Please sign in again — nothing you saved is lost.',
  signed_out: 'You have been signed out.',
};

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const status = useQuery(setupStatusQuery);
  const next = params.get('next');
  const safeNext = next?.startsWith('/') && !next.startsWith('//') ? next : '/jobs';

  return (
    <Center mih="100dvh" p="md" bg="bench.0">
      <Paper withBorder shadow="sm" p="xl" radius="lg" w="100%" maw={420}>
        <Stack gap="lg">
          <Logo size={40} />
          <div>
            <Title order={2}>Sign in to the bench</Title>
            <Text c="dimmed">Staff of your workshop only. Bike owners use the link in their e-mail.</Text>
          </div>
          <SignInForm notice={NOTICES[params.get('reason') ?? ''] ?? null} onSignedIn={() => void navigate(safeNext, { replace: true })} />
          {status.data?.signupOpen && (
            <Anchor component={Link} to="/signup" ta="center" py="xs">
              New workshop? Sign it up
            </Anchor>
          )}
        </Stack>
      </Paper>
    </Center>
  );
}
