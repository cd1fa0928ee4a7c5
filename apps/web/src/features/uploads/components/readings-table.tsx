import type { ReadingRow } from '@porestack/types';
import { keepPreviousData, useQueries, useQuery } from '@tanstack/react-query';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useVirtualizer } from '@tanstack/react-virtual';
import { useMemo, useRef } from 'react';
import { EmptyState } from '../../../components/empty-state';
import { ErrorMessage } from '../../../components/error-message';
import { LoadingBlock } from '../../../components/spinner';
import { getReadingsPage, readingsPageKey } from '../api/get-readings';

const PAGE_SIZE = 1000;
const ROW_HEIGHT_PX = 32;

/** A row slot: the reading once its page has arrived, else its position only. */
type Slot = { position: number; reading: ReadingRow | undefined };

const column = createColumnHelper<Slot>();
const num = (digits: number) => (info: { getValue: () => unknown }) => {
  const v = info.getValue() as number | undefined;
  return v === undefined ? <span className="text-slate-300">…</span> : v.toFixed(digits);
};
const columns = [
  column.accessor((s) => s.reading?.rowNumber, { id: 'row', header: 'File row', cell: (info) => info.getValue() ?? <span className="text-slate-300">…</span> }),
  column.accessor((s) => s.reading?.incrementIndex, { id: 'increment', header: 'Increment', cell: (info) => info.getValue() ?? '' }),
  column.accessor((s) => s.reading?.stressKpa, { id: 'stress', header: 'Stress (kPa)', cell: num(1) }),
  column.accessor((s) => s.reading?.elapsedMin, { id: 'time', header: 'Time (min)', cell: num(3) }),
  column.accessor((s) => s.reading?.deformationMm, { id: 'deformation', header: 'Deformation (mm)', cell: num(4) }),
];

/**
 * All of a test's readings in one scrolling table. Only the rows in view are in the DOM
 * (react-virtual), and only the pages under them are fetched (offset/limit), so 200,000 readings
 * scroll as smoothly as 20.
 */
export function ReadingsTable({ orgId, testId }: { orgId: string; testId: string }) {
  const first = useQuery({
    queryKey: readingsPageKey(orgId, testId, 0, PAGE_SIZE),
    queryFn: () => getReadingsPage(orgId, testId, 0, PAGE_SIZE),
    placeholderData: keepPreviousData,
  });
  const total = first.data?.total ?? 0;
  const scrollRef = useRef<HTMLDivElement>(null);
  const virtualizer = useVirtualizer({ count: total, getScrollElement: () => scrollRef.current, estimateSize: () => ROW_HEIGHT_PX, overscan: 20 });
  const items = virtualizer.getVirtualItems();
  const firstIndex = items[0]?.index ?? 0;
  const lastIndex = items[items.length - 1]?.index ?? 0;
  const pageNumbers: number[] = [];
  for (let p = Math.floor(firstIndex / PAGE_SIZE); p <= Math.floor(lastIndex / PAGE_SIZE); p += 1) pageNumbers.push(p);

  const pages = useQueries({
    queries: pageNumbers.map((p) => ({
      queryKey: readingsPageKey(orgId, testId, p * PAGE_SIZE, PAGE_SIZE),
      queryFn: () => getReadingsPage(orgId, testId, p * PAGE_SIZE, PAGE_SIZE),
      staleTime: 60_000,
    })),
  });
  const byPage = new Map(pageNumbers.map((p, n) => [p, pages[n]?.data?.readings ?? (p === 0 ? first.data?.readings : undefined)]));

  const slots: Slot[] = items.map((item) => ({
    position: item.index,
    reading: byPage.get(Math.floor(item.index / PAGE_SIZE))?.[item.index % PAGE_SIZE],
  }));
  // The rows in view change on every scroll, so `data` is a new array on every render. TanStack
  // Table's default autoResetPageIndex answers each new `data` with a state update (queued in a
  // microtask), which renders again with new `data`: an endless loop of urgent updates that starved
  // React Router's navigation transition (the URL changed, the page never did). The virtualiser
  // does the paging here, so the table's own pagination stays off.
  const table = useReactTable({
    data: slots,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (s) => String(s.position),
    manualPagination: true,
    autoResetPageIndex: false,
  });
  const headers = useMemo(() => table.getHeaderGroups(), [table]);

  if (first.isPending) return <LoadingBlock label="Loading readings…" />;
  if (first.error) return <ErrorMessage error={first.error} title="The readings could not be loaded" onRetry={() => void first.refetch()} />;
  if (total === 0) return <EmptyState title="No readings yet">Upload a readings file; once it is imported every reading is listed here.</EmptyState>;

  const rows = table.getRowModel().rows;
  const padTop = items[0]?.start ?? 0;
  const padBottom = virtualizer.getTotalSize() - (items[items.length - 1]?.end ?? 0);
  return (
    <div>
      <p className="px-4 py-2 text-sm text-slate-600" aria-live="polite">
        {total.toLocaleString('en-GB')} readings · showing rows {(firstIndex + 1).toLocaleString('en-GB')}–{(lastIndex + 1).toLocaleString('en-GB')}
      </p>
      <div ref={scrollRef} className="h-[28rem] overflow-auto border-t border-slate-200" data-testid="readings-scroll">
        <table className="w-full border-collapse text-left text-sm" aria-rowcount={total + 1}>
          <caption className="sr-only">Readings of this test</caption>
          <thead className="sticky top-0 z-10 bg-slate-50 text-xs uppercase tracking-wide text-slate-500">
            {headers.map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <th key={header.id} scope="col" className="border-b border-slate-200 px-4 py-2 font-medium">
                    {flexRender(header.column.columnDef.header, header.getContext())}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {padTop > 0 ? <tr aria-hidden="true" style={{ height: padTop }} /> : null}
            {rows.map((row) => (
              <tr key={row.id} aria-rowindex={row.original.position + 2} style={{ height: ROW_HEIGHT_PX }} className="border-b border-slate-100 tabular-nums">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="whitespace-nowrap px-4 text-slate-700">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {padBottom > 0 ? <tr aria-hidden="true" style={{ height: padBottom }} /> : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
