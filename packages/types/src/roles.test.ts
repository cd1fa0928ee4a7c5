import { describe, expect, it } from 'vitest';
import { holdsAnyRole, roleList, RolesSchema } from './roles.js';

describe('RolesSchema', () => {
  it('answers the roles once each, in the usual order, whatever order they came in', () => {
    expect(RolesSchema.parse(['lab_manager', 'admin', 'lab_manager'])).toEqual(['admin', 'lab_manager']);
  });

  it('refuses an empty set and names the unknown role’s place', () => {
    expect(RolesSchema.safeParse([]).error?.issues.map((issue) => issue.message)).toEqual(['Choose at least one role.']);
    expect(RolesSchema.safeParse(['client', 'owner']).error?.issues.map((issue) => issue.path)).toEqual([[1]]);
  });
});

describe('holdsAnyRole(held, allowed)', () => {
  it('lets a member in on any one of the roles they hold', () => {
    expect(holdsAnyRole(['admin', 'lab_manager'], ['lab_manager'])).toBe(true);
    expect(holdsAnyRole(['designer', 'client'], ['admin', 'technician'])).toBe(false);
    expect(holdsAnyRole([], ['admin'])).toBe(false);
  });
});

describe('roleList(roles)', () => {
  it('joins labels the way a sentence does', () => {
    expect(roleList(['client'])).toBe('Client');
    expect(roleList(['lab_manager', 'admin'])).toBe('Administrator and Lab manager');
    expect(roleList(['designer', 'technician', 'admin'])).toBe('Administrator, Technician and Designer');
  });
});
