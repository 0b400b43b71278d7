import { ROLE_LABELS, type SessionUser } from '@benchproof/contracts';
import { AppShell, Burger, Button, Group, NavLink, ScrollArea, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconLogout } from '@tabler/icons-react';
import { NavLink as RouterNavLink, Outlet, useNavigate } from 'react-router';
import { Logo } from '../../components/logo';
import { useLogout, useSession } from '../../features/auth';
import { NAV_ITEMS } from './nav-items';

function Navigation({ user, onNavigate }: { user: SessionUser; onNavigate: () => void }) {
  return (
    <Stack gap={4}>
      {NAV_ITEMS.filter((i) => !i.roles || i.roles.includes(user.role)).map((item) => (
        <NavLink
          key={item.to}
          component={RouterNavLink}
          to={item.to}
          label={item.label}
          leftSection={<item.icon size={22} stroke={1.7} />}
          onClick={onNavigate}
          styles={{ root: { minHeight: 48, borderRadius: 8 }, label: { fontSize: 16 } }}
        />
      ))}
    </Stack>
  );
}

/** The signed-in frame: header with the mark, a navigation drawer on phones, a sidebar on desktops. */
export function AppLayout() {
  const [opened, { toggle, close }] = useDisclosure();
  const { data: user } = useSession();
  const logout = useLogout();
  const navigate = useNavigate();
  if (!user) return null;

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
              <Text size="sm" fw={600}>{user.name}</Text>
              <Text size="xs" c="dimmed">{ROLE_LABELS[user.role]}</Text>
            </Stack>
            <Button variant="subtle" color="gray" leftSection={<IconLogout size={20} />} onClick={signOut} loading={logout.isPending}>
              Sign out
            </Button>
          </Group>
        </Group>
      </AppShell.Header>
      <AppShell.Navbar p="sm">
        <AppShell.Section grow component={ScrollArea}>
          <Navigation user={user} onNavigate={close} />
        </AppShell.Section>
      </AppShell.Navbar>
      <AppShell.Main>
        <Outlet />
      </AppShell.Main>
    </AppShell>
  );
}
