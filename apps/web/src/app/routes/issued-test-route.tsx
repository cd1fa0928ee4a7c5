import { ROLES } from '@porestack/types';
import { Link, useParams } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { EngineeringCaution } from '../../components/engineering-caution';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { formatDate } from '../../lib/format';
import { IssuedCurves } from '../../features/analysis/components/issued-curves';
import { ParametersTable, WarningsList } from '../../features/analysis/components/parameters-table';
import { useIssuedTest } from '../../features/results/api/get-issued-test';
import { IssuedProvenance } from '../../features/results/components/issued-provenance';
import { depthRange } from '../../features/results/components/parameter-format';
import { VersionDownloads } from '../../features/reports/components/version-downloads';
import { sampleQualityInWords } from '../../features/results/components/sample-quality-words';
import { SpecimenTable } from '../../features/results/components/specimen-table';
import { labPermissions } from '../lab-permissions';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';

export function IssuedTestRoute() {
  return (
    <RoleGate roles={ROLES} purpose="reading approved test results">
      <IssuedTestPage />
    </RoleGate>
  );
}

/** One approved version of a test as issued: read-only, for everyone who may read its project. */
function IssuedTestPage() {
  const { orgId, membership } = useCurrentOrg();
  const { recordId = '', version = '' } = useParams();
  const summary = useIssuedTest(orgId, recordId, Number(version));
  if (summary.isPending) return <LoadingBlock label="Loading the test summary…" />;
  if (summary.error) return <ErrorMessage error={summary.error} title="The test summary could not be loaded" onRetry={() => void summary.refetch()} />;
  const s = summary.data;
  const result = s.result;
  const quality = sampleQualityInWords(result.sampleQuality);
  const isCurrent = s.version.supersededAt === null;
  const overridden = result.picksApplied.some((pick) => pick.applied);
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.org.project.to(orgId, s.project.id)} className="text-accent-700 hover:underline">← {s.project.name}</Link>
      </p>
      <PageHeader
        title={`Test ${s.test.reference}: ${s.borehole.name} / ${s.sample.reference}`}
        description={
          <>
            {s.project.reference} · {s.project.name} · sample at {depthRange(s.sample.topDepthM, s.sample.bottomDepthM)} · version {s.version.version}, approved {formatDate(s.version.approvedAt)} by{' '}
            {s.version.approvedByName}
          </>
        }
      />
      <div className="space-y-6">
        {isCurrent ? null : (
          <Alert tone="warning" title={`Version ${s.version.version} has been superseded`}>
            The laboratory approved version {s.version.supersededByVersion ?? s.currentVersion} later. This page shows version {s.version.version} exactly as it was approved.{' '}
            <Link to={paths.org.issuedTest.to(orgId, s.recordId, s.currentVersion)} className="font-medium underline">
              Open the current version
            </Link>
            .
          </Alert>
        )}
        <EngineeringCaution />
        <Panel title="Report and data" description="The laboratory’s issued test report of this version — the same file on every download — and its reduced data.">
          <VersionDownloads orgId={orgId} recordId={s.recordId} version={s.version.version} canRetry={labPermissions(membership.roles).retryReports} />
        </Panel>
        <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-2">
          <Panel title="Sample and specimen" description={s.sample.description || undefined}>
            <SpecimenTable specimen={s.specimen} />
          </Panel>
          <Panel title="Sample quality">
            <p className="text-sm font-semibold text-slate-900">{quality.headline}</p>
            <p className="mt-1 text-sm text-slate-700">{quality.meaning}</p>
            <p className="mt-2 text-xs text-slate-500">Method: Lunne, Berre &amp; Strandvik (1997), from the void ratio change on reloading to the in-situ stress.</p>
          </Panel>
        </div>
        <Panel title="Parameters" description={overridden ? `The laboratory overrode an automatic choice (marked “picked”): “${s.overrideReason ?? 'no reason recorded'}”` : 'All values as found by the methods named; none was overridden.'} flush>
          <ParametersTable result={result} />
        </Panel>
        <Panel title="Notes from the analysis">
          <WarningsList warnings={result.warnings} />
        </Panel>
        <Panel title="Curves">
          <IssuedCurves result={result} />
        </Panel>
        <Panel title="Approval and traceability">
          <IssuedProvenance version={s.version} testReference={s.test.reference} />
        </Panel>
      </div>
    </>
  );
}
