import type { FootingPairResult, FootingSettlementResult } from '@porestack/types';
import { createColumnHelper, flexRender, getCoreRowModel, getFilteredRowModel, getPaginationRowModel, getSortedRowModel, useReactTable, type SortingState, type Table } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Button } from '../../../components/button';
import { formatFixed, formatMm, formatRatio, formatYears } from './design-format';

const PAGE_SIZE = 25;

/** A sortable, paged table with a text filter; rows may be clicked. */
function ResultTable<Row>({ table, caption, onRowClick, selected, rowId }: { table: Table<Row>; caption: string; onRowClick?: (row: Row) => void; selected?: string | null; rowId: (row: Row) => string }) {
  return (
    <div className="space-y-2">
      <div className="overflow-x-auto rounded-md border border-slate-200 bg-white">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-slate-50 text-xs text-slate-600">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <th key={header.id} scope="col" className="whitespace-nowrap px-2 py-2 font-medium" aria-sort={header.column.getIsSorted() === 'asc' ? 'ascending' : header.column.getIsSorted() === 'desc' ? 'descending' : undefined}>
                    {header.column.getCanSort() ? (
                      <button type="button" className="inline-flex items-center gap-1 hover:text-slate-900" onClick={header.column.getToggleSortingHandler()}>
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true">{header.column.getIsSorted() === 'asc' ? '▲' : header.column.getIsSorted() === 'desc' ? '▼' : '↕'}</span>
                      </button>
                    ) : (
                      flexRender(header.column.columnDef.header, header.getContext())
                    )}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr
                key={row.id}
                onClick={onRowClick ? () => onRowClick(row.original) : undefined}
                aria-selected={selected === rowId(row.original) ? true : undefined}
                className={`border-t border-slate-100 ${onRowClick ? 'cursor-pointer hover:bg-slate-50' : ''} ${selected === rowId(row.original) ? 'bg-accent-50' : ''}`}
              >
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="whitespace-nowrap px-2 py-1.5">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {table.getPageCount() > 1 ? (
        <div className="flex items-center gap-2 text-sm">
          <Button variant="secondary" size="sm" disabled={!table.getCanPreviousPage()} onClick={() => table.previousPage()}>
            Previous
          </Button>
          <span>
            Page {table.getState().pagination.pageIndex + 1} of {table.getPageCount()} ({table.getFilteredRowModel().rows.length} rows)
          </span>
          <Button variant="secondary" size="sm" disabled={!table.getCanNextPage()} onClick={() => table.nextPage()}>
            Next
          </Button>
        </div>
      ) : null}
    </div>
  );
}

const footingColumn = createColumnHelper<FootingSettlementResult>();

/** Each footing's settlements (mm) and times, sortable and filterable; a click opens the footing. */
export function FootingResultsTable({ footings, selectedId, onSelect }: { footings: readonly FootingSettlementResult[]; selectedId: string | null; onSelect: (id: string) => void }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [filter, setFilter] = useState('');
  const [onlyOver, setOnlyOver] = useState(false);
  const data = useMemo(() => (onlyOver ? footings.filter((f) => f.withinTotalLimit === false) : [...footings]), [footings, onlyOver]);
  const columns = useMemo(
    () => [
      footingColumn.accessor('id', { header: 'Footing', cell: (c) => <span className="font-medium text-slate-900">{c.getValue()}</span> }),
      footingColumn.accessor((f) => f.widthM * (f.lengthM ?? f.widthM), {
        id: 'size',
        header: 'Size (m)',
        cell: (c) => {
          const f = c.row.original;
          return f.shape === 'circle' ? `D ${formatFixed(f.widthM, 2)}` : f.shape === 'strip' ? `strip B ${formatFixed(f.widthM, 2)}` : `${formatFixed(f.widthM, 2)} × ${formatFixed(f.lengthM, 2)}`;
        },
      }),
      footingColumn.accessor('depthM', { header: 'Depth (m)', cell: (c) => formatFixed(c.getValue(), 2) }),
      footingColumn.accessor('pressureKpa', { header: 'Net q (kPa)', cell: (c) => formatFixed(c.getValue(), 1) }),
      footingColumn.accessor('immediateM', { header: 'Immediate (mm)', cell: (c) => formatMm(c.getValue()) }),
      footingColumn.accessor('primaryM', { header: 'Primary (mm)', cell: (c) => formatMm(c.getValue()) }),
      footingColumn.accessor('secondaryM', { header: 'Secondary (mm)', cell: (c) => formatMm(c.getValue()) }),
      footingColumn.accessor('totalM', { header: 'Total (mm)', cell: (c) => <span className="font-semibold" data-testid={`total-${c.row.original.id}`}>{formatMm(c.getValue())}</span> }),
      footingColumn.accessor('timeTo50PercentYears', { header: 't50', cell: (c) => formatYears(c.getValue()), sortUndefined: 'last' }),
      footingColumn.accessor('timeTo90PercentYears', { header: 't90', cell: (c) => formatYears(c.getValue()), sortUndefined: 'last' }),
      footingColumn.accessor('withinTotalLimit', {
        header: 'Within limit',
        cell: (c) => (c.getValue() === null ? '—' : c.getValue() ? 'yes' : <span className="font-semibold text-red-700">no</span>),
      }),
    ],
    [],
  );
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _column, value: string) => row.original.id.toLowerCase().includes(value.toLowerCase()),
    getRowId: (row) => row.id,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: PAGE_SIZE } },
  });
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-4 text-sm">
        <label className="flex items-center gap-2">
          Find a footing
          <input value={filter} onChange={(e) => setFilter(e.target.value)} className="h-8 w-32 rounded border border-slate-300 px-2" />
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={onlyOver} onChange={(e) => setOnlyOver(e.target.checked)} />
          only footings over the total limit
        </label>
      </div>
      <ResultTable table={table} caption="Settlement of each footing" onRowClick={(f) => onSelect(f.id)} selected={selectedId} rowId={(f) => f.id} />
    </div>
  );
}

const pairColumn = createColumnHelper<FootingPairResult>();

/** Neighbouring pairs: differential settlement and angular distortion against the limit, the worst first. */
export function PairResultsTable({ pairs, limitLabel }: { pairs: readonly FootingPairResult[]; limitLabel: string }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'angularDistortion', desc: true }]);
  const [onlyOver, setOnlyOver] = useState(false);
  const data = useMemo(() => (onlyOver ? pairs.filter((p) => !p.withinDesignLimit) : [...pairs]), [pairs, onlyOver]);
  const columns = useMemo(
    () => [
      pairColumn.accessor((p) => `${p.footingIds[0]}–${p.footingIds[1]}`, { id: 'pair', header: 'Pair' }),
      pairColumn.accessor('distanceM', { header: 'Distance (m)', cell: (c) => formatFixed(c.getValue(), 2) }),
      pairColumn.accessor('differentialSettlementM', { header: 'δ (mm)', cell: (c) => formatMm(c.getValue()) }),
      pairColumn.accessor('angularDistortion', { header: 'δ/L', cell: (c) => formatRatio(c.getValue()) }),
      pairColumn.accessor('withinDesignLimit', {
        header: `Against ${limitLabel}`,
        cell: (c) => (c.getValue() ? 'within' : <span className="font-semibold text-red-700">over the limit</span>),
      }),
      pairColumn.accessor((p) => p.verdicts.map((v) => v.statement).join(' '), {
        id: 'verdicts',
        header: 'Published limits',
        enableSorting: false,
        cell: (c) => <span className="block max-w-xl whitespace-normal text-xs text-slate-600">{c.getValue()}</span>,
      }),
    ],
    [limitLabel],
  );
  const table = useReactTable({
    data,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getRowId: (p) => `${p.footingIds[0]}|${p.footingIds[1]}`,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: PAGE_SIZE } },
  });
  return (
    <div className="space-y-2">
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={onlyOver} onChange={(e) => setOnlyOver(e.target.checked)} />
        only pairs over the limit
      </label>
      <ResultTable table={table} caption="Differential settlement of neighbouring footings" rowId={(p) => `${p.footingIds[0]}|${p.footingIds[1]}`} />
    </div>
  );
}
