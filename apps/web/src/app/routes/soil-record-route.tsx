import { Link, useParams, useSearchParams } from 'react-router-dom';
import { EngineeringCaution } from '../../components/engineering-caution';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { formatDate } from '../../lib/format';
import { useSoilRecord } from '../../features/soil-records/api/get-soil-record';
import { VersionView } from '../../features/soil-records/components/version-view';
import { VersionDownloads } from '../../features/reports/components/version-downloads';
import { labPermissions } from '../lab-permissions';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';

export function SoilRecordRoute() {
  return (
    <RoleGate roles={rolesFor('soil-records')} purpose="reading approved soil records">
      <SoilRecordPage />
    </RoleGate>
  );
}

function SoilRecordPage() {
  const { orgId, membership } = useCurrentOrg();
  const { recordId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const record = useSoilRecord(orgId, recordId);
  if (record.isPending) return <LoadingBlock label="Loading the record…" />;
  if (record.error) return <ErrorMessage error={record.error} title="The record could not be loaded" onRetry={() => void record.refetch()} />;
  const r = record.data;
  const wanted = Number(search.get('version') ?? r.currentVersion);
  const versions = [...r.versions].sort((a, b) => b.version - a.version);
  const shown = versions.find((v) => v.version === wanted) ?? versions[0];
  return (
    <>
      <p className="mb-2 text-sm"><Link to={paths.org.soilRecords.to(orgId)} className="text-accent-700 hover:underline">← Soil records</Link></p>
      <PageHeader
        title={`${r.boreholeName} / ${r.sampleReference} at ${r.topDepthM.toFixed(2)} m`}
        description={`${r.projectName} · from test ${r.testReference} · current version v${r.currentVersion}`}
      />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[14rem_minmax(0,1fr)]">
        <nav aria-label="Versions" className="rounded-lg border border-slate-200 bg-white">
          <h2 className="border-b border-slate-200 px-4 py-2 text-sm font-semibold text-slate-900">Versions</h2>
          <ul>
            {versions.map((v) => (
              <li key={v.id}>
                <button
                  type="button"
                  onClick={() => setSearch({ version: String(v.version) }, { replace: true })}
                  aria-current={shown?.version === v.version ? 'true' : undefined}
                  className={`flex w-full items-baseline justify-between px-4 py-2 text-left text-sm ${shown?.version === v.version ? 'bg-accent-50 font-medium text-accent-800' : 'text-slate-700 hover:bg-slate-50'}`}
                >
                  <span>v{v.version} {v.supersededAt ? <span className="text-xs font-normal text-slate-500">superseded</span> : <span className="text-xs font-normal text-accent-700">current</span>}</span>
                  <span className="text-xs text-slate-500">{formatDate(v.approvedAt)}</span>
                </button>
              </li>
            ))}
          </ul>
        </nav>
        <div className="space-y-4">
          <EngineeringCaution />
          {shown ? (
            <Panel title={`Version ${shown.version}`}>
              <VersionView orgId={orgId} version={shown} isCurrent={shown.supersededAt === null} labTestLink={labPermissions(membership.roles).readsLabWork} />
            </Panel>
          ) : null}
          {shown ? (
            <Panel title="Report and data" description="The issued test report of this version, the same file on every download, and its reduced data.">
              <VersionDownloads key={shown.version} orgId={orgId} recordId={r.id} version={shown.version} canRetry={labPermissions(membership.roles).retryReports} />
            </Panel>
          ) : null}
        </div>
      </div>
    </>
  );
}
