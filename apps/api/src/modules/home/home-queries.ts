import type { HomeApproval, HomeTest, StuckTest, TestStatus } from '@porestack/types';
import { dataSource } from '../../data-source.js';

type Row = Record<string, unknown>;

const TEST_COLUMNS = `t.id AS test_id, t.reference AS test_reference, t.status, p.name AS project_name, b.name AS borehole_name,
  s.reference AS sample_reference, s.top_depth_m, t.updated_at`;
const TEST_JOINS = `JOIN samples s ON s.id = t.sample_id JOIN boreholes b ON b.id = s.borehole_id JOIN projects p ON p.id = b.project_id`;

function toHomeTest(row: Row): HomeTest {
  return {
    testId: row['test_id'] as string,
    testReference: row['test_reference'] as string,
    status: row['status'] as TestStatus,
    projectName: row['project_name'] as string,
    boreholeName: row['borehole_name'] as string,
    sampleReference: row['sample_reference'] as string,
    topDepthM: row['top_depth_m'] as number,
    updatedAt: (row['updated_at'] as Date).toISOString(),
  };
}

export interface TechnicianTest extends HomeTest {
  lastJob: { kind: string; state: string; message: string | null } | null;
  lastChangeRequest: string | null;
}

/** The technician's tests, most recently changed first, with their newest job and the newest change request. */
export async function technicianTests(orgId: string, technicianId: string): Promise<TechnicianTest[]> {
  const rows = (await dataSource.query(
    `SELECT ${TEST_COLUMNS},
            (SELECT json_build_object('kind', j.kind, 'state', j.state, 'message', j.message) FROM job_runs j
              WHERE j.organisation_id = t.organisation_id AND j.test_id = t.id ORDER BY j.created_at DESC LIMIT 1) AS last_job,
            (SELECT e.comment FROM review_events e WHERE e.organisation_id = t.organisation_id AND e.test_id = t.id AND e.decision = 'changes_requested'
              ORDER BY e.at DESC LIMIT 1) AS last_change_request
       FROM consolidation_tests t ${TEST_JOINS}
      WHERE t.organisation_id = $1 AND t.technician_id = $2
      ORDER BY t.updated_at DESC`,
    [orgId, technicianId],
  )) as Row[];
  return rows.map((row) => ({
    ...toHomeTest(row),
    lastJob: (row['last_job'] as TechnicianTest['lastJob']) ?? null,
    lastChangeRequest: (row['last_change_request'] as string | null) ?? null,
  }));
}

/** Tests whose newest background job failed: nothing has been run on them since. */
export async function stuckTests(orgId: string, limit: number): Promise<StuckTest[]> {
  const rows = (await dataSource.query(
    `SELECT ${TEST_COLUMNS}, last.kind, last.message, last.updated_at AS failed_at, u.name AS technician_name
       FROM (SELECT DISTINCT ON (j.test_id) j.test_id, j.kind, j.state, j.message, j.updated_at
               FROM job_runs j WHERE j.organisation_id = $1 AND j.test_id IS NOT NULL ORDER BY j.test_id, j.created_at DESC) last
       JOIN consolidation_tests t ON t.id = last.test_id ${TEST_JOINS} JOIN users u ON u.id = t.technician_id
      WHERE last.state = 'failed'
      ORDER BY last.updated_at DESC LIMIT $2`,
    [orgId, limit],
  )) as Row[];
  return rows.map((row) => ({
    ...toHomeTest(row),
    jobKind: row['kind'] as string,
    message: row['message'] as string | null,
    failedAt: (row['failed_at'] as Date).toISOString(),
    technicianName: row['technician_name'] as string,
  }));
}

/**
 * Approved versions, newest first: of every project (`projectIds` null), or of these projects;
 * `currentOnly` leaves out versions superseded since.
 */
export async function recentApprovals(orgId: string, projectIds: readonly string[] | null, options: { limit: number; currentOnly: boolean }): Promise<HomeApproval[]> {
  if (projectIds !== null && projectIds.length === 0) return [];
  const rows = (await dataSource.query(
    `SELECT v.record_id, v.version, v.test_id, t.reference AS test_reference, p.id AS project_id, p.name AS project_name, b.name AS borehole_name,
            s.reference AS sample_reference, s.top_depth_m, v.approved_at, u.name AS approved_by_name, v.compression_index, v.preconsolidation_adopted_kpa
       FROM soil_record_versions v JOIN soil_records r ON r.id = v.record_id JOIN consolidation_tests t ON t.id = v.test_id
       JOIN samples s ON s.id = r.sample_id JOIN boreholes b ON b.id = s.borehole_id JOIN projects p ON p.id = r.project_id
       LEFT JOIN users u ON u.id = v.approved_by_id
      WHERE v.organisation_id = $1 AND ($2::uuid[] IS NULL OR r.project_id = ANY($2::uuid[])) AND (NOT $3 OR v.version = r.current_version)
      ORDER BY v.approved_at DESC LIMIT $4`,
    [orgId, projectIds, options.currentOnly, options.limit],
  )) as Row[];
  return rows.map((row) => ({
    recordId: row['record_id'] as string,
    version: row['version'] as number,
    testId: row['test_id'] as string,
    testReference: row['test_reference'] as string,
    projectId: row['project_id'] as string,
    projectName: row['project_name'] as string,
    boreholeName: row['borehole_name'] as string,
    sampleReference: row['sample_reference'] as string,
    topDepthM: row['top_depth_m'] as number,
    approvedAt: (row['approved_at'] as Date).toISOString(),
    approvedByName: (row['approved_by_name'] as string | null) ?? '',
    compressionIndex: row['compression_index'] as number | null,
    preconsolidationAdoptedKpa: row['preconsolidation_adopted_kpa'] as number | null,
  }));
}

/** How many members hold each role (a member holding two roles counts under both). */
export async function memberCounts(orgId: string): Promise<Array<{ role: string; count: number }>> {
  return (await dataSource.query('SELECT role, count(*)::int AS count FROM memberships, unnest(roles) AS role WHERE organisation_id = $1 GROUP BY role', [orgId])) as Array<{
    role: string;
    count: number;
  }>;
}

export async function memberTotal(orgId: string): Promise<number> {
  const [row] = (await dataSource.query('SELECT count(*)::int AS n FROM memberships WHERE organisation_id = $1', [orgId])) as Array<{ n: number }>;
  return row?.n ?? 0;
}

/** The projects a member holds a place on, as a designer or as a client. */
export async function placedProjectIds(orgId: string, userId: string, place: 'designer' | 'client'): Promise<string[]> {
  const rows = (await dataSource.query('SELECT project_id FROM project_members WHERE organisation_id = $1 AND user_id = $2 AND role = $3', [orgId, userId, place])) as Array<{
    project_id: string;
  }>;
  return rows.map((row) => row.project_id);
}
