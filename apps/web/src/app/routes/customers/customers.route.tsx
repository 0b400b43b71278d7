import { Button, Modal } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconTableImport, IconUserPlus } from '@tabler/icons-react';
import { Link, useNavigate } from 'react-router';
import { PageHeader } from '../../../components/page-header';
import { useCan } from '../../../features/auth';
import { CustomerForm, CustomersTable } from '../../../features/customers';

export function CustomersRoute() {
  const [opened, { open, close }] = useDisclosure();
  const navigate = useNavigate();
  const can = useCan();
  const canEdit = can('customers.edit');
  return (
    <>
      <PageHeader
        title="Customers & bikes"
        subtitle="Owners, their bikes, and each bike's history."
        actions={
          <>
            {can('customers.import') && (
              <Button size="lg" variant="default" leftSection={<IconTableImport />} component={Link} to="/customers/import">
                Import from a spreadsheet
              </Button>
            )}
            {canEdit && (
              <Button size="lg" leftSection={<IconUserPlus />} onClick={open}>
                Add customer
              </Button>
            )}
          </>
        }
      />
      <CustomersTable />
      <Modal opened={opened} onClose={close} title="Add a customer" size="lg">
        <CustomerForm
          onDone={(c) => {
            close();
            void navigate(`/customers/${c.id}`);
          }}
        />
      </Modal>
    </>
  );
}
