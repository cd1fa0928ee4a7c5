import type { HomeOverview } from '@porestack/types';
import { Panel } from '../../../components/panel';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { HomeList, MoreLink } from './home-list';

const SHOWN = 6;
const fixed = (n: number | null, d: number) => (n === null ? '—' : n.toFixed(d));
const JOB_WORDS: Record<string, string> = { 'analyse-test': 'analysis', 'import-readings': 'readings import' };

export function LabManagerHome({ orgId, section }: { orgId: string; section: NonNullable<HomeOverview['labManager']> }) {
  const queue = section.reviewQueue;
  return (
    <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-2">
      <Panel title="Review queue" description={queue.length === 0 ? 'Nothing to review.' : `${queue.length} ${queue.length === 1 ? 'test waits' : 'tests wait'} for a decision, oldest first.`}>
        <HomeList
          label="Tests to review"
          empty="No test is waiting for review."
          items={queue.slice(0, SHOWN).map((q) => ({
            key: q.testId,
            to: `${paths.org.test.to(orgId, q.testId)}?section=review`,
            title: `${q.testReference} · ${q.boreholeName} / ${q.sampleReference}`,
            meta: `${q.projectName} · from ${q.technicianName}${q.warningCount > 0 ? ` · ${q.warningCount} ${q.warningCount === 1 ? 'warning' : 'warnings'}` : ''}`,
            aside: `sent ${formatDateTime(q.submittedAt)}`,
          }))}
        />
        {queue.length > SHOWN ? <MoreLink to={paths.org.reviewQueue.to(orgId)}>All {queue.length} in the review queue</MoreLink> : null}
      </Panel>
      <Panel title="Stuck after a failed job" description="Tests whose last analysis or import failed and has not been run again.">
        <HomeList
          label="Tests stuck after a failed job"
          empty="No test is stuck: every last job succeeded or is still running."
          items={section.stuckTests.map((t) => ({
            key: t.testId,
            to: `${paths.org.test.to(orgId, t.testId)}?section=${t.jobKind === 'import-readings' ? 'readings' : 'results'}`,
            title: `${t.testReference} · ${JOB_WORDS[t.jobKind] ?? t.jobKind} failed`,
            meta: (
              <>
                {t.projectName} · {t.technicianName}
                {t.message ? <span className="mt-0.5 block text-slate-800">{t.message}</span> : null}
              </>
            ),
            aside: formatDateTime(t.failedAt),
          }))}
        />
      </Panel>
      <Panel title="Recent approvals" description="The latest soil record versions approved in the laboratory.">
        <HomeList
          label="Recent approvals"
          empty="Nothing has been approved yet."
          items={section.recentApprovals.map((a) => ({
            key: `${a.recordId}-${a.version}`,
            to: `${paths.org.soilRecord.to(orgId, a.recordId)}?version=${a.version}`,
            title: `${a.testReference} v${a.version} · ${a.boreholeName} / ${a.sampleReference}`,
            meta: `${a.projectName} · Cc ${fixed(a.compressionIndex, 3)} · σ′p ${fixed(a.preconsolidationAdoptedKpa, 0)} kPa · by ${a.approvedByName}`,
            aside: formatDateTime(a.approvedAt),
          }))}
        />
      </Panel>
    </div>
  );
}
