import type { CustomerDto } from '@benchproof/contracts';
import { Anchor, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { IconMail, IconPhone } from '@tabler/icons-react';
import type { ReactNode } from 'react';

/** Name, contact and notes of one customer. */
export function CustomerCard({ customer, actions }: { customer: CustomerDto; actions?: ReactNode }) {
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
