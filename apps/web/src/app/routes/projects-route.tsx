import { useNavigate } from 'react-router-dom';
import { DisclosureForm } from '../../components/disclosure-form';
import { EmptyState } from '../../components/empty-state';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { useProjects } from '../../features/projects/api/get-projects';
import { ProjectCreateForm } from '../../features/projects/components/project-create-form';
import { ProjectsTable } from '../../features/projects/components/projects-table';
import { labPermissions } from '../lab-permissions';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { Padded } from './padded';

export function ProjectsRoute() {
  return (
    <RoleGate roles={rolesFor('projects')} purpose="the laboratory's projects">
      <ProjectsPage />
    </RoleGate>
  );
}

function ProjectsPage() {
  const { orgId, membership } = useCurrentOrg();
  const projects = useProjects(orgId);
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Projects" description="Each project is a job for a client: its boreholes, the samples taken from them and the tests run on those samples." />
      <div className="flex flex-col gap-6">
        {labPermissions(membership.roles).editProjects ? (
          <DisclosureForm openLabel="New project" size="md">
            {(close) => <ProjectCreateForm orgId={orgId} onCancel={close} onCreated={(project) => navigate(paths.org.project.to(orgId, project.id))} />}
          </DisclosureForm>
        ) : null}
        <Panel title="All projects" flush>
          {projects.isPending ? (
            <Padded><LoadingBlock label="Loading projects…" /></Padded>
          ) : projects.error ? (
            <Padded><ErrorMessage error={projects.error} title="The projects could not be loaded" onRetry={() => void projects.refetch()} /></Padded>
          ) : projects.data.length === 0 ? (
            <Padded><EmptyState title="No projects yet">A lab manager creates each project; then its boreholes and samples are set up here.</EmptyState></Padded>
          ) : (
            <ProjectsTable orgId={orgId} projects={projects.data} />
          )}
        </Panel>
      </div>
    </>
  );
}
