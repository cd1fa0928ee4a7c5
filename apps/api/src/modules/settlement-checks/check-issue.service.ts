import type { IssuedCheck } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import { IssuedReportEntity } from '../reports/issued-report.entity.js';
import { queueReport, retryReport, toIssuedReport } from '../reports/reports.service.js';
import { longDate } from '../reports/report-format.js';
import { CheckRevisionEntity } from './check-revision.entity.js';
import { SettlementCheckEntity } from './settlement-check.entity.js';

/** The audit action that records who issued a revision; the PDF prints its actor and time. */
export const CHECK_ISSUED_ACTION = 'settlement_check.issued';

type Row = Record<string, unknown>;

/**
 * Issued revisions of checks with who issued them: the issuer is the actor of the audit entry
 * written in the same transaction as the report row, so it cannot be missing or differ.
 */
const ISSUED_SQL = `
  SELECT c.id AS check_id, c.name AS check_name, r.revision, r.id AS revision_id, ir.id AS report_id,
         a.actor_user_id AS issued_by_id, u.name AS issued_by_name, a.at AS issued_at
    FROM issued_reports ir
    JOIN settlement_check_revisions r ON r.id = ir.subject_id AND r.organisation_id = ir.organisation_id
    JOIN settlement_checks c ON c.id = r.check_id
    JOIN audit_entries a ON a.organisation_id = ir.organisation_id AND a.action = '${CHECK_ISSUED_ACTION}' AND a.details->>'reportId' = ir.id::text
    JOIN users u ON u.id = a.actor_user_id
   WHERE ir.organisation_id = $1 AND ir.kind = 'settlement-check'`;

async function issuedRows(sqlTail: string, params: unknown[]): Promise<IssuedCheck[]> {
  const rows = (await dataSource.query(`${ISSUED_SQL} ${sqlTail}`, params)) as Row[];
  if (rows.length === 0) return [];
  const reports = await dataSource.getRepository(IssuedReportEntity).findBy(rows.map((row) => ({ id: row['report_id'] as string })));
  const byId = new Map(reports.map((report) => [report.id, report]));
  return rows.map((row) => ({
    checkId: row['check_id'] as string,
    checkName: row['check_name'] as string,
    revision: Number(row['revision']),
    revisionId: row['revision_id'] as string,
    issuedBy: { id: row['issued_by_id'] as string, name: row['issued_by_name'] as string },
    issuedAt: (row['issued_at'] as Date).toISOString(),
    report: toIssuedReport(byId.get(row['report_id'] as string)!),
  }));
}

/** Every issued revision of the project's checks, newest first. */
export function listIssuedChecks(orgId: string, projectId: string): Promise<IssuedCheck[]> {
  return issuedRows('AND c.project_id = $2 ORDER BY a.at DESC', [orgId, projectId]);
}

/** One issued revision; 404 with a plain reason when the revision exists but was never issued. */
export async function findIssuedCheck(orgId: string, projectId: string, checkId: string, revision: number): Promise<IssuedCheck> {
  const [found] = await issuedRows('AND c.project_id = $2 AND c.id = $3 AND r.revision = $4', [orgId, projectId, checkId, revision]);
  if (found) return found;
  await revisionIdOf(orgId, projectId, checkId, revision);
  throw new DomainError('not_found', `Revision ${revision} of this check has not been issued, so it has no PDF summary. A designer of the project can issue it from the check’s results.`);
}

async function revisionIdOf(orgId: string, projectId: string, checkId: string, revision: number): Promise<string> {
  const check = await dataSource.getRepository(SettlementCheckEntity).findOneBy({ organisationId: orgId, projectId, id: checkId });
  if (!check) throw new NotFoundError('settlement check');
  const row = await dataSource.getRepository(CheckRevisionEntity).findOne({ where: { organisationId: orgId, checkId, revision }, select: { id: true } });
  if (!row) throw new NotFoundError('revision of this check');
  return row.id;
}

/**
 * A designer issues one revision of a check: its PDF summary is queued in the same transaction
 * (the report row, its job and the audit entry commit together), once. The check row is locked
 * so two clicks at once issue it once; a revision already issued is refused with a plain answer.
 */
export async function issueRevision(orgId: string, projectId: string, checkId: string, revision: number, actor: { id: string }): Promise<IssuedCheck> {
  await dataSource.transaction(async (manager) => {
    const check = await manager.getRepository(SettlementCheckEntity).findOne({ where: { organisationId: orgId, projectId, id: checkId }, lock: { mode: 'pessimistic_write' } });
    if (!check) throw new NotFoundError('settlement check');
    const row = await manager.getRepository(CheckRevisionEntity).findOne({ where: { organisationId: orgId, checkId, revision }, select: { id: true } });
    if (!row) throw new NotFoundError('revision of this check');
    const existing = await manager.getRepository(IssuedReportEntity).findOneBy({ organisationId: orgId, kind: 'settlement-check', subjectId: row.id });
    if (existing) {
      throw new DomainError(
        'invalid_transition',
        `Revision ${revision} of this check was issued on ${longDate(existing.createdAt)}; an issued revision is not issued again. Download its PDF summary, or run the check again and issue the new revision.`,
      );
    }
    const report = await queueReport(manager, { orgId, kind: 'settlement-check', subjectId: row.id, testId: null, requestedById: actor.id });
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: CHECK_ISSUED_ACTION, objectType: 'settlement_check', objectId: checkId, details: { revision, revisionId: row.id, reportId: report.id } },
      manager,
    );
  });
  return findIssuedCheck(orgId, projectId, checkId, revision);
}

/** A designer asks again for the PDF of an issued revision whose printing failed. */
export async function retryIssuedCheckReport(orgId: string, projectId: string, checkId: string, revision: number, actor: { id: string }): Promise<IssuedCheck> {
  const issued = await findIssuedCheck(orgId, projectId, checkId, revision);
  await retryReport(orgId, 'settlement-check', issued.revisionId, actor, null);
  return findIssuedCheck(orgId, projectId, checkId, revision);
}
