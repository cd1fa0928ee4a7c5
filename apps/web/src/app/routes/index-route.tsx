import { Navigate } from 'react-router-dom';
import { useSession } from '../../features/auth/hooks/use-session';
import { paths } from '../../config/paths';
import { FullPageSpinner } from '../layout/full-page-spinner';
import { lastOrg } from '../last-org';
import { NoOrganisation } from './no-organisation';
import { SessionError } from './session-error';

/** "/" sends the person where they belong: sign-in, their last organisation, or an explanation. */
export function IndexRoute() {
  const { session, isPending, error, refetch } = useSession();
  if (isPending) return <FullPageSpinner />;
  if (error) return <SessionError error={error} onRetry={refetch} />;
  if (!session) return <Navigate to={paths.signIn.to()} replace />;
  const remembered = session.memberships.find((membership) => membership.organisationId === lastOrg());
  const target = remembered ?? session.memberships[0];
  if (!target) return <NoOrganisation user={session.user} />;
  return <Navigate to={paths.org.home.to(target.organisationId)} replace />;
}
