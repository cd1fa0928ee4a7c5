import { SignUpSchema } from '@porestack/types';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useSignUp } from '../api/sign-up';

const FIELDS = ['name', 'email', 'password', 'organisationName'];

/** Sends the sign-up; the account is made from the link e-mailed to the address (`onSent` gets the server's words). */
export function SignUpForm({ onSent }: { onSent: (message: string) => void }) {
  const signUp = useSignUp();
  const { errors, onSubmit } = useSchemaForm(SignUpSchema, {
    serverError: signUp.error,
    onValid: (data) => signUp.mutate(data, { onSuccess: (sent) => onSent(sent.message) }),
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Create an account">
      {signUp.error ? <ErrorMessage error={signUp.error} hideIssuesFor={FIELDS} /> : null}
      <TextField label="Your name" name="name" autoComplete="name" autoFocus error={errors['name']} />
      <TextField label="E-mail address" name="email" type="email" autoComplete="email" error={errors['email']} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint="10 to 72 characters. A short sentence is easier to remember than symbols."
        error={errors['password']}
      />
      <TextField
        label="Organisation name"
        name="organisationName"
        autoComplete="organization"
        hint="Your laboratory or firm. You become its administrator and can invite colleagues."
        error={errors['organisationName']}
      />
      <Button type="submit" pending={signUp.isPending}>
        {signUp.isPending ? 'Sending the link…' : 'Create account'}
      </Button>
    </form>
  );
}
