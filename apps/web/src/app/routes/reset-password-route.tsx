import { useQueryClient } from '@tanstack/react-query';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { paths } from '../../config/paths';
import { PasswordResetConfirmForm } from '../../features/auth/components/password-reset-confirm-form';
import { SESSION_QUERY_KEY } from '../../lib/query-client';
import { AuthPanel } from '../layout/auth-panel';
import type { SignInState } from './sign-in-route';

/** The page the reset e-mail links to: `/reset-password?token=…`. */
export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const token = params.get('token') ?? '';

  return (
    <AuthPanel
      title="Choose a new password"
      description="After saving, sign in with the new password. Other devices signed in with the old one are signed out."
      footer={
        <Link to={paths.forgotPassword.to()} className="font-medium text-accent-700 hover:underline">
          Need a new link?
        </Link>
      }
    >
      {token === '' ? (
        <Alert tone="error" title="This link has no reset code">
          Open the link from the password-reset e-mail again, or ask for a new one.
        </Alert>
      ) : (
        <PasswordResetConfirmForm
          token={token}
          onReset={() => {
            // The server ends the session on reset: forget it here too.
            queryClient.clear();
            queryClient.setQueryData(SESSION_QUERY_KEY, null);
            const state: SignInState = { notice: 'password-changed' };
            void navigate(paths.signIn.to(), { replace: true, state });
          }}
        />
      )}
    </AuthPanel>
  );
}
