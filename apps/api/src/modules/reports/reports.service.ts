import { createHash } from 'node:crypto';
import type { IssuedReport, ReportKind } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { DomainError } from '../../errors/domain-error.js';
import { enqueueReportGeneration } from '../../jobs/generate-report-queue.js';
import { logger } from '../../http/logger.js';
import { objectBytes } from '../../storage/storage.js';
import { audit } from '../audit/audit.service.js';
import { IssuedReportEntity } from './issued-report.entity.js';
import { reportNotFailed, reportNotReady } from './report.exception.js';

export function toIssuedReport(row: IssuedReportEntity): IssuedReport {
  return {
    id: row.id,
    kind: row.kind,
    state: row.state,
    message: row.message,
    jobId: row.jobRunId,
    fileName: row.fileName,
    sha256: row.sha256,
    byteSize: row.byteSize,
    generatedAt: row.generatedAt ? row.generatedAt.toISOString() : null,
  };
}

/**
 * Records that a report of this subject is to be issued and queues its generation, in the
 * caller's transaction (for a test report: the approval's).
 */
export async function queueReport(
  manager: EntityManager,
  input: { orgId: string; kind: ReportKind; subjectId: string; testId: string | null; requestedById: string },
): Promise<IssuedReportEntity> {
  const reports = manager.getRepository(IssuedReportEntity);
  const report = await reports.save(
    reports.create({ organisationId: input.orgId, kind: input.kind, subjectId: input.subjectId, testId: input.testId, state: 'queued', message: null }),
  );
  report.jobRunId = await enqueueReportGeneration({ orgId: input.orgId, reportId: report.id, testId: input.testId, requestedById: input.requestedById }, manager);
  await reports.update({ id: report.id }, { jobRunId: report.jobRunId });
  return report;
}

export async function findReport(orgId: string, kind: ReportKind, subjectId: string): Promise<IssuedReportEntity> {
  const row = await dataSource.getRepository(IssuedReportEntity).findOneBy({ organisationId: orgId, kind, subjectId });
  if (!row) throw new DomainError('not_found', 'No report has been issued for this version: it was approved before reports were printed. A lab manager can print it from the soil record page.');
  return row;
}

/**
 * The stored PDF, checked against the hash recorded when it was issued: a file that no longer
 * matches is never handed out as the report.
 */
export async function reportFile(orgId: string, kind: ReportKind, subjectId: string): Promise<{ bytes: Buffer; fileName: string; sha256: string }> {
  const row = await findReport(orgId, kind, subjectId);
  if (row.state !== 'ready' || !row.objectKey || !row.sha256) throw reportNotReady(row.state, kind);
  const bytes = await objectBytes(row.objectKey);
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  if (sha256 !== row.sha256) {
    logger.error({ reportId: row.id, expected: row.sha256, got: sha256 }, 'stored report does not match its recorded hash');
    throw new Error(`stored report ${row.id} does not match its recorded SHA-256`);
  }
  return { bytes, fileName: row.fileName ?? `${row.id}.pdf`, sha256 };
}

/**
 * A lab manager asks again for a report whose generation failed — or, for a version approved
 * before reports were issued (it has none), for its first one.
 */
export async function retryReport(orgId: string, kind: ReportKind, subjectId: string, actor: { id: string }, testId: string | null): Promise<IssuedReport> {
  return dataSource.transaction(async (manager) => {
    const reports = manager.getRepository(IssuedReportEntity);
    const row = await reports.findOne({ where: { organisationId: orgId, kind, subjectId }, lock: { mode: 'pessimistic_write' } });
    if (!row) {
      const created = await queueReport(manager, { orgId, kind, subjectId, testId, requestedById: actor.id });
      await audit.record({ organisationId: orgId, actorUserId: actor.id, action: 'report.requested', objectType: 'issued_report', objectId: created.id, details: { kind, subjectId } }, manager);
      return toIssuedReport(created);
    }
    if (row.state !== 'failed') throw reportNotFailed(row.state);
    const jobRunId = await enqueueReportGeneration({ orgId, reportId: row.id, testId: row.testId, requestedById: actor.id }, manager);
    await reports.update({ id: row.id }, { state: 'queued', message: null, jobRunId });
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'report.retried', objectType: 'issued_report', objectId: row.id, details: { kind, subjectId, previousFailure: row.message } },
      manager,
    );
    return toIssuedReport({ ...row, state: 'queued', message: null, jobRunId });
  });
}
