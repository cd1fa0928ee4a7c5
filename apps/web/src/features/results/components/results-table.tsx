import type { IssuedResult } from '@porestack/types';
import {
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type FilterFn,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/data-table';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { fixed, range } from './parameter-format';

const column = createColumnHelper<IssuedResult>();

/** Matches the words typed against the test, borehole, sample and soil description. */
const matchesText: FilterFn<IssuedResult> = (row, _columnId, value: string) => {
  const r = row.original;
  const haystack = `${r.testReference} ${r.boreholeName} ${r.sampleReference} ${r.description}`.toLowerCase();
  return value
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean)
    .every((word) => haystack.includes(word));
};

const inBorehole: FilterFn<IssuedResult> = (row, _columnId, value: string) => row.original.boreholeName === value;

/** Numbers sort with the missing ones last, whichever way. */
const numeric = { sortingFn: 'basic' as const, sortUndefined: 'last' as const };
const orUndefined = (value: number | null) => value ?? undefined;

/**
 * The project's approved tests with their key parameters: sortable by any column, filtered by
 * words and by borehole. Each test opens its summary.
 */
export function ResultsTable({ orgId, results }: { orgId: string; results: readonly IssuedResult[] }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [text, setText] = useState('');
  const [borehole, setBorehole] = useState('');
  const columnFilters = useMemo<ColumnFiltersState>(() => (borehole ? [{ id: 'sample', value: borehole }] : []), [borehole]);
  const boreholes = useMemo(() => [...new Set(results.map((r) => r.boreholeName))].sort(), [results]);
  const columns = useMemo(
    () => [
      column.accessor('testReference', {
        header: 'Test',
        cell: (info) => (
          <Link to={paths.org.issuedTest.to(orgId, info.row.original.recordId, info.row.original.current.version)} className="font-medium text-accent-700 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor((r) => `${r.boreholeName} / ${r.sampleReference}`, { id: 'sample', header: 'Borehole / sample', filterFn: inBorehole }),
      column.accessor('topDepthM', { header: 'Depth (m)', cell: (info) => info.getValue().toFixed(2), ...numeric }),
      column.accessor((r) => orUndefined(r.current.initialVoidRatio), { id: 'e0', header: () => <span className="normal-case">e0</span>, cell: (info) => fixed(info.getValue(), 3), ...numeric }),
      column.accessor((r) => orUndefined(r.current.compressionIndex), { id: 'cc', header: () => <span className="normal-case">Cc</span>, cell: (info) => fixed(info.getValue(), 3), ...numeric }),
      column.accessor((r) => orUndefined(r.current.recompressionIndex ?? r.current.swellIndex), {
        id: 'cr',
        header: () => <span className="normal-case">Cr / Cs</span>,
        cell: (info) => fixed(info.getValue(), 3),
        ...numeric,
      }),
      column.accessor((r) => orUndefined(r.current.preconsolidationAdoptedKpa), { id: 'sp', header: () => <span className="normal-case">σ′p (kPa)</span>, cell: (info) => fixed(info.getValue(), 0), ...numeric }),
      column.accessor((r) => orUndefined(r.current.overconsolidationRatio), { id: 'ocr', header: 'OCR', cell: (info) => fixed(info.getValue(), 2), ...numeric }),
      column.accessor((r) => orUndefined(r.current.cvMinM2PerYr), {
        id: 'cv',
        header: () => <span className="normal-case">cv (m²/yr)</span>,
        cell: (info) => range(info.row.original.current.cvMinM2PerYr, info.row.original.current.cvMaxM2PerYr, 2),
        ...numeric,
      }),
      column.accessor((r) => orUndefined(r.current.secondaryCompressionIndex), { id: 'ca', header: () => <span className="normal-case">Cα</span>, cell: (info) => fixed(info.getValue(), 4), ...numeric }),
      column.accessor((r) => r.current.sampleQuality ?? '', { id: 'quality', header: 'Sample quality', cell: (info) => info.getValue() || '—' }),
      column.accessor((r) => r.current.approvedAt, {
        id: 'approved',
        header: 'Version',
        cell: (info) => <span title={`Approved ${formatDate(info.getValue())} by ${info.row.original.current.approvedByName}`}>v{info.row.original.current.version}</span>,
      }),
    ],
    [orgId],
  );
  const table = useReactTable({
    data: results as IssuedResult[],
    columns,
    state: { sorting, globalFilter: text, columnFilters },
    onSortingChange: setSorting,
    globalFilterFn: matchesText,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getRowId: (r) => r.recordId,
  });
  const shown = table.getRowModel().rows.length;
  return (
    <div>
      <div className="flex flex-wrap items-end gap-3 border-b border-slate-200 px-5 py-3">
        <TextField label="Find" name="find" type="search" value={text} onChange={(e) => setText(e.target.value)} placeholder="Test, sample or soil words" className="w-full sm:w-64" />
        <Select
          label="Borehole"
          options={[{ value: '', label: 'All boreholes' }, ...boreholes.map((b) => ({ value: b, label: b }))]}
          value={borehole}
          onChange={(e) => setBorehole(e.target.value)}
          className="w-full sm:w-44"
        />
        <p className="pb-2 text-sm text-slate-600" aria-live="polite">
          {shown === results.length ? `${results.length} ${results.length === 1 ? 'test' : 'tests'}` : `${shown} of ${results.length} tests`}
        </p>
      </div>
      {shown === 0 ? (
        <p className="px-5 py-6 text-sm text-slate-600">No test matches. Clear the search or pick all boreholes.</p>
      ) : (
        <>
          <p className="px-5 pt-2 text-xs text-slate-500 sm:hidden">The table scrolls sideways to the parameters.</p>
          <DataTable table={table} caption="Approved tests and their key parameters; choose a column heading to sort" framed={false} />
        </>
      )}
    </div>
  );
}
