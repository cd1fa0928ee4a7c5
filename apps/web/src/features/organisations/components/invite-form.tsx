import { InvitationCreateSchema } from '@porestack/types';
import { useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useCreateInvitation } from '../api/create-invitation';
import { ROLE_OPTIONS } from './role-options';

export function InviteForm({ orgId }: { orgId: string }) {
  const create = useCreateInvitation(orgId);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const emailRef = useRef<HTMLInputElement>(null);
  const { errors, onSubmit: submit } = useSchemaForm(InvitationCreateSchema, {
    serverError: create.error,
    onValid: (data, form) =>
      create.mutate(data, {
        onSuccess: (invitation) => {
          setSentTo(invitation.email);
          form.reset();
          emailRef.current?.focus();
        },
      }),
  });

  // The last confirmation goes as soon as another invitation is sent, valid or not.
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    setSentTo(null);
    submit(event);
  };

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-label="Invite a colleague">
      <div className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_12rem_auto] sm:items-start">
        <TextField ref={emailRef} label="E-mail address" name="email" type="email" autoComplete="off" error={errors['email']} />
        <Select label="Role" name="role" options={ROLE_OPTIONS} defaultValue="technician" error={errors['role']} />
        <Button type="submit" pending={create.isPending} className="sm:mt-6">
          {create.isPending ? 'Sending…' : 'Send invitation'}
        </Button>
      </div>
      {create.error ? <ErrorMessage error={create.error} hideIssuesFor={['email', 'role']} /> : null}
      {sentTo ? (
        <Alert tone="success">
          Invitation sent to <strong>{sentTo}</strong>. It appears under pending invitations until they accept it.
        </Alert>
      ) : null}
    </form>
  );
}
