import { ROLE_LABELS, type SessionUser } from '@benchproof/contracts';
import { ActionIcon, Burger, Group, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconKey } from '@tabler/icons-react';
import { Suspense, useEffect } from 'react';
import { Link, Outlet } from 'react-router';
import { Logo } from '../../components/logo';
import { DatesLocale } from '../../lib/dates';
import { useSession } from '../../features/auth';
import { DiskSpaceWarning } from '../../features/disk-space';
import { attachShots, UploadBadge } from '../../features/media';
import { useShopSettings } from '../../features/shop-settings';
import { shopCan } from '../shop-access';
import classes from './app-layout.module.css';
import { Navigation } from './navigation';
import { OfflineAge } from './offline-age';
import { SignOutButton } from './sign-out';
import { UpdatePrompt } from './update-prompt';

/** The signed-in user's name and role, the change-password key and sign-out, at the header's right. */
function AccountActions({ user }: { user: SessionUser }) {
  return (
    <Group gap="xs" wrap="nowrap">
      <Stack gap={0} visibleFrom="xs" align="flex-end">
        <Text size="sm" fw={600}>
          {user.name}
        </Text>
        <Text size="xs" c="dimmed">
          {ROLE_LABELS[user.role]}
        </Text>
      </Stack>
      <ActionIcon component={Link} to="/account/password" variant="subtle" color="gray" size={44} aria-label="Change password" title="Change password">
        <IconKey size={22} />
      </ActionIcon>
      <SignOutButton />
    </Group>
  );
}

/** The signed-in frame: header with the mark, a navigation panel on phones, a sidebar on desktops (app-layout.module.css). */
export function AppLayout() {
  const [opened, { toggle, close }] = useDisclosure();
  const { data: user } = useSession();
  const { data: shop } = useShopSettings();
  // The signed-in user's shots kept on this phone come back and carry on uploading (app open, sign-in).
  const userId = user?.id;
  useEffect(() => {
    if (userId !== undefined) void attachShots(userId);
  }, [userId]);
  if (!user) return null;
  const can = shopCan(user.role, shop);

  return (
    <>
      <header className={classes.header}>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="xs" wrap="nowrap">
            <Burger
              opened={opened}
              onClick={toggle}
              hiddenFrom="sm"
              size="md"
              aria-label="Open navigation"
              aria-expanded={opened}
              aria-controls="app-navigation"
            />
            <Logo size={30} />
            <UploadBadge />
          </Group>
          <AccountActions user={user} />
        </Group>
      </header>
      <nav id="app-navigation" aria-label="Sections" className={classes.navbar} data-opened={opened || undefined}>
        <Navigation can={can} onNavigate={close} />
      </nav>
      <main className={classes.main}>
        {can('storage.view') && (
          <Suspense fallback={null}>
            <DiskSpaceWarning />
          </Suspense>
        )}
        <UpdatePrompt />
        <OfflineAge />
        <DatesLocale locale={shop?.dateLocale}>
          <Outlet />
        </DatesLocale>
      </main>
    </>
  );
}
