import { Group, Radio, Stack, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { QueryState } from '../../../components/query-state';
import { useCustomerBikes } from '../api/bikes';
import { bikeLabel } from './spec-labels';

/** One of the customer's bikes as big radio cards. */
export function BikeChooser({
  customerId,
  selectedId,
  onPick,
  error,
}: {
  customerId: number;
  selectedId: number | null;
  onPick: (id: number | null) => void;
  error?: ReactNode;
}) {
  const bikes = useCustomerBikes(customerId);
  if (!bikes.data) return <QueryState isLoading={bikes.isLoading} error={bikes.error} />;
  if (bikes.data.length === 0) return <Text c="dimmed">No bikes on file for this customer yet — add a new bike.</Text>;
  return (
    <Radio.Group value={selectedId ? String(selectedId) : null} onChange={(v) => onPick(Number(v))} error={error} label="Which bike?">
      <Stack gap="xs" mt="xs">
        {bikes.data.map((b) => (
          <Radio.Card key={b.id} value={String(b.id)} radius="md" p="md">
            <Group wrap="nowrap" align="flex-start">
              <Radio.Indicator />
              <Stack gap={0}>
                <Text fw={700}>{bikeLabel(b)}</Text>
                <Text size="sm" c="dimmed">
                  {[b.colour, b.size, b.drivetrainSpeeds === 1 ? 'single speed' : `${b.drivetrainSpeeds}-speed`, b.serialNumber && `S/N ${b.serialNumber}`]
                    .filter(Boolean)
                    .join(' · ')}
                </Text>
              </Stack>
            </Group>
          </Radio.Card>
        ))}
      </Stack>
    </Radio.Group>
  );
}
