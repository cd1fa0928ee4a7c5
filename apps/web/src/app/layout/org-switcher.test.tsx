import type { Membership } from '@porestack/types';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../../test/render';
import { OrgSwitcher } from './org-switcher';

const NORTH = '11111111-1111-4111-8111-111111111111';
const SOUTH = '22222222-2222-4222-8222-222222222222';
const memberships: Membership[] = [
  { organisationId: NORTH, organisationName: 'North Quay Soils', roles: ['admin', 'lab_manager'] },
  { organisationId: SOUTH, organisationName: 'Southfen Geotechnics', roles: ['technician'] },
];

describe('<OrgSwitcher memberships currentOrgId />', () => {
  it('lists every organisation with the person’s roles in it, the current one chosen', () => {
    renderWithProviders(<OrgSwitcher memberships={memberships} currentOrgId={NORTH} />);
    const select = screen.getByRole('combobox', { name: 'Organisation' });
    expect(select).toHaveDisplayValue('North Quay Soils (Administrator and Lab manager)');
    expect(screen.getAllByRole('option').map((option) => option.textContent)).toEqual([
      'North Quay Soils (Administrator and Lab manager)',
      'Southfen Geotechnics (Technician)',
    ]);
  });

  it('opens the chosen organisation’s home and drops only the cache of the one left', async () => {
    const user = userEvent.setup();
    const { queryClient } = renderWithProviders(<OrgSwitcher memberships={memberships} currentOrgId={NORTH} />, {
      path: `/orgs/${NORTH}/members`,
    });
    queryClient.setQueryData(['orgs', NORTH, 'members'], []);
    queryClient.setQueryData(['orgs', SOUTH, 'members'], []);
    queryClient.setQueryData(['session'], null);

    await user.selectOptions(screen.getByRole('combobox', { name: 'Organisation' }), 'Southfen Geotechnics (Technician)');

    expect(screen.getByRole('status', { name: 'Current path' })).toHaveTextContent(`/orgs/${SOUTH}`);
    expect(queryClient.getQueryData(['orgs', NORTH, 'members'])).toBeUndefined();
    expect(queryClient.getQueryData(['orgs', SOUTH, 'members'])).toEqual([]);
    expect(queryClient.getQueryCache().find({ queryKey: ['session'] })).toBeDefined();
  });

  it('shows a single organisation as text, since there is nothing to switch to', () => {
    renderWithProviders(<OrgSwitcher memberships={memberships.slice(0, 1)} currentOrgId={NORTH} />);
    expect(screen.queryByRole('combobox')).not.toBeInTheDocument();
    expect(screen.getByText('North Quay Soils')).toBeInTheDocument();
    expect(screen.getByText('· Administrator and Lab manager')).toBeInTheDocument();
  });

  it('asks to choose when the URL names an organisation the person is not in', () => {
    renderWithProviders(<OrgSwitcher memberships={memberships.slice(0, 1)} currentOrgId={null} />);
    expect(screen.getByRole('combobox', { name: 'Organisation' })).toHaveDisplayValue('Choose an organisation');
  });
});
