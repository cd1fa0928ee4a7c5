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
      column.accessor('projectName', { header: 'Project', cell: (info) => <span className="block min-w-40 whitespace-normal">{info.getValue()}</span> }),
      column.accessor((r) => `${r.boreholeName} / ${r.sampleReference}`, {
        id: 'sample',
        header: 'Sample',
        cell: (info) => (
          <>
            {info.getValue()}
            <span className="block text-xs text-slate-500">{info.row.original.topDepthM.toFixed(2)}–{info.row.original.bottomDepthM.toFixed(2)} m</span>
          </>
        ),
      }),
      column.accessor('technicianName', {
        header: 'Technician',
        cell: (info) => (
          <span className="block min-w-24 whitespace-normal">
            {info.getValue()}
            {info.row.original.technicianId === currentUserId ? <span className="ml-1 text-xs text-slate-500">(you)</span> : null}
          </span>
        ),
      }),
      column.accessor('submittedAt', { header: 'Submitted', cell: (info) => <span className="block min-w-24 whitespace-normal">{formatDateTime(info.getValue())}</span> }),
      column.accessor((r) => r.keyParameters.compressionIndex, { id: 'cc', header: () => <span className="normal-case">Cc</span>, cell: (info) => fixed(info.getValue(), 3) }),
      column.accessor((r) => r.keyParameters.preconsolidationStressKpa, { id: 'sp', header: () => <span className="normal-case">σ′p (kPa)</span>, cell: (info) => fixed(info.getValue(), 0) }),
      column.accessor((r) => r.keyParameters.overconsolidationRatio, { id: 'ocr', header: 'OCR', cell: (info) => fixed(info.getValue(), 2) }),
      column.accessor((r) => r.keyParameters.sampleQuality, { id: 'quality', header: 'Quality', cell: (info) => <span className="block min-w-16 whitespace-normal">{info.getValue() ?? '—'}</span> }),
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
