import type { SoilRecordVersion } from '@porestack/types';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/alert';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';

const fixed = (n: number | null, d: number, unit = '') => (n === null ? '—' : `${n.toFixed(d)}${unit ? ` ${unit}` : ''}`);

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <tr className="border-b border-slate-100 last:border-b-0">
      <th scope="row" className="px-4 py-2 text-left font-normal text-slate-700">{label}</th>
      <td className="px-4 py-2 tabular-nums text-slate-900">{children}</td>
    </tr>
  );
}

/**
 * One version exactly as approved: its parameters and where each came from. Versions never change.
 * `labTestLink`: also link the lab's working page of the test (for lab staff).
 */
export function VersionView({ orgId, version, isCurrent, labTestLink }: { orgId: string; version: SoilRecordVersion; isCurrent: boolean; labTestLink: boolean }) {
  const adoptedFrom = version.preconsolidationAdoptedFrom === 'pick' ? ' (picked)' : version.preconsolidationAdoptedFrom ? ` (${version.preconsolidationAdoptedFrom})` : '';
  return (
    <div className="space-y-4">
      {isCurrent ? (
        <Alert tone="success">Version {version.version} is the current version of this record.</Alert>
      ) : (
        <Alert tone="warning" title={`Version ${version.version} is superseded`}>
          Replaced by version {version.supersededByVersion ?? '?'}{version.supersededAt ? ` on ${formatDateTime(version.supersededAt)}` : ''}. It stays readable as it was approved; use the current version for design.
        </Alert>
      )}
      <table className="w-full border-collapse text-sm" aria-label={`Parameters of version ${version.version}`}>
        <tbody>
          <Row label="Initial void ratio e0">{fixed(version.initialVoidRatio, 3)}</Row>
          <Row label="Compression index Cc">{fixed(version.compressionIndex, 3)}</Row>
          <Row label="Recompression index Cr">{fixed(version.recompressionIndex, 3)}</Row>
          <Row label="Swelling index Cs">{fixed(version.swellIndex, 3)}</Row>
          <Row label="σ′p, Casagrande">{fixed(version.preconsolidationCasagrandeKpa, 0, 'kPa')}</Row>
          <Row label="σ′p, Pacheco Silva">{fixed(version.preconsolidationPachecoSilvaKpa, 0, 'kPa')}</Row>
          <Row label="σ′p, adopted">{fixed(version.preconsolidationAdoptedKpa, 0, 'kPa')}{version.preconsolidationAdoptedKpa === null ? '' : adoptedFrom}</Row>
          <Row label="OCR">{fixed(version.overconsolidationRatio, 2)}</Row>
          <Row label="cv range">{version.cvMinM2PerYr === null || version.cvMaxM2PerYr === null ? '—' : `${version.cvMinM2PerYr.toFixed(2)} – ${version.cvMaxM2PerYr.toFixed(2)} m²/yr`}</Row>
          <Row label="Cα">{fixed(version.secondaryCompressionIndex, 4)}</Row>
          <Row label="Sample quality">{version.sampleQuality ?? '—'}</Row>
        </tbody>
      </table>
      <dl className="grid gap-3 text-sm sm:grid-cols-2">
        <div>
          <dt className="text-xs uppercase tracking-wide text-slate-500">Source test</dt>
          <dd className="flex flex-col gap-0.5">
            <Link to={paths.org.issuedTest.to(orgId, version.recordId, version.version)} className="text-accent-700 hover:underline">Test summary and curves of this version</Link>
            {labTestLink ? <Link to={paths.org.test.to(orgId, version.testId)} className="text-accent-700 hover:underline">The test in the laboratory</Link> : null}
          </dd>
        </div>
        <div>
          <dt className="text-xs uppercase tracking-wide text-slate-500">Approved</dt>
          <dd>{version.approvedByName}, {formatDateTime(version.approvedAt)}</dd>
        </div>
        <div className="sm:col-span-2">
          <dt className="text-xs uppercase tracking-wide text-slate-500">Readings file SHA-256</dt>
          <dd className="break-all font-mono text-xs">{version.uploadSha256 ?? 'not recorded'}</dd>
        </div>
        <div>
          <dt className="text-xs uppercase tracking-wide text-slate-500">Analysis</dt>
          <dd className="font-mono text-xs">{version.analysisId.slice(0, 8)} · geo-core {version.geoCoreVersion}</dd>
        </div>
      </dl>
    </div>
  );
}
