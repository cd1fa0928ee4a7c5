import { isFrozenTestStatus, type ReviewOutcome, type TestDetail } from '@porestack/types';
import { useState, type ReactNode } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { Alert } from '../../components/alert';
import { Button } from '../../components/button';
import { ErrorMessage } from '../../components/error-message';
import { JobProgress } from '../../components/job-progress';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { TestStatusBadge } from '../../components/test-status-badge';
import { apiPaths, paths } from '../../config/paths';
import { useJob } from '../../lib/jobs';
import { useAnalysis } from '../../features/analysis/api/get-analysis';
import { useRerunAnalysis } from '../../features/analysis/api/rerun-analysis';
import { CurvesWorkspace } from '../../features/analysis/components/curves-workspace';
import { ResultsView } from '../../features/analysis/components/results-view';
import { ReviewDecision } from '../../features/review/components/review-decision';
import { useReviews } from '../../features/tests/api/get-reviews';
import { useTest } from '../../features/tests/api/get-test';
import { useSubmitTest } from '../../features/tests/api/submit-test';
import { ReviewHistory } from '../../features/tests/components/review-history';
import { SpecimenForm } from '../../features/tests/components/specimen-form';
import { SpecimenSummary } from '../../features/tests/components/specimen-summary';
import { ReadingsTable } from '../../features/uploads/components/readings-table';
import { UploadPanel } from '../../features/uploads/components/upload-panel';
import { DownloadLink } from '../../features/reports/components/download-link';
import { labPermissions, TEST_PAGE_ROLES } from '../lab-permissions';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';

/** The parts of the test page, in the order the work goes. */
const SECTIONS = [
  { id: 'setup', label: 'Set-up' },
  { id: 'readings', label: 'Readings' },
  { id: 'results', label: 'Results' },
  { id: 'curves', label: 'Curves' },
  { id: 'review', label: 'Review' },
] as const;
type SectionId = (typeof SECTIONS)[number]['id'];

export function TestRoute() {
  return (
    <RoleGate roles={TEST_PAGE_ROLES} purpose="working on laboratory tests">
      <TestPage />
    </RoleGate>
  );
}

function TestPage() {
  const { orgId, membership, user } = useCurrentOrg();
  const { testId = '' } = useParams();
  const [search] = useSearchParams();
  const test = useTest(orgId, testId);
  const section: SectionId = SECTIONS.find((s) => s.id === search.get('section'))?.id ?? 'setup';

  if (test.isPending) return <LoadingBlock label="Loading the test…" />;
  if (test.error) return <ErrorMessage error={test.error} title="The test could not be loaded" onRetry={() => void test.refetch()} />;
  const t = test.data;
  const may = labPermissions(membership.roles);
  const editable = may.benchWork && !isFrozenTestStatus(t.status);

  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.org.project.to(orgId, t.projectId)} className="text-accent-700 hover:underline">← {t.projectName}</Link>
      </p>
      <PageHeader
        title={`Test ${t.reference}`}
        description={<>{t.boreholeName} / {t.sampleReference} at {t.topDepthM.toFixed(2)} m · <TestStatusBadge status={t.status} /></>}
        actions={t.latestAnalysis ? <DownloadLink href={apiPaths.testDataXlsx(orgId, t.id)}>Reduced data (XLSX)</DownloadLink> : null}
      />
      {t.status === 'changes_requested' && t.changesRequestedComment ? (
        <Alert tone="warning" title="The lab manager asked for changes" className="mb-4">
          <p className="whitespace-pre-line">{t.changesRequestedComment}</p>
        </Alert>
      ) : null}
      <nav aria-label="Parts of the test" className="mb-5 flex gap-1 overflow-x-auto border-b border-slate-200">
        {SECTIONS.map((s) => (
          <Link
            key={s.id}
            to={{ search: `?section=${s.id}` }}
            aria-current={section === s.id ? 'page' : undefined}
            className={`-mb-px whitespace-nowrap border-b-2 px-3 py-2 text-sm font-medium ${section === s.id ? 'border-accent-600 text-accent-700' : 'border-transparent text-slate-600 hover:text-slate-900'}`}
          >
            {s.label}
          </Link>
        ))}
      </nav>
      {section === 'setup' ? <SetupSection orgId={orgId} test={t} editable={editable} /> : null}
      {section === 'readings' ? <ReadingsSection orgId={orgId} test={t} canImport={may.importReadings && !isFrozenTestStatus(t.status)} /> : null}
      {section === 'results' ? <AnalysisSection orgId={orgId} test={t} view="results" canPick={false} canRerun={editable && t.status !== 'draft'} /> : null}
      {section === 'curves' ? <AnalysisSection orgId={orgId} test={t} view="curves" canPick={editable && t.status !== 'draft'} canRerun={editable && t.status !== 'draft'} /> : null}
      {section === 'review' ? <ReviewSection orgId={orgId} test={t} canSubmit={editable} isManager={may.review} userId={user.id} /> : null}
    </>
  );
}

function SetupSection({ orgId, test, editable }: { orgId: string; test: TestDetail; editable: boolean }) {
  return (
    <div className="space-y-6">
      <Panel title="Summary"><SpecimenSummary test={test} /></Panel>
      <Panel title="Specimen, apparatus and compliance"><SpecimenForm key={test.id} orgId={orgId} test={test} readOnly={!editable} /></Panel>
    </div>
  );
}

function ReadingsSection({ orgId, test, canImport }: { orgId: string; test: TestDetail; canImport: boolean }) {
  return (
    <div className="space-y-6">
      <Panel title="Readings file" description="The canonical layout imports at once; any other layout asks which column holds what.">
        <UploadPanel orgId={orgId} testId={test.id} canUpload={canImport} />
      </Panel>
      <Panel title="All readings" flush>
        <ReadingsTable key={test.latestUploadId ?? 'none'} orgId={orgId} testId={test.id} />
      </Panel>
    </div>
  );
}

function AnalysisSection({ orgId, test, view, canPick, canRerun }: { orgId: string; test: TestDetail; view: 'results' | 'curves'; canPick: boolean; canRerun: boolean }) {
  const analysis = useAnalysis(orgId, test.id);
  const rerun = useRerunAnalysis(orgId, test.id);
  const pendingJob = useJob(orgId, test.pendingJobId);
  let body: ReactNode;
  if (analysis.isPending) body = <LoadingBlock label="Loading the analysis…" />;
  else if (analysis.error) body = <ErrorMessage error={analysis.error} title="The analysis could not be loaded" onRetry={() => void analysis.refetch()} />;
  else if (!analysis.data) {
    body = test.status === 'draft' ? (
      <p className="text-sm text-slate-600">Upload the readings first; the analysis runs by itself once they are imported.</p>
    ) : (
      <p className="text-sm text-slate-600">No analysis yet. It starts by itself after an import; you can also start it below.</p>
    );
  } else if (view === 'results') body = <ResultsView key={analysis.data.id} analysis={analysis.data} />;
  else body = <CurvesWorkspace key={analysis.data.id} orgId={orgId} testId={test.id} analysis={analysis.data} canPick={canPick} pendingJobId={test.pendingJobId} />;

  return (
    <Panel title={view === 'results' ? 'Parameters' : 'Curves and picks'}>
      <div className="space-y-4">
        {pendingJob.data && view === 'results' ? <JobProgress job={pendingJob.data} what="Analysis" /> : null}
        {test.pendingJobId === null && test.latestAnalysisJob?.state === 'failed' ? (
          <Alert tone="error" title="The last analysis failed">
            {test.latestAnalysisJob.message ?? 'It stopped without saying why.'}
            {analysis.data ? ' The parameters below are from the analysis before it.' : ''}
          </Alert>
        ) : null}
        {body}
        {canRerun ? (
          <div className="flex items-center gap-3 border-t border-slate-100 pt-4">
            <Button variant="secondary" size="sm" pending={rerun.isPending} disabled={test.pendingJobId !== null} onClick={() => rerun.mutate()}>
              Run the analysis again
            </Button>
            {rerun.error ? <ErrorMessage error={rerun.error} title="The analysis did not start" /> : null}
          </div>
        ) : null}
      </div>
    </Panel>
  );
}

function ReviewSection({ orgId, test, canSubmit, isManager, userId }: { orgId: string; test: TestDetail; canSubmit: boolean; isManager: boolean; userId: string }) {
  const reviews = useReviews(orgId, test.id);
  const submit = useSubmitTest(orgId, test.id);
  const ready = test.status === 'analysed' || (test.status === 'changes_requested' && test.latestAnalysis !== null);
  // The decision panel goes away once the status moves on, so its confirmation is kept here.
  const [decided, setDecided] = useState<ReviewOutcome | null>(null);
  return (
    <div className="space-y-6">
      {decided === 'approved' ? (
        <Alert tone="success">
          {test.reference} approved. A new soil record version has been written;{' '}
          <Link to={paths.org.soilRecords.to(orgId)} className="font-medium underline">see the soil records</Link>.
        </Alert>
      ) : null}
      {decided === 'changes_requested' ? <Alert tone="success">{test.reference} sent back to the technician with your comment.</Alert> : null}
      {canSubmit ? (
        <Panel title="Send for review" description="A lab manager checks the curves and parameters, then approves them or sends the test back with a comment.">
          {ready ? (
            <div className="space-y-3">
              <Button onClick={() => submit.mutate()} pending={submit.isPending}>Submit {test.reference} for review</Button>
              {submit.error ? <ErrorMessage error={submit.error} title="The test was not submitted" /> : null}
            </div>
          ) : (
            <p className="text-sm text-slate-600">The test can be submitted once its readings are analysed.</p>
          )}
        </Panel>
      ) : null}
      {test.status === 'submitted' && isManager ? (
        <Panel title="Your decision">
          <ReviewDecision orgId={orgId} testId={test.id} testReference={test.reference} isOwnTest={test.technicianId === userId} onDecided={setDecided} />
        </Panel>
      ) : null}
      {test.status === 'submitted' && !isManager ? <Alert tone="info">Submitted. A lab manager will review it; you will get an e-mail with the decision.</Alert> : null}
      <Panel title="History">
        {reviews.isPending ? <LoadingBlock label="Loading the history…" /> : reviews.error ? <ErrorMessage error={reviews.error} onRetry={() => void reviews.refetch()} /> : <ReviewHistory events={reviews.data} />}
      </Panel>
    </div>
  );
}
