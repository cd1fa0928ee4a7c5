import { PasswordResetRequestSchema } from '@porestack/types';
import { useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function PasswordResetRequestForm() {
  const request = useRequestPasswordReset();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { errors, onSubmit } = useSchemaForm(PasswordResetRequestSchema, {
    serverError: request.error,
    onValid: (data) => request.mutate(data, { onSuccess: () => setSentTo(data.email) }),
  });

  if (sentTo) {
    return (
      <Alert tone="success" title="Check your inbox">
        If an account uses <strong>{sentTo}</strong>, a link to choose a new password is on its way. The link works once
        and expires after a while; if nothing arrives within a few minutes, check the spam folder or ask again.
      </Alert>
    );
  }

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Request a password reset">
      {request.error ? <ErrorMessage error={request.error} hideIssuesFor={['email']} /> : null}
      <TextField
        label="E-mail address"
        name="email"
        type="email"
        autoComplete="email"
        autoFocus
        error={errors['email']}
      />
      <Button type="submit" pending={request.isPending}>
        {request.isPending ? 'Sending…' : 'Send reset link'}
      </Button>
    </form>
  );
}
