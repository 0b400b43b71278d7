import type { Action } from '@benchproof/contracts';
import { Stack } from '@mantine/core';
import { IconAlertTriangle, IconBike, IconClipboardList, IconDatabase, IconPhotoStar, IconSettings, IconUsers } from '@tabler/icons-react';
import { NavLink } from 'react-router';
import { MENU, type MenuIcon } from '../route-table';
import classes from './navigation.module.css';

const ICONS: Record<MenuIcon, typeof IconBike> = {
  jobs: IconClipboardList,
  customers: IconBike,
  showcase: IconPhotoStar,
  users: IconUsers,
  shop: IconSettings,
  data: IconDatabase,
  work: IconAlertTriangle,
};

/** The route table's menu entries the caller's role may open (ACCESS_POLICY through `can`). */
export function Navigation({ can, onNavigate }: { can: (action: Action) => boolean; onNavigate: () => void }) {
  return (
    <Stack gap={4}>
      {MENU.filter((i) => !i.action || can(i.action)).map((item) => {
        const Icon = ICONS[item.icon];
        return (
          <NavLink key={item.to} to={item.to} className={classes.link} onClick={onNavigate}>
            <Icon size={22} stroke={1.7} aria-hidden />
            {item.label}
          </NavLink>
        );
      })}
    </Stack>
  );
}
