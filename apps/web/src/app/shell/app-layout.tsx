import { ROLE_LABELS } from '@benchproof/contracts';
import { ActionIcon, AppShell, Burger, Button, Group, ScrollArea, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconKey, IconLogout } from '@tabler/icons-react';
import { Link, Outlet, useNavigate } from 'react-router';
import { Logo } from '../../components/logo';
import { useLogout, useSession } from '../../features/auth';
import { useShopSettings } from '../../features/shop-settings';
import { shopCan } from '../shop-access';
import { Navigation } from './navigation';

/** The signed-in frame: header with the mark, a navigation drawer on phones, a sidebar on desktops. */
export function AppLayout() {
  const [opened, { toggle, close }] = useDisclosure();
  const { data: user } = useSession();
  const { data: shop } = useShopSettings();
  const logout = useLogout();
  const navigate = useNavigate();
  if (!user) return null;
  const can = shopCan(user.role, shop);

  const signOut = () => logout.mutate(undefined, { onSettled: () => void navigate('/sign-in', { replace: true }) });

  return (
    <AppShell header={{ height: 60 }} navbar={{ width: 250, breakpoint: 'sm', collapsed: { mobile: !opened } }} padding="md">
      <AppShell.Header>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
            <Burger opened={opened} onClick={toggle} hiddenFrom="sm" size="md" aria-label="Open navigation" />
            <Logo size={30} />
          </Group>
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
            <Button variant="subtle" color="gray" leftSection={<IconLogout size={20} />} onClick={signOut} loading={logout.isPending}>
              Sign out
            </Button>
          </Group>
        </Group>
      </AppShell.Header>
      <AppShell.Navbar p="sm">
        <AppShell.Section grow component={ScrollArea}>
          <Navigation can={can} onNavigate={close} />
        </AppShell.Section>
      </AppShell.Navbar>
      <AppShell.Main>
        <Outlet />
      </AppShell.Main>
    </AppShell>
  );
}
