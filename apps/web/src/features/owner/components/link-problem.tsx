import type { ErrorCode } from '@benchproof/contracts';
import { Alert, Stack, Text, Title } from '@mantine/core';

const HEADINGS: Partial<Record<ErrorCode | 'NETWORK', string>> = {
  OWNER_LINK_EXPIRED: 'This link has expired',
  OWNER_LINK_REVOKED: 'This link is no longer in use',
  OWNER_LINK_INVALID: 'This link does not work',
  RATE_LIMITED: 'Too many tries',
  NETWORK: 'No connection',
};

/**
 * What a visitor with a dead link sees: why, and how to get a new one. It
 * shows nothing of any job — the server gave us nothing to show.
 */
export function LinkProblem({ code, message }: { code: ErrorCode | 'NETWORK'; message: string }) {
  return (
    <Stack maw={480} mx="auto" p="md" pt="xl" gap="md">
      <Title order={1} size="h2">
        {HEADINGS[code] ?? 'This page cannot be shown'}
      </Title>
      <Text size="lg">{message}</Text>
      <Alert color="gray" variant="light" title="How to get a new link">
        Call or e-mail the workshop that has your bike and ask them to send you a new link to your bike’s page. For your privacy, each link works for a limited
        time and only the newest one is active.
      </Alert>
    </Stack>
  );
}
