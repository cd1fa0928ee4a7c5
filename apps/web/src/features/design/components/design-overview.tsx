import type { GroundModelSummary } from '@porestack/types';
import { useState, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Button, buttonClasses } from '../../../components/button';
import { EmptyState } from '../../../components/empty-state';
import { ErrorMessage } from '../../../components/error-message';
import { Select } from '../../../components/select';
import { LoadingBlock } from '../../../components/spinner';
import { TextField } from '../../../components/text-field';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useCharacteristicSets } from '../api/characteristic-sets';
import { useGroundModels } from '../api/ground-models';
import { useChecks, useCreateCheck } from '../api/settlement-checks';
import { NewerParametersBadge } from './newer-parameters-badge';

type DesignOverviewProps = { orgId: string; projectId: string; canEdit: boolean };

/** The project's design work in one place: ground models, characteristic sets and settlement checks. */
export function DesignOverview({ orgId, projectId, canEdit }: DesignOverviewProps) {
  const models = useGroundModels(orgId, projectId);
  const sets = useCharacteristicSets(orgId, projectId);
  const checks = useChecks(orgId, projectId);
  const failed = models.error ?? sets.error ?? checks.error;
  if (failed) return <ErrorMessage error={failed} title="The design work could not be loaded" onRetry={() => void Promise.all([models.refetch(), sets.refetch(), checks.refetch()])} />;
  if (!models.data || !sets.data || !checks.data) return <LoadingBlock label="Loading the design work…" />;
  return (
    <div className="grid gap-6 xl:grid-cols-3">
      <section aria-label="Settlement checks" className="xl:col-span-3">
        <SectionHeading title="Settlement checks" />
        {checks.data.length === 0 ? (
          <EmptyState title="No settlement checks yet">{models.data.length === 0 ? 'Build a ground model first; a check runs footings on it.' : 'Start a check on one of the ground models below.'}</EmptyState>
        ) : (
          <ul className="divide-y divide-slate-100 rounded-md border border-slate-200">
            {checks.data.map((check) => (
              <li key={check.id} className="flex flex-wrap items-center justify-between gap-2 px-3 py-2 text-sm">
                <span className="min-w-0">
                  <Link to={paths.org.settlementCheck.to(orgId, projectId, check.id)} className="font-medium text-accent-700 hover:underline">
                    {check.name}
                  </Link>
                  <span className="ml-2 text-slate-600">
                    on {check.groundModelName} · {check.footingCount} footing{check.footingCount === 1 ? '' : 's'}
                  </span>
                </span>
                <span className="flex items-center gap-2 text-xs text-slate-600">
                  {check.newerParametersApproved ? <NewerParametersBadge /> : null}
                  {check.latestRevision === null ? 'not run yet' : `revision ${check.latestRevision}, ${formatDateTime(check.latestRunAt ?? check.updatedAt)}`}
                </span>
              </li>
            ))}
          </ul>
        )}
        {canEdit && models.data.length > 0 ? <NewCheckForm orgId={orgId} projectId={projectId} models={models.data} /> : null}
      </section>
      <section aria-label="Ground models" className="xl:col-span-2">
        <SectionHeading
          title="Ground models"
          action={canEdit ? <Link className={buttonClasses('secondary', 'sm')} to={paths.org.newGroundModel.to(orgId, projectId)}>New ground model</Link> : null}
        />
        {models.data.length === 0 ? (
          <EmptyState title="No ground models yet">A ground model is the site's layers, water table and the parameters of each clay, taken from approved soil records.</EmptyState>
        ) : (
          <ul className="divide-y divide-slate-100 rounded-md border border-slate-200">
            {models.data.map((model) => (
              <li key={model.id} className="flex items-center justify-between px-3 py-2 text-sm">
                <Link to={paths.org.groundModel.to(orgId, projectId, model.id)} className="font-medium text-accent-700 hover:underline">
                  {model.name}
                </Link>
                <span className="text-xs text-slate-600">
                  revision {model.currentRevision} · {model.layerCount} layer{model.layerCount === 1 ? '' : 's'}
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section aria-label="Characteristic sets">
        <SectionHeading
          title="Characteristic sets"
          action={canEdit ? <Link className={buttonClasses('secondary', 'sm')} to={paths.org.newCharacteristicSet.to(orgId, projectId)}>New characteristic set</Link> : null}
        />
        {sets.data.length === 0 ? (
          <EmptyState title="No characteristic sets yet">Group approved records of one stratum to see their statistics and adopt cautious values.</EmptyState>
        ) : (
          <ul className="divide-y divide-slate-100 rounded-md border border-slate-200">
            {sets.data.map((set) => (
              <li key={set.id} className="px-3 py-2 text-sm">
                <Link to={paths.org.characteristicSet.to(orgId, projectId, set.id)} className="font-medium text-accent-700 hover:underline">
                  {set.name}
                </Link>
                <span className="ml-2 text-xs text-slate-600">
                  revision {set.currentRevision} · {set.memberCount} record{set.memberCount === 1 ? '' : 's'}
                </span>
                {set.membersWithNewerVersions > 0 ? (
                  <p className="text-xs text-amber-800">
                    {set.membersWithNewerVersions} record{set.membersWithNewerVersions === 1 ? ' has' : 's have'} a newer approved version: revise the set to take {set.membersWithNewerVersions === 1 ? 'it' : 'them'} in.
                  </p>
                ) : null}
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}

function SectionHeading({ title, action }: { title: string; action?: ReactNode }) {
  return (
    <div className="mb-2 flex items-center justify-between gap-2">
      <h3 className="text-sm font-semibold text-slate-900">{title}</h3>
      {action}
    </div>
  );
}

function NewCheckForm({ orgId, projectId, models }: { orgId: string; projectId: string; models: readonly GroundModelSummary[] }) {
  const [open, setOpen] = useState(false);
  const [name, setName] = useState('');
  const [modelId, setModelId] = useState(models[0]?.id ?? '');
  const create = useCreateCheck(orgId, projectId);
  const navigate = useNavigate();
  if (!open) {
    return (
      <Button variant="secondary" size="sm" className="mt-3" onClick={() => setOpen(true)}>
        New settlement check
      </Button>
    );
  }
  return (
    <form
      aria-label="New settlement check"
      className="mt-3 flex flex-wrap items-end gap-3 rounded-md border border-slate-200 bg-slate-50 p-3"
      onSubmit={(event) => {
        event.preventDefault();
        create.mutate({ name, groundModelId: modelId }, { onSuccess: (check) => navigate(paths.org.settlementCheck.to(orgId, projectId, check.id)) });
      }}
    >
      <TextField label="Check name" name="name" value={name} onChange={(e) => setName(e.target.value)} autoFocus className="min-w-56 flex-1" />
      <Select label="Ground model" value={modelId} onChange={(e) => setModelId(e.target.value)} options={models.map((m) => ({ value: m.id, label: `${m.name} (revision ${m.currentRevision})` }))} />
      <Button type="submit" pending={create.isPending}>
        Create check
      </Button>
      <Button variant="ghost" onClick={() => setOpen(false)}>
        Cancel
      </Button>
      {create.error ? <div className="w-full"><ErrorMessage error={create.error} title="The check was not created" /></div> : null}
    </form>
  );
}
