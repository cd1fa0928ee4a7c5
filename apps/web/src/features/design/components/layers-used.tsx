import type { CheckRevision, ResolvedValue } from '@porestack/types';
import { formatNumber } from './design-format';
import { sourceWords } from './source-words';
import { TracePopover } from './trace-popover';
import { TableHead } from './table-head';

/**
 * The layers as the run used them, every parameter one click from its source (record → version →
 * test → approver → readings file hash, a set, or "entered by hand").
 */
export function LayersUsed({ orgId, revision }: { orgId: string; revision: CheckRevision }) {
  const used = revision.result.check.layers;
  const content = revision.groundModel.content;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Layers and parameters used by the run, each traceable to its source</caption>
        <TableHead cellClassName="px-2 py-2" headings={['Layer', 'Depth (m)', 'Source', 'e0', 'Cc', 'Cr/Cs used', 'σ′p basis', 'cv (m²/yr)', 'Cα', 'Drainage path (m)', 'End of primary']} />
        <tbody>
          {used.map((layer) => {
            const stored = content.layers[layer.layerIndex];
            const p = stored?.parameters;
            const source = stored?.source ?? null;
            const traced = (value: number | null, resolved: ResolvedValue | undefined) =>
              value === null ? '—' : resolved ? <TracePopover orgId={orgId} projectId={revision.projectId} source={source} label={formatNumber(value)} origin={resolved.origin} /> : formatNumber(value);
            return (
              <tr key={layer.layerIndex} className="border-t border-slate-100 align-top">
                <th scope="row" className="whitespace-nowrap px-2 py-2 text-left font-medium text-slate-900">
                  {layer.name}
                </th>
                <td className="whitespace-nowrap px-2 py-2">
                  {layer.topDepthM.toFixed(2)}–{layer.bottomDepthM.toFixed(2)}
                </td>
                <td className="px-2 py-2 text-xs">{stored?.kind === 'granular' ? (layer.elasticModulusKpa === null ? 'granular, no E′' : `granular, E′ ${formatNumber(layer.elasticModulusKpa)} kPa, ν ${layer.poissonRatio}`) : sourceWords(source)}</td>
                <td className="px-2 py-2">{traced(layer.e0, p?.e0)}</td>
                <td className="px-2 py-2">{traced(layer.cc, p?.cc)}</td>
                <td className="px-2 py-2">
                  {traced(layer.cs, p?.recompressionIndex)} {p?.recompressionIndex.kind ? <span className="text-xs text-slate-500">{p.recompressionIndex.kind}</span> : null}
                </td>
                <td className="px-2 py-2 text-xs">
                  {layer.preconsolidationBasis === 'ocr' ? (
                    <>OCR {traced(layer.ocr, p?.ocr.value !== null ? p?.ocr : p?.preconsolidationKpa)}{p?.preconsolidationKpa.value != null && p.preconsolidationDepthM != null ? ` (σ′p ${formatNumber(p.preconsolidationKpa.value)} kPa at ${p.preconsolidationDepthM.toFixed(2)} m)` : ''}</>
                  ) : layer.preconsolidationBasis === 'preconsolidation-stress' ? (
                    <>constant σ′p {traced(layer.preconsolidationKpa, p?.preconsolidationKpa)} kPa</>
                  ) : layer.preconsolidationBasis === 'assumed-normally-consolidated' ? (
                    'assumed normally consolidated'
                  ) : (
                    '—'
                  )}
                </td>
                <td className="px-2 py-2">{traced(layer.cvM2PerYr, p?.cvM2PerYr)}</td>
                <td className="px-2 py-2">{traced(layer.cAlpha, p?.cAlpha)}</td>
                <td className="px-2 py-2">{formatNumber(layer.drainagePathM)}</td>
                <td className="px-2 py-2">{layer.endOfPrimaryYears === null ? '—' : `${formatNumber(layer.endOfPrimaryYears)} yr`}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
