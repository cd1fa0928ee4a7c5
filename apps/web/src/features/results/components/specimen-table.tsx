import type { IssuedSpecimen } from '@porestack/types';
import { fixed } from './parameter-format';

const percent = (fraction: number | null) => (fraction === null ? '—' : `${(fraction * 100).toFixed(1)} %`);

/** The specimen before and after the test, as the approved analysis used it. */
export function SpecimenTable({ specimen }: { specimen: IssuedSpecimen }) {
  const rows: Array<[string, string, string]> = [
    ['Height (mm)', fixed(specimen.initialHeightMm, 2), fixed(specimen.finalHeightMm, 2)],
    ['Void ratio e', fixed(specimen.initialVoidRatio, 3), fixed(specimen.finalVoidRatio, 3)],
    ['Water content w', percent(specimen.initialWaterContent), percent(specimen.finalWaterContent)],
    ['Degree of saturation S', percent(specimen.initialDegreeOfSaturation), percent(specimen.finalDegreeOfSaturation)],
  ];
  return (
    <div className="space-y-3">
      <table className="w-full border-collapse text-sm" aria-label="Specimen before and after the test">
        <thead className="text-xs uppercase tracking-wide text-slate-500">
          <tr className="border-b border-slate-200">
            <th scope="col" className="py-1.5 pr-3 text-left font-medium">
              <span className="sr-only">Quantity</span>
            </th>
            <th scope="col" className="px-3 py-1.5 text-right font-medium">Before</th>
            <th scope="col" className="py-1.5 pl-3 text-right font-medium">After</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, before, after]) => (
            <tr key={label} className="border-b border-slate-100 last:border-b-0">
              <th scope="row" className="py-1.5 pr-3 text-left font-normal text-slate-700">{label}</th>
              <td className="px-3 py-1.5 text-right tabular-nums text-slate-900">{before}</td>
              <td className="py-1.5 pl-3 text-right tabular-nums text-slate-900">{after}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm">
        <dt className="text-slate-600">Diameter</dt>
        <dd className="text-right tabular-nums text-slate-900">{fixed(specimen.diameterMm, 1)} mm</dd>
        <dt className="text-slate-600">Dry mass</dt>
        <dd className="text-right tabular-nums text-slate-900">{fixed(specimen.dryMassG, 2)} g</dd>
        <dt className="text-slate-600">Specific gravity Gs</dt>
        <dd className="text-right tabular-nums text-slate-900">{fixed(specimen.specificGravity, 2)}</dd>
        <dt className="text-slate-600">Drainage</dt>
        <dd className="text-right text-slate-900">{specimen.drainage === 'double' ? 'top and bottom' : 'one face'}</dd>
      </dl>
      {specimen.initialWaterContent === null ? <p className="text-xs text-slate-500">No water content was measured, so water content and saturation are not given.</p> : null}
    </div>
  );
}
