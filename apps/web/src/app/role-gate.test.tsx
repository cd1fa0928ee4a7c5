import type { Membership, Role } from '@porestack/types';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../test/render';
import { MainNav } from './layout/main-nav';
import { rolesFor } from './nav-config';
import { CurrentOrgContext } from './org-context';
import { RoleGate } from './role-gate';

const ORG = '33333333-3333-4333-8333-333333333333';

function renderAs(role: Role) {
  const membership: Membership = { organisationId: ORG, organisationName: 'Marlpit Laboratory', role };
  return renderWithProviders(
    <CurrentOrgContext.Provider value={{ orgId: ORG, membership, memberships: [membership], user: { id: ORG, name: 'Kit', email: 'kit@example.org' } }}>
      <MainNav orgId={ORG} role={role} />
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
});
