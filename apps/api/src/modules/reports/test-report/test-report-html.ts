import type { TimeDeformationReading } from '@porestack/geo-core';
import { html, trusted, type Html } from '../pdf/html.js';
import { reportPage } from '../pdf/report-page.js';
import { dateTime, fixed, longDate } from '../report-format.js';
import { REPORT_CAUTION } from '../report-caution.js';
import { compressionChart, coefficientCharts, timeCurveCharts } from './test-report-charts.js';
import { facts, incrementTable, parameterTable, specimenTable, timeCurveTable, warningsAndOverrides } from './test-report-tables.js';
import type { TestRecord } from './test-record.js';

export interface TestReportInput {
  record: TestRecord & { approval: NonNullable<TestRecord['approval']> };
  /** Readings per increment index, thinned for plotting; empty when they are no longer the analysed ones. */
  readings: ReadonlyMap<number, readonly TimeDeformationReading[]>;
  reportId: string;
  generatedAt: Date;
}

/** The reference printed on every page: test reference and version. */
export function testReportReference(record: TestReportInput['record']): string {
  return `${record.test.reference}/v${record.approval.version}`;
}

function depth(record: TestRecord): string {
  return `${fixed(record.sample.topDepthM, 2)}–${fixed(record.sample.bottomDepthM, 2)} m`;
}

function masthead(input: TestReportInput): Html {
  const { record } = input;
  return html`<div class="masthead">
  <div><div class="lab">${record.organisation.name}</div><div class="address">${record.organisation.address}</div></div>
  <div class="issue">Report ${testReportReference(record)}<br>Issued ${longDate(record.approval.approvedAt)}<br>Soil record version ${record.approval.version}</div>
</div>
<h1>Oedometer test report</h1>
<p class="subtitle">One-dimensional consolidation by incremental loading — sample ${record.sample.reference}, ${record.borehole.name}, ${depth(record)}</p>`;
}

function identification(record: TestRecord): Html {
  const b = record.borehole;
  return html`<div class="grid">
<div><h2>Project and sample</h2>${facts([
    ['Project', `${record.project.name} (${record.project.reference})`],
    ['Client', record.project.clientName],
    ['Site', record.project.siteName || '–'],
    ['Borehole', `${b.name}${b.groundLevelMOd === null ? '' : `, ground level ${fixed(b.groundLevelMOd, 2)} m OD`}`],
    ['Groundwater', b.waterTableDepthM === null ? 'not met' : `${fixed(b.waterTableDepthM, 2)} m below ground level`],
    ['Sample', record.sample.reference],
    ['Depth', depth(record)],
    ['Description', record.sample.description || '–'],
  ])}</div>
<div><h2>Test</h2>${facts([
    ['Test reference', record.test.reference],
    ['Apparatus', record.test.apparatusName || '–'],
    ['Started', longDate(record.test.startedOn)],
    ['Finished', longDate(record.test.finishedOn)],
    ['Tested by', record.test.technicianName],
    ['Increments', String(record.analysis.result.increments.length)],
    ['Method', record.organisation.methodStatement],
  ])}</div>
</div>`;
}

function approval(input: TestReportInput): Html {
  const a = input.record.approval;
  return html`<h2>Approval</h2>
<p>Approved for issue by <strong>${a.approvedByName}</strong> on ${dateTime(a.approvedAt)} as version ${a.version} of this sample’s soil record${a.supersedesVersion ? html`, replacing version ${a.supersedesVersion}` : ''}.${a.comment ? html` Reviewer’s comment: “${a.comment}”` : ''}</p>
<div class="signature"><div>Tested by<br>${input.record.test.technicianName}</div><div>Approved by<br>${a.approvedByName}</div><div>Date of approval<br>${longDate(a.approvedAt)}</div></div>`;
}

function traceability(input: TestReportInput): Html {
  const { record } = input;
  return html`<div class="keep"><h2>Traceability</h2>${facts([
    ['Soil record version id', record.approval.versionId],
    ['Analysis id and time', `${record.analysis.id}, ${dateTime(record.analysis.createdAt)}`],
    ['Inputs hash (SHA-256)', record.analysis.inputsHash],
    ['Raw readings file (SHA-256)', record.approval.uploadSha256 ?? 'not recorded'],
    ['Calculation library', `geo-core ${record.analysis.geoCoreVersion}`],
    ['Report id and time printed', `${input.reportId}, ${dateTime(input.generatedAt)}`],
  ])}
<p class="note">The results relate only to the specimen tested. This report may be reproduced only in full. Its stored copy and SHA-256 are kept with the soil record; any copy that differs from it is not this report.</p></div>`;
}

function figures(input: TestReportInput): Html {
  const r = input.record.analysis.result;
  const [cv, mv, k, ca] = coefficientCharts(r).map(trusted);
  return html`<h2 class="new-page">Compression curves</h2>
<div class="figure">${trusted(compressionChart(r, 'voidRatio'))}<div class="caption">Figure 1. Void ratio against effective vertical stress (end of each increment), with Casagrande’s construction (smoothed curve, horizontal, tangent and bisector at the point of maximum curvature, virgin line) and Pacheco Silva’s (e0 line, vertical, horizontal); the solid vertical line is the adopted σ′p.</div></div>
<div class="figure">${trusted(compressionChart(r, 'strain'))}<div class="caption">Figure 2. Vertical strain against effective vertical stress, with the same constructions.</div></div>
<h2>Coefficients against stress</h2>
<div class="pair"><div class="figure">${cv}<div class="caption">Figure 3. cv by Taylor’s and Casagrande’s methods.</div></div><div class="figure">${mv}<div class="caption">Figure 4. Coefficient of volume compressibility mv.</div></div></div>
<div class="pair"><div class="figure">${k}<div class="caption">Figure 5. Hydraulic conductivity k = cv·mv·γw.</div></div><div class="figure">${ca}<div class="caption">Figure 6. Secondary compression index Cα.</div></div></div>`;
}

function timeCurves(input: TestReportInput): Html {
  const r = input.record.analysis.result;
  const drawable = r.increments.filter((i) => (i.taylor || i.casagrande) && (input.readings.get(i.index)?.length ?? 0) > 0);
  if (drawable.length === 0) {
    return html`<h2 class="new-page">Time curves</h2><p>The time curves are not drawn: the readings stored for this test are no longer the ones this version was analysed from. The increment table gives each construction’s results.</p>`;
  }
  let figure = 6;
  return html`<h2 class="new-page">Time curves</h2>
<p class="note">Each increment’s readings against √time with Taylor’s construction (left) and against log time with Casagrande’s (right). Deformation on the readings’ own datum.</p>
${drawable.map((i) => {
    const [taylor, logTime] = timeCurveCharts(i, input.readings.get(i.index) ?? []);
    figure += 1;
    return html`<div class="figure"><h3>Increment ${i.index}: σ′ ${fixed(i.stressKpa, 1)} kPa (${i.kind})</h3><div class="pair"><div>${trusted(taylor)}</div><div>${trusted(logTime)}</div></div><div class="caption">Figure ${figure}. cv Taylor ${fixed(i.cvTaylorM2PerYr, 3)} m²/yr, cv Casagrande ${fixed(i.cvCasagrandeM2PerYr, 3)} m²/yr.</div></div>`;
  })}`;
}

/** The whole test report as one self-contained HTML document, ready to print. */
export function testReportHtml(input: TestReportInput): string {
  const { record } = input;
  const r = record.analysis.result;
  const body = html`${masthead(input)}
<div class="caution"><strong>Caution.</strong> ${REPORT_CAUTION}</div>
${identification(record)}
<h2>Specimen</h2>${specimenTable(record)}
<h2>Reported parameters</h2>${parameterTable(record)}
<h2>Warnings and overrides</h2>${warningsAndOverrides(record)}
${approval(input)}
${traceability(input)}
<h2 class="new-page">Increments</h2>${incrementTable(r)}
<h3>Time-curve constructions</h3>${timeCurveTable(r)}
${figures(input)}
${timeCurves(input)}
<div class="caution"><strong>Caution.</strong> ${REPORT_CAUTION}</div>`;
  return reportPage(`Oedometer test report ${testReportReference(record)} — sample ${record.sample.reference}`, body);
}
