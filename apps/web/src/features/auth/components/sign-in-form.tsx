import { SignInSchema, type Session } from '@porestack/types';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { paths } from '../../../config/paths';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useSignIn } from '../api/sign-in';

type SignInFormProps = {
  onSignedIn: (session: Session) => void;
  /** Pre-fills the address, e.g. after a password reset. */
  defaultEmail?: string;
};

export function SignInForm({ onSignedIn, defaultEmail }: SignInFormProps) {
  const signIn = useSignIn();
  const { errors, onSubmit } = useSchemaForm(SignInSchema, {
    serverError: signIn.error,
    onValid: (data) => signIn.mutate(data, { onSuccess: onSignedIn }),
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Sign in">
      {signIn.error ? <ErrorMessage error={signIn.error} hideIssuesFor={['email', 'password']} /> : null}
      <TextField
        label="E-mail address"
        name="email"
        type="email"
        autoComplete="username"
        autoFocus
        defaultValue={defaultEmail}
        error={errors['email']}
      />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        error={errors['password']}
        hint={
          <Link to={paths.forgotPassword.to()} className="text-accent-700 underline-offset-2 hover:underline">
            Forgotten your password?
          </Link>
        }
      />
      <Button type="submit" pending={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
