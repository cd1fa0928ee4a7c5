import type { Member } from '@porestack/types';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '../../../test/render';
import { MembersTable } from './members-table';

const ORG = '44444444-4444-4444-8444-444444444444';
const ME = '55555555-5555-4555-8555-555555555555';
const TECH = '66666666-6666-4666-8666-666666666666';
const joinedAt = '2026-01-05T09:00:00.000Z';
const me: Member = { userId: ME, name: 'Rhea Tolland', email: 'rhea@example.org', roles: ['admin'], joinedAt };
const tech: Member = { userId: TECH, name: 'Bram Okoro', email: 'bram@example.org', roles: ['technician'], joinedAt };

/** The browser's network boundary: answers the CSRF token and echoes a PATCHed member. */
function stubApi() {
  const calls: Array<{ method: string; url: string; body: unknown }> = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (url: string, init: RequestInit = {}) => {
      const method = init.method ?? 'GET';
      const body = typeof init.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined;
      calls.push({ method, url, body });
      if (url.endsWith('/api/auth/csrf')) return Response.json({ csrfToken: 'token' });
      if (method === 'PATCH') return Response.json({ ...tech, ...(body as object) });
      return Response.json([]);
    }),
  );
  return calls;
}

describe('<MembersTable />', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('adds a role from the keyboard: Tab to the box, Space ticks it, and the whole new set is sent', async () => {
    const calls = stubApi();
    const user = userEvent.setup();
    renderWithProviders(<MembersTable orgId={ORG} members={[me, tech]} currentUserId={ME} />);
    const roles = screen.getByRole('group', { name: 'Roles of Bram Okoro' });
    const labManager = within(roles).getByRole('checkbox', { name: 'Lab manager' });
    expect(within(roles).getByRole('checkbox', { name: 'Technician' })).toBeChecked();

    within(roles).getByRole('checkbox', { name: 'Technician' }).focus();
    await user.tab();
    expect(labManager).toHaveFocus();
    await user.keyboard(' ');

    await vi.waitFor(() => expect(calls.filter((call) => call.method === 'PATCH')).toHaveLength(1));
    expect(calls.find((call) => call.method === 'PATCH')).toEqual({
      method: 'PATCH',
      url: `/api/orgs/${ORG}/members/${TECH}`,
      body: { roles: ['technician', 'lab_manager'] },
    });
  });

  it('keeps the last role: unticking it sends nothing and says what to do', async () => {
    const calls = stubApi();
    const user = userEvent.setup();
    renderWithProviders(<MembersTable orgId={ORG} members={[me, tech]} currentUserId={ME} />);
    await user.click(within(screen.getByRole('group', { name: 'Roles of Bram Okoro' })).getByRole('checkbox', { name: 'Technician' }));
    const roles = screen.getByRole('group', { name: 'Roles of Bram Okoro' });
    expect(roles).toHaveAccessibleDescription('Choose at least one role. Tick another role first.');
    expect(within(roles).getByRole('checkbox', { name: 'Technician' })).toBeChecked();
    expect(calls.filter((call) => call.method === 'PATCH')).toEqual([]);
  });

  it('lets the only administrator tick her own roles, as nobody else could', () => {
    renderWithProviders(<MembersTable orgId={ORG} members={[me, tech]} currentUserId={ME} />);
    const own = screen.getByRole('group', { name: 'Roles of Rhea Tolland' });
    expect(within(own).getByRole('checkbox', { name: 'Lab manager' })).toBeEnabled();
  });

  it('shows an administrator’s own roles as text when another administrator can change them', () => {
    const otherAdmin: Member = { ...tech, roles: ['admin', 'lab_manager'] };
    renderWithProviders(<MembersTable orgId={ORG} members={[{ ...me, roles: ['admin', 'designer'] }, otherAdmin]} currentUserId={ME} />);
    expect(screen.queryByRole('group', { name: 'Roles of Rhea Tolland' })).not.toBeInTheDocument();
    expect(screen.getByText('Administrator and Designer')).toBeInTheDocument();
    expect(screen.getByText('Another administrator changes your roles.')).toBeInTheDocument();
    const other = screen.getByRole('group', { name: 'Roles of Bram Okoro' });
    expect(within(other).getAllByRole('checkbox', { checked: true }).map((box) => box.closest('label')?.textContent)).toEqual(['Administrator', 'Lab manager']);
  });
});
