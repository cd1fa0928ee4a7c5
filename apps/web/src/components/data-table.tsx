import { flexRender, type Table } from '@tanstack/react-table';

type DataTableProps<Row> = {
  table: Table<Row>;
  /** Read by screen readers: what the rows are. */
  caption: string;
  /** Off when the table sits flush inside a Panel, which already draws the frame. */
  framed?: boolean;
};

/**
 * Dense, readable table markup for a TanStack table instance; scrolls sideways on narrow screens.
 * Cells do not wrap: a column of long text opts in with a `whitespace-normal` span in its cell.
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
                <th key={header.id} scope="col" className="whitespace-nowrap border-b border-slate-200 px-3 py-2 font-medium">
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
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
