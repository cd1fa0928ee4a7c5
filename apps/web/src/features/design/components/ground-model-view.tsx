import type { GroundModelRevision, ResolvedValue } from '@porestack/types';
import { formatNumber } from './design-format';
import { GroundProfilePlot } from './ground-profile-plot';
import { sourceWords } from './source-words';
import { TableHead } from './table-head';

function Value({ value }: { value: ResolvedValue | undefined }) {
  if (!value || value.value === null) return <>—</>;
  return (
    <>
      {formatNumber(value.value)}
      {value.origin === 'hand' ? <span className="ml-1 text-xs text-amber-800">(entered by hand)</span> : null}
    </>
  );
}

/** A saved revision of a ground model, read-only: its layers with every value and source, and the drawing. */
export function GroundModelView({ revision }: { revision: GroundModelRevision }) {
  const { content } = revision;
  return (
    <div className="space-y-4">
      <p className="text-sm text-slate-700">
        Water table {content.waterTableDepthM} m below ground level ({content.groundLevelM} m); γw {content.waterUnitWeightKnPerM3} kN/m³.
        {revision.note ? ` ${revision.note}` : ''}
      </p>
      <div className="overflow-x-auto rounded-md border border-slate-200">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Layers of the ground model</caption>
          <TableHead cellClassName="px-3 py-2" headings={['Layer', 'Depth (m)', 'γ / γsat', 'E′, ν', 'Source', 'e0', 'Cc', 'Cr/Cs', 'σ′p (kPa)', 'OCR', 'cv (m²/yr)', 'Cα']} />
          <tbody>
            {content.layers.map((layer, index) => {
              const p = layer.parameters;
              return (
                <tr key={`${index}-${layer.name}`} className="border-t border-slate-100">
                  <td className="px-3 py-2 font-medium text-slate-900">{layer.name}</td>
                  <td className="whitespace-nowrap px-3 py-2">
                    {layer.topDepthM.toFixed(2)}–{layer.bottomDepthM.toFixed(2)}
                  </td>
                  <td className="whitespace-nowrap px-3 py-2">
                    {layer.unitWeightKnPerM3} / {layer.saturatedUnitWeightKnPerM3}
                  </td>
                  <td className="whitespace-nowrap px-3 py-2">{layer.elasticModulusKpa === null ? '—' : `${formatNumber(layer.elasticModulusKpa)}, ${layer.poissonRatio}`}</td>
                  <td className="px-3 py-2">{layer.kind === 'granular' ? 'granular' : sourceWords(layer.source)}</td>
                  <td className="px-3 py-2"><Value value={p?.e0} /></td>
                  <td className="px-3 py-2"><Value value={p?.cc} /></td>
                  <td className="px-3 py-2">
                    <Value value={p?.recompressionIndex} /> {p?.recompressionIndex.kind ? <span className="text-xs text-slate-500">{p.recompressionIndex.kind}</span> : null}
                  </td>
                  <td className="px-3 py-2">
                    <Value value={p?.preconsolidationKpa} />
                    {p && p.preconsolidationKpa.value !== null ? <span className="block text-xs text-slate-500">carried by {p.preconsolidationCarry === 'ocr' ? 'OCR' : 'a constant σ′p'}</span> : null}
                  </td>
                  <td className="px-3 py-2"><Value value={p?.ocr} /></td>
                  <td className="px-3 py-2"><Value value={p?.cvM2PerYr} /></td>
                  <td className="px-3 py-2"><Value value={p?.cAlpha} /></td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <GroundProfilePlot content={content} profile={revision.profile} />
    </div>
  );
}
