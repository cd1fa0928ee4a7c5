import { ErrorMessage } from '../../../components/error-message';
import { LoadingBlock } from '../../../components/spinner';
import { useDesigners } from '../api/get-designers';

type DesignerPickerProps = { orgId: string; value: readonly string[]; onChange: (ids: string[]) => void; error?: string | undefined };

/** Tick the designers who get an e-mail whenever a soil record version of this project is approved. */
export function DesignerPicker({ orgId, value, onChange, error }: DesignerPickerProps) {
  const designers = useDesigners(orgId);
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium text-slate-800">Designers of this project</legend>
      <p className="text-xs text-slate-500">They are e-mailed each new approved soil record version.</p>
      {designers.isPending ? (
        <LoadingBlock label="Loading designers…" />
      ) : designers.error ? (
        <ErrorMessage error={designers.error} title="The designers could not be loaded" onRetry={() => void designers.refetch()} />
      ) : designers.data.length === 0 ? (
        <p className="text-sm text-slate-600">Nobody in the organisation has the designer role yet; an administrator can invite one.</p>
      ) : (
        <ul className="grid gap-1 sm:grid-cols-2">
          {designers.data.map((d) => (
            <li key={d.userId}>
              <label className="flex items-center gap-2 text-sm text-slate-800">
                <input
                  type="checkbox"
                  className="h-4 w-4 rounded border-slate-300"
                  checked={value.includes(d.userId)}
                  onChange={(e) => onChange(e.target.checked ? [...value, d.userId] : value.filter((id) => id !== d.userId))}
                />
                <span>{d.name}</span>
                <span className="truncate text-slate-500">{d.email}</span>
              </label>
            </li>
          ))}
        </ul>
      )}
      {error ? <p className="text-sm text-red-700">{error}</p> : null}
    </fieldset>
  );
}
