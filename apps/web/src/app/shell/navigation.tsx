import type { Action } from '@benchproof/contracts';
import { Stack } from '@mantine/core';
import { NavLink } from 'react-router';
import classes from './navigation.module.css';
import { NAV_ITEMS } from './nav-items';

/** The section links the caller's role may open (ACCESS_POLICY through `can`). */
export function Navigation({ can, onNavigate }: { can: (action: Action) => boolean; onNavigate: () => void }) {
  return (
    <Stack gap={4}>
      {NAV_ITEMS.filter((i) => !i.action || can(i.action)).map((item) => (
        <NavLink key={item.to} to={item.to} className={classes.link} onClick={onNavigate}>
          <item.icon size={22} stroke={1.7} aria-hidden />
          {item.label}
        </NavLink>
      ))}
    </Stack>
  );
}
