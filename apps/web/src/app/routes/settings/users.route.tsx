import { defaultLocaleFor, formatShopDate } from '@benchproof/contracts';
import { Button, Modal } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { IconUserPlus } from '@tabler/icons-react';
import { PageHeader } from '../../../components/page-header';
import { useSession } from '../../../features/auth';
import { shopSettingsQuery } from '../../../features/shop-settings';
import { InvitationsList, InviteForm, UsersTable } from '../../../features/users';

export function UsersRoute() {
  const [opened, { open, close }] = useDisclosure();
  const { data: me } = useSession();
  const { data: shop } = useQuery(shopSettingsQuery);
  // TODO(locale): use the shop's own locale setting once it lands; until then the currency's usual locale.
  const locale = defaultLocaleFor(shop?.currency ?? 'GBP');
  return (
    <>
      <PageHeader
        title="Users & roles"
        subtitle="Managers run settings, the front desk books bikes in and records approvals, mechanics work the stand."
        actions={
          <Button size="md" leftSection={<IconUserPlus />} onClick={open}>
            Invite someone
          </Button>
        }
      />
      <InvitationsList formatDate={(iso) => formatShopDate(iso, locale)} />
      <UsersTable me={me?.id ?? 0} />
      <Modal opened={opened} onClose={close} title="Invite to your workshop" size="md">
        <InviteForm onDone={close} />
      </Modal>
    </>
  );
}
