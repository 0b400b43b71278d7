import { Button, Stack, Text, Title } from '@mantine/core';
import { IconDownload } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { customerExportUrl } from '../api/data-export';

/** "Their data" on the customer page: a download when the customer asks for a copy; the erase button is passed in for managers. */
export function CustomerData({ customerId, erase }: { customerId: number; erase?: ReactNode }) {
  return (
    <Stack gap="sm" data-testid="customer-data">
      <Title order={3}>Customer’s data</Title>
      <Text size="sm">
        When the customer asks for a copy of what the shop holds about them: one zip with their details, bikes and jobs, photos and issued reports.
      </Text>
      <Button size="lg" variant="default" component="a" href={customerExportUrl(customerId)} download leftSection={<IconDownload />}>
        Download this customer’s data
      </Button>
      {erase}
    </Stack>
  );
}
