import { Button, Modal } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconUserPlus } from '@tabler/icons-react';
import { PageHeader } from '../../../components/page-header';
import { useSession } from '../../../features/auth';
import { AddUserForm, UsersTable } from '../../../features/users';

export function UsersRoute() {
  const [opened, { open, close }] = useDisclosure();
  const { data: me } = useSession();
  return (
    <>
      <PageHeader
        title="Users & roles"
        subtitle="Managers run settings, the front desk books bikes in and records approvals, mechanics work the stand."
        actions={
          <Button leftSection={<IconUserPlus />} onClick={open}>
            Add user
          </Button>
        }
      />
      <UsersTable me={me?.id ?? 0} />
      <Modal opened={opened} onClose={close} title="Add a user" size="md">
        <AddUserForm onDone={close} />
      </Modal>
    </>
  );
}
