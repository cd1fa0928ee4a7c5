import { useEffect, useMemo } from 'react';
import { Navigate, Outlet, useLocation, useParams } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useSession } from '../../features/auth/hooks/use-session';
import { rememberOrg } from '../last-org';
import { CurrentOrgContext, type CurrentOrg } from '../org-context';
import { NotFoundPanel } from '../routes/not-found-panel';
import { SessionError } from '../routes/session-error';
import type { SignInState } from '../routes/sign-in-route';
import { AppShell } from './app-shell';
import { FullPageSpinner } from './full-page-spinner';

/**
 * Everything under /orgs/:orgId: requires a session and a membership of that organisation.
 * An organisation the person is not in looks exactly like one that does not exist.
 */
export function OrgLayout() {
  const { orgId = '' } = useParams();
  const location = useLocation();
  const { session, isPending, error, refetch, membershipFor } = useSession();
  const membership = membershipFor(orgId);

  useEffect(() => {
    if (membership) rememberOrg(orgId);
  }, [membership, orgId]);

  const current = useMemo<CurrentOrg | null>(
    () => (session && membership ? { orgId, membership, user: session.user, memberships: session.memberships } : null),
    [session, membership, orgId],
  );

  if (isPending) return <FullPageSpinner />;
  if (error) return <SessionError error={error} onRetry={refetch} />;
  if (!session) {
    const state: SignInState = { from: `${location.pathname}${location.search}` };
    return <Navigate to={paths.signIn.to()} replace state={state} />;
  }
  if (!current) {
    return (
      <AppShell user={session.user} memberships={session.memberships} current={null}>
        <NotFoundPanel what="organisation" homeTo={paths.root.to()} />
      </AppShell>
    );
  }
  return (
    <CurrentOrgContext.Provider value={current}>
      <AppShell user={session.user} memberships={session.memberships} current={current.membership}>
        <Outlet />
      </AppShell>
    </CurrentOrgContext.Provider>
  );
}
