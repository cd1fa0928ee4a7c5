import { roleList, RolesSchema, type Member, type Role } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Button } from '../../../components/button';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ErrorMessage } from '../../../components/error-message';
import { formatDate } from '../../../lib/format';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMemberRoles } from '../api/update-member-roles';
import { RoleCheckboxes } from './role-checkboxes';
import { DataTable } from '../../../components/data-table';

type MembersTableProps = {
  orgId: string;
  members: readonly Member[];
  /**
   * The signed-in person: they cannot remove themselves here, and change their own roles only
   * as the organisation's only administrator (otherwise another administrator does it).
   */
  currentUserId: string;
};

const column = createColumnHelper<Member>();

/** The members, with their roles to tick and a remove button for everyone but oneself. Sits flush in a Panel. */
export function MembersTable({ orgId, members, currentUserId }: MembersTableProps) {
  const updateRoles = useUpdateMemberRoles(orgId);
  const removeMember = useRemoveMember(orgId);
  const [toRemove, setToRemove] = useState<Member | null>(null);
  /** A change refused before sending (no role left), by member. */
  const [refused, setRefused] = useState<{ userId: string; message: string } | null>(null);
  const soleAdmin = members.filter((member) => member.roles.includes('admin')).length === 1;

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
      column.accessor('roles', {
        header: 'Roles',
        cell: (info) => {
          const member = info.row.original;
          if (member.userId === currentUserId && !soleAdmin) {
            return (
              <span>
                {roleList(member.roles)}
                <span className="block text-xs text-slate-500">Another administrator changes your roles.</span>
              </span>
            );
          }
          const pending = updateRoles.isPending && updateRoles.variables?.userId === member.userId;
          // While the change is on its way, the boxes show what was asked for.
          const shown: readonly Role[] = pending && updateRoles.variables ? updateRoles.variables.roles : member.roles;
          return (
            <RoleCheckboxes
              legend={`Roles of ${member.name}`}
              hideLegend
              value={shown}
              disabled={pending}
              error={refused?.userId === member.userId ? refused.message : undefined}
              onChange={(next) => {
                const checked = RolesSchema.safeParse(next);
                if (!checked.success) {
                  setRefused({ userId: member.userId, message: `${checked.error.issues[0]?.message ?? 'Choose at least one role.'} Tick another role first.` });
                  return;
                }
                setRefused(null);
                updateRoles.mutate({ userId: member.userId, roles: checked.data });
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
    [currentUserId, soleAdmin, refused, updateRoles],
  );

  const table = useReactTable({ data: members as Member[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.userId });

  return (
    <div>
      {updateRoles.error ? (
        <div className="px-5 pt-4">
          <ErrorMessage error={updateRoles.error} title="The roles were not changed" />
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
