import { EmptyState } from '../../components/empty-state';
import { EngineeringCaution } from '../../components/engineering-caution';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { useSoilRecords } from '../../features/soil-records/api/get-soil-records';
import { SoilRecordsTable } from '../../features/soil-records/components/soil-records-table';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { Padded } from './padded';

export function SoilRecordsRoute() {
  return (
    <RoleGate roles={rolesFor('soil-records')} purpose="reading approved soil records">
      <SoilRecordsPage />
    </RoleGate>
  );
}

function SoilRecordsPage() {
  const { orgId } = useCurrentOrg();
  const records = useSoilRecords(orgId);
  return (
    <>
      <PageHeader title="Soil records" description="Approved consolidation parameters, one record per sample. Each approval adds a version; earlier versions stay readable." />
      <div className="flex flex-col gap-4">
        <EngineeringCaution />
        <Panel title="Records" flush>
          {records.isPending ? (
            <Padded><LoadingBlock label="Loading soil records…" /></Padded>
          ) : records.error ? (
            <Padded><ErrorMessage error={records.error} title="The soil records could not be loaded" onRetry={() => void records.refetch()} /></Padded>
          ) : records.data.length === 0 ? (
            <Padded><EmptyState title="No approved records yet">A record appears when a lab manager approves a test.</EmptyState></Padded>
          ) : (
            <SoilRecordsTable orgId={orgId} records={records.data} />
          )}
        </Panel>
      </div>
    </>
  );
}
