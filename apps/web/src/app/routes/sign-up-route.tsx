import { useState } from 'react';
import { Link, Navigate } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { paths } from '../../config/paths';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { useSession } from '../../features/auth/hooks/use-session';
import { AuthPanel } from '../layout/auth-panel';

export function SignUpRoute() {
  const { session } = useSession();
  const [sent, setSent] = useState<string | null>(null);
  if (session) return <Navigate to={paths.root.to()} replace />;

  return (
    <AuthPanel
      title="Create an account"
      description="Set up your organisation in Porestack. Colleagues join later by invitation, each with their own roles."
      footer={
        <>
          Already have an account?{' '}
          <Link to={paths.signIn.to()} className="font-medium text-accent-700 hover:underline">
            Sign in
          </Link>
        </>
      }
    >
      {sent ? (
        <Alert tone="success" title="Check your inbox">
          {sent} You can close this page.
        </Alert>
      ) : (
        <SignUpForm onSent={setSent} />
      )}
    </AuthPanel>
  );
}
