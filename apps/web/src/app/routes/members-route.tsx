import type { ReactNode } from 'react';
import { EmptyState } from '../../components/empty-state';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { useInvitations } from '../../features/organisations/api/get-invitations';
import { useMembers } from '../../features/organisations/api/get-members';
import { InvitationsTable } from '../../features/organisations/components/invitations-table';
import { InviteForm } from '../../features/organisations/components/invite-form';
import { MembersTable } from '../../features/organisations/components/members-table';
import { useReportSettings } from '../../features/organisations/api/report-settings';
import { ReportSettingsForm } from '../../features/organisations/components/report-settings-form';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';

export function MembersRoute() {
  return (
    <RoleGate roles={rolesFor('members')} purpose="managing members">
      <MembersPage />
    </RoleGate>
  );
}

function MembersPage() {
  const { orgId, user, membership } = useCurrentOrg();
  const members = useMembers(orgId);
  const invitations = useInvitations(orgId);

  return (
    <>
      <PageHeader
        title="Members"
        description={`Everyone who works in ${membership.organisationName}, and the roles that decide what each can do.`}
      />
      <div className="flex flex-col gap-6">
        <Panel title="Invite a colleague" description="They get an e-mail with a link to join. The link expires after a few days.">
          <InviteForm orgId={orgId} />
        </Panel>
        <Panel title="Pending invitations" flush>
          {invitations.isPending ? (
            <Padded>
              <LoadingBlock label="Loading invitations…" />
            </Padded>
          ) : invitations.error ? (
            <Padded>
              <ErrorMessage error={invitations.error} title="The invitations could not be loaded" onRetry={() => void invitations.refetch()} />
            </Padded>
          ) : invitations.data.length === 0 ? (
            <Padded>
              <EmptyState title="No invitations waiting">Invitations you send appear here until they are accepted.</EmptyState>
            </Padded>
          ) : (
            <InvitationsTable orgId={orgId} invitations={invitations.data} />
          )}
        </Panel>
        <Panel title="Members" flush>
          {members.isPending ? (
            <Padded>
              <LoadingBlock label="Loading members…" />
            </Padded>
          ) : members.error ? (
            <Padded>
              <ErrorMessage error={members.error} title="The members could not be loaded" onRetry={() => void members.refetch()} />
            </Padded>
          ) : (
            <MembersTable orgId={orgId} members={members.data} currentUserId={user.id} />
          )}
        </Panel>
        <ReportSettingsPanel orgId={orgId} />
      </div>
    </>
  );
}

/** States shown inside a flush panel still need the panel's padding. */
function Padded({ children }: { children: ReactNode }) {
  return <div className="p-5">{children}</div>;
}

function ReportSettingsPanel({ orgId }: { orgId: string }) {
  const settings = useReportSettings(orgId);
  return (
    <Panel title="What reports print" description="How the laboratory appears on the test reports it issues.">
      {settings.isPending ? (
        <LoadingBlock label="Loading the report settings…" />
      ) : settings.error ? (
        <ErrorMessage error={settings.error} title="The report settings could not be loaded" onRetry={() => void settings.refetch()} />
      ) : (
        <ReportSettingsForm orgId={orgId} settings={settings.data} />
      )}
    </Panel>
  );
}
