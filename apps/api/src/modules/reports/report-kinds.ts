import type { ReportKind } from '@porestack/types';
import { checkReportKind } from './check-report/check-report-kind.js';
import { testReportKind } from './test-report/test-report-kind.js';

/** A report ready to print: the page, the file name and the small print of every page. */
export interface RenderedReport {
  html: string;
  fileName: string;
  headerText: string;
  footerText: string;
}

/**
 * What each kind of report needs: how to turn its subject into a printable page. The job,
 * storage, hashing, download and retry are shared, so each kind is one entry here with its own
 * render function, plus the call that queues it when its subject is issued.
 */
export interface ReportKindDefinition {
  render(input: { orgId: string; subjectId: string; reportId: string; generatedAt: Date }): Promise<RenderedReport>;
}

export const REPORT_KIND_DEFINITIONS: Record<ReportKind, ReportKindDefinition> = {
  'test-report': testReportKind,
  'settlement-check': checkReportKind,
};
