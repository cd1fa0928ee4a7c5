import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { EngineeringCaution } from '../../components/engineering-caution';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { paths } from '../../config/paths';
import { formatDateTime } from '../../lib/format';
import { useGroundModel } from '../../features/design/api/ground-models';
import { draftFromContent, emptyModel } from '../../features/design/components/ground-model-draft';
import { GroundModelEditor } from '../../features/design/components/ground-model-editor';
import { GroundModelView } from '../../features/design/components/ground-model-view';
import { DESIGN_READERS, designPermissions } from '../design-permissions';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { ProjectBackLink } from './project-back-link';

export function GroundModelRoute() {
  return (
    <RoleGate roles={DESIGN_READERS} purpose="a project's design work">
      <GroundModelPage />
    </RoleGate>
  );
}

function GroundModelPage() {
  const { orgId, membership } = useCurrentOrg();
  const { projectId = '', modelId = 'new' } = useParams();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const isNew = modelId === 'new';
  const revisionParam = search.get('revision');
  const model = useGroundModel(orgId, projectId, isNew ? '' : modelId, revisionParam === null ? null : Number(revisionParam));
  const canEdit = designPermissions(membership.roles).edit;
  const back = <ProjectBackLink orgId={orgId} projectId={projectId} />;
  const saved = (id: string) => navigate(paths.org.groundModel.to(orgId, projectId, id));
  if (isNew) {
    return (
      <>
        {back}
        <PageHeader title="New ground model" description="Layers from the top down; each clay takes its parameters from an approved soil record, a characteristic set or your own entries." />
        {canEdit ? <GroundModelEditor orgId={orgId} projectId={projectId} modelId={null} initial={emptyModel()} onSaved={(m) => saved(m.id)} /> : <p className="text-sm">Only the project's designers build ground models.</p>}
      </>
    );
  }
  if (model.isPending) return <LoadingBlock label="Loading the ground model…" />;
  if (model.error) return <ErrorMessage error={model.error} title="The ground model could not be loaded" onRetry={() => void model.refetch()} />;
  const m = model.data;
  const isCurrent = m.current.revision === m.currentRevision;
  return (
    <>
      {back}
      <PageHeader
        title={m.name}
        description={`Ground model · revision ${m.current.revision}${isCurrent ? ' (current)' : ` of ${m.currentRevision}`} · saved ${formatDateTime(m.current.createdAt)} by ${m.current.createdBy.name}${m.current.note ? ` · ${m.current.note}` : ''}`}
        actions={
          m.revisions.length > 1 ? (
            <nav aria-label="Revisions" className="flex flex-wrap gap-2 text-sm">
              {m.revisions.map((r) => (
                <Link
                  key={r.revision}
                  to={`${paths.org.groundModel.to(orgId, projectId, m.id)}${r.revision === m.currentRevision ? '' : `?revision=${r.revision}`}`}
                  aria-current={r.revision === m.current.revision ? 'page' : undefined}
                  title={`${formatDateTime(r.createdAt)}${r.note ? ` · ${r.note}` : ''}`}
                  className={r.revision === m.current.revision ? 'font-semibold text-slate-900' : 'text-accent-700 hover:underline'}
                >
                  rev. {r.revision}
                </Link>
              ))}
            </nav>
          ) : undefined
        }
      />
      <div className="space-y-4">
        <EngineeringCaution />
        {canEdit && isCurrent ? (
          <GroundModelEditor key={m.current.id} orgId={orgId} projectId={projectId} modelId={m.id} initial={draftFromContent(m.current.content, m.name)} onSaved={(saved) => navigate(paths.org.groundModel.to(orgId, projectId, saved.id), { replace: true })} />
        ) : (
          <Panel title={`Revision ${m.current.revision}`}>
            <GroundModelView revision={m.current} />
          </Panel>
        )}
      </div>
    </>
  );
}
