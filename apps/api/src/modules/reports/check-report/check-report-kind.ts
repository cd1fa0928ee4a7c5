import type { ReportKindDefinition } from '../report-kinds.js';
import { REPORT_CAUTION_SHORT } from '../report-caution.js';
import { safeReportFileName } from '../report-file-name.js';
import { loadCheckReportData } from './check-report-data.js';
import { checkReportHtml, checkReportReference } from './check-report-html.js';

/** The PDF summary of an issued settlement check revision (the subject is the revision id). */
export const checkReportKind: ReportKindDefinition = {
  async render({ orgId, subjectId, reportId, generatedAt }) {
    const data = await loadCheckReportData(orgId, subjectId);
    return {
      html: checkReportHtml({ data, reportId, generatedAt }),
      fileName: safeReportFileName(`settlement-check-${data.project.reference}-${data.revision.checkName}-r${data.revision.revision}.pdf`),
      headerText: `${data.organisation.name} · Settlement check summary · ${checkReportReference(data)}`,
      footerText: REPORT_CAUTION_SHORT,
    };
  },
};
