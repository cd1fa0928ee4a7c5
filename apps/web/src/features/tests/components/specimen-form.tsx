import { TestUpdateSchema, type TestDetail } from '@porestack/types';
import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { numberOrNull } from '../../../lib/form-numbers';
import { fieldErrorsFromApi, formValues, type FieldErrors } from '../../../lib/form-errors';
import { useUpdateTest } from '../api/update-test';

const DRAINAGE_OPTIONS = [
  { value: 'double', label: 'Both ends (double)' },
  { value: 'single', label: 'One end (single)' },
];

/** Water contents are typed in per cent (what the lab sheet says) and stored as fractions. */
const percentToFraction = (text: string | undefined) => {
  const n = numberOrNull(text);
  return typeof n === 'number' ? n / 100 : n;
};
const fractionToPercent = (n: number | null) => (n === null ? '' : String(Math.round(n * 10000) / 100));
const str = (n: number | null) => (n === null ? '' : String(n));

type ComplianceRow = { key: number; stressKpa: string; deflectionMm: string };

/** Specimen, apparatus and compliance table, editable until the test is sent for review. */
export function SpecimenForm({ orgId, test, readOnly }: { orgId: string; test: TestDetail; readOnly: boolean }) {
  const update = useUpdateTest(orgId, test.id);
  const [errors, setErrors] = useState<FieldErrors & Record<string, string | undefined>>({});
  const [saved, setSaved] = useState(false);
  const [rows, setRows] = useState<ComplianceRow[]>(() =>
    test.compliance.map((p, key) => ({ key, stressKpa: String(p.stressKpa), deflectionMm: String(p.deflectionMm) })),
  );
  const shown = { ...fieldErrorsFromApi(update.error), ...errors };
  const s = test.specimen;

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setSaved(false);
    const v = formValues(event.currentTarget);
    const candidate = {
      apparatusName: v['apparatusName'] ?? '',
      startedOn: v['startedOn'] || null,
      finishedOn: v['finishedOn'] || null,
      specimen: {
        initialHeightMm: numberOrNull(v['initialHeightMm']),
        diameterMm: numberOrNull(v['diameterMm']),
        specificGravity: numberOrNull(v['specificGravity']),
        dryMassG: numberOrNull(v['dryMassG']),
        wetMassG: numberOrNull(v['wetMassG']),
        initialWaterContent: percentToFraction(v['initialWaterContent']),
        finalWaterContent: percentToFraction(v['finalWaterContent']),
        drainage: v['drainage'],
      },
      compliance: rows.map((r) => ({ stressKpa: numberOrNull(r.stressKpa), deflectionMm: numberOrNull(r.deflectionMm) })),
    };
    const result = TestUpdateSchema.safeParse(candidate);
    if (!result.success) {
      // Messages keyed by the specimen field (or "compliance"), as the inputs are named.
      const next: Record<string, string> = {};
      for (const issue of result.error.issues) {
        const key = issue.path[0] === 'specimen' ? String(issue.path[1]) : String(issue.path[0]);
        next[key] ??= issue.path[0] === 'compliance' ? `Calibration row ${Number(issue.path[1]) + 1}: ${issue.message}` : issue.message;
      }
      setErrors(next);
      return;
    }
    setErrors({});
    update.mutate(result.data, { onSuccess: () => setSaved(true) });
  };

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Specimen and apparatus" className="space-y-5">
      <fieldset disabled={readOnly} className="grid gap-4 sm:grid-cols-4">
        <legend className="mb-2 text-sm font-semibold text-slate-900">Specimen</legend>
        <TextField label="Initial height H0 (mm)" name="initialHeightMm" inputMode="decimal" defaultValue={str(s.initialHeightMm)} error={shown['initialHeightMm']} />
        <TextField label="Diameter (mm)" name="diameterMm" inputMode="decimal" defaultValue={str(s.diameterMm)} error={shown['diameterMm']} />
        <TextField label="Specific gravity Gs" name="specificGravity" inputMode="decimal" defaultValue={str(s.specificGravity)} error={shown['specificGravity']} />
        <Select label="Drainage" name="drainage" options={DRAINAGE_OPTIONS} defaultValue={s.drainage} />
        <TextField label="Dry mass (g)" name="dryMassG" inputMode="decimal" defaultValue={str(s.dryMassG)} hint="Or give wet mass and w0" error={shown['dryMassG']} />
        <TextField label="Wet mass (g)" name="wetMassG" inputMode="decimal" defaultValue={str(s.wetMassG)} error={shown['wetMassG']} />
        <TextField label="Initial water content w0 (%)" name="initialWaterContent" inputMode="decimal" defaultValue={fractionToPercent(s.initialWaterContent)} error={shown['initialWaterContent']} />
        <TextField label="Final water content wf (%)" name="finalWaterContent" inputMode="decimal" defaultValue={fractionToPercent(s.finalWaterContent)} error={shown['finalWaterContent']} />
      </fieldset>
      <fieldset disabled={readOnly} className="grid gap-4 sm:grid-cols-4">
        <legend className="mb-2 text-sm font-semibold text-slate-900">Apparatus and dates</legend>
        <TextField label="Apparatus" name="apparatusName" defaultValue={test.apparatusName} className="sm:col-span-2" error={shown['apparatusName']} />
        <TextField label="Started on" name="startedOn" type="date" defaultValue={test.startedOn ?? ''} error={shown['startedOn']} />
        <TextField label="Finished on" name="finishedOn" type="date" defaultValue={test.finishedOn ?? ''} error={shown['finishedOn']} />
      </fieldset>
      <fieldset disabled={readOnly} className="space-y-2">
        <legend className="mb-1 text-sm font-semibold text-slate-900">Apparatus compliance (steel-dummy calibration)</legend>
        <p className="text-xs text-slate-500">The deflection of the frame, stones and papers at each stress; it is subtracted from the readings.</p>
        <ComplianceTable rows={rows} onChange={setRows} />
        {shown['compliance'] ? <p className="text-sm text-red-700">{shown['compliance']}</p> : null}
      </fieldset>
      {update.error ? <ErrorMessage error={update.error} title="The changes were not saved" /> : null}
      {saved ? <Alert tone="success">Saved. Re-run the analysis to use the new values.</Alert> : null}
      {readOnly ? (
        <p className="text-sm text-slate-600">The test is with review or approved; its set-up can no longer be changed.</p>
      ) : (
        <Button type="submit" pending={update.isPending}>Save specimen and apparatus</Button>
      )}
    </form>
  );
}

function ComplianceTable({ rows, onChange }: { rows: ComplianceRow[]; onChange: (rows: ComplianceRow[]) => void }) {
  const set = (key: number, patch: Partial<ComplianceRow>) => onChange(rows.map((r) => (r.key === key ? { ...r, ...patch } : r)));
  const nextKey = rows.reduce((m, r) => Math.max(m, r.key), -1) + 1;
  return (
    <div className="space-y-2">
      {rows.length > 0 ? (
        <table className="text-sm">
          <thead className="text-xs text-slate-500">
            <tr>
              <th scope="col" className="pr-3 text-left font-medium">Stress (kPa)</th>
              <th scope="col" className="pr-3 text-left font-medium">Deflection (mm)</th>
              <th scope="col"><span className="sr-only">Remove</span></th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, n) => (
              <tr key={r.key}>
                <td className="py-1 pr-3">
                  <input aria-label={`Calibration ${n + 1} stress (kPa)`} inputMode="decimal" className="h-8 w-28 rounded border border-slate-300 px-2" value={r.stressKpa} onChange={(e) => set(r.key, { stressKpa: e.target.value })} />
                </td>
                <td className="py-1 pr-3">
                  <input aria-label={`Calibration ${n + 1} deflection (mm)`} inputMode="decimal" className="h-8 w-28 rounded border border-slate-300 px-2" value={r.deflectionMm} onChange={(e) => set(r.key, { deflectionMm: e.target.value })} />
                </td>
                <td>
                  <Button variant="ghost-danger" size="sm" onClick={() => onChange(rows.filter((x) => x.key !== r.key))}>
                    Remove<span className="sr-only"> calibration row {n + 1}</span>
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="text-sm text-slate-600">No calibration: readings are used as measured.</p>
      )}
      <Button variant="secondary" size="sm" onClick={() => onChange([...rows, { key: nextKey, stressKpa: '', deflectionMm: '' }])}>
        Add calibration point
      </Button>
    </div>
  );
}

