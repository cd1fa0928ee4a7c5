import type { ReviewQueueItem } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/data-table';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';

const column = createColumnHelper<ReviewQueueItem>();
const fixed = (n: number | null, d: number) => (n === null ? '—' : n.toFixed(d));

/** Submitted tests, oldest first, with the numbers a manager glances at before opening one. */
export function ReviewQueueTable({ orgId, items, currentUserId }: { orgId: string; items: readonly ReviewQueueItem[]; currentUserId: string }) {
  const columns = useMemo(
    () => [
      column.accessor('testReference', {
        header: 'Test',
        cell: (info) => (
          <Link to={paths.org.test.to(orgId, info.row.original.testId)} className="font-medium text-accent-700 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('projectName', { header: 'Project' }),
      column.accessor((r) => `${r.boreholeName} / ${r.sampleReference}`, { id: 'sample', header: 'Sample' }),
      column.accessor((r) => `${r.topDepthM.toFixed(2)}–${r.bottomDepthM.toFixed(2)}`, { id: 'depth', header: 'Depth (m)' }),
      column.accessor('technicianName', {
        header: 'Technician',
        cell: (info) => (
          <>
            {info.getValue()}
            {info.row.original.technicianId === currentUserId ? <span className="ml-1 text-xs text-slate-500">(you)</span> : null}
          </>
        ),
      }),
      column.accessor('submittedAt', { header: 'Submitted', cell: (info) => formatDateTime(info.getValue()) }),
      column.accessor((r) => r.keyParameters.compressionIndex, { id: 'cc', header: 'Cc', cell: (info) => fixed(info.getValue(), 3) }),
      column.accessor((r) => r.keyParameters.preconsolidationStressKpa, { id: 'sp', header: 'σ′p (kPa)', cell: (info) => fixed(info.getValue(), 0) }),
      column.accessor((r) => r.keyParameters.overconsolidationRatio, { id: 'ocr', header: 'OCR', cell: (info) => fixed(info.getValue(), 2) }),
      column.accessor((r) => r.keyParameters.sampleQuality, { id: 'quality', header: 'Quality', cell: (info) => info.getValue() ?? '—' }),
      column.accessor('warningCount', {
        header: 'Warnings',
        cell: (info) => <span className={info.getValue() > 0 ? 'font-medium text-amber-800' : 'text-slate-500'}>{info.getValue()}</span>,
      }),
    ],
    [orgId, currentUserId],
  );
  const table = useReactTable({ data: items as ReviewQueueItem[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => r.testId });
  return <DataTable table={table} caption="Tests waiting for review" framed={false} />;
}
