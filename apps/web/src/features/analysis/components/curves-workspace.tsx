import type { Analysis } from '@porestack/types';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Alert } from '../../../components/alert';
import { EngineeringCaution } from '../../../components/engineering-caution';
import { JobProgress } from '../../../components/job-progress';
import { isJobRunning, useJob } from '../../../lib/jobs';
import { useSavePicks } from '../api/save-picks';
import { CoefficientPlots, CompressionPlots, TimePlots, type Proposal } from './analysis-plots';
import { draftFromPicks, picksUpdateFromDraft, type PicksDraft, type PicksErrors } from './picks-draft';
import { PicksForm } from './picks-form';

type CurvesWorkspaceProps = {
  orgId: string;
  testId: string;
  analysis: Analysis;
  /** Overrides are for the technician before review; afterwards the curves are read only. */
  canPick: boolean;
  /** A job the server already runs for this test (e.g. after an upload). */
  pendingJobId: string | null;
};

/** The plots and the override form side by side, sharing one set of proposed picks. */
export function CurvesWorkspace({ orgId, testId, analysis, canPick, pendingJobId }: CurvesWorkspaceProps) {
  const result = analysis.result;
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState<PicksDraft>(() => draftFromPicks(analysis.picks));
  const [errors, setErrors] = useState<PicksErrors>({});
  const [incrementIndex, setIncrementIndex] = useState(() => result.increments.find((i) => i.taylor !== null)?.index ?? result.increments[0]?.index ?? 1);
  const [proposed, setProposed] = useState<string | null>(null);
  const save = useSavePicks(orgId, testId);
  const [jobId, setJobId] = useState<string | null>(null);
  const job = useJob(orgId, jobId ?? pendingJobId);

  useEffect(() => {
    if (job.data && !isJobRunning(job.data)) void queryClient.invalidateQueries({ queryKey: ['orgs', orgId, 'tests', testId] });
  }, [job.data, orgId, testId, queryClient]);

  const propose = (p: Proposal) => {
    if (!canPick) return;
    if (p.preconsolidationStressKpa !== undefined) {
      setDraft((d) => ({ ...d, preconsolidationStressKpa: String(p.preconsolidationStressKpa) }));
      setProposed(`σ′p ${p.preconsolidationStressKpa} kPa proposed from the plot. Give a reason and save to use it.`);
    }
    const patchIncrement = (patch: { t90Min?: string; t50Min?: string }) =>
      setDraft((d) => ({ ...d, increments: { ...d.increments, [incrementIndex]: { t90Min: '', t50Min: '', ...d.increments[incrementIndex], ...patch } } }));
    if (p.t90Min !== undefined) {
      patchIncrement({ t90Min: String(p.t90Min) });
      setProposed(`t90 ${p.t90Min} min proposed for increment ${incrementIndex}. Give a reason and save to use it.`);
    }
    if (p.t50Min !== undefined) {
      patchIncrement({ t50Min: String(p.t50Min) });
      setProposed(`t50 ${p.t50Min} min proposed for increment ${incrementIndex}. Give a reason and save to use it.`);
    }
  };

  const onSave = () => {
    const built = picksUpdateFromDraft(draft, analysis.picks);
    if (!built.ok) {
      setErrors(built.errors);
      return;
    }
    setErrors({});
    save.mutate(built.body, {
      onSuccess: (started) => {
        setJobId(started?.id ?? null);
        setProposed(null);
        setDraft((d) => ({ ...d, reason: '' }));
      },
    });
  };

  const running = job.data !== undefined && isJobRunning(job.data);
  return (
    <div className="space-y-6">
      <EngineeringCaution />
      {job.data ? <JobProgress job={job.data} what="Re-running the analysis" /> : null}
      {analysis.pickReason ? (
        <Alert tone="info" title="Picks in this analysis">
          {analysis.pickReason}
        </Alert>
      ) : null}
      <section aria-label="Compression curves" className="space-y-2">
        <h3 className="text-sm font-semibold text-slate-900">Compression: void ratio and strain against log stress</h3>
        <CompressionPlots result={result} onPropose={propose} />
      </section>
      <section aria-label="Time curves" className="space-y-2">
        <h3 className="text-sm font-semibold text-slate-900">Time curves of one increment</h3>
        <TimePlots orgId={orgId} testId={testId} result={result} incrementIndex={incrementIndex} onIncrementChange={setIncrementIndex} onPropose={propose} />
      </section>
      {canPick ? (
        <section aria-label="Override picks" className="space-y-2 rounded-md border border-slate-200 p-4">
          <h3 className="text-sm font-semibold text-slate-900">Override the automatic picks</h3>
          {proposed ? <Alert tone="info">{proposed}</Alert> : null}
          <PicksForm result={result} draft={draft} incrementIndex={incrementIndex} errors={errors} pending={save.isPending} error={save.error} disabled={running} onChange={setDraft} onSave={onSave} />
        </section>
      ) : null}
      <section aria-label="Coefficients against stress" className="space-y-2">
        <h3 className="text-sm font-semibold text-slate-900">cv, mv, k and Cα against stress</h3>
        <CoefficientPlots result={result} />
      </section>
    </div>
  );
}
