import { ROLE_LABELS, type InvitationDto } from '@benchproof/contracts';
import { Badge, Button, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { IconMailForward, IconX } from '@tabler/icons-react';
import { useInvitations, useResendInvitation, useWithdrawInvitation } from '../api/users';

/** People invited who have not chosen a password yet, with resend and withdraw. */
export function InvitationsList({ formatDate }: { formatDate: (iso: string) => string }) {
  const { data = [] } = useInvitations();
  if (!data.length) return null;
  return (
    <Stack gap="xs" mb="lg">
      <Title order={3}>Not accepted yet</Title>
      {data.map((inv) => (
        <InvitationRow key={inv.id} inv={inv} formatDate={formatDate} />
      ))}
    </Stack>
  );
}

function InvitationRow({ inv, formatDate }: { inv: InvitationDto; formatDate: (iso: string) => string }) {
  const resend = useResendInvitation();
  const withdraw = useWithdrawInvitation();
  return (
    <Paper withBorder p="sm" radius="md" data-testid="invitation">
      <Group justify="space-between" wrap="wrap" gap="sm">
        <Stack gap={0}>
          <Text fw={600}>
            {inv.name} · {ROLE_LABELS[inv.role]}
          </Text>
          <Text size="sm" c="dimmed">
            {inv.email} · sent {formatDate(inv.sentAt)}
          </Text>
          {inv.expired ? (
            <Badge color="red" variant="light">
              Link expired
            </Badge>
          ) : (
            <Text size="sm" c="dimmed">
              Link works until {formatDate(inv.expiresAt)}
            </Text>
          )}
        </Stack>
        <Group gap="xs">
          <Button variant="default" size="md" leftSection={<IconMailForward />} loading={resend.isPending} onClick={() => resend.mutate(inv.id)}>
            Send again
          </Button>
          <Button variant="subtle" color="red" size="md" leftSection={<IconX />} loading={withdraw.isPending} onClick={() => withdraw.mutate(inv.id)}>
            Withdraw
          </Button>
        </Group>
      </Group>
    </Paper>
  );
}
