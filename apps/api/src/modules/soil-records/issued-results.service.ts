import type { IssuedResult, IssuedTestSummary, ProjectResults, ResultsBorehole, ResultsProject } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { AnalysisEntity } from '../analyses/analysis.entity.js';
import { assertProjectVisible, type Viewer } from '../projects/project-scope.js';
import { inSituStress } from '../samples/in-situ-stress.js';
import { issuedSpecimen } from './issued-specimen.js';
import { getSoilRecord, loadVersions } from './soil-records.service.js';

type Row = Record<string, unknown>;

async function resultsProject(orgId: string, projectId: string): Promise<ResultsProject> {
  const [row] = (await dataSource.query('SELECT id, name, reference, client_name, site_name FROM projects WHERE organisation_id = $1 AND id = $2', [orgId, projectId])) as Row[];
  if (!row) throw new NotFoundError('project');
  return { id: row['id'] as string, name: row['name'] as string, reference: row['reference'] as string, clientName: row['client_name'] as string, siteName: row['site_name'] as string };
}

const stressOf = (row: Row) =>
  inSituStress(
    {
      topDepthM: row['top_depth_m'] as number,
      bottomDepthM: row['bottom_depth_m'] as number,
      bulkUnitWeightKnPerM3: row['bulk_unit_weight_kn_per_m3'] as number | null,
      inSituStressKpa: row['in_situ_stress_kpa'] as number | null,
    },
    row['water_table_depth_m'] as number | null,
  ).kpa;

/**
 * A project's approved results, as everyone who may read the project sees them (clients
 * included): its boreholes and samples, and each test's current approved version. Nothing of
 * the lab's work in hand. 404 when the project is missing or outside the viewer's scope.
 */
export async function projectResults(viewer: Viewer, projectId: string): Promise<ProjectResults> {
  assertProjectVisible(viewer, projectId);
  const project = await resultsProject(viewer.orgId, projectId);
  const sampleRows = (await dataSource.query(
    `SELECT b.id AS borehole_id, b.name AS borehole_name, b.ground_level_m_od, b.water_table_depth_m,
            s.id AS sample_id, s.reference, s.top_depth_m, s.bottom_depth_m, s.description,
            (SELECT count(*)::int FROM soil_records r WHERE r.sample_id = s.id) AS issued_count
       FROM boreholes b LEFT JOIN samples s ON s.borehole_id = b.id
      WHERE b.organisation_id = $1 AND b.project_id = $2
      ORDER BY b.name, s.top_depth_m, s.reference`,
    [viewer.orgId, projectId],
  )) as Row[];
  const boreholes = new Map<string, ResultsBorehole>();
  for (const row of sampleRows) {
    const id = row['borehole_id'] as string;
    const borehole = boreholes.get(id) ?? {
      id,
      name: row['borehole_name'] as string,
      groundLevelMOd: row['ground_level_m_od'] as number | null,
      waterTableDepthM: row['water_table_depth_m'] as number | null,
      samples: [],
    };
    boreholes.set(id, borehole);
    if (row['sample_id']) {
      borehole.samples.push({
        id: row['sample_id'] as string,
        reference: row['reference'] as string,
        topDepthM: row['top_depth_m'] as number,
        bottomDepthM: row['bottom_depth_m'] as number,
        description: row['description'] as string,
        issuedTestCount: row['issued_count'] as number,
      });
    }
  }
  const recordRows = (await dataSource.query(
    `SELECT r.id, r.test_id, r.current_version, t.reference AS test_reference, b.name AS borehole_name, b.water_table_depth_m,
            s.reference AS sample_reference, s.top_depth_m, s.bottom_depth_m, s.description, s.bulk_unit_weight_kn_per_m3, s.in_situ_stress_kpa
       FROM soil_records r JOIN consolidation_tests t ON t.id = r.test_id JOIN samples s ON s.id = r.sample_id JOIN boreholes b ON b.id = s.borehole_id
      WHERE r.organisation_id = $1 AND r.project_id = $2
      ORDER BY b.name, s.top_depth_m, t.reference`,
    [viewer.orgId, projectId],
  )) as Row[];
  const versions = await loadVersions(viewer.orgId, recordRows.map((row) => row['id'] as string));
  const results: IssuedResult[] = recordRows.map((row) => {
    const current = versions.find((v) => v.recordId === row['id'] && v.version === row['current_version']);
    if (!current) throw new Error(`soil record ${String(row['id'])} has no current version`);
    return {
      recordId: row['id'] as string,
      testId: row['test_id'] as string,
      testReference: row['test_reference'] as string,
      boreholeName: row['borehole_name'] as string,
      sampleReference: row['sample_reference'] as string,
      topDepthM: row['top_depth_m'] as number,
      bottomDepthM: row['bottom_depth_m'] as number,
      description: row['description'] as string,
      inSituStressKpa: stressOf(row),
      current,
    };
  });
  return { project, boreholes: [...boreholes.values()], results };
}

/**
 * One approved version as it was issued: where the sample came from, the specimen and the curves
 * of the analysis the version was approved from (never the test's later working analysis).
 * 404 when the record is missing or outside the viewer's scope, or has no such version.
 */
export async function issuedTestSummary(viewer: Viewer, recordId: string, versionNumber: number): Promise<IssuedTestSummary> {
  const record = await getSoilRecord(viewer, recordId);
  const version = record.versions.find((v) => v.version === versionNumber);
  if (!version) throw new NotFoundError('soil record version');
  const analysis = await dataSource.getRepository(AnalysisEntity).findOneBy({ organisationId: viewer.orgId, id: version.analysisId });
  if (!analysis) throw new Error(`soil record version ${version.id} points at a missing analysis`);
  const [row] = (await dataSource.query(
    `SELECT t.id AS test_id, t.reference AS test_reference, t.started_on::text AS started_on, t.finished_on::text AS finished_on,
            s.reference AS sample_reference, s.top_depth_m, s.bottom_depth_m, s.description,
            b.name AS borehole_name, b.ground_level_m_od, b.water_table_depth_m
       FROM soil_records r JOIN consolidation_tests t ON t.id = r.test_id JOIN samples s ON s.id = r.sample_id JOIN boreholes b ON b.id = s.borehole_id
      WHERE r.organisation_id = $1 AND r.id = $2`,
    [viewer.orgId, recordId],
  )) as Row[];
  if (!row) throw new NotFoundError('soil record');
  return {
    recordId,
    currentVersion: record.currentVersion,
    version,
    project: await resultsProject(viewer.orgId, record.projectId),
    borehole: { name: row['borehole_name'] as string, groundLevelMOd: row['ground_level_m_od'] as number | null, waterTableDepthM: row['water_table_depth_m'] as number | null },
    sample: { reference: row['sample_reference'] as string, topDepthM: row['top_depth_m'] as number, bottomDepthM: row['bottom_depth_m'] as number, description: row['description'] as string },
    test: { id: row['test_id'] as string, reference: row['test_reference'] as string, startedOn: row['started_on'] as string | null, finishedOn: row['finished_on'] as string | null },
    specimen: issuedSpecimen(analysis.result),
    overrideReason: analysis.pickReason,
    result: analysis.result,
  };
}
