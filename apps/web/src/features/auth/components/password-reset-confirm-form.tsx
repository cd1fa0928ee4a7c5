import { PasswordResetConfirmSchema } from '@porestack/types';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

type PasswordResetConfirmFormProps = {
  token: string;
  onReset: () => void;
};

export function PasswordResetConfirmForm({ token, onReset }: PasswordResetConfirmFormProps) {
  const confirm = useConfirmPasswordReset();
  const { errors, onSubmit } = useSchemaForm(PasswordResetConfirmSchema, {
    toValues: (values) => ({ token, password: values['password'] }),
    // Differing passwords get this message alone: both must be typed again anyway, whatever the schema says of the first.
    check: (values, schemaErrors) =>
      values['password'] === values['passwordAgain']
        ? schemaErrors
        : { passwordAgain: 'The two passwords differ. Type the same password in both fields.' },
    serverError: confirm.error,
    onValid: (data) => confirm.mutate(data, { onSuccess: onReset }),
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Choose a new password">
      {confirm.error ? <ErrorMessage error={confirm.error} hideIssuesFor={['password']} /> : null}
      {errors['token'] ? <Alert tone="error">{errors['token']}</Alert> : null}
      <TextField
        label="New password"
        name="password"
        type="password"
        autoComplete="new-password"
        autoFocus
        hint="At least 10 characters."
        error={errors['password']}
      />
      <TextField
        label="New password, again"
        name="passwordAgain"
        type="password"
        autoComplete="new-password"
        error={errors['passwordAgain']}
      />
      <Button type="submit" pending={confirm.isPending}>
        {confirm.isPending ? 'Saving…' : 'Save new password'}
      </Button>
    </form>
  );
}
