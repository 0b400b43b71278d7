import type { Action } from '@benchproof/contracts';
import { NavLink, Stack } from '@mantine/core';
import { NavLink as RouterNavLink } from 'react-router';
import { NAV_ITEMS } from './nav-items';

/** The section links the caller's role may open (ACCESS_POLICY through `can`). */
export function Navigation({ can, onNavigate }: { can: (action: Action) => boolean; onNavigate: () => void }) {
  return (
    <Stack gap={4}>
      {NAV_ITEMS.filter((i) => !i.action || can(i.action)).map((item) => (
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
