import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';
import { PasswordResetRequestForm } from '../../features/auth/components/password-reset-request-form';
import { AuthPanel } from '../layout/auth-panel';

export function ForgotPasswordRoute() {
  return (
    <AuthPanel
      title="Reset your password"
      description="Enter the address you sign in with. We e-mail you a link to choose a new password."
      footer={
        <Link to={paths.signIn.to()} className="font-medium text-accent-700 hover:underline">
          Back to sign-in
        </Link>
      }
    >
      <PasswordResetRequestForm />
    </AuthPanel>
  );
}
