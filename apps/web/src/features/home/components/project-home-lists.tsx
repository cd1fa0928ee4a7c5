import type { HomeApproval, ProjectSummary } from '@porestack/types';
import { Panel } from '../../../components/panel';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { HomeList } from './home-list';

const fixed = (n: number | null, d: number) => (n === null ? '—' : n.toFixed(d));

/** The projects a designer or client is on, each opening its page. */
export function ProjectsPanel({ orgId, title, projects, empty, countWord }: { orgId: string; title: string; projects: readonly ProjectSummary[]; empty: string; countWord: string }) {
  return (
    <Panel title={title}>
      <HomeList
        label={title}
        empty={empty}
        items={projects.map((p) => ({
          key: p.id,
          to: paths.org.project.to(orgId, p.id),
          title: p.name,
          meta: `${p.reference}${p.siteName ? ` · ${p.siteName}` : ''}`,
          aside: `${p.boreholeCount} ${p.boreholeCount === 1 ? 'borehole' : 'boreholes'} · ${p.testCount} ${countWord}`,
        }))}
      />
    </Panel>
  );
}

/** Approved versions, newest first, each opening its test summary. */
export function IssuedResultsPanel({ orgId, results }: { orgId: string; results: readonly HomeApproval[] }) {
  return (
    <Panel title="Recently issued results" description="The laboratory’s latest approved test results on your projects.">
      <HomeList
        label="Recently issued results"
        empty="No result has been issued on your projects yet. You will find each one here as soon as the laboratory approves it."
        items={results.map((r) => ({
          key: `${r.recordId}-${r.version}`,
          to: paths.org.issuedTest.to(orgId, r.recordId, r.version),
          title: `Test ${r.testReference} · ${r.boreholeName} / ${r.sampleReference} at ${r.topDepthM.toFixed(2)} m`,
          meta: `${r.projectName} · Cc ${fixed(r.compressionIndex, 3)} · σ′p ${fixed(r.preconsolidationAdoptedKpa, 0)} kPa`,
          aside: `approved ${formatDate(r.approvedAt)}`,
        }))}
      />
    </Panel>
  );
}
