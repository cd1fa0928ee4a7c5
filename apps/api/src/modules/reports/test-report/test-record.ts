import type { ConsolidationTestResult, Picks, Specimen } from '@porestack/types';
import { dataSource } from '../../../data-source.js';
import { DomainError, NotFoundError } from '../../../errors/domain-error.js';
import { DEFAULT_TEST_METHOD_STATEMENT } from './test-method.js';

/**
 * Everything a test report or a reduced-data export prints about one analysis of a test,
 * with its context (organisation, project, borehole, sample) and, for an approved version,
 * the approval. Read in one place so the PDF and the spreadsheet always agree.
 */
export interface TestRecord {
  organisation: { name: string; address: string; methodStatement: string };
  project: { id: string; name: string; reference: string; clientName: string; siteName: string };
  borehole: { name: string; groundLevelMOd: number | null; waterTableDepthM: number | null };
  sample: { reference: string; topDepthM: number; bottomDepthM: number; description: string; inSituStressSource: 'entered' | 'estimated' | null };
  test: { id: string; reference: string; status: string; apparatusName: string; startedOn: string | null; finishedOn: string | null; technicianName: string; specimen: Specimen };
  analysis: { id: string; createdAt: Date; inputsHash: string; geoCoreVersion: string; picks: Picks; pickReason: string | null; uploadId: string | null; result: ConsolidationTestResult };
  /** The approval, for a soil record version; null for a test's current (unapproved) analysis. */
  approval: {
    versionId: string;
    recordId: string;
    version: number;
    approvedAt: Date;
    approvedByName: string;
    comment: string | null;
    supersedesVersion: number | null;
    uploadSha256: string | null;
  } | null;
  /** Whether the test's stored readings are still those the analysis used (time-curve plots need them). */
  readingsMatchAnalysis: boolean;
}

type Row = Record<string, unknown>;

const CONTEXT_SQL = `
  SELECT o.name AS org_name, o.report_address, o.test_method_statement,
         p.id AS project_id, p.name AS project_name, p.reference AS project_reference, p.client_name, p.site_name,
         b.name AS borehole_name, b.ground_level_m_od, b.water_table_depth_m,
         s.reference AS sample_reference, s.top_depth_m, s.bottom_depth_m, s.description, s.bulk_unit_weight_kn_per_m3, s.in_situ_stress_kpa,
         t.id AS test_id, t.reference AS test_reference, t.status, t.apparatus_name, t.started_on, t.finished_on, t.latest_upload_id,
         t.initial_height_mm, t.diameter_mm, t.specific_gravity, t.dry_mass_g, t.initial_water_content, t.wet_mass_g, t.final_water_content, t.drainage,
         u.name AS technician_name,
         a.id AS analysis_id, a.created_at AS analysis_created_at, a.inputs_hash, a.geo_core_version, a.picks, a.pick_reason, a.upload_id, a.result
    FROM analyses a
    JOIN consolidation_tests t ON t.id = a.test_id AND t.organisation_id = a.organisation_id
    JOIN samples s ON s.id = t.sample_id
    JOIN boreholes b ON b.id = s.borehole_id
    JOIN projects p ON p.id = b.project_id
    JOIN organisations o ON o.id = t.organisation_id
    JOIN users u ON u.id = t.technician_id
   WHERE a.organisation_id = $1 AND a.id = $2`;

function toRecord(row: Row, approval: TestRecord['approval']): TestRecord {
  const n = (key: string) => (row[key] === null || row[key] === undefined ? null : Number(row[key]));
  return {
    organisation: {
      name: row['org_name'] as string,
      address: row['report_address'] as string,
      methodStatement: (row['test_method_statement'] as string | null) ?? DEFAULT_TEST_METHOD_STATEMENT,
    },
    project: {
      id: row['project_id'] as string,
      name: row['project_name'] as string,
      reference: row['project_reference'] as string,
      clientName: row['client_name'] as string,
      siteName: row['site_name'] as string,
    },
    borehole: { name: row['borehole_name'] as string, groundLevelMOd: n('ground_level_m_od'), waterTableDepthM: n('water_table_depth_m') },
    sample: {
      reference: row['sample_reference'] as string,
      topDepthM: Number(row['top_depth_m']),
      bottomDepthM: Number(row['bottom_depth_m']),
      description: row['description'] as string,
      inSituStressSource: row['in_situ_stress_kpa'] !== null ? 'entered' : row['bulk_unit_weight_kn_per_m3'] !== null ? 'estimated' : null,
    },
    test: {
      id: row['test_id'] as string,
      reference: row['test_reference'] as string,
      status: row['status'] as string,
      apparatusName: row['apparatus_name'] as string,
      startedOn: row['started_on'] as string | null,
      finishedOn: row['finished_on'] as string | null,
      technicianName: row['technician_name'] as string,
      specimen: {
        initialHeightMm: n('initial_height_mm'),
        diameterMm: n('diameter_mm'),
        specificGravity: n('specific_gravity'),
        dryMassG: n('dry_mass_g'),
        initialWaterContent: n('initial_water_content'),
        wetMassG: n('wet_mass_g'),
        finalWaterContent: n('final_water_content'),
        drainage: row['drainage'] as Specimen['drainage'],
      },
    },
    analysis: {
      id: row['analysis_id'] as string,
      createdAt: row['analysis_created_at'] as Date,
      inputsHash: row['inputs_hash'] as string,
      geoCoreVersion: row['geo_core_version'] as string,
      picks: row['picks'] as Picks,
      pickReason: row['pick_reason'] as string | null,
      uploadId: row['upload_id'] as string | null,
      result: row['result'] as ConsolidationTestResult,
    },
    approval,
    readingsMatchAnalysis: row['upload_id'] !== null && row['upload_id'] === row['latest_upload_id'],
  };
}

async function contextOf(orgId: string, analysisId: string): Promise<Row> {
  const [row] = (await dataSource.query(CONTEXT_SQL, [orgId, analysisId])) as Row[];
  if (!row) throw new NotFoundError('analysis');
  return row;
}

/** The approved version with the analysis it froze. */
export async function loadVersionRecord(orgId: string, versionId: string): Promise<TestRecord> {
  const [version] = (await dataSource.query(
    `SELECT v.id, v.record_id, v.version, v.analysis_id, v.test_id, v.approved_at, v.upload_sha256, u.name AS approver_name,
            (SELECT e.comment FROM review_events e
              WHERE e.organisation_id = v.organisation_id AND e.test_id = v.test_id AND e.decision = 'approved' AND e.analysis_id = v.analysis_id AND e.at <= v.approved_at
              ORDER BY e.at DESC LIMIT 1) AS comment,
            (SELECT prev.version FROM soil_record_versions prev WHERE prev.record_id = v.record_id AND prev.version = v.version - 1) AS supersedes
       FROM soil_record_versions v JOIN users u ON u.id = v.approved_by_id
      WHERE v.organisation_id = $1 AND v.id = $2`,
    [orgId, versionId],
  )) as Row[];
  if (!version) throw new NotFoundError('soil record version');
  return toRecord(await contextOf(orgId, version['analysis_id'] as string), {
    versionId: version['id'] as string,
    recordId: version['record_id'] as string,
    version: Number(version['version']),
    approvedAt: version['approved_at'] as Date,
    approvedByName: version['approver_name'] as string,
    comment: version['comment'] as string | null,
    supersedesVersion: version['supersedes'] === null ? null : Number(version['supersedes']),
    uploadSha256: version['upload_sha256'] as string | null,
  });
}

/** A test's newest analysis, approved or not (lab staff's working export). */
export async function loadCurrentAnalysisRecord(orgId: string, testId: string): Promise<TestRecord> {
  const [test] = (await dataSource.query('SELECT latest_analysis_id FROM consolidation_tests WHERE organisation_id = $1 AND id = $2', [orgId, testId])) as Row[];
  if (!test) throw new NotFoundError('test');
  if (!test['latest_analysis_id']) throw new DomainError('report_not_ready', 'This test has not been analysed yet, so there is no reduced data to export. Import its readings first.');
  return toRecord(await contextOf(orgId, test['latest_analysis_id'] as string), null);
}
