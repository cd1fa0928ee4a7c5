import type { RunCheckAnswer, SettlementCheckDetail } from '@porestack/types';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef, useState } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { Button } from '../../components/button';
import { ErrorMessage } from '../../components/error-message';
import { JobProgress } from '../../components/job-progress';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { useJob } from '../../lib/jobs';
import { designKeys } from '../../features/design/api/design-keys';
import { useCheck, useRerunWithNewer, useRunCheck } from '../../features/design/api/settlement-checks';
import { CheckOptionsForm } from '../../features/design/components/check-options-form';
import { CheckResults } from '../../features/design/components/check-results';
import { formatNumber } from '../../features/design/components/design-format';
import { FootingScheduleEditor } from '../../features/design/components/footing-schedule-editor';
import { IssuedCheckReport } from '../../features/design/components/issued-check-report';
import { NewerParametersBadge } from '../../features/design/components/newer-parameters-badge';
import { RevisionsPanel } from '../../features/design/components/revisions-panel';
import { SizingPanel } from '../../features/design/components/sizing-panel';
import { DESIGN_READERS, designPermissions } from '../design-permissions';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { ProjectBackLink } from './project-back-link';

const TABS = [
  ['schedule', 'Schedule'],
  ['options', 'Options'],
  ['results', 'Results'],
  ['sizing', 'Sizing'],
  ['revisions', 'Revisions'],
] as const;
type Tab = (typeof TABS)[number][0];

export function SettlementCheckRoute() {
  return (
    <RoleGate roles={DESIGN_READERS} purpose="a project's design work">
      <SettlementCheckPage />
    </RoleGate>
  );
}

function SettlementCheckPage() {
  const { orgId, membership } = useCurrentOrg();
  const { projectId = '', checkId = '' } = useParams();
  const check = useCheck(orgId, projectId, checkId);
  if (check.isPending) return <LoadingBlock label="Loading the check…" />;
  if (check.error) return <ErrorMessage error={check.error} title="The check could not be loaded" onRetry={() => void check.refetch()} />;
  return <CheckPage orgId={orgId} projectId={projectId} check={check.data} canEdit={designPermissions(membership.roles).edit} />;
}

function CheckPage({ orgId, projectId, check, canEdit }: { orgId: string; projectId: string; check: SettlementCheckDetail; canEdit: boolean }) {
  const [search, setSearch] = useSearchParams();
  const client = useQueryClient();
  const tab = (search.get('tab') as Tab | null) ?? (check.latestRevision === null ? 'schedule' : 'results');
  const revision = search.get('revision') === null ? check.latestRevision : Number(search.get('revision'));
  const footing = search.get('footing');
  const [jobId, setJobId] = useState<string | null>(check.pendingJobId);
  const job = useJob(orgId, jobId);
  const run = useRunCheck(orgId, projectId, check.id);
  const rerun = useRerunWithNewer(orgId, projectId, check.id);
  const go = (changes: Record<string, string | null>) =>
    setSearch(
      (current) => {
        const next = new URLSearchParams(current);
        for (const [key, value] of Object.entries(changes)) {
          if (value === null) next.delete(key);
          else next.set(key, value);
        }
        return next;
      },
      { replace: false },
    );
  const ran = (answer: RunCheckAnswer) => {
    void client.invalidateQueries({ queryKey: designKeys.check(orgId, projectId, check.id) });
    if (answer.kind === 'done') go({ tab: 'results', revision: String(answer.revision), footing: null });
    else setJobId(answer.jobId);
  };
  // When a queued run ends, once: refresh the check and open the new revision.
  const handledJob = useRef<string | null>(null);
  useEffect(() => {
    const ended = job.data;
    if (!ended || (ended.state !== 'succeeded' && ended.state !== 'failed') || handledJob.current === ended.id) return;
    handledJob.current = ended.id;
    void client.invalidateQueries({ queryKey: designKeys.check(orgId, projectId, check.id) });
    const result = ended.result as { revision?: number } | null;
    if (ended.state === 'succeeded' && result?.revision) go({ tab: 'results', revision: String(result.revision), footing: null });
  });

  return (
    <>
      <ProjectBackLink orgId={orgId} projectId={projectId} label={check.projectName} />
      <PageHeader
        title={check.name}
        description={
          <>
            Settlement check on ground model “{check.groundModelName}” · {check.footings.length} footing{check.footings.length === 1 ? '' : 's'} in the schedule ·{' '}
            {check.latestRevision === null ? 'not run yet' : `${check.revisions.length} revision${check.revisions.length === 1 ? '' : 's'}`}
            {check.newerParametersApproved ? (
              <span className="ml-2">
                <NewerParametersBadge />
              </span>
            ) : null}
          </>
        }
      />
      {check.freshness.newerParametersApproved ? (
        <Alert tone="warning" title="Newer parameters approved" className="mb-4">
          <p>Since revision {check.latestRevision} was run, newer versions of the parameters it used have been approved:</p>
          <ul className="mt-1 list-disc space-y-0.5 pl-5">
            {check.freshness.changes.map((c) => (
              <li key={`${c.layerIndex}-${c.label}`}>
                Layer {c.layerIndex + 1} ({c.layerName}): {c.label}, {c.kind === 'record' ? 'version' : 'revision'} {c.pinned} → {c.current}
                {c.parameters.length > 0 ? `: ${c.parameters.map((p) => `${p.name} ${formatNumber(p.before)} → ${formatNumber(p.after)}`).join(', ')}` : ' (no parameter the check uses changed)'}
              </li>
            ))}
          </ul>
          {canEdit ? (
            <Button className="mt-3" size="sm" pending={rerun.isPending} onClick={() => rerun.mutate(undefined, { onSuccess: ran })}>
              Re-run with the newer parameters (new revision)
            </Button>
          ) : null}
          {rerun.error ? <ErrorMessage error={rerun.error} title="The re-run did not start" /> : null}
        </Alert>
      ) : null}
      {jobId && job.data && job.data.state !== 'succeeded' ? (
        <div className="mb-4">
          <JobProgress job={job.data} what="The check" />
        </div>
      ) : null}
      {run.error ? (
        <div className="mb-4">
          <ErrorMessage error={run.error} title="The check was not run" />
        </div>
      ) : null}
      <nav aria-label="Parts of the check" className="mb-4 flex flex-wrap gap-1 border-b border-slate-200">
        {TABS.map(([id, words]) => (
          <button
            key={id}
            type="button"
            aria-current={tab === id ? 'page' : undefined}
            onClick={() => go({ tab: id })}
            className={`-mb-px border-b-2 px-4 py-2 text-sm font-medium ${tab === id ? 'border-accent-600 text-accent-800' : 'border-transparent text-slate-600 hover:text-slate-900'}`}
          >
            {words}
          </button>
        ))}
      </nav>
      {tab === 'schedule' ? (
        <Panel title="Footing schedule" description="B along x (a circle's diameter, a strip's width), L along y (rectangles only); depths below ground level. A load is in kN (kN per metre for a strip), a pressure in kPa; gross loads are netted against the soil removed.">
          <FootingScheduleEditor key={check.updatedAt} orgId={orgId} projectId={projectId} check={check} canEdit={canEdit} running={run.isPending} onRun={() => run.mutate({}, { onSuccess: ran })} />
        </Panel>
      ) : tab === 'options' ? (
        <Panel title="Options">
          <CheckOptionsForm orgId={orgId} projectId={projectId} check={check} canEdit={canEdit} />
        </Panel>
      ) : tab === 'results' ? (
        revision === null ? (
          <Alert>
            The check has not been run yet. Fill in the schedule, then run it.
            {canEdit ? (
              <Button className="ml-3" size="sm" pending={run.isPending} onClick={() => run.mutate({}, { onSuccess: ran })}>
                Run the check
              </Button>
            ) : null}
          </Alert>
        ) : (
          <>
            {check.revisions.length > 1 ? (
              <div className="mb-3 flex items-center gap-2 text-sm">
                <label htmlFor="revision-pick">Showing</label>
                <select id="revision-pick" className="h-8 rounded border border-slate-300 bg-white px-2" value={revision} onChange={(e) => go({ revision: e.target.value, footing: null })}>
                  {check.revisions.map((r) => (
                    <option key={r.revision} value={r.revision}>
                      Revision {r.revision}
                      {r.revision === check.latestRevision ? ' (latest)' : ''} — {r.reason}
                    </option>
                  ))}
                </select>
              </div>
            ) : null}
            <div className="mb-4">
              <IssuedCheckReport orgId={orgId} projectId={projectId} checkId={check.id} revision={revision} canIssue={canEdit} />
            </div>
            <CheckResults orgId={orgId} projectId={projectId} checkId={check.id} revision={revision} selectedFooting={footing} onSelectFooting={(id) => go({ footing: id })} />
          </>
        )
      ) : tab === 'sizing' ? (
        <Panel title="Size a footing" description="On the latest revision's ground model and neighbours, with the footing's net load held.">
          <SizingPanel orgId={orgId} projectId={projectId} check={check} canEdit={canEdit} onApplied={ran} />
        </Panel>
      ) : (
        <Panel title="Revisions">
          <RevisionsPanel orgId={orgId} projectId={projectId} check={check} onOpen={(n) => go({ tab: 'results', revision: String(n), footing: null })} />
        </Panel>
      )}
    </>
  );
}
