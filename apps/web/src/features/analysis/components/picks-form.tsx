import type { FormEvent } from 'react';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import type { ConsolidationTestResult } from '@porestack/types';
import type { PicksDraft, PicksErrors } from './picks-draft';

type PicksFormProps = {
  result: ConsolidationTestResult;
  draft: PicksDraft;
  incrementIndex: number;
  errors: PicksErrors;
  pending: boolean;
  error: unknown;
  disabled: boolean;
  onChange: (draft: PicksDraft) => void;
  onSave: () => void;
};

/** The same overrides the plots propose, typed in; a reason is always required. */
export function PicksForm({ result, draft, incrementIndex, errors, pending, error, disabled, onChange, onSave }: PicksFormProps) {
  const entry = draft.increments[incrementIndex] ?? { t90Min: '', t50Min: '' };
  const setIncrement = (patch: Partial<typeof entry>) => onChange({ ...draft, increments: { ...draft.increments, [incrementIndex]: { ...entry, ...patch } } });
  const incrementOptions = [{ value: '', label: 'Automatic' }, ...result.increments.filter((i) => i.kind === 'loading').map((i) => ({ value: String(i.index), label: `${i.index}: ${i.stressKpa.toFixed(0)} kPa` }))];
  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    onSave();
  };
  return (
    <form noValidate onSubmit={onSubmit} aria-label="Override picks" className="space-y-4">
      <fieldset disabled={disabled} className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-sm font-semibold text-slate-900">Whole test</legend>
        <TextField label="σ′p adopted (kPa)" name="preconsolidationStressKpa" inputMode="decimal" hint={`Blank: the method's value (${result.preconsolidation.casagrandeKpa?.toFixed(0) ?? '—'} kPa by Casagrande)`} value={draft.preconsolidationStressKpa} onChange={(e) => onChange({ ...draft, preconsolidationStressKpa: e.target.value })} error={errors.preconsolidationStressKpa} />
        <Select label="Virgin line from increment" name="virginFirst" options={incrementOptions} value={draft.virginFirst} onChange={(e) => onChange({ ...draft, virginFirst: e.target.value })} error={errors.virginLine} />
        <Select label="Virgin line to increment" name="virginLast" options={incrementOptions} value={draft.virginLast} onChange={(e) => onChange({ ...draft, virginLast: e.target.value })} />
      </fieldset>
      <fieldset disabled={disabled} className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-sm font-semibold text-slate-900">Increment {incrementIndex}</legend>
        <TextField label={`t90 of increment ${incrementIndex} (min)`} name={`t90-${incrementIndex}`} inputMode="decimal" hint="Blank: Taylor's construction" value={entry.t90Min} onChange={(e) => setIncrement({ t90Min: e.target.value })} error={errors[`t90-${incrementIndex}`]} />
        <TextField label={`t50 of increment ${incrementIndex} (min)`} name={`t50-${incrementIndex}`} inputMode="decimal" hint="Blank: Casagrande's construction" value={entry.t50Min} onChange={(e) => setIncrement({ t50Min: e.target.value })} error={errors[`t50-${incrementIndex}`]} />
      </fieldset>
      <TextField label="Reason for the override" name="reason" disabled={disabled} hint="Kept with the analysis and shown to the reviewer" value={draft.reason} onChange={(e) => onChange({ ...draft, reason: e.target.value })} error={errors.reason} />
      {Object.keys(errors).some((k) => k.startsWith('t90-') || k.startsWith('t50-')) ? (
        <ul className="text-sm text-red-700">
          {Object.entries(errors).filter(([k]) => k.startsWith('t')).map(([k, m]) => <li key={k}>{m}</li>)}
        </ul>
      ) : null}
      {error ? <ErrorMessage error={error} title="The picks were not saved" /> : null}
      <Button type="submit" pending={pending} disabled={disabled}>Save picks and re-run the analysis</Button>
    </form>
  );
}
