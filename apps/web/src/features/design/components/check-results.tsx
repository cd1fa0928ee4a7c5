import { LIMIT_SOURCE_LABELS, type CheckRevision, type SettlementCheckResult } from '@porestack/types';
import { useMemo } from 'react';
import { Alert } from '../../../components/alert';
import { buttonClasses } from '../../../components/button';
import { EngineeringCaution } from '../../../components/engineering-caution';
import { ErrorMessage } from '../../../components/error-message';
import { Panel } from '../../../components/panel';
import { LoadingBlock } from '../../../components/spinner';
import { apiPaths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useCheckRevision, useFootingResult } from '../api/settlement-checks';
import { formatMm } from './design-format';
import { LayersUsed } from './layers-used';
import { PlanView, type PlanFooting } from './plan-view';
import { FootingResultsTable, PairResultsTable } from './result-tables';
import { SettlementDetail } from './settlement-detail';

type CheckResultsProps = {
  orgId: string;
  projectId: string;
  checkId: string;
  revision: number;
  selectedFooting: string | null;
  onSelectFooting: (id: string) => void;
};

/** One stored run: the caution, what it was run on, each footing's settlement, the plan, pairs and the chosen footing in detail. */
export function CheckResults({ orgId, projectId, checkId, revision, selectedFooting, onSelectFooting }: CheckResultsProps) {
  const stored = useCheckRevision(orgId, projectId, checkId, revision);
  if (stored.isPending) return <LoadingBlock label="Loading the results…" />;
  if (stored.error) return <ErrorMessage error={stored.error} title="The results could not be loaded" onRetry={() => void stored.refetch()} />;
  const r = stored.data;
  return (
    <div className="space-y-5">
      <EngineeringCaution />
      <div className="flex flex-wrap items-center justify-between gap-3 text-sm text-slate-700">
        <p>
          <strong className="text-slate-900">Revision {r.revision}</strong> · {r.reason} · run {formatDateTime(r.createdAt)} by {r.createdBy.name} · ground model “{r.groundModel.name}” revision {r.groundModel.revision} · geo-core {r.geoCoreVersion}
        </p>
        <a className={buttonClasses('secondary', 'sm')} href={apiPaths.checkWorkbook(orgId, projectId, checkId, r.revision)} download>
          Export to XLSX
        </a>
      </div>
      {r.warnings.length > 0 ? (
        <Alert tone="warning" title="Warnings from the run">
          <ul className="list-disc space-y-0.5 pl-5">
            {r.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Alert>
      ) : null}
      {r.result.kind === 'footings' ? (
        <FootingsResult orgId={orgId} projectId={projectId} checkId={checkId} revision={r} check={r.result.check} selectedFooting={selectedFooting} onSelectFooting={onSelectFooting} />
      ) : (
        <Panel title={`Uniform load: Δσ = ${r.result.check.method.stressIncreaseKpa} kPa at every depth`}>
          <SettlementDetail point={{ ...r.result.check, label: 'the uniform load', immediateM: 0 }} layerNames={new Map(r.result.check.layers.map((l) => [l.layerIndex, l.name]))} />
        </Panel>
      )}
      <Panel title="Layers used" description="Click a value to see where it came from.">
        <LayersUsed orgId={orgId} revision={r} />
      </Panel>
      <Panel title="Method">
        <ul className="list-disc space-y-1 pl-5 text-sm text-slate-700">
          {r.result.check.method.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      </Panel>
    </div>
  );
}

function FootingsResult({ orgId, projectId, checkId, revision, check, selectedFooting, onSelectFooting }: Omit<CheckResultsProps, 'revision'> & { revision: CheckRevision; check: SettlementCheckResult }) {
  const o = revision.options;
  const limitLabel = `1/${o.angularDistortionDenominator} (${LIMIT_SOURCE_LABELS[o.angularDistortionSource]})`;
  const plan: PlanFooting[] = useMemo(() => planFootings(check.footings), [check.footings]);
  const chosen = selectedFooting ?? check.footings.reduce((worst, f) => (f.totalM > worst.totalM ? f : worst), check.footings[0]!).id;
  const over = check.pairs.filter((p) => !p.withinDesignLimit).length;
  const overTotal = check.footings.filter((f) => f.withinTotalLimit === false).length;
  const maxTotal = Math.max(...check.footings.map((f) => f.totalM));
  return (
    <>
      <dl className="grid gap-3 sm:grid-cols-4" aria-label="Summary of the run">
        <Summary term="Footings" value={String(check.footings.length)} />
        <Summary term="Largest total settlement" value={`${formatMm(maxTotal)} mm`} />
        <Summary term={`Over the total limit${o.totalSettlementLimitMm === null ? '' : ` of ${o.totalSettlementLimitMm} mm (${LIMIT_SOURCE_LABELS[o.totalSettlementSource]})`}`} value={o.totalSettlementLimitMm === null ? 'not judged' : String(overTotal)} alarm={overTotal > 0} />
        <Summary term={`Pairs over ${limitLabel}`} value={String(over)} alarm={over > 0} />
      </dl>
      <Panel title="Plan" description="To scale, coloured by total settlement; pairs of neighbours over the angular-distortion limit in red.">
        <PlanView footings={plan} pairs={check.pairs} limitLabel={limitLabel} selectedId={chosen} onSelect={onSelectFooting} />
      </Panel>
      <Panel title="Footings" description="Settlement at each footing's centre; sort by any column, click a row to open the footing below.">
        <FootingResultsTable footings={check.footings} selectedId={chosen} onSelect={onSelectFooting} />
      </Panel>
      <FootingPanel orgId={orgId} projectId={projectId} checkId={checkId} revision={revision} footingId={chosen} />
      <Panel title="Neighbouring pairs" description={`Differential settlement δ and angular distortion δ/L of footings within ${o.pairMaxDistanceM === null ? 'any distance' : `${o.pairMaxDistanceM} m`} of each other, judged against ${limitLabel}.`}>
        <PairResultsTable pairs={check.pairs} limitLabel={limitLabel} />
      </Panel>
    </>
  );
}

function Summary({ term, value, alarm = false }: { term: string; value: string; alarm?: boolean }) {
  return (
    <div className={`rounded-md border px-3 py-2 ${alarm ? 'border-red-300 bg-red-50' : 'border-slate-200 bg-white'}`}>
      <dt className="text-xs text-slate-600">{term}</dt>
      <dd className={`text-lg font-semibold ${alarm ? 'text-red-800' : 'text-slate-900'}`}>{value}</dd>
    </div>
  );
}

function FootingPanel({ orgId, projectId, checkId, revision, footingId }: { orgId: string; projectId: string; checkId: string; revision: CheckRevision; footingId: string }) {
  const detail = useFootingResult(orgId, projectId, checkId, revision.revision, footingId);
  const layerNames = useMemo(() => new Map(revision.result.check.layers.map((l) => [l.layerIndex, l.name])), [revision]);
  const asRun = revision.footingsAsRun.find((f) => f.id === footingId);
  return (
    <Panel
      title={`Footing ${footingId}`}
      description={asRun ? `Gross ${asRun.grossPressureKpa.toFixed(1)} kPa − soil removed ${asRun.overburdenKpa.toFixed(1)} kPa = net ${asRun.netPressureKpa.toFixed(1)} kPa at founding level.` : undefined}
    >
      {detail.isPending ? (
        <LoadingBlock label={`Loading footing ${footingId}…`} />
      ) : detail.error ? (
        <ErrorMessage error={detail.error} title="The footing could not be loaded" />
      ) : (
        <SettlementDetail point={{ ...detail.data, label: `footing ${footingId}` }} layerNames={layerNames} />
      )}
    </Panel>
  );
}

/**
 * The plan sizes of the footings: B × L, a circle's D, and a strip drawn as long as the rest of
 * the plan is deep (at least ten widths), since it runs on beyond the drawing.
 */
function planFootings(footings: SettlementCheckResult['footings']): PlanFooting[] {
  const others = footings.filter((f) => f.shape !== 'strip');
  const spanY = others.length === 0 ? 0 : Math.max(...others.map((f) => f.yM + (f.lengthM ?? f.widthM) / 2)) - Math.min(...others.map((f) => f.yM - (f.lengthM ?? f.widthM) / 2));
  return footings.map((f) => ({
    id: f.id,
    xM: f.xM,
    yM: f.yM,
    alongXM: f.widthM,
    alongYM: f.shape === 'strip' ? Math.max(10 * f.widthM, spanY) : (f.lengthM ?? f.widthM),
    circle: f.shape === 'circle',
    totalM: f.totalM,
  }));
}
