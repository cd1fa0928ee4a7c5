import type { ImportRequest, UploadPreview } from '@porestack/types';
import { useEffect, useMemo, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { LoadingBlock } from '../../../components/spinner';
import { TextField } from '../../../components/text-field';
import { useImportProfiles } from '../api/get-import-profiles';
import { useImportTrial } from '../api/trial-import';
import { draftFromGuess, mappingFromDraft, type MappingDraft, type MappingErrors } from './mapping-draft';
import { ColumnFields, FileLayoutFields, GaugeFields, UnitFields } from './mapping-fields';
import { PreviewRowsTable } from './preview-rows-table';
import { TrialTable } from './trial-table';

type MappingFormProps = {
  orgId: string;
  preview: UploadPreview;
  /** The preview is being read again (another header row or delimiter). */
  reading: boolean;
  specimenHeightMm: number | null;
  pending: boolean;
  error: unknown;
  onHeaderRow: (row: number) => void;
  onDelimiter: (delimiter: MappingDraft['delimiter']) => void;
  onImport: (request: ImportRequest) => void;
};

/** Waits until the value has held still for a moment (typing a division), then passes it on. */
function useSettled<T>(value: T, delayMs = 350): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}

/**
 * The mapping step: the file's first rows with the header row marked, every setting
 * pre-selected from a matching saved profile or from the guess (each with what it rests on,
 * and the ones the file does not tell left to choose), and the first increment as it will
 * import, read again as the settings change.
 */
export function MappingForm({ orgId, preview, reading, specimenHeightMm, pending, error, onHeaderRow, onDelimiter, onImport }: MappingFormProps) {
  const profiles = useImportProfiles(orgId);
  const suggestion = preview.suggestion;
  const [draft, setDraft] = useState<MappingDraft>(() => draftFromGuess(suggestion.guess, suggestion.open));
  const [errors, setErrors] = useState<MappingErrors>({});
  const [profileName, setProfileName] = useState('');
  const [profileId, setProfileId] = useState('');
  const set = <K extends keyof MappingDraft>(key: K, value: MappingDraft[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const settled = useSettled(draft);
  const built = useMemo(() => mappingFromDraft(settled), [settled]);
  const trial = useImportTrial(orgId, preview.uploadId, built.ok ? built.mapping : null);
  const fields = { preview, suggestion, draft, errors, set };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = mappingFromDraft(draft);
    if (!result.ok) {
      setErrors(result.errors);
      event.currentTarget.querySelector<HTMLElement>(`[name="${Object.keys(result.errors)[0]}"]`)?.focus();
      return;
    }
    setErrors({});
    onImport({ mapping: result.mapping, ...(profileName.trim() ? { saveAsProfile: profileName.trim() } : {}) });
  };

  return (
    <div className="space-y-5">
      <PreviewRowsTable preview={preview} headerRow={preview.headerRow} onHeaderRow={onHeaderRow} disabled={reading} />
      {suggestion.source === 'profile' && suggestion.profile ? (
        <Alert tone="success" title={`The saved profile “${suggestion.profile.name}” fits this file`}>Its settings are filled in below. Check the first increment, then import.</Alert>
      ) : suggestion.open.length > 0 ? (
        <Alert tone="warning" title={`${suggestion.open.length} setting${suggestion.open.length === 1 ? '' : 's'} the file does not tell`}>The rest is guessed from the column names and the values, with the reason under each setting. Choose the ones marked, check the first increment, then import.</Alert>
      ) : (
        <Alert tone="info" title="Every setting is guessed from the file">The reason is under each setting. Check the first increment below, then import.</Alert>
      )}
      {profiles.data && profiles.data.length > 0 ? (
        <div className="flex flex-wrap items-end gap-3 rounded-md border border-slate-200 p-3">
          <Select label="Use a saved import profile" className="w-72" options={[{ value: '', label: 'Choose a profile…' }, ...profiles.data.map((p) => ({ value: p.id, label: p.name }))]} value={profileId} onChange={(e) => setProfileId(e.target.value)} />
          <Button variant="secondary" disabled={profileId === '' || pending} onClick={() => onImport({ profileId })}>Import with this profile</Button>
        </div>
      ) : null}
      <form noValidate onSubmit={onSubmit} aria-label="Map the file's columns" className="space-y-4">
        <FileLayoutFields {...fields} onHeaderRow={onHeaderRow} onDelimiter={onDelimiter} />
        <ColumnFields {...fields} />
        <UnitFields {...fields} />
        <GaugeFields {...fields} />
        <section aria-label="First increment as it will import" className="space-y-2">
          <h4 className="text-sm font-semibold text-slate-900">First increment as it will import</h4>
          {!built.ok ? (
            <p className="text-sm text-slate-600">Complete the settings to see the first increment in minutes and millimetres.</p>
          ) : trial.isPending ? (
            <LoadingBlock label="Reading the first increment…" />
          ) : trial.error ? (
            <ErrorMessage error={trial.error} title="The first increment could not be read" />
          ) : trial.data ? (
            <TrialTable trial={trial.data} specimenHeightMm={specimenHeightMm} />
          ) : null}
        </section>
        <TextField label="Save as profile (optional)" name="profileName" hint="Give it a name to reuse this mapping for files from the same logger" value={profileName} onChange={(e) => setProfileName(e.target.value)} />
        {error ? <ErrorMessage error={error} title="The import did not start" /> : null}
        <Button type="submit" pending={pending}>Import with this mapping</Button>
      </form>
    </div>
  );
}
