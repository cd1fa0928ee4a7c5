import { LIMIT_SOURCE_LABELS, type CheckRevision, type GroundModelLayer, type RevisionComparison } from '@porestack/types';
import { getRevision } from './check-runs.service.js';
import { sourceLabel } from './source-label.js';

const number = (value: number | null | undefined, digits = 3) => (value === null || value === undefined ? '—' : String(Number(value.toPrecision(digits + 2))));

function layerLines(layer: GroundModelLayer, index: number): Array<[string, string]> {
  const at = `Layer ${index + 1}`;
  const lines: Array<[string, string]> = [
    [`${at}: name and kind`, `${layer.name} (${layer.kind})`],
    [`${at}: depth (m)`, `${number(layer.topDepthM)}–${number(layer.bottomDepthM)}`],
    [`${at}: γ / γsat (kN/m³)`, `${number(layer.unitWeightKnPerM3)} / ${number(layer.saturatedUnitWeightKnPerM3)}`],
    [`${at}: E′ (kPa), ν`, layer.elasticModulusKpa === null ? '—' : `${number(layer.elasticModulusKpa)}, ${number(layer.poissonRatio)}`],
    [`${at}: source`, sourceLabel(layer.source)],
  ];
  const p = layer.parameters;
  if (p) {
    const value = (v: { value: number | null; origin: 'source' | 'hand' }) => `${number(v.value)}${v.origin === 'hand' && v.value !== null ? ' (entered by hand)' : ''}`;
    lines.push(
      [`${at}: e0`, value(p.e0)],
      [`${at}: Cc`, value(p.cc)],
      [`${at}: ${p.recompressionIndex.kind ?? 'Cr/Cs'}`, value(p.recompressionIndex)],
      [`${at}: σ′p (kPa)`, `${value(p.preconsolidationKpa)}${p.preconsolidationDepthM === null ? '' : ` at ${number(p.preconsolidationDepthM)} m`}, carried by ${p.preconsolidationCarry === 'ocr' ? 'OCR' : 'constant σ′p'}`],
      [`${at}: OCR`, value(p.ocr)],
      [`${at}: cv (m²/yr)`, value(p.cvM2PerYr)],
      [`${at}: Cα`, value(p.cAlpha)],
      [`${at}: drainage top/bottom`, `${layer.drainageTop}/${layer.drainageBottom}`],
    );
  }
  return lines;
}

/** Everything a revision was run on, as labelled lines a person compares. */
function inputLines(revision: CheckRevision): Map<string, string> {
  const lines = new Map<string, string>();
  const model = revision.groundModel;
  lines.set('Ground model', `${model.name}, revision ${model.revision}`);
  lines.set('Water table depth (m)', number(model.content.waterTableDepthM));
  lines.set('γw (kN/m³)', number(model.content.waterUnitWeightKnPerM3));
  model.content.layers.forEach((layer, index) => layerLines(layer, index).forEach(([label, value]) => lines.set(label, value)));
  const o = revision.options;
  lines.set('Loading', o.loading === 'uniform' ? `uniform Δσ = ${number(o.uniformStressIncreaseKpa)} kPa` : 'footing schedule');
  lines.set('Stress method', o.stressMethod === '2to1' ? '2V:1H' : 'Boussinesq');
  lines.set('Neighbouring footings', o.includeNeighbours ? 'included' : 'ignored');
  lines.set('Sublayers', o.sublayerMode === 'count' ? `${o.sublayerCount} per layer` : `at most ${o.sublayerMaxThicknessM} m thick`);
  lines.set('Immediate settlement', o.immediate ? 'on' : 'off');
  lines.set('Secondary compression', o.secondary ? `on, ${o.designLifeYears} years` : 'off');
  lines.set('Total settlement limit', o.totalSettlementLimitMm === null ? 'none' : `${o.totalSettlementLimitMm} mm (${LIMIT_SOURCE_LABELS[o.totalSettlementSource]})`);
  lines.set('Angular distortion limit', `1/${o.angularDistortionDenominator} (${LIMIT_SOURCE_LABELS[o.angularDistortionSource]})`);
  for (const f of revision.footings) {
    const size = f.shape === 'rectangle' ? `${number(f.widthM)} × ${number(f.lengthM)} m` : `${number(f.widthM)} m`;
    lines.set(`Footing ${f.id}`, `${f.shape} ${size}, depth ${number(f.depthM)} m, ${number(f.load)} ${f.loadKind === 'load' ? 'kN' : 'kPa'} ${f.loadBasis}, at (${number(f.xM)}, ${number(f.yM)})`);
  }
  return lines;
}

function totals(revision: CheckRevision): Map<string, number> {
  if (revision.result.kind === 'uniform') return new Map([['uniform load', revision.result.check.totalM]]);
  return new Map(revision.result.check.footings.map((f) => [f.id, f.totalM]));
}

/** Two revisions side by side: every input that differs, and each footing's settlement before and after. */
export async function compareRevisions(orgId: string, projectId: string, checkId: string, a: number, b: number): Promise<RevisionComparison> {
  const [first, second] = await Promise.all([getRevision(orgId, projectId, checkId, a, 'summary'), getRevision(orgId, projectId, checkId, b, 'summary')]);
  const linesA = inputLines(first);
  const linesB = inputLines(second);
  const labels = [...new Set([...linesA.keys(), ...linesB.keys()])];
  const totalsA = totals(first);
  const totalsB = totals(second);
  const ids = [...new Set([...totalsA.keys(), ...totalsB.keys()])];
  return {
    a: { revision: first.revision, createdAt: first.createdAt, reason: first.reason },
    b: { revision: second.revision, createdAt: second.createdAt, reason: second.reason },
    inputs: labels.filter((label) => linesA.get(label) !== linesB.get(label)).map((what) => ({ what, a: linesA.get(what) ?? '—', b: linesB.get(what) ?? '—' })),
    footings: ids.map((id) => {
      const before = totalsA.get(id) ?? null;
      const after = totalsB.get(id) ?? null;
      return { id, aTotalM: before, bTotalM: after, changeM: before === null || after === null ? null : after - before };
    }),
  };
}
