import { Button, Group, Modal, Stack, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconBike, IconEdit } from '@tabler/icons-react';
import { useParams } from 'react-router';
import { QueryState } from '../../../components/query-state';
import { useCan } from '../../../features/auth';
import { BikeForm, CustomerBikes } from '../../../features/bikes';
import { CustomerCard, CustomerForm, useCustomer } from '../../../features/customers';
import { CustomerData, EraseCustomer } from '../../../features/data-export';
import { CustomerTextsPanel } from '../../../features/mail';

/** /customers/:customerId — contact details (with a STOP reply to texts), the bikes on file and the texts sent. */
export function CustomerRoute() {
  const id = Number(useParams().customerId);
  const customer = useCustomer(id);
  const [editing, edit] = useDisclosure();
  const [adding, add] = useDisclosure();
  const can = useCan();
  const canEdit = can('customers.edit');
  if (!customer.data) return <QueryState isLoading={customer.isLoading} error={customer.error} />;
  return (
    <Stack>
      <CustomerCard
        customer={customer.data}
        actions={
          canEdit && (
            <Button variant="default" leftSection={<IconEdit size={18} />} onClick={edit.open}>
              Edit
            </Button>
          )
        }
      />
      <Group justify="space-between">
        <Title order={3}>Bikes</Title>
        {canEdit && (
          <Button leftSection={<IconBike />} onClick={add.open}>
            Add bike
          </Button>
        )}
      </Group>
      <CustomerBikes customerId={id} />
      <CustomerTextsPanel customerId={id} />
      {can('customers.export') && (
        <CustomerData customerId={id} erase={can('customers.erase') && <EraseCustomer customerId={id} name={customer.data.name} />} />
      )}
      <Modal opened={editing} onClose={edit.close} title="Edit customer" size="lg">
        <CustomerForm customer={customer.data} onDone={edit.close} />
      </Modal>
      <Modal opened={adding} onClose={add.close} title="Add a bike" size="lg">
        <BikeForm customerId={id} onDone={add.close} />
      </Modal>
    </Stack>
  );
}
