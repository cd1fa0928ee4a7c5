import type { TestDetail } from '@porestack/types';
import type { ReactNode } from 'react';
import { TestStatusBadge } from '../../../components/test-status-badge';
import { formatDate } from '../../../lib/format';

const value = (n: number | null, digits: number, unit: string) => (n === null ? '—' : `${n.toFixed(digits)} ${unit}`.trim());
const percent = (n: number | null) => (n === null ? '—' : `${(n * 100).toFixed(1)} %`);

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div>
      <dt className="text-xs uppercase tracking-wide text-slate-500">{term}</dt>
      <dd className="mt-0.5 text-sm text-slate-900">{children}</dd>
    </div>
  );
}

/** The test at a glance: where the sample came from and how the specimen was set up. */
export function SpecimenSummary({ test }: { test: TestDetail }) {
  const s = test.specimen;
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-3 sm:grid-cols-4">
      <Fact term="Status"><TestStatusBadge status={test.status} /></Fact>
      <Fact term="Sample">{test.boreholeName} / {test.sampleReference} at {test.topDepthM.toFixed(2)} m</Fact>
      <Fact term="Technician">{test.technicianName}</Fact>
      <Fact term="Dates">{test.startedOn ? formatDate(test.startedOn) : 'not started'}{test.finishedOn ? ` – ${formatDate(test.finishedOn)}` : ''}</Fact>
      <Fact term="Ring H0 × D">{value(s.initialHeightMm, 2, 'mm')} × {value(s.diameterMm, 1, 'mm')}</Fact>
      <Fact term="Gs">{value(s.specificGravity, 3, '')}</Fact>
      <Fact term="Dry mass">{value(s.dryMassG, 2, 'g')}</Fact>
      <Fact term="w0 / wf">{percent(s.initialWaterContent)} / {percent(s.finalWaterContent)}</Fact>
      <Fact term="Drainage">{s.drainage === 'double' ? 'both ends' : 'one end'}</Fact>
      <Fact term="In-situ σ′v0">{value(test.inSituStressKpa, 0, 'kPa')}</Fact>
      <Fact term="Apparatus">{test.apparatusName || '—'}</Fact>
      <Fact term="Compliance">{test.compliance.length === 0 ? 'no calibration' : `${test.compliance.length} calibration points`}</Fact>
    </dl>
  );
}
