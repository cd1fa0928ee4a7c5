import { roleList, type Membership } from '@porestack/types';
import { useQueryClient } from '@tanstack/react-query';
import { useId } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths';

type OrgSwitcherProps = {
  memberships: readonly Membership[];
  /** null when the URL names no organisation of this person. */
  currentOrgId: string | null;
};

/**
 * Lists the person's organisations. Choosing one opens its home and drops the cache of the one
 * left behind (every org query key starts with ['orgs', orgId]), so no data crosses tenants.
 */
export function OrgSwitcher({ memberships, currentOrgId }: OrgSwitcherProps) {
  const id = useId();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const current = memberships.find((membership) => membership.organisationId === currentOrgId);

  if (memberships.length === 1 && current) {
    return (
      <p className="text-sm text-slate-700">
        <span className="sr-only">Organisation: </span>
        <span className="font-medium">{current.organisationName}</span>
        <span className="text-slate-500"> · {roleList(current.roles)}</span>
      </p>
    );
  }

  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="text-sm text-slate-500">
        Organisation
      </label>
      <select
        id={id}
        value={currentOrgId ?? ''}
        onChange={(event) => {
          const next = event.target.value;
          if (!next || next === currentOrgId) return;
          if (currentOrgId) queryClient.removeQueries({ queryKey: ['orgs', currentOrgId] });
          void navigate(paths.org.home.to(next));
        }}
        className="h-8 max-w-64 rounded-md border border-slate-300 bg-white px-2 pr-8 text-sm font-medium text-slate-900 hover:border-slate-400"
      >
        {current ? null : (
          <option value="" disabled>
            Choose an organisation
          </option>
        )}
        {memberships.map((membership) => (
          <option key={membership.organisationId} value={membership.organisationId}>
            {membership.organisationName} ({roleList(membership.roles)})
          </option>
        ))}
      </select>
    </div>
  );
}
