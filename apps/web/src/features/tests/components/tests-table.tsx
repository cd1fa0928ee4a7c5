import type { TestSummary } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/data-table';
import { TestStatusBadge } from '../../../components/test-status-badge';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';

const column = createColumnHelper<TestSummary>();

export function TestsTable({ orgId, tests }: { orgId: string; tests: readonly TestSummary[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'updatedAt', desc: true }]);
  const columns = useMemo(
    () => [
      column.accessor('reference', {
        header: 'Test',
        cell: (info) => (
          <Link to={paths.org.test.to(orgId, info.row.original.id)} className="font-medium text-accent-700 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('status', { header: 'Status', cell: (info) => <TestStatusBadge status={info.getValue()} /> }),
      column.accessor('projectName', { header: 'Project' }),
      column.accessor((row) => `${row.boreholeName} / ${row.sampleReference}`, { id: 'sample', header: 'Borehole / sample' }),
      column.accessor('topDepthM', { header: 'Depth (m)', cell: (info) => info.getValue().toFixed(2) }),
      column.accessor('technicianName', { header: 'Technician' }),
      column.accessor('updatedAt', { header: 'Last change', cell: (info) => formatDateTime(info.getValue()) }),
    ],
    [orgId],
  );
  const table = useReactTable({
    data: tests as TestSummary[],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (row) => row.id,
  });
  return <DataTable table={table} caption="Consolidation tests" framed={false} />;
}
