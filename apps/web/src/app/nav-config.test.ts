import { ROLES } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { NAV_ITEMS, navItemsFor, rolesFor } from './nav-config';

describe('navItemsFor(roles)', () => {
  it('gives administrators every page but the review queue (reviewing is for lab managers), in order', () => {
    expect(navItemsFor(['admin']).map((item) => item.label)).toEqual(['Home', 'Members', 'Activity', 'Projects', 'Tests', 'Soil records']);
  });

  it('gives technicians the bench pages: projects and tests', () => {
    expect(navItemsFor(['technician']).map((item) => item.label)).toEqual(['Home', 'Projects', 'Tests']);
  });

  it('gives lab managers the review queue and the soil records as well', () => {
    expect(navItemsFor(['lab_manager']).map((item) => item.label)).toEqual(['Home', 'Projects', 'Tests', 'Review queue', 'Soil records']);
  });

  it.each(['designer', 'client'] as const)('gives a %s their projects and the soil records', (role) => {
    expect(navItemsFor([role]).map((item) => item.label)).toEqual(['Home', 'Projects', 'Soil records']);
  });

  it('gives an administrator who is also lab manager every page, each once, in order', () => {
    expect(navItemsFor(['admin', 'lab_manager']).map((item) => item.label)).toEqual([
      'Home',
      'Members',
      'Activity',
      'Projects',
      'Tests',
      'Review queue',
      'Soil records',
    ]);
  });

  it('gives a technician who also designs the bench pages and the soil records', () => {
    expect(navItemsFor(['technician', 'designer']).map((item) => item.label)).toEqual(['Home', 'Projects', 'Tests', 'Soil records']);
  });

  it('builds links inside the organisation in the URL', () => {
    expect(navItemsFor(['admin']).map((item) => item.to('org-1'))).toEqual([
      '/orgs/org-1',
      '/orgs/org-1/members',
      '/orgs/org-1/activity',
      '/orgs/org-1/projects',
      '/orgs/org-1/tests',
      '/orgs/org-1/soil-records',
    ]);
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
