import type { AuditEntry } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { DataTable } from '../../../components/data-table';
import { formatDateTime } from '../../../lib/format';
import { describeEntry } from './audit-wording';

const column = createColumnHelper<AuditEntry>();

const columns = [
  column.accessor('at', { header: 'When', cell: (info) => <span className="whitespace-nowrap tabular-nums">{formatDateTime(info.getValue())}</span> }),
  column.accessor('actorName', { header: 'Who', cell: (info) => info.getValue() ?? <span className="text-slate-500">Porestack (automatic)</span> }),
  column.display({
    id: 'what',
    header: 'What happened',
    cell: (info) => <span className="block min-w-[16rem] whitespace-normal text-slate-800">{describeEntry(info.row.original)}</span>,
  }),
];

export function AuditLogTable({ entries, caption = 'Activity in this organisation, newest first' }: { entries: readonly AuditEntry[]; caption?: string }) {
  const table = useReactTable({ data: entries as AuditEntry[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.id });
  return <DataTable table={table} caption={caption} />;
}
