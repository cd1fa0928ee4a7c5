import type { UploadPreview } from '@porestack/types';

type PreviewRowsTableProps = {
  preview: UploadPreview;
  headerRow: number;
  onHeaderRow: (row: number) => void;
  disabled: boolean;
};

/**
 * The file's first rows as found, title rows included, with the row of the column names
 * marked; any row can be made the header with one click (the columns follow at once).
 */
export function PreviewRowsTable({ preview, headerRow, onHeaderRow, disabled }: PreviewRowsTableProps) {
  const width = Math.max(...preview.topRows.map((row) => row.cells.length), 1);
  return (
    <div className="overflow-x-auto rounded-md border border-slate-200">
      <table className="w-full border-collapse text-left text-xs" aria-label="First rows of the file, as found">
        <caption className="bg-slate-50 px-3 py-2 text-left text-sm font-medium text-slate-800">
          First rows of the file, as found{preview.sheets.length > 1 ? ` (sheet “${preview.sheets[0]}”, one of ${preview.sheets.length})` : ''}
        </caption>
        <tbody>
          {preview.topRows.map((row) => {
            const isHeader = row.rowNumber === headerRow;
            return (
              <tr key={row.rowNumber} className={`border-b border-slate-100 tabular-nums ${isHeader ? 'bg-accent-50 font-semibold text-slate-900' : 'text-slate-700'}`}>
                <th scope="row" className="whitespace-nowrap px-2 py-1 font-normal text-slate-500">
                  {isHeader ? (
                    <span className="text-accent-800">Row {row.rowNumber}: names</span>
                  ) : (
                    <button type="button" disabled={disabled} className="text-accent-700 hover:underline disabled:text-slate-400" onClick={() => onHeaderRow(row.rowNumber)} aria-label={`Take the names from row ${row.rowNumber}`}>
                      Row {row.rowNumber}
                    </button>
                  )}
                </th>
                {Array.from({ length: width }, (_, m) => (
                  <td key={m} className="whitespace-nowrap px-3 py-1">{row.cells[m] ?? ''}</td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
