import type { Action } from '@benchproof/contracts';
import { IconAlertTriangle, IconBike, IconClipboardList, IconDatabase, IconPhotoStar, IconSettings, IconUsers } from '@tabler/icons-react';

export interface NavItem {
  to: string;
  label: string;
  icon: typeof IconBike;
  /** The ACCESS_POLICY action the page needs; none means every signed-in role. */
  action?: Action;
}

/** The sections of DESIGN.md's screen list. */
export const NAV_ITEMS: NavItem[] = [
  { to: '/jobs', label: 'Jobs', icon: IconClipboardList },
  { to: '/customers', label: 'Customers & bikes', icon: IconBike },
  { to: '/showcase', label: 'Showcase', icon: IconPhotoStar, action: 'showcase.view' },
  { to: '/settings/users', label: 'Users & roles', icon: IconUsers, action: 'users.manage' },
  { to: '/settings/shop', label: 'Shop settings', icon: IconSettings, action: 'shop.edit' },
  { to: '/settings/data', label: 'Backups & export', icon: IconDatabase, action: 'backups.manage' },
  { to: '/settings/work', label: 'Failed work', icon: IconAlertTriangle, action: 'work.retry' },
];
