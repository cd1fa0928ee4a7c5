import { DEFAULT_LIMITS, LIMIT_SOURCE_LABELS, LIMIT_SOURCES, type CheckOptions, type LimitSource, type SettlementCheckDetail } from '@porestack/types';
import { useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { ApiError } from '../../../lib/api-error';
import { numberOrNull } from '../../../lib/form-numbers';
import { useUpdateCheck } from '../api/settlement-checks';

type Draft = { [K in keyof CheckOptions]: CheckOptions[K] extends number | null ? string : CheckOptions[K] };

const NUMBER_KEYS = ['uniformStressIncreaseKpa', 'sublayerMaxThicknessM', 'sublayerCount', 'designLifeYears', 'totalSettlementLimitMm', 'angularDistortionDenominator', 'pairMaxDistanceM'] as const;

function toDraft(options: CheckOptions): Draft {
  const draft = { ...options } as unknown as Record<string, unknown>;
  for (const key of NUMBER_KEYS) draft[key] = options[key] === null ? '' : String(options[key]);
  return draft as Draft;
}

function fromDraft(draft: Draft): CheckOptions {
  const options = { ...draft } as unknown as Record<string, unknown>;
  for (const key of NUMBER_KEYS) options[key] = numberOrNull(draft[key] as string);
  return options as CheckOptions;
}

const LIMIT_OPTIONS = LIMIT_SOURCES.map((source) => ({ value: source, label: LIMIT_SOURCE_LABELS[source] }));

/**
 * How the check is worked out and judged. Each default comes from a published table; the
 * source of every limit is named here and in the results.
 */
export function CheckOptionsForm({ orgId, projectId, check, canEdit }: { orgId: string; projectId: string; check: SettlementCheckDetail; canEdit: boolean }) {
  const [draft, setDraft] = useState<Draft>(() => toDraft(check.options));
  const update = useUpdateCheck(orgId, projectId, check.id);
  const set = <K extends keyof Draft>(key: K, value: Draft[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const issue = (key: string) => (update.error instanceof ApiError ? update.error.issueFor(`options.${key}`) ?? update.error.issues.find((i) => i.path === `options.${key}`)?.message : undefined);
  const yesNo = [
    { value: 'yes', label: 'yes' },
    { value: 'no', label: 'no' },
  ];
  return (
    <form
      aria-label="Check options"
      className="space-y-5"
      onSubmit={(event) => {
        event.preventDefault();
        update.mutate({ options: fromDraft(draft), acceptWarnings: true });
      }}
    >
      <fieldset disabled={!canEdit} className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <Select
          label="Loading"
          value={draft.loading}
          onChange={(e) => set('loading', e.target.value as CheckOptions['loading'])}
          options={[
            { value: 'footings', label: 'the footing schedule' },
            { value: 'uniform', label: 'a uniform stress increase (wide fill, or Δσ given)' },
          ]}
        />
        {draft.loading === 'uniform' ? (
          <TextField label="Stress increase Δσ (kPa)" name="uniformStressIncreaseKpa" inputMode="decimal" value={draft.uniformStressIncreaseKpa} onChange={(e) => set('uniformStressIncreaseKpa', e.target.value)} error={issue('uniformStressIncreaseKpa')} />
        ) : (
          <>
            <Select
              label="Stress below a footing"
              value={draft.stressMethod}
              onChange={(e) => set('stressMethod', e.target.value as CheckOptions['stressMethod'])}
              options={[
                { value: 'boussinesq', label: 'Boussinesq (Newmark/Fadum)' },
                { value: '2to1', label: '2V:1H spread' },
              ]}
            />
            <Select label="Include neighbouring footings" value={draft.includeNeighbours ? 'yes' : 'no'} onChange={(e) => set('includeNeighbours', e.target.value === 'yes')} options={yesNo} />
            <Select
              label="Points evaluated"
              value={draft.evaluationPoints}
              onChange={(e) => set('evaluationPoints', e.target.value as CheckOptions['evaluationPoints'])}
              options={[
                { value: 'centre-and-corners', label: 'centre and corners' },
                { value: 'centre', label: 'centre only' },
              ]}
            />
          </>
        )}
        <Select
          label="Sublayers"
          value={draft.sublayerMode}
          onChange={(e) => set('sublayerMode', e.target.value as CheckOptions['sublayerMode'])}
          options={[
            { value: 'thickness', label: 'no thicker than…' },
            { value: 'count', label: 'a number per layer' },
          ]}
        />
        {draft.sublayerMode === 'thickness' ? (
          <TextField label="Largest sublayer (m)" name="sublayerMaxThicknessM" inputMode="decimal" value={draft.sublayerMaxThicknessM} onChange={(e) => set('sublayerMaxThicknessM', e.target.value)} error={issue('sublayerMaxThicknessM')} />
        ) : (
          <TextField label="Sublayers per layer" name="sublayerCount" inputMode="numeric" value={draft.sublayerCount} onChange={(e) => set('sublayerCount', e.target.value)} error={issue('sublayerCount')} hint="1: stresses at each layer's mid-depth" />
        )}
        <Select label="Immediate settlement" value={draft.immediate ? 'yes' : 'no'} onChange={(e) => set('immediate', e.target.value === 'yes')} options={yesNo} hint="Steinbrenner, over layers with E′ and ν" />
        {draft.loading === 'footings' ? (
          <Select label="Fox depth factor on own footing" value={draft.applyFoxDepthFactor ? 'yes' : 'no'} onChange={(e) => set('applyFoxDepthFactor', e.target.value === 'yes')} options={yesNo} hint="only where the soil above the base is in place" />
        ) : null}
        <Select label="Secondary compression" value={draft.secondary ? 'yes' : 'no'} onChange={(e) => set('secondary', e.target.value === 'yes')} options={yesNo} />
        <TextField label="Design life (years)" name="designLifeYears" inputMode="decimal" value={draft.designLifeYears} onChange={(e) => set('designLifeYears', e.target.value)} error={issue('designLifeYears')} />
      </fieldset>
      <fieldset disabled={!canEdit} className="grid gap-4 rounded-md border border-slate-200 p-4 sm:grid-cols-2 lg:grid-cols-3">
        <legend className="px-1 text-sm font-semibold text-slate-900">Limits</legend>
        <TextField
          label="Total settlement limit (mm)"
          name="totalSettlementLimitMm"
          inputMode="decimal"
          value={draft.totalSettlementLimitMm}
          onChange={(e) => set('totalSettlementLimitMm', e.target.value)}
          error={issue('totalSettlementLimitMm')}
          hint={`Default ${DEFAULT_LIMITS.totalSettlementMm} mm: ${LIMIT_SOURCE_LABELS[DEFAULT_LIMITS.totalSettlementSource]}, often acceptable for isolated foundations. Leave empty not to judge totals.`}
        />
        <Select label="Total limit from" value={draft.totalSettlementSource} onChange={(e) => set('totalSettlementSource', e.target.value as LimitSource)} options={LIMIT_OPTIONS} />
        <div />
        <TextField
          label="Angular distortion limit 1/n: n ="
          name="angularDistortionDenominator"
          inputMode="decimal"
          value={draft.angularDistortionDenominator}
          onChange={(e) => set('angularDistortionDenominator', e.target.value)}
          error={issue('angularDistortionDenominator')}
          hint={`Default 1/${DEFAULT_LIMITS.angularDistortionDenominator}: ${LIMIT_SOURCE_LABELS[DEFAULT_LIMITS.angularDistortionSource]}, safe limit where no cracking is allowed (also Skempton & MacDonald's design limit).`}
        />
        <Select label="Angular distortion limit from" value={draft.angularDistortionSource} onChange={(e) => set('angularDistortionSource', e.target.value as LimitSource)} options={LIMIT_OPTIONS} />
        <TextField
          label="Neighbours closer than (m)"
          name="pairMaxDistanceM"
          inputMode="decimal"
          value={draft.pairMaxDistanceM}
          onChange={(e) => set('pairMaxDistanceM', e.target.value)}
          error={issue('pairMaxDistanceM')}
          hint="Pairs of footings within this distance, centre to centre, are judged for differential settlement. Empty: every pair."
        />
      </fieldset>
      {update.isSuccess ? <Alert tone="success">Options saved. Run the check to use them.</Alert> : null}
      {update.error ? <ErrorMessage error={update.error} title="The options were not saved" /> : null}
      {canEdit ? (
        <Button type="submit" pending={update.isPending}>
          Save options
        </Button>
      ) : null}
    </form>
  );
}
