import type { RunCheckAnswer, SettlementCheckDetail, SizingAnswer } from '@porestack/types';
import { useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { ApiError } from '../../../lib/api-error';
import { numberOrNull } from '../../../lib/form-numbers';
import { useApplySizing, useSizing } from '../api/settlement-checks';
import { formatMm } from './design-format';

type SizingPanelProps = { orgId: string; projectId: string; check: SettlementCheckDetail; canEdit: boolean; onApplied: (answer: RunCheckAnswer) => void };

/**
 * The width of a footing that meets a target settlement, or matches another footing's, on the
 * latest revision; a plain answer when no width within the bounds does; applied on request as a
 * new revision.
 */
export function SizingPanel({ orgId, projectId, check, canEdit, onApplied }: SizingPanelProps) {
  const sizable = check.footings.filter((f) => f.shape === 'square' || f.shape === 'rectangle');
  const [footingId, setFootingId] = useState(sizable[0]?.id ?? '');
  const [target, setTarget] = useState<'settlement' | 'match'>('settlement');
  const [targetMm, setTargetMm] = useState(String(check.options.totalSettlementLimitMm ?? 25));
  const [matchId, setMatchId] = useState(check.footings.find((f) => f.id !== footingId)?.id ?? '');
  const [minWidth, setMinWidth] = useState('0.5');
  const [maxWidth, setMaxWidth] = useState('6');
  const [answer, setAnswer] = useState<SizingAnswer | null>(null);
  const sizing = useSizing(orgId, projectId, check.id);
  const apply = useApplySizing(orgId, projectId, check.id);
  const applyWidth = (sized: SizingAnswer, acceptWarnings: boolean) =>
    apply.mutate(
      { footingId: sized.footingId, widthM: Number((sized.widthM ?? 0).toFixed(2)), lengthM: sized.lengthM === null ? null : Number(sized.lengthM.toFixed(2)), acceptWarnings },
      { onSuccess: onApplied },
    );
  const issue = (field: string) => (sizing.error instanceof ApiError ? sizing.error.issueFor(field) : undefined);
  if (check.latestRevision === null) return <p className="text-sm text-slate-600">Run the check first: sizing works on the latest revision's ground model and neighbours.</p>;
  if (!canEdit) return <p className="text-sm text-slate-600">Sizing is for the project's designers; the revisions show the widths they chose.</p>;
  return (
    <div className="space-y-4">
      <form
        aria-label="Size a footing"
        className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3"
        onSubmit={(event) => {
          event.preventDefault();
          setAnswer(null);
          sizing.mutate(
            {
              footingId,
              target,
              targetTotalMm: target === 'settlement' ? (numberOrNull(targetMm) as number | null) : null,
              matchFootingId: target === 'match' ? matchId : null,
              minWidthM: numberOrNull(minWidth) as number,
              maxWidthM: numberOrNull(maxWidth) as number,
            },
            { onSuccess: setAnswer },
          );
        }}
      >
        <Select label="Footing to size" value={footingId} onChange={(e) => setFootingId(e.target.value)} options={sizable.map((f) => ({ value: f.id, label: f.id }))} error={issue('footingId')} />
        <Select
          label="Size it to"
          value={target}
          onChange={(e) => setTarget(e.target.value as 'settlement' | 'match')}
          options={[
            { value: 'settlement', label: 'meet a target total settlement' },
            { value: 'match', label: "match another footing's settlement" },
          ]}
        />
        {target === 'settlement' ? (
          <TextField label="Target total settlement (mm)" name="targetTotalMm" inputMode="decimal" value={targetMm} onChange={(e) => setTargetMm(e.target.value)} error={issue('targetTotalMm')} />
        ) : (
          <Select label="Footing to match" value={matchId} onChange={(e) => setMatchId(e.target.value)} options={check.footings.filter((f) => f.id !== footingId).map((f) => ({ value: f.id, label: f.id }))} error={issue('matchFootingId')} />
        )}
        <TextField label="Smallest width to try (m)" name="minWidthM" inputMode="decimal" value={minWidth} onChange={(e) => setMinWidth(e.target.value)} error={issue('minWidthM')} />
        <TextField label="Largest width to try (m)" name="maxWidthM" inputMode="decimal" value={maxWidth} onChange={(e) => setMaxWidth(e.target.value)} error={issue('maxWidthM')} />
        <div className="flex items-end">
          <Button type="submit" pending={sizing.isPending}>
            Find the width
          </Button>
        </div>
      </form>
      {sizing.error ? <ErrorMessage error={sizing.error} title="The footing could not be sized" hideIssuesFor={['footingId', 'targetTotalMm', 'matchFootingId', 'minWidthM', 'maxWidthM']} /> : null}
      {answer ? (
        <Alert tone={answer.status === 'no-width-within-bounds' ? 'warning' : 'success'} title="Sizing answer">
          <p data-testid="sizing-answer">{answer.message}</p>
          <p className="mt-1 text-xs">
            At the smallest width {formatMm(answer.settlementAtMinWidthM)} mm; at the largest {formatMm(answer.settlementAtMaxWidthM)} mm; target {formatMm(answer.targetSettlementM)} mm.
          </p>
          {answer.widthM !== null && answer.status === 'found' && canEdit ? (
            <Button
              className="mt-3"
              size="sm"
              pending={apply.isPending}
              onClick={() => applyWidth(answer, false)}
            >
              Apply B = {answer.widthM.toFixed(2)} m to the schedule and run (new revision)
            </Button>
          ) : null}
        </Alert>
      ) : null}
      {apply.error instanceof ApiError && apply.error.code === 'confirmation_needed' && answer ? (
        <Alert tone="warning" title="Check this before applying">
          <ul className="list-disc space-y-0.5 pl-5">
            {apply.error.issues.map((i) => (
              <li key={i.path + i.message}>{i.message}</li>
            ))}
          </ul>
          <Button className="mt-3" variant="secondary" size="sm" pending={apply.isPending} onClick={() => applyWidth(answer, true)}>
            Apply anyway
          </Button>
        </Alert>
      ) : apply.error ? (
        <ErrorMessage error={apply.error} title="The width was not applied" />
      ) : null}
    </div>
  );
}
