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

/** What the list holds for each kind of reader: the lab's whole book, or the projects someone is on. */
const WORDING = {
  lab: {
    description: 'Each project is a job for a client: its boreholes, the samples taken from them and the tests run on those samples.',
    title: 'All projects',
    empty: 'A lab manager creates each project; then its boreholes and samples are set up here.',
  },
  designer: {
    description: 'The projects you are a designer on: their boreholes, samples and approved tests.',
    title: 'Your projects',
    empty: 'The laboratory puts designers on a project’s designers list; the projects you are on appear here.',
  },
  client: {
    description: 'The projects the laboratory has shared with you: their approved test results and reports.',
    title: 'Projects shared with you',
    empty: 'When the laboratory shares a project with you, it appears here and you get an e-mail.',
  },
} as const;

function ProjectsPage() {
  const { orgId, membership } = useCurrentOrg();
  const projects = useProjects(orgId);
  const navigate = useNavigate();
  const may = labPermissions(membership.roles);
  const words = WORDING[may.readsLabWork ? 'lab' : membership.roles.includes('designer') ? 'designer' : 'client'];
  return (
    <>
      <PageHeader title="Projects" description={words.description} />
      <div className="flex flex-col gap-6">
        {labPermissions(membership.roles).editProjects ? (
          <DisclosureForm openLabel="New project" size="md">
            {(close) => <ProjectCreateForm orgId={orgId} onCancel={close} onCreated={(project) => navigate(paths.org.project.to(orgId, project.id))} />}
          </DisclosureForm>
        ) : null}
        <Panel title={words.title} flush>
          {projects.isPending ? (
            <Padded><LoadingBlock label="Loading projects…" /></Padded>
          ) : projects.error ? (
            <Padded><ErrorMessage error={projects.error} title="The projects could not be loaded" onRetry={() => void projects.refetch()} /></Padded>
          ) : projects.data.length === 0 ? (
            <Padded><EmptyState title="No projects yet">{words.empty}</EmptyState></Padded>
          ) : (
            <ProjectsTable orgId={orgId} projects={projects.data} {...(words === WORDING.client ? { testsHeader: 'Approved tests' } : {})} />
          )}
        </Panel>
      </div>
    </>
  );
}
