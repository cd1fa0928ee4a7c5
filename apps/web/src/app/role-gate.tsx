import { holdsAnyRole, roleList, type Role } from '@porestack/types';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { buttonClasses } from '../components/button';
import { paths } from '../config/paths';
import { useCurrentOrg } from './org-context';

type RoleGateProps = {
  roles: readonly Role[];
  /** What the page is for, to finish the sentence "Your role does not include …". */
  purpose: string;
  children: ReactNode;
};

/** Shows the page to a member holding any of the roles that may use it; everyone else learns why and where to go. */
export function RoleGate({ roles, purpose, children }: RoleGateProps) {
  const { orgId, membership } = useCurrentOrg();
  if (holdsAnyRole(membership.roles, roles)) return <>{children}</>;
  const several = membership.roles.length > 1;
  return (
    <div role="alert" className="mx-auto max-w-lg rounded-lg border border-amber-300 bg-white p-6">
      <h1 className="text-lg font-semibold text-slate-900">This page is not available to your {several ? 'roles' : 'role'}</h1>
      <p className="mt-2 text-sm text-slate-700">
        You are {roleList(membership.roles).toLowerCase()} in {membership.organisationName}. {several ? 'Those roles do' : 'That role does'} not
        include {purpose}. If you need it, ask an administrator of {membership.organisationName} to change your roles.
      </p>
      <Link to={paths.org.home.to(orgId)} className={`${buttonClasses('secondary')} mt-5`}>
        Go to your organisation home
      </Link>
    </div>
  );
}
