import { InvitationCreateSchema, type Role } from '@porestack/types';
import { useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { TextField } from '../../../components/text-field';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useCreateInvitation } from '../api/create-invitation';
import { RoleCheckboxes } from './role-checkboxes';

export function InviteForm({ orgId }: { orgId: string }) {
  const create = useCreateInvitation(orgId);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const emailRef = useRef<HTMLInputElement>(null);
  const [roles, setRoles] = useState<Role[]>(['technician']);
  const { errors, onSubmit: submit } = useSchemaForm(InvitationCreateSchema, {
    toValues: (values) => ({ ...values, roles }),
    serverError: create.error,
    onValid: (data, form) =>
      create.mutate(data, {
        onSuccess: (invitation) => {
          setSentTo(invitation.email);
          form.reset();
          setRoles(['technician']);
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
      <TextField ref={emailRef} label="E-mail address" name="email" type="email" autoComplete="off" error={errors['email']} />
      {/* Roles before the button, so the keyboard reaches them in reading order. */}
      <div className="flex flex-col gap-4 sm:flex-row sm:items-end sm:justify-between">
        <RoleCheckboxes legend="Roles (one or more)" value={roles} onChange={setRoles} error={errors['roles']} />
        <Button type="submit" pending={create.isPending}>
          {create.isPending ? 'Sending…' : 'Send invitation'}
        </Button>
      </div>
      {create.error ? <ErrorMessage error={create.error} hideIssuesFor={['email', 'roles']} /> : null}
      {sentTo ? (
        <Alert tone="success">
          Invitation sent to <strong>{sentTo}</strong>. It appears under pending invitations until they accept it.
        </Alert>
      ) : null}
    </form>
  );
}
