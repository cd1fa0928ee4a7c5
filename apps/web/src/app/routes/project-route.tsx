import { Link, useParams } from 'react-router-dom';
import { DisclosureForm } from '../../components/disclosure-form';
import { EngineeringCaution } from '../../components/engineering-caution';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { apiPaths, paths } from '../../config/paths';
import { useBoreholes } from '../../features/projects/api/get-boreholes';
import { useProject } from '../../features/projects/api/get-project';
import { useProjectTests } from '../../features/projects/api/get-project-tests';
import { BoreholesSection } from '../../features/projects/components/boreholes-section';
import { ProjectClientsPanel } from '../../features/projects/components/project-clients-panel';
import { ProjectEditForm } from '../../features/projects/components/project-edit-form';
import { DesignOverview } from '../../features/design/components/design-overview';
import { designPermissions } from '../design-permissions';
import { useProjectResults } from '../../features/results/api/get-project-results';
import { BoreholesAndSamples } from '../../features/results/components/boreholes-and-samples';
import { IssuedChecksList } from '../../features/results/components/issued-checks-list';
import { ResultsTable } from '../../features/results/components/results-table';
import { PARAMETER_MEANINGS, resultsInWords } from '../../features/results/components/results-in-words';
import { DownloadLink } from '../../features/reports/components/download-link';
import { labPermissions } from '../lab-permissions';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { Padded } from './padded';

export function ProjectRoute() {
  return (
    <RoleGate roles={rolesFor('projects')} purpose="the laboratory's projects">
      <ProjectPage />
    </RoleGate>
  );
}

/** Clients read the project's issued results; the lab and designers work on it (a member holding a lab or designer role beside client gets theirs). */
function ProjectPage() {
  const { membership } = useCurrentOrg();
  const onlyClient = membership.roles.every((role) => role === 'client');
  return onlyClient ? <ClientProjectPage /> : <LabProjectPage />;
}

function BackToProjects({ orgId }: { orgId: string }) {
  return (
    <p className="mb-2 text-sm">
      <Link to={paths.org.projects.to(orgId)} className="text-accent-700 hover:underline">← Projects</Link>
    </p>
  );
}

/** The approved tests with their parameters, as everyone who reads the project sees them. */
function ApprovedResultsPanel({ orgId, projectId, description }: { orgId: string; projectId: string; description: string }) {
  const results = useProjectResults(orgId, projectId);
  return (
    <Panel title="Approved test results" description={description} flush>
      {results.isPending ? (
        <Padded><LoadingBlock label="Loading the results…" /></Padded>
      ) : results.error ? (
        <Padded><ErrorMessage error={results.error} title="The results could not be loaded" onRetry={() => void results.refetch()} /></Padded>
      ) : results.data.results.length === 0 ? (
        <Padded><p className="text-sm text-slate-600">No test of this project has been approved yet.</p></Padded>
      ) : (
        <ResultsTable orgId={orgId} results={results.data.results} />
      )}
    </Panel>
  );
}

/** A client's read-only summary: what was tested, what it means, the approved results, the boreholes. */
function ClientProjectPage() {
  const { orgId } = useCurrentOrg();
  const { projectId = '' } = useParams();
  const results = useProjectResults(orgId, projectId);
  if (results.isPending) return <LoadingBlock label="Loading the project…" />;
  if (results.error) return <ErrorMessage error={results.error} title="The project could not be loaded" onRetry={() => void results.refetch()} />;
  const { project, boreholes } = results.data;
  return (
    <>
      <BackToProjects orgId={orgId} />
      <PageHeader
        title={project.name}
        description={<>{project.reference} · for {project.clientName}{project.siteName ? ` · ${project.siteName}` : ''}</>}
        actions={<DownloadLink href={apiPaths.projectParametersXlsx(orgId, project.id)}>Approved parameters (XLSX)</DownloadLink>}
      />
      <div className="space-y-6">
        <Panel title="In short">
          <div className="space-y-2 text-sm text-slate-800">
            {resultsInWords(results.data).map((sentence) => (
              <p key={sentence}>{sentence}</p>
            ))}
          </div>
          <details className="mt-4 rounded-md border border-slate-200 px-4 py-2 text-sm">
            <summary className="cursor-pointer font-medium text-slate-900">What the parameters mean</summary>
            <dl className="mt-2 grid gap-x-4 gap-y-2 sm:grid-cols-[8rem_minmax(0,1fr)]">
              {PARAMETER_MEANINGS.map((p) => (
                <div key={p.symbol} className="contents">
                  <dt className="font-medium text-slate-900">{p.symbol}</dt>
                  <dd className="text-slate-700">{p.meaning}</dd>
                </div>
              ))}
            </dl>
          </details>
        </Panel>
        <EngineeringCaution />
        <ApprovedResultsPanel orgId={orgId} projectId={projectId} description="Each test’s current approved version. Open a test for its summary, curves and report." />
        <Panel title="Issued settlement checks" description="Settlement checks of footings the project’s designers have issued, each as a PDF summary.">
          <IssuedChecksList orgId={orgId} projectId={projectId} />
        </Panel>
        <Panel title="Boreholes and samples">
          <BoreholesAndSamples boreholes={boreholes} />
        </Panel>
      </div>
    </>
  );
}

function LabProjectPage() {
  const { orgId, membership } = useCurrentOrg();
  const { projectId = '' } = useParams();
  const project = useProject(orgId, projectId);
  const boreholes = useBoreholes(orgId, projectId);
  const tests = useProjectTests(orgId, projectId);
  const may = labPermissions(membership.roles);

  if (project.isPending) return <LoadingBlock label="Loading the project…" />;
  if (project.error) return <ErrorMessage error={project.error} title="The project could not be loaded" onRetry={() => void project.refetch()} />;
  const p = project.data;
  return (
    <>
      <BackToProjects orgId={orgId} />
      <PageHeader
        title={p.name}
        description={
          <>
            {p.reference} · for {p.clientName}
            {p.siteName ? ` · ${p.siteName}` : ''}
            {p.designers.length > 0 ? ` · designers: ${p.designers.map((d) => d.name).join(', ')}` : ''}
          </>
        }
        actions={<DownloadLink href={apiPaths.projectParametersXlsx(orgId, projectId)}>Approved parameters (XLSX)</DownloadLink>}
      />
      {may.editProjects ? (
        <div className="mb-6">
          <DisclosureForm openLabel="Edit project and designers">
            {(close) => <ProjectEditForm orgId={orgId} project={p} onDone={close} />}
          </DisclosureForm>
        </div>
      ) : null}
      <div className="space-y-6">
        {designPermissions(membership.roles).read ? (
          <Panel title="Design" description="Ground models built from the approved soil records, characteristic sets of each stratum, and settlement checks of footings.">
            <DesignOverview orgId={orgId} projectId={projectId} canEdit={designPermissions(membership.roles).edit} />
          </Panel>
        ) : null}
        <Panel
          title="Boreholes, samples and tests"
          description={may.benchWork ? 'Open a test to upload its readings, check the curves and send it for review.' : 'The approved tests of this project; each opens with its curves.'}
        >
          {boreholes.isPending || tests.isPending ? (
            <LoadingBlock label="Loading boreholes…" />
          ) : boreholes.error ? (
            <ErrorMessage error={boreholes.error} title="The boreholes could not be loaded" onRetry={() => void boreholes.refetch()} />
          ) : tests.error ? (
            <ErrorMessage error={tests.error} title="The tests could not be loaded" onRetry={() => void tests.refetch()} />
          ) : (
            <BoreholesSection orgId={orgId} projectId={projectId} boreholes={boreholes.data} tests={tests.data} canEdit={may.benchWork} />
          )}
        </Panel>
        <ApprovedResultsPanel orgId={orgId} projectId={projectId} description="Each test’s current approved version, as the project’s clients and designers read it." />
        {may.editProjects ? (
          <Panel title="Shared with clients" description="Clients read this project’s approved results and issued reports only: never drafts, tests under review or the lab’s comments.">
            <ProjectClientsPanel orgId={orgId} projectId={projectId} projectName={p.name} />
          </Panel>
        ) : null}
      </div>
    </>
  );
}
