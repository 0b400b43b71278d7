import { ROLE_LABELS, type SessionUser } from '@benchproof/contracts';
import { ActionIcon, Burger, Button, Group, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconKey, IconLogout } from '@tabler/icons-react';
import { Suspense } from 'react';
import { Link, Outlet, useNavigate } from 'react-router';
import { Logo } from '../../components/logo';
import { DatesLocale } from '../../lib/dates';
import { useLogout, useSession } from '../../features/auth';
import { DiskSpaceWarning } from '../../features/disk-space';
import { useShopSettings } from '../../features/shop-settings';
import { shopCan } from '../shop-access';
import classes from './app-layout.module.css';
import { Navigation } from './navigation';

/** The signed-in user's name and role, the change-password key and sign-out, at the header's right. */
function AccountActions({ user }: { user: SessionUser }) {
  const logout = useLogout();
  const navigate = useNavigate();
  const signOut = () => logout.mutate(undefined, { onSettled: () => void navigate('/sign-in', { replace: true }) });
  return (
    <Group gap="sm" wrap="nowrap">
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
      {/* On a phone the word does not fit beside the mark and the key: the icon, with its name for screen readers. */}
      <ActionIcon hiddenFrom="xs" variant="subtle" color="gray" size={44} aria-label="Sign out" title="Sign out" onClick={signOut} loading={logout.isPending}>
        <IconLogout size={22} />
      </ActionIcon>
      <Button visibleFrom="xs" variant="subtle" color="gray" leftSection={<IconLogout size={20} />} onClick={signOut} loading={logout.isPending}>
        Sign out
      </Button>
    </Group>
  );
}

/** The signed-in frame: header with the mark, a navigation panel on phones, a sidebar on desktops (app-layout.module.css). */
export function AppLayout() {
  const [opened, { toggle, close }] = useDisclosure();
  const { data: user } = useSession();
  const { data: shop } = useShopSettings();
  if (!user) return null;
  const can = shopCan(user.role, shop);

  return (
    <>
      <header className={classes.header}>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
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
        <DatesLocale locale={shop?.dateLocale}>
          <Outlet />
        </DatesLocale>
      </main>
    </>
  );
}
