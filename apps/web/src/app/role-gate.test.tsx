import type { Membership, Role } from '@porestack/types';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../test/render';
import { MainNav } from './layout/main-nav';
import { rolesFor } from './nav-config';
import { CurrentOrgContext } from './org-context';
import { RoleGate } from './role-gate';

const ORG = '33333333-3333-4333-8333-333333333333';

function renderAs(...roles: Role[]) {
  const membership: Membership = { organisationId: ORG, organisationName: 'Marlpit Laboratory', roles };
  return renderWithProviders(
    <CurrentOrgContext.Provider value={{ orgId: ORG, membership, memberships: [membership], user: { id: ORG, name: 'Kit', email: 'kit@example.org' } }}>
      <MainNav orgId={ORG} roles={roles} />
      <RoleGate roles={rolesFor('members')} purpose="managing members">
        <h1>Members</h1>
      </RoleGate>
    </CurrentOrgContext.Provider>,
    { path: `/orgs/${ORG}/members` },
  );
}

describe('role-aware navigation and <RoleGate />', () => {
  it('shows an administrator the Members tab, marked current, and the page', () => {
    renderAs('admin');
    const nav = screen.getByRole('navigation', { name: 'Organisation' });
    expect(nav).toContainElement(screen.getByRole('link', { name: 'Members' }));
    expect(screen.getByRole('link', { name: 'Members' })).toHaveAttribute('aria-current', 'page');
    expect(screen.getByRole('heading', { name: 'Members' })).toBeInTheDocument();
  });

  it('hides Members from a technician and explains, with a way home, when they open it anyway', () => {
    renderAs('technician');
    expect(screen.queryByRole('link', { name: 'Members' })).not.toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Members' })).not.toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('You are technician in Marlpit Laboratory. That role does not include managing members.');
    expect(screen.getByRole('link', { name: 'Go to your organisation home' })).toHaveAttribute('href', `/orgs/${ORG}`);
  });

  it('lets a member in when any role they hold may open the page', () => {
    renderAs('lab_manager', 'admin');
    expect(screen.getByRole('heading', { name: 'Members' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Review queue' })).toBeInTheDocument();
  });

  it('names every role held when none of them opens the page', () => {
    renderAs('designer', 'client');
    expect(screen.getByRole('heading', { name: 'This page is not available to your roles' })).toBeInTheDocument();
    expect(screen.getByRole('alert')).toHaveTextContent('You are designer and client in Marlpit Laboratory. Those roles do not include managing members.');
  });
});
