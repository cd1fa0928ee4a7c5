import { ROLE_LABELS, RoleSchema, type Member } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Button } from '../../../components/button';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { formatDate } from '../../../lib/format';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMemberRole } from '../api/update-member-role';
import { ROLE_OPTIONS } from './role-options';
import { DataTable } from '../../../components/data-table';

type MembersTableProps = {
  orgId: string;
  members: readonly Member[];
  /** The signed-in person: they cannot change their own role or remove themselves here. */
  currentUserId: string;
};

const column = createColumnHelper<Member>();

/** The members, with a role picker and a remove button for everyone but oneself. Sits flush in a Panel. */
export function MembersTable({ orgId, members, currentUserId }: MembersTableProps) {
  const updateRole = useUpdateMemberRole(orgId);
  const removeMember = useRemoveMember(orgId);
  const [toRemove, setToRemove] = useState<Member | null>(null);

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <span className="font-medium text-slate-900">
            {info.getValue()}
            {info.row.original.userId === currentUserId ? <span className="ml-2 text-xs font-normal text-slate-500">(you)</span> : null}
          </span>
        ),
      }),
      column.accessor('email', { header: 'E-mail', cell: (info) => info.getValue() }),
      column.accessor('role', {
        header: 'Role',
        cell: (info) => {
          const member = info.row.original;
          if (member.userId === currentUserId) return ROLE_LABELS[member.role];
          const pending = updateRole.isPending && updateRole.variables?.userId === member.userId;
          return (
            <Select
              label={`Role of ${member.name}`}
              hideLabel
              size="sm"
              className="w-40"
              options={ROLE_OPTIONS}
              value={member.role}
              disabled={pending}
              onChange={(event) => {
                const role = RoleSchema.parse(event.target.value);
                updateRole.mutate({ userId: member.userId, role });
              }}
            />
          );
        },
      }),
      column.accessor('joinedAt', { header: 'Joined', cell: (info) => formatDate(info.getValue()) }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (info) =>
          info.row.original.userId === currentUserId ? null : (
            <Button variant="ghost-danger" size="sm" onClick={() => setToRemove(info.row.original)}>
              Remove<span className="sr-only"> {info.row.original.name}</span>
            </Button>
          ),
      }),
    ],
    [currentUserId, updateRole],
  );

  const table = useReactTable({ data: members as Member[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.userId });

  return (
    <div>
      {updateRole.error ? (
        <div className="px-5 pt-4">
          <ErrorMessage error={updateRole.error} title="The role was not changed" />
        </div>
      ) : null}
      <DataTable table={table} caption="Members of this organisation" framed={false} />
      <ConfirmDialog
        open={toRemove !== null}
        title={`Remove ${toRemove?.name ?? 'this member'}?`}
        confirmLabel="Remove member"
        pending={removeMember.isPending}
        error={removeMember.error}
        onCancel={() => {
          setToRemove(null);
          removeMember.reset();
        }}
        onConfirm={() => {
          if (toRemove) removeMember.mutate(toRemove.userId, { onSuccess: () => setToRemove(null) });
        }}
      >
        {toRemove?.name} ({toRemove?.email}) loses access to this organisation at once. Their account and their work in
        other organisations stay. You can invite them again later.
      </ConfirmDialog>
    </div>
  );
}
