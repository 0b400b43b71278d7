import { Anchor, Card, SimpleGrid, Text } from '@mantine/core';
import { Link } from 'react-router';
import { QueryState } from '../../../components/query-state';
import { useCustomerBikes } from '../api/bikes';
import { bikeLabel, BRAKE_TYPE_LABELS } from './spec-labels';

/** A customer's bikes, each linking to its page with history. */
export function CustomerBikes({ customerId }: { customerId: number }) {
  const bikes = useCustomerBikes(customerId);
  if (!bikes.data) return <QueryState isLoading={bikes.isLoading} error={bikes.error} />;
  if (bikes.data.length === 0) return <Text c="dimmed">No bikes on file yet.</Text>;
  return (
    <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }}>
      {bikes.data.map((b) => (
        <Card key={b.id} withBorder padding="md">
          <Anchor component={Link} to={`/bikes/${b.id}`} fw={700} size="lg">
            {bikeLabel(b)}
          </Anchor>
          <Text size="sm" c="dimmed">
            {[b.colour, b.size, `${b.drivetrainSpeeds}-speed`, BRAKE_TYPE_LABELS[b.brakeType]].filter(Boolean).join(' · ')}
          </Text>
        </Card>
      ))}
    </SimpleGrid>
  );
}
