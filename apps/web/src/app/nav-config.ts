import { ROLES, type Role } from '@porestack/types';
import { paths } from '../config/paths';

export type NavItem = {
  /** Stable id, also used by the route guard to find who may open the page. */
  id: string;
  label: string;
  to: (orgId: string) => string;
  /** Roles that see the entry and may open the page. */
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
  { id: 'members', label: 'Members', to: paths.org.members.to, roles: ['admin'] },
  { id: 'activity', label: 'Activity', to: paths.org.activity.to, roles: ['admin'] },
  // Designers see the projects they are on (the API scopes the list), with their design work.
  { id: 'projects', label: 'Projects', to: paths.org.projects.to, roles: ['admin', 'technician', 'lab_manager', 'designer'] },
  { id: 'tests', label: 'Tests', to: paths.org.tests.to, roles: ['admin', 'technician', 'lab_manager'] },
  // Reviewing is the lab manager's alone (the API refuses administrators), so the queue is not offered to them.
  { id: 'review-queue', label: 'Review queue', to: paths.org.reviewQueue.to, roles: ['lab_manager'] },
  { id: 'soil-records', label: 'Soil records', to: paths.org.soilRecords.to, roles: ['admin', 'lab_manager', 'designer', 'client'] },
] as const satisfies readonly NavItem[];

export type NavItemId = (typeof NAV_ITEMS)[number]['id'];

/** The entries one role sees, in order. */
export function navItemsFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => (item.roles as readonly Role[]).includes(role));
}

/** Who may open a page: the nav and the route guard read the same list. */
export function rolesFor(id: NavItemId): readonly Role[] {
  const item = NAV_ITEMS.find((entry) => entry.id === id);
  return item ? item.roles : [];
}
