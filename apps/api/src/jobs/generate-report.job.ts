import { createHash } from 'node:crypto';
import { IsNull } from 'typeorm';
import { env } from '../config/env.js';
import { dataSource } from '../data-source.js';
import { logger } from '../http/logger.js';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { IssuedReportEntity } from '../modules/reports/issued-report.entity.js';
import { printPdf } from '../modules/reports/pdf/print-pdf.js';
import { REPORT_KIND_DEFINITIONS } from '../modules/reports/report-kinds.js';
import { REPORT_RETRY_HINT } from '../modules/reports/report.exception.js';
import { bucketName, storage } from '../storage/storage.js';
import { GENERATE_REPORT_QUEUE, type GenerateReportJobData } from './generate-report-queue.js';
import type { JobDefinition } from './job-definition.js';

export interface ReportPrinterOptions {
  /** The Chromium to print with; CHROMIUM_PATH unless given. */
  executablePath?: string;
}

/** orgs/<orgId>/reports/<reportId>.pdf: the tenant first, as for uploads. */
export function reportObjectKey(orgId: string, reportId: string): string {
  return `orgs/${orgId}/reports/${reportId}.pdf`;
}

/**
 * Prints one issued report, stores it with its SHA-256 and marks it ready — once: a report
 * that is already ready is left as it is (its row and file are final). Any failure marks
 * the report and its job failed with a message for the lab manager, who can retry.
 */
export async function generateReport(data: GenerateReportJobData, options: ReportPrinterOptions = {}): Promise<void> {
  const reports = dataSource.getRepository(IssuedReportEntity);
  const report = await reports.findOneBy({ organisationId: data.orgId, id: data.reportId });
  if (!report) throw new Error(`report ${data.reportId} not found`);
  if (report.state === 'ready') {
    await jobRuns.update(data.jobRunId, { state: 'succeeded', progress: 1, message: 'The report had already been issued.', result: { reportId: report.id, sha256: report.sha256 } });
    return;
  }
  await reports.update({ id: report.id, sha256: IsNull() }, { state: 'running', message: null });
  await jobRuns.update(data.jobRunId, { state: 'running', progress: 0.1, message: 'Gathering the approved results.' });
  try {
    const generatedAt = new Date();
    const rendered = await REPORT_KIND_DEFINITIONS[report.kind].render({ orgId: data.orgId, subjectId: report.subjectId, reportId: report.id, generatedAt });
    await jobRuns.update(data.jobRunId, { progress: 0.4, message: 'Printing the PDF.' });
    const pdf = await printPdf(rendered.html, { executablePath: options.executablePath ?? env().CHROMIUM_PATH, headerText: rendered.headerText, footerText: rendered.footerText });
    const sha256 = createHash('sha256').update(pdf).digest('hex');
    const objectKey = reportObjectKey(data.orgId, report.id);
    await jobRuns.update(data.jobRunId, { progress: 0.8, message: 'Storing the PDF.' });
    // A Buffer with its size: the S3 fake has no multipart upload, which size-less streams use.
    await storage().putObject(bucketName(), objectKey, pdf, pdf.length, { 'Content-Type': 'application/pdf', 'x-amz-meta-sha256': sha256 });
    await reports.update(
      { id: report.id, sha256: IsNull() },
      { state: 'ready', message: null, objectKey, fileName: rendered.fileName, sha256, byteSize: pdf.length, generatedAt },
    );
    await jobRuns.update(data.jobRunId, { state: 'succeeded', progress: 1, message: `Report issued (${Math.round(pdf.length / 1024)} kB).`, result: { reportId: report.id, sha256 } });
  } catch (error) {
    logger.error({ err: error, job: GENERATE_REPORT_QUEUE, reportId: report.id }, 'report generation failed');
    const message = `The report could not be printed because of a problem on our side. ${REPORT_RETRY_HINT[report.kind]} If it fails again, tell your administrator.`;
    await reports.update({ id: report.id, sha256: IsNull() }, { state: 'failed', message });
    await jobRuns.update(data.jobRunId, { state: 'failed', message, result: { reportId: report.id } });
  }
}

/** The worker's job; tests build one with another printer to see a real failure. */
export function generateReportJob(options: ReportPrinterOptions = {}): JobDefinition {
  return {
    name: GENERATE_REPORT_QUEUE,
    // The soil record page shows the report's state after approval: pick it up quickly.
    pollingIntervalSeconds: 1,
    handler: (data) => generateReport(data as GenerateReportJobData, options),
  };
}
