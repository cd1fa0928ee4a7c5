import { ROLE_LABELS, roleList, ROLES, type HomeOverview } from '@porestack/types';
import { Link } from 'react-router-dom';
import { Panel } from '../../../components/panel';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';

/** The administrator's members and pending invitations at a glance (recent activity is composed beside it). */
export function AdminMembersPanel({ orgId, section }: { orgId: string; section: NonNullable<HomeOverview['admin']> }) {
  const total = section.memberTotal;
  return (
    <Panel title="Members" description={`${total} ${total === 1 ? 'member' : 'members'} in all; one member may hold several roles.`}>
      <ul className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-3" aria-label="Members by role">
        {ROLES.map((role) => (
          <li key={role} className="flex justify-between gap-2">
            <span className="text-slate-700">{ROLE_LABELS[role]}</span>
            <span className="tabular-nums font-medium text-slate-900">{section.memberCounts[role]}</span>
          </li>
        ))}
      </ul>
      <h3 className="mt-5 text-sm font-semibold text-slate-900">Pending invitations</h3>
      {section.pendingInvitations.length === 0 ? (
        <p className="mt-1 text-sm text-slate-600">No invitation is waiting to be accepted.</p>
      ) : (
        <ul className="mt-1 divide-y divide-slate-100 text-sm" aria-label="Pending invitations">
          {section.pendingInvitations.map((i) => (
            <li key={i.id} className="flex flex-wrap justify-between gap-x-4 py-1.5">
              <span>
                <span className="font-medium text-slate-900">{i.email}</span> <span className="text-slate-600">as {roleList(i.roles)}</span>
                {i.projects.length > 0 ? <span className="block text-xs text-slate-600">with {i.projects.map((p) => p.reference).join(', ')}</span> : null}
              </span>
              <span className="text-xs text-slate-600">until {formatDate(i.expiresAt)}</span>
            </li>
          ))}
        </ul>
      )}
      <p className="mt-4 text-sm">
        <Link to={paths.org.members.to(orgId)} className="font-medium text-accent-700 hover:underline">Invite someone or change roles →</Link>
      </p>
    </Panel>
  );
}
