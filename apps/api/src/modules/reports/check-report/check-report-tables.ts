import { LIMIT_SOURCE_LABELS, type CheckRevision, type FootingSettlementResult, type GroundModelLayer, type ResolvedValue } from '@porestack/types';
import { sourceLabel } from '../../settlement-checks/source-label.js';
import { html, type Html } from '../pdf/html.js';
import { fixed, NOT_DETERMINED, significant } from '../report-format.js';
import { distortionText, mmText, yearsText } from './check-report-format.js';

/** Marks a value typed by the designer, not taken from a record or a set; the key is printed under the table. */
export const HAND_MARK = '†';

function resolved(v: ResolvedValue | undefined, format: (n: number) => string): Html {
  if (!v || v.value === null) return html`${NOT_DETERMINED}`;
  return html`${format(v.value)}${v.origin === 'hand' ? html` ${HAND_MARK}` : ''}`;
}

export function facts(rows: ReadonlyArray<readonly [string, string | Html]>): Html {
  return html`<table class="facts"><tbody>${rows.map(([k, v]) => html`<tr><th scope="row">${k}</th><td>${v}</td></tr>`)}</tbody></table>`;
}

export function optionFacts(r: CheckRevision): Html {
  const o = r.options;
  return facts([
    ['Loading', o.loading === 'uniform' ? `one stress increase of ${fixed(o.uniformStressIncreaseKpa, 1)} kPa at every depth` : `${r.footings.length} footings of the schedule below`],
    ['Stress increase under a footing', o.stressMethod === '2to1' ? '2V:1H spread' : 'Boussinesq (elastic half-space)'],
    ['Neighbouring footings', o.includeNeighbours ? 'their stress increase is added' : 'left out'],
    ['Sublayers', o.sublayerMode === 'count' ? `${o.sublayerCount} per layer` : `at most ${fixed(o.sublayerMaxThicknessM, 2)} m thick`],
    ['Settlement evaluated at', o.evaluationPoints === 'centre' ? 'the centre of each footing' : 'the centre and corners of each footing'],
    ['Immediate settlement', o.immediate ? `included${o.applyFoxDepthFactor ? ', with Fox’s depth factor' : ''}` : 'left out'],
    ['Secondary compression', o.secondary ? `included over a design life of ${o.designLifeYears} years` : 'left out'],
    ['Total settlement limit', o.totalSettlementLimitMm === null ? 'none set' : `${o.totalSettlementLimitMm} mm — ${LIMIT_SOURCE_LABELS[o.totalSettlementSource]}`],
    ['Angular distortion limit', `1/${o.angularDistortionDenominator} — ${LIMIT_SOURCE_LABELS[o.angularDistortionSource]}`],
    ['Neighbours judged within', o.pairMaxDistanceM === null ? 'any distance' : `${fixed(o.pairMaxDistanceM, 1)} m centre to centre`],
  ]);
}

function layerRow(l: GroundModelLayer, index: number): Html {
  return html`<tr><td class="num">${index + 1}</td><td>${l.name}</td><td>${l.kind}</td><td class="num">${fixed(l.topDepthM, 2)}–${fixed(l.bottomDepthM, 2)}</td>
<td class="num">${fixed(l.unitWeightKnPerM3, 1)} / ${fixed(l.saturatedUnitWeightKnPerM3, 1)}</td><td class="num">${l.elasticModulusKpa === null ? NOT_DETERMINED : fixed(l.elasticModulusKpa, 0)}</td>
<td class="num">${fixed(l.poissonRatio, 2)}</td><td>${l.drainageTop} / ${l.drainageBottom}</td><td>${sourceLabel(l.source)}</td></tr>`;
}

function carriedBy(carry: 'ocr' | 'pop' | 'constant'): string {
  return carry === 'ocr' ? 'constant OCR' : carry === 'pop' ? 'constant σ′p − σ′v0' : 'constant σ′p';
}

export function groundModelTables(r: CheckRevision): Html {
  const content = r.groundModel.content;
  const compressible = content.layers.flatMap((l, i) => (l.parameters ? [{ l, i, p: l.parameters }] : []));
  const anyHand = compressible.some(({ p }) => [p.e0, p.cc, p.recompressionIndex, p.preconsolidationKpa, p.ocr, p.cvM2PerYr, p.cAlpha].some((v) => v.value !== null && v.origin === 'hand'));
  return html`<p>“${r.groundModel.name}”, revision ${r.groundModel.revision}. Ground level ${fixed(content.groundLevelM, 2)} m; water table ${fixed(content.waterTableDepthM, 2)} m below ground level; γw ${fixed(content.waterUnitWeightKnPerM3, 2)} kN/m³. Depths in metres below ground level.</p>
<table class="dense"><thead><tr><th class="num">#</th><th>Layer</th><th>Kind</th><th class="num">Depth (m)</th><th class="num">γ / γsat (kN/m³)</th><th class="num">E′ (kPa)</th><th class="num">ν</th><th>Drainage top / bottom</th><th>Parameters from</th></tr></thead>
<tbody>${content.layers.map(layerRow)}</tbody></table>
${compressible.length === 0 ? '' : html`<h3>Compressible layers</h3>
<table class="dense"><thead><tr><th>Layer</th><th class="num">e0</th><th class="num">Cc</th><th class="num">Cr or Cs</th><th class="num">σ′p (kPa)</th><th>σ′p carried by</th><th class="num">OCR</th><th class="num">cv (m²/yr)</th><th>cv taken as</th><th class="num">Cα</th></tr></thead>
<tbody>${compressible.map(({ l, p }) => html`<tr><td>${l.name}</td><td class="num">${resolved(p.e0, (n) => n.toFixed(3))}</td><td class="num">${resolved(p.cc, (n) => n.toFixed(3))}</td>
<td class="num">${resolved(p.recompressionIndex, (n) => `${n.toFixed(3)}${p.recompressionIndex.kind ? ` (${p.recompressionIndex.kind})` : ''}`)}</td>
<td class="num">${resolved(p.preconsolidationKpa, (n) => `${n.toFixed(0)}${p.preconsolidationDepthM === null ? '' : ` at ${p.preconsolidationDepthM.toFixed(2)} m`}`)}</td><td>${carriedBy(p.preconsolidationCarry)}</td>
<td class="num">${resolved(p.ocr, (n) => n.toFixed(2))}</td><td class="num">${resolved(p.cvM2PerYr, (n) => significant(n, 3))}</td><td>${p.cvM2PerYr.basis}</td><td class="num">${resolved(p.cAlpha, (n) => n.toFixed(4))}</td></tr>`)}</tbody></table>
${anyHand ? html`<p class="note">${HAND_MARK} entered by hand: typed by the designer, not taken from an approved soil record or a characteristic set.</p>` : ''}`}`;
}

export function footingSchedule(r: CheckRevision): Html {
  const asRun = new Map(r.footingsAsRun.map((f) => [f.id, f]));
  return html`<table class="dense"><thead><tr><th>Mark</th><th>Shape</th><th class="num">B (m)</th><th class="num">L (m)</th><th class="num">Depth (m)</th><th class="num">x (m)</th><th class="num">y (m)</th><th class="num">Load as entered</th><th class="num">Gross q (kPa)</th><th class="num">Soil removed (kPa)</th><th class="num">Net q (kPa)</th></tr></thead>
<tbody>${r.footings.map((f) => {
    const run = asRun.get(f.id);
    const unit = f.loadKind === 'pressure' ? 'kPa' : f.shape === 'strip' ? 'kN/m' : 'kN';
    return html`<tr><td>${f.id}</td><td>${f.shape}</td><td class="num">${fixed(f.widthM, 2)}</td><td class="num">${f.shape === 'rectangle' ? fixed(f.lengthM, 2) : NOT_DETERMINED}</td><td class="num">${fixed(f.depthM, 2)}</td>
<td class="num">${fixed(f.xM, 2)}</td><td class="num">${fixed(f.yM, 2)}</td><td class="num">${fixed(f.load, 1)} ${unit} ${f.loadBasis}</td><td class="num">${fixed(run?.grossPressureKpa, 1)}</td><td class="num">${fixed(run?.overburdenKpa, 1)}</td><td class="num">${fixed(run?.netPressureKpa, 1)}</td></tr>`;
  })}</tbody></table>`;
}

function limitWords(f: FootingSettlementResult): string {
  return f.withinTotalLimit === null ? 'no limit' : f.withinTotalLimit ? 'within' : 'OVER';
}

export function footingResults(footings: readonly FootingSettlementResult[]): Html {
  return html`<table class="dense"><thead><tr><th>Mark</th><th class="num">Net q (kPa)</th><th class="num">Immediate (mm)</th><th class="num">Primary (mm)</th><th class="num">Secondary (mm)</th><th class="num">Total (mm)</th><th class="num">t50 (years)</th><th class="num">t90 (years)</th><th>Total limit</th></tr></thead>
<tbody>${footings.map((f) => html`<tr><td>${f.id}</td><td class="num">${fixed(f.pressureKpa, 1)}</td><td class="num">${mmText(f.immediateM)}</td><td class="num">${mmText(f.primaryM)}</td><td class="num">${mmText(f.secondaryM)}</td>
<td class="num"><strong>${mmText(f.totalM)}</strong></td><td class="num">${yearsText(f.timeTo50PercentYears)}</td><td class="num">${yearsText(f.timeTo90PercentYears)}</td><td>${limitWords(f)}</td></tr>`)}</tbody></table>`;
}

export function pairsOverLimit(r: CheckRevision & { result: { kind: 'footings' } }): Html {
  const pairs = r.result.check.pairs;
  const over = pairs.filter((p) => !p.withinDesignLimit);
  const limit = `1/${r.options.angularDistortionDenominator} (${LIMIT_SOURCE_LABELS[r.options.angularDistortionSource]})`;
  if (over.length === 0) return html`<p>None of the ${pairs.length} neighbouring pairs judged exceeds the angular distortion limit of ${limit}.</p>`;
  return html`<p>${over.length} of the ${pairs.length} neighbouring pairs judged exceed the angular distortion limit of ${limit}.</p>
<table class="dense"><thead><tr><th>Pair</th><th class="num">Distance (m)</th><th class="num">Differential (mm)</th><th class="num">Angular distortion</th><th>Against the published limits</th></tr></thead>
<tbody>${over.map((p) => html`<tr><td>${p.footingIds[0]} – ${p.footingIds[1]}</td><td class="num">${fixed(p.distanceM, 2)}</td><td class="num">${mmText(p.differentialSettlementM)}</td><td class="num">${distortionText(p.angularDistortion)}</td><td>${p.verdicts.map((v) => v.statement).join(' ')}</td></tr>`)}</tbody></table>`;
}
