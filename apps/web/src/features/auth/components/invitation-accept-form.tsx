import { InvitationAcceptSchema, roleList, type InvitationPreview, type Session } from '@porestack/types';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import type { FieldErrors } from '../../../lib/form-errors';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useAcceptInvitation } from '../api/accept-invitation';

type InvitationAcceptFormProps = {
  token: string;
  invitation: InvitationPreview;
  onAccepted: (session: Session) => void;
};

/** A new person chooses a name and password; someone with an account confirms with their password. */
export function InvitationAcceptForm({ token, invitation, onAccepted }: InvitationAcceptFormProps) {
  const accept = useAcceptInvitation(token);
  const isNewAccount = !invitation.accountExists;
  const { errors, onSubmit } = useSchemaForm(InvitationAcceptSchema, {
    toValues: (values) => (isNewAccount ? values : { password: values['password'] }),
    // The shared schema also fits people who already have an account, so a new account's rules are added here.
    check: (values, schemaErrors) => {
      const newAccountErrors: FieldErrors = {};
      if (isNewAccount && (values['name'] ?? '').trim() === '') newAccountErrors['name'] = 'Enter your name.';
      if (isNewAccount && (values['password'] ?? '').length < 10) newAccountErrors['password'] = 'Use a password of at least 10 characters.';
      return { ...schemaErrors, ...newAccountErrors };
    },
    serverError: accept.error,
    onValid: (data) => accept.mutate(data, { onSuccess: onAccepted }),
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Accept the invitation">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md bg-slate-50 px-4 py-3 text-sm">
        <dt className="text-slate-500">Organisation</dt>
        <dd className="font-medium text-slate-900">{invitation.organisationName}</dd>
        <dt className="text-slate-500">{invitation.roles.length > 1 ? 'Your roles' : 'Your role'}</dt>
        <dd className="text-slate-900">{roleList(invitation.roles)}</dd>
        <dt className="text-slate-500">E-mail</dt>
        <dd className="break-all text-slate-900">{invitation.email}</dd>
        <dt className="text-slate-500">Invited by</dt>
        <dd className="text-slate-900">{invitation.invitedBy}</dd>
        {invitation.projectNames.length > 0 ? (
          <>
            <dt className="text-slate-500">Shared with you</dt>
            <dd className="text-slate-900">{invitation.projectNames.join(', ')}</dd>
          </>
        ) : null}
      </dl>
      {accept.error ? <ErrorMessage error={accept.error} hideIssuesFor={['name', 'password']} /> : null}
      {isNewAccount ? (
        <TextField label="Your name" name="name" autoComplete="name" autoFocus error={errors['name']} />
      ) : null}
      <TextField
        label={isNewAccount ? 'Choose a password' : 'Your Porestack password'}
        name="password"
        type="password"
        autoComplete={isNewAccount ? 'new-password' : 'current-password'}
        autoFocus={!isNewAccount}
        hint={isNewAccount ? 'At least 10 characters.' : 'You already have an account with this address; confirm it is you.'}
        error={errors['password']}
      />
      <Button type="submit" pending={accept.isPending}>
        {accept.isPending ? 'Joining…' : `Join ${invitation.organisationName}`}
      </Button>
    </form>
  );
}
