import type { AnalysisSummary, ReviewDecision, TestDetail, TestListQuery, TestSummary } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { ANALYSE_TEST_QUEUE } from '../../jobs/analyse-test-queue.js';
import { AnalysisEntity } from '../analyses/analysis.entity.js';
import { toAnalysisSummary } from '../analyses/analyses.service.js';
import { jobRuns } from '../job-runs/job-runs.service.js';
import { assertProjectVisible, assertTestOpenable, openableTestsSql, type Viewer } from '../projects/project-scope.js';
import { inSituStress } from '../samples/in-situ-stress.js';
import { ConsolidationTestEntity } from './consolidation-test.entity.js';

const SUMMARY_SQL = `
  SELECT t.id, t.reference, t.status, p.id AS project_id, p.name AS project_name, b.id AS borehole_id, b.name AS borehole_name,
         b.water_table_depth_m, s.id AS sample_id, s.reference AS sample_reference, s.top_depth_m, s.bottom_depth_m,
         s.bulk_unit_weight_kn_per_m3, s.in_situ_stress_kpa, u.id AS technician_id, u.name AS technician_name, t.submitted_at, t.updated_at
    FROM consolidation_tests t
    JOIN samples s ON s.id = t.sample_id
    JOIN boreholes b ON b.id = s.borehole_id
    JOIN projects p ON p.id = b.project_id
    JOIN users u ON u.id = t.technician_id
   WHERE t.organisation_id = $1`;

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

/** The tests the viewer may open (project-scope.ts: a designer, their projects' tests as approved), filtered. */
export async function listTests(viewer: Viewer, filter: TestListQuery): Promise<TestSummary[]> {
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
  const sql = `${SUMMARY_SQL}${clauses.map((c) => ` AND ${c}`).join('')} ORDER BY p.name, b.name, s.top_depth_m, t.reference`;
  return ((await dataSource.query(sql, values)) as Row[]).map(toSummary);
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

/**
 * A test as the viewer may read it: the lab's whole detail; for a designer (only while the test
 * stands approved) without the lab's working state — job messages and the upload to download.
 */
export async function readTestDetail(viewer: Viewer, testId: string): Promise<TestDetail> {
  const view = await assertTestOpenable(viewer, testId);
  const detail = await getTestDetail(viewer.orgId, testId);
  if (view === 'lab') return detail;
  return { ...detail, latestUploadId: null, pendingJobId: null, latestAnalysisJob: null, changesRequestedComment: null };
}

/** The lab's whole detail of a test of the organisation; for lab routes and after the lab's own changes. */
export async function getTestDetail(orgId: string, testId: string): Promise<TestDetail> {
  // Independent reads side by side, each on its own pooled connection.
  const [[row], test] = await Promise.all([
    dataSource.query(`${SUMMARY_SQL} AND t.id = $2`, [orgId, testId]) as Promise<Row[]>,
    dataSource.getRepository(ConsolidationTestEntity).findOneBy({ organisationId: orgId, id: testId }),
  ]);
  if (!row || !test) throw new NotFoundError('test');
  const [analysis, pending, latestJob, [lastChangeRequest]] = await Promise.all([
    test.latestAnalysisId ? analysisSummary(orgId, test.latestAnalysisId) : null,
    jobRuns.pendingFor(orgId, testId, ANALYSE_TEST_QUEUE),
    jobRuns.latestFor(orgId, testId, ANALYSE_TEST_QUEUE),
    test.status === 'changes_requested'
      ? (dataSource.query(
          'SELECT comment FROM review_events WHERE organisation_id = $1 AND test_id = $2 AND decision = $3 ORDER BY at DESC LIMIT 1',
          [orgId, testId, 'changes_requested' satisfies ReviewDecision],
        ) as Promise<Array<{ comment: string | null }>>)
      : [],
  ]);
  const stress = inSituStress(
    {
      topDepthM: row['top_depth_m'] as number,
      bottomDepthM: row['bottom_depth_m'] as number,
      bulkUnitWeightKnPerM3: row['bulk_unit_weight_kn_per_m3'] as number | null,
      inSituStressKpa: row['in_situ_stress_kpa'] as number | null,
    },
    row['water_table_depth_m'] as number | null,
  );
  return {
    ...toSummary(row),
    specimen: {
      initialHeightMm: test.initialHeightMm,
      diameterMm: test.diameterMm,
      specificGravity: test.specificGravity,
      dryMassG: test.dryMassG,
      initialWaterContent: test.initialWaterContent,
      wetMassG: test.wetMassG,
      finalWaterContent: test.finalWaterContent,
      drainage: test.drainage,
    },
    apparatusName: test.apparatusName,
    compliance: test.compliance,
    startedOn: test.startedOn,
    finishedOn: test.finishedOn,
    inSituStressKpa: stress.kpa,
    latestUploadId: test.latestUploadId,
    picks: test.picks,
    latestAnalysis: analysis,
    pendingJobId: pending?.id ?? null,
    latestAnalysisJob: latestJob ? { id: latestJob.id, state: latestJob.state, message: latestJob.message, updatedAt: latestJob.updatedAt.toISOString() } : null,
    changesRequestedComment: lastChangeRequest?.comment ?? null,
    createdAt: test.createdAt.toISOString(),
  };
}
