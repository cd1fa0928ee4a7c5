import type { TimeDeformationReading } from '@porestack/geo-core';
import { loadIncrements } from '../../readings/readings.service.js';
import type { ReportKindDefinition } from '../report-kinds.js';
import { REPORT_CAUTION_SHORT } from '../report-caution.js';
import { safeReportFileName } from '../report-file-name.js';
import { testReportHtml, testReportReference } from './test-report-html.js';
import { loadVersionRecord } from './test-record.js';
import { thinReadings } from './thin-readings.js';

/** The PDF test report of one approved soil record version (the subject is the version id). */
export const testReportKind: ReportKindDefinition = {
  async render({ orgId, subjectId, reportId, generatedAt }) {
    const record = await loadVersionRecord(orgId, subjectId);
    const approval = record.approval;
    if (!approval) throw new Error(`soil record version ${subjectId} has no approval`);
    const readings = new Map<number, readonly TimeDeformationReading[]>();
    if (record.readingsMatchAnalysis) {
      for (const increment of await loadIncrements(orgId, record.test.id)) readings.set(increment.index, thinReadings(increment.readings));
    }
    const withApproval = { ...record, approval };
    const reference = testReportReference(withApproval);
    return {
      html: testReportHtml({ record: withApproval, readings, reportId, generatedAt }),
      fileName: safeReportFileName(`oedometer-report-${record.test.reference}-v${approval.version}.pdf`),
      headerText: `${record.organisation.name} · Oedometer test report ${reference} · ${record.project.name} · ${record.borehole.name} sample ${record.sample.reference}`,
      footerText: REPORT_CAUTION_SHORT,
    };
  },
};
