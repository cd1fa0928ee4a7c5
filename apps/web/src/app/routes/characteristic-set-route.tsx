import type { AdoptionBasis, SetParameter } from '@porestack/types';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { EngineeringCaution } from '../../components/engineering-caution';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { formatDateTime } from '../../lib/format';
import { useCharacteristicSet } from '../../features/design/api/characteristic-sets';
import { CharacteristicSetEditor } from '../../features/design/components/characteristic-set-editor';
import { DESIGN_READERS, designPermissions } from '../design-permissions';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { ProjectBackLink } from './project-back-link';

export function CharacteristicSetRoute() {
  return (
    <RoleGate roles={DESIGN_READERS} purpose="a project's design work">
      <CharacteristicSetPage />
    </RoleGate>
  );
}

function CharacteristicSetPage() {
  const { orgId, membership } = useCurrentOrg();
  const { projectId = '', setId = 'new' } = useParams();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const isNew = setId === 'new';
  const revisionParam = search.get('revision');
  const set = useCharacteristicSet(orgId, projectId, isNew ? '' : setId, revisionParam === null ? null : Number(revisionParam));
  const canEdit = designPermissions(membership.roles).edit;
  const back = <ProjectBackLink orgId={orgId} projectId={projectId} />;
  const toSet = (id: string) => navigate(paths.org.characteristicSet.to(orgId, projectId, id), { replace: !isNew });
  if (isNew) {
    return (
      <>
        {back}
        <PageHeader title="New characteristic set" description="Approved records of one stratum, their statistics, and the values you adopt for design." />
        <EngineeringCaution />
        <div className="mt-4">
          <CharacteristicSetEditor orgId={orgId} projectId={projectId} setId={null} canEdit={canEdit} initial={{ name: '', note: '', versionIds: [], adopted: {} }} onSaved={(s) => toSet(s.id)} />
        </div>
      </>
    );
  }
  if (set.isPending) return <LoadingBlock label="Loading the characteristic set…" />;
  if (set.error) return <ErrorMessage error={set.error} title="The characteristic set could not be loaded" onRetry={() => void set.refetch()} />;
  const s = set.data;
  const isCurrent = s.current.revision === s.currentRevision;
  const adopted = Object.fromEntries(Object.entries(s.current.adopted).map(([key, a]) => [key, { basis: a.basis, value: a.value === null ? '' : String(a.value), note: a.note }])) as Partial<
    Record<SetParameter, { basis: AdoptionBasis; value: string; note: string }>
  >;
  return (
    <>
      {back}
      <PageHeader
        title={s.name}
        description={`Characteristic set · revision ${s.current.revision}${isCurrent ? ' (current)' : ` of ${s.currentRevision}`} · saved ${formatDateTime(s.current.createdAt)} by ${s.current.createdBy.name}`}
        actions={
          s.revisions.length > 1 ? (
            <nav aria-label="Revisions" className="flex flex-wrap gap-2 text-sm">
              {s.revisions.map((r) => (
                <Link key={r.id} className={r.revision === s.current.revision ? 'font-semibold text-slate-900' : 'text-accent-700 hover:underline'} to={`${paths.org.characteristicSet.to(orgId, projectId, s.id)}?revision=${r.revision}`}>
                  rev. {r.revision}
                </Link>
              ))}
            </nav>
          ) : undefined
        }
      />
      <EngineeringCaution />
      <div className="mt-4">
        <CharacteristicSetEditor
          key={s.current.id}
          orgId={orgId}
          projectId={projectId}
          setId={s.id}
          canEdit={canEdit && isCurrent}
          initial={{ name: s.current.name, note: '', versionIds: s.current.members.map((m) => m.versionId), adopted }}
          onSaved={(saved) => toSet(saved.id)}
        />
      </div>
    </>
  );
}
