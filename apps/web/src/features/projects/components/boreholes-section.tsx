import type { Borehole, Sample, TestSummary } from '@porestack/types';
import { Link, useNavigate } from 'react-router-dom';
import { DisclosureForm } from '../../../components/disclosure-form';
import { EmptyState } from '../../../components/empty-state';
import { ErrorMessage } from '../../../components/error-message';
import { LoadingBlock } from '../../../components/spinner';
import { TestStatusBadge } from '../../../components/test-status-badge';
import { paths } from '../../../config/paths';
import { useSamples } from '../api/get-samples';
import { BoreholeCreateForm } from './borehole-create-form';
import { SampleCreateForm } from './sample-create-form';
import { TestCreateForm } from './test-create-form';

type BoreholesSectionProps = {
  orgId: string;
  projectId: string;
  boreholes: readonly Borehole[];
  tests: readonly TestSummary[];
  /** Technicians and managers set up boreholes, samples and tests; others only read. */
  canEdit: boolean;
};

/** The project's boreholes, each with its samples by depth and the tests on each sample. */
export function BoreholesSection({ orgId, projectId, boreholes, tests, canEdit }: BoreholesSectionProps) {
  return (
    <div className="space-y-4">
      {canEdit ? <DisclosureForm openLabel="New borehole">{(close) => <BoreholeCreateForm orgId={orgId} projectId={projectId} onDone={close} />}</DisclosureForm> : null}
      {boreholes.length === 0 ? (
        <EmptyState title="No boreholes yet">Add the first borehole, then its samples; tests are set up on a sample.</EmptyState>
      ) : (
        boreholes.map((borehole) => (
          <BoreholeCard key={borehole.id} orgId={orgId} projectId={projectId} borehole={borehole} tests={tests.filter((t) => t.boreholeId === borehole.id)} canEdit={canEdit} />
        ))
      )}
    </div>
  );
}

function BoreholeCard({ orgId, projectId, borehole, tests, canEdit }: { orgId: string; projectId: string; borehole: Borehole; tests: readonly TestSummary[]; canEdit: boolean }) {
  const samples = useSamples(orgId, borehole.id);
  const facts = [
    borehole.groundLevelMOd === null ? null : `ground level ${borehole.groundLevelMOd.toFixed(2)} m OD`,
    borehole.waterTableDepthM === null ? 'no groundwater met' : `water at ${borehole.waterTableDepthM.toFixed(1)} m`,
  ].filter(Boolean);
  return (
    <section aria-label={`Borehole ${borehole.name}`} className="rounded-md border border-slate-200">
      <div className="flex flex-wrap items-center justify-between gap-2 border-b border-slate-200 bg-slate-50 px-4 py-2">
        <h3 className="text-sm font-semibold text-slate-900">
          {borehole.name} <span className="ml-2 font-normal text-slate-500">{facts.join(' · ')}</span>
        </h3>
        {canEdit ? (
          <DisclosureForm openLabel={`New sample in ${borehole.name}`}>
            {(close) => <SampleCreateForm orgId={orgId} projectId={projectId} boreholeId={borehole.id} onDone={close} />}
          </DisclosureForm>
        ) : null}
      </div>
      <div className="p-4">
        {samples.isPending ? (
          <LoadingBlock label="Loading samples…" />
        ) : samples.error ? (
          <ErrorMessage error={samples.error} title="The samples could not be loaded" onRetry={() => void samples.refetch()} />
        ) : samples.data.length === 0 ? (
          <p className="text-sm text-slate-600">No samples from this borehole yet.</p>
        ) : (
          <ul className="divide-y divide-slate-100">
            {samples.data.map((sample) => (
              <SampleRow key={sample.id} orgId={orgId} sample={sample} tests={tests.filter((t) => t.sampleId === sample.id)} canEdit={canEdit} />
            ))}
          </ul>
        )}
      </div>
    </section>
  );
}

function SampleRow({ orgId, sample, tests, canEdit }: { orgId: string; sample: Sample; tests: readonly TestSummary[]; canEdit: boolean }) {
  const navigate = useNavigate();
  const stress =
    sample.inSituStressKpa === null ? 'σ′v0 unknown' : `σ′v0 ${sample.inSituStressKpa.toFixed(0)} kPa${sample.inSituStressSource === 'estimated' ? ' (estimated)' : ''}`;
  return (
    <li className="py-3 first:pt-0 last:pb-0">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-sm text-slate-800">
          <span className="font-medium">{sample.reference}</span>
          <span className="ml-2 text-slate-600">
            {sample.topDepthM.toFixed(2)}–{sample.bottomDepthM.toFixed(2)} m · {stress}
          </span>
          {sample.description ? <span className="ml-2 text-slate-500">{sample.description}</span> : null}
        </p>
      </div>
      <ul className="mt-2 flex flex-wrap gap-2" aria-label={`Tests on ${sample.reference}`}>
        {tests.map((test) => (
          <li key={test.id}>
            <Link to={paths.org.test.to(orgId, test.id)} className="inline-flex items-center gap-2 rounded border border-slate-200 px-2 py-1 text-sm text-accent-700 hover:bg-slate-50">
              {test.reference} <TestStatusBadge status={test.status} />
            </Link>
          </li>
        ))}
      </ul>
      {canEdit ? (
        <div className="mt-2">
          <DisclosureForm openLabel={`New test on ${sample.reference}`}>
            {(close) => (
              <TestCreateForm
                orgId={orgId}
                sampleId={sample.id}
                sampleReference={sample.reference}
                onCancel={close}
                onCreated={(test) => navigate(paths.org.test.to(orgId, test.id))}
              />
            )}
          </DisclosureForm>
        </div>
      ) : null}
    </li>
  );
}
