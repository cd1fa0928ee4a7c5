import type { Upload } from '@porestack/types';
import { Alert } from '../../../components/alert';

const KIND_WORDS = { dropped: 'Dropped', replaced: 'Replaced', check: 'To check' } as const;

/**
 * What the last import dropped (repeated rows), replaced (a second reading at one time: the
 * later kept) or found implausible, row by row — nothing leaves the file in silence.
 */
export function UploadNotes({ upload }: { upload: Upload }) {
  if (upload.noteCount === 0) return null;
  const checks = upload.notes.filter((note) => note.kind === 'check');
  const rows = upload.notes.filter((note) => note.kind !== 'check');
  return (
    <div className="space-y-2">
      {checks.map((note) => (
        <Alert key={note.message} tone="warning" title="The imported deformations look wrong">
          {note.message}
        </Alert>
      ))}
      {rows.length > 0 ? (
        <div className="overflow-x-auto rounded-md border border-slate-200">
          <table className="w-full border-collapse text-left text-xs" aria-label="Rows the import dropped or replaced">
            <caption className="bg-slate-50 px-3 py-2 text-left text-sm font-medium text-slate-800">
              Rows the import dropped or replaced ({upload.noteCount - checks.length}
              {upload.noteCount > upload.notes.length ? `; the first ${upload.notes.length} of ${upload.noteCount} notes are listed` : ''})
            </caption>
            <tbody>
              {rows.map((note, n) => (
                <tr key={`${note.sheet ?? ''}-${note.row ?? 'file'}-${n}`} className="border-b border-slate-100 text-slate-700">
                  <th scope="row" className="whitespace-nowrap px-3 py-1 font-medium">{KIND_WORDS[note.kind]}</th>
                  <td className="px-3 py-1">{note.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
