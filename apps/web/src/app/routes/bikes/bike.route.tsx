import { Anchor, Button, Group, Modal, Paper, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconEdit } from '@tabler/icons-react';
import { Link, useParams } from 'react-router';
import { QueryState } from '../../../components/query-state';
import { useCan } from '../../../features/auth';
import { BikeForm, BikeHistoryPanel, bikeLabel, BikeSpecs, useBike } from '../../../features/bikes';

/** /bikes/:bikeId — specs, visits and the wear trend across them. */
export function BikeRoute() {
  const id = Number(useParams().bikeId);
  const bike = useBike(id);
  const can = useCan();
  const [editing, edit] = useDisclosure();
  if (!bike.data) return <QueryState isLoading={bike.isLoading} error={bike.error} />;
  const b = bike.data;
  return (
    <Stack>
      <Paper withBorder p="md">
        <Group justify="space-between" align="flex-start" mb="sm">
          <Stack gap={2}>
            <Title order={2}>{bikeLabel(b)}</Title>
            <Text>
              Owner:{' '}
              <Anchor component={Link} to={`/customers/${b.customerId}`}>
                {b.ownerName}
              </Anchor>
            </Text>
          </Stack>
          {can('bikes.edit') && (
            <Button variant="default" leftSection={<IconEdit size={18} />} onClick={edit.open}>
              Edit
            </Button>
          )}
        </Group>
        <BikeSpecs bike={b} />
      </Paper>
      <BikeHistoryPanel bikeId={id} />
      <Modal opened={editing} onClose={edit.close} title="Edit bike" size="lg">
        <BikeForm customerId={b.customerId} bike={b} onDone={edit.close} />
      </Modal>
    </Stack>
  );
}
