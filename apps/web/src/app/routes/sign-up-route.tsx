import { Link, Navigate, useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { useSession } from '../../features/auth/hooks/use-session';
import { AuthPanel } from '../layout/auth-panel';

export function SignUpRoute() {
  const navigate = useNavigate();
  const { session } = useSession();
  if (session) return <Navigate to={paths.root.to()} replace />;

  return (
    <AuthPanel
      title="Create an account"
      description="Set up your organisation in Porestack. Colleagues join later by invitation, each with their own role."
      footer={
        <>
          Already have an account?{' '}
          <Link to={paths.signIn.to()} className="font-medium text-accent-700 hover:underline">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm
        onSignedUp={(created) => {
          const org = created.memberships[0];
          void navigate(org ? paths.org.home.to(org.organisationId) : paths.root.to(), { replace: true });
        }}
      />
    </AuthPanel>
  );
}
