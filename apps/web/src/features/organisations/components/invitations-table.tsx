import { roleList, type Invitation } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Button } from '../../../components/button';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { DataTable } from '../../../components/data-table';
import { formatDateTime } from '../../../lib/format';
import { useRevokeInvitation } from '../api/revoke-invitation';

const column = createColumnHelper<Invitation>();

/** Pending invitations with a revoke button each. Sits flush in a Panel. */
export function InvitationsTable({ orgId, invitations }: { orgId: string; invitations: readonly Invitation[] }) {
  const revoke = useRevokeInvitation(orgId);
  const [toRevoke, setToRevoke] = useState<Invitation | null>(null);

  const columns = useMemo(
    () => [
      column.accessor('email', { header: 'E-mail', cell: (info) => <span className="font-medium text-slate-900">{info.getValue()}</span> }),
      column.accessor('roles', {
        header: 'Roles',
        cell: (info) => (
          <>
            {roleList(info.getValue())}
            {info.row.original.projects.length > 0 ? <span className="block text-xs text-slate-500">with {info.row.original.projects.map((p) => p.reference).join(', ')}</span> : null}
          </>
        ),
      }),
      column.accessor('invitedBy', { header: 'Invited by' }),
      column.accessor('expiresAt', { header: 'Link expires', cell: (info) => formatDateTime(info.getValue()) }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (info) => (
          <Button variant="ghost-danger" size="sm" onClick={() => setToRevoke(info.row.original)}>
            Revoke<span className="sr-only"> the invitation for {info.row.original.email}</span>
          </Button>
        ),
      }),
    ],
    [],
  );

  const table = useReactTable({ data: invitations as Invitation[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.id });

  return (
    <>
      <DataTable table={table} caption="Invitations waiting for an answer" framed={false} />
      <ConfirmDialog
        open={toRevoke !== null}
        title="Revoke this invitation?"
        confirmLabel="Revoke invitation"
        pending={revoke.isPending}
        error={revoke.error}
        onCancel={() => {
          setToRevoke(null);
          revoke.reset();
        }}
        onConfirm={() => {
          if (toRevoke) revoke.mutate(toRevoke.id, { onSuccess: () => setToRevoke(null) });
        }}
      >
        The link sent to {toRevoke?.email} stops working. You can send a new invitation at any time.
      </ConfirmDialog>
    </>
  );
}
