import { holdsAnyRole, LAB_STAFF_ROLES, ROLE_ACCESS, ROLES, type Role } from '@porestack/types';
import { paths } from '../config/paths';

export type NavItem = {
  /** Stable id, also used by the route guard to find who may open the page. */
  id: string;
  label: string;
  to: (orgId: string) => string;
  /** Roles that see the entry and may open the page: a member holding any one of them does. */
  roles: readonly Role[];
  /** Match the path exactly (the organisation home would otherwise be active everywhere). */
  end?: boolean;
};

/**
 * The organisation navigation, in display order. To add a page: add an entry here, a route in
 * router.tsx guarded with `rolesFor('<id>')`, and its path in config/paths.ts.
 */
export const NAV_ITEMS = [
  { id: 'home', label: 'Home', to: paths.org.home.to, roles: ROLES, end: true },
  { id: 'members', label: 'Members', to: paths.org.members.to, roles: ROLE_ACCESS.admins },
  { id: 'activity', label: 'Activity', to: paths.org.activity.to, roles: ROLE_ACCESS.admins },
  // Designers and clients see the projects they are on (the API scopes the list).
  { id: 'projects', label: 'Projects', to: paths.org.projects.to, roles: ROLE_ACCESS.projectReaders },
  // The lab's own working pages; designers reach a test from a project or a soil record instead.
  { id: 'tests', label: 'Tests', to: paths.org.tests.to, roles: LAB_STAFF_ROLES },
  // Reviewing is the lab manager's (the API refuses an administrator who is not also lab manager).
  { id: 'review-queue', label: 'Review queue', to: paths.org.reviewQueue.to, roles: ROLE_ACCESS.reviewers },
  // For those who approve records and those who use them; technicians work on their tests (the API would let them read records).
  { id: 'soil-records', label: 'Soil records', to: paths.org.soilRecords.to, roles: ['admin', 'lab_manager', 'designer', 'client'] },
] as const satisfies readonly NavItem[];

export type NavItemId = (typeof NAV_ITEMS)[number]['id'];

/** The entries a member holding `roles` sees, in order. */
export function navItemsFor(roles: readonly Role[]): NavItem[] {
  return NAV_ITEMS.filter((item) => holdsAnyRole(roles, item.roles));
}

/** Who may open a page: the nav and the route guard read the same list. */
export function rolesFor(id: NavItemId): readonly Role[] {
  const item = NAV_ITEMS.find((entry) => entry.id === id);
  return item ? item.roles : [];
}
