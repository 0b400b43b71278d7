import type { Role } from '@benchproof/contracts';
import { IconBike, IconClipboardList, IconPhotoStar, IconSettings, IconUsers } from '@tabler/icons-react';

export interface NavItem {
  to: string;
  label: string;
  icon: typeof IconBike;
  roles?: Role[];
}

/** The sections of DESIGN.md's screen list. */
export const NAV_ITEMS: NavItem[] = [
  { to: '/jobs', label: 'Jobs', icon: IconClipboardList },
  { to: '/customers', label: 'Customers & bikes', icon: IconBike },
  { to: '/showcase', label: 'Showcase', icon: IconPhotoStar, roles: ['manager'] },
  { to: '/settings/users', label: 'Users & roles', icon: IconUsers, roles: ['manager'] },
  { to: '/settings/shop', label: 'Shop settings', icon: IconSettings, roles: ['manager'] },
];
