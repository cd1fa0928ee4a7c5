import { Link, Navigate, useLocation, useNavigate, useSearchParams } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { paths } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { useSession } from '../../features/auth/hooks/use-session';
import { AuthPanel } from '../layout/auth-panel';

/** What other pages may pass when they send someone here (sign-out passes `?notice=signed-out`, as it reloads). */
export type SignInState = { from?: string; notice?: Notice };
type Notice = 'signed-out' | 'password-changed';

const NOTICES: Record<Notice, string> = {
  'signed-out': 'You are signed out. Sign in again whenever you need Porestack.',
  'password-changed': 'Your new password is saved. Sign in with it now.',
};

export function SignInRoute() {
  const navigate = useNavigate();
  const state = (useLocation().state ?? {}) as SignInState;
  const [params] = useSearchParams();
  const noticeParam = params.get('notice');
  const notice = state.notice ?? (noticeParam === 'signed-out' ? noticeParam : undefined);
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
      {notice ? (
        <Alert tone="success" className="mb-4">
          {NOTICES[notice]}
        </Alert>
      ) : null}
      <SignInForm onSignedIn={() => void navigate(state.from ?? paths.root.to(), { replace: true })} />
    </AuthPanel>
  );
}
