import { roleList } from '@porestack/types';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { ErrorMessage } from '../../components/error-message';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { useInvitation } from '../../features/auth/api/get-invitation';
import { InvitationAcceptForm } from '../../features/auth/components/invitation-accept-form';
import { AuthPanel } from '../layout/auth-panel';

/** The page the invitation e-mail links to: `/invitations/<token>`. */
export function InvitationRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invitation = useInvitation(token);

  if (invitation.isPending) {
    return (
      <AuthPanel title="Your invitation">
        <LoadingBlock label="Checking the invitation…" />
      </AuthPanel>
    );
  }
  if (invitation.error) {
    return (
      <AuthPanel
        title="This invitation cannot be used"
        footer={
          <Link to={paths.signIn.to()} className="font-medium text-accent-700 hover:underline">
            Go to sign-in
          </Link>
        }
      >
        <ErrorMessage error={invitation.error} />
        <p className="mt-4 text-sm text-slate-600">
          Invitations expire and work only once. Ask the person who invited you to send a new one.
        </p>
      </AuthPanel>
    );
  }

  const preview = invitation.data;
  return (
    <AuthPanel
      title={`Join ${preview.organisationName}`}
      description={`${preview.invitedBy} invited you to Porestack as ${roleList(preview.roles).toLowerCase()}.`}
    >
      <InvitationAcceptForm
        token={token}
        invitation={preview}
        onAccepted={(session) => {
          const joined = session.memberships.find((membership) => membership.organisationName === preview.organisationName);
          void navigate(joined ? paths.org.home.to(joined.organisationId) : paths.root.to(), { replace: true });
        }}
      />
    </AuthPanel>
  );
}
