import { flexRender, type Header, type Table } from '@tanstack/react-table';

type DataTableProps<Row> = {
  table: Table<Row>;
  /** Read by screen readers: what the rows are. */
  caption: string;
  /** Off when the table sits flush inside a Panel, which already draws the frame. */
  framed?: boolean;
};

const SORT_MARK = { asc: '▲', desc: '▼' } as const;

/** A column heading; a button that sorts by the column when the table sorts. */
function HeaderCell<Row>({ header, sortable }: { header: Header<Row, unknown>; sortable: boolean }) {
  const content = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
  const canSort = sortable && !header.isPlaceholder && header.column.getCanSort();
  const sorted = header.column.getIsSorted();
  return (
    <th
      scope="col"
      aria-sort={!canSort ? undefined : sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
      className="whitespace-nowrap border-b border-slate-200 px-3 py-2 font-medium"
    >
      {canSort ? (
        <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase tracking-wide hover:text-slate-800">
          {content}
          <span aria-hidden="true" className={sorted ? 'text-accent-700' : 'text-slate-300'}>
            {sorted ? SORT_MARK[sorted] : '↕'}
          </span>
        </button>
      ) : (
        content
      )}
    </th>
  );
}

/**
 * Dense, readable table markup for a TanStack table instance; scrolls sideways on narrow screens.
 * Cells do not wrap: a column of long text opts in with a `whitespace-normal` span in its cell.
 * When the table has a sorted row model, each sortable heading becomes a button (aria-sort tells which way).
 */
export function DataTable<Row>({ table, caption, framed = true }: DataTableProps<Row>) {
  return (
    <div className={`relative overflow-x-auto bg-white ${framed ? 'rounded-lg border border-slate-200' : 'rounded-b-lg'}`}>
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-slate-50 text-xs uppercase tracking-wide text-slate-500">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <HeaderCell key={header.id} header={header} sortable={table.options.getSortedRowModel !== undefined} />
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-slate-100 last:border-b-0 hover:bg-slate-50/60">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="whitespace-nowrap px-3 py-2 align-middle text-slate-700">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
