/**
 * Staff roles (DESIGN.md). The bike owner is not a user. Kept free of zod so the web's
 * first screen (route guards, the header's role label) can read them without the schema library.
 */
export const ROLES = ['manager', 'desk', 'mechanic'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  manager: 'Manager',
  desk: 'Front desk',
  mechanic: 'Mechanic',
};
