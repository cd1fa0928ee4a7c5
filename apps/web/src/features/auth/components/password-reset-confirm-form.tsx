import { PasswordResetConfirmSchema } from '@porestack/types';
import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { fieldErrorsFromApi, focusFirstInvalid, formValues, validate, type FieldErrors } from '../../../lib/form-errors';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';

type PasswordResetConfirmFormProps = {
  token: string;
  onReset: () => void;
};

export function PasswordResetConfirmForm({ token, onReset }: PasswordResetConfirmFormProps) {
  const confirm = useConfirmPasswordReset();
  const [errors, setErrors] = useState<FieldErrors>({});
  const fieldErrors = { ...fieldErrorsFromApi(confirm.error), ...errors };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const values = formValues(event.currentTarget);
    if (values['password'] !== values['passwordAgain']) {
      const mismatch = { passwordAgain: 'The two passwords differ. Type the same password in both fields.' };
      setErrors(mismatch);
      focusFirstInvalid(event.currentTarget, mismatch);
      return;
    }
    const result = validate(PasswordResetConfirmSchema, { token, password: values['password'] });
    if (!result.ok) {
      setErrors(result.errors);
      focusFirstInvalid(event.currentTarget, result.errors);
      return;
    }
    setErrors({});
    confirm.mutate(result.data, { onSuccess: onReset });
  };

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Choose a new password">
      {confirm.error ? <ErrorMessage error={confirm.error} hideIssuesFor={['password']} /> : null}
      {fieldErrors['token'] ? <Alert tone="error">{fieldErrors['token']}</Alert> : null}
      <TextField
        label="New password"
        name="password"
        type="password"
        autoComplete="new-password"
        autoFocus
        hint="At least 10 characters."
        error={fieldErrors['password']}
      />
      <TextField
        label="New password, again"
        name="passwordAgain"
        type="password"
        autoComplete="new-password"
        error={fieldErrors['passwordAgain']}
      />
      <Button type="submit" pending={confirm.isPending}>
        {confirm.isPending ? 'Saving…' : 'Save new password'}
      </Button>
    </form>
  );
}
