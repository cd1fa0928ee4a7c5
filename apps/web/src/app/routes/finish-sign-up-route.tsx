import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { Button } from '../../components/button';
import { ErrorMessage } from '../../components/error-message';
import { paths } from '../../config/paths';
import { useConfirmSignUp } from '../../features/auth/api/sign-up';
import { AuthPanel } from '../layout/auth-panel';

/** The page the sign-up e-mail links to: `/finish-sign-up?token=…`. */
export function FinishSignUpRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const confirm = useConfirmSignUp();
  const token = params.get('token') ?? '';

  const finish = () =>
    confirm.mutate(
      { token },
      {
        onSuccess: (session) => {
          const org = session.memberships[0];
          void navigate(org ? paths.org.home.to(org.organisationId) : paths.root.to(), { replace: true });
        },
      },
    );

  return (
    <AuthPanel
      title="Finish creating your account"
      description="One click makes your account and your organisation, with you as its administrator."
      footer={
        <>
          Link not working?{' '}
          <Link to={paths.signUp.to()} className="font-medium text-accent-700 hover:underline">
            Sign up again
          </Link>
        </>
      }
    >
      {token === '' ? (
        <Alert tone="error" title="This link has no sign-up code">
          Open the link from the sign-up e-mail again, or sign up again.
        </Alert>
      ) : (
        <div className="flex flex-col gap-4">
          {confirm.error ? <ErrorMessage error={confirm.error} /> : null}
          <Button autoFocus pending={confirm.isPending} onClick={finish}>
            {confirm.isPending ? 'Creating your account…' : 'Create my account'}
          </Button>
        </div>
      )}
    </AuthPanel>
  );
}
