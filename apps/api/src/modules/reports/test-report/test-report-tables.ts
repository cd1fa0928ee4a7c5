import type { ConsolidationTestResult } from '@porestack/types';
import { representativeSecondaryIndex } from '../../analyses/key-parameters.js';
import { html, type Html } from '../pdf/html.js';
import { fixed, percent, scientific, significant, NOT_DETERMINED } from '../report-format.js';
import type { TestRecord } from './test-record.js';

const KIND_WORDS = { loading: 'load', unloading: 'unload', reloading: 'reload' } as const;
const ADOPTED_FROM_WORDS = { pick: 'set by the reviewer', casagrande: 'Casagrande', 'pacheco-silva': 'Pacheco Silva' } as const;

function facts(rows: Array<[string, string | Html]>): Html {
  return html`<table class="facts"><tbody>${rows.map(([label, value]) => html`<tr><th scope="row">${label}</th><td>${value}</td></tr>`)}</tbody></table>`;
}

/** Specimen dimensions, masses and state at the start and at the end of the test. */
export function specimenTable(record: TestRecord): Html {
  const r = record.analysis.result;
  const s = record.test.specimen;
  const area = r.specimen.areaMm2;
  const h0 = r.specimen.initialHeightMm;
  const last = r.increments[r.increments.length - 1];
  const hf = last?.heightEndMm ?? null;
  const dry = r.specimen.dryMassG;
  const volumeCm3 = (h: number | null) => (h === null ? null : (area * h) / 1000);
  const v0 = volumeCm3(h0);
  const vf = volumeCm3(hf);
  const w0 = s.initialWaterContent ?? (s.wetMassG !== null ? (s.wetMassG - dry) / dry : null);
  const row = (label: string, before: string, after: string) => html`<tr><th scope="row">${label}</th><td class="num">${before}</td><td class="num">${after}</td></tr>`;
  return html`<table class="dense">
<thead><tr><th>Quantity</th><th class="num">Before test</th><th class="num">After test</th></tr></thead>
<tbody>
${row('Height (mm)', fixed(h0, 3), fixed(hf, 3))}
${row('Diameter (mm)', fixed(s.diameterMm, 2), fixed(s.diameterMm, 2))}
${row('Area (mm²)', fixed(area, 1), fixed(area, 1))}
${row('Volume (cm³)', fixed(v0, 2), fixed(vf, 2))}
${row('Wet mass (g)', fixed(s.wetMassG, 2), NOT_DETERMINED)}
${row(`Dry mass (g)${r.specimen.dryMassSource === 'from-wet-mass' ? ', from wet mass and water content' : ''}`, fixed(dry, 2), fixed(dry, 2))}
${row('Water content (%)', w0 === null ? NOT_DETERMINED : (w0 * 100).toFixed(1), s.finalWaterContent === null ? NOT_DETERMINED : (s.finalWaterContent * 100).toFixed(1))}
${row('Bulk density (Mg/m³)', s.wetMassG !== null && v0 ? fixed(s.wetMassG / v0, 3) : NOT_DETERMINED, s.finalWaterContent !== null && vf ? fixed((dry * (1 + s.finalWaterContent)) / vf, 3) : NOT_DETERMINED)}
${row('Dry density (Mg/m³)', v0 ? fixed(dry / v0, 3) : NOT_DETERMINED, vf ? fixed(dry / vf, 3) : NOT_DETERMINED)}
${row('Particle density Gs (–)', fixed(s.specificGravity, 3), fixed(s.specificGravity, 3))}
${row('Height of solids Hs (mm)', fixed(r.specimen.heightOfSolidsMm, 3), fixed(r.specimen.heightOfSolidsMm, 3))}
${row('Void ratio e (–)', fixed(r.initialVoidRatio, 3), fixed(r.specimen.finalVoidRatio, 3))}
${row('Degree of saturation (%)', percent(r.specimen.initialDegreeOfSaturation).replace(' %', ''), percent(r.specimen.finalDegreeOfSaturation).replace(' %', ''))}
</tbody></table>
<p class="note">Drainage: ${s.drainage === 'double' ? 'top and bottom (double drainage; drainage path half the height at 50 % consolidation)' : 'one face (single drainage; drainage path the full height)'}.</p>`;
}

/** The reported parameters, with both σ′p constructions and the one adopted. */
export function parameterTable(record: TestRecord): Html {
  const r = record.analysis.result;
  const p = r.preconsolidation;
  const cvLoading = r.increments.filter((i) => i.kind !== 'unloading');
  const cvValues = (pick: (i: (typeof cvLoading)[number]) => number | null) => cvLoading.map(pick).filter((v): v is number => v !== null && Number.isFinite(v) && v > 0);
  const range = (values: number[]) => (values.length ? `${significant(Math.min(...values))} – ${significant(Math.max(...values))}` : NOT_DETERMINED);
  const fit = (f: { rSquared: number; incrementIndices: readonly number[]; source: string } | null) =>
    f ? `increments ${f.incrementIndices.join(', ')}; R² ${f.rSquared.toFixed(3)}${f.source === 'pick' ? '; line chosen by the reviewer' : ''}` : '';
  const sq = r.sampleQuality;
  const stressSource = record.sample.inSituStressSource === 'entered' ? 'as entered for the sample' : record.sample.inSituStressSource === 'estimated' ? 'estimated from depth, unit weight and water table' : '';
  const rows: Array<{ name: string; symbol: string; value: string; unit: string; basis: string; adopted?: boolean }> = [
    { name: 'Initial void ratio', symbol: 'e0', value: fixed(r.initialVoidRatio, 3), unit: '–', basis: 'from height of solids' },
    { name: 'Compression index', symbol: 'Cc', value: fixed(r.compressionIndex, 3), unit: '–', basis: fit(r.compressionFit) },
    { name: 'Compression ratio Cc/(1+e0)', symbol: 'CR', value: fixed(r.compressionRatio, 3), unit: '–', basis: '' },
    { name: 'Recompression index', symbol: 'Cr', value: fixed(r.recompressionIndex, 3), unit: '–', basis: r.recompressionFit ? `${r.recompressionFit.branch === 'reloading' ? 'reload branch' : 'first loading below σ′p'}; ${fit(r.recompressionFit)}` : '' },
    { name: 'Recompression ratio Cr/(1+e0)', symbol: 'RR', value: fixed(r.recompressionRatio, 3), unit: '–', basis: '' },
    { name: 'Swell index', symbol: 'Cs', value: fixed(r.swellIndex, 3), unit: '–', basis: fit(r.swellFit) },
    { name: 'Preconsolidation stress, Casagrande', symbol: 'σ′p', value: fixed(p.casagrandeKpa, 0), unit: 'kPa', basis: p.casagrande ? 'bisector at the point of maximum curvature (convention below)' : 'construction not possible' },
    { name: 'Preconsolidation stress, Pacheco Silva', symbol: 'σ′p', value: fixed(p.pachecoSilvaKpa, 0), unit: 'kPa', basis: p.pachecoSilva ? 'e0 line, virgin line' : 'construction not possible' },
    { name: 'Preconsolidation stress, adopted', symbol: 'σ′p', value: fixed(p.adoptedKpa, 0), unit: 'kPa', basis: p.adoptedFrom ? ADOPTED_FROM_WORDS[p.adoptedFrom] : 'not determined', adopted: true },
    { name: 'In-situ vertical effective stress', symbol: 'σ′v0', value: fixed(r.inSituVerticalEffectiveStressKpa, 1), unit: 'kPa', basis: stressSource },
    { name: 'Overconsolidation ratio σ′p/σ′v0', symbol: 'OCR', value: fixed(r.overconsolidationRatio, 2), unit: '–', basis: '' },
    { name: 'Coefficient of consolidation, Taylor', symbol: 'cv', value: range(cvValues((i) => i.cvTaylorM2PerYr)), unit: 'm²/yr', basis: 'range over loading increments' },
    { name: 'Coefficient of consolidation, Casagrande', symbol: 'cv', value: range(cvValues((i) => i.cvCasagrandeM2PerYr)), unit: 'm²/yr', basis: 'range over loading increments' },
    { name: 'Secondary compression index', symbol: 'Cα', value: fixed(representativeSecondaryIndex(r), 4), unit: '–', basis: 'median of loading increments beyond σ′p' },
  ];
  return html`<table class="dense">
<thead><tr><th>Parameter</th><th>Symbol</th><th class="num">Value</th><th>Unit</th><th>Basis</th></tr></thead>
<tbody>${rows.map((row) => html`<tr class="${row.adopted ? 'adopted' : ''}"><td>${row.name}</td><td>${row.symbol}</td><td class="num">${row.value}</td><td>${row.unit}</td><td>${row.basis}</td></tr>`)}</tbody>
</table>
${p.casagrande ? html`<p class="note">Curvature convention of the Casagrande construction: ${p.casagrande.curvatureConvention}</p>` : ''}
<h3>Sample quality</h3>
${
  sq
    ? html`<p>Δe/e0 at σ′v0 = ${fixed(sq.voidRatioChangeRatio, 3)} (e at σ′v0 ${fixed(sq.voidRatioAtInSituStress, 3)}): <strong>${sq.category ?? 'not classified'}</strong>${sq.overconsolidationBand ? html` for OCR ${sq.overconsolidationBand}` : ''}, after ${sq.method}.</p>`
    : html`<p>Sample quality was not assessed (it needs the in-situ stress and σ′p).</p>`
}`;
}

/** One row per increment: stress, void ratio, strain, cv by both methods, mv, k, Cα. */
export function incrementTable(r: ConsolidationTestResult): Html {
  return html`<table class="dense">
<thead><tr><th class="num">No.</th><th class="num">σ′ (kPa)</th><th>Stage</th><th class="num">H (mm)</th><th class="num">e</th><th class="num">ε (%)</th><th class="num">t90 (min)</th><th class="num">cv Taylor (m²/yr)</th><th class="num">t50 (min)</th><th class="num">cv Casagrande (m²/yr)</th><th class="num">mv (1/MPa)</th><th class="num">k (m/s)</th><th class="num">Cα</th></tr></thead>
<tbody>${r.increments.map(
    (i) => html`<tr><td class="num">${i.index}</td><td class="num">${fixed(i.stressKpa, 1)}</td><td>${KIND_WORDS[i.kind]}</td><td class="num">${fixed(i.heightEndMm, 3)}</td><td class="num">${fixed(i.voidRatioEnd, 4)}</td><td class="num">${fixed(i.strainEnd * 100, 2)}</td><td class="num">${significant(i.taylor?.t90Min)}</td><td class="num">${significant(i.cvTaylorM2PerYr)}</td><td class="num">${significant(i.casagrande?.t50Min)}</td><td class="num">${significant(i.cvCasagrandeM2PerYr)}</td><td class="num">${significant(i.mvPerMPa)}</td><td class="num">${scientific(i.hydraulicConductivityMPerS, 2)}</td><td class="num">${fixed(i.secondaryCompressionIndex, 4)}</td></tr>`,
  )}</tbody></table>
<p class="note">Void ratio, strain and height at the end of each increment, after subtracting the apparatus deflection. mv over the increment from the previous end point; k = cv·mv·γw (γw = 9.81 kN/m³) with Taylor’s cv where available. “–”: not determined (see the warnings).</p>`;
}

/** The time-curve constructions behind each cv: corrected zero, end of primary, drainage path. */
export function timeCurveTable(r: ConsolidationTestResult): Html {
  const source = (s: string | undefined) => (s === 'pick' ? ' *' : '');
  return html`<table class="dense">
<thead><tr><th class="num">No.</th><th class="num">σ′ (kPa)</th><th class="num">Readings</th><th class="num">Taylor d0 (mm)</th><th class="num">d90 (mm)</th><th class="num">d100 (mm)</th><th class="num">Hdr (mm)</th><th class="num">Casagrande d0 (mm)</th><th class="num">d50 (mm)</th><th class="num">d100 (mm)</th><th class="num">Hdr (mm)</th></tr></thead>
<tbody>${r.increments.map((i) => {
    const t = i.taylor;
    const c = i.casagrande;
    return html`<tr><td class="num">${i.index}</td><td class="num">${fixed(i.stressKpa, 1)}</td><td class="num">${i.readingCount}</td><td class="num">${fixed(t?.d0Mm, 4)}${source(t?.d0Source)}</td><td class="num">${fixed(t?.d90Mm, 4)}${t?.t90Source === 'pick' ? ' *' : ''}</td><td class="num">${fixed(t?.d100Mm, 4)}</td><td class="num">${fixed(t?.drainagePathMm, 3)}</td><td class="num">${fixed(c?.d0Mm, 4)}${source(c?.d0Source)}</td><td class="num">${fixed(c?.d50Mm, 4)}${c?.t50Source === 'pick' ? ' *' : ''}</td><td class="num">${fixed(c?.d100Mm, 4)}${source(c?.d100Source)}</td><td class="num">${fixed(c?.drainagePathMm, 3)}</td></tr>`;
  })}</tbody></table>
<p class="note">Deformations on the readings’ own datum (before the apparatus correction), as drawn on the time curves. * value set by the reviewer (see overrides).</p>`;
}

const PICK_WORDS: Record<string, string> = {
  preconsolidationStressKpa: 'Preconsolidation stress σ′p (kPa)',
  virginLine: 'Increments of the virgin compression line',
  'taylor.t90Min': 't90, Taylor (min)',
  'taylor.d0Mm': 'Corrected zero d0, Taylor (mm)',
  'casagrande.t50Min': 't50, Casagrande (min)',
  'casagrande.d0Mm': 'Corrected zero d0, Casagrande (mm)',
  'casagrande.d100Mm': 'End of primary d100, Casagrande (mm)',
};

/** Every warning of the analysis and every value a reviewer set by hand, with the stated reason. */
export function warningsAndOverrides(record: TestRecord): Html {
  const r = record.analysis.result;
  const picks = r.picksApplied;
  return html`<h3>Warnings</h3>
${
  r.warnings.length === 0
    ? html`<p>The analysis raised no warnings.</p>`
    : html`<ul>${r.warnings.map((w) => html`<li>${w.incrementIndex === null ? 'Test' : `Increment ${w.incrementIndex}`}: ${w.message}</li>`)}</ul>`
}
<h3>Values set by the reviewer</h3>
${
  picks.length === 0
    ? html`<p>None: every construction is the automatic one.</p>`
    : html`<table class="dense"><thead><tr><th>Value</th><th>Increment</th><th>Set to</th><th>Applied</th></tr></thead><tbody>${picks.map(
        (p) =>
          html`<tr><td>${PICK_WORDS[p.target] ?? p.target}</td><td>${p.incrementIndex ?? '–'}</td><td>${typeof p.value === 'number' ? significant(p.value, 4) : `increments ${p.value.firstIncrementIndex} to ${p.value.lastIncrementIndex}`}</td><td>${p.applied ? 'yes' : 'no (see warnings)'}</td></tr>`,
      )}</tbody></table>
<p><strong>Reason given:</strong> ${record.analysis.pickReason ?? 'none recorded'}</p>`
}`;
}

export { facts };
