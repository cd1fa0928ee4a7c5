import type { AnalysisSummary, CompliancePoint, JobState, Picks, TestDetail, TestListQuery, TestSummary } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { preparedQuery } from '../../db/prepared.js';
import { readCache } from '../../db/read-cache.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { jsonBody, type JsonBody } from '../../http/json-body.js';
import { ANALYSE_TEST_QUEUE } from '../../jobs/analyse-test-queue.js';
import { AnalysisEntity } from '../analyses/analysis.entity.js';
import { toAnalysisSummary } from '../analyses/analyses.service.js';
import { assertProjectVisible, openableTestsSql, opensLabTest, projectView, type Viewer } from '../projects/project-scope.js';
import { inSituStress } from '../samples/in-situ-stress.js';

/** A test with its sample, borehole, project and technician. */
const SUMMARY_JOINS = `
    FROM consolidation_tests t
    JOIN samples s ON s.id = t.sample_id
    JOIN boreholes b ON b.id = s.borehole_id
    JOIN projects p ON p.id = b.project_id
    JOIN users u ON u.id = t.technician_id`;

const SUMMARY_COLUMNS = `t.id, t.reference, t.status, p.id AS project_id, p.name AS project_name, b.id AS borehole_id, b.name AS borehole_name,
         b.water_table_depth_m, s.id AS sample_id, s.reference AS sample_reference, s.top_depth_m, s.bottom_depth_m,
         s.bulk_unit_weight_kn_per_m3, s.in_situ_stress_kpa, u.id AS technician_id, u.name AS technician_name, t.submitted_at, t.updated_at`;

/**
 * A test's whole detail in one row: its summary, its set-up, and beside them the newest pending
 * and the newest analysis job ($3, the queue) and the comment of the last change request while
 * changes stand requested. Dates as text ('YYYY-MM-DD'), as the entity reads them.
 */
const DETAIL_SQL = `
  SELECT ${SUMMARY_COLUMNS},
         t.initial_height_mm, t.diameter_mm, t.specific_gravity, t.dry_mass_g, t.initial_water_content, t.wet_mass_g,
         t.final_water_content, t.drainage, t.apparatus_name, t.compliance, t.started_on::text AS started_on,
         t.finished_on::text AS finished_on, t.picks, t.latest_upload_id, t.latest_analysis_id, t.created_at,
         pending.id AS pending_job_id, latest.id AS latest_job_id, latest.state AS latest_job_state,
         latest.message AS latest_job_message, latest.updated_at AS latest_job_updated_at, changes.comment AS changes_requested_comment
  ${SUMMARY_JOINS}
    LEFT JOIN LATERAL (SELECT r.id FROM job_runs r
                        WHERE r.organisation_id = t.organisation_id AND r.test_id = t.id AND r.kind = $3 AND r.state IN ('queued', 'running')
                        ORDER BY r.created_at DESC LIMIT 1) pending ON TRUE
    LEFT JOIN LATERAL (SELECT r.id, r.state, r.message, r.updated_at FROM job_runs r
                        WHERE r.organisation_id = t.organisation_id AND r.test_id = t.id AND r.kind = $3
                        ORDER BY r.created_at DESC LIMIT 1) latest ON TRUE
    LEFT JOIN LATERAL (SELECT e.comment FROM review_events e
                        WHERE t.status = 'changes_requested' AND e.organisation_id = t.organisation_id AND e.test_id = t.id
                          AND e.decision = 'changes_requested'
                        ORDER BY e.at DESC LIMIT 1) changes ON TRUE
   WHERE t.organisation_id = $1 AND t.id = $2`;

type Row = Record<string, unknown>;

function toSummary(row: Row): TestSummary {
  return {
    id: row['id'] as string,
    reference: row['reference'] as string,
    status: row['status'] as TestSummary['status'],
    projectId: row['project_id'] as string,
    projectName: row['project_name'] as string,
    boreholeId: row['borehole_id'] as string,
    boreholeName: row['borehole_name'] as string,
    sampleId: row['sample_id'] as string,
    sampleReference: row['sample_reference'] as string,
    topDepthM: row['top_depth_m'] as number,
    technicianId: row['technician_id'] as string,
    technicianName: row['technician_name'] as string,
    submittedAt: row['submitted_at'] ? (row['submitted_at'] as Date).toISOString() : null,
    updatedAt: (row['updated_at'] as Date).toISOString(),
  };
}

/**
 * The tests the viewer may open (project-scope.ts: a designer, their projects' tests as approved),
 * filtered: a TestSummary[] as the JSON answer, encoded once and kept until the rows change.
 */
export async function listTestsBody(viewer: Viewer, filter: TestListQuery): Promise<JsonBody> {
  if (filter.projectId) assertProjectVisible(viewer, filter.projectId);
  const values: unknown[] = [viewer.orgId];
  const clauses: string[] = [openableTestsSql(viewer, 'p.id', 't.status', values)];
  const add = (column: string, value: string | undefined) => {
    if (value === undefined) return;
    values.push(value);
    clauses.push(`${column} = $${values.length}`);
  };
  add('p.id', filter.projectId);
  add('b.id', filter.boreholeId);
  add('s.id', filter.sampleId);
  add('t.status', filter.status);
  add('t.technician_id', filter.technicianId);
  const sql = `SELECT ${SUMMARY_COLUMNS} ${SUMMARY_JOINS}
   WHERE t.organisation_id = $1${clauses.map((c) => ` AND ${c}`).join('')}
   ORDER BY p.name, b.name, s.top_depth_m, t.reference`;
  return readCache().read(
    viewer.orgId,
    `tests ${sql} ${JSON.stringify(values)}`,
    async () => jsonBody((await preparedQuery<Row>(sql, values)).map(toSummary)),
    (kept) => kept.body.length + 200,
  );
}

/** Summaries of analyses already read, by organisation and id; the oldest goes first past the bound. */
const summaries = new Map<string, AnalysisSummary>();
const SUMMARIES_KEPT = 5000;

/**
 * An analysis's summary (its key parameters come out of the whole stored result, tens of kB of
 * JSON to read and parse). Analyses are never changed once written, so a summary read once
 * holds for good.
 */
async function analysisSummary(orgId: string, analysisId: string): Promise<AnalysisSummary | null> {
  const key = `${orgId}:${analysisId}`;
  const kept = summaries.get(key);
  if (kept) return kept;
  const analysis = await dataSource.getRepository(AnalysisEntity).findOneBy({ organisationId: orgId, id: analysisId });
  if (!analysis) return null;
  const summary = toAnalysisSummary(analysis);
  summaries.set(key, summary);
  if (summaries.size > SUMMARIES_KEPT) summaries.delete(summaries.keys().next().value as string);
  return summary;
}

/** The test's detail row (DETAIL_SQL); the same 404 as for a test of another tenant when there is none. */
async function detailRow(orgId: string, testId: string): Promise<Row> {
  const [row] = await preparedQuery<Row>(DETAIL_SQL, [orgId, testId, ANALYSE_TEST_QUEUE]);
  if (!row) throw new NotFoundError('test');
  return row;
}

/**
 * A test as the viewer may read it: the lab's whole detail; for a designer (only while the test
 * stands approved) without the lab's working state — job messages and the upload to download.
 * Outside the viewer's scope, the same 404 as a missing test (the rule of assertTestOpenable).
 * As the JSON answer: the lab's is kept (db/read-cache.ts) encoded, and the scope checked on it each time.
 */
export async function readTestDetailBody(viewer: Viewer, testId: string): Promise<JsonBody> {
  const { detail, answer } = await readCache().read(
    viewer.orgId,
    `test ${testId}`,
    async () => {
      const lab = await getTestDetail(viewer.orgId, testId);
      return { detail: lab, answer: jsonBody(lab) };
    },
    (kept) => kept.answer.body.length * 3,
  );
  const view = projectView(viewer, detail.projectId);
  if (!view || !opensLabTest(view, detail.status)) throw new NotFoundError('test');
  if (view === 'lab') return answer;
  return jsonBody({ ...detail, latestUploadId: null, pendingJobId: null, latestAnalysisJob: null, changesRequestedComment: null } satisfies TestDetail);
}

/** The lab's whole detail of a test of the organisation, from the database; for lab routes and after the lab's own changes. */
export async function getTestDetail(orgId: string, testId: string): Promise<TestDetail> {
  return toDetail(orgId, await detailRow(orgId, testId));
}

async function toDetail(orgId: string, row: Row): Promise<TestDetail> {
  const latestAnalysisId = row['latest_analysis_id'] as string | null;
  const analysis = latestAnalysisId ? await analysisSummary(orgId, latestAnalysisId) : null;
  const stress = inSituStress(
    {
      topDepthM: row['top_depth_m'] as number,
      bottomDepthM: row['bottom_depth_m'] as number,
      bulkUnitWeightKnPerM3: row['bulk_unit_weight_kn_per_m3'] as number | null,
      inSituStressKpa: row['in_situ_stress_kpa'] as number | null,
    },
    row['water_table_depth_m'] as number | null,
  );
  const latestJobId = row['latest_job_id'] as string | null;
  return {
    ...toSummary(row),
    specimen: {
      initialHeightMm: row['initial_height_mm'] as number | null,
      diameterMm: row['diameter_mm'] as number | null,
      specificGravity: row['specific_gravity'] as number | null,
      dryMassG: row['dry_mass_g'] as number | null,
      initialWaterContent: row['initial_water_content'] as number | null,
      wetMassG: row['wet_mass_g'] as number | null,
      finalWaterContent: row['final_water_content'] as number | null,
      drainage: row['drainage'] as 'double' | 'single',
    },
    apparatusName: row['apparatus_name'] as string,
    compliance: row['compliance'] as CompliancePoint[],
    startedOn: row['started_on'] as string | null,
    finishedOn: row['finished_on'] as string | null,
    inSituStressKpa: stress.kpa,
    latestUploadId: row['latest_upload_id'] as string | null,
    picks: row['picks'] as Picks,
    latestAnalysis: analysis,
    pendingJobId: (row['pending_job_id'] as string | null) ?? null,
    latestAnalysisJob: latestJobId
      ? {
          id: latestJobId,
          state: row['latest_job_state'] as JobState,
          message: row['latest_job_message'] as string | null,
          updatedAt: (row['latest_job_updated_at'] as Date).toISOString(),
        }
      : null,
    changesRequestedComment: (row['changes_requested_comment'] as string | null) ?? null,
    createdAt: (row['created_at'] as Date).toISOString(),
  };
}
