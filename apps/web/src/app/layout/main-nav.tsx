import type { Role } from '@porestack/types';
import { NavLink } from 'react-router-dom';
import { navItemsFor } from '../nav-config';

/** Tabs for the pages the member's roles open in the current organisation. */
export function MainNav({ orgId, roles }: { orgId: string; roles: readonly Role[] }) {
  return (
    <nav aria-label="Organisation" className="-mb-px flex gap-1 overflow-x-auto">
      {navItemsFor(roles).map((item) => (
        <NavLink
          key={item.id}
          to={item.to(orgId)}
          end={item.end ?? false}
          className={({ isActive }) =>
            `whitespace-nowrap border-b-2 px-3 py-2 text-sm font-medium ${
              isActive ? 'border-accent-600 text-accent-700' : 'border-transparent text-slate-600 hover:border-slate-300 hover:text-slate-900'
            }`
          }
        >
          {item.label}
        </NavLink>
      ))}
    </nav>
  );
}
