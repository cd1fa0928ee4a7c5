import { LIMIT_SOURCE_LABELS, type CheckRevision, type SettlementCheckResult } from '@porestack/types';
import { renderPlanView, STRIP_DRAWN_WIDTHS } from '../charts/plan-view-svg.js';
import { html, trusted, type Html } from '../pdf/html.js';
import { reportPage } from '../pdf/report-page.js';
import { REPORT_CAUTION } from '../report-caution.js';
import { dateTime, fixed, longDate } from '../report-format.js';
import { distortionText, mmText, yearsText } from './check-report-format.js';
import type { CheckReportData } from './check-report-data.js';
import { facts, footingResults, footingSchedule, groundModelTables, optionFacts, pairsOverLimit } from './check-report-tables.js';

export interface CheckReportInput {
  data: CheckReportData;
  reportId: string;
  generatedAt: Date;
}

/** The reference printed on every page: project reference, check name and revision. */
export function checkReportReference(data: CheckReportData): string {
  return `${data.project.reference} · ${data.revision.checkName} · revision ${data.revision.revision}`;
}

function masthead({ data }: CheckReportInput): Html {
  const r = data.revision;
  return html`<div class="masthead">
  <div><div class="lab">${data.organisation.name}</div><div class="address">${data.organisation.address}</div></div>
  <div class="issue">Issued ${longDate(data.issuedAt)}<br>Revision ${r.revision}</div>
</div>
<h1>Settlement check summary</h1>
<p class="subtitle">${r.checkName} — revision ${r.revision} of the check, for ${data.project.name} (${data.project.reference})</p>`;
}

function identification({ data, reportId, generatedAt }: CheckReportInput): Html {
  const r = data.revision;
  return html`<div class="grid">
<div><h2>Project</h2>${facts([
    ['Project', `${data.project.name} (${data.project.reference})`],
    ['Client', data.project.clientName],
    ['Site', data.project.siteName || '–'],
    ['Check', r.checkName],
    ['Revision', `${r.revision} — ${r.reason}`],
  ])}</div>
<div><h2>Run and issue</h2>${facts([
    ['Run by', `${r.createdBy.name}, ${dateTime(new Date(r.createdAt))}`],
    ['Issued by', `${data.issuedBy}, ${dateTime(data.issuedAt)}`],
    ['Calculation library', `geo-core ${r.geoCoreVersion}`],
    ['Revision id', r.id],
    ['Report id, printed', `${reportId}, ${dateTime(generatedAt)}`],
  ])}</div>
</div>`;
}

function headline(check: SettlementCheckResult, r: CheckRevision): Html {
  const worst = check.footings.reduce((a, b) => (b.totalM > a.totalM ? b : a), check.footings[0]!);
  const overTotal = check.footings.filter((f) => f.withinTotalLimit === false).length;
  const overPairs = check.pairs.filter((p) => !p.withinDesignLimit).length;
  const limit = r.options.totalSettlementLimitMm;
  return html`<p>Largest total settlement <strong>${mmText(worst.totalM)} mm</strong> at ${worst.id}.
${limit === null ? 'No total settlement limit was set.' : html`${overTotal} of ${check.footings.length} footings exceed the total settlement limit of ${limit} mm (${LIMIT_SOURCE_LABELS[r.options.totalSettlementSource]}).`}
${overPairs} neighbouring ${overPairs === 1 ? 'pair exceeds' : 'pairs exceed'} the angular distortion limit of 1/${r.options.angularDistortionDenominator}.</p>`;
}

function planView(check: SettlementCheckResult, r: CheckRevision): Html {
  const o = r.options;
  const svg = renderPlanView({
    description: `Plan of the ${check.footings.length} footings of ${r.checkName}, revision ${r.revision}, drawn to scale, with each footing’s total settlement`,
    footings: check.footings.map((f) => ({ id: f.id, shape: f.shape, xM: f.xM, yM: f.yM, widthM: f.widthM, lengthM: f.lengthM, totalMm: f.totalM * 1000, overTotalLimit: f.withinTotalLimit === false })),
    pairsOverLimit: check.pairs.filter((p) => !p.withinDesignLimit).map((p) => ({ from: p.footingIds[0], to: p.footingIds[1], label: distortionText(p.angularDistortion) })),
    pairLegend: `pair over the angular distortion limit 1/${o.angularDistortionDenominator} (${LIMIT_SOURCE_LABELS[o.angularDistortionSource]}), its distortion written on the line`,
    totalLegend: o.totalSettlementLimitMm === null ? 'hatched: over the total settlement limit (none was set)' : `hatched: over the total settlement limit of ${o.totalSettlementLimitMm} mm (${LIMIT_SOURCE_LABELS[o.totalSettlementSource]})`,
  });
  const strips = check.footings.some((f) => f.shape === 'strip');
  return html`<div class="figure">${trusted(svg)}<div class="caption">Figure 1. The footings in plan, to scale (x and y as in the schedule, metres).${strips ? ` Strips are drawn ${STRIP_DRAWN_WIDTHS} widths long; they continue beyond the drawing.` : ''}</div></div>`;
}

function warnings(r: CheckRevision): Html {
  const all = [...new Set([...r.warnings, ...r.result.check.warnings])];
  return all.length === 0 ? html`<p>The run raised no warnings.</p>` : html`<ul>${all.map((w) => html`<li>${w}</li>`)}</ul>`;
}

function results(r: CheckRevision): Html {
  if (r.result.kind === 'uniform') {
    const u = r.result.check;
    return html`<h2>Result</h2>${facts([
      ['Stress increase at every depth', `${fixed(u.method.stressIncreaseKpa, 1)} kPa`],
      ['Primary consolidation', `${mmText(u.primaryM)} mm`],
      ['Secondary compression', `${mmText(u.secondaryM)} mm`],
      ['Total', `${mmText(u.totalM)} mm`],
      ['t50 / t90', `${yearsText(u.timeTo50PercentYears)} / ${yearsText(u.timeTo90PercentYears)} years`],
    ])}`;
  }
  const check = r.result.check;
  const withPairs = { ...r, result: r.result };
  return html`<h2>Settlement of each footing</h2>${headline(check, r)}${footingResults(check.footings)}
<p class="note">Immediate, primary and secondary settlement at the footing’s centre; t50 and t90 are the times to 50 % and 90 % of primary consolidation, – where no layer consolidates.</p>
<h2 class="new-page">Plan</h2>${planView(check, r)}
<h2>Neighbouring pairs over the limit</h2>${pairsOverLimit(withPairs)}`;
}

/** The whole summary of an issued check revision as one self-contained HTML document, ready to print. */
export function checkReportHtml(input: CheckReportInput): string {
  const r = input.data.revision;
  const body = html`${masthead(input)}
<div class="caution"><strong>Caution.</strong> ${REPORT_CAUTION}</div>
${identification(input)}
<h2>Ground model</h2>${groundModelTables(r)}
<h2>Options</h2>${optionFacts(r)}
${r.result.kind === 'footings' ? html`<h2>Footing schedule</h2>${footingSchedule(r)}` : ''}
${results(r)}
<h2>Warnings</h2>${warnings(r)}
<h2>Method</h2><ul>${r.result.check.method.notes.map((n) => html`<li>${n}</li>`)}</ul>
<div class="caution"><strong>Caution.</strong> ${REPORT_CAUTION}</div>`;
  return reportPage(`Settlement check summary — ${checkReportReference(input.data)}`, body);
}
