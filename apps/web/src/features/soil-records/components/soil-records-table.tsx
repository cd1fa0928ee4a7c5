import type { SoilRecordSummary } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/data-table';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';

const column = createColumnHelper<SoilRecordSummary>();
const fixed = (n: number | null, d: number) => (n === null ? '—' : n.toFixed(d));

export function SoilRecordsTable({ orgId, records }: { orgId: string; records: readonly SoilRecordSummary[] }) {
  const columns = useMemo(
    () => [
      column.accessor((r) => `${r.boreholeName} / ${r.sampleReference}`, {
        id: 'sample',
        header: 'Sample',
        cell: (info) => (
          <Link to={paths.org.soilRecord.to(orgId, info.row.original.id)} className="font-medium text-accent-700 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('projectName', { header: 'Project' }),
      column.accessor('topDepthM', { header: 'Depth (m)', cell: (info) => info.getValue().toFixed(2) }),
      column.accessor('testReference', { header: 'Test' }),
      column.accessor('currentVersion', { header: 'Version', cell: (info) => `v${info.getValue()}` }),
      column.accessor((r) => r.current.compressionIndex, { id: 'cc', header: 'Cc', cell: (info) => fixed(info.getValue(), 3) }),
      column.accessor((r) => r.current.preconsolidationAdoptedKpa, { id: 'sp', header: 'σ′p (kPa)', cell: (info) => fixed(info.getValue(), 0) }),
      column.accessor((r) => r.current.approvedAt, { id: 'approved', header: 'Approved', cell: (info) => formatDate(info.getValue()) }),
    ],
    [orgId],
  );
  const table = useReactTable({ data: records as SoilRecordSummary[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => r.id });
  return <DataTable table={table} caption="Soil records" framed={false} />;
}
