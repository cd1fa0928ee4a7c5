import type { AuditEntry } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { DataTable } from '../../../components/data-table';
import { formatDateTime } from '../../../lib/format';
import { describeAction, describeDetails } from './audit-wording';

const column = createColumnHelper<AuditEntry>();

const columns = [
  column.accessor('at', { header: 'When', cell: (info) => <span className="whitespace-nowrap tabular-nums">{formatDateTime(info.getValue())}</span> }),
  column.accessor('actorName', { header: 'Who', cell: (info) => info.getValue() ?? <span className="text-slate-500">System</span> }),
  column.accessor('action', { header: 'What', cell: (info) => <span className="font-medium text-slate-900">{describeAction(info.getValue())}</span> }),
  column.accessor('details', { header: 'Details', cell: (info) => <span className="text-slate-600">{describeDetails(info.getValue())}</span> }),
];

export function AuditLogTable({ entries }: { entries: readonly AuditEntry[] }) {
  const table = useReactTable({ data: entries as AuditEntry[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.id });
  return <DataTable table={table} caption="Activity in this organisation, newest first" />;
}
