import type { ImportRequest, UploadPreview } from '@porestack/types';
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { useImportProfiles } from '../api/get-import-profiles';
import { draftFromMapping, mappingFromDraft, type MappingDraft, type MappingErrors } from './mapping-draft';
import { DEFORMATION_KIND_OPTIONS, DIAL_DIRECTION_OPTIONS, LENGTH_UNIT_OPTIONS, STRESS_UNIT_OPTIONS, TIME_UNIT_OPTIONS } from './unit-options';

type MappingFormProps = {
  orgId: string;
  preview: UploadPreview;
  pending: boolean;
  error: unknown;
  onImport: (request: ImportRequest) => void;
};

/** The file's first rows, and a column and unit for each field the importer needs. */
export function MappingForm({ orgId, preview, pending, error, onImport }: MappingFormProps) {
  const profiles = useImportProfiles(orgId);
  const [draft, setDraft] = useState<MappingDraft>(() => draftFromMapping(preview.suggestedMapping, preview.delimiter));
  const [errors, setErrors] = useState<MappingErrors>({});
  const [profileName, setProfileName] = useState('');
  const [profileId, setProfileId] = useState('');
  const set = <K extends keyof MappingDraft>(key: K, value: MappingDraft[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const columnOptions = [{ value: '', label: 'Choose a column…' }, ...preview.columns.map((c) => ({ value: c, label: c }))];

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = mappingFromDraft(draft);
    if (!result.ok) {
      setErrors(result.errors);
      const first = Object.keys(result.errors)[0];
      event.currentTarget.querySelector<HTMLElement>(`[name="${first}"]`)?.focus();
      return;
    }
    setErrors({});
    onImport({ mapping: result.mapping, ...(profileName.trim() ? { saveAsProfile: profileName.trim() } : {}) });
  };

  return (
    <div className="space-y-5">
      <PreviewTable preview={preview} />
      {profiles.data && profiles.data.length > 0 ? (
        <div className="flex flex-wrap items-end gap-3 rounded-md border border-slate-200 p-3">
          <Select
            label="Use a saved import profile"
            className="w-72"
            options={[{ value: '', label: 'Choose a profile…' }, ...profiles.data.map((p) => ({ value: p.id, label: p.name }))]}
            value={profileId}
            onChange={(e) => setProfileId(e.target.value)}
          />
          <Button variant="secondary" disabled={profileId === '' || pending} onClick={() => onImport({ profileId })}>
            Import with this profile
          </Button>
        </div>
      ) : null}
      <form noValidate onSubmit={onSubmit} aria-label="Map the file's columns" className="space-y-4">
        <div className="grid gap-4 sm:grid-cols-4">
          <Select label="Increment column" name="increment" options={[{ value: '', label: 'None: a new increment when the stress changes' }, ...preview.columns.map((c) => ({ value: c, label: c }))]} value={draft.increment} onChange={(e) => set('increment', e.target.value)} error={errors.increment} />
          <Select label="Stress column" name="stress" options={columnOptions} value={draft.stress} onChange={(e) => set('stress', e.target.value)} error={errors.stress} />
          <Select label="Time column" name="elapsedTime" options={columnOptions} value={draft.elapsedTime} onChange={(e) => set('elapsedTime', e.target.value)} error={errors.elapsedTime} />
          <Select label="Deformation column" name="deformation" options={columnOptions} value={draft.deformation} onChange={(e) => set('deformation', e.target.value)} error={errors.deformation} />
          <div />
          <Select label="Stress unit" name="stressUnit" options={STRESS_UNIT_OPTIONS} value={draft.stressUnit} onChange={(e) => set('stressUnit', e.target.value as MappingDraft['stressUnit'])} />
          <Select label="Time unit" name="timeUnit" options={TIME_UNIT_OPTIONS} value={draft.timeUnit} onChange={(e) => set('timeUnit', e.target.value as MappingDraft['timeUnit'])} />
          <Select label="Deformation unit" name="deformationUnit" options={LENGTH_UNIT_OPTIONS} value={draft.deformationUnit} onChange={(e) => set('deformationUnit', e.target.value as MappingDraft['deformationUnit'])} />
        </div>
        <div className="grid gap-4 sm:grid-cols-4">
          <Select label="The deformation column holds" name="deformationKind" options={DEFORMATION_KIND_OPTIONS} value={draft.deformationKind} onChange={(e) => set('deformationKind', e.target.value as MappingDraft['deformationKind'])} />
          {draft.deformationKind === 'dial' ? (
            <>
              <TextField label="Zero reading" name="dialZero" inputMode="decimal" hint="Blank: the first reading" value={draft.dialZero} onChange={(e) => set('dialZero', e.target.value)} error={errors.dialZero} />
              <TextField label="One division" name="dialDivision" inputMode="decimal" hint="In the deformation unit, e.g. 0.001" value={draft.dialDivision} onChange={(e) => set('dialDivision', e.target.value)} error={errors.dialDivision} />
              <Select label="Direction" name="dialDirection" options={DIAL_DIRECTION_OPTIONS} value={draft.dialDirection} onChange={(e) => set('dialDirection', e.target.value as MappingDraft['dialDirection'])} />
            </>
          ) : null}
        </div>
        <div className="grid gap-4 sm:grid-cols-4">
          <TextField label="Row of the column names" name="headerRow" inputMode="numeric" value={draft.headerRow} onChange={(e) => set('headerRow', e.target.value)} error={errors.headerRow} />
          <Select label="Decimal separator" name="decimalSeparator" options={[{ value: '.', label: 'Point (1.25)' }, { value: ',', label: 'Comma (1,25)' }]} value={draft.decimalSeparator} onChange={(e) => set('decimalSeparator', e.target.value as '.' | ',')} />
          <TextField label="Save as profile (optional)" name="profileName" className="sm:col-span-2" hint="Give it a name to reuse this mapping for files from the same logger" value={profileName} onChange={(e) => setProfileName(e.target.value)} />
        </div>
        {error ? <ErrorMessage error={error} title="The import did not start" /> : null}
        <Button type="submit" pending={pending}>Import with this mapping</Button>
      </form>
    </div>
  );
}

function PreviewTable({ preview }: { preview: UploadPreview }) {
  return (
    <div className="overflow-x-auto rounded-md border border-slate-200">
      <table className="w-full border-collapse text-left text-xs">
        <caption className="bg-slate-50 px-3 py-2 text-left text-sm font-medium text-slate-800">First rows of the file, as found</caption>
        <thead className="bg-slate-50 text-slate-600">
          <tr>
            {preview.columns.map((c) => (
              <th key={c} scope="col" className="whitespace-nowrap border-y border-slate-200 px-3 py-1.5 font-medium">{c}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {preview.rows.slice(0, 8).map((row, n) => (
            <tr key={n} className="border-b border-slate-100 tabular-nums">
              {row.map((cell, m) => (
                <td key={m} className="whitespace-nowrap px-3 py-1 text-slate-700">{cell ?? ''}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
