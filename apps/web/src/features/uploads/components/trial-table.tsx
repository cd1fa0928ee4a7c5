import type { ImportTrial } from '@porestack/types';
import { Alert } from '../../../components/alert';

/** More than this share of the height in one increment is no compression a specimen gives. */
const MOST_STRAIN = 0.6;
const mm = (value: number) => value.toFixed(4);

/**
 * The first increment as the mapping imports it: each time and deformation cell as written
 * beside minutes and millimetres, and the increment's compression against the specimen's
 * height — a division or direction set wrong shows here, before anything is imported.
 */
export function TrialTable({ trial, specimenHeightMm }: { trial: ImportTrial; specimenHeightMm: number | null }) {
  const increment = trial.increment;
  if (!increment) {
    return (
      <Alert tone="warning" title="The first increment cannot be read with these settings">
        {trial.issues[0]?.message ?? 'No readings were found below the column names.'}
      </Alert>
    );
  }
  const readings = increment.readings;
  const shown = readings.length > 12 ? [...readings.slice(0, 8), ...readings.slice(-4)] : readings;
  const last = readings[readings.length - 1]?.deformationMm ?? 0;
  const largest = Math.max(...readings.map((r) => Math.abs(r.deformationMm)));
  const strain = specimenHeightMm ? largest / specimenHeightMm : null;
  return (
    <div className="space-y-2">
      <div className="overflow-x-auto rounded-md border border-slate-200">
        <table className="w-full border-collapse text-left text-xs" aria-label="First increment as it will import">
          <caption className="bg-slate-50 px-3 py-2 text-left text-sm font-medium text-slate-800">
            Increment {increment.index}{increment.sheet ? ` (sheet “${increment.sheet}”)` : ''} at {increment.stressKpa.toLocaleString('en-GB', { maximumFractionDigits: 2 })} kPa, as it will import
          </caption>
          <thead className="bg-slate-50 text-slate-600">
            <tr>
              <th scope="col" className="px-3 py-1.5 font-medium">Row</th>
              <th scope="col" className="px-3 py-1.5 font-medium">Time as written</th>
              <th scope="col" className="px-3 py-1.5 font-medium">Minutes</th>
              <th scope="col" className="px-3 py-1.5 font-medium">Deformation as written</th>
              <th scope="col" className="px-3 py-1.5 font-medium">Deformation (mm)</th>
            </tr>
          </thead>
          <tbody>
            {shown.map((r) => (
              <tr key={r.rowNumber} className="border-b border-slate-100 tabular-nums text-slate-700">
                <td className="px-3 py-1">{r.rowNumber}</td>
                <td className="px-3 py-1">{r.time ?? ''}</td>
                <td className="px-3 py-1">{Number(r.elapsedMin.toPrecision(6))}</td>
                <td className="px-3 py-1">{r.deformation ?? ''}</td>
                <td className="px-3 py-1 font-medium text-slate-900">{mm(r.deformationMm)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {readings.length > shown.length ? <p className="text-xs text-slate-500">{readings.length - shown.length} readings in between are not shown.</p> : null}
      {last < 0 ? (
        <Alert tone="warning" title="The specimen swells over this increment">
          It ends {mm(-last)} mm higher than it started. A first, light load can do that; otherwise the gauge direction is the wrong way round.
        </Alert>
      ) : null}
      {strain !== null ? (
        <p className="text-sm text-slate-700">
          This increment moves the specimen by up to {mm(largest)} mm, {(strain * 100).toPrecision(2)} % of its {specimenHeightMm} mm height. The import checks the whole test: under 0.1 % or over 60 % is doubted.
        </p>
      ) : (
        <p className="text-sm text-slate-600">Enter the specimen’s initial height (Set-up) to see these deformations against it.</p>
      )}
      {strain !== null && strain > MOST_STRAIN ? (
        <Alert tone="warning" title="These deformations look wrong for the specimen">
          More than a specimen can compress. Check the gauge division and the deformation unit.
        </Alert>
      ) : null}
      {trial.issueCount > 0 ? <p className="text-sm text-red-700">{trial.issueCount} problem{trial.issueCount === 1 ? '' : 's'} in these rows; the first: {trial.issues[0]?.message}</p> : null}
    </div>
  );
}
