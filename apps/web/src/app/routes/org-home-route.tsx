import { roleList, type HomeOverview } from '@porestack/types';
import { EmptyState } from '../../components/empty-state';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { useHome } from '../../features/home/api/get-home';
import { AdminMembersPanel } from '../../features/home/components/admin-home';
import { MoreLink } from '../../features/home/components/home-list';
import { LabManagerHome } from '../../features/home/components/lab-manager-home';
import { IssuedResultsPanel, ProjectsPanel } from '../../features/home/components/project-home-lists';
import { TechnicianHome } from '../../features/home/components/technician-home';
import { AuditLogTable } from '../../features/organisations/components/audit-log-table';
import { useCurrentOrg } from '../org-context';
import { ROLE_SUMMARIES } from '../role-guides';

/** One section per role the member holds, in the order the work flows. */
function Sections({ orgId, home }: { orgId: string; home: HomeOverview }) {
  return (
    <div className="space-y-8">
      {home.technician ? <TechnicianHome orgId={orgId} section={home.technician} /> : null}
      {home.labManager ? <LabManagerHome orgId={orgId} section={home.labManager} /> : null}
      {home.designer ? (
        <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-2">
          <ProjectsPanel
            orgId={orgId}
            title="Your projects"
            projects={home.designer.projects}
            countWord="tests"
            empty="You are not on any project yet. A lab manager adds designers to a project’s designers list."
          />
          <Panel title="Checks to look at again" description="Settlement checks whose soil parameters have a newer approved version.">
            <p className="text-sm text-slate-600" data-testid="flagged-checks-slot">
              Each of your settlement checks that used a soil record version since superseded will be listed here with what changed, so you can re-run it.
            </p>
          </Panel>
        </div>
      ) : null}
      {home.client ? (
        <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <IssuedResultsPanel orgId={orgId} results={home.client.recentResults} />
          <ProjectsPanel
            orgId={orgId}
            title="Projects shared with you"
            projects={home.client.projects}
            countWord="approved tests"
            empty="No project is shared with you yet. The laboratory shares each project by e-mail."
          />
        </div>
      ) : null}
      {home.admin ? (
        <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
          <AdminMembersPanel orgId={orgId} section={home.admin} />
          <Panel title="Recent activity" flush>
            {home.admin.recentActivity.length === 0 ? (
              <div className="p-5">
                <EmptyState title="Nothing recorded yet" />
              </div>
            ) : (
              <AuditLogTable entries={home.admin.recentActivity} caption="The latest activity in this organisation" />
            )}
            <div className="px-5 pb-4">
              <MoreLink to={paths.org.activity.to(orgId)}>All activity</MoreLink>
            </div>
          </Panel>
        </div>
      ) : null}
    </div>
  );
}

export function OrgHomeRoute() {
  const { orgId, membership } = useCurrentOrg();
  const home = useHome(orgId);
  return (
    <>
      <PageHeader
        title={membership.organisationName}
        description={
          <>
            You are <strong className="font-medium text-slate-800">{roleList(membership.roles).toLowerCase()}</strong> here.{' '}
            {membership.roles.map((role) => ROLE_SUMMARIES[role]).join(' ')}
          </>
        }
      />
      {home.isPending ? (
        <LoadingBlock label="Loading your home page…" />
      ) : home.error ? (
        <ErrorMessage error={home.error} title="Your home page could not be loaded" onRetry={() => void home.refetch()} />
      ) : (
        <Sections orgId={orgId} home={home.data} />
      )}
    </>
  );
}
