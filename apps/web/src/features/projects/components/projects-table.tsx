import type { ProjectSummary } from '@porestack/types';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/data-table';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';

const column = createColumnHelper<ProjectSummary>();

/** `testsHeader`: a client counts the tests issued to them, so their column says so. */
export function ProjectsTable({ orgId, projects, testsHeader = 'Tests' }: { orgId: string; projects: readonly ProjectSummary[]; testsHeader?: string }) {
  const columns = useMemo(
    () => [
      column.accessor('reference', { header: 'Reference', cell: (info) => <span className="font-medium text-slate-900">{info.getValue()}</span> }),
      column.accessor('name', {
        header: 'Project',
        cell: (info) => (
          <Link to={paths.org.project.to(orgId, info.row.original.id)} className="font-medium text-accent-700 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor('clientName', { header: 'Client' }),
      column.accessor('siteName', { header: 'Site', cell: (info) => info.getValue() || '—' }),
      column.accessor('boreholeCount', { header: 'Boreholes' }),
      column.accessor('testCount', { header: testsHeader }),
      column.accessor('createdAt', { header: 'Created', cell: (info) => formatDate(info.getValue()) }),
    ],
    [orgId, testsHeader],
  );
  const table = useReactTable({ data: projects as ProjectSummary[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (row) => row.id });
  return <DataTable table={table} caption="Projects" framed={false} />;
}
