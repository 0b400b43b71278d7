import type { CustomerDto } from '@benchproof/contracts';
import { Alert, Anchor, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { IconBan, IconMail, IconPhone } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { useDates } from '../../../lib/dates';

/** Name, contact and notes of one customer. */
export function CustomerCard({ customer, actions }: { customer: CustomerDto; actions?: ReactNode }) {
  const dates = useDates();
  return (
    <Paper withBorder p="md" mb="md">
      <Group justify="space-between" align="flex-start">
        <Stack gap={4}>
          <Title order={2}>{customer.name}</Title>
          {customer.phone && (
            <Anchor href={`tel:${customer.phone}`}>
              <Group gap={6} component="span">
                <IconPhone size={18} />
                {customer.phone}
              </Group>
            </Anchor>
          )}
          {customer.email && (
            <Anchor href={`mailto:${customer.email}`}>
              <Group gap={6} component="span">
                <IconMail size={18} />
                {customer.email}
              </Group>
            </Anchor>
          )}
          {customer.textsStoppedAt && (
            <Alert color="orange" variant="light" icon={<IconBan />} p="xs" data-testid="texts-stopped">
              Replied STOP to our texts on {dates.dateTime(customer.textsStoppedAt)}. No texts go to this number until they reply START; links go by e-mail when
              there is an address.
            </Alert>
          )}
          {customer.notes && (
            <Text size="sm" c="dimmed" style={{ whiteSpace: 'pre-wrap' }}>
              {customer.notes}
            </Text>
          )}
        </Stack>
        {actions}
      </Group>
    </Paper>
  );
}
