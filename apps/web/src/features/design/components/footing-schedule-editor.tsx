import type { FootingImportResult, SettlementCheckDetail } from '@porestack/types';
import { createColumnHelper, flexRender, getCoreRowModel, getPaginationRowModel, useReactTable, type CellContext } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { ApiError } from '../../../lib/api-error';
import { importFootings, pasteFootings, useUpdateCheck } from '../api/settlement-checks';
import { blankFooting, footingDraft, footingInput, type FootingDraft } from './footing-draft';

type FootingScheduleEditorProps = {
  orgId: string;
  projectId: string;
  check: SettlementCheckDetail;
  canEdit: boolean;
  /** Called after the draft is saved, to run it. */
  onRun: () => void;
  running: boolean;
};

type Meta = { update: (index: number, patch: Partial<FootingDraft>) => void; remove: (index: number) => void; issueAt: (index: number, column: string) => string | undefined; canEdit: boolean };

const PAGE_SIZE = 50;
const column = createColumnHelper<FootingDraft>();

function cellInput(field: keyof FootingDraft, label: string, width = 'w-20') {
  return ({ row, table }: CellContext<FootingDraft, unknown>) => {
    const meta = table.options.meta as Meta;
    const issue = meta.issueAt(row.index, field);
    const disabled = !meta.canEdit || (field === 'lengthM' && row.original.shape !== 'rectangle');
    return (
      <input
        aria-label={`${label}, row ${row.index + 1}`}
        aria-invalid={issue ? true : undefined}
        title={issue}
        disabled={disabled}
        inputMode={field === 'id' ? undefined : 'decimal'}
        value={field === 'lengthM' && row.original.shape !== 'rectangle' ? '' : String(row.original[field])}
        onChange={(e) => meta.update(row.index, { [field]: e.target.value })}
        className={`h-8 ${width} rounded border px-2 text-sm disabled:bg-slate-100 ${issue ? 'border-red-600 bg-red-50' : 'border-slate-300'}`}
      />
    );
  };
}

function cellSelect(field: 'shape' | 'loadKind' | 'loadBasis', label: string, options: ReadonlyArray<[string, string]>) {
  return ({ row, table }: CellContext<FootingDraft, unknown>) => {
    const meta = table.options.meta as Meta;
    const issue = meta.issueAt(row.index, field);
    return (
      <select
        aria-label={`${label}, row ${row.index + 1}`}
        disabled={!meta.canEdit}
        value={row.original[field]}
        onChange={(e) => meta.update(row.index, { [field]: e.target.value } as Partial<FootingDraft>)}
        className={`h-8 rounded border bg-white px-1 text-sm ${issue ? 'border-red-600' : 'border-slate-300'}`}
      >
        {options.map(([value, words]) => (
          <option key={value} value={value}>
            {words}
          </option>
        ))}
      </select>
    );
  };
}

/**
 * The footing schedule as an editable table: type, paste rows from a spreadsheet, or import a
 * CSV or XLSX file; rows that do not read are listed with their row and column. Saving keeps the
 * draft; running freezes it into a new revision.
 */
export function FootingScheduleEditor({ orgId, projectId, check, canEdit, onRun, running }: FootingScheduleEditorProps) {
  const [rows, setRows] = useState<FootingDraft[]>(() => check.footings.map(footingDraft));
  const [pasted, setPasted] = useState('');
  const [readBack, setReadBack] = useState<FootingImportResult | null>(null);
  const [readError, setReadError] = useState<unknown>(null);
  const [warnings, setWarnings] = useState<Array<{ path: string; message: string }> | null>(null);
  const [dirty, setDirty] = useState(false);
  const update = useUpdateCheck(orgId, projectId, check.id);
  const saveIssues = update.error instanceof ApiError && update.error.code !== 'confirmation_needed' ? update.error.issues : [];
  const issueAt = (index: number, field: string) => saveIssues.find((i) => i.path === `footings.${index}.${field}` || i.path === `footings.${index}`)?.message;
  const meta: Meta = {
    update: (index, patch) => {
      setDirty(true);
      setRows((all) => all.map((row, i) => (i === index ? { ...row, ...patch } : row)));
    },
    remove: (index) => {
      setDirty(true);
      setRows((all) => all.filter((_, i) => i !== index));
    },
    issueAt,
    canEdit,
  };
  const columns = useMemo(
    () => [
      column.display({ id: 'row', header: '#', cell: ({ row }) => <span className="text-xs text-slate-500">{row.index + 1}</span> }),
      column.accessor('id', { header: 'Mark', cell: cellInput('id', 'Mark', 'w-24') }),
      column.accessor('shape', {
        header: 'Shape',
        cell: cellSelect('shape', 'Shape', [
          ['square', 'square'],
          ['rectangle', 'rectangle'],
          ['circle', 'circle'],
          ['strip', 'strip'],
        ]),
      }),
      column.accessor('widthM', { header: 'B (m)', cell: cellInput('widthM', 'B (m)') }),
      column.accessor('lengthM', { header: 'L (m)', cell: cellInput('lengthM', 'L (m)') }),
      column.accessor('depthM', { header: 'Depth (m)', cell: cellInput('depthM', 'Depth (m)') }),
      column.accessor('loadKind', {
        header: 'Given as',
        cell: cellSelect('loadKind', 'Given as', [
          ['load', 'load (kN)'],
          ['pressure', 'pressure (kPa)'],
        ]),
      }),
      column.accessor('load', { header: 'Load or pressure', cell: cellInput('load', 'Load or pressure', 'w-24') }),
      column.accessor('loadBasis', {
        header: 'Gross or net',
        cell: cellSelect('loadBasis', 'Gross or net', [
          ['net', 'net'],
          ['gross', 'gross'],
        ]),
      }),
      column.accessor('xM', { header: 'x (m)', cell: cellInput('xM', 'x (m)') }),
      column.accessor('yM', { header: 'y (m)', cell: cellInput('yM', 'y (m)') }),
      column.display({
        id: 'remove',
        header: '',
        cell: ({ row, table }) =>
          (table.options.meta as Meta).canEdit ? (
            <Button variant="ghost-danger" size="sm" aria-label={`Remove row ${row.index + 1}`} onClick={() => (table.options.meta as Meta).remove(row.index)}>
              ✕
            </Button>
          ) : null,
      }),
    ],
    [],
  );
  const table = useReactTable({
    data: rows,
    columns,
    meta,
    getRowId: (row) => row.key,
    getCoreRowModel: getCoreRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    autoResetPageIndex: false,
    initialState: { pagination: { pageSize: PAGE_SIZE } },
  });

  const take = (result: FootingImportResult, mode: 'add' | 'replace') => {
    setReadBack(result);
    if (result.rows.length === 0) return;
    setDirty(true);
    setRows((all) => (mode === 'replace' ? result.rows.map(footingDraft) : [...all, ...result.rows.map(footingDraft)]));
  };
  const read = (promise: Promise<FootingImportResult>, mode: 'add' | 'replace') => {
    setReadError(null);
    promise.then((result) => take(result, mode), setReadError);
  };
  const save = (acceptWarnings: boolean, then?: () => void) =>
    update.mutate(
      { footings: rows.map(footingInput), acceptWarnings },
      {
        onSuccess: () => {
          setWarnings(null);
          setDirty(false);
          then?.();
        },
        onError: (error) => {
          if (error instanceof ApiError && error.code === 'confirmation_needed') setWarnings([...error.issues]);
        },
      },
    );

  return (
    <div className="space-y-4">
      {canEdit ? (
        <div className="grid gap-4 lg:grid-cols-2">
          <div className="space-y-2">
            <label htmlFor="footing-paste" className="text-sm font-medium text-slate-800">
              Paste rows from a spreadsheet
            </label>
            <textarea
              id="footing-paste"
              value={pasted}
              onChange={(e) => setPasted(e.target.value)}
              rows={4}
              placeholder={'mark  shape  B (m)  L (m)  depth (m)  load kind  load  gross or net  x (m)  y (m)'}
              className="block w-full rounded-md border border-slate-300 px-3 py-2 font-mono text-xs"
            />
            <div className="flex gap-2">
              <Button variant="secondary" size="sm" disabled={pasted.trim() === ''} onClick={() => read(pasteFootings(orgId, projectId, pasted), 'add')}>
                Add pasted rows
              </Button>
              <Button variant="secondary" size="sm" disabled={pasted.trim() === ''} onClick={() => read(pasteFootings(orgId, projectId, pasted), 'replace')}>
                Replace the schedule with them
              </Button>
            </div>
          </div>
          <div className="space-y-2">
            <label htmlFor="footing-file" className="text-sm font-medium text-slate-800">
              Import a CSV or XLSX schedule
            </label>
            <input
              id="footing-file"
              type="file"
              accept=".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
              className="block text-sm"
              onChange={(e) => {
                const file = e.target.files?.[0];
                if (file) read(importFootings(orgId, projectId, file), 'replace');
                e.target.value = '';
              }}
            />
            <p className="text-xs text-slate-500">
              One footing per row under a heading row (mark, shape, B, L, depth, load kind, load, gross or net, x, y — in any order). Without headings the columns are read in that order. An import replaces the schedule.
            </p>
          </div>
        </div>
      ) : null}
      {readError ? <ErrorMessage error={readError} title="The rows could not be read" /> : null}
      {readBack ? (
        <Alert tone={readBack.issues.length > 0 ? 'warning' : 'success'} title={`${readBack.rows.length} of ${readBack.rowCount} row${readBack.rowCount === 1 ? '' : 's'} read`}>
          {readBack.issues.length > 0 ? (
            <ul className="list-disc space-y-0.5 pl-5" aria-label="Rows that were not read">
              {readBack.issues.map((issue) => (
                <li key={`${issue.row}-${issue.column}-${issue.message}`}>{issue.message}</li>
              ))}
            </ul>
          ) : (
            'Check the rows below, then save or run.'
          )}
        </Alert>
      ) : null}
      <div className="overflow-x-auto rounded-md border border-slate-200 bg-white">
        <table className="w-full text-left text-sm" aria-label="Footing schedule">
          <thead className="bg-slate-50 text-xs text-slate-600">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <th key={header.id} scope="col" className="whitespace-nowrap px-2 py-2 font-medium">
                    {flexRender(header.column.columnDef.header, header.getContext())}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-slate-100">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-2 py-1">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 ? <p className="px-3 py-4 text-sm text-slate-600">No footings yet: add a row, paste from a spreadsheet or import a file.</p> : null}
      </div>
      {table.getPageCount() > 1 ? (
        <div className="flex items-center gap-2 text-sm">
          <Button variant="secondary" size="sm" disabled={!table.getCanPreviousPage()} onClick={() => table.previousPage()}>
            Previous
          </Button>
          <span>
            Rows {table.getState().pagination.pageIndex * PAGE_SIZE + 1}–{Math.min(rows.length, (table.getState().pagination.pageIndex + 1) * PAGE_SIZE)} of {rows.length}
          </span>
          <Button variant="secondary" size="sm" disabled={!table.getCanNextPage()} onClick={() => table.nextPage()}>
            Next
          </Button>
        </div>
      ) : null}
      {saveIssues.length > 0 ? (
        <Alert tone="error" title="The schedule was not saved">
          <ul className="list-disc space-y-0.5 pl-5">
            {saveIssues.map((issue) => (
              <li key={issue.path + issue.message}>{issue.message}</li>
            ))}
          </ul>
        </Alert>
      ) : update.error && !(update.error instanceof ApiError && update.error.code === 'confirmation_needed') ? (
        <ErrorMessage error={update.error} title="The schedule was not saved" />
      ) : null}
      {warnings ? (
        <Alert tone="warning" title="Check these before saving">
          <ul className="list-disc space-y-0.5 pl-5">
            {warnings.map((w) => (
              <li key={w.path + w.message}>{w.message}</li>
            ))}
          </ul>
          <Button className="mt-3" variant="secondary" size="sm" pending={update.isPending} onClick={() => save(true)}>
            Save anyway
          </Button>
        </Alert>
      ) : null}
      {canEdit ? (
        <div className="flex flex-wrap items-center gap-2">
          <Button variant="secondary" size="sm" onClick={() => { setDirty(true); setRows((all) => [...all, blankFooting(all.length)]); }}>
            Add a footing
          </Button>
          <Button variant="secondary" pending={update.isPending} onClick={() => save(false)}>
            Save schedule
          </Button>
          <Button pending={running || update.isPending} onClick={() => (dirty ? save(false, onRun) : onRun())}>
            {dirty ? 'Save and run the check' : 'Run the check'}
          </Button>
          {dirty ? <span className="text-xs text-amber-800">Unsaved changes</span> : null}
        </div>
      ) : null}
    </div>
  );
}
