import type { CheckRevision } from '@porestack/types';
import { dataSource } from '../../../data-source.js';
import { CHECK_ISSUED_ACTION } from '../../settlement-checks/check-issue.service.js';
import { getRevision } from '../../settlement-checks/check-runs.service.js';

/** What the printed summary of an issued check revision is made from: the stored run and its context. */
export interface CheckReportData {
  organisation: { name: string; address: string };
  project: { name: string; reference: string; clientName: string; siteName: string };
  revision: CheckRevision;
  issuedBy: string;
  issuedAt: Date;
}

type Row = Record<string, unknown>;

/** Loads an issued revision (the report's subject) with the run as stored, every footing in full. */
export async function loadCheckReportData(orgId: string, revisionId: string): Promise<CheckReportData> {
  const [row] = (await dataSource.query(
    `SELECT r.revision, r.check_id, c.project_id, o.name AS org_name, o.report_address,
            p.name AS project_name, p.reference AS project_reference, p.client_name, p.site_name,
            u.name AS issued_by, a.at AS issued_at
       FROM settlement_check_revisions r
       JOIN settlement_checks c ON c.id = r.check_id
       JOIN projects p ON p.id = c.project_id
       JOIN organisations o ON o.id = r.organisation_id
       JOIN audit_entries a ON a.organisation_id = r.organisation_id AND a.action = $3 AND a.details->>'revisionId' = r.id::text
       JOIN users u ON u.id = a.actor_user_id
      WHERE r.organisation_id = $1 AND r.id = $2
      ORDER BY a.at LIMIT 1`,
    [orgId, revisionId, CHECK_ISSUED_ACTION],
  )) as Row[];
  if (!row) throw new Error(`settlement check revision ${revisionId} is not issued in organisation ${orgId}`);
  const revision = await getRevision(orgId, row['project_id'] as string, row['check_id'] as string, Number(row['revision']), 'full');
  return {
    organisation: { name: row['org_name'] as string, address: row['report_address'] as string },
    project: {
      name: row['project_name'] as string,
      reference: row['project_reference'] as string,
      clientName: row['client_name'] as string,
      siteName: row['site_name'] as string,
    },
    revision,
    issuedBy: row['issued_by'] as string,
    issuedAt: row['issued_at'] as Date,
  };
}
