import { ProjectShareCreateSchema, type ProjectShareOutcome } from '@porestack/types';
import { useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ErrorMessage } from '../../../components/error-message';
import { LoadingBlock } from '../../../components/spinner';
import { TextField } from '../../../components/text-field';
import { formatDate } from '../../../lib/format';
import { useSchemaForm } from '../../../lib/use-schema-form';
import { useProjectClients } from '../api/get-project-clients';
import { useShareProject } from '../api/share-project';
import { useWithdrawShare, type ShareToWithdraw } from '../api/withdraw-share';

type Withdrawal = ShareToWithdraw & { email: string };

function outcomeWords(outcome: ProjectShareOutcome): string {
  return outcome.outcome === 'shared'
    ? `Shared with ${outcome.client.name} (${outcome.client.email}). They were told by e-mail and can open the project now.`
    : `${outcome.invitation.email} has no client account here yet, so they were invited by e-mail. The project is theirs to read once they accept.`;
}

/**
 * Who the project is shared with, for lab managers and admins: share by e-mail (a client member
 * at once, anyone else by invitation), and withdraw. Clients read only approved results.
 */
export function ProjectClientsPanel({ orgId, projectId, projectName }: { orgId: string; projectId: string; projectName: string }) {
  const clients = useProjectClients(orgId, projectId);
  const share = useShareProject(orgId, projectId);
  const withdraw = useWithdrawShare(orgId, projectId);
  const [done, setDone] = useState<string | null>(null);
  const [toWithdraw, setToWithdraw] = useState<Withdrawal | null>(null);
  const emailRef = useRef<HTMLInputElement>(null);
  const { errors, onSubmit: submit } = useSchemaForm(ProjectShareCreateSchema, {
    serverError: share.error,
    onValid: (data, form) =>
      share.mutate(data, {
        onSuccess: (outcome) => {
          setDone(outcomeWords(outcome));
          form.reset();
          emailRef.current?.focus();
        },
      }),
  });
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    setDone(null);
    submit(event);
  };

  return (
    <div className="space-y-5">
      <form noValidate onSubmit={onSubmit} aria-label="Share with a client" className="space-y-3">
        <div className="grid gap-3 sm:grid-cols-[minmax(0,1fr)_auto] sm:items-start">
          <TextField
            ref={emailRef}
            label="Client’s e-mail address"
            name="email"
            type="email"
            autoComplete="off"
            error={errors['email']}
            hint="A client member of the organisation gets the project at once; anyone else is invited as a client."
          />
          <Button type="submit" pending={share.isPending} className="sm:mt-6">
            {share.isPending ? 'Sharing…' : 'Share project'}
          </Button>
        </div>
        {share.error ? <ErrorMessage error={share.error} hideIssuesFor={['email']} /> : null}
        {done ? <Alert tone="success">{done}</Alert> : null}
      </form>
      {clients.isPending ? (
        <LoadingBlock label="Loading who the project is shared with…" />
      ) : clients.error ? (
        <ErrorMessage error={clients.error} title="Who the project is shared with could not be loaded" onRetry={() => void clients.refetch()} />
      ) : clients.data.clients.length === 0 && clients.data.invitations.length === 0 ? (
        <p className="text-sm text-slate-600">Not shared with any client yet.</p>
      ) : (
        <ul className="divide-y divide-slate-100 rounded-md border border-slate-200" aria-label="Clients of this project">
          {clients.data.clients.map((c) => (
            <li key={c.userId} className="flex flex-wrap items-center justify-between gap-2 px-4 py-2.5 text-sm">
              <span>
                <span className="font-medium text-slate-900">{c.name}</span> <span className="text-slate-600">{c.email}</span>
                <span className="block text-xs text-slate-500">
                  Shared {formatDate(c.sharedAt)}
                  {c.sharedByName ? ` by ${c.sharedByName}` : ''}
                </span>
              </span>
              <Button variant="ghost-danger" size="sm" onClick={() => setToWithdraw({ kind: 'client', userId: c.userId, email: c.email })}>
                Withdraw
              </Button>
            </li>
          ))}
          {clients.data.invitations.map((i) => (
            <li key={i.invitationId} className="flex flex-wrap items-center justify-between gap-2 px-4 py-2.5 text-sm">
              <span>
                <span className="font-medium text-slate-900">{i.email}</span> <span className="rounded-full bg-slate-100 px-2 py-0.5 text-xs text-slate-600">invited, not yet accepted</span>
                <span className="block text-xs text-slate-500">
                  Invited {formatDate(i.invitedAt)} by {i.invitedByName} · the link works until {formatDate(i.expiresAt)}
                </span>
              </span>
              <Button variant="ghost-danger" size="sm" onClick={() => setToWithdraw({ kind: 'invitation', invitationId: i.invitationId, email: i.email })}>
                Withdraw
              </Button>
            </li>
          ))}
        </ul>
      )}
      <ConfirmDialog
        open={toWithdraw !== null}
        title="Withdraw the sharing?"
        confirmLabel="Withdraw"
        pending={withdraw.isPending}
        error={withdraw.error}
        onCancel={() => {
          setToWithdraw(null);
          withdraw.reset();
        }}
        onConfirm={() => {
          if (toWithdraw) withdraw.mutate(toWithdraw, { onSuccess: () => setToWithdraw(null) });
        }}
      >
        {toWithdraw?.kind === 'invitation'
          ? `${toWithdraw.email} will not get ${projectName} when they accept. An invitation made only for this project is withdrawn altogether.`
          : `${toWithdraw?.email ?? ''} will no longer see ${projectName} or its results. Their account and any other shared projects stay.`}
      </ConfirmDialog>
    </div>
  );
}
