import { ROLES } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { NAV_ITEMS, navItemsFor, rolesFor } from './nav-config';

describe('navItemsFor(role)', () => {
  it('gives administrators Home, Members and Activity, in that order', () => {
    expect(navItemsFor('admin').map((item) => item.label)).toEqual(['Home', 'Members', 'Activity']);
  });

  it.each(['technician', 'lab_manager', 'designer', 'client'] as const)('gives a %s only Home for now', (role) => {
    expect(navItemsFor(role).map((item) => item.label)).toEqual(['Home']);
  });

  it('builds links inside the organisation in the URL', () => {
    expect(navItemsFor('admin').map((item) => item.to('org-1'))).toEqual(['/orgs/org-1', '/orgs/org-1/members', '/orgs/org-1/activity']);
  });
});

describe('rolesFor(id)', () => {
  it('returns the same roles the navigation shows the entry to', () => {
    for (const item of NAV_ITEMS) expect(rolesFor(item.id)).toEqual(item.roles);
  });

  it('lets every role open the organisation home', () => {
    expect(rolesFor('home')).toEqual(ROLES);
  });
});
