import { InvitationAcceptSchema, ROLE_LABELS, type InvitationPreview, type Session } from '@porestack/types';
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { fieldErrorsFromApi, focusFirstInvalid, formValues, validate, type FieldErrors } from '../../../lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';

type InvitationAcceptFormProps = {
  token: string;
  invitation: InvitationPreview;
  onAccepted: (session: Session) => void;
};

/** A new person chooses a name and password; someone with an account confirms with their password. */
export function InvitationAcceptForm({ token, invitation, onAccepted }: InvitationAcceptFormProps) {
  const accept = useAcceptInvitation(token);
  const [errors, setErrors] = useState<FieldErrors>({});
  const fieldErrors = { ...fieldErrorsFromApi(accept.error), ...errors };
  const isNewAccount = !invitation.accountExists;

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const values = formValues(event.currentTarget);
    const clientErrors: FieldErrors = {};
    if (isNewAccount && (values['name'] ?? '').trim() === '') clientErrors['name'] = 'Enter your name.';
    if (isNewAccount && (values['password'] ?? '').length < 10) clientErrors['password'] = 'Use a password of at least 10 characters.';
    const result = validate(InvitationAcceptSchema, isNewAccount ? values : { password: values['password'] });
    if (!result.ok || Object.keys(clientErrors).length > 0) {
      const allErrors = { ...(result.ok ? {} : result.errors), ...clientErrors };
      setErrors(allErrors);
      focusFirstInvalid(event.currentTarget, allErrors);
      return;
    }
    setErrors({});
    accept.mutate(result.data, { onSuccess: onAccepted });
  };

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Accept the invitation">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md bg-slate-50 px-4 py-3 text-sm">
        <dt className="text-slate-500">Organisation</dt>
        <dd className="font-medium text-slate-900">{invitation.organisationName}</dd>
        <dt className="text-slate-500">Your role</dt>
        <dd className="text-slate-900">{ROLE_LABELS[invitation.role]}</dd>
        <dt className="text-slate-500">E-mail</dt>
        <dd className="break-all text-slate-900">{invitation.email}</dd>
        <dt className="text-slate-500">Invited by</dt>
        <dd className="text-slate-900">{invitation.invitedBy}</dd>
      </dl>
      {accept.error ? <ErrorMessage error={accept.error} hideIssuesFor={['name', 'password']} /> : null}
      {isNewAccount ? (
        <TextField label="Your name" name="name" autoComplete="name" autoFocus error={fieldErrors['name']} />
      ) : null}
      <TextField
        label={isNewAccount ? 'Choose a password' : 'Your Porestack password'}
        name="password"
        type="password"
        autoComplete={isNewAccount ? 'new-password' : 'current-password'}
        autoFocus={!isNewAccount}
        hint={isNewAccount ? 'At least 10 characters.' : 'You already have an account with this address; confirm it is you.'}
        error={fieldErrors['password']}
      />
      <Button type="submit" pending={accept.isPending}>
        {accept.isPending ? 'Joining…' : `Join ${invitation.organisationName}`}
      </Button>
    </form>
  );
}
