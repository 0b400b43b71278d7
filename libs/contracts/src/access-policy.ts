import { ROLES, type Role } from './roles';

/**
 * The one access policy: what each staff role may do, and what an owner-link
 * visitor may do. The api guard (@Can), the web's `can()` and the route-matrix
 * test all read this table, so a role string never appears anywhere else.
 *
 * Per-object rules (the job is in the caller's shop, the job is still open)
 * are not here: they need the row, so the jobs feature's JobAccess checks them.
 */

/** A signed-in staff member of one shop. */
export interface StaffActor {
  kind: 'staff';
  shopId: number;
  userId: number;
  role: Role;
}

/** Someone holding a job's private owner link: one shop, one job, owner-facing actions only. */
export interface OwnerActor {
  kind: 'owner';
  shopId: number;
  jobId: number;
}

export type Actor = StaffActor | OwnerActor;

interface Rule {
  /** Staff roles allowed to do it. */
  staff: readonly Role[];
  /** Whether an owner-link visitor may do it (on their one job only). */
  owner: boolean;
}

const ALL_STAFF = ROLES;
const staff = (...roles: Role[]): Rule => ({ staff: roles, owner: false });
const ownerOnly: Rule = { staff: [], owner: true };

export const ACCESS_POLICY = {
  'session.view': staff(...ALL_STAFF),
  /** Every signed-in staff member may change their own password. */
  'account.change_password': staff(...ALL_STAFF),
  /** Every signed-in staff member may set up or turn off their own two-step sign-in. */
  'account.two_factor': staff(...ALL_STAFF),
  'users.view': staff(...ALL_STAFF),
  'users.manage': staff('manager'),
  'shop.view': staff(...ALL_STAFF),
  'shop.edit': staff('manager'),
  'audit.view': staff('manager'),
  /** See background work that failed (thumbnails, renders, e-mails) and run it again. */
  'work.retry': staff('manager'),
  /** List backups and make one now (the whole database: restore is a server command). */
  'backups.manage': staff('manager'),
  /** Download everything of the shop as one zip. */
  'shop.export': staff('manager'),
  /** Free space on the server's disks (the low-space warning). */
  'storage.view': staff('manager'),
  /** Favourites, captions and the take-down list. */
  'showcase.manage': staff('manager'),
  /** Open the library and export from it; desk only where the shop allows it (canOpenShowcase). */
  'showcase.view': staff('manager', 'desk'),
  'customers.view': staff(...ALL_STAFF),
  'customers.edit': staff('manager', 'desk'),
  /** Download one customer's own data when they ask for it. */
  'customers.export': staff('manager', 'desk'),
  /** Erase a customer's personal data on request (audited, cannot be undone). */
  'customers.erase': staff('manager'),
  /** Bring customers and bikes in from a CSV file, many at once. */
  'customers.import': staff('manager'),
  'bikes.view': staff(...ALL_STAFF),
  'bikes.edit': staff('manager', 'desk'),
  'jobs.view': staff(...ALL_STAFF),
  'jobs.book_in': staff('manager', 'desk'),
  'jobs.edit': staff('manager', 'desk'),
  'jobs.transition': staff(...ALL_STAFF),
  'jobs.final_check': staff('manager', 'mechanic'),
  /** Change evidence on a collected or cancelled job; every use is audited (JobAccess). */
  'jobs.reopen_evidence': staff('manager'),
  'inspection.view': staff(...ALL_STAFF),
  'inspection.record': staff('manager', 'mechanic'),
  'findings.view': staff(...ALL_STAFF),
  'findings.edit': staff('manager', 'mechanic'),
  'findings.recommend': staff(...ALL_STAFF),
  'recommendations.decide': staff('manager', 'desk'),
  'work_log.view': staff(...ALL_STAFF),
  'work_log.record': staff('manager', 'mechanic'),
  'media.view': staff(...ALL_STAFF),
  'media.upload': staff(...ALL_STAFF),
  'media.edit': staff(...ALL_STAFF),
  'media.view_deleted': staff('manager'),
  'media.purge': staff('manager'),
  'annotations.edit': staff('manager', 'mechanic'),
  'pairs.view': staff(...ALL_STAFF),
  'pairs.edit': staff('manager', 'mechanic'),
  'owner_links.view': staff(...ALL_STAFF),
  'owner_links.manage': staff('manager', 'desk'),
  'consent.view': staff(...ALL_STAFF),
  'consent.record': staff('manager', 'desk'),
  'reports.view': staff(...ALL_STAFF),
  'reports.issue': staff('manager', 'desk'),
  /** See the balance and the payments of a job. */
  'payments.view': staff(...ALL_STAFF),
  /** Record money taken at the counter (card terminal, cash, bank transfer). */
  'payments.record': staff('manager', 'desk'),
  /** Give money back against a payment, with a reason. */
  'payments.refund': staff('manager'),
  /** Texts of a job and their delivery status. */
  'texts.view': staff(...ALL_STAFF),
  'owner.view': ownerOnly,
  'owner.decide': ownerOnly,
  'owner.consent': ownerOnly,
  /** Pay what is due through the hosted checkout. */
  'owner.pay': ownerOnly,
} as const satisfies Record<string, Rule>;

export type Action = keyof typeof ACCESS_POLICY;

/** Every action, for the route matrix and exhaustive checks. */
export const ACTIONS = Object.keys(ACCESS_POLICY) as [Action, ...Action[]];

/** Whether a staff role may do an action. */
export function roleCan(role: Role, action: Action): boolean {
  const rule: Rule = ACCESS_POLICY[action];
  return rule.staff.includes(role);
}

/** Whether an actor may do an action (the object-level checks come after, in JobAccess). */
export function actorCan(actor: Actor, action: Action): boolean {
  const rule: Rule = ACCESS_POLICY[action];
  return actor.kind === 'staff' ? rule.staff.includes(actor.role) : rule.owner;
}

/** The staff roles allowed to do an action, in ROLES order. */
export function rolesFor(action: Action): Role[] {
  return ROLES.filter((r) => roleCan(r, action));
}

/**
 * Whether a role may open the showcase library in a shop: whoever manages it always; the
 * others the policy lets view only while the shop's manager has allowed desk access. The
 * api checks this after the policy guard; the web uses it for the navigation and the route.
 */
export function canOpenShowcase(role: Role, shop: { showcaseDeskAccess: boolean }): boolean {
  return roleCan(role, 'showcase.manage') || (roleCan(role, 'showcase.view') && shop.showcaseDeskAccess);
}
