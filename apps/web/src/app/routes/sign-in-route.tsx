import { Link, Navigate, useLocation, useNavigate } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { paths } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useSession } from '../../features/auth/hooks/use-session';
import { AuthPanel } from '../layout/auth-panel';

/** What other pages may pass when they send someone here. */
export type SignInState = { from?: string; notice?: 'signed-out' | 'password-changed' };

const NOTICES: Record<NonNullable<SignInState['notice']>, string> = {
  'signed-out': 'You are signed out. Sign in again whenever you need Porestack.',
  'password-changed': 'Your new password is saved. Sign in with it now.',
};

export function SignInRoute() {
  const navigate = useNavigate();
  const state = (useLocation().state ?? {}) as SignInState;
  const { session } = useSession();
  if (session) return <Navigate to={paths.root.to()} replace />;

  return (
    <AuthPanel
      title="Sign in"
      description="Use the e-mail address your laboratory registered you with."
      footer={
        <>
          New to Porestack?{' '}
          <Link to={paths.signUp.to()} className="font-medium text-accent-700 hover:underline">
            Create an account for your organisation
          </Link>
        </>
      }
    >
      {state.notice ? (
        <Alert tone="success" className="mb-4">
          {NOTICES[state.notice]}
        </Alert>
      ) : null}
      <SignInForm onSignedIn={() => void navigate(state.from ?? paths.root.to(), { replace: true })} />
    </AuthPanel>
  );
}
