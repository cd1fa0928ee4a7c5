import { EmptyState } from '../../components/empty-state';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { LoadingBlock } from '../../components/spinner';
import { useAudit } from '../../features/organisations/api/get-audit';
import { AuditLogTable } from '../../features/organisations/components/audit-log-table';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';

export function ActivityRoute() {
  return (
    <RoleGate roles={rolesFor('activity')} purpose="reading the activity log">
      <ActivityPage />
    </RoleGate>
  );
}

function ActivityPage() {
  const { orgId } = useCurrentOrg();
  const audit = useAudit(orgId);
  return (
    <>
      <PageHeader
        title="Activity"
        description="Who changed what in this organisation, and when. The log is kept as written; nobody can edit it."
      />
      {audit.isPending ? (
        <LoadingBlock label="Loading activity…" />
      ) : audit.error ? (
        <ErrorMessage error={audit.error} title="The activity could not be loaded" onRetry={() => void audit.refetch()} />
      ) : audit.data.length === 0 ? (
        <EmptyState title="Nothing recorded yet">Invitations, role changes and removals appear here as they happen.</EmptyState>
      ) : (
        <AuditLogTable entries={audit.data} />
      )}
    </>
  );
}
