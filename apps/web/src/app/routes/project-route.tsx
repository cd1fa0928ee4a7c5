import { Link, useParams } from 'react-router-dom';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { useBoreholes } from '../../features/projects/api/get-boreholes';
import { useProject } from '../../features/projects/api/get-project';
import { useProjectTests } from '../../features/projects/api/get-project-tests';
import { BoreholesSection } from '../../features/projects/components/boreholes-section';
import { ProjectEditForm } from '../../features/projects/components/project-edit-form';
import { DisclosureForm } from '../../components/disclosure-form';
import { DesignOverview } from '../../features/design/components/design-overview';
import { designPermissions } from '../design-permissions';
import { labPermissions } from '../lab-permissions';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';

export function ProjectRoute() {
  return (
    <RoleGate roles={rolesFor('projects')} purpose="the laboratory's projects">
      <ProjectPage />
    </RoleGate>
  );
}

function ProjectPage() {
  const { orgId, membership } = useCurrentOrg();
  const { projectId = '' } = useParams();
  const project = useProject(orgId, projectId);
  const boreholes = useBoreholes(orgId, projectId);
  const tests = useProjectTests(orgId, projectId);

  if (project.isPending) return <LoadingBlock label="Loading the project…" />;
  if (project.error) return <ErrorMessage error={project.error} title="The project could not be loaded" onRetry={() => void project.refetch()} />;
  const p = project.data;
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.org.projects.to(orgId)} className="text-accent-700 hover:underline">← Projects</Link>
      </p>
      <PageHeader
        title={p.name}
        description={
          <>
            {p.reference} · for {p.clientName}
            {p.siteName ? ` · ${p.siteName}` : ''}
            {p.designers.length > 0 ? ` · designers: ${p.designers.map((d) => d.name).join(', ')}` : ''}
          </>
        }
      />
      {labPermissions(membership.roles).editProjects ? (
        <div className="mb-6">
          <DisclosureForm openLabel="Edit project and designers">
            {(close) => <ProjectEditForm orgId={orgId} project={p} onDone={close} />}
          </DisclosureForm>
        </div>
      ) : null}
      {designPermissions(membership.roles).read ? (
        <div className="mb-6">
          <Panel title="Design" description="Ground models built from the approved soil records, characteristic sets of each stratum, and settlement checks of footings.">
            <DesignOverview orgId={orgId} projectId={projectId} canEdit={designPermissions(membership.roles).edit} />
          </Panel>
        </div>
      ) : null}
      <Panel title="Boreholes, samples and tests" description="Open a test to upload its readings, check the curves and send it for review.">
        {boreholes.isPending || tests.isPending ? (
          <LoadingBlock label="Loading boreholes…" />
        ) : boreholes.error ? (
          <ErrorMessage error={boreholes.error} title="The boreholes could not be loaded" onRetry={() => void boreholes.refetch()} />
        ) : tests.error ? (
          <ErrorMessage error={tests.error} title="The tests could not be loaded" onRetry={() => void tests.refetch()} />
        ) : (
          <BoreholesSection orgId={orgId} projectId={projectId} boreholes={boreholes.data} tests={tests.data} canEdit={labPermissions(membership.roles).benchWork} />
        )}
      </Panel>
    </>
  );
}
